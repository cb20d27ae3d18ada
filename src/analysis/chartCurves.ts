/**
 * The curves a chart draws, handed to the sheets here so that sheets never call the model themselves:
 * every number a sheet shows, a point or a whole curve, comes to it through the analysis layer.
 * - an impeller's absorption law on the engine shaft, P = c·nᵏ (kW, engine rpm);
 * - an engine's full-throttle curve at given conditions (exact cubic Hermite pieces);
 * - a piece of such a curve cut to a speed range, still exact (for drawing part of a curve).
 */
import {
  hermiteSlope,
  hermiteValue,
  makeAbsorber,
  type DriveLineSpec,
  type EngineCurve,
  type HermitePiece,
  type ImpellerFamilySpec,
  type ImpellerSpec,
} from '../model/index.ts';

export type { EngineCurve, HermitePiece };
/** An engine's full-throttle curve at the site's air (or as published without one), times an extra power factor. */
export { engineCurve as engineCurveAt } from '../model/index.ts';

/** P = coefficient · rpm^exponent, kW at engine rpm: one impeller's absorption referred to the engine. */
export interface AbsorptionLaw {
  readonly coefficient: number;
  readonly exponent: number;
}

/** The absorption law of one impeller in its family, through the drive line, in water of the given density. */
export function absorptionLaw(args: {
  family: ImpellerFamilySpec;
  impeller: ImpellerSpec;
  driveLine: DriveLineSpec;
  waterDensityKgM3: number;
}): AbsorptionLaw {
  const a = makeAbsorber(args);
  return { coefficient: a.coefficient, exponent: a.exponent };
}

/** The same cubic restricted to [a, b] ⊂ [x0, x1], still in Hermite form (exact, no sampling). */
export function pieceBetween(p: HermitePiece, a: number, b: number): HermitePiece {
  if (a === p.x0 && b === p.x1) return p;
  return { x0: a, x1: b, y0: hermiteValue(p, a), y1: hermiteValue(p, b), m0: hermiteSlope(p, a), m1: hermiteSlope(p, b) };
}
