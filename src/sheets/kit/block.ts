/**
 * Blocks: a laid-out piece of a sheet (nodes plus the height it took), and the text helpers every block
 * uses. Line pitch is the font's full extent (ascent + descent) plus a gap, so the measured boxes of two
 * lines never overlap.
 */
import type { Colour, FontWeight, SceneNode, TextNode } from '../../scene/types.ts';
import { fontExtentMm, measureTextMm, textNode, unsupportedCharacters } from '../../scene/text.ts';
import { LayoutError } from './errors.ts';
import { INK } from './style.ts';

export interface Block {
  readonly nodes: readonly SceneNode[];
  readonly heightMm: number;
}

/** Distance (mm) between baselines of consecutive lines at a size: extent × 1.08. */
export function linePitchMm(sizePt: number, weight: FontWeight = 'regular'): number {
  const { ascentMm, descentMm } = fontExtentMm({ sizePt, weight });
  return (ascentMm + descentMm) * 1.08;
}

/** Ascent (mm): the offset from a line's top to its baseline. */
export function ascentMm(sizePt: number, weight: FontWeight = 'regular'): number {
  return fontExtentMm({ sizePt, weight }).ascentMm;
}

/** Throws a LayoutError when the font cannot draw some character (it would print as a box). */
export function assertPrintable(text: string, weight: FontWeight, where: string): void {
  const missing = unsupportedCharacters(text, weight);
  if (missing.length > 0) {
    throw new LayoutError(where, `the font has no glyph for ${missing.map((c) => JSON.stringify(c)).join(', ')} in "${text}"; use other characters`);
  }
}

/** Text node after checking every character prints. */
export function label(args: {
  x: number;
  y: number;
  text: string;
  sizePt: number;
  weight?: FontWeight;
  anchor?: TextNode['anchor'];
  colour?: Colour;
  rotateDeg?: 0 | 90;
  role?: string;
  key?: string;
  where: string;
}): TextNode {
  const weight = args.weight ?? 'regular';
  assertPrintable(args.text, weight, args.where);
  const { where: _where, ...rest } = args;
  return textNode({ ...rest, weight, colour: args.colour ?? INK });
}

/** Greedy word wrap to a width (mm). A single word wider than the width is broken between letters. */
export function wrapLines(args: { text: string; sizePt: number; weight: FontWeight; widthMm: number; where: string }): string[] {
  const fits = (t: string) => measureTextMm({ text: t, sizePt: args.sizePt, weight: args.weight }) <= args.widthMm;
  // A word too wide for the column (a long part number or name without spaces) goes onto as many lines as it needs.
  const pieces = (word: string): string[] => {
    if (fits(word)) return [word];
    const out: string[] = [];
    let rest = [...word];
    while (rest.length > 0) {
      let n = rest.length;
      while (n > 1 && !fits(rest.slice(0, n).join(''))) n -= 1;
      out.push(rest.slice(0, n).join(''));
      rest = rest.slice(n);
    }
    return out;
  };
  const words = args.text.split(/\s+/).filter((w) => w.length > 0).flatMap(pieces);
  const lines: string[] = [];
  let current = '';
  for (const word of words) {
    const candidate = current === '' ? word : `${current} ${word}`;
    if (fits(candidate)) {
      current = candidate;
      continue;
    }
    if (current !== '') lines.push(current);
    current = word;
  }
  if (current !== '') lines.push(current);
  return lines;
}

/** A wrapped paragraph whose first line's top is at y (mm). */
export function paragraph(args: {
  x: number;
  y: number;
  widthMm: number;
  text: string;
  sizePt: number;
  weight?: FontWeight;
  colour?: Colour;
  role?: string;
  where: string;
}): Block {
  const weight = args.weight ?? 'regular';
  const lines = wrapLines({ text: args.text, sizePt: args.sizePt, weight, widthMm: args.widthMm, where: args.where });
  const pitch = linePitchMm(args.sizePt, weight);
  const top = ascentMm(args.sizePt, weight);
  const nodes = lines.map((line, i) =>
    label({ x: args.x, y: args.y + top + i * pitch, text: line, sizePt: args.sizePt, weight, colour: args.colour, role: args.role, where: args.where }),
  );
  return { nodes, heightMm: lines.length * pitch };
}

/** Nodes gathered in a group, tagged with a role for tests and the site. */
export function group(nodes: readonly SceneNode[], role?: string): SceneNode {
  return { type: 'group', children: nodes, ...(role ? { role } : {}) };
}
