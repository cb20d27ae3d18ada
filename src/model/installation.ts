/**
 * One fitted installation (engine, site air, jet unit's impeller, drive line, water) and its WOT solve.
 * Convenience for sheets and the build: everything is recomputed from the inputs, nothing cached.
 */
import { makeAbsorber, type Absorber } from './absorption.ts';
import { engineCurve } from './engineCurve.ts';
import { operatingPoint, type OperatingPoint } from './operatingPoint.ts';
import type { Ambient, DriveLineSpec, EngineSpec, ImpellerFamilySpec, ImpellerSpec } from './types.ts';

export interface Installation {
  readonly engine: EngineSpec;
  readonly ambient: Ambient;
  readonly family: ImpellerFamilySpec;
  readonly impeller: ImpellerSpec;
  readonly driveLine: DriveLineSpec;
  readonly waterDensityKgM3: number;
}

/** Absorber of the installation's impeller, optionally with its rating scaled (tolerance corners). */
export function installationAbsorber(inst: Installation, opts: { ratingFactor?: number } = {}): Absorber {
  return makeAbsorber({
    family: inst.family,
    impeller: inst.impeller,
    driveLine: inst.driveLine,
    waterDensityKgM3: inst.waterDensityKgM3,
    ratingFactor: opts.ratingFactor,
  });
}

/** WOT operating point (rpm, kW) of the installation at its site air; factors scale rating and engine power. */
export function solveInstallation(inst: Installation, opts: { ratingFactor?: number; powerFactor?: number } = {}): OperatingPoint {
  const curve = engineCurve(inst.engine, { ambient: inst.ambient, powerFactor: opts.powerFactor });
  return operatingPoint({ curve, absorber: installationAbsorber(inst, opts), limits: inst.engine.limits });
}
