/**
 * Text metrics with the embedded font, so every renderer and every collision check agree on how
 * wide a run of text is. Widths are the sum of glyph advances after shaping with SHAPING_FEATURES
 * (ligatures yes, kerning no): exactly what pdf-lib's widthOfTextAtSize returns for the same font.
 */
import { SHAPING_FEATURES } from './fonts.ts';
import { openFont } from './openFont.ts';
import type { Box, Colour, FontWeight, TextNode } from './types.ts';

/** Millimetres per PostScript point (1 pt = 1/72 in, 1 in = 25.4 mm exactly). */
export const MM_PER_PT = 25.4 / 72;

export interface TextArgs {
  readonly text: string;
  readonly sizePt: number;
  readonly weight: FontWeight;
}

const fontFor = openFont; // one font object (and one layout cache) per weight, shared with the glyph outlines

// C0 and C1 control characters (tab, newline, NUL…) have no place in a one-line run of text, and
// bidirectional marks, embeddings, overrides and isolates could make a label display reversed.
const CONTROL_CHARS = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/** The text as every renderer draws it: control and bidirectional-control characters removed. */
export function printableText(text: string): string {
  return text.replace(CONTROL_CHARS, '');
}

/** Advance width of a run of text in mm (sum of glyph advances, no kerning). */
export function measureTextMm(args: TextArgs): number {
  const font = fontFor(args.weight);
  const glyphs = font.layout(printableText(args.text), SHAPING_FEATURES).glyphs;
  let advanceUnits = 0;
  for (const glyph of glyphs) advanceUnits += glyph.advanceWidth;
  return (advanceUnits / font.unitsPerEm) * args.sizePt * MM_PER_PT;
}

/** Characters of `text` (deduplicated, in order of appearance) that the font has no glyph for. */
export function unsupportedCharacters(text: string, weight: FontWeight): string[] {
  const font = fontFor(weight);
  const missing: string[] = [];
  for (const ch of printableText(text)) {
    const codePoint = ch.codePointAt(0) ?? 0;
    if (!font.hasGlyphForCodePoint(codePoint) && !missing.includes(ch)) missing.push(ch);
  }
  return missing;
}

/** Ascent and descent of the font in mm at a size, both positive (hhea metrics). */
export function fontExtentMm(args: { sizePt: number; weight: FontWeight }): { ascentMm: number; descentMm: number } {
  const font = fontFor(args.weight);
  const mmPerUnit = (args.sizePt * MM_PER_PT) / font.unitsPerEm;
  return { ascentMm: font.ascent * mmPerUnit, descentMm: Math.abs(font.descent) * mmPerUnit };
}

export interface TextNodeArgs extends TextArgs {
  readonly x: number;
  readonly y: number;
  /** Default 'start'. */
  readonly anchor?: TextNode['anchor'];
  /** Default '#000000'. */
  readonly colour?: Colour;
  readonly rotateDeg?: 0 | 90;
  readonly role?: string;
  readonly key?: string;
}

/** A TextNode with its width measured (mm); positions in mm, size in pt. */
export function textNode(args: TextNodeArgs): TextNode {
  return {
    type: 'text',
    x: args.x,
    y: args.y,
    text: args.text,
    sizePt: args.sizePt,
    weight: args.weight,
    anchor: args.anchor ?? 'start',
    colour: args.colour ?? '#000000',
    widthMm: measureTextMm(args),
    ...(args.rotateDeg !== undefined ? { rotateDeg: args.rotateDeg } : {}),
    ...(args.role !== undefined ? { role: args.role } : {}),
    ...(args.key !== undefined ? { key: args.key } : {}),
  };
}

/** The box (mm) a text node covers on paper: advance width by font ascent + descent, rotation aware. */
export function textBox(node: TextNode): Box {
  const { ascentMm, descentMm } = fontExtentMm(node);
  // Distance along the baseline from the anchor to the start of the run.
  const startOffsetMm = node.anchor === 'start' ? 0 : node.anchor === 'middle' ? -node.widthMm / 2 : -node.widthMm;
  if (node.rotateDeg === 90) {
    // Rotated 90° counter-clockwise on a y-down page: the baseline runs up (−y), glyph tops point to −x.
    return {
      x: node.x - ascentMm,
      y: node.y - startOffsetMm - node.widthMm,
      width: ascentMm + descentMm,
      height: node.widthMm,
    };
  }
  return { x: node.x + startOffsetMm, y: node.y - ascentMm, width: node.widthMm, height: ascentMm + descentMm };
}

export interface FitTextArgs extends TextArgs {
  readonly maxWidthMm: number;
  readonly minSizePt: number;
}

export interface FittedText extends TextArgs {
  readonly widthMm: number;
  /** True when characters were dropped and an ellipsis added. */
  readonly shortened: boolean;
}

const ELLIPSIS = '\u2026';
// Sizes are rounded down to a tenth of a point so output stays tidy and stable.
const SIZE_STEP_PT = 0.1;

/**
 * Fits text into maxWidthMm: keeps sizePt if it fits, else shrinks (width ∝ size) down to
 * minSizePt, else shortens at minSizePt with an ellipsis ('…' alone if nothing else fits).
 */
export function fitText(args: FitTextArgs): FittedText {
  const { text, weight, maxWidthMm, minSizePt } = args;
  const fullWidthMm = measureTextMm(args);
  if (fullWidthMm <= maxWidthMm) return { text, sizePt: args.sizePt, weight, widthMm: fullWidthMm, shortened: false };
  const exactSizePt = (args.sizePt * maxWidthMm) / fullWidthMm;
  const sizePt = Math.floor(exactSizePt / SIZE_STEP_PT + 1e-9) * SIZE_STEP_PT;
  if (sizePt >= minSizePt) {
    const rounded = Number(sizePt.toFixed(1));
    return { text, sizePt: rounded, weight, widthMm: measureTextMm({ text, sizePt: rounded, weight }), shortened: false };
  }
  // Prefix width grows with prefix length (advances are non-negative): binary-search the longest fit.
  const chars = [...text];
  const shortenedTo = (keep: number): string => chars.slice(0, keep).join('').trimEnd() + ELLIPSIS;
  const widthOf = (keep: number): number => measureTextMm({ text: shortenedTo(keep), sizePt: minSizePt, weight });
  let fits = 0;
  let tooLong = chars.length;
  while (tooLong - fits > 1) {
    const mid = Math.floor((fits + tooLong) / 2);
    if (widthOf(mid) <= maxWidthMm) fits = mid;
    else tooLong = mid;
  }
  if (fits > 0) return { text: shortenedTo(fits), sizePt: minSizePt, weight, widthMm: widthOf(fits), shortened: true };
  return { text: ELLIPSIS, sizePt: minSizePt, weight, widthMm: measureTextMm({ text: ELLIPSIS, sizePt: minSizePt, weight }), shortened: true };
}
