/**
 * The shaded tolerance band of one impeller: the area between its −tol and +tol absorption curves
 * inside the plot. Both edges are the 0.1 mm chords of curves.ts; where an edge leaves the plot through
 * the top or the right, the outline follows the plot corner so the area stays closed and inside.
 */
import type { PathSegment } from '../../scene/types.ts';
import { powerLawPoints, powerLawVisibleRpm, type PowerLaw } from '../kit/curves.ts';
import type { PlotScales } from '../kit/scales.ts';

const EPS_MM = 1e-6;

/** Closed outline (mm) of the area between two power laws (lower absorbs less), or null when unseen. */
export function bandArea(lower: PowerLaw, upper: PowerLaw, scales: PlotScales): PathSegment[] | null {
  const lowRange = powerLawVisibleRpm(lower, scales);
  const upRange = powerLawVisibleRpm(upper, scales);
  if (!lowRange || !upRange) return null;
  const low = powerLawPoints(lower, scales, lowRange);
  const up = powerLawPoints(upper, scales, upRange).reverse();
  const { area } = scales;
  const right = area.x + area.width;
  const top = area.y;
  const left = area.x;
  const bottom = area.y + area.height;
  const outline = [...low];
  const lowEnd = low[low.length - 1];
  const upEnd = up[0];
  // Lower edge leaves through the right side while the upper leaves through the top: turn the corner.
  if (Math.abs(lowEnd.x - right) < EPS_MM && Math.abs(upEnd.y - top) < EPS_MM && lowEnd.y - top > EPS_MM) outline.push({ x: right, y: top });
  outline.push(...up);
  const upStart = up[up.length - 1];
  const lowStart = low[0];
  // Upper edge enters through the left side while the lower enters through the bottom: the other corner.
  if (Math.abs(upStart.x - left) < EPS_MM && Math.abs(lowStart.y - bottom) < EPS_MM && bottom - upStart.y > EPS_MM) outline.push({ x: left, y: bottom });
  return [...outline.map((p, i) => ({ op: i === 0 ? 'M' : 'L', x: p.x, y: p.y }) as PathSegment), { op: 'Z' }];
}
