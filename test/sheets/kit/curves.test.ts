import { describe, expect, it } from 'vitest';
import { engineCurve, makeAbsorber, absorbedPowerKw } from '../../../src/model/index.ts';
import { hermitePath, MAX_CURVE_CHORDS, powerLawPoints } from '../../../src/sheets/kit/curves.ts';
import { plotScales } from '../../../src/sheets/kit/scales.ts';
import { family, jet } from '../fixtures/demoProject.ts';

const scales = plotScales({ area: { x: 20, y: 10, width: 250, height: 150 }, rpmDomain: [2600, 5600], powerKwDomain: [20, 200], powerUnitFirst: 'kW' });

function bezierAt(p0: number, p1: number, p2: number, p3: number, t: number): number {
  const u = 1 - t;
  return u * u * u * p0 + 3 * u * u * t * p1 + 3 * u * t * t * p2 + t * t * t * p3;
}

describe('hermitePath()', () => {
  it('draws the model engine curve exactly: every Bézier point lies on the model curve', () => {
    const curve = engineCurve(family.variants[0]);
    const segs = hermitePath(curve.pieces, scales);
    let prev = segs[0] as { x: number; y: number };
    let checked = 0;
    for (const s of segs.slice(1)) {
      if (s.op !== 'C') continue;
      for (let t = 0; t <= 1; t += 0.05) {
        const xMm = bezierAt(prev.x, s.x1, s.x2, s.x, t);
        const yMm = bezierAt(prev.y, s.y1, s.y2, s.y, t);
        const rpm = scales.x.invert(xMm);
        expect(Math.abs(scales.y(curve.powerKwUnchecked(rpm)) - yMm)).toBeLessThan(1e-9);
        checked++;
      }
      prev = s;
    }
    expect(checked).toBeGreaterThan(100);
  });

  it('starts the path at the x domain when the table starts below it', () => {
    const segs = hermitePath(engineCurve(family.variants[0]).pieces, scales);
    expect((segs[0] as { x: number }).x).toBeCloseTo(scales.x(2600), 9);
  });
});

describe('powerLawPoints()', () => {
  const a = makeAbsorber({ family: jet.family, impeller: jet.impellers[2], driveLine: { ratio: 1, efficiency: 0.97 }, waterDensityKgM3: 1025 });

  it('keeps every chord within 0.1 mm of the model absorption curve', () => {
    const pts = powerLawPoints(a, scales, { fromRpm: 2600, toRpm: 5400 });
    let worst = 0;
    for (let i = 1; i < pts.length; i++) {
      for (let f = 0; f <= 1; f += 0.02) {
        const xMm = pts[i - 1].x + f * (pts[i].x - pts[i - 1].x);
        const chordY = pts[i - 1].y + f * (pts[i].y - pts[i - 1].y);
        worst = Math.max(worst, Math.abs(scales.y(absorbedPowerKw(a, scales.x.invert(xMm))) - chordY));
      }
    }
    expect(worst).toBeLessThanOrEqual(0.1);
    // Not wasteful either: the chords use most of the tolerance.
    expect(worst).toBeGreaterThan(0.02);
  });

  it('uses fewer chords for a looser tolerance', () => {
    const fine = powerLawPoints(a, scales, { fromRpm: 2600, toRpm: 5400, toleranceMm: 0.1 });
    const coarse = powerLawPoints(a, scales, { fromRpm: 2600, toRpm: 5400, toleranceMm: 1 });
    expect(coarse.length).toBeLessThan(fine.length);
  });
});

describe('powerLawPoints() is bounded whatever its numbers', () => {
  // Issue class: a rating of 1e-300 or 1e300 underflows or overflows the law to 0 or Infinity; the
  // sampler used to split NaN intervals until the heap ran out. Now a named LayoutError, at once.
  it('refuses a law whose powers overflow to Infinity with a LayoutError naming the figures to check', () => {
    const overflow = { coefficient: 1e300, exponent: 3 };
    expect(() => powerLawPoints(overflow, scales, { fromRpm: 2600, toRpm: 5400 })).toThrow(/absorption curve: cannot be drawn: a power of Infinity kW at 2600 rpm/);
    try {
      powerLawPoints(overflow, scales, { fromRpm: 2600, toRpm: 5400 });
    } catch (error) {
      expect((error as Error).name).toBe('LayoutError');
    }
  });

  it('draws a law that underflows to 0 kW as a finite polyline instead of subdividing forever', () => {
    const pts = powerLawPoints({ coefficient: 1e-300, exponent: 3 }, scales, { fromRpm: 2600, toRpm: 5400 });
    expect(pts.length).toBeLessThanOrEqual(MAX_CURVE_CHORDS + 1);
    expect(pts.every((p) => Number.isFinite(p.x) && Number.isFinite(p.y))).toBe(true);
    expect(pts[pts.length - 1].x).toBeCloseTo(scales.x(5400), 9);
  });

  it('refuses a NaN range at once', () => {
    expect(() => powerLawPoints({ coefficient: 1e-6, exponent: 3 }, scales, { fromRpm: NaN, toRpm: 5400 })).toThrow(/not a finite number/);
  });
});
