import { describe, expect, it } from 'vitest';
import { PLANING_FROUDE_VOLUME, planingSpeedKn, volumeFroudeNumber } from '../../src/model/index.ts';

describe('planingSpeedKn()', () => {
  it('is the speed at which the volume Froude number V / sqrt(g ∇^(1/3)) reaches 3', () => {
    // Fn∇ > 3 as the planing range: Savitsky, Hydrodynamic Design of Planing Hulls (1964), from memory.
    expect(PLANING_FROUDE_VOLUME).toBe(3);
    // 1000 kg in water of 1000 kg/m³ displaces 1 m³: V = 3 · sqrt(9.80665 m/s²) = 9.3946 m/s = 18.262 kn
    // (standard gravity and the international nautical mile, NIST SP 811 appendix B).
    expect(planingSpeedKn({ displacementKg: 1000, waterDensityKgM3: 1000 })).toBeCloseTo((3 * Math.sqrt(9.80665) * 3600) / 1852, 9);
    expect(planingSpeedKn({ displacementKg: 1000, waterDensityKgM3: 1000 })).toBeCloseTo(18.262, 3);
  });

  it('rises with the sixth root of displacement: 64 times heavier planes twice as fast', () => {
    const light = planingSpeedKn({ displacementKg: 500, waterDensityKgM3: 1025 });
    expect(planingSpeedKn({ displacementKg: 500 * 64, waterDensityKgM3: 1025 })).toBeCloseTo(2 * light, 9);
  });

  it('gives the Froude number back: 3 at the planing speed, in proportion to speed', () => {
    const hull = { displacementKg: 3000, waterDensityKgM3: 1026 };
    expect(volumeFroudeNumber({ ...hull, speedKn: planingSpeedKn(hull) })).toBeCloseTo(3, 12);
    expect(volumeFroudeNumber({ ...hull, speedKn: planingSpeedKn(hull) / 2 })).toBeCloseTo(1.5, 12);
  });
});
