import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hermiteMaxSlope, hermiteSlope, hermiteValue, monotonePieces, steffenSlopes } from '../../src/model/monotoneCubic.ts';
import { arbTable, PROPERTY_RUNS } from './fixtures.ts';

describe('steffenSlopes()', () => {
  it('gives Steffen’s interior and end slopes (hand-worked)', () => {
    // Steffen (1990) eqs. 11 and 26–27 on (1,0), (2,1), (3,4): secants 1 and 3.
    // interior: p = (1·1 + 3·1)/2 = 2 → m = 2·min(1, 3, 1) = 2; left end: p = 1·1.5 − 3·0.5 = 0 → 0;
    // right end: p = 3·1.5 − 1·0.5 = 4 ≤ 2·3 → 4.
    expect(steffenSlopes([1, 2, 3], [0, 1, 4])).toEqual([0, 2, 4]);
  });

  it('is flat at a local maximum and uses the secant for two rows', () => {
    expect(steffenSlopes([1, 2, 3], [0, 5, 1])[1]).toBe(0);
    expect(steffenSlopes([2, 4], [10, 30])).toEqual([10, 10]);
  });
});

describe('monotonePieces()', () => {
  it('passes exactly through every row and never overshoots a row value between rows', () => {
    fc.assert(
      fc.property(arbTable, fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 5, maxLength: 5 }), (points, ts) => {
        const pieces = monotonePieces(points.map((p) => p.speedRpm), points.map((p) => p.powerKw));
        pieces.forEach((p, i) => {
          expect(hermiteValue(p, p.x0)).toBe(points[i].powerKw);
          expect(hermiteValue(p, p.x1)).toBe(points[i + 1].powerKw);
          const lo = Math.min(p.y0, p.y1);
          const hi = Math.max(p.y0, p.y1);
          const slack = 1e-12 * Math.max(1, hi);
          const xs = [...ts].sort((a, b) => a - b).map((t) => p.x0 + t * (p.x1 - p.x0));
          const ys = xs.map((x) => hermiteValue(p, x));
          for (const y of ys) {
            expect(y).toBeGreaterThanOrEqual(lo - slack);
            expect(y).toBeLessThanOrEqual(hi + slack);
          }
          // Monotone inside the piece, in the direction of its rows.
          const dir = Math.sign(p.y1 - p.y0);
          for (let j = 1; j < ys.length; j++) expect(dir * (ys[j] - ys[j - 1])).toBeGreaterThanOrEqual(-slack);
        });
      }),
      PROPERTY_RUNS,
    );
  });

  it('reproduces a straight line exactly (so constant-torque tables stay constant torque)', () => {
    const pieces = monotonePieces([1000, 2500, 3000, 5200], [20, 50, 60, 104]);
    for (const p of pieces) {
      expect(p.m0).toBeCloseTo(0.02, 15);
      expect(hermiteValue(p, 0.5 * (p.x0 + p.x1))).toBeCloseTo(0.01 * (p.x0 + p.x1), 12);
    }
  });
});

describe('hermiteMaxSlope()', () => {
  it('bounds the slope found by dense sampling of the piece', () => {
    fc.assert(
      fc.property(arbTable, (points) => {
        const pieces = monotonePieces(points.map((p) => p.speedRpm), points.map((p) => p.powerKw));
        for (const p of pieces) {
          const bound = hermiteMaxSlope(p, p.x0, p.x1);
          for (let j = 0; j <= 64; j++) {
            const x = p.x0 + (j / 64) * (p.x1 - p.x0);
            expect(hermiteSlope(p, x)).toBeLessThanOrEqual(bound + 1e-12 * Math.max(1, Math.abs(bound)));
          }
        }
      }),
      { ...PROPERTY_RUNS, numRuns: 100 },
    );
  });
});
