/**
 * Curves drawn exactly as the model states them.
 * - Engine curves are the model's cubic Hermite pieces. A Hermite piece on [x0, x1] with values y0, y1 and
 *   slopes m0, m1 is the cubic Bézier with control points (x0, y0), (x0 + h/3, y0 + h·m0/3),
 *   (x1 − h/3, y1 − h·m1/3), (x1, y1), h = x1 − x0; x is linear in the Bézier parameter, and linear scales
 *   map Béziers to Béziers, so the drawn path IS the model's curve (no sampling).
 * - Absorption curves P = c·nᵏ are drawn as chords, subdivided until no point of the curve is more than
 *   `toleranceMm` (0.1 mm) away vertically from its chord, which bounds the true distance too. For a convex
 *   power law the farthest point from the chord of [a, b] is where the slope equals the chord's slope:
 *   c·k·n^(k−1) = s ⇒ n* = (s / (c·k))^(1/(k−1)); scales are affine, so that holds in mm as well.
 */
import type { PathSegment } from '../../scene/types.ts';
import { pieceBetween, type HermitePiece } from '../../analysis/index.ts';
import { LayoutError } from './errors.ts';
import type { PlotScales } from './scales.ts';

/** Most chords one absorption curve may take; a drawable curve needs a few dozen at 0.1 mm. */
export const MAX_CURVE_CHORDS = 4096;

/** Path (mm) of an engine curve's Hermite pieces, exact, limited to [fromRpm, toRpm] and the x domain. */
export function hermitePath(
  pieces: readonly HermitePiece[],
  scales: PlotScales,
  range?: { fromRpm: number; toRpm: number },
): PathSegment[] {
  const lo = Math.max(scales.x.domain()[0], range?.fromRpm ?? -Infinity);
  const hi = Math.min(scales.x.domain()[1], range?.toRpm ?? Infinity);
  const segments: PathSegment[] = [];
  for (const piece of pieces) {
    const a = Math.max(piece.x0, lo);
    const b = Math.min(piece.x1, hi);
    if (!(b > a)) continue;
    const p = pieceBetween(piece, a, b);
    const h = p.x1 - p.x0;
    if (segments.length === 0) segments.push({ op: 'M', x: scales.x(p.x0), y: scales.y(p.y0) });
    segments.push({
      op: 'C',
      x1: scales.x(p.x0 + h / 3),
      y1: scales.y(p.y0 + (h * p.m0) / 3),
      x2: scales.x(p.x1 - h / 3),
      y2: scales.y(p.y1 - (h * p.m1) / 3),
      x: scales.x(p.x1),
      y: scales.y(p.y1),
    });
  }
  return segments;
}

/** P = coefficient · rpm^exponent (kW), the form of every absorption curve on the engine side. */
export interface PowerLaw {
  readonly coefficient: number;
  readonly exponent: number;
}

/** Power (kW) of a power law at an engine speed. */
export function powerLawKw(law: PowerLaw, speedRpm: number): number {
  return law.coefficient * speedRpm ** law.exponent;
}

/** Speed (rpm) at which a power law reaches a power. */
export function powerLawRpm(law: PowerLaw, powerKw: number): number {
  return (powerKw / law.coefficient) ** (1 / law.exponent);
}

/** The rpm interval where the law is inside the plot (x domain, and below the top of the y domain). */
export function powerLawVisibleRpm(law: PowerLaw, scales: PlotScales): { fromRpm: number; toRpm: number } | null {
  const [xLo, xHi] = scales.x.domain();
  const [yLo, yHi] = scales.y.domain();
  const fromRpm = Math.max(xLo, yLo > 0 ? powerLawRpm(law, yLo) : xLo);
  const toRpm = Math.min(xHi, powerLawRpm(law, yHi));
  return toRpm > fromRpm ? { fromRpm, toRpm } : null;
}

/** Points (mm) of a power law from fromRpm to toRpm, chords within toleranceMm of the curve. */
export function powerLawPoints(
  law: PowerLaw,
  scales: PlotScales,
  opts: { fromRpm: number; toRpm: number; toleranceMm?: number },
): { x: number; y: number }[] {
  const tol = opts.toleranceMm ?? 0.1;
  const mmPerKw = Math.abs(scales.y(1) - scales.y(0));
  const point = (n: number): { x: number; y: number } => ({ x: scales.x(n), y: scales.y(powerLawKw(law, n)) });
  const out = [point(opts.fromRpm)];
  // Explicit stack instead of recursion: [a, b] intervals still to draw, leftmost on top.
  const stack: [number, number][] = [[opts.fromRpm, opts.toRpm]];
  // Bounded whatever the numbers: a NaN or infinite value stops at once, and at most MAX_CURVE_CHORDS chords.
  let steps = 0;
  while (stack.length > 0) {
    const [a, b] = stack.pop()!;
    const fa = powerLawKw(law, a);
    const fb = powerLawKw(law, b);
    if (!Number.isFinite(a) || !Number.isFinite(b) || !Number.isFinite(fa) || !Number.isFinite(fb) || !Number.isFinite(mmPerKw)) {
      throw new LayoutError('absorption curve', `cannot be drawn: a power of ${fa} kW at ${a} rpm or ${fb} kW at ${b} rpm is not a finite number; check the impeller ratings and drive-line figures`);
    }
    if ((steps += 1) > 2 * MAX_CURVE_CHORDS) {
      throw new LayoutError('absorption curve', `cannot be drawn within ${MAX_CURVE_CHORDS} chords between ${opts.fromRpm} and ${opts.toRpm} rpm; check the impeller ratings and drive-line figures`);
    }
    const slope = (fb - fa) / (b - a);
    const nStar = (slope / (law.coefficient * law.exponent)) ** (1 / (law.exponent - 1));
    const deviationMm = Math.abs(powerLawKw(law, nStar) - (fa + slope * (nStar - a))) * mmPerKw;
    // A NaN deviation (slope or n* not finite) can never shrink by splitting: draw the chord.
    if (!(deviationMm > tol) || b - a < 1e-6) {
      out.push(point(b));
    } else {
      const mid = Math.min(Math.max(nStar, a + (b - a) * 0.1), b - (b - a) * 0.1);
      stack.push([mid, b], [a, mid]);
    }
  }
  return out;
}

/** Open path through points. */
export function polylinePath(points: readonly { x: number; y: number }[]): PathSegment[] {
  return points.map((p, i) => ({ op: i === 0 ? 'M' : 'L', x: p.x, y: p.y }) as PathSegment);
}
