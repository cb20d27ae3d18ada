import { describe, expect, it } from 'vitest';
import { absorbedPowerKw, makeAbsorber, speedAtAbsorbedPowerRpm } from '../../src/model/absorption.ts';
import { FRESH_WATER_KG_M3, SALT_WATER_KG_M3 } from '../../src/model/water.ts';
import { FAMILY } from './fixtures.ts';

const absorber = (over: { ratingKw?: number; ratio?: number; efficiency?: number; density?: number; exponent?: number; ratingFactor?: number } = {}) =>
  makeAbsorber({
    family: { ...FAMILY, exponent: over.exponent ?? 3 },
    impeller: { id: 'a', label: 'A', ratingKw: over.ratingKw ?? 1.2 },
    driveLine: { ratio: over.ratio ?? 1, efficiency: over.efficiency ?? 1 },
    waterDensityKgM3: over.density ?? FAMILY.referenceDensityKgM3,
    ratingFactor: over.ratingFactor,
  });

describe('water densities', () => {
  it('are the ITTC 7.5-02-01-03 values at 15 °C', () => {
    expect(FRESH_WATER_KG_M3).toBe(999.1026); // ITTC 7.5-02-01-03 Rev 02 (2011), fresh water at 15 °C
    expect(SALT_WATER_KG_M3).toBe(1026.021); // ITTC 7.5-02-01-03 Rev 02 (2011), seawater S = 35.165 g/kg at 15 °C
  });
});

describe('absorbedPowerKw()', () => {
  it('takes the rating at the reference speed with direct drive, full efficiency and reference water', () => {
    expect(absorbedPowerKw(absorber(), 1000)).toBeCloseTo(1.2, 12);
  });

  it('follows the affinity law P2/P1 = (n2/n1)³', () => {
    // KSB Centrifugal Pump Lexicon, "Pump affinity laws": P ∝ n³ for one impeller (REFERENCES.md).
    const a = absorber();
    expect(absorbedPowerKw(a, 5500) / absorbedPowerKw(a, 4000)).toBeCloseTo((5500 / 4000) ** 3, 12);
    // Common practice, no source: doubling speed needs 8 times the power.
    expect(absorbedPowerKw(a, 6000) / absorbedPowerKw(a, 3000)).toBeCloseTo(8, 12);
  });

  it('scales with water density: salt water takes about 2.7 % more than fresh', () => {
    // Affinity law P ∝ ρ (KSB lexicon); densities from ITTC 7.5-02-01-03 at 15 °C: 1026.021 / 999.1026 = 1.0269426.
    const ratio = absorbedPowerKw(absorber({ density: SALT_WATER_KG_M3 }), 5000) / absorbedPowerKw(absorber({ density: FRESH_WATER_KG_M3 }), 5000);
    expect(ratio).toBeCloseTo(1.0269426, 6);
  });

  it('refers impeller power to the engine through the ratio and the drive-line efficiency', () => {
    // Impeller turns at n/ratio; the engine must also cover the losses: P_engine = P_impeller / efficiency.
    const geared = absorber({ ratio: 1.5, efficiency: 0.95 });
    expect(absorbedPowerKw(geared, 1500)).toBeCloseTo(1.2 / 0.95, 12);
    expect(absorbedPowerKw(geared, 6000)).toBeCloseTo((1.2 * (4000 / 1000) ** 3) / 0.95, 9);
  });

  it('uses a family exponent other than 3 when the data says so, and the rating factor', () => {
    const a = absorber({ exponent: 2.7, ratingFactor: 1.05 });
    expect(absorbedPowerKw(a, 5000)).toBeCloseTo(1.2 * 1.05 * 5 ** 2.7, 9);
    expect(a.ratingKw).toBeCloseTo(1.26, 12);
  });
});

describe('speedAtAbsorbedPowerRpm()', () => {
  it('inverts absorbedPowerKw()', () => {
    for (const a of [absorber(), absorber({ exponent: 2.4, ratio: 2.2, efficiency: 0.7 })]) {
      expect(absorbedPowerKw(a, speedAtAbsorbedPowerRpm(a, 187.5))).toBeCloseTo(187.5, 9);
    }
  });

  it('answers 0 rpm, not NaN, for zero or negative power', () => {
    expect(speedAtAbsorbedPowerRpm(absorber(), 0)).toBe(0);
    expect(speedAtAbsorbedPowerRpm(absorber(), -5)).toBe(0);
  });
});

describe('makeAbsorber()', () => {
  it('rejects inputs no impeller can have, naming the field and the value', () => {
    expect(() => absorber({ efficiency: 1.2 })).toThrow(/efficiency must be in \(0, 1\], found 1.2/);
    expect(() => absorber({ ratio: 0 })).toThrow(/drive ratio must be a positive number, found 0/);
    expect(() => absorber({ ratingKw: -3 })).toThrow(/rating_kw .* found -3/);
    expect(() => absorber({ exponent: 1 })).toThrow(/exponent/);
  });
});
