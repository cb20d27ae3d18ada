/**
 * Monotone piecewise-cubic Hermite interpolation after Steffen (1990), "A simple method for monotonic
 * interpolation in one dimension", Astron. Astrophys. 239, 443–450, including its own end conditions
 * (eqs. 26–27), not the parabolic ends some chart libraries use.
 *
 * Why Steffen: every piece is monotone between its two table points, so the curve passes exactly
 * through the table, never overshoots a table value and never invents a bump between rows. On each
 * interval the slopes satisfy |m| ≤ 2|secant| with the secant's sign (or 0), which lies inside the
 * Fritsch–Carlson monotonicity region (α, β ≤ 3).
 */

/** One cubic Hermite piece on [x0, x1] with end values y0, y1 and end slopes m0, m1 (dy/dx). */
export interface HermitePiece {
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
  readonly m0: number;
  readonly m1: number;
}

/** Steffen slopes (dy/dx) at each knot; xs strictly increasing, at least two knots. */
export function steffenSlopes(xs: readonly number[], ys: readonly number[]): number[] {
  const n = xs.length;
  const h: number[] = [];
  const s: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    h.push(xs[i + 1] - xs[i]);
    s.push((ys[i + 1] - ys[i]) / h[i]);
  }
  if (n === 2) return [s[0], s[0]];
  const m: number[] = new Array<number>(n);
  for (let i = 1; i < n - 1; i++) {
    // Slope of the parabola through three neighbours, limited so the piece stays monotone (eq. 11).
    const p = (s[i - 1] * h[i] + s[i] * h[i - 1]) / (h[i - 1] + h[i]);
    m[i] = (Math.sign(s[i - 1]) + Math.sign(s[i])) * Math.min(Math.abs(s[i - 1]), Math.abs(s[i]), 0.5 * Math.abs(p));
  }
  m[0] = endSlope(s[0], s[1], h[0], h[1]);
  m[n - 1] = endSlope(s[n - 2], s[n - 3], h[n - 2], h[n - 3]);
  return m;
}

/** Steffen's end condition: parabola slope at the end, zeroed on sign change, capped at twice the secant. */
function endSlope(sEnd: number, sNext: number, hEnd: number, hNext: number): number {
  const p = sEnd * (1 + hEnd / (hEnd + hNext)) - (sNext * hEnd) / (hEnd + hNext);
  if (p * sEnd <= 0) return 0;
  if (Math.abs(p) > 2 * Math.abs(sEnd)) return 2 * sEnd;
  return p;
}

/** Pieces of the monotone interpolant through (xs, ys). */
export function monotonePieces(xs: readonly number[], ys: readonly number[]): HermitePiece[] {
  const m = steffenSlopes(xs, ys);
  const pieces: HermitePiece[] = [];
  for (let i = 0; i < xs.length - 1; i++) {
    pieces.push(Object.freeze({ x0: xs[i], x1: xs[i + 1], y0: ys[i], y1: ys[i + 1], m0: m[i], m1: m[i + 1] }));
  }
  return pieces;
}

/** Value of the piece at x (x0 ≤ x ≤ x1); exact y0 at x0 and y1 at x1. */
export function hermiteValue(p: HermitePiece, x: number): number {
  if (x === p.x1) return p.y1;
  const h = p.x1 - p.x0;
  const t = (x - p.x0) / h;
  const d = p.y1 - p.y0;
  // y = y0 + t·(h·m0) + t²·(3d − 2h·m0 − h·m1) + t³·(h·m0 + h·m1 − 2d), nested.
  const a = h * p.m0;
  const b = h * p.m1;
  return p.y0 + t * (a + t * (3 * d - 2 * a - b + t * (a + b - 2 * d)));
}

/** Slope dy/dx of the piece at x. */
export function hermiteSlope(p: HermitePiece, x: number): number {
  const h = p.x1 - p.x0;
  const t = (x - p.x0) / h;
  const d = p.y1 - p.y0;
  const a = h * p.m0;
  const b = h * p.m1;
  return (a + t * (2 * (3 * d - 2 * a - b) + 3 * t * (a + b - 2 * d))) / h;
}

/** Largest slope dy/dx of the piece over [u, v] (a sub-interval of the piece). */
export function hermiteMaxSlope(p: HermitePiece, u: number, v: number): number {
  const h = p.x1 - p.x0;
  const d = p.y1 - p.y0;
  const a = h * p.m0;
  const b = h * p.m1;
  const c2 = 3 * d - 2 * a - b;
  const c3 = a + b - 2 * d;
  // dy/dt = a + 2·c2·t + 3·c3·t² is a parabola in t: its maximum is at an end or at its vertex.
  let best = Math.max(hermiteSlope(p, u), hermiteSlope(p, v));
  if (c3 < 0) {
    const tv = -c2 / (3 * c3);
    const tu = (u - p.x0) / h;
    const tw = (v - p.x0) / h;
    if (tv > tu && tv < tw) best = Math.max(best, (a + 2 * c2 * tv + 3 * c3 * tv * tv) / h);
  }
  return best;
}
