/**
 * Sea-trial calibration. Every trial first gives the impeller's effective rating at the family exponent
 * (trialRating.ts). Then, in log space, with x = ln(n / (ratio·n_ref)) and the engine made γ times its
 * published curve A(n):  ln(A·η / ρr) = k·x + ln(R / γ).  Ratings R and γ are confounded in that
 * equation, so the data can support one of:
 *   exponentAndRatings   — one impeller at two or more clearly different rpm (different air, water or
 *                          ratio): common k, one free rating per impeller, engine as published (γ = 1);
 *   exponentAndCondition — two or more impellers, ratings taken as nominal: k and one engine factor γ;
 *   conditionOnly        — k kept at the family value, γ alone (one impeller, too narrow a spread, or an
 *                          exponent fit that is implausible or too uncertain). On a known-point engine
 *                          this anchors the constant-torque line at the measured point(s).
 */
import { ModelInputError } from './errors.ts';
import type { Installation } from './installation.ts';
import { solveInstallation } from './installation.ts';
import { fitLogLinear, type LogFit, type LogPoint } from './logFit.ts';
import { trialEffectiveRating, type TrialInput, type TrialRating } from './trialRating.ts';
import type { ImpellerSpec } from './types.ts';

export type CalibrationMode = 'none' | 'conditionOnly' | 'exponentAndCondition' | 'exponentAndRatings';

export interface TrialResidual {
  readonly date: string;
  readonly impellerId: string;
  readonly measuredRpm: number;
  readonly predictedRpm: number;
  /** predicted − measured, rpm. */
  readonly residualRpm: number;
  /** False for trials left out of the fit (at the limiter or off the engine table). */
  readonly usedInFit: boolean;
}

export interface Calibration {
  readonly mode: CalibrationMode;
  readonly exponent: number;
  readonly exponentSe: number | null;
  /** Engine power multiplier on top of the spec's condition factor. */
  readonly powerFactor: number;
  readonly powerFactorSe: number | null;
  /** Fitted rating / nominal, per impeller id (exponentAndRatings only; untried impellers stay nominal). */
  readonly ratingFactors: Readonly<Record<string, number>>;
  /** Each trial's effective rating at the family exponent and the published engine. */
  readonly trialRatings: readonly TrialRating[];
  readonly residuals: readonly TrialResidual[];
  /** True when the engine is a known point: the fit anchors its constant-torque line. */
  readonly anchoredConstantTorque: boolean;
  /** Plain sentences: what was assumed, what was left out, what could not be told apart and why. */
  readonly notes: readonly string[];
}

/** Fits narrower than this in rpm (max/min) cannot separate the exponent from a power factor. */
export const MIN_RPM_SPAN = 1.03;
/** Largest standard error of a fitted exponent we still use for predictions. */
export const MAX_EXPONENT_SE = 0.3;
/** Range an absorption exponent must lie in to be believed (as in the family data). */
const EXPONENT_RANGE = [2, 4] as const;
/**
 * Engine power factors and impeller rating factors a sea trial may plausibly show (common practice, no
 * source: a healthy engine within its ± tolerance and a sound impeller within its manufacturing tolerance,
 * with generous room for wear and reading errors). Outside these the trials say something is wrong (a
 * tachometer reading, a slipping drive, a damaged impeller, an engine fault, a data error), so the model is
 * not bent to fit them.
 */
export const PLAUSIBLE_FACTOR_RANGE = [0.6, 1.25] as const;

/** Calibrated installation: fitted exponent and engine factor, and the impeller's fitted rating when it was tried. */
export function calibratedInstallation(inst: Installation, cal: Calibration, impeller: ImpellerSpec = inst.impeller): Installation {
  const ratingFactor = cal.ratingFactors[impeller.id] ?? 1;
  return {
    ...inst,
    engine: { ...inst.engine, conditionFactor: inst.engine.conditionFactor * cal.powerFactor },
    family: { ...inst.family, exponent: cal.exponent },
    impeller: ratingFactor === 1 ? impeller : { ...impeller, ratingKw: impeller.ratingKw * ratingFactor },
  };
}

/** Calibrate exponent, engine factor or ratings from WOT sea trials; inst gives engine, family, drive line. */
export function calibrate(args: { inst: Installation; impellers: readonly ImpellerSpec[]; trials: readonly TrialInput[] }): Calibration {
  const { inst } = args;
  const byId = new Map(args.impellers.map((i) => [i.id, i]));
  const impellerOf = (t: TrialInput): ImpellerSpec => {
    const found = byId.get(t.impellerId);
    if (!found) throw new ModelInputError(`sea trial ${t.date}: impeller "${t.impellerId}" is not in the jet's impeller list; use one of ${[...byId.keys()].join(', ')}`);
    return found;
  };
  const trialRatings = args.trials.map((trial) =>
    trialEffectiveRating({ engine: inst.engine, family: inst.family, impeller: impellerOf(trial), driveLine: inst.driveLine, trial }),
  );
  const usable = args.trials
    .map((trial, i) => ({ trial, impeller: impellerOf(trial), rating: trialRatings[i] }))
    .filter((row) => row.rating.status === 'measured');
  const anchoredConstantTorque = inst.engine.curve.kind === 'knownPoint';
  const fitted = withinPlausibleFactors(chooseFit({ inst, usable, leftOut: args.trials.length - usable.length }), inst.family.exponent);
  const partial = { ...fitted, trialRatings, anchoredConstantTorque, residuals: [] as TrialResidual[] };
  const residuals = args.trials.map((t, i) => {
    const at = calibratedInstallation({ ...inst, ambient: t.ambient, waterDensityKgM3: t.waterDensityKgM3 }, partial, impellerOf(t));
    const predictedRpm = solveInstallation(at).speedRpm;
    const usedInFit = fitted.mode !== 'none' && trialRatings[i].status === 'measured';
    return { date: t.date, impellerId: t.impellerId, measuredRpm: t.wotRpm, predictedRpm, residualRpm: predictedRpm - t.wotRpm, usedInFit };
  });
  const notes = anchoredConstantTorque
    ? [...fitted.notes, 'The engine is a known point, so its constant-torque line is anchored at the measured WOT point(s).']
    : fitted.notes;
  return { ...partial, residuals, notes };
}

type FitPart = Pick<Calibration, 'mode' | 'exponent' | 'exponentSe' | 'powerFactor' | 'powerFactorSe' | 'ratingFactors' | 'notes'>;

/** One trial that measured a real crossing, with its impeller and its closed-form rating. */
interface Row {
  readonly trial: TrialInput;
  readonly impeller: ImpellerSpec;
  readonly rating: TrialRating;
}

function chooseFit(args: { inst: Installation; usable: readonly Row[]; leftOut: number }): FitPart {
  const { inst, usable } = args;
  const k0 = inst.family.exponent;
  const leftNote = args.leftOut > 0 ? [`${args.leftOut} trial(s) at the rev limiter or off the engine table were left out of the fit.`] : [];
  if (usable.length === 0) {
    return { mode: 'none', exponent: k0, exponentSe: null, powerFactor: 1, powerFactorSe: null, ratingFactors: {}, notes: [...leftNote, 'No usable sea trial: the model is as published.'] };
  }
  const ratio = inst.driveLine.ratio;
  // y = ln(A·η/ρr) (− ln R_nominal when ratings are taken as nominal), x = ln of impeller speed over reference.
  const point = (row: Row, group: string, nominal: boolean): LogPoint => {
    const t = row.trial;
    const densityRatio = t.waterDensityKgM3 / inst.family.referenceDensityKgM3;
    const y = Math.log((row.rating.availableKw * inst.driveLine.efficiency) / densityRatio) - (nominal ? Math.log(row.impeller.ratingKw) : 0);
    return { group, x: Math.log(t.wotRpm / ratio / inst.family.referenceSpeedRpm), y };
  };
  const reasons: string[] = [];
  const ids = new Set(usable.map((r) => r.impeller.id));
  const nominalKw = new Map(usable.map((r) => [r.impeller.id, r.impeller.ratingKw]));
  // Free ratings need one impeller seen at clearly different rpm.
  const spreadIds = [...ids].filter((id) => span(usable.filter((r) => r.impeller.id === id)) >= MIN_RPM_SPAN);
  if (spreadIds.length > 0 && usable.length - ids.size - 1 >= 1) {
    const fit = fitLogLinear(usable.map((r) => point(r, r.impeller.id, false)));
    if (plausible(fit, reasons, 'with free ratings')) {
      const ratingFactors = Object.fromEntries([...fit.intercepts].map(([id, b]) => [id, Math.exp(b.value) / nominalKw.get(id)!]));
      const notes = [...leftNote, 'The engine is taken as published; untried impellers keep their nominal ratings.'];
      return { mode: 'exponentAndRatings', exponent: fit.slope, exponentSe: fit.slopeSe, powerFactor: 1, powerFactorSe: null, ratingFactors, notes };
    }
  }
  if (ids.size >= 2 && span(usable) >= MIN_RPM_SPAN && usable.length >= 3) {
    const fit = fitLogLinear(usable.map((r) => point(r, '', true)));
    if (plausible(fit, reasons, 'with nominal ratings')) {
      const notes = [...leftNote, 'Impeller ratings are taken as nominal.'];
      return { mode: 'exponentAndCondition', exponent: fit.slope, exponentSe: fit.slopeSe, ...factorOf(fit), ratingFactors: {}, notes };
    }
  } else {
    reasons.push(whyNoExponent(usable, ids.size));
  }
  const fit = fitLogLinear(usable.map((r) => point(r, '', true)), { slope: k0 });
  const notes = [...leftNote, ...reasons];
  return { mode: 'conditionOnly', exponent: k0, exponentSe: null, ...factorOf(fit), ratingFactors: {}, notes };
}

/** A fit whose engine or rating factors lie outside PLAUSIBLE_FACTOR_RANGE is refused, with a note saying why. */
function withinPlausibleFactors(fit: FitPart, familyExponent: number): FitPart {
  const [lo, hi] = PLAUSIBLE_FACTOR_RANGE;
  const outside = (f: number) => !(f >= lo && f <= hi);
  const pct = (f: number) => `${Math.round(f * 100)} %`;
  const problems: string[] = [];
  if (outside(fit.powerFactor)) problems.push(`the engine would make ${pct(fit.powerFactor)} of its published power`);
  for (const [id, f] of Object.entries(fit.ratingFactors)) if (outside(f)) problems.push(`impeller ${id} would absorb ${pct(f)} of its rating`);
  if (problems.length === 0) return fit;
  return {
    mode: 'none',
    exponent: familyExponent,
    exponentSe: null,
    powerFactor: 1,
    powerFactorSe: null,
    ratingFactors: {},
    notes: [
      ...fit.notes,
      `The sea trials were not used: to fit them ${problems.join(' and ')}, outside the plausible ${pct(lo)}–${pct(hi)}. ` +
        'Check the tachometer, the trial records and the data, and have the engine, drive and impeller inspected by a qualified marine technician; the model stays as published.',
    ],
  };
}

/** γ = e^(−b); its standard error by the delta method, γ·SE(b). */
function factorOf(fit: LogFit): { powerFactor: number; powerFactorSe: number | null } {
  const b = fit.intercepts.get('')!;
  const powerFactor = Math.exp(-b.value);
  return { powerFactor, powerFactorSe: b.se === null ? null : powerFactor * b.se };
}

function span(rows: readonly Row[]): number {
  const rpms = rows.map((r) => r.trial.wotRpm);
  return rpms.length === 0 ? 1 : Math.max(...rpms) / Math.min(...rpms);
}

function whyNoExponent(usable: readonly Row[], impellerCount: number): string {
  if (impellerCount < 2) return 'Only one impeller was tried, so the exponent and the engine’s condition cannot be told apart: the exponent stays at the family value.';
  if (usable.length < 3) return 'Two trials fit an exponent exactly with no way to judge it: a third trial (another impeller, or a repeat) is needed.';
  return `The trials span less than ${Math.round((MIN_RPM_SPAN - 1) * 100)} % in rpm, too narrow to tell the exponent from the engine’s condition.`;
}

function plausible(fit: LogFit, reasons: string[], how: string): boolean {
  const [lo, hi] = EXPONENT_RANGE;
  if (!(fit.slope >= lo && fit.slope <= hi)) {
    reasons.push(`An exponent fitted ${how} came out at ${fit.slope.toFixed(2)}, outside ${lo}–${hi}: not used.`);
    return false;
  }
  if (fit.slopeSe === null || fit.slopeSe > MAX_EXPONENT_SE) {
    reasons.push(`An exponent fitted ${how} is too uncertain (standard error ${fit.slopeSe?.toFixed(2) ?? 'unknown'}): the trials cannot tell it from the engine’s condition.`);
    return false;
  }
  return true;
}
