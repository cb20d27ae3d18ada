/**
 * Direct labels placed without collisions. Every label is measured with the font; candidate positions
 * are tried around its anchor point, nearest ring first (8 directions per ring). The first box that stays
 * inside the bounds and clears every placed label and obstacle wins; rings further out get a leader line.
 * When no ring fits, the label becomes a numbered callout (a small number placed the same way, else at the
 * nearest free spot anywhere in the bounds, with a leader) and its text goes into a note the sheet prints;
 * when even the number finds no room anywhere, LayoutError.
 *
 * Given the chart's marks (operating points), every spot must also keep three rules: no leader crosses
 * another, no leader passes through a mark other than the label's own, and a label that names marks is
 * nearer one of its own marks than any other mark. Only when no spot anywhere keeps them (a mark on top of
 * another's) does a callout number take the nearest free spot without them.
 */
import type { Box, Colour, FontWeight, SceneNode } from '../../scene/types.ts';
import { fontExtentMm, measureTextMm } from '../../scene/text.ts';
import { label } from './block.ts';
import { boxesOverlap, boxInside, pointBoxDistanceMm, segmentHitsBox, segmentsCross, type Point } from './boxes.ts';
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
  /** Keys of the marks this label names (an operating point's label names its marker). */
  readonly marks?: readonly string[];
}

/** A mark on the chart (a marker), which labels keep the rules of the file comment against. */
export interface LabelMark {
  readonly key: string;
  readonly x: number;
  readonly y: number;
  readonly box: Box;
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

/** A spot's box passes the placement rules (true when there are none). */
type SpotRule = (box: Box) => boolean;

function findSpot(args: { x: number; y: number; w: number; h: number; prefer: readonly (readonly [number, number])[]; bounds: Box; occupied: readonly Box[]; ok: SpotRule }): { box: Box; ring: number } | null {
  const dirs = [...args.prefer, ...DIRECTIONS.filter((d) => !args.prefer.some((p) => p[0] === d[0] && p[1] === d[1]))];
  for (let ring = 0; ring < RINGS_MM.length; ring += 1) {
    for (const dir of dirs) {
      const box = candidateBox(args.x, args.y, dir, RINGS_MM[ring], args.w, args.h);
      if (!boxInside(box, args.bounds)) continue;
      if (args.occupied.some((o) => boxesOverlap(box, o, PAD_MM))) continue;
      if (!args.ok(box)) continue;
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
function farSpot(args: { x: number; y: number; w: number; h: number; bounds: Box; occupied: readonly Box[]; ok: SpotRule }): { box: Box; ring: number } | null {
  const { bounds, w, h } = args;
  let best: { box: Box; ring: number; d: number } | null = null;
  for (let y = bounds.y; y + h <= bounds.y + bounds.height; y += FAR_STEP_MM) {
    for (let x = bounds.x; x + w <= bounds.x + bounds.width; x += FAR_STEP_MM) {
      const box = { x, y, width: w, height: h };
      const d = Math.hypot(x + w / 2 - args.x, y + h / 2 - args.y);
      if (best && d >= best.d) continue;
      if (args.occupied.some((o) => boxesOverlap(box, o, PAD_MM))) continue;
      if (!args.ok(box)) continue;
      best = { box, ring: RINGS_MM.length, d };
    }
  }
  return best && { box: best.box, ring: best.ring };
}

/** The leader a label at this box gets (anchor to the nearest point of the box), or null when it sits close enough. */
function leaderTo(anchor: Point, box: Box): { from: Point; to: Point } | null {
  const to = { x: Math.min(Math.max(anchor.x, box.x), box.x + box.width), y: Math.min(Math.max(anchor.y, box.y), box.y + box.height) };
  return Math.hypot(to.x - anchor.x, to.y - anchor.y) > LEADER_FROM_MM ? { from: anchor, to } : null;
}

/** The rules of the file comment for one label, against the marks and the leaders drawn so far. */
function markRules(req: LabelRequest, marks: readonly LabelMark[], leaders: readonly { from: Point; to: Point }[]): SpotRule {
  if (marks.length === 0) return () => true;
  const own = marks.filter((m) => req.marks?.includes(m.key));
  const others = marks.filter((m) => !req.marks?.includes(m.key));
  return (box) => {
    const leader = leaderTo(req, box);
    if (leader) {
      if (others.some((m) => segmentHitsBox(leader.from, leader.to, m.box))) return false;
      if (leaders.some((l) => segmentsCross(leader.from, leader.to, l.from, l.to))) return false;
    }
    if (own.length === 0) return true;
    const near = Math.min(...own.map((m) => pointBoxDistanceMm(m, box)));
    return others.every((m) => pointBoxDistanceMm(m, box) > near);
  };
}

/** Places labels in order (earlier = higher priority); see the file comment for the rules. */
export function placeLabels(
  requests: readonly LabelRequest[],
  opts: {
    bounds: Box;
    obstacles: readonly Box[];
    where: string;
    /** Callout numbers continue after this many (a chart placing labels in two areas). */
    numbersBefore?: number;
    /** Marks the placement rules hold against (none: only bounds and collisions count). */
    marks?: readonly LabelMark[];
  },
): PlacedLabels {
  const occupied: Box[] = [...opts.obstacles];
  const nodes: SceneNode[] = [];
  const notes: { number: number; key: string; text: string }[] = [];
  const leaders: { from: Point; to: Point }[] = [];
  const marks = opts.marks ?? [];
  const emit = (req: LabelRequest, text: string, spot: { box: Box; ring: number }, weight: FontWeight, role: string): void => {
    const { ascentMm } = fontExtentMm({ sizePt: req.sizePt, weight });
    const { box } = spot;
    // Leader from the anchor to the nearest point of the box, so a label set apart still points home.
    const leader = leaderTo(req, box);
    if (leader) {
      leaders.push(leader);
      nodes.push({ type: 'path', role: 'leader', key: req.key, segments: [{ op: 'M', x: req.x, y: req.y }, { op: 'L', x: leader.to.x, y: leader.to.y }], stroke: stroke(req.colour ?? INK, STROKE.hairline) });
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
    const ok = markRules(req, marks, leaders);
    const spot = findSpot({ x: req.x, y: req.y, w, h, prefer, bounds: opts.bounds, occupied, ok });
    if (spot) {
      emit(req, req.text, spot, weight, 'direct-label');
      continue;
    }
    const number = (opts.numbersBefore ?? 0) + notes.length + 1;
    const numText = String(number);
    const nw = measureTextMm({ text: numText, sizePt: req.sizePt, weight: 'bold' });
    const num = { x: req.x, y: req.y, w: nw, h, bounds: opts.bounds, occupied };
    const numSpot = findSpot({ ...num, prefer, ok }) ?? farSpot({ ...num, ok }) ?? farSpot({ ...num, ok: () => true });
    if (!numSpot) {
      throw new LayoutError(opts.where, `no room for the label "${req.text}" or a callout number near (${req.x.toFixed(1)}, ${req.y.toFixed(1)}) mm; use larger paper or fewer series`);
    }
    emit(req, numText, numSpot, 'bold', 'callout-number');
    notes.push({ number, key: req.key, text: req.text });
  }
  return { nodes, notes, occupied };
}
