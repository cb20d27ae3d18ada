/**
 * Results of one boat: its fitted combination under its own conditions, the predicted WOT band, the
 * cruise table, every alternative impeller of its jet, and the engine-upgrade table. Pure composition of
 * model calls. Speed and fuel estimates (boatEstimates.ts) sit beside the data-sheet figures; a boat with
 * usable sea trials also gets its calibration and every figure again on the calibrated model
 * (boatCalibration.ts, boatCalibratedBand.ts), which sheets put first.
 */
import type { Boat, Project } from '../data/types.ts';
import { operatingBand, type ImpellerSpec, type Installation } from '../model/index.ts';
import { calibratedBand, calibratedBandNote } from './boatCalibratedBand.ts';
import { boatCalibration, calibratedBoatInstallation, calibrationResult, type CalibrationResult } from './boatCalibration.ts';
import { boatTrend, type TrendResult } from './boatTrend.ts';
import { boatEstimates, type BoatEstimates, type SpeedGainRow, type TopSpeedRow } from './boatEstimates.ts';
import { boatFigures, type BoatFigures, type CruiseRow, type RpmGainRow, type UpgradeRow } from './boatFigures.ts';
import { bandResult, conditionsResult, limitsResult, type BandResult, type ConditionsResult, type LimitsResult } from './results.ts';

export { RPM_GAINS, UPGRADE_STEPS_PCT, windowPlace, type BoatFigures, type CruiseRow, type RpmGainRow, type UpgradeRow, type WindowPlace } from './boatFigures.ts';

export interface AlternativeRow {
  readonly impellerId: string;
  readonly label: string;
  readonly ratingKw: number;
  readonly fitted: 'yes' | 'no';
  /** On the data-sheet model, band over the data-sheet tolerances. */
  readonly band: BandResult;
  /** Crouch top-speed estimate at the nominal WOT power, knots. */
  readonly topSpeedKn?: number;
  /** On the sea-trial-calibrated model, when the boat has trials. */
  readonly calibratedWotRpm?: number;
  readonly calibratedTopSpeedKn?: number;
  /** Band on the calibrated model (what it covers: BoatResult.calibrated.bandNote). */
  readonly calibratedBand?: BandResult;
}

/** The boat's figures on the sea-trial-calibrated model. */
export interface CalibratedFigures extends BoatFigures {
  readonly calibration: CalibrationResult;
  readonly estimates: BoatEstimates;
  /** Fitted impeller's WOT band on the calibrated model. */
  readonly wot: BandResult;
  /** What the calibrated bands cover, one sentence. */
  readonly bandNote: string;
  /** The latest usable trial of the fitted impeller, when it ran in one. */
  readonly fittedMeasured?: { readonly date: string; readonly wotRpm: number };
}

export interface BoatResult {
  readonly kind: 'boat';
  readonly boatId: string;
  readonly name: string;
  readonly engineFamilyId: string;
  readonly engineVariantId: string;
  readonly engineLabel: string;
  readonly jetId: string;
  readonly jetLabel: string;
  readonly impellerId: string;
  readonly impellerLabel: string;
  readonly limits: LimitsResult;
  readonly conditions: ConditionsResult;
  readonly wot: BandResult;
  readonly cruise: readonly CruiseRow[];
  readonly alternatives: readonly AlternativeRow[];
  readonly upgrade: readonly UpgradeRow[];
  readonly rpmGains: readonly RpmGainRow[];
  /** Speed, fuel and upgrade estimates beside the nominal figures (hull constant from trials when logged). */
  readonly estimates: BoatEstimates;
  /** Power change for planing-speed gains (estimates). */
  readonly speedGains: readonly SpeedGainRow[];
  /** Present when the boat has usable sea trials: the calibration and every figure on the calibrated model. */
  readonly calibrated?: CalibratedFigures;
  /** Present when the boat has sea trials the calibration refused (implausible factors): why, in words. */
  readonly trialsNotUsed?: string;
  /** Present when the boat has sea trials: each tried impeller's effective rating over time, and the wear flag. */
  readonly trend?: TrendResult;
  /** The latest sea trial of the fitted impeller, wherever it is written (whether or not the fit used it). */
  readonly lastTrial?: { readonly date: string; readonly wotRpm: number };
}

/** The boat's installation with a given impeller (its fitted one by default). */
export function boatInstallation(boat: Boat, impeller?: ImpellerSpec): Installation {
  const fitted = impeller ?? boat.jet.impellers.find((i) => i.id === boat.impellerId);
  if (!fitted) throw new Error(`${boat.source.file}: impeller "${boat.impellerId}" is not in jet ${boat.jetId}; pick one of ${boat.jet.impellers.map((i) => i.id).join(', ')}`);
  return { engine: boat.engine, ambient: boat.site.ambient, family: boat.jet.family, impeller: fitted, driveLine: boat.driveLine, waterDensityKgM3: boat.water.densityKgM3 };
}

/** The latest trial of the fitted impeller that the fit used, as the card prints it. */
function fittedMeasured(boat: Boat, c: CalibrationResult): CalibratedFigures['fittedMeasured'] {
  const runs = c.trials.filter((t) => t.impellerId === boat.impellerId && t.usedInFit === 'yes');
  const latest = runs.reduce<(typeof runs)[number] | undefined>((a, t) => (a === undefined || t.date >= a.date ? t : a), undefined);
  return latest ? { date: latest.date, wotRpm: latest.wotRpm } : undefined;
}

/** The latest trial of the fitted impeller (boat.trials is in date order). */
function lastTrialOf(boat: Boat): { lastTrial?: BoatResult['lastTrial'] } {
  const runs = boat.trials.filter((t) => t.impellerId === boat.impellerId);
  const last = runs[runs.length - 1];
  return last ? { lastTrial: { date: last.date, wotRpm: last.wotRpm } } : {};
}

/**
 * Analyses one boat of the project (powers kW, speeds rpm). A boat's spec sheet, console card, upgrade
 * sheet and results file all need the same analysis (about 8 ms with its calibration), so it is
 * remembered per (boat, project) object: both are immutable and a new load makes new objects, so a
 * remembered result can never be stale. The WeakMap keeps nothing alive that the caller dropped.
 */
export function analyseBoat(args: { boat: Boat; project: Project }): BoatResult {
  let perProject = REMEMBERED.get(args.boat);
  if (!perProject) {
    perProject = new WeakMap();
    REMEMBERED.set(args.boat, perProject);
  }
  let result = perProject.get(args.project);
  if (!result) {
    result = computeBoat(args);
    perProject.set(args.project, result);
  }
  return result;
}

const REMEMBERED = new WeakMap<Boat, WeakMap<Project, BoatResult>>();

function computeBoat(args: { boat: Boat; project: Project }): BoatResult {
  const { boat } = args;
  const inst = boatInstallation(boat);
  const wot = bandResult(operatingBand(inst));
  const calibration = boatCalibration(boat, inst);
  const estimates = boatEstimates({ boat, inst, calibration, basis: 'nominal' });
  const nominal = boatFigures({ boat, inst, wotRpm: wot.nominal.speedRpm, estimates });
  const usable = calibration.mode !== 'none';
  const calBands = new Map(usable ? boat.jet.impellers.map((impeller) => [impeller.id, calibratedBand({ inst, cal: calibration, impeller })]) : []);
  const calibrated = ((): CalibratedFigures | undefined => {
    if (!usable) return undefined;
    const calEstimates = boatEstimates({ boat, inst, calibration, basis: 'calibrated' });
    const calWot = calBands.get(inst.impeller.id)!;
    const figures = boatFigures({ boat, inst: calibratedBoatInstallation(inst, calibration), wotRpm: calWot.nominal.speedRpm, estimates: calEstimates });
    const cal = calibrationResult(boat, calibration);
    const measured = fittedMeasured(boat, cal);
    return {
      calibration: cal,
      estimates: calEstimates,
      wot: calWot,
      bandNote: calibratedBandNote({ cal: calibration, tolerancePct: boat.jet.family.tolerancePct }),
      ...figures,
      ...(measured ? { fittedMeasured: measured } : {}),
    };
  })();
  const topOf = (rows: readonly TopSpeedRow[], id: string) => rows.find((r) => r.impellerId === id)!;
  const alternatives = boat.jet.impellers.map((impeller): AlternativeRow => ({
    impellerId: impeller.id,
    label: impeller.label,
    ratingKw: impeller.ratingKw,
    fitted: impeller.id === boat.impellerId ? ('yes' as const) : ('no' as const),
    band: bandResult(operatingBand(boatInstallation(boat, impeller))),
    topSpeedKn: topOf(estimates.topSpeeds, impeller.id).speedKn,
    ...(calibrated
      ? {
          calibratedWotRpm: topOf(calibrated.estimates.topSpeeds, impeller.id).wotRpm,
          calibratedTopSpeedKn: topOf(calibrated.estimates.topSpeeds, impeller.id).speedKn,
          calibratedBand: calBands.get(impeller.id)!,
        }
      : {}),
  }));
  return {
    kind: 'boat',
    boatId: boat.id,
    name: boat.name,
    engineFamilyId: boat.engineFamilyId,
    engineVariantId: boat.engineVariantId,
    engineLabel: boat.engine.label,
    jetId: boat.jetId,
    jetLabel: boat.jet.label,
    impellerId: inst.impeller.id,
    impellerLabel: inst.impeller.label,
    limits: limitsResult(boat.engine.limits),
    conditions: conditionsResult(boat),
    wot,
    cruise: nominal.cruise,
    alternatives,
    upgrade: nominal.upgrade,
    rpmGains: nominal.rpmGains,
    estimates,
    speedGains: estimates.speedGains,
    ...(calibrated ? { calibrated } : {}),
    ...(!usable && boat.trials.length > 0 ? { trialsNotUsed: calibration.notes.join(' ') } : {}),
    ...(boat.trials.length > 0 ? { trend: boatTrend(boat, calibration) } : {}),
    ...lastTrialOf(boat),
  };
}
