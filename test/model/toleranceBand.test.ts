import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveInstallation } from '../../src/model/installation.ts';
import { operatingBand } from '../../src/model/toleranceBand.ts';
import { FRESH_WATER_KG_M3, SALT_WATER_KG_M3 } from '../../src/model/water.ts';
import { arbMatch, installationFrom, PROPERTY_RUNS, rows, testEngine, testInstallation } from './fixtures.ts';

describe('operatingBand()', () => {
  it('spreads ±5 % rating and ±5 % engine power into a WOT rpm band around the nominal', () => {
    // ±5 % rating tolerance: common practice, no source. Flat 200 kW curve, rating 1 kW at 1000 rpm, η = 0.97:
    // n = 1000 · (P·η / r)^(1/3): nominal (194)^(1/3), low (0.95·194/1.05)^(1/3), high (1.05·194/0.95)^(1/3).
    const flat = testEngine({ points: rows([[1000, 200], [4000, 200], [7000, 200]]) });
    const band = operatingBand(testInstallation({ engine: flat, waterDensityKgM3: 1025 }));
    expect(band.nominal.speedRpm).toBeCloseTo(1000 * Math.cbrt(194), 6);
    expect(band.lowRpm.speedRpm).toBeCloseTo(1000 * Math.cbrt((0.95 * 194) / 1.05), 6);
    expect(band.highRpm.speedRpm).toBeCloseTo(1000 * Math.cbrt((1.05 * 194) / 0.95), 6);
  });

  it('widens with a water density range: salt water lowers the low corner', () => {
    const inst = testInstallation({ waterDensityKgM3: FRESH_WATER_KG_M3 });
    const fresh = operatingBand(inst);
    const both = operatingBand(inst, { densityRangeKgM3: [SALT_WATER_KG_M3, FRESH_WATER_KG_M3] });
    expect(both.lowRpm.speedRpm).toBeLessThan(fresh.lowRpm.speedRpm);
    expect(both.highRpm.speedRpm).toBe(fresh.highRpm.speedRpm);
  });

  it('always contains the nominal point', () => {
    fc.assert(
      fc.property(arbMatch, (m) => {
        const band = operatingBand(installationFrom(m), { densityRangeKgM3: [FRESH_WATER_KG_M3, SALT_WATER_KG_M3] });
        expect(band.lowRpm.speedRpm).toBeLessThanOrEqual(band.nominal.speedRpm * (1 + 1e-12));
        expect(band.nominal.speedRpm).toBeLessThanOrEqual(band.highRpm.speedRpm * (1 + 1e-12));
      }),
      PROPERTY_RUNS,
    );
  });

  it('bounds every combination inside the tolerance box by its two corners', () => {
    const share = fc.double({ min: -1, max: 1, noNaN: true });
    fc.assert(
      fc.property(arbMatch, share, share, fc.double({ min: 0, max: 1, noNaN: true }), (m, r, p, d) => {
        const inst = installationFrom(m);
        const range = [FRESH_WATER_KG_M3, SALT_WATER_KG_M3] as const;
        const band = operatingBand(inst, { densityRangeKgM3: range });
        const inner = solveInstallation(
          { ...inst, waterDensityKgM3: range[0] + d * (range[1] - range[0]) },
          { ratingFactor: 1 + (r * inst.family.tolerancePct) / 100, powerFactor: 1 + (p * inst.engine.powerTolerancePct) / 100 },
        );
        expect(inner.speedRpm).toBeGreaterThanOrEqual(band.lowRpm.speedRpm * (1 - 1e-12));
        expect(inner.speedRpm).toBeLessThanOrEqual(band.highRpm.speedRpm * (1 + 1e-12));
      }),
      PROPERTY_RUNS,
    );
  });
});
