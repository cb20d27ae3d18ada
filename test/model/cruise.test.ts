import { describe, expect, it } from 'vitest';
import { absorbedPowerKw, makeAbsorber } from '../../src/model/absorption.ts';
import { cruiseAtRpm, cruiseRpmAtPower } from '../../src/model/cruise.ts';
import { FAMILY, testInstallation } from './fixtures.ts';

const impellers = [
  { id: 'light', label: 'Light', ratingKw: 0.8 },
  { id: 'mid', label: 'Mid', ratingKw: 1.0 },
  { id: 'heavy', label: 'Heavy', ratingKw: 1.25 },
];
const driveLine = { ratio: 1.2, efficiency: 0.97 };

describe('cruiseRpmAtPower()', () => {
  it('gives each impeller the speed at which it takes the stated power', () => {
    const line = cruiseRpmAtPower({ family: FAMILY, impellers, driveLine, waterDensityKgM3: 1025, powerKw: 90 });
    expect(line.map((l) => l.impellerId)).toEqual(['light', 'mid', 'heavy']);
    for (const [i, l] of line.entries()) {
      const a = makeAbsorber({ family: FAMILY, impeller: impellers[i], driveLine, waterDensityKgM3: 1025 });
      expect(absorbedPowerKw(a, l.speedRpm)).toBeCloseTo(90, 9);
    }
  });

  it('moves speed by the rating ratio to the power 1/k at constant power', () => {
    // Common practice, no source (follows from the cube law): n_B / n_A = (P_ref,A / P_ref,B)^(1/k).
    const [light, , heavy] = cruiseRpmAtPower({ family: FAMILY, impellers, driveLine, waterDensityKgM3: 1025, powerKw: 120 });
    expect(heavy.speedRpm / light.speedRpm).toBeCloseTo((0.8 / 1.25) ** (1 / 3), 12);
  });
});

describe('cruiseAtRpm()', () => {
  it('reports the fitted impeller’s power at the cruise rpm and the rpm each alternative needs for it', () => {
    // Fitted 1 kW impeller, direct drive, η = 0.97, ρ = ρref: P = (4.2)³ / 0.97 = 76.3802 kW at 4200 rpm.
    const out = cruiseAtRpm({ inst: testInstallation(), alternatives: [impellers[0], impellers[2]], speedRpm: 4200 });
    expect(out.powerKw).toBeCloseTo(4.2 ** 3 / 0.97, 9);
    expect(out.alternatives[0]).toEqual({ impellerId: 'light', speedRpm: expect.closeTo(4200 * (1 / 0.8) ** (1 / 3), 6) });
    expect(out.alternatives[1].speedRpm).toBeCloseTo(4200 * (1 / 1.25) ** (1 / 3), 6);
  });
});
