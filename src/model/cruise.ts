/**
 * Constant-power cruise lines: at a fixed engine-side power each impeller turns at its own speed,
 * n = (P / c)^(1/k) from the absorption law; the engine must simply be able to make that power there.
 */
import { absorbedPowerKw, makeAbsorber, speedAtAbsorbedPowerRpm } from './absorption.ts';
import { installationAbsorber, type Installation } from './installation.ts';
import type { DriveLineSpec, ImpellerFamilySpec, ImpellerSpec } from './types.ts';

/** Engine rpm at which each impeller of the family takes the given engine-side power (constant-power line). */
export function cruiseRpmAtPower(args: {
  family: ImpellerFamilySpec;
  impellers: readonly ImpellerSpec[];
  driveLine: DriveLineSpec;
  waterDensityKgM3: number;
  powerKw: number;
}): { impellerId: string; speedRpm: number }[] {
  return args.impellers.map((impeller) => {
    const absorber = makeAbsorber({ family: args.family, impeller, driveLine: args.driveLine, waterDensityKgM3: args.waterDensityKgM3 });
    return { impellerId: impeller.id, speedRpm: speedAtAbsorbedPowerRpm(absorber, args.powerKw) };
  });
}

/** With the fitted impeller at a cruise rpm: the power, and the rpm each alternative needs for the same power. */
export function cruiseAtRpm(args: { inst: Installation; alternatives: readonly ImpellerSpec[]; speedRpm: number }): {
  powerKw: number;
  alternatives: { impellerId: string; speedRpm: number }[];
} {
  const { inst } = args;
  const powerKw = absorbedPowerKw(installationAbsorber(inst), args.speedRpm);
  const alternatives = cruiseRpmAtPower({
    family: inst.family,
    impellers: args.alternatives,
    driveLine: inst.driveLine,
    waterDensityKgM3: inst.waterDensityKgM3,
    powerKw,
  });
  return { powerKw, alternatives };
}
