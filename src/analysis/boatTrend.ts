/**
 * The trend of each tried impeller's effective rating over the boat's sea trials (model/ratingTrend.ts)
 * and the wear flag of the fitted impeller, in plain words: what the drift means and what to inspect.
 */
import type { Boat } from '../data/types.ts';
import { BASELINE_TRIALS, DRIFT_K, ratingTrend, READING_FLOOR, type Calibration, type TrendVerdict } from '../model/index.ts';

export interface TrendPointResult {
  readonly date: string;
  readonly wotRpm: number;
  readonly effectiveRatingKw: number;
  readonly role: 'baseline' | 'later';
  readonly driftPct?: number;
  readonly outside: 'yes' | 'no';
}

export interface ImpellerTrend {
  readonly impellerId: string;
  readonly points: readonly TrendPointResult[];
  /** Mean, standard deviations and limits of the first trials; absent with fewer than BASELINE_TRIALS. */
  readonly baseline?: { readonly trials: number; readonly meanKw: number; readonly sdKw: number; readonly usedSdKw: number; readonly lowKw: number; readonly highKw: number };
  readonly verdict: TrendVerdict;
}

export interface WearFlag {
  readonly impellerId: string;
  readonly direction: 'absorbsLess' | 'absorbsMore';
  readonly date: string;
  readonly wotRpm: number;
  readonly driftPct: number;
  /** What the drift means, in one or two sentences. */
  readonly meaning: string;
  /** What to do. */
  readonly action: string;
}

export interface TrendResult {
  /** The rule, in words (its numbers from the model's constants). */
  readonly rule: string;
  readonly impellers: readonly ImpellerTrend[];
  /** Raised when the fitted impeller's latest trial lies outside its baseline's limits. */
  readonly flag?: WearFlag;
}

export const WEAR_ACTION = 'Have the impeller, the intake and the wear ring inspected, and the engine checked, by a qualified marine technician.';

const MEANING: Readonly<Record<WearFlag['direction'], string>> = {
  absorbsLess: 'Full-throttle rpm has risen: the impeller absorbs less than in its first trials (worn blade edges, damage or cavitation; a blocked intake changes it too).',
  absorbsMore: 'Full-throttle rpm has fallen: usually the engine delivers less than in the first trials, or the boat is heavier (or the impeller is fouled).',
};

export const TREND_RULE = `Each trial's effective rating (the published engine, the family exponent, the trial's air and water) is compared with the mean of the impeller's first ${BASELINE_TRIALS} trials; a later trial is outside when it lies more than ${DRIFT_K} standard deviations of a new reading from that mean (the first trials' own scatter, at least ${Math.round(READING_FLOOR * 100)} % of the rating for reading errors). The flag is raised when the fitted impeller's latest trial is outside. Our rule, no source.`;

/** The trends of the boat's trials (measured ones only: at the limiter or off the engine table says nothing of wear). */
export function boatTrend(boat: Boat, cal: Calibration): TrendResult {
  const ids = [...new Set(cal.trialRatings.map((r) => r.impellerId))].sort();
  const impellers = ids.map((impellerId): ImpellerTrend => {
    const measured = cal.trialRatings.filter((r) => r.impellerId === impellerId && r.status === 'measured' && Number.isFinite(r.effectiveRatingKw));
    const t = ratingTrend(measured.map((r) => ({ date: r.date, wotRpm: r.wotRpm, ratingKw: r.effectiveRatingKw })));
    return {
      impellerId,
      points: t.points.map((p) => ({ date: p.date, wotRpm: p.wotRpm, effectiveRatingKw: p.ratingKw, role: p.role, ...(p.driftPct !== undefined ? { driftPct: p.driftPct } : {}), outside: p.outside ? 'yes' : 'no' })),
      ...(t.baseline ? { baseline: { ...t.baseline } } : {}),
      verdict: t.verdict,
    };
  });
  const fitted = impellers.find((i) => i.impellerId === boat.impellerId);
  const last = fitted?.points[fitted.points.length - 1];
  const flag: WearFlag | undefined =
    fitted && last && (fitted.verdict === 'absorbsLess' || fitted.verdict === 'absorbsMore')
      ? { impellerId: fitted.impellerId, direction: fitted.verdict, date: last.date, wotRpm: last.wotRpm, driftPct: last.driftPct ?? 0, meaning: MEANING[fitted.verdict], action: WEAR_ACTION }
      : undefined;
  return { rule: TREND_RULE, impellers, ...(flag ? { flag } : {}) };
}
