/**
 * Wear and damage from the trend of one impeller's effective rating (docs/model.md, "Trend of the
 * effective rating"). Each trial gives a rating in closed form (trialRating.ts) at the family exponent
 * and the published engine, in the trial's own air and water, so trials of other days compare on one
 * scale. The first BASELINE_TRIALS measured trials are the baseline: their mean m and sample standard
 * deviation s, with s no smaller than the reading floor (a tachometer read to ±0.5 % moves the rating by
 * about ±1.5 % at k = 3; air read to ±2 °C about ±0.4 %). A later trial lies outside when
 *   |R − m| > K · s · √(1 + 1/n)
 * (the spread of one new reading about a mean of n: a prediction interval), and the flag is raised when
 * the latest trial lies outside. BASELINE_TRIALS, K and the floor are our choice (common practice of a
 * three-sigma control chart, no source).
 */

/** Trials that make the baseline; the flag needs one more after them. */
export const BASELINE_TRIALS = 3;
/** Limits at K standard deviations of a new reading. */
export const DRIFT_K = 3;
/** The least standard deviation of one trial's effective rating, as a share of the baseline mean. */
export const READING_FLOOR = 0.02;

export interface TrendInput {
  readonly date: string;
  readonly wotRpm: number;
  /** Effective rating, kW at the family's reference speed and density. */
  readonly ratingKw: number;
}

export interface TrendPoint extends TrendInput {
  readonly role: 'baseline' | 'later';
  /** (rating / baseline mean − 1) · 100; absent without a baseline. */
  readonly driftPct?: number;
  /** A later trial outside the limits. */
  readonly outside: boolean;
}

export interface Baseline {
  readonly trials: number;
  readonly meanKw: number;
  /** Sample standard deviation of the baseline ratings. */
  readonly sdKw: number;
  /** The standard deviation the limits use: sdKw, or the reading floor when larger. */
  readonly usedSdKw: number;
  readonly lowKw: number;
  readonly highKw: number;
}

/** absorbsLess: the latest trial below the limits (rpm risen); absorbsMore: above them (rpm fallen). */
export type TrendVerdict = 'tooFew' | 'steady' | 'absorbsLess' | 'absorbsMore';

export interface RatingTrend {
  readonly points: readonly TrendPoint[];
  readonly baseline?: Baseline;
  readonly verdict: TrendVerdict;
}

/** The trend of one impeller's measured trials, in date order (ties keep their order). */
export function ratingTrend(trials: readonly TrendInput[]): RatingTrend {
  const ordered = [...trials].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  if (ordered.length < BASELINE_TRIALS) return { points: ordered.map((t) => ({ ...t, role: 'baseline', outside: false })), verdict: 'tooFew' };
  const first = ordered.slice(0, BASELINE_TRIALS).map((t) => t.ratingKw);
  const n = first.length;
  const meanKw = first.reduce((a, b) => a + b, 0) / n;
  const sdKw = Math.sqrt(first.reduce((a, r) => a + (r - meanKw) ** 2, 0) / (n - 1));
  const usedSdKw = Math.max(sdKw, READING_FLOOR * meanKw);
  const half = DRIFT_K * usedSdKw * Math.sqrt(1 + 1 / n);
  const baseline: Baseline = { trials: n, meanKw, sdKw, usedSdKw, lowKw: meanKw - half, highKw: meanKw + half };
  const points = ordered.map((t, i): TrendPoint => {
    const later = i >= n;
    return { ...t, role: later ? 'later' : 'baseline', driftPct: (t.ratingKw / meanKw - 1) * 100, outside: later && (t.ratingKw < baseline.lowKw || t.ratingKw > baseline.highKw) };
  });
  const last = points[points.length - 1];
  const verdict: TrendVerdict = points.length === n ? 'tooFew' : !last.outside ? 'steady' : last.ratingKw < meanKw ? 'absorbsLess' : 'absorbsMore';
  return { points, baseline, verdict };
}
