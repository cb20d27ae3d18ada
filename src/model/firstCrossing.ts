/**
 * The lowest speed at which surplus s(n) = available(n) − c·n^k turns negative, where available is a
 * chain of monotone cubic Hermite pieces. Works on any table shape: flat spots, power falling past its
 * peak, several crossings.
 *
 * Per piece [u, v], because the cubic is monotone and c·n^k rises:
 *   - lower bound  s ≥ min(y(u), y(v)) − c·v^k; if that is > 0 the piece holds no crossing (cheap skip);
 *   - if max y'(n) over [u, v] < k·c·u^(k−1) ≤ d(c·n^k)/dn, s falls strictly, so a sign change there is
 *     the only root and safeguarded Newton (bisection whenever Newton leaves the bracket) refines it;
 *   - otherwise split in half and search the left half first, so the first crossing wins.
 */
import { hermiteMaxSlope, hermiteValue, type HermitePiece } from './monotoneCubic.ts';

/** Bisection depth cap: 2^-60 of a piece is far below any meaningful rpm. */
const MAX_DEPTH = 60;

function absorbed(c: number, k: number, n: number): number {
  return k === 3 ? c * n * n * n : c * Math.pow(n, k);
}

/** Lowest rpm in [lo, hi] where surplus turns negative, or -1 if it never does; caller ensures surplus(lo) ≥ 0. */
export function firstCrossingRpm(pieces: readonly HermitePiece[], c: number, k: number, lo: number, hi: number): number {
  let i = 0;
  while (i < pieces.length - 1 && pieces[i].x1 <= lo) i++;
  let a = lo;
  let ya = hermiteValue(pieces[i], lo);
  let sa = ya - absorbed(c, k, lo);
  for (; i < pieces.length && a < hi; i++) {
    const p = pieces[i];
    const b = p.x1 < hi ? p.x1 : hi;
    const yb = b === p.x1 ? p.y1 : hermiteValue(p, b);
    const absB = absorbed(c, k, b);
    const sb = yb - absB;
    if ((ya < yb ? ya : yb) - absB <= 0) {
      const r = searchPiece(p, c, k, a, ya, sa, b, yb, sb, 0);
      if (r >= 0) return r;
    }
    a = b;
    ya = yb;
    sa = sb;
  }
  return -1;
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

/** Root of a strictly falling surplus on [u, v], s(u) ≥ 0 > s(v): Newton kept inside a shrinking bracket. */
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
    if (sx === 0) return x;
    if (sx > 0) a = x;
    else b = x;
    const slope = (A + t * (2 * B + 3 * C * t)) / h - (k * ab) / x;
    let next = x - sx / slope;
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (Math.abs(next - x) <= 1e-13 * x || b - a <= 1e-13 * b) return next;
    x = next;
  }
  return x;
}
