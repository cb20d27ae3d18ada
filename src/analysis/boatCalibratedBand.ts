/**
 * WOT band of an impeller on the sea-trial-calibrated model. The data-sheet tolerances no longer say how
 * sure a calibrated prediction is, so the band covers instead:
 *   - the fit's uncertainty: engine power factor and fitted exponent each at ± 2 standard errors;
 *   - for an impeller no usable trial ran, its own rating ± the family tolerance (the trials measured
 *     other impellers: this one's manufacturing spread is still unknown);
 *   - the trials' scatter about the model: the largest residual of a trial used in the fit, and never less
 *     than READING_SCATTER_PCT of the rpm (tachometer reading and day-to-day repeatability), added in rpm.
 * Every corner is solved by the model; the operating speed is monotone in rating, power and (on either side
 * of the reference speed) in the exponent, so the slowest and fastest corners bound the box.
 */
import type { EngineLimits, ImpellerSpec, Installation, MatchStatus, OperatingBand, OperatingPoint } from '../model/index.ts';
import { solveInstallation, type Calibration } from '../model/index.ts';
import { calibratedBoatInstallation } from './boatCalibration.ts';
import { bandResult, type BandResult } from './results.ts';
import { STATUS_WORDS, toleranceNote } from './status.ts';

/** WOT rpm repeatability assumed when the trials cannot show their own scatter, % of the rpm (common practice, no source). */
export const READING_SCATTER_PCT = 1;
/** Half the 10 rpm step sheets print engine speeds in. */
const PRINT_HALF_STEP_RPM = 5;
/** Standard errors of the fit the band spans on each side. */
export const FIT_SE_MULTIPLE = 2;

/** Impeller ids that ran in a trial used by the fit. */
export function triedImpellerIds(cal: Calibration): ReadonlySet<string> {
  return new Set(cal.residuals.filter((r) => r.usedInFit).map((r) => r.impellerId));
}

/** Largest |residual| (rpm) among the trials used in the fit; 0 when none. */
export function largestResidualRpm(cal: Calibration): number {
  return Math.max(0, ...cal.residuals.filter((r) => r.usedInFit).map((r) => Math.abs(r.residualRpm)));
}

/** One sentence on what calibrated bands cover, for sheets and results. */
export function calibratedBandNote(args: { cal: Calibration; tolerancePct: number }): string {
  const fit = args.cal.powerFactorSe !== null || args.cal.exponentSe !== null ? `the fit (± ${FIT_SE_MULTIPLE} standard errors), ` : '';
  const residual = Math.round(largestResidualRpm(args.cal));
  return (
    `Calibrated bands cover ${fit}the trials’ scatter (largest residual ${residual} rpm; at least ± ${READING_SCATTER_PCT} % for tachometer reading and repeat) ` +
    `and, for impellers not tried, their rating ± ${args.tolerancePct} %.`
  );
}

/** A point moved by `deltaRpm` (the trials' scatter), its status read again against the engine's limits. */
function shifted(p: OperatingPoint, deltaRpm: number, limits: EngineLimits): OperatingPoint {
  // A limiter or an engine-table end stays what it is: scatter cannot take the engine past either.
  if (p.status === 'revLimited' || p.status === 'noCrossing') return p;
  // Sheets print rpm to 10: a band end that prints as the maximum is taken as reaching the limiter.
  const reaches = p.speedRpm + deltaRpm >= limits.maxRpm - PRINT_HALF_STEP_RPM;
  const speedRpm = reaches ? limits.maxRpm : p.speedRpm + deltaRpm;
  const status: MatchStatus =
    reaches ? 'revLimited'
    : speedRpm > limits.windowHighRpm ? 'aboveWindow'
    : speedRpm < limits.windowLowRpm ? 'belowWindow'
    : 'matched';
  return { ...p, speedRpm, status, unusedPowerKw: 0, reason: `${p.reason} Moved ${Math.round(deltaRpm)} rpm for the trials’ scatter.` };
}

/** The fit's ± SE_MULTIPLE standard-error values of a parameter, or the value alone when its error is unknown. */
function spread(value: number, se: number | null): number[] {
  return se === null ? [value] : [value - FIT_SE_MULTIPLE * se, value + FIT_SE_MULTIPLE * se];
}

/** WOT band (rpm, kW, statuses) of one impeller on the calibrated model; inst is the boat's nominal installation. */
export function calibratedBand(args: { inst: Installation; cal: Calibration; impeller: ImpellerSpec }): BandResult {
  const { cal, impeller } = args;
  const base = calibratedBoatInstallation(args.inst, cal, impeller);
  const limits = base.engine.limits;
  const tol = base.family.tolerancePct / 100;
  const ratings = triedImpellerIds(cal).has(impeller.id) ? [1] : [1 - tol, 1 + tol];
  // Power factors relative to the calibrated engine (its condition factor already holds the fitted one). The
  // factor was fitted as ln γ with standard error SE/γ, so its corners are γ·e^(± 2·SE/γ): always positive.
  const powers = cal.powerFactorSe === null ? [1] : spread(0, cal.powerFactorSe / cal.powerFactor).map(Math.exp);
  const exponents = spread(cal.exponent, cal.mode === 'exponentAndCondition' || cal.mode === 'exponentAndRatings' ? cal.exponentSe : null);
  const corners = exponents.flatMap((exponent) =>
    ratings.flatMap((ratingFactor) =>
      powers.map((powerFactor) => solveInstallation({ ...base, family: { ...base.family, exponent } }, { ratingFactor, powerFactor })),
    ),
  );
  const nominal = solveInstallation(base);
  const slowest = corners.reduce((a, b) => (b.speedRpm < a.speedRpm ? b : a));
  const fastest = corners.reduce((a, b) => (b.speedRpm > a.speedRpm ? b : a));
  const scatterRpm = Math.max((READING_SCATTER_PCT / 100) * nominal.speedRpm, largestResidualRpm(cal));
  const band: OperatingBand = { nominal, lowRpm: shifted(slowest, -scatterRpm, limits), highRpm: shifted(fastest, scatterRpm, limits) };
  const note = toleranceNote({ nominal: band.nominal.status, low: band.lowRpm.status, high: band.highRpm.status });
  const words = STATUS_WORDS[nominal.status];
  return { ...bandResult(band), verdict: note === '' ? words : `${words}; across the band it ${note}` };
}
