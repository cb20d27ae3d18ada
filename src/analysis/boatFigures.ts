/**
 * The rows a boat sheet tabulates for one installation (the data-sheet model, or the sea-trial-calibrated
 * one): cruise settings, engine-power changes, and the power a WOT rpm gain needs, each target placed
 * against the engine's recommended window so no sheet offers a target outside it as a goal.
 */
import type { Boat, CruiseSetting } from '../data/types.ts';
import {
  absorbedPowerKw,
  installationAbsorber,
  powerChangeForRpm,
  speedAtAbsorbedPowerRpm,
  upgradeOperatingPoint,
  type EngineLimits,
  type Installation,
} from '../model/index.ts';
import type { BoatEstimates, UpgradeEstimate } from './boatEstimates.ts';
import { pointResult, type PointResult } from './results.ts';

export interface CruiseRow {
  readonly label: string;
  readonly kind: CruiseSetting['kind'];
  /** 'ok'; 'aboveWot' (asks more than the engine makes at WOT). 'needsSpeedModel' is no longer produced (speed settings use the Crouch estimate); kept so older readers still type-check. */
  /** 'belowPlaning': a speed setting below planing speed, so its rpm, power and fuel are not estimated. */
  readonly status: 'ok' | 'aboveWot' | 'belowPlaning' | 'needsSpeedModel';
  /** 'belowPlaning' when the setting runs below planing speed: then no speed is estimated (speedKn absent). */
  readonly speedBasis: 'planing' | 'belowPlaning';
  readonly speedRpm?: number;
  readonly powerKw?: number;
  /** Boat speed, knots (filled by the speed model). */
  readonly speedKn?: number;
  /** Fuel flow, L/h (filled by the fuel model). */
  readonly fuelLPerH?: number;
  readonly fuelUsGalPerH?: number;
  /** With a tank: hours and nautical miles keeping the boat's reserve (estimates.fuelReservePct). */
  readonly hoursWithReserve?: number;
  readonly rangeWithReserveNm?: number;
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

/** Where a target rpm sits against the engine's limits. */
export type WindowPlace = 'belowWindow' | 'withinWindow' | 'aboveWindow' | 'beyondMax';

export interface RpmGainRow {
  /** 'step': a fixed gain (RPM_GAINS); 'windowTop': up to the top of the recommended window. */
  readonly kind: 'step' | 'windowTop';
  readonly gainRpm: number;
  readonly targetRpm: number;
  /** 'ok' with powerChangePct, or 'unreachable' below the engine's maximum rpm. */
  readonly status: 'ok' | 'unreachable';
  readonly powerChangePct?: number;
  /** The target against the window; only 'withinWindow' is a target to aim for. */
  readonly window: WindowPlace;
}

/** The tabulated rows of one installation. */
export interface BoatFigures {
  readonly cruise: readonly CruiseRow[];
  readonly upgrade: readonly UpgradeRow[];
  readonly rpmGains: readonly RpmGainRow[];
}

/** Power changes tabulated on upgrade sheets, %. */
export const UPGRADE_STEPS_PCT: readonly number[] = [5, 10, 15, 20, 25, 30, 35, 40, 45, 50];
/** WOT rpm gains tabulated on upgrade sheets. */
export const RPM_GAINS: readonly number[] = [100, 200, 300, 500];

/** Where an engine speed (rpm) sits against the limits: at or past the maximum counts as beyond it. */
export function windowPlace(speedRpm: number, limits: EngineLimits): WindowPlace {
  if (speedRpm >= limits.maxRpm) return 'beyondMax';
  if (speedRpm > limits.windowHighRpm) return 'aboveWindow';
  if (speedRpm < limits.windowLowRpm) return 'belowWindow';
  return 'withinWindow';
}

function cruiseRow(setting: CruiseSetting, inst: Installation, wotRpm: number, est: BoatEstimates['cruise'][number]): CruiseRow {
  const absorber = installationAbsorber(inst);
  const range = est.rangeWithReserveNm !== undefined ? { hoursWithReserve: est.hoursWithReserve!, rangeWithReserveNm: est.rangeWithReserveNm } : {};
  const estimates = { speedBasis: est.speedBasis, ...(est.speedKn !== undefined ? { speedKn: est.speedKn } : {}), ...(est.fuelLPerH !== undefined ? { fuelLPerH: est.fuelLPerH, fuelUsGalPerH: est.fuelUsGalPerH } : {}), ...range };
  // A speed setting needs the speed model: its rpm and power come from the Crouch estimate inverted (none below planing speed).
  if (setting.kind === 'speed') return { label: setting.label, kind: setting.kind, status: est.status, ...(est.speedRpm !== undefined ? { speedRpm: est.speedRpm, powerKw: est.powerKw } : {}), ...estimates };
  const speedRpm = setting.kind === 'rpm' ? setting.speedRpm : speedAtAbsorbedPowerRpm(absorber, setting.powerKw);
  const powerKw = setting.kind === 'power' ? setting.powerKw : absorbedPowerKw(absorber, setting.speedRpm);
  return { label: setting.label, kind: setting.kind, status: speedRpm > wotRpm ? 'aboveWot' : 'ok', speedRpm, powerKw, ...estimates };
}

function rpmGainRow(inst: Installation, kind: RpmGainRow['kind'], gainRpm: number, targetRpm: number): RpmGainRow {
  const pct = powerChangeForRpm(inst, targetRpm);
  const window = windowPlace(targetRpm, inst.engine.limits);
  return pct === null ? { kind, gainRpm, targetRpm, status: 'unreachable', window } : { kind, gainRpm, targetRpm, status: 'ok', powerChangePct: pct, window };
}

/** Cruise, upgrade and rpm-gain rows of one installation whose WOT speed is wotRpm and estimates are `estimates`. */
export function boatFigures(args: { boat: Boat; inst: Installation; wotRpm: number; estimates: BoatEstimates }): BoatFigures {
  const { boat, inst, wotRpm, estimates } = args;
  const upgrade = UPGRADE_STEPS_PCT.map((changePct): UpgradeRow => {
    const e = estimates.upgrade.find((u) => u.changePct === changePct);
    const speed = e ? { speedKn: e.speedKn, speedGainPct: e.speedGainPct, ...(e.best ? { best: e.best } : {}) } : {};
    return { changePct, wot: pointResult(upgradeOperatingPoint(inst, changePct)), ...speed };
  });
  const steps = RPM_GAINS.map((gain) => rpmGainRow(inst, 'step', gain, wotRpm + gain));
  // The top of the window is the most a technician should aim for: list it in order among the steps.
  const top = inst.engine.limits.windowHighRpm;
  const windowTop = top > wotRpm + 1 && !RPM_GAINS.some((g) => Math.abs(wotRpm + g - top) < 1) ? [rpmGainRow(inst, 'windowTop', top - wotRpm, top)] : [];
  const rpmGains = [...steps, ...windowTop].sort((a, b) => a.targetRpm - b.targetRpm);
  return { cruise: boat.cruise.map((c, i) => cruiseRow(c, inst, wotRpm, estimates.cruise[i])), upgrade, rpmGains };
}
