/**
 * Least squares for y = k·x + b_g: one common slope k and one intercept per group g (a fixed-effects
 * line fit). With x = ln(impeller speed / reference) and y = ln(power terms) the slope is the absorption
 * exponent; the intercepts are log ratings or log engine factors (see calibration.ts).
 * Closed form: k = Σ(x − x̄_g)(y − ȳ_g) / Σ(x − x̄_g)², b_g = ȳ_g − k·x̄_g; the residual variance
 * s² = Σr² / (n − G − 1) gives SE(k) = s / sqrt(Sxx) and SE(b_g) = s·sqrt(1/n_g + x̄_g² / Sxx).
 * With the slope fixed, b_g = mean(y − k·x) and SE(b_g) = s / sqrt(n_g) with n − G degrees of freedom.
 */
import { ModelInputError } from './errors.ts';

export interface LogPoint {
  readonly group: string;
  readonly x: number;
  readonly y: number;
}

export interface LogFit {
  readonly slope: number;
  /** null when the slope was fixed or there are no degrees of freedom left. */
  readonly slopeSe: number | null;
  /** Per group: intercept and its standard error (null without degrees of freedom). */
  readonly intercepts: ReadonlyMap<string, { readonly value: number; readonly se: number | null }>;
  /** y − fit, in the order of the points. */
  readonly residuals: readonly number[];
  readonly dof: number;
  /** Σ(x − x̄_g)²: how much the data spread along x inside the groups (0 = slope not estimable). */
  readonly sxx: number;
}

interface GroupSums {
  n: number;
  sx: number;
  sy: number;
}

function groupMeans(points: readonly LogPoint[]): Map<string, { n: number; mx: number; my: number }> {
  const sums = new Map<string, GroupSums>();
  for (const p of points) {
    const s = sums.get(p.group) ?? { n: 0, sx: 0, sy: 0 };
    sums.set(p.group, { n: s.n + 1, sx: s.sx + p.x, sy: s.sy + p.y });
  }
  return new Map([...sums].map(([g, s]) => [g, { n: s.n, mx: s.sx / s.n, my: s.sy / s.n }]));
}

/** Common-slope, per-group-intercept least squares; slope fixed when opts.slope is given. */
export function fitLogLinear(points: readonly LogPoint[], opts: { slope?: number } = {}): LogFit {
  if (points.length === 0) throw new ModelInputError('fitLogLinear: no points to fit');
  const means = groupMeans(points);
  let sxx = 0;
  let sxy = 0;
  for (const p of points) {
    const m = means.get(p.group)!;
    sxx += (p.x - m.mx) ** 2;
    sxy += (p.x - m.mx) * (p.y - m.my);
  }
  const fixed = opts.slope !== undefined;
  if (!fixed && !(sxx > 0)) throw new ModelInputError('fitLogLinear: every group sits at one x, so no slope can be fitted');
  const slope = fixed ? opts.slope! : sxy / sxx;
  const residuals = points.map((p) => {
    const m = means.get(p.group)!;
    return p.y - m.my - slope * (p.x - m.mx);
  });
  const dof = points.length - means.size - (fixed ? 0 : 1);
  const s = dof > 0 ? Math.sqrt(residuals.reduce((a, r) => a + r * r, 0) / dof) : null;
  const intercepts = new Map(
    [...means].map(([g, m]) => {
      const se = s === null ? null : fixed ? s / Math.sqrt(m.n) : s * Math.sqrt(1 / m.n + (m.mx * m.mx) / sxx);
      return [g, { value: m.my - slope * m.mx, se }] as const;
    }),
  );
  return { slope, slopeSe: fixed || s === null ? null : s / Math.sqrt(sxx), intercepts, residuals, dof, sxx };
}
