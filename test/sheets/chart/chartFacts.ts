/**
 * What a boat chart shows, read back from a scene: each match chart's plot frame, its operating-point
 * markers, leaders and label boxes, and the label rules (docs/sheets.md) checked on them with geometry
 * written here, apart from the placer's own.
 */
import { scenePages, type Box, type Scene, type SceneNode, type TextNode } from '../../../src/scene/types.ts';
import { textBox } from '../../../src/scene/text.ts';
import { markBox } from '../sceneWalk.ts';

export interface ChartFacts {
  readonly plot: Box;
  readonly marks: { key: string; x: number; y: number; box: Box }[];
  readonly leaders: { key: string; x0: number; y0: number; x1: number; y1: number }[];
  readonly labels: { key: string; text: string; box: Box }[];
}

function leavesOf(n: SceneNode): SceneNode[] {
  return n.type === 'group' ? n.children.flatMap(leavesOf) : [n];
}

function groups(n: SceneNode, role: string): SceneNode[] {
  if (n.type !== 'group') return [];
  return n.role === role ? [n] : n.children.flatMap((c) => groups(c, role));
}

/** Every match chart of every page of a scene. */
export function chartFacts(scene: Scene): ChartFacts[] {
  return scenePages(scene).map((p) => p.root).flatMap((root) => groups(root, 'match-chart')).map((chart) => {
    const all = leavesOf(chart);
    const frame = all.find((n) => n.role === 'plot-frame');
    if (frame?.type !== 'rect') throw new Error('match chart without a plot frame');
    const marks = all.filter((n) => n.role === 'operating-point').map((n) => {
      const box = markBox(n)!;
      return { key: n.key ?? '', x: box.x + box.width / 2, y: box.y + box.height / 2, box };
    });
    const leaders = all.flatMap((n) => (n.type === 'path' && n.role === 'leader' && n.segments[0].op === 'M' && n.segments[1].op === 'L' ? [{ key: n.key ?? '', x0: n.segments[0].x, y0: n.segments[0].y, x1: n.segments[1].x, y1: n.segments[1].y }] : []));
    const labels = all.filter((n): n is TextNode => n.type === 'text' && (n.role === 'direct-label' || n.role === 'callout-number')).map((n) => ({ key: n.key ?? '', text: n.text, box: textBox(n) }));
    return { plot: { x: frame.x, y: frame.y, width: frame.width, height: frame.height }, marks, leaders, labels };
  });
}

/** Share of the plot's area the box around the WOT markers' centres covers (0–1). */
export function plotFill(f: ChartFacts): { area: number; rpm: number; power: number } {
  if (f.marks.length === 0) return { area: 0, rpm: 0, power: 0 };
  const xs = f.marks.map((m) => m.x);
  const ys = f.marks.map((m) => m.y);
  const rpm = (Math.max(...xs) - Math.min(...xs)) / f.plot.width;
  const power = (Math.max(...ys) - Math.min(...ys)) / f.plot.height;
  return { area: rpm * power, rpm, power };
}

const dist = (x: number, y: number, b: Box) => Math.hypot(Math.max(b.x - x, 0, x - b.x - b.width), Math.max(b.y - y, 0, y - b.y - b.height));

/** Does the segment pass through the box's interior? Sampled every 0.02 mm (independent of the placer's clipping). */
function segmentThrough(l: { x0: number; y0: number; x1: number; y1: number }, b: Box): boolean {
  const n = Math.max(2, Math.ceil(Math.hypot(l.x1 - l.x0, l.y1 - l.y0) / 0.02));
  for (let i = 0; i <= n; i++) {
    const x = l.x0 + ((l.x1 - l.x0) * i) / n;
    const y = l.y0 + ((l.y1 - l.y0) * i) / n;
    if (x > b.x + 1e-6 && x < b.x + b.width - 1e-6 && y > b.y + 1e-6 && y < b.y + b.height - 1e-6) return true;
  }
  return false;
}

function crosses(a: ChartFacts['leaders'][number], b: ChartFacts['leaders'][number]): boolean {
  const side = (px: number, py: number, qx: number, qy: number, rx: number, ry: number) => Math.sign((qx - px) * (ry - py) - (qy - py) * (rx - px));
  return side(b.x0, b.y0, b.x1, b.y1, a.x0, a.y0) * side(b.x0, b.y0, b.x1, b.y1, a.x1, a.y1) < 0 && side(a.x0, a.y0, a.x1, a.y1, b.x0, b.y0) * side(a.x0, a.y0, a.x1, a.y1, b.x1, b.y1) < 0;
}

/**
 * Breaches of the three label rules: leaders that cross, a leader through a marker not its own, a point
 * label nearer another marker than its own. A marker whose label is shared (points piled up at one spot
 * saying the same) counts as its neighbour's own when it lies within 2.4 mm of it.
 */
export function labelRuleBreaches(f: ChartFacts): { crossings: number; throughMarks: number; nearerOther: number; details: string[] } {
  const details: string[] = [];
  let crossings = 0;
  let throughMarks = 0;
  let nearerOther = 0;
  for (let i = 0; i < f.leaders.length; i++)
    for (let j = i + 1; j < f.leaders.length; j++)
      if (crosses(f.leaders[i], f.leaders[j])) {
        crossings++;
        details.push(`leaders of ${f.leaders[i].key} and ${f.leaders[j].key} cross`);
      }
  const ownMarks = (key: string) => {
    const own = f.marks.find((m) => m.key === key);
    return own ? f.marks.filter((m) => m === own || (!f.labels.some((l) => l.key === m.key) && Math.hypot(m.x - own.x, m.y - own.y) < 2.4)) : [];
  };
  for (const l of f.leaders) {
    const own = ownMarks(l.key);
    for (const m of f.marks) {
      if (own.includes(m)) continue;
      if (segmentThrough(l, m.box)) {
        throughMarks++;
        details.push(`leader of ${l.key} passes through the marker of ${m.key}`);
      }
    }
  }
  for (const label of f.labels) {
    const own = ownMarks(label.key);
    if (own.length === 0) continue;
    const near = Math.min(...own.map((m) => dist(m.x, m.y, label.box)));
    for (const m of f.marks) {
      if (own.includes(m)) continue;
      if (dist(m.x, m.y, label.box) <= near) {
        nearerOther++;
        details.push(`label "${label.text}" of ${label.key} is as near the marker of ${m.key} as its own`);
      }
    }
  }
  return { crossings, throughMarks, nearerOther, details };
}
