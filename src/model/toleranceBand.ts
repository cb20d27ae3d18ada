/**
 * Spread of the WOT point. The operating speed is monotone in each factor (a heavier impeller, denser
 * water or a weaker engine can only lower it; see operatingPoint.ts), so the two extreme corners bound
 * every combination inside the box and no inner samples are needed.
 */
import { solveInstallation, type Installation } from './installation.ts';
import type { OperatingPoint } from './operatingPoint.ts';

export interface OperatingBand {
  readonly nominal: OperatingPoint;
  readonly lowRpm: OperatingPoint;
  readonly highRpm: OperatingPoint;
}

/** Corners of impeller rating ± tol, engine power ± tol, water density range (default nominal only). */
export function operatingBand(inst: Installation, opts: { densityRangeKgM3?: readonly [number, number] } = {}): OperatingBand {
  const ratingTol = inst.family.tolerancePct / 100;
  const powerTol = inst.engine.powerTolerancePct / 100;
  const [densityA, densityB] = opts.densityRangeKgM3 ?? [inst.waterDensityKgM3, inst.waterDensityKgM3];
  const densest = Math.max(densityA, densityB);
  const lightest = Math.min(densityA, densityB);
  return {
    nominal: solveInstallation(inst),
    // Lowest speed: heaviest impeller, weakest engine, densest water.
    lowRpm: solveInstallation({ ...inst, waterDensityKgM3: densest }, { ratingFactor: 1 + ratingTol, powerFactor: 1 - powerTol }),
    highRpm: solveInstallation({ ...inst, waterDensityKgM3: lightest }, { ratingFactor: 1 - ratingTol, powerFactor: 1 + powerTol }),
  };
}
