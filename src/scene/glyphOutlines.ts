/**
 * Text as glyph outlines: SVG path data for a run of text, set in the embedded font exactly as
 * src/scene/text.ts measures it (shaped with SHAPING_FEATURES, pen moved by the shaped advances).
 * A rasteriser handed outlines has no text to lay out, which is most of resvg's time on a sheet.
 *
 * Path data is in font units with y pointing down (SVG's way), origin on the baseline at the start
 * of the run; the caller scales it by sizePt × MM_PER_PT / unitsPerEm. Every coordinate is rounded to
 * a hundredth of a unit (TrueType points are whole units, quadratic midpoints halves) and written
 * relative to the previous point, so each glyph's path data is one fixed string that can be reused at
 * any pen position: only the move to the glyph's first point depends on where the glyph sits.
 */
import type * as fontkit from 'fontkit';
import { SHAPING_FEATURES } from './fonts.ts';
import { openFont } from './openFont.ts';
import { printableText, type TextArgs } from './text.ts';
import type { FontWeight } from './types.ts';

/** One glyph's outline, coordinates in hundredths of a font unit, y down. */
interface GlyphOutline {
  /** First point of the outline (the initial move), or undefined for a glyph with no ink (a space). */
  readonly first: readonly [number, number] | undefined;
  /** Relative path data after the initial move. */
  readonly body: string;
  /** Current point once the outline is drawn (after a close path, the start of the last contour). */
  readonly last: readonly [number, number];
}

/** A run of text as one path, in font units (see the file comment). */
export interface TextOutline {
  /** SVG path data, origin at the run's start on the baseline; '' for a run with no ink. */
  readonly d: string;
  /** Sum of the shaped advances, font units (equals measureTextMm × unitsPerEm / size in mm). */
  readonly advanceUnits: number;
  readonly unitsPerEm: number;
}

const hundredths = (units: number): number => Math.round(units * 100);
const unitsText = (h: number): string => String(h / 100);

/** Joins numbers as SVG path data: a minus sign separates as well as a space does. */
function numbers(values: readonly number[]): string {
  return values.map((h, i) => (i > 0 && h >= 0 ? ' ' : '') + unitsText(h)).join('');
}

/** Converts fontkit's absolute, y-up path commands to relative, y-down path data. */
function outlineOf(glyph: fontkit.Glyph): GlyphOutline {
  let first: [number, number] | undefined;
  let current: [number, number] = [0, 0];
  let contourStart: [number, number] = [0, 0];
  const parts: string[] = [];
  for (const { command, args } of glyph.path.commands) {
    // Points of this command in hundredths, y flipped; relative to the current point as SVG reads them.
    const points: Array<[number, number]> = [];
    for (let i = 0; i + 1 < args.length; i += 2) points.push([hundredths(args[i]), -hundredths(args[i + 1])]);
    const relative = points.flatMap(([x, y]) => [x - current[0], y - current[1]]);
    switch (command) {
      case 'moveTo':
        if (first === undefined) first = points[0];
        else parts.push(`m${numbers(relative)}`);
        contourStart = points[0];
        break;
      case 'lineTo':
        parts.push(`l${numbers(relative)}`);
        break;
      case 'quadraticCurveTo':
        parts.push(`q${numbers(relative)}`);
        break;
      case 'bezierCurveTo':
        parts.push(`c${numbers(relative)}`);
        break;
      case 'closePath':
        parts.push('z');
        current = contourStart;
        continue;
    }
    current = points[points.length - 1];
  }
  return { first, body: parts.join(''), last: current };
}

/** Outlines remembered per (weight, glyph id); a font has a few thousand glyphs, so the bound is a guard. */
const outlineFor = (() => {
  const MAX_ENTRIES = 20_000;
  const outlines = new Map<string, GlyphOutline>();
  return (weight: FontWeight, glyph: fontkit.Glyph): GlyphOutline => {
    const key = `${weight}:${glyph.id}`;
    const hit = outlines.get(key);
    if (hit) return hit;
    if (outlines.size >= MAX_ENTRIES) outlines.clear();
    const outline = outlineOf(glyph);
    outlines.set(key, outline);
    return outline;
  };
})();

/** The run's glyph outlines as one path in font units, y down, origin at the start of its baseline. */
export function textOutline(args: Pick<TextArgs, 'text' | 'weight'>): TextOutline {
  const font = openFont(args.weight);
  const run = font.layout(printableText(args.text), SHAPING_FEATURES);
  const parts: string[] = [];
  let current: readonly [number, number] | undefined;
  let penX = 0;
  run.glyphs.forEach((glyph, i) => {
    const position = run.positions[i];
    const outline = outlineFor(args.weight, glyph);
    if (outline.first !== undefined) {
      // Glyph origin: pen plus the shaped offset (marks sit on their base glyph); y offsets point up.
      const originX = hundredths(penX + position.xOffset);
      const originY = -hundredths(position.yOffset);
      const startX = originX + outline.first[0];
      const startY = originY + outline.first[1];
      parts.push(current === undefined ? `M${numbers([startX, startY])}` : `m${numbers([startX - current[0], startY - current[1]])}`);
      parts.push(outline.body);
      current = [originX + outline.last[0], originY + outline.last[1]];
    }
    penX += position.xAdvance;
  });
  return { d: parts.join(''), advanceUnits: penX, unitsPerEm: font.unitsPerEm };
}
