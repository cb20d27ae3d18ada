/**
 * Speed and fuel estimates of one boat, on the sea-trial-calibrated model when the boat has trials:
 * the Crouch hull constant and where it came from, top speed of the fitted and every alternative impeller,
 * speed and fuel for each cruise setting, and the engine-upgrade what-ifs with speed. All are estimates.
 */
import type { Boat, CruiseSetting } from '../data/types.ts';
import {
  absorbedPowerKw,
  DEFAULT_RESERVE_FRACTION,
  crouchConstantsFromTrials,
  crouchSpeedKn,
  fuelFlow,
  fuelRange,
  hullConstant,
  impellerTopSpeeds,
  installationAbsorber,
  planingSpeedKn,
  powerChangeForSpeedGain,
  shaftPowerForSpeedKw,
  speedAtAbsorbedPowerRpm,
  upgradeWhatIf,
  type Calibration,
  type HullConstantSource,
  type Installation,
  type SpeedBasis,
  type WhatIfPoint,
} from '../model/index.ts';
import { boatTrials, calibratedBoatInstallation } from './boatCalibration.ts';
import { STATUS_WORDS } from './status.ts';

export const SPEED_NOTE =
  'Speeds are estimates from Crouch’s planing formula (power into the jet shaft, loaded displacement); they hold for planing speeds only, so a setting below planing speed gets no speed, and they are best calibrated by a logged sea-trial speed.';
export const FUEL_NOTE = 'Fuel figures are estimates: brake power × BSFC / fuel density, with typical figures where the engine data give none.';

export interface HullResult {
  readonly crouchConstant: number;
  readonly source: HullConstantSource;
  readonly trialDates: readonly string[];
  readonly note: string;
  readonly displacementKg: number;
  /** Lowest speed (kn) taken as planing for this hull (model/planing.ts); below it no speed is estimated. */
  readonly planingFromKn: number;
}

/** 'planing': the speed is a planing estimate; 'belowPlaning': the setting is below planing speed, so no speed is estimated. */
export type SpeedBasisWord = 'planing' | 'belowPlaning';

export interface CruiseEstimate {
  readonly label: string;
  readonly kind: CruiseSetting['kind'];
  /** 'belowPlaning' only for a speed setting below planing speed: its rpm, power and fuel cannot be estimated. */
  readonly status: 'ok' | 'aboveWot' | 'belowPlaning';
  readonly speedBasis: SpeedBasisWord;
  readonly speedRpm?: number;
  readonly powerKw?: number;
  /** Absent below planing speed (speedBasis 'belowPlaning'). */
  readonly speedKn?: number;
  readonly fuelLPerH?: number;
  readonly fuelUsGalPerH?: number;
  /** With a tank: hours and nautical miles keeping the boat's reserve (estimates.fuelReservePct). */
  readonly hoursWithReserve?: number;
  readonly rangeWithReserveNm?: number;
}

export interface TopSpeedRow {
  readonly impellerId: string;
  readonly label: string;
  readonly fitted: 'yes' | 'no';
  readonly wotRpm: number;
  readonly powerKw: number;
  readonly status: string;
  readonly statusText: string;
  readonly speedKn: number;
}

export interface UpgradeEstimate {
  readonly changePct: number;
  readonly wotRpm: number;
  readonly powerKw: number;
  readonly status: string;
  readonly speedKn: number;
  readonly speedGainPct: number;
  /** The impeller of the jet that would best use the new power, when one is matched. */
  readonly best?: { readonly impellerId: string; readonly wotRpm: number; readonly powerKw: number; readonly speedKn: number; readonly speedGainPct: number };
}

export interface SpeedGainRow {
  readonly gainPct: number;
  readonly fittedChangePct?: number;
  /** Match status of the fitted impeller after that change. */
  readonly fittedStatus?: string;
  readonly fittedStatusText?: string;
  readonly rematchedChangePct?: number;
  readonly rematchedImpellerId?: string;
}

export interface BoatEstimates {
  /** 'calibrated' when the rpm and power figures rest on sea trials (trialDates), else 'nominal'. */
  readonly basis: 'calibrated' | 'nominal';
  /** Trials the calibrated figures rest on (empty on the nominal basis). */
  readonly trialDates: readonly string[];
  readonly hull: HullResult;
  readonly wotSpeedKn: number;
  readonly wotFuelLPerH: number;
  readonly bsfcGPerKwh: number;
  readonly bsfcSource: 'engine' | 'typical';
  readonly fuelKgPerL: number;
  /** Share of the tank (%) the time and range figures keep in reserve. */
  readonly fuelReservePct: number;
  readonly cruise: readonly CruiseEstimate[];
  readonly topSpeeds: readonly TopSpeedRow[];
  readonly upgrade: readonly UpgradeEstimate[];
  readonly speedGains: readonly SpeedGainRow[];
  readonly notes: readonly string[];
}

/** The share of the tank a boat keeps in reserve (a fraction). */
export function reserveFraction(boat: Boat): number {
  return boat.fuelReservePct !== undefined ? boat.fuelReservePct / 100 : DEFAULT_RESERVE_FRACTION;
}

/** Speed gains tabulated on upgrade sheets, %. */
export const SPEED_GAINS_PCT: readonly number[] = [5, 10, 15];

function cruiseEstimate(boat: Boat, setting: CruiseSetting, inst: Installation, speed: SpeedBasis, wotRpm: number, planingFromKn: number): CruiseEstimate {
  const absorber = installationAbsorber(inst);
  const eff = inst.driveLine.efficiency;
  // Crouch's formula holds on the plane only: a speed setting below planing speed gives no power, and a
  // power or rpm setting whose estimate falls below it gets no speed (its rpm, power and fuel still hold).
  if (setting.kind === 'speed' && setting.speedKn < planingFromKn) return { label: setting.label, kind: setting.kind, status: 'belowPlaning', speedBasis: 'belowPlaning' };
  // Engine-side power for each kind of setting; the impeller's absorption law gives the rpm.
  const powerKw =
    setting.kind === 'power' ? setting.powerKw
    : setting.kind === 'rpm' ? absorbedPowerKw(absorber, setting.speedRpm)
    : shaftPowerForSpeedKw({ ...speed, speedKn: setting.speedKn }) / eff;
  const speedRpm = setting.kind === 'rpm' ? setting.speedRpm : speedAtAbsorbedPowerRpm(absorber, powerKw);
  const crouchKn = setting.kind === 'speed' ? setting.speedKn : crouchSpeedKn({ ...speed, shaftPowerKw: powerKw * eff });
  const planing = crouchKn >= planingFromKn;
  const fuel = fuelFlow({ powerKw, fuel: inst.engine.fuel, bsfcGPerKwh: inst.engine.bsfcGPerKwh });
  const range = boat.fuelTankL === undefined || !planing ? undefined : fuelRange({ tankL: boat.fuelTankL, litresPerHour: fuel.litresPerHour, speedKn: crouchKn, reserveFraction: reserveFraction(boat) });
  return {
    label: setting.label,
    kind: setting.kind,
    status: speedRpm > wotRpm ? 'aboveWot' : 'ok',
    speedBasis: planing ? 'planing' : 'belowPlaning',
    speedRpm,
    powerKw,
    ...(planing ? { speedKn: crouchKn } : {}),
    fuelLPerH: fuel.litresPerHour,
    fuelUsGalPerH: fuel.usGalPerHour,
    ...(range ? { hoursWithReserve: range.hoursWithReserve, rangeWithReserveNm: range.rangeWithReserveNm! } : {}),
  };
}

function topSpeedRow(boat: Boat, p: WhatIfPoint): TopSpeedRow {
  const impeller = boat.jet.impellers.find((i) => i.id === p.impellerId)!;
  return {
    impellerId: p.impellerId,
    label: impeller.label,
    fitted: p.impellerId === boat.impellerId ? 'yes' : 'no',
    wotRpm: p.point.speedRpm,
    powerKw: p.point.powerKw,
    status: p.point.status,
    statusText: STATUS_WORDS[p.point.status],
    speedKn: p.speedKn,
  };
}

/**
 * Speed, fuel and upgrade estimates of one boat, on the nominal model (figures that sit beside the sheet's
 * predicted WOT band) or on the sea-trial-calibrated one. The hull constant comes from trials either way.
 */
export function boatEstimates(args: { boat: Boat; inst: Installation; calibration: Calibration; basis: 'nominal' | 'calibrated' }): BoatEstimates {
  const { boat, calibration } = args;
  const calibrated = args.basis === 'calibrated' && calibration.mode !== 'none';
  const inst = calibrated ? calibratedBoatInstallation(args.inst, calibration) : args.inst;
  const measured = crouchConstantsFromTrials({ inst: args.inst, calibration, trials: boatTrials(boat), displacementKg: boat.hull.displacementKg });
  const hc = hullConstant({ hullType: boat.hull.type, statedConstant: boat.hull.crouchConstant, measured });
  const speed: SpeedBasis = { crouchConstant: hc.value, displacementKg: boat.hull.displacementKg };
  const planingFromKn = planingSpeedKn({ displacementKg: boat.hull.displacementKg, waterDensityKgM3: boat.water.densityKgM3 });
  const topSpeeds = impellerTopSpeeds({ inst, impellers: boat.jet.impellers, speed }).map((p) => topSpeedRow(boat, p));
  const fitted = topSpeeds.find((r) => r.fitted === 'yes')!;
  const what = upgradeWhatIf({ inst, impellers: boat.jet.impellers, speed });
  const gain = (v: number) => (v / what.base.speedKn - 1) * 100;
  const upgrade = what.steps.map((s): UpgradeEstimate => ({
    changePct: s.changePct,
    wotRpm: s.fitted.point.speedRpm,
    powerKw: s.fitted.point.powerKw,
    status: s.fitted.point.status,
    speedKn: s.fitted.speedKn,
    speedGainPct: gain(s.fitted.speedKn),
    ...(s.best
      ? { best: { impellerId: s.best.impellerId, wotRpm: s.best.point.speedRpm, powerKw: s.best.point.powerKw, speedKn: s.best.speedKn, speedGainPct: gain(s.best.speedKn) } }
      : {}),
  }));
  const speedGains = SPEED_GAINS_PCT.map((gainPct): SpeedGainRow => {
    const need = powerChangeForSpeedGain({ inst, impellers: boat.jet.impellers, gainPct });
    return {
      gainPct,
      ...(need.fittedChangePct !== null && need.fittedStatus !== null
        ? { fittedChangePct: need.fittedChangePct, fittedStatus: need.fittedStatus, fittedStatusText: STATUS_WORDS[need.fittedStatus] }
        : {}),
      ...(need.rematchedChangePct !== null ? { rematchedChangePct: need.rematchedChangePct, rematchedImpellerId: need.rematchedImpellerId! } : {}),
    };
  });
  const wotFuel = fuelFlow({ powerKw: fitted.powerKw, fuel: inst.engine.fuel, bsfcGPerKwh: inst.engine.bsfcGPerKwh });
  const trialDates = calibrated ? calibration.residuals.filter((r) => r.usedInFit).map((r) => r.date) : [];
  return {
    basis: calibrated ? 'calibrated' : 'nominal',
    trialDates,
    hull: { crouchConstant: hc.value, source: hc.source, trialDates: hc.trialDates, note: hc.note, displacementKg: boat.hull.displacementKg, planingFromKn },
    wotSpeedKn: fitted.speedKn,
    wotFuelLPerH: wotFuel.litresPerHour,
    bsfcGPerKwh: wotFuel.bsfcGPerKwh,
    bsfcSource: wotFuel.bsfcSource,
    fuelKgPerL: wotFuel.fuelKgPerL,
    fuelReservePct: Math.round(reserveFraction(boat) * 1000) / 10,
    cruise: boat.cruise.map((c) => cruiseEstimate(boat, c, inst, speed, fitted.wotRpm, planingFromKn)),
    topSpeeds,
    upgrade,
    speedGains,
    notes: [SPEED_NOTE, FUEL_NOTE, hc.note],
  };
}
