/**
 * Engine power changes (tuning, wear, a different engine of the same shape): the whole full-throttle
 * curve scales by (1 + changePct/100) and the WOT point is solved again. Because the impeller's
 * absorption rises as n^k, x % more power moves WOT speed by roughly only x/k % on a flat-topped curve.
 */
import { absorbedPowerKw } from './absorption.ts';
import { engineCurve } from './engineCurve.ts';
import { installationAbsorber, solveInstallation, type Installation } from './installation.ts';
import type { OperatingPoint } from './operatingPoint.ts';

/** WOT point after an engine power change of changePct (e.g. +10). */
export function upgradeOperatingPoint(inst: Installation, changePct: number): OperatingPoint {
  return solveInstallation(inst, { powerFactor: 1 + changePct / 100 });
}

/** Relative tolerance on reaching the target speed. */
const RPM_TOL = 1e-9;

/** Power change (%) needed to reach targetRpm with the same impeller; null when not reachable below max rpm. */
export function powerChangeForRpm(inst: Installation, targetRpm: number): number | null {
  const curve = engineCurve(inst.engine, { ambient: inst.ambient });
  const top = Math.min(curve.maxRpm, inst.engine.limits.maxRpm);
  if (!(targetRpm >= curve.minRpm && targetRpm < top) || curve.pieces.length === 0) return null;
  const availableKw = curve.powerKwUnchecked(targetRpm);
  if (!(availableKw > 0)) return null;
  // Scaling the curve by f puts a crossing at the target when f·available = absorbed there.
  let factor = absorbedPowerKw(installationAbsorber(inst), targetRpm) / availableKw;
  const reaches = (f: number) => solveInstallation(inst, { powerFactor: f }).speedRpm >= targetRpm * (1 - RPM_TOL);
  if (!reaches(factor)) {
    // An earlier crossing (a dip in the curve) still holds the engine below the target: the WOT speed rises
    // monotonically with the factor, so bisect for the smallest factor that gets past it.
    let lowF = factor;
    let highF = factor * 2;
    for (let i = 0; i < 60 && !reaches(highF); i++) highF *= 2;
    if (!reaches(highF)) return null;
    for (let i = 0; i < 100 && highF - lowF > 1e-12 * highF; i++) {
      const mid = 0.5 * (lowF + highF);
      if (reaches(mid)) highF = mid;
      else lowF = mid;
    }
    factor = highF;
  }
  return (factor - 1) * 100;
}
