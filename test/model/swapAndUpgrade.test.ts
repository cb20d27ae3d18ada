import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeAbsorber } from '../../src/model/absorption.ts';
import { engineCurve } from '../../src/model/engineCurve.ts';
import { operatingPoint } from '../../src/model/operatingPoint.ts';
import { solveInstallation } from '../../src/model/installation.ts';
import { swapFromKnownPoint } from '../../src/model/swap.ts';
import { powerChangeForRpm, upgradeOperatingPoint } from '../../src/model/upgrade.ts';
import { FAMILY, PROPERTY_RUNS, rows, testEngine, testInstallation } from './fixtures.ts';

const flatEngine = testEngine({ points: rows([[1000, 200], [4000, 200], [7000, 200]]) });
/** Constant torque as a table: P = 0.035 kW/rpm · n. */
const torqueTable = testEngine({ points: rows([[1000, 35], [3000, 105], [5000, 175], [7000, 245]]) });
const impeller = (ratingKw: number) => ({ id: `r${ratingKw}`, label: `${ratingKw} kW`, ratingKw });

describe('swapFromKnownPoint()', () => {
  it('scales speed by the square root of the rating ratio when k = 3', () => {
    // Constant torque with the cube law: n_B = n_A · sqrt(rating_A / rating_B) (DOMAIN.md; common practice, no source).
    const out = swapFromKnownPoint({ knownRpm: 5800, knownPowerKw: 210, fromRatingKw: 1.0, toRatingKw: 0.81, exponent: 3 });
    expect(out.speedRpm).toBeCloseTo(5800 / 0.9, 9);
    expect(out.powerKw).toBeCloseTo(210 / 0.9, 9);
  });

  it('equals the full solve exactly when the engine table itself is constant torque', () => {
    const instA = testInstallation({ engine: torqueTable, impeller: impeller(1.2) });
    const a = solveInstallation(instA);
    const b = solveInstallation({ ...instA, impeller: impeller(1.0) });
    expect(b.status).toBe('matched');
    const est = swapFromKnownPoint({ knownRpm: a.speedRpm, knownPowerKw: a.powerKw, fromRatingKw: 1.2, toRatingKw: 1.0, exponent: 3 });
    expect(est.speedRpm).toBeCloseTo(b.speedRpm, 6);
    expect(est.powerKw).toBeCloseTo(b.powerKw, 6);
  });

  it('matches the solver on a known-point (constant-torque) engine, which matches the closed form', () => {
    fc.assert(
      fc.property(
        fc.record({
          knownRpm: fc.double({ min: 3000, max: 6000, noNaN: true }),
          knownPowerKw: fc.double({ min: 20, max: 600, noNaN: true }),
          load: fc.double({ min: 0.8, max: 1.25, noNaN: true }),
          ratingRatio: fc.double({ min: 0.8, max: 1.25, noNaN: true }),
          exponent: fc.double({ min: 2, max: 4, noNaN: true }),
        }),
        ({ knownRpm, knownPowerKw, load, ratingRatio, exponent }) => {
          const engine = testEngine({ curve: { kind: 'knownPoint', point: { speedRpm: knownRpm, powerKw: knownPowerKw } }, limits: { idleRpm: 500, windowLowRpm: 1000, windowHighRpm: 9000, maxRpm: 10000 } });
          const family = { ...FAMILY, exponent };
          const driveLine = { ratio: 1, efficiency: 1 };
          const fromRatingKw = (load * knownPowerKw) / (knownRpm / 1000) ** exponent;
          const toRatingKw = fromRatingKw * ratingRatio;
          const solve = (ratingKw: number) =>
            operatingPoint({
              curve: engineCurve(engine),
              absorber: makeAbsorber({ family, impeller: impeller(ratingKw), driveLine, waterDensityKgM3: FAMILY.referenceDensityKgM3 }),
              limits: engine.limits,
            });
          const a = solve(fromRatingKw);
          expect(a.status).not.toBe('revLimited');
          // Closed form on a constant-torque line: P0·n/n0 = c·n^k → n = (P0 / (n0·c))^(1/(k−1)).
          const c = fromRatingKw / 1000 ** exponent;
          expect(a.speedRpm).toBeCloseTo((knownPowerKw / (knownRpm * c)) ** (1 / (exponent - 1)), 6);
          const b = solve(toRatingKw);
          const est = swapFromKnownPoint({ knownRpm: a.speedRpm, knownPowerKw: a.powerKw, fromRatingKw, toRatingKw, exponent });
          expect(est.speedRpm / b.speedRpm).toBeCloseTo(1, 10);
          expect(est.powerKw / b.powerKw).toBeCloseTo(1, 10);
        },
      ),
      PROPERTY_RUNS,
    );
  });

  it('exaggerates the rpm change against a full curve whose torque falls with speed, by a few percent', () => {
    // The default test table's torque falls above ~4000 rpm, so the real power lies below the
    // constant-torque line above the known point and above it below: both swaps overshoot.
    const inst = testInstallation({ impeller: impeller(1.0) });
    const known = solveInstallation(inst);
    for (const to of [0.8, 1.25]) {
      const full = solveInstallation({ ...inst, impeller: impeller(to) });
      const est = swapFromKnownPoint({ knownRpm: known.speedRpm, knownPowerKw: known.powerKw, fromRatingKw: 1.0, toRatingKw: to, exponent: 3 });
      const fullChange = full.speedRpm - known.speedRpm;
      const estChange = est.speedRpm - known.speedRpm;
      expect(Math.sign(estChange)).toBe(Math.sign(fullChange));
      expect(Math.abs(estChange)).toBeGreaterThan(Math.abs(fullChange));
      expect(Math.abs(est.speedRpm / full.speedRpm - 1)).toBeLessThan(0.05);
    }
  });
});

describe('upgradeOperatingPoint()', () => {
  it('moves WOT rpm by about a third of the power gain on a flat-topped curve', () => {
    // Common practice, no source: x % more power → about x/3 % more WOT rpm; exactly 1.1^(1/3) − 1 = 3.23 % here.
    const inst = testInstallation({ engine: flatEngine });
    const before = solveInstallation(inst).speedRpm;
    expect(upgradeOperatingPoint(inst, 10).speedRpm / before).toBeCloseTo(1.1 ** (1 / 3), 9);
  });

  it('moves it by the square root instead on a constant-torque curve (the curve shape matters)', () => {
    const inst = testInstallation({ engine: torqueTable });
    const before = solveInstallation(inst).speedRpm;
    expect(upgradeOperatingPoint(inst, 10).speedRpm / before).toBeCloseTo(Math.sqrt(1.1), 9);
  });
});

describe('powerChangeForRpm()', () => {
  it('inverts upgradeOperatingPoint()', () => {
    const inst = testInstallation({ impeller: impeller(1.3) });
    for (const pct of [-8, 4, 12]) {
      expect(powerChangeForRpm(inst, upgradeOperatingPoint(inst, pct).speedRpm)).toBeCloseTo(pct, 6);
    }
  });

  it('is null when the target is at or above the maximum speed or outside the table', () => {
    const inst = testInstallation();
    expect(powerChangeForRpm(inst, 6500)).toBeNull();
    expect(powerChangeForRpm(inst, 7000)).toBeNull();
    expect(powerChangeForRpm(inst, 1500)).toBeNull();
  });

  it('finds the smallest change that gets past an earlier crossing in a dip', () => {
    // The table dips to 50 kW at 4000 rpm; the impeller holds the engine there until power is raised enough.
    const engine = testEngine({ points: rows([[2000, 100], [3000, 100], [4000, 50], [5000, 300], [6000, 400], [6500, 400]]) });
    const inst = testInstallation({ engine, impeller: impeller(80 / 64), driveLine: { ratio: 1, efficiency: 1 } });
    const pct = powerChangeForRpm(inst, 5500);
    expect(pct).not.toBeNull();
    expect(upgradeOperatingPoint(inst, pct!).speedRpm).toBeGreaterThanOrEqual(5500 * (1 - 1e-9));
    expect(upgradeOperatingPoint(inst, pct! - 0.01).speedRpm).toBeLessThan(4500);
  });
});
