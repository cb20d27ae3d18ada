/**
 * What one sea trial says about the fitted impeller. At a measured WOT speed n the engine makes A(n)
 * (its full-throttle curve at the trial's air) and the impeller takes all of it:
 *   R · ((n / ratio) / n_ref)^k · (ρ / ρ_ref) / η = A(n)
 * Absorption is linear in the rating R, so the impeller's effective rating has a closed form:
 *   R_eff = A(n) · η / ((ρ / ρ_ref) · ((n / ratio) / n_ref)^k).
 * A trial at the rev limiter says only that the engine was not loaded: R_eff is then an upper bound.
 */
import { engineCurve } from './engineCurve.ts';
import type { Ambient, DriveLineSpec, EngineSpec, ImpellerFamilySpec, ImpellerSpec } from './types.ts';

/** One WOT sea-trial record as the model needs it (the data layer's SeaTrial, unit-normalised). */
export interface TrialInput {
  /** ISO date, YYYY-MM-DD: names the trial in results. */
  readonly date: string;
  readonly impellerId: string;
  readonly wotRpm: number;
  readonly ambient: Ambient;
  readonly waterDensityKgM3: number;
  /** Measured boat speed at WOT, knots, when logged. */
  readonly speedKn?: number;
  /** Load aboard beyond the hull's displacement, kg. */
  readonly loadKg?: number;
}

/** measured: a real crossing; atLimiter: rpm at the rev limit (rating is an upper bound); offCurve: rpm outside the engine table. */
export type TrialRatingStatus = 'measured' | 'atLimiter' | 'offCurve';

export interface TrialRating {
  readonly date: string;
  readonly impellerId: string;
  readonly wotRpm: number;
  readonly status: TrialRatingStatus;
  /** Engine full-throttle power at the measured rpm and the trial's air, kW (0 when offCurve). */
  readonly availableKw: number;
  readonly nominalRatingKw: number;
  /** Closed-form effective rating, kW at the family's reference speed and density (NaN when offCurve). */
  readonly effectiveRatingKw: number;
  /** (effective / nominal − 1) · 100. */
  readonly deviationPct: number;
  /** |deviation| within the family's ± tolerance. */
  readonly insideTolerance: boolean;
}

/** A measured rpm this close to the maximum (relative) counts as at the limiter: tachometers read ±0.5 %. */
const LIMITER_BAND = 0.005;

/** Effective rating (kW) of the impeller one trial used, from the engine curve at the trial's air. */
export function trialEffectiveRating(args: {
  engine: EngineSpec;
  family: ImpellerFamilySpec;
  impeller: ImpellerSpec;
  driveLine: DriveLineSpec;
  trial: TrialInput;
  /** Absorption exponent to use (default the family's). */
  exponent?: number;
  /** Engine power multiplier on top of the spec (a fitted condition factor; default 1). */
  powerFactor?: number;
}): TrialRating {
  const { engine, family, impeller, driveLine, trial } = args;
  const k = args.exponent ?? family.exponent;
  const curve = engineCurve(engine, { ambient: trial.ambient, powerFactor: args.powerFactor });
  const value = curve.powerAt(trial.wotRpm);
  const base = { date: trial.date, impellerId: impeller.id, wotRpm: trial.wotRpm, nominalRatingKw: impeller.ratingKw };
  if (value.status !== 'ok') {
    return { ...base, status: 'offCurve', availableKw: 0, effectiveRatingKw: NaN, deviationPct: NaN, insideTolerance: false };
  }
  const effectiveRatingKw = ratingFromPower({
    family,
    driveLine,
    exponent: k,
    powerKw: value.powerKw,
    speedRpm: trial.wotRpm,
    waterDensityKgM3: trial.waterDensityKgM3,
  });
  const deviationPct = (effectiveRatingKw / impeller.ratingKw - 1) * 100;
  const atLimiter = trial.wotRpm >= engine.limits.maxRpm * (1 - LIMITER_BAND);
  return {
    ...base,
    status: atLimiter ? 'atLimiter' : 'measured',
    availableKw: value.powerKw,
    effectiveRatingKw,
    deviationPct,
    insideTolerance: Math.abs(deviationPct) <= family.tolerancePct,
  };
}

/** Rating (kW at n_ref, ρ_ref) of an impeller that takes powerKw at engine speedRpm: the absorption law solved for R. */
export function ratingFromPower(args: {
  family: ImpellerFamilySpec;
  driveLine: DriveLineSpec;
  exponent: number;
  powerKw: number;
  speedRpm: number;
  waterDensityKgM3: number;
}): number {
  const { family, driveLine } = args;
  const densityRatio = args.waterDensityKgM3 / family.referenceDensityKgM3;
  const speedRatio = args.speedRpm / driveLine.ratio / family.referenceSpeedRpm;
  return (args.powerKw * driveLine.efficiency) / (densityRatio * Math.pow(speedRatio, args.exponent));
}
