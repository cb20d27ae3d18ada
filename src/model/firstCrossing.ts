/**
 * The lowest speed at which surplus s(n) = available(n) − c·n^k turns negative, where available is a
 * chain of monotone cubic Hermite pieces. Works on any table shape: flat spots, power falling past its
 * peak, several crossings.
 *
 * Per piece [u, v], because the cubic is monotone and c·n^k rises:
 *   - lower bound  s ≥ min(y(u), y(v)) − c·v^k; if that is > 0 the piece holds no crossing (cheap skip,
 *     done in logs with the curve's precomputed screen so no power function is evaluated);
 *   - if max y'(n) over [u, v] < k·c·u^(k−1) ≤ d(c·n^k)/dn, s falls strictly, so a sign change there is
 *     the only root and safeguarded Halley iteration (bisection whenever a step leaves the bracket) refines it;
 *   - otherwise split in half and search the left half first, so the first crossing wins.
 */
import type { Absorber } from './absorption.ts';
import type { EngineCurve } from './engineCurve.ts';
import { ModelInputError } from './errors.ts';
import { hermiteMaxSlope, hermiteValue, type HermitePiece } from './monotoneCubic.ts';

/** Bisection depth cap: 2^-60 of a piece is far below any meaningful rpm. */
const MAX_DEPTH = 60;

function absorbed(c: number, k: number, n: number): number {
  return k === 3 ? c * n * n * n : c * Math.pow(n, k);
}

/** Margin on the log screen so rounding can never skip a piece that holds a crossing. */
const SCREEN_MARGIN = 1e-9;

/** Lowest rpm in [lo, hi] where surplus turns negative, or -1 if it never does; caller ensures surplus(lo) ≥ 0. */
export function firstCrossingRpm(curve: EngineCurve, absorber: Absorber, lo: number, hi: number): number {
  const { pieces, screen } = curve;
  const c = absorber.coefficient;
  const k = absorber.exponent;
  // NaN guard: every loop below is bounded (pieces, MAX_DEPTH, 100 steps), but a NaN would only come out as a NaN speed.
  if (!(c > 0 && Number.isFinite(c) && k > 0 && Number.isFinite(k) && Number.isFinite(lo) && Number.isFinite(hi))) {
    throw new ModelInputError(`the operating point cannot be solved: absorption coefficient ${c}, exponent ${k}, speed range ${lo}–${hi} rpm must be finite positive numbers; check the impeller ratings, the drive line and the engine's speeds`);
  }
  const lnC = absorber.lnCoefficient + SCREEN_MARGIN;
  const lnFloorKw = screen.lnFloorKw;
  const lnEndRpm = screen.lnEndRpm;
  for (let i = k === 3 ? firstScreenFailureCube(screen.runningMinCube, lnC) : 0; i < pieces.length; i++) {
    // Every earlier piece kept surplus ≥ 0, so only pieces that fail the screen need a closer look.
    if (lnFloorKw[i] - k * lnEndRpm[i] > lnC) continue;
    const p = pieces[i];
    if (p.x1 <= lo) continue;
    if (p.x0 >= hi) break;
    const a = p.x0 > lo ? p.x0 : lo;
    const b = p.x1 < hi ? p.x1 : hi;
    const ya = a === p.x0 ? p.y0 : hermiteValue(p, a);
    const yb = b === p.x1 ? p.y1 : hermiteValue(p, b);
    const absA = absorbed(c, k, a);
    const sb = yb - absorbed(c, k, b);
    // Usual case: the whole piece is less steep than the impeller curve at its start, so surplus falls
    // throughout and one sign check decides (same test as in searchPiece, slope precomputed).
    if (a === p.x0 && b === p.x1 && screen.maxSlopeKwPerRpm[i] < (k * absA) / a) {
      if (sb < 0) return refine(p, c, k, a, ya - absA, b, sb);
      continue;
    }
    const r = searchPiece(p, c, k, a, ya, ya - absA, b, yb, sb, 0);
    if (r >= 0) return r;
  }
  return -1;
}

/** First index whose running minimum is ≤ lnC (all earlier pieces pass the screen); length if none. */
function firstScreenFailureCube(runningMin: Float64Array, lnC: number): number {
  let lo = 0;
  let hi = runningMin.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (runningMin[mid] > lnC) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function searchPiece(
  p: HermitePiece,
  c: number,
  k: number,
  u: number,
  yu: number,
  su: number,
  v: number,
  yv: number,
  sv: number,
  depth: number,
): number {
  const absV = yv - sv;
  if ((yu < yv ? yu : yv) - absV > 0) return -1;
  const absU = yu - su;
  const falling = p.m0 <= 0 && p.m1 <= 0 && p.y1 <= p.y0 ? true : hermiteMaxSlope(p, u, v) < (k * absU) / u;
  if (falling) return sv < 0 ? refine(p, c, k, u, su, v, sv) : -1;
  if (depth >= MAX_DEPTH || v - u <= 1e-12 * v) return sv < 0 ? v : -1;
  const m = 0.5 * (u + v);
  const ym = hermiteValue(p, m);
  const sm = ym - absorbed(c, k, m);
  const left = searchPiece(p, c, k, u, yu, su, m, ym, sm, depth + 1);
  if (left >= 0) return left;
  return searchPiece(p, c, k, m, ym, sm, v, yv, sv, depth + 1);
}

/** Root of a strictly falling surplus on [u, v], s(u) ≥ 0 > s(v): Halley steps kept inside a shrinking bracket. */
function refine(p: HermitePiece, c: number, k: number, u: number, su: number, v: number, sv: number): number {
  if (su === 0) return u;
  // Cubic in t = (x − x0)/h: y = y0 + t·(A + t·(B + t·C)), dy/dx = (A + t·(2B + 3C·t)) / h.
  const h = p.x1 - p.x0;
  const d = p.y1 - p.y0;
  const A = h * p.m0;
  const B = 3 * d - 2 * A - h * p.m1;
  const C = A + h * p.m1 - 2 * d;
  let a = u;
  let b = v;
  // Start from the secant (regula falsi) point: already close when the piece is nearly straight.
  let x = u + ((v - u) * su) / (su - sv);
  for (let iter = 0; iter < 100; iter++) {
    const t = (x - p.x0) / h;
    const ab = absorbed(c, k, x);
    const sx = p.y0 + t * (A + t * (B + t * C)) - ab;
    if (!Number.isFinite(sx)) {
      throw new ModelInputError(`the operating point cannot be solved: the power surplus at ${x} rpm is ${sx} kW, not a finite number; check the engine curve and the impeller ratings`);
    }
    // Balanced to 1e-12 of the power: done.
    if (Math.abs(sx) <= 1e-12 * ab) return x;
    if (sx > 0) a = x;
    else b = x;
    // Halley's step (cubic convergence) from s, s' and s''; the bracket guards it like Newton's.
    const slope = (A + t * (2 * B + 3 * C * t)) / h - (k * ab) / x;
    const curvature = (2 * B + 6 * C * t) / (h * h) - (k * (k - 1) * ab) / (x * x);
    let next = x - (2 * sx * slope) / (2 * slope * slope - sx * curvature);
    // Halley's error after a step of relative size δ is of order δ³ (times the curves' bend), so a step
    // of 1e-7 leaves far less than the 1e-9 balance we promise: stop without another evaluation.
    if (next >= a && next <= b && Math.abs(next - x) <= 1e-7 * x) return next;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (b - a <= 1e-13 * b) return next;
    x = next;
  }
  return x;
}
