/** Box geometry for layout checks (mm). */
import type { Box } from '../../scene/types.ts';

/** True when two boxes share interior area (touching edges do not count). */
export function boxesOverlap(a: Box, b: Box, padMm = 0): boolean {
  return a.x < b.x + b.width + padMm && b.x < a.x + a.width + padMm && a.y < b.y + b.height + padMm && b.y < a.y + a.height + padMm;
}

/** True when `inner` lies within `outer` (with a tolerance for rounding). */
export function boxInside(inner: Box, outer: Box, tolMm = 1e-6): boolean {
  return inner.x >= outer.x - tolMm && inner.y >= outer.y - tolMm && inner.x + inner.width <= outer.x + outer.width + tolMm && inner.y + inner.height <= outer.y + outer.height + tolMm;
}

/** A point (mm). */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/** Distance (mm) from a point to the nearest point of a box (0 inside it). */
export function pointBoxDistanceMm(p: Point, b: Box): number {
  const dx = Math.max(b.x - p.x, 0, p.x - (b.x + b.width));
  const dy = Math.max(b.y - p.y, 0, p.y - (b.y + b.height));
  return Math.hypot(dx, dy);
}

/** True when the segment a–b passes through the interior of a box (Liang–Barsky clipping). */
export function segmentHitsBox(a: Point, b: Point, box: Box): boolean {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  let t0 = 0;
  let t1 = 1;
  const edges: [number, number][] = [
    [-dx, a.x - box.x],
    [dx, box.x + box.width - a.x],
    [-dy, a.y - box.y],
    [dy, box.y + box.height - a.y],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q <= 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 >= t1) return false;
  }
  return true;
}

/** True when two segments cross at a point inside both (touching at an end does not count). */
export function segmentsCross(a: Point, b: Point, c: Point, d: Point): boolean {
  const side = (p: Point, q: Point, r: Point) => (q.x - p.x) * (r.y - p.y) - (q.y - p.y) * (r.x - p.x);
  const d1 = side(c, d, a);
  const d2 = side(c, d, b);
  const d3 = side(a, b, c);
  const d4 = side(a, b, d);
  return d1 * d2 < 0 && d3 * d4 < 0;
}
