/**
 * Results of one boat: its fitted combination under its own conditions, the predicted WOT band, the
 * cruise table, every alternative impeller of its jet, and the engine-upgrade table. Pure composition of
 * model calls. Speed and fuel estimates (boatEstimates.ts) sit beside the nominal figures; a boat with sea
 * trials also gets its calibration and the estimates on the calibrated model (boatCalibration.ts).
 */
import type { Boat, CruiseSetting, Project } from '../data/types.ts';
import {
  absorbedPowerKw,
  installationAbsorber,
  operatingBand,
  powerChangeForRpm,
  speedAtAbsorbedPowerRpm,
  upgradeOperatingPoint,
  type ImpellerSpec,
  type Installation,
} from '../model/index.ts';
import { boatCalibration, calibrationResult, type CalibrationResult } from './boatCalibration.ts';
import { boatEstimates, type BoatEstimates, type SpeedGainRow, type TopSpeedRow, type UpgradeEstimate } from './boatEstimates.ts';
import { bandResult, conditionsResult, limitsResult, pointResult, type BandResult, type ConditionsResult, type LimitsResult, type PointResult } from './results.ts';

export interface CruiseRow {
  readonly label: string;
  readonly kind: CruiseSetting['kind'];
  /** 'ok'; 'aboveWot' (asks more than the engine makes at WOT). 'needsSpeedModel' is no longer produced (speed settings use the Crouch estimate); kept so older readers still type-check. */
  readonly status: 'ok' | 'aboveWot' | 'needsSpeedModel';
  readonly speedRpm?: number;
  readonly powerKw?: number;
  /** Boat speed, knots (filled by the speed model). */
  readonly speedKn?: number;
  /** Fuel flow, L/h (filled by the fuel model). */
  readonly fuelLPerH?: number;
  readonly fuelUsGalPerH?: number;
  /** With a tank: hours and nautical miles keeping a third in reserve. */
  readonly hoursWithReserve?: number;
  readonly rangeWithReserveNm?: number;
}

export interface AlternativeRow {
  readonly impellerId: string;
  readonly label: string;
  readonly ratingKw: number;
  readonly fitted: 'yes' | 'no';
  readonly band: BandResult;
  /** Crouch top-speed estimate at the nominal WOT power, knots. */
  readonly topSpeedKn?: number;
  /** On the sea-trial-calibrated model, when the boat has trials. */
  readonly calibratedWotRpm?: number;
  readonly calibratedTopSpeedKn?: number;
}

export interface UpgradeRow {
  readonly changePct: number;
  readonly wot: PointResult;
  /** Crouch estimate at the new WOT power, knots, and the gain over today, %. */
  readonly speedKn?: number;
  readonly speedGainPct?: number;
  /** The impeller of the jet that would best use the new power (matched, most power taken). */
  readonly best?: UpgradeEstimate['best'];
}

export interface RpmGainRow {
  readonly gainRpm: number;
  readonly targetRpm: number;
  /** 'ok' with powerChangePct, or 'unreachable' below the engine's maximum rpm. */
  readonly status: 'ok' | 'unreachable';
  readonly powerChangePct?: number;
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
  /** Present when the boat has sea trials: the calibration and the estimates on the calibrated model. */
  readonly calibrated?: { readonly calibration: CalibrationResult; readonly estimates: BoatEstimates };
}

/** Power changes tabulated on upgrade sheets, %. */
export const UPGRADE_STEPS_PCT: readonly number[] = [5, 10, 15, 20, 25, 30, 35, 40, 45, 50];
/** WOT rpm gains tabulated on upgrade sheets. */
export const RPM_GAINS: readonly number[] = [100, 200, 300, 500];

/** The boat's installation with a given impeller (its fitted one by default). */
export function boatInstallation(boat: Boat, impeller?: ImpellerSpec): Installation {
  const fitted = impeller ?? boat.jet.impellers.find((i) => i.id === boat.impellerId);
  if (!fitted) throw new Error(`${boat.source.file}: impeller "${boat.impellerId}" is not in jet ${boat.jetId}; pick one of ${boat.jet.impellers.map((i) => i.id).join(', ')}`);
  return { engine: boat.engine, ambient: boat.site.ambient, family: boat.jet.family, impeller: fitted, driveLine: boat.driveLine, waterDensityKgM3: boat.water.densityKgM3 };
}

function cruiseRow(setting: CruiseSetting, inst: Installation, wotRpm: number, est: BoatEstimates['cruise'][number]): CruiseRow {
  const absorber = installationAbsorber(inst);
  const range = est.rangeWithReserveNm !== undefined ? { hoursWithReserve: est.hoursWithReserve!, rangeWithReserveNm: est.rangeWithReserveNm } : {};
  const estimates = { speedKn: est.speedKn, fuelLPerH: est.fuelLPerH, fuelUsGalPerH: est.fuelUsGalPerH, ...range };
  // A speed setting needs the speed model: its rpm and power come from the Crouch estimate inverted.
  if (setting.kind === 'speed') return { label: setting.label, kind: setting.kind, status: est.status, speedRpm: est.speedRpm, powerKw: est.powerKw, ...estimates };
  const speedRpm = setting.kind === 'rpm' ? setting.speedRpm : speedAtAbsorbedPowerRpm(absorber, setting.powerKw);
  const powerKw = setting.kind === 'power' ? setting.powerKw : absorbedPowerKw(absorber, setting.speedRpm);
  return { label: setting.label, kind: setting.kind, status: speedRpm > wotRpm ? 'aboveWot' : 'ok', speedRpm, powerKw, ...estimates };
}

/** Analyses one boat of the project (powers kW, speeds rpm). */
export function analyseBoat(args: { boat: Boat; project: Project }): BoatResult {
  const { boat } = args;
  const inst = boatInstallation(boat);
  const wot = bandResult(operatingBand(inst));
  const calibration = boatCalibration(boat, inst);
  const estimates = boatEstimates({ boat, inst, calibration, basis: 'nominal' });
  const calibrated =
    calibration.mode === 'none' ? undefined : { calibration: calibrationResult(boat, calibration), estimates: boatEstimates({ boat, inst, calibration, basis: 'calibrated' }) };
  const topOf = (rows: readonly TopSpeedRow[], id: string) => rows.find((r) => r.impellerId === id)!;
  const alternatives = boat.jet.impellers.map((impeller) => ({
    impellerId: impeller.id,
    label: impeller.label,
    ratingKw: impeller.ratingKw,
    fitted: impeller.id === boat.impellerId ? ('yes' as const) : ('no' as const),
    band: bandResult(operatingBand(boatInstallation(boat, impeller))),
    topSpeedKn: topOf(estimates.topSpeeds, impeller.id).speedKn,
    ...(calibrated
      ? { calibratedWotRpm: topOf(calibrated.estimates.topSpeeds, impeller.id).wotRpm, calibratedTopSpeedKn: topOf(calibrated.estimates.topSpeeds, impeller.id).speedKn }
      : {}),
  }));
  const upgrade = UPGRADE_STEPS_PCT.map((changePct): UpgradeRow => {
    const e = estimates.upgrade.find((u) => u.changePct === changePct);
    const speed = e ? { speedKn: e.speedKn, speedGainPct: e.speedGainPct, ...(e.best ? { best: e.best } : {}) } : {};
    return { changePct, wot: pointResult(upgradeOperatingPoint(inst, changePct)), ...speed };
  });
  const rpmGains = RPM_GAINS.map((gainRpm): RpmGainRow => {
    const targetRpm = wot.nominal.speedRpm + gainRpm;
    const pct = powerChangeForRpm(inst, targetRpm);
    return pct === null ? { gainRpm, targetRpm, status: 'unreachable' } : { gainRpm, targetRpm, status: 'ok', powerChangePct: pct };
  });
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
    cruise: boat.cruise.map((c, i) => cruiseRow(c, inst, wot.nominal.speedRpm, estimates.cruise[i])),
    alternatives,
    upgrade,
    rpmGains,
    estimates,
    speedGains: estimates.speedGains,
    ...(calibrated ? { calibrated } : {}),
  };
}
