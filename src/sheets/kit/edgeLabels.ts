/**
 * Names set in one row along the edge of a plot, each over the point where its series leaves the plot.
 * Labels that would overlap are spread apart along the row with the least total squared shift (labels
 * are packed into clusters; a cluster sits at the mean of its members' wishes, clamped to the row), and a
 * short leader joins a shifted label to its anchor.
 */
import type { Colour, FontWeight, SceneNode } from '../../scene/types.ts';
import { measureTextMm } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm } from './block.ts';
import { INK, STROKE, stroke } from './style.ts';

export interface EdgeLabel {
  readonly key: string;
  /** Where the series meets the edge, mm across the page. */
  readonly anchorX: number;
  readonly text: string;
  readonly colour?: Colour;
}

/** Leaders are drawn only for labels shifted further than this from their anchor (mm). */
const LEADER_FROM_MM = 0.6;

/**
 * Left edges (mm) for items of given widths, in anchor order, at least gapMm apart inside [fromMm, toMm],
 * each centre as near its anchor as the others allow (least squares over every cluster of touching items).
 */
export function spreadAlong(items: readonly { anchorX: number; widthMm: number }[], opts: { fromMm: number; toMm: number; gapMm: number }): number[] {
  const order = items.map((_, i) => i).sort((a, b) => items[a].anchorX - items[b].anchorX);
  // A cluster: consecutive items packed edge to edge; `wish` is the best left edge for all of them.
  type Cluster = { members: number[]; width: number; wish: number; left: number };
  const clamp = (c: Cluster) => Math.min(Math.max(c.wish, opts.fromMm), opts.toMm - c.width);
  const clusters: Cluster[] = [];
  for (const i of order) {
    const item = items[i];
    let c: Cluster = { members: [i], width: item.widthMm, wish: item.anchorX - item.widthMm / 2, left: 0 };
    c.left = clamp(c);
    // Merge backwards while this cluster would overlap the one before it.
    while (clusters.length > 0) {
      const prev = clusters[clusters.length - 1];
      if (prev.left + prev.width + opts.gapMm <= c.left) break;
      clusters.pop();
      const offset = prev.width + opts.gapMm;
      // Mean of the members' wishes: prev wants prev.wish, c wants c.wish − offset, weighted by count.
      const n = prev.members.length + c.members.length;
      const wish = (prev.wish * prev.members.length + (c.wish - offset) * c.members.length) / n;
      c = { members: [...prev.members, ...c.members], width: prev.width + opts.gapMm + c.width, wish, left: 0 };
      c.left = clamp(c);
    }
    clusters.push(c);
  }
  const lefts = new Array<number>(items.length);
  for (const c of clusters) {
    if (c.width > opts.toMm - opts.fromMm + 1e-9) return [];
    let x = c.left;
    for (const i of c.members) {
      lefts[i] = x;
      x += items[i].widthMm + opts.gapMm;
    }
  }
  return lefts;
}

/**
 * A row of labels just above `edgeY` (their descent `gapMm` clear of it), spread inside [fromMm, toMm],
 * with leaders; null when they do not fit in one row (the caller places them some other way).
 */
export function edgeLabelRow(args: {
  labels: readonly EdgeLabel[];
  edgeY: number;
  fromMm: number;
  toMm: number;
  sizePt: number;
  weight?: FontWeight;
  /** Space between the label's descent and the edge (mm), where leaders run. */
  gapMm: number;
  role: string;
  where: string;
}): { nodes: SceneNode[]; heightMm: number } | null {
  const weight = args.weight ?? 'bold';
  const widths = args.labels.map((l) => measureTextMm({ text: l.text, sizePt: args.sizePt, weight }));
  const pad = measureTextMm({ text: 'n', sizePt: args.sizePt, weight }) * 0.6;
  const lefts = spreadAlong(
    args.labels.map((l, i) => ({ anchorX: l.anchorX, widthMm: widths[i] })),
    { fromMm: args.fromMm, toMm: args.toMm, gapMm: pad },
  );
  if (lefts.length !== args.labels.length) return null;
  const pitch = linePitchMm(args.sizePt, weight);
  const top = args.edgeY - args.gapMm - pitch;
  const baseline = top + ascentMm(args.sizePt, weight);
  const nodes: SceneNode[] = [];
  args.labels.forEach((l, i) => {
    const centre = lefts[i] + widths[i] / 2;
    if (Math.abs(centre - l.anchorX) > LEADER_FROM_MM) {
      nodes.push({ type: 'path', role: 'leader', key: l.key, segments: [{ op: 'M', x: l.anchorX, y: args.edgeY }, { op: 'L', x: centre, y: top + pitch }], stroke: stroke(l.colour ?? INK, STROKE.hairline) });
    }
    nodes.push(label({ x: lefts[i], y: baseline, text: l.text, sizePt: args.sizePt, weight, colour: INK, role: args.role, key: l.key, where: args.where }));
  });
  return { nodes, heightMm: pitch + args.gapMm };
}
