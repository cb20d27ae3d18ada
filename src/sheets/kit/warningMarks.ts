/**
 * The reserved marks: the warning box (white bold words on the warning colour, a reversed box that stays
 * the darkest thing on a grey photocopy), the status shapes of a WOT point, and the hatched limit line.
 * No series is drawn with any of them.
 */
import type { MatchStatus } from '../../analysis/index.ts';
import type { Box, FontWeight, PathSegment, SceneNode } from '../../scene/types.ts';
import { fontExtentMm, measureTextMm } from '../../scene/text.ts';
import { label } from './block.ts';
import { INK, INK_SOFT, ON_WARN, PAPER_WHITE, STROKE, WARN, stroke } from './style.ts';

/** Padding (mm) around the words in a warning box. */
export const WARNING_BOX_PAD_MM = 0.9;

/**
 * Words at (x, top) mm, left-aligned: plain ink for a usable status, or white bold in a warning box.
 * Returns the nodes, the width taken (mm, box included) and the text box for collision checks.
 */
export function statusWords(args: { x: number; top: number; text: string; sizePt: number; warn: boolean; role: string; key?: string; where: string }): { nodes: SceneNode[]; widthMm: number; heightMm: number } {
  const weight: FontWeight = args.warn ? 'bold' : 'regular';
  const pad = args.warn ? WARNING_BOX_PAD_MM : 0;
  const { ascentMm: asc, descentMm: desc } = fontExtentMm({ sizePt: args.sizePt, weight });
  const text = label({ x: args.x + pad, y: args.top + pad + asc, text: args.text, sizePt: args.sizePt, weight, colour: args.warn ? ON_WARN : INK, role: args.role, ...(args.key ? { key: args.key } : {}), where: args.where });
  const widthMm = text.widthMm + 2 * pad;
  const heightMm = asc + desc + 2 * pad;
  if (!args.warn) return { nodes: [text], widthMm, heightMm };
  const box: SceneNode = { type: 'rect', role: 'warning-box', ...(args.key ? { key: args.key } : {}), x: args.x, y: args.top, width: widthMm, height: heightMm, fill: { colour: WARN } };
  return { nodes: [box, text], widthMm, heightMm };
}

/** Width (mm) statusWords() takes for a text at a size, box included. */
export function statusWordsWidthMm(text: string, sizePt: number, warn: boolean): number {
  return measureTextMm({ text, sizePt, weight: warn ? 'bold' : 'regular' }) + (warn ? 2 * WARNING_BOX_PAD_MM : 0);
}

/** Height (mm) statusWords() takes at a size. */
export function statusWordsHeightMm(sizePt: number, warn: boolean): number {
  const { ascentMm: asc, descentMm: desc } = fontExtentMm({ sizePt, weight: warn ? 'bold' : 'regular' });
  return asc + desc + (warn ? 2 * WARNING_BOX_PAD_MM : 0);
}

function polygon(points: readonly [number, number][]): PathSegment[] {
  return [...points.map(([x, y], i) => ({ op: i === 0 ? 'M' : 'L', x, y }) as PathSegment), { op: 'Z' }];
}

/**
 * The shape of a WOT point by status, about sizeMm across, centred on (cx, cy): in the window a filled
 * ink disc; above the window (usable, runs high) an open ring; lugging a left-pointing triangle and
 * over-revving a right-pointing one (the way the rpm would have to move), both filled with the warning
 * colour; no operating point a warning-filled square.
 */
export function statusShape(args: { status: MatchStatus; cx: number; cy: number; sizeMm: number; role?: string; key?: string }): SceneNode {
  const { cx, cy } = args;
  const r = args.sizeMm / 2;
  const tags = { ...(args.role ? { role: args.role } : {}), ...(args.key ? { key: args.key } : {}) };
  const outline = stroke(INK, STROKE.rule);
  switch (args.status) {
    case 'matched':
      return { type: 'circle', cx, cy, r, fill: { colour: INK }, stroke: outline, ...tags };
    case 'aboveWindow':
      return { type: 'circle', cx, cy, r: r - STROKE.series / 2, fill: { colour: PAPER_WHITE }, stroke: stroke(INK, STROKE.series), ...tags };
    case 'belowWindow':
      return { type: 'path', segments: polygon([[cx - r * 1.1, cy], [cx + r * 0.9, cy - r], [cx + r * 0.9, cy + r]]), fill: { colour: WARN }, stroke: outline, ...tags };
    case 'revLimited':
      return { type: 'path', segments: polygon([[cx + r * 1.1, cy], [cx - r * 0.9, cy - r], [cx - r * 0.9, cy + r]]), fill: { colour: WARN }, stroke: outline, ...tags };
    case 'noCrossing':
      return { type: 'rect', x: cx - r * 0.85, y: cy - r * 0.85, width: r * 1.7, height: r * 1.7, fill: { colour: WARN }, stroke: outline, ...tags };
  }
}

/** The box (mm) a status shape covers, outline included. */
export function statusShapeBox(cx: number, cy: number, sizeMm: number): Box {
  const r = (sizeMm / 2) * 1.1 + STROKE.rule / 2;
  return { x: cx - r, y: cy - r, width: 2 * r, height: 2 * r };
}

/** Spacing (mm) of the hatch strokes on the forbidden side of a limit line. */
const HATCH_STEP_MM = 1.6;

/**
 * A limit (maximum rpm): a solid ink line from y0 to y1 at x, and diagonal hatch strokes filling the side
 * past the limit (toward +x) for `depthMm`. Solid plus hatch is a pattern no series uses.
 */
export function limitLine(args: { x: number; y0: number; y1: number; depthMm: number; widthMm?: number; role: string; key?: string }): SceneNode[] {
  const { x, y0, y1, depthMm } = args;
  const tags = { role: args.role, ...(args.key ? { key: args.key } : {}) };
  const h = y1 - y0;
  const hatch: PathSegment[] = [];
  // Strokes at 45°, clipped to the rectangle [x, x + depth] × [y0, y1] by hand (the scene has no clip paths here).
  for (let c = HATCH_STEP_MM; c < depthMm + h; c += HATCH_STEP_MM) {
    // The line u + v = c in box coordinates (u from x rightwards, v from y1 upwards).
    const u0 = Math.max(0, c - h);
    const u1 = Math.min(depthMm, c);
    if (u1 - u0 < 0.2) continue;
    hatch.push({ op: 'M', x: x + u0, y: y1 - (c - u0) }, { op: 'L', x: x + u1, y: y1 - (c - u1) });
  }
  const nodes: SceneNode[] = [];
  if (hatch.length > 0) nodes.push({ type: 'path', role: `${args.role}-hatch`, ...(args.key ? { key: args.key } : {}), segments: hatch, stroke: stroke(INK_SOFT, STROKE.grid) });
  nodes.push({ type: 'path', ...tags, segments: [{ op: 'M', x, y: y0 }, { op: 'L', x, y: y1 }], stroke: stroke(INK, args.widthMm ?? STROKE.series) });
  return nodes;
}
