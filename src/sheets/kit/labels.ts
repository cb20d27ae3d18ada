/**
 * Direct labels placed without collisions. Every label is measured with the font; candidate positions
 * are tried around its anchor point, nearest ring first (8 directions per ring). The first box that stays
 * inside the bounds and clears every placed label and obstacle wins; rings further out get a leader line.
 * When no ring fits, the label becomes a numbered callout (a small number placed the same way, else at the
 * nearest free spot anywhere in the bounds, with a leader) and its text goes into a note the sheet prints;
 * when even the number finds no room anywhere, LayoutError.
 */
import type { Box, Colour, FontWeight, SceneNode } from '../../scene/types.ts';
import { fontExtentMm, measureTextMm } from '../../scene/text.ts';
import { label } from './block.ts';
import { boxesOverlap, boxInside } from './boxes.ts';
import { LayoutError } from './errors.ts';
import { INK, PAPER_WHITE, STROKE, stroke } from './style.ts';

export interface LabelRequest {
  readonly key: string;
  readonly x: number;
  readonly y: number;
  readonly text: string;
  readonly sizePt: number;
  readonly weight?: FontWeight;
  readonly colour?: Colour;
  /** Directions to try first, e.g. [[1, -1]] = up-right. */
  readonly prefer?: readonly (readonly [number, number])[];
}

export interface PlacedLabels {
  readonly nodes: readonly SceneNode[];
  /** Callouts that replaced labels: number and the text to print in a note. */
  readonly notes: readonly { readonly number: number; readonly key: string; readonly text: string }[];
  /** Every box now occupied (placed labels plus the obstacles given). */
  readonly occupied: readonly Box[];
}

const RINGS_MM = [1.2, 2.6, 4.5, 7, 10.5, 15, 21];
/** Labels whose box is further than this from their anchor get a leader line. */
const LEADER_FROM_MM = 2.4;
const DIRECTIONS: readonly (readonly [number, number])[] = [
  [1, -1], [1, 1], [-1, -1], [-1, 1], [1, 0], [-1, 0], [0, -1], [0, 1],
];
const PAD_MM = 0.4;

function candidateBox(x: number, y: number, dir: readonly [number, number], d: number, w: number, h: number): Box {
  const bx = dir[0] > 0 ? x + d : dir[0] < 0 ? x - d - w : x - w / 2;
  const by = dir[1] < 0 ? y - d - h : dir[1] > 0 ? y + d : y - h / 2;
  return { x: bx, y: by, width: w, height: h };
}

function findSpot(args: { x: number; y: number; w: number; h: number; prefer: readonly (readonly [number, number])[]; bounds: Box; occupied: readonly Box[] }): { box: Box; ring: number } | null {
  const dirs = [...args.prefer, ...DIRECTIONS.filter((d) => !args.prefer.some((p) => p[0] === d[0] && p[1] === d[1]))];
  for (let ring = 0; ring < RINGS_MM.length; ring += 1) {
    for (const dir of dirs) {
      const box = candidateBox(args.x, args.y, dir, RINGS_MM[ring], args.w, args.h);
      if (!boxInside(box, args.bounds)) continue;
      if (args.occupied.some((o) => boxesOverlap(box, o, PAD_MM))) continue;
      return { box, ring };
    }
  }
  return null;
}

/** Grid step (mm) of the last search for a callout number's spot anywhere in the bounds. */
const FAR_STEP_MM = 1.5;

/**
 * The free spot nearest the anchor anywhere in the bounds (a leader line points home), for a callout
 * number the rings could not place: a crowded corner of a chart still leaves room elsewhere.
 */
function farSpot(args: { x: number; y: number; w: number; h: number; bounds: Box; occupied: readonly Box[] }): { box: Box; ring: number } | null {
  const { bounds, w, h } = args;
  let best: { box: Box; ring: number; d: number } | null = null;
  for (let y = bounds.y; y + h <= bounds.y + bounds.height; y += FAR_STEP_MM) {
    for (let x = bounds.x; x + w <= bounds.x + bounds.width; x += FAR_STEP_MM) {
      const box = { x, y, width: w, height: h };
      const d = Math.hypot(x + w / 2 - args.x, y + h / 2 - args.y);
      if (best && d >= best.d) continue;
      if (args.occupied.some((o) => boxesOverlap(box, o, PAD_MM))) continue;
      best = { box, ring: RINGS_MM.length, d };
    }
  }
  return best && { box: best.box, ring: best.ring };
}

/** Places labels in order (earlier = higher priority); see the file comment for the rules. */
export function placeLabels(requests: readonly LabelRequest[], opts: { bounds: Box; obstacles: readonly Box[]; where: string; /** Callout numbers continue after this many (a chart placing labels in two areas). */ numbersBefore?: number }): PlacedLabels {
  const occupied: Box[] = [...opts.obstacles];
  const nodes: SceneNode[] = [];
  const notes: { number: number; key: string; text: string }[] = [];
  const emit = (req: LabelRequest, text: string, spot: { box: Box; ring: number }, weight: FontWeight, role: string): void => {
    const { ascentMm } = fontExtentMm({ sizePt: req.sizePt, weight });
    const { box } = spot;
    // Leader from the anchor to the nearest point of the box, so a label set apart still points home.
    const lx = Math.min(Math.max(req.x, box.x), box.x + box.width);
    const ly = Math.min(Math.max(req.y, box.y), box.y + box.height);
    if (Math.hypot(lx - req.x, ly - req.y) > LEADER_FROM_MM) {
      nodes.push({ type: 'path', role: 'leader', key: req.key, segments: [{ op: 'M', x: req.x, y: req.y }, { op: 'L', x: lx, y: ly }], stroke: stroke(req.colour ?? INK, STROKE.hairline) });
    }
    // A white backing keeps the text readable where it sits over grid or curves.
    nodes.push({ type: 'rect', role: 'label-backing', key: req.key, x: box.x, y: box.y, width: box.width, height: box.height, fill: { colour: PAPER_WHITE, opacity: 0.85 } });
    nodes.push(label({ x: box.x, y: box.y + ascentMm, text, sizePt: req.sizePt, weight, colour: INK, role, key: req.key, where: opts.where }));
    occupied.push(box);
  };
  for (const req of requests) {
    const weight = req.weight ?? 'regular';
    const { ascentMm, descentMm } = fontExtentMm({ sizePt: req.sizePt, weight });
    const h = ascentMm + descentMm;
    const prefer = req.prefer ?? [];
    const w = measureTextMm({ text: req.text, sizePt: req.sizePt, weight });
    const spot = findSpot({ x: req.x, y: req.y, w, h, prefer, bounds: opts.bounds, occupied });
    if (spot) {
      emit(req, req.text, spot, weight, 'direct-label');
      continue;
    }
    const number = (opts.numbersBefore ?? 0) + notes.length + 1;
    const numText = String(number);
    const nw = measureTextMm({ text: numText, sizePt: req.sizePt, weight: 'bold' });
    const numSpot = findSpot({ x: req.x, y: req.y, w: nw, h, prefer, bounds: opts.bounds, occupied }) ?? farSpot({ x: req.x, y: req.y, w: nw, h, bounds: opts.bounds, occupied });
    if (!numSpot) {
      throw new LayoutError(opts.where, `no room for the label "${req.text}" or a callout number near (${req.x.toFixed(1)}, ${req.y.toFixed(1)}) mm; use larger paper or fewer series`);
    }
    emit(req, numText, numSpot, 'bold', 'callout-number');
    notes.push({ number, key: req.key, text: req.text });
  }
  return { nodes, notes, occupied };
}
