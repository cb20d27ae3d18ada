/**
 * Power an impeller absorbs, from the pump affinity law P ∝ ρ·n³·D⁵ for one impeller in one housing:
 *   P_impeller(n_imp) = rating · (n_imp / n_ref)^k · (ρ / ρ_ref)
 * referred to the engine through the ratio (n_imp = n_engine / ratio) and the drive-line efficiency:
 *   P_engine(n) = rating · ((n / ratio) / n_ref)^k · (ρ / ρ_ref) / efficiency = coefficient · n^k.
 */
import { ModelInputError } from './errors.ts';
import type { DriveLineSpec, ImpellerFamilySpec, ImpellerSpec } from './types.ts';

export interface Absorber {
  /** Impeller rating with any rating factor applied, kW at the reference speed and density. */
  readonly ratingKw: number;
  readonly referenceSpeedRpm: number;
  readonly exponent: number;
  readonly ratio: number;
  readonly efficiency: number;
  readonly densityRatio: number;
  /** Precomputed c in P_engine = c · n^k (kW, n engine rpm). */
  readonly coefficient: number;
  /** ln c, for the solver's per-piece screen. */
  readonly lnCoefficient: number;
}

/** Absorption of one impeller at one water density, referred to the engine shaft. */
export function makeAbsorber(args: {
  family: ImpellerFamilySpec;
  impeller: ImpellerSpec;
  driveLine: DriveLineSpec;
  waterDensityKgM3: number;
  ratingFactor?: number;
}): Absorber {
  const { family, impeller, driveLine } = args;
  const ratingKw = impeller.ratingKw * (args.ratingFactor ?? 1);
  const where = `impeller ${impeller.id}`;
  positive(where, 'rating_kw (with tolerance factor)', ratingKw);
  positive(where, 'reference speed rpm', family.referenceSpeedRpm);
  positive(where, 'drive ratio', driveLine.ratio);
  positive(where, 'water density kg/m³', args.waterDensityKgM3);
  positive(where, 'reference water density kg/m³', family.referenceDensityKgM3);
  if (!(driveLine.efficiency > 0 && driveLine.efficiency <= 1)) {
    throw new ModelInputError(`${where}: drive-line efficiency must be in (0, 1], found ${driveLine.efficiency}; 0.97 is typical`);
  }
  if (!(family.exponent > 1 && family.exponent <= 5)) {
    throw new ModelInputError(`${where}: absorption exponent must be above 1 and at most 5, found ${family.exponent}; 3 is the affinity law`);
  }
  const densityRatio = args.waterDensityKgM3 / family.referenceDensityKgM3;
  const k = family.exponent;
  const coefficient = (ratingKw * densityRatio) / driveLine.efficiency / Math.pow(family.referenceSpeedRpm * driveLine.ratio, k);
  return Object.freeze({
    ratingKw,
    referenceSpeedRpm: family.referenceSpeedRpm,
    exponent: k,
    ratio: driveLine.ratio,
    efficiency: driveLine.efficiency,
    densityRatio,
    coefficient,
    lnCoefficient: Math.log(coefficient),
  });
}

function positive(where: string, field: string, value: number): void {
  if (!(value > 0 && Number.isFinite(value))) {
    throw new ModelInputError(`${where}: ${field} must be a positive number, found ${value}`);
  }
}

/** Power the engine must deliver (kW) to turn the impeller at this engine speed (drive-line losses included). */
export function absorbedPowerKw(a: Absorber, engineSpeedRpm: number): number {
  const n = engineSpeedRpm;
  // The cube is the usual case; a plain product is exact-ish and much cheaper than pow.
  return a.exponent === 3 ? a.coefficient * n * n * n : a.coefficient * Math.pow(n, a.exponent);
}

/** Inverse: engine rpm at which the impeller takes this engine-side power (0 rpm for power ≤ 0). */
export function speedAtAbsorbedPowerRpm(a: Absorber, engineSidePowerKw: number): number {
  return engineSidePowerKw > 0 ? Math.pow(engineSidePowerKw / a.coefficient, 1 / a.exponent) : 0;
}
