/**
 * Sea-trial calibration of one boat as plain records: each trial's effective impeller rating against the
 * nominal one and the family tolerance, what the trials could fit (exponent, engine factor, ratings), the
 * residual of each trial under the calibrated model, and the calibrated installation for predictions.
 */
import type { Boat } from '../data/types.ts';
import {
  calibrate,
  calibratedInstallation,
  type Calibration,
  type CalibrationMode,
  type Installation,
  type TrialInput,
} from '../model/index.ts';

export interface TrialRow {
  readonly date: string;
  readonly impellerId: string;
  readonly wotRpm: number;
  /** 'measured', 'atLimiter' (rating only an upper bound) or 'offCurve' (outside the engine table). */
  readonly status: string;
  readonly nominalRatingKw: number;
  /** Absent when the rpm is off the engine table. */
  readonly effectiveRatingKw?: number;
  readonly deviationPct?: number;
  readonly insideTolerance: 'yes' | 'no';
  readonly predictedRpm: number;
  /** Calibrated prediction minus measured, rpm. */
  readonly residualRpm: number;
  readonly usedInFit: 'yes' | 'no';
  readonly speedKn?: number;
  readonly loadKg?: number;
}

export interface CalibrationResult {
  readonly mode: CalibrationMode;
  readonly modeText: string;
  readonly exponent: number;
  readonly exponentSource: 'family' | 'fitted';
  readonly exponentSe?: number;
  /** Engine power multiplier found on top of the spec's condition factor. */
  readonly powerFactor: number;
  readonly powerFactorSe?: number;
  /** Fitted rating / nominal for impellers whose rating was fitted. */
  readonly ratingFactors: readonly { readonly impellerId: string; readonly factor: number }[];
  readonly trials: readonly TrialRow[];
  /** Dates of the trials the calibrated figures rest on. */
  readonly trialDates: readonly string[];
  readonly notes: readonly string[];
}

const MODE_TEXT: Readonly<Record<CalibrationMode, string>> = {
  none: 'Not calibrated: no usable sea trial.',
  conditionOnly: 'Calibrated: engine power factor fitted, family exponent kept.',
  exponentAndCondition: 'Calibrated: absorption exponent and engine power factor fitted, ratings nominal.',
  exponentAndRatings: 'Calibrated: absorption exponent and the tried impellers’ ratings fitted.',
};

/** The boat's sea trials in model form. */
export function boatTrials(boat: Boat): TrialInput[] {
  return boat.trials.map((t) => ({
    date: t.date,
    impellerId: t.impellerId,
    wotRpm: t.wotRpm,
    ambient: t.ambient,
    waterDensityKgM3: t.water.densityKgM3,
    ...(t.speedKn !== undefined ? { speedKn: t.speedKn } : {}),
    ...(t.loadKg !== undefined ? { loadKg: t.loadKg } : {}),
  }));
}

/** Calibration of the boat from its trials (mode 'none' when it has none). */
export function boatCalibration(boat: Boat, inst: Installation): Calibration {
  return calibrate({ inst, impellers: boat.jet.impellers, trials: boatTrials(boat) });
}

/** The boat's installation with the calibration applied, for the given (or fitted) impeller. */
export function calibratedBoatInstallation(inst: Installation, cal: Calibration, impeller = inst.impeller): Installation {
  return cal.mode === 'none' ? { ...inst, impeller } : calibratedInstallation(inst, cal, impeller);
}

const finite = (x: number | null | undefined): x is number => typeof x === 'number' && Number.isFinite(x);

/** Calibration as a plain record. */
export function calibrationResult(boat: Boat, cal: Calibration): CalibrationResult {
  const trials = cal.trialRatings.map((r, i): TrialRow => {
    const res = cal.residuals[i];
    const src = boat.trials[i];
    return {
      date: r.date,
      impellerId: r.impellerId,
      wotRpm: r.wotRpm,
      status: r.status,
      nominalRatingKw: r.nominalRatingKw,
      ...(finite(r.effectiveRatingKw) ? { effectiveRatingKw: r.effectiveRatingKw, deviationPct: r.deviationPct } : {}),
      insideTolerance: r.insideTolerance ? 'yes' : 'no',
      predictedRpm: res.predictedRpm,
      residualRpm: res.residualRpm,
      usedInFit: res.usedInFit ? 'yes' : 'no',
      ...(src?.speedKn !== undefined ? { speedKn: src.speedKn } : {}),
      ...(src?.loadKg !== undefined ? { loadKg: src.loadKg } : {}),
    };
  });
  return {
    mode: cal.mode,
    modeText: MODE_TEXT[cal.mode],
    exponent: cal.exponent,
    exponentSource: cal.mode === 'exponentAndCondition' || cal.mode === 'exponentAndRatings' ? 'fitted' : 'family',
    ...(finite(cal.exponentSe) ? { exponentSe: cal.exponentSe } : {}),
    powerFactor: cal.powerFactor,
    ...(finite(cal.powerFactorSe) ? { powerFactorSe: cal.powerFactorSe } : {}),
    ratingFactors: Object.entries(cal.ratingFactors)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([impellerId, factor]) => ({ impellerId, factor })),
    trials,
    trialDates: cal.residuals.filter((r) => r.usedInFit).map((r) => r.date),
    notes: cal.notes,
  };
}
