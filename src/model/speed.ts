/**
 * Planing speed from Crouch's formula (as given in naval-architecture handbooks, e.g. Gerr, The Propeller
 * Handbook):  V [kn] = C / sqrt(Δ [lb] / P [shp]),  so V ∝ sqrt(P / Δ).
 * Power convention here: P is the power delivered into the jet's input shaft, i.e. engine brake power times
 * the drive-line efficiency, in horsepower of 550 ft·lbf/s. A constant C calibrated from a measured speed
 * uses the same convention, so a calibrated estimate does not depend on it. Crouch is a propeller-boat
 * rule: for a waterjet the constant is best calibrated from a trial. Estimates only; planing hulls only.
 */
import { engineCurve } from './engineCurve.ts';
import { calibratedInstallation, type Calibration } from './calibration.ts';
import type { Installation } from './installation.ts';
import type { TrialInput } from './trialRating.ts';
import { hpToKw, kgToLb, kwToHp } from '../units.ts';

export type CrouchHullType = 'runabout' | 'cruiser' | 'high-speed-runabout' | 'workboat' | 'race';

/**
 * Typical Crouch constants by hull type, FROM MEMORY of the handbook table (not confirmed): about 150
 * for average runabouts and cruisers (workboats put there too, our choice), 190 for high-speed runabouts,
 * 210 for race-boat types.
 */
export const TYPICAL_CROUCH_CONSTANTS: Readonly<Record<CrouchHullType, number>> = Object.freeze({
  runabout: 150,
  cruiser: 150,
  'high-speed-runabout': 190,
  workboat: 150,
  race: 210,
});

/** Where a hull constant came from: a sea trial's measured speed, the boat file, or the typical table. */
export type HullConstantSource = 'trial' | 'stated' | 'typical';

export interface HullConstant {
  readonly value: number;
  readonly source: HullConstantSource;
  /** Dates of the trials it was calibrated from (empty unless source is 'trial'). */
  readonly trialDates: readonly string[];
  /** One plain sentence saying where the constant came from. */
  readonly note: string;
}

/** Crouch speed estimate, knots, from shaft power (kW) and loaded displacement (kg). */
export function crouchSpeedKn(args: { crouchConstant: number; displacementKg: number; shaftPowerKw: number }): number {
  return args.crouchConstant / Math.sqrt(kgToLb(args.displacementKg) / kwToHp(args.shaftPowerKw));
}

/** Crouch constant C = V · sqrt(Δ/P) from a measured speed (kn), displacement (kg) and shaft power (kW). */
export function crouchConstantFromSpeed(args: { speedKn: number; displacementKg: number; shaftPowerKw: number }): number {
  return args.speedKn * Math.sqrt(kgToLb(args.displacementKg) / kwToHp(args.shaftPowerKw));
}

/** Shaft power (kW) Crouch's formula needs for a speed (kn): P = Δ · (V / C)². */
export function shaftPowerForSpeedKw(args: { crouchConstant: number; displacementKg: number; speedKn: number }): number {
  const ratio = args.speedKn / args.crouchConstant;
  return hpToKw(kgToLb(args.displacementKg) * ratio * ratio);
}

/** Loaded displacement from its parts, kg (hull's loaded displacement plus any extra load). */
export function loadedDisplacementKg(args: { displacementKg: number; loadKg?: number }): number {
  return args.displacementKg + (args.loadKg ?? 0);
}

/** One Crouch constant per trial that logged a speed, from the calibrated engine's power at the measured rpm. */
export function crouchConstantsFromTrials(args: {
  inst: Installation;
  calibration: Calibration;
  trials: readonly TrialInput[];
  displacementKg: number;
}): { date: string; constant: number }[] {
  const engine = calibratedInstallation(args.inst, args.calibration).engine;
  return args.trials.flatMap((t) => {
    if (t.speedKn === undefined || !(t.speedKn > 0)) return [];
    const value = engineCurve(engine, { ambient: t.ambient }).powerAt(t.wotRpm);
    if (value.status !== 'ok') return [];
    const shaftPowerKw = value.powerKw * args.inst.driveLine.efficiency;
    const displacementKg = loadedDisplacementKg({ displacementKg: args.displacementKg, loadKg: t.loadKg });
    return [{ date: t.date, constant: crouchConstantFromSpeed({ speedKn: t.speedKn, displacementKg, shaftPowerKw }) }];
  });
}

/** The hull constant to use: mean of trial calibrations, else the boat file's, else the typical one for the type. */
export function hullConstant(args: {
  hullType: CrouchHullType;
  statedConstant?: number;
  measured: readonly { date: string; constant: number }[];
}): HullConstant {
  if (args.measured.length > 0) {
    const value = args.measured.reduce((s, m) => s + m.constant, 0) / args.measured.length;
    const trialDates = args.measured.map((m) => m.date);
    return { value, source: 'trial', trialDates, note: `Hull constant ${value.toFixed(0)} calibrated from the measured speed of the sea trial(s) of ${trialDates.join(', ')}.` };
  }
  if (args.statedConstant !== undefined) {
    return { value: args.statedConstant, source: 'stated', trialDates: [], note: `Hull constant ${args.statedConstant} as stated in the boat file; no trial speed to calibrate it.` };
  }
  const value = TYPICAL_CROUCH_CONSTANTS[args.hullType];
  return {
    value,
    source: 'typical',
    trialDates: [],
    note: `Hull constant ${value}: a typical value for a ${args.hullType} hull, quoted from memory of a handbook table; log a trial speed to calibrate it.`,
  };
}

