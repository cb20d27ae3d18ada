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
