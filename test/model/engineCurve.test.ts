import { describe, expect, it } from 'vitest';
import { correctionFactor } from '../../src/model/ambient.ts';
import { engineCurve } from '../../src/model/engineCurve.ts';
import { REFERENCE_AIR, rows, testEngine } from './fixtures.ts';

describe('engineCurve()', () => {
  it('returns the table values at the table speeds and a status outside the table', () => {
    const curve = engineCurve(testEngine());
    expect(curve.kind).toBe('table');
    expect([curve.minRpm, curve.maxRpm]).toEqual([2000, 6500]);
    expect(curve.powerAt(4000)).toEqual({ status: 'ok', powerKw: 160 });
    expect(curve.powerAt(6500)).toEqual({ status: 'ok', powerKw: 215 });
    expect(curve.powerAt(1500)).toEqual({ status: 'belowRange', nearestRpm: 2000 });
    expect(curve.powerAt(7000)).toEqual({ status: 'aboveRange', nearestRpm: 6500 });
    expect(curve.pieces).toHaveLength(5);
  });

  it('scales the whole curve by the condition factor and the extra power factor', () => {
    const worn = engineCurve(testEngine({ conditionFactor: 0.9 }), { powerFactor: 1.1 });
    expect(worn.powerKwUnchecked(5000)).toBeCloseTo(200 * 0.99, 12);
    expect(worn.appliedFactor).toBeCloseTo(0.99, 15);
  });

  it('leaves power unchanged at the reference air and lowers it in thin air', () => {
    expect(engineCurve(testEngine(), { ambient: REFERENCE_AIR }).powerKwUnchecked(6000)).toBe(220);
    const high = engineCurve(testEngine(), { ambient: { ...REFERENCE_AIR, pressureKpa: 85 } });
    expect(high.powerKwUnchecked(6000)).toBeLessThan(220 * 0.9);
  });

  it('corrects rows measured in other air to the reference air with the engine’s standard', () => {
    const bench = { pressureKpa: 95, airTempC: 35, relativeHumidityPct: 0 };
    const table = testEngine();
    if (table.curve.kind !== 'table') throw new Error('fixture is a table');
    const measured = testEngine({ curve: { ...table.curve, measuredIn: bench }, correction: { standard: 'iso-1585-si' } });
    // P_reference = P_measured · CF(bench) / CF(reference); ISO 1585 SI αa = (99/pd)^1.2 · (T/298)^0.6:
    // CF(bench) = 1.072066 (hand-worked in ambient.test.ts); at the reference air (100 kPa, 25 °C, 30 %) the
    // computed factor is used, so this checks the direction of the correction and that it is exact at the rows.
    const ratio = correctionFactor({ standard: 'iso-1585-si' }, bench, 'natural') / correctionFactor({ standard: 'iso-1585-si' }, REFERENCE_AIR, 'natural');
    expect(correctionFactor({ standard: 'iso-1585-si' }, bench, 'natural')).toBeCloseTo(1.072066, 6);
    expect(ratio).toBeGreaterThan(1);
    expect(engineCurve(measured).powerKwUnchecked(6000)).toBeCloseTo(220 * ratio, 10);
    // At the bench's own air the rows come back as measured.
    expect(engineCurve(measured, { ambient: bench }).powerKwUnchecked(6000)).toBeCloseTo(220, 10);
  });

  it('models a known point as constant torque between idle and maximum speed', () => {
    const curve = engineCurve(testEngine({ curve: { kind: 'knownPoint', point: { speedRpm: 5800, powerKw: 203 } } }));
    expect(curve.kind).toBe('constantTorque');
    expect([curve.minRpm, curve.maxRpm]).toEqual([800, 6500]);
    expect(curve.powerKwUnchecked(5800)).toBeCloseTo(203, 12);
    // Constant torque: P = P0 · n / n0.
    expect(curve.powerKwUnchecked(4000)).toBeCloseTo((203 * 4000) / 5800, 12);
  });

  it('defines a one-row table at its single speed only', () => {
    const curve = engineCurve(testEngine({ points: rows([[5800, 200]]) }));
    expect(curve.kind).toBe('singlePoint');
    expect(curve.pieces).toHaveLength(0);
    expect(curve.powerAt(5800)).toEqual({ status: 'ok', powerKw: 200 });
    expect(curve.powerAt(5799)).toEqual({ status: 'belowRange', nearestRpm: 5800 });
    expect(curve.powerAt(5801)).toEqual({ status: 'aboveRange', nearestRpm: 5800 });
  });

  it('rejects tables a technician must fix, saying which row and how', () => {
    expect(() => engineCurve(testEngine({ points: rows([[3000, 100], [2800, 120]]) }))).toThrow(
      /found 2800 rpm after 3000 rpm; sort the rows and remove repeats/,
    );
    expect(() => engineCurve(testEngine({ points: rows([[3000, 100], [3000, 120]]) }))).toThrow(/remove repeats/);
    expect(() => engineCurve(testEngine({ points: rows([[3000, -5], [4000, 120]]) }))).toThrow(/row 1 .* found 3000 rpm, -5 kW/);
    expect(() => engineCurve(testEngine({ points: [] }))).toThrow(/no rows/);
    const knownPoint = { kind: 'knownPoint', point: { speedRpm: 5800, powerKw: 0 } } as const;
    expect(() => engineCurve(testEngine({ curve: knownPoint }))).toThrow(/known point needs rpm > 0 and power > 0, found 5800 rpm, 0 kW/);
    const upsideDown = { idleRpm: 7000, windowLowRpm: 5000, windowHighRpm: 6000, maxRpm: 6500 };
    expect(() => engineCurve(testEngine({ curve: { ...knownPoint, point: { speedRpm: 5800, powerKw: 200 } }, limits: upsideDown }))).toThrow(
      /found idle 7000 rpm, max 6500 rpm/,
    );
  });

  it('answers NaN speeds with a status, never a number', () => {
    expect(engineCurve(testEngine()).powerAt(Number.NaN).status).toBe('belowRange');
  });
});
