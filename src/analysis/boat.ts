/**
 * Results of one boat: its fitted combination under its own conditions, the predicted WOT band, the
 * cruise table, every alternative impeller of its jet, and the engine-upgrade table. Pure composition of
 * model calls. Speed, fuel and sea-trial calibration are added by later analyses into the optional fields.
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
import { bandResult, conditionsResult, limitsResult, pointResult, type BandResult, type ConditionsResult, type LimitsResult, type PointResult } from './results.ts';

export interface CruiseRow {
  readonly label: string;
  readonly kind: CruiseSetting['kind'];
  /** 'ok'; 'aboveWot' (asks more than the engine makes at WOT); 'needsSpeedModel' (speed settings, for now). */
  readonly status: 'ok' | 'aboveWot' | 'needsSpeedModel';
  readonly speedRpm?: number;
  readonly powerKw?: number;
  /** Boat speed, knots (filled by the speed model). */
  readonly speedKn?: number;
  /** Fuel flow, L/h (filled by the fuel model). */
  readonly fuelLPerH?: number;
}

export interface AlternativeRow {
  readonly impellerId: string;
  readonly label: string;
  readonly ratingKw: number;
  readonly fitted: 'yes' | 'no';
  readonly band: BandResult;
}

export interface UpgradeRow {
  readonly changePct: number;
  readonly wot: PointResult;
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

function cruiseRow(setting: CruiseSetting, inst: Installation, wotRpm: number): CruiseRow {
  const absorber = installationAbsorber(inst);
  if (setting.kind === 'speed') return { label: setting.label, kind: setting.kind, status: 'needsSpeedModel' };
  const speedRpm = setting.kind === 'rpm' ? setting.speedRpm : speedAtAbsorbedPowerRpm(absorber, setting.powerKw);
  const powerKw = setting.kind === 'power' ? setting.powerKw : absorbedPowerKw(absorber, setting.speedRpm);
  return { label: setting.label, kind: setting.kind, status: speedRpm > wotRpm ? 'aboveWot' : 'ok', speedRpm, powerKw };
}

/** Analyses one boat of the project (powers kW, speeds rpm). */
export function analyseBoat(args: { boat: Boat; project: Project }): BoatResult {
  const { boat } = args;
  const inst = boatInstallation(boat);
  const wot = bandResult(operatingBand(inst));
  const alternatives = boat.jet.impellers.map((impeller) => ({
    impellerId: impeller.id,
    label: impeller.label,
    ratingKw: impeller.ratingKw,
    fitted: impeller.id === boat.impellerId ? ('yes' as const) : ('no' as const),
    band: bandResult(operatingBand(boatInstallation(boat, impeller))),
  }));
  const upgrade = UPGRADE_STEPS_PCT.map((changePct) => ({ changePct, wot: pointResult(upgradeOperatingPoint(inst, changePct)) }));
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
    cruise: boat.cruise.map((c) => cruiseRow(c, inst, wot.nominal.speedRpm)),
    alternatives,
    upgrade,
    rpmGains,
  };
}
