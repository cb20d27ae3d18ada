import { describe, expect, it } from 'vitest';
import { absorbedPowerKw, makeAbsorber } from '../../src/model/absorption.ts';
import { engineCurve } from '../../src/model/engineCurve.ts';
import { operatingPoint, REASONS, type OperatingPoint } from '../../src/model/operatingPoint.ts';
import type { EngineSpec } from '../../src/model/types.ts';
import { FAMILY, LIMITS, rows, testEngine } from './fixtures.ts';

function solve(engine: EngineSpec, ratingKw: number, driveLine = { ratio: 1, efficiency: 1 }, exponent = 3): OperatingPoint {
  const absorber = makeAbsorber({
    family: { ...FAMILY, exponent },
    impeller: { id: 'i', label: 'I', ratingKw },
    driveLine,
    waterDensityKgM3: FAMILY.referenceDensityKgM3,
  });
  return operatingPoint({ curve: engineCurve(engine), absorber, limits: engine.limits });
}

/** A flat curve: constant power from 1000 to 7000 rpm. */
const flat = (powerKw: number) => testEngine({ points: rows([[1000, powerKw], [3000, powerKw], [5000, powerKw], [7000, powerKw]]) });

describe('operatingPoint()', () => {
  it('returns the lowest speed at which surplus power turns negative (flat curve, closed form)', () => {
    // 200 kW = 1.0 · (n/1000)³ → n = 1000 · 200^(1/3) = 5848.04 rpm.
    const op = solve(flat(200), 1.0);
    expect(op.status).toBe('matched');
    expect(op.speedRpm).toBeCloseTo(1000 * Math.cbrt(200), 7);
    expect(op.powerKw).toBeCloseTo(200, 9);
    expect(op.unusedPowerKw).toBe(0);
    expect(op.reason).toBe(REASONS.matched);
  });

  it('reports belowWindow for a heavy impeller and aboveWindow for a light one', () => {
    const heavy = solve(flat(200), 1.6);
    expect(heavy.status).toBe('belowWindow');
    expect(heavy.speedRpm).toBeLessThan(LIMITS.windowLowRpm);
    const light = solve(flat(200), 0.8);
    expect(light.status).toBe('aboveWindow');
    expect(light.speedRpm).toBeCloseTo(1000 * Math.cbrt(250), 7);
  });

  it('holds the engine at maxRpm and reports the unused power when the impeller is too light (revLimited)', () => {
    const op = solve(flat(200), 0.3);
    expect(op.status).toBe('revLimited');
    expect(op.speedRpm).toBe(LIMITS.maxRpm);
    // At 6500 rpm the impeller takes 0.3 · 6.5³ = 82.3875 kW; the engine could give 200.
    expect(op.powerKw).toBeCloseTo(82.3875, 9);
    expect(op.unusedPowerKw).toBeCloseTo(200 - 82.3875, 9);
  });

  it('reports noCrossing when the impeller takes more than the engine makes at the table start', () => {
    const op = solve(testEngine(), 50);
    expect(op).toMatchObject({ status: 'noCrossing', speedRpm: 2000, powerKw: 60, reason: REASONS.tooHeavyAtStart });
  });

  it('reports noCrossing when the table ends below maxRpm with surplus left', () => {
    const op = solve(testEngine({ points: rows([[2000, 60], [4000, 160], [5000, 200]]) }), 0.5);
    expect(op).toMatchObject({ status: 'noCrossing', speedRpm: 5000, powerKw: 200, reason: REASONS.tableEndsLow });
  });

  it('reports noCrossing for a table that starts above maxRpm', () => {
    const op = solve(testEngine({ points: rows([[6600, 200], [7000, 210]]) }), 1);
    expect(op).toMatchObject({ status: 'noCrossing', speedRpm: 6600, reason: REASONS.tableAboveMax });
  });

  it('reports a one-row table explicitly instead of guessing a curve', () => {
    const op = solve(testEngine({ points: rows([[5800, 200]]) }), 1);
    expect(op).toMatchObject({ status: 'noCrossing', speedRpm: 5800, powerKw: 200, reason: REASONS.singlePoint });
  });

  it('picks the first of several crossings (a dip in the table)', () => {
    // Absorption 80 kW at 4000 rpm; the table dips to 50 kW there, then recovers above the cube.
    const engine = testEngine({ points: rows([[2000, 100], [3000, 100], [4000, 50], [5000, 300], [6000, 400], [6500, 400]]) });
    const op = solve(engine, 80 / 64);
    expect(op.status).toBe('belowWindow');
    expect(op.speedRpm).toBeGreaterThan(3000);
    expect(op.speedRpm).toBeLessThan(4000);
    expect(Math.abs(op.powerKw - (80 / 64) * (op.speedRpm / 1000) ** 3)).toBeLessThan(1e-9 * op.powerKw);
  });

  it('crosses on a flat run and on the falling side past the power peak', () => {
    const engine = testEngine({ points: rows([[2000, 60], [4000, 150], [5000, 150], [5500, 150], [6000, 140], [6500, 100]]) });
    // Flat 150 kW run: 150 = r · 5.2³ with r chosen so the crossing is at 5200 rpm.
    expect(solve(engine, 150 / 5.2 ** 3).speedRpm).toBeCloseTo(5200, 7);
    const falling = solve(engine, 0.7);
    expect(falling.speedRpm).toBeGreaterThan(5500);
    expect(falling.speedRpm).toBeLessThan(6500);
    expect(Math.abs(falling.powerKw - 0.7 * (falling.speedRpm / 1000) ** 3)).toBeLessThan(1e-9 * falling.powerKw);
  });

  it('handles reduction ratios and efficiencies far from 1 (closed form on a flat curve)', () => {
    // Engine side: 200 = (r/η) · (n/(ratio·1000))^k → n = ratio · 1000 · (200·η/r)^(1/k).
    const cases = [
      { ratio: 2.5, efficiency: 0.6, ratingKw: 10, exponent: 3 },
      { ratio: 0.4, efficiency: 0.95, ratingKw: 5, exponent: 2.5 },
    ];
    for (const c of cases) {
      const engine = flat(200);
      const op = solve({ ...engine, limits: { idleRpm: 500, windowLowRpm: 900, windowHighRpm: 6900, maxRpm: 7000 } }, c.ratingKw, c, c.exponent);
      const expected = c.ratio * 1000 * ((200 * c.efficiency) / c.ratingKw) ** (1 / c.exponent);
      expect(op.status).toBe('matched');
      expect(op.speedRpm).toBeCloseTo(expected, 6);
    }
  });

  it('never returns NaN, even for degenerate inputs', () => {
    const engines = [testEngine(), flat(0), testEngine({ points: rows([[2000, 0], [7000, 0]]) }), testEngine({ points: rows([[5800, 0]]) })];
    for (const engine of engines) {
      for (const rating of [1e-6, 0.01, 1, 100, 1e6]) {
        const op = solve(engine, rating);
        for (const v of [op.speedRpm, op.powerKw, op.unusedPowerKw]) expect(Number.isFinite(v)).toBe(true);
      }
    }
  });

  it('gives powerKw equal to what the impeller absorbs at the crossing', () => {
    const absorber = makeAbsorber({ family: FAMILY, impeller: { id: 'i', label: 'I', ratingKw: 1 }, driveLine: { ratio: 1.2, efficiency: 0.96 }, waterDensityKgM3: 1000 });
    const op = operatingPoint({ curve: engineCurve(testEngine()), absorber, limits: LIMITS });
    expect(op.powerKw / absorbedPowerKw(absorber, op.speedRpm)).toBeCloseTo(1, 12);
  });
});

describe('operatingPoint() inside one piece', () => {
  it('finds a crossing inside a piece whose two rows both show surplus', () => {
    // Rows 4000 → 5000 rpm: the interpolant leaves 4000 rpm almost flat (slope 0.001 kW/rpm) while the
    // impeller, taking 100 kW at 4000 rpm, climbs at 0.075 kW/rpm: surplus 0.5 kW at 4000 rpm turns
    // negative within ~100 rpm, then recovers (300 vs 195 kW at 5000 rpm), so both rows show surplus.
    const engine = testEngine({ points: rows([[3000, 100], [4000, 100.5], [5000, 300], [6000, 330], [6500, 330]]) });
    const op = solve(engine, 100 / 64);
    expect(op.speedRpm).toBeGreaterThan(4000);
    expect(op.speedRpm).toBeLessThan(4100);
    expect(op.status).toBe('belowWindow');
  });
});
