/**
 * Engine-upgrade what-ifs: for engine power changes (+5 % … +50 %) the WOT point and planing speed with the
 * fitted impeller, and with the impeller of the same family that would best use the new power (the highest
 * power taken while matched inside the WOT window); and the inverse, the power change a speed gain needs.
 * Speed is Crouch's estimate (speed.ts): V ∝ sqrt(P), so a speed gain g needs (1 + g)² times the WOT power.
 * Pass a calibrated installation (calibration.ts) to build on sea trials.
 */
import { solveInstallation, type Installation } from './installation.ts';
import type { MatchStatus, OperatingPoint } from './operatingPoint.ts';
import { crouchSpeedKn } from './speed.ts';
import type { ImpellerSpec } from './types.ts';

/** What Crouch's estimate needs besides power: the hull constant and loaded displacement. */
export interface SpeedBasis {
  readonly crouchConstant: number;
  readonly displacementKg: number;
}

export interface WhatIfPoint {
  readonly impellerId: string;
  readonly point: OperatingPoint;
  /** Crouch estimate at the WOT power, knots. */
  readonly speedKn: number;
}

export interface UpgradeStep {
  readonly changePct: number;
  readonly fitted: WhatIfPoint;
  /** Best-using impeller of the family at this power; null when none is matched inside the window. */
  readonly best: WhatIfPoint | null;
}

export const DEFAULT_CHANGES_PCT: readonly number[] = Object.freeze([5, 10, 15, 20, 25, 30, 35, 40, 45, 50]);

/** WOT point and speed estimate (kn) of one impeller at an engine power factor. */
export function whatIfPoint(args: { inst: Installation; impeller: ImpellerSpec; speed: SpeedBasis; powerFactor?: number }): WhatIfPoint {
  const point = solveInstallation({ ...args.inst, impeller: args.impeller }, { powerFactor: args.powerFactor });
  const shaftPowerKw = point.powerKw * args.inst.driveLine.efficiency;
  return { impellerId: args.impeller.id, point, speedKn: crouchSpeedKn({ ...args.speed, shaftPowerKw }) };
}

/** Top speed estimate (kn) and WOT point of every impeller of the family, as the engine stands. */
export function impellerTopSpeeds(args: { inst: Installation; impellers: readonly ImpellerSpec[]; speed: SpeedBasis }): WhatIfPoint[] {
  return args.impellers.map((impeller) => whatIfPoint({ inst: args.inst, impeller, speed: args.speed }));
}

/** The matched impeller taking the most power at this power factor, or null when none is matched. */
export function bestImpeller(args: { inst: Installation; impellers: readonly ImpellerSpec[]; speed: SpeedBasis; powerFactor?: number }): WhatIfPoint | null {
  let best: WhatIfPoint | null = null;
  for (const impeller of args.impellers) {
    const p = whatIfPoint({ ...args, impeller });
    if (p.point.status === 'matched' && (best === null || p.point.powerKw > best.point.powerKw)) best = p;
  }
  return best;
}

/** WOT rpm, power and speed after each engine power change (%), fitted impeller and best re-matched one. */
export function upgradeWhatIf(args: {
  inst: Installation;
  impellers: readonly ImpellerSpec[];
  speed: SpeedBasis;
  changesPct?: readonly number[];
}): { base: WhatIfPoint; steps: UpgradeStep[] } {
  const base = whatIfPoint({ inst: args.inst, impeller: args.inst.impeller, speed: args.speed });
  const steps = (args.changesPct ?? DEFAULT_CHANGES_PCT).map((changePct) => {
    const powerFactor = 1 + changePct / 100;
    return {
      changePct,
      fitted: whatIfPoint({ inst: args.inst, impeller: args.inst.impeller, speed: args.speed, powerFactor }),
      best: bestImpeller({ ...args, powerFactor }),
    };
  });
  return { base, steps };
}

/** Power factors searched: a quarter of today's engine up to four times it. */
const FACTOR_RANGE = [0.25, 4] as const;

/** Smallest factor in the range where a condition that stays true once true holds; null if never. */
function smallestFactor(holds: (f: number) => boolean): number | null {
  let lo: number = FACTOR_RANGE[0];
  let hi: number = FACTOR_RANGE[1];
  if (!holds(hi)) return null;
  if (holds(lo)) return lo;
  for (let i = 0; i < 80 && hi - lo > 1e-10 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (holds(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

export interface SpeedGainNeed {
  /** WOT shaft-side power needed: today's × (1 + gain)², engine kW. */
  readonly targetPowerKw: number;
  /** Engine power change (%) with the fitted impeller; null when the limiter or table end stops it first. */
  readonly fittedChangePct: number | null;
  /** Match status of the fitted impeller at that change (null with fittedChangePct). */
  readonly fittedStatus: MatchStatus | null;
  /** Smallest change (%) with which some impeller of the family is matched and takes the target power. */
  readonly rematchedChangePct: number | null;
  readonly rematchedImpellerId: string | null;
}

/** Engine power change (%) needed for a planing-speed gain (%), with the fitted impeller and re-matched. */
export function powerChangeForSpeedGain(args: { inst: Installation; impellers: readonly ImpellerSpec[]; gainPct: number }): SpeedGainNeed {
  const { inst } = args;
  const basePowerKw = solveInstallation(inst).powerKw;
  const targetPowerKw = basePowerKw * (1 + args.gainPct / 100) ** 2;
  const reaches = (impeller: ImpellerSpec, requireMatch: boolean) => (f: number) => {
    const p = solveInstallation({ ...inst, impeller }, { powerFactor: f });
    return p.powerKw >= targetPowerKw * (1 - 1e-9) && (!requireMatch || p.speedRpm >= inst.engine.limits.windowLowRpm) && p.status !== 'noCrossing';
  };
  const fitted = smallestFactor(reaches(inst.impeller, false));
  let rematched: { f: number; id: string } | null = null;
  for (const impeller of args.impellers) {
    // Power and rpm both rise with the factor, so "enough power and at least the window's low end" is
    // monotone; the answer counts only if the engine is then still inside the window.
    const f = smallestFactor(reaches(impeller, true));
    if (f === null || solveInstallation({ ...inst, impeller }, { powerFactor: f }).status !== 'matched') continue;
    if (rematched === null || f < rematched.f) rematched = { f, id: impeller.id };
  }
  return {
    targetPowerKw,
    fittedChangePct: fitted === null ? null : (fitted - 1) * 100,
    fittedStatus: fitted === null ? null : solveInstallation(inst, { powerFactor: fitted }).status,
    rematchedChangePct: rematched === null ? null : (rematched.f - 1) * 100,
    rematchedImpellerId: rematched?.id ?? null,
  };
}
