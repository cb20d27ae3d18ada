import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { plotScales } from '../../../src/sheets/kit/scales.ts';

const area = (heightMm: number) => ({ x: 20, y: 10, width: 160, height: heightMm });

describe('plotScales() keeps the power range tight at any plot height', () => {
  it('rounds 194–486 kW to 150–500 kW on a 44 mm plot instead of 0–600 kW, with two ticks', () => {
    // Two ticks wanted (44 mm / 22 mm per tick): a 200 kW step would round the range out to 0–600 kW.
    const s = plotScales({ area: area(44), rpmDomain: [3200, 5400], powerKwDomain: [194, 486], powerUnitFirst: 'kW' });
    expect(s.y.domain()).toEqual([150, 500]);
    expect(s.yLeft.ticks(s.yTicks)).toEqual([200, 400]);
  });

  it('widens the asked range by at most a quarter and labels at least two ticks on each axis (seeded property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 15, max: 180, noNaN: true }),
        fc.double({ min: 5, max: 600, noNaN: true }),
        fc.double({ min: 10, max: 900, noNaN: true }),
        fc.constantFrom('kW' as const, 'hp' as const),
        (heightMm, lowKw, spanKw, unit) => {
          const s = plotScales({ area: area(heightMm), rpmDomain: [2000, 6000], powerKwDomain: [lowKw, lowKw + spanKw], powerUnitFirst: unit });
          const [lo, hi] = s.y.domain();
          expect(lo).toBeLessThanOrEqual(lowKw + 1e-9);
          expect(hi).toBeGreaterThanOrEqual(lowKw + spanKw - 1e-9);
          expect(hi - lo).toBeLessThanOrEqual(spanKw * 1.25 + 1e-9);
          for (const axis of [s.yLeft, s.yRight]) expect(axis.ticks(s.yTicks).length).toBeGreaterThanOrEqual(2);
        },
      ),
      { seed: 20261102, numRuns: 300 },
    );
  });

  it('keeps the exact domain when asked not to round it', () => {
    const s = plotScales({ area: area(40), rpmDomain: [3000, 5000], powerKwDomain: [123, 377], powerUnitFirst: 'kW', nicePower: false });
    expect(s.y.domain()).toEqual([123, 377]);
  });
});
