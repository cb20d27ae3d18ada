import { describe, expect, it } from 'vitest';
import { fitLogLinear } from '../../src/model/logFit.ts';

describe('fitLogLinear()', () => {
  it('fits a hand-computed three-point line with its standard errors', () => {
    // Hand-computed from the least-squares formulas (no outside source): x = 1,2,3, y = 1,2,2 gives
    // Sxx = 2, Sxy = 1, slope 0.5, intercept 2/3, residuals −1/6, 1/3, −1/6, s² = (1/6)/1, SE(slope) = sqrt(1/12).
    const fit = fitLogLinear([1, 2, 3].map((x, i) => ({ group: '', x, y: [1, 2, 2][i] })));
    expect(fit.slope).toBeCloseTo(0.5, 12);
    expect(fit.intercepts.get('')!.value).toBeCloseTo(2 / 3, 12);
    expect(fit.residuals.map((r) => r * 6)).toEqual([expect.closeTo(-1, 12), expect.closeTo(2, 12), expect.closeTo(-1, 12)]);
    expect(fit.dof).toBe(1);
    expect(fit.slopeSe).toBeCloseTo(Math.sqrt(1 / 12), 12);
    // SE(b) = s·sqrt(1/n + x̄²/Sxx) = sqrt(1/6)·sqrt(1/3 + 2) = sqrt(7/18)
    expect(fit.intercepts.get('')!.se).toBeCloseTo(Math.sqrt(7 / 18), 12);
  });

  it('gives each group its own intercept and one common slope', () => {
    const points = [
      { group: 'a', x: 1, y: 3 * 1 + 2 },
      { group: 'a', x: 2, y: 3 * 2 + 2 },
      { group: 'b', x: 5, y: 3 * 5 - 1 },
      { group: 'b', x: 7, y: 3 * 7 - 1 },
    ];
    const fit = fitLogLinear(points);
    expect(fit.slope).toBeCloseTo(3, 12);
    expect(fit.intercepts.get('a')!.value).toBeCloseTo(2, 12);
    expect(fit.intercepts.get('b')!.value).toBeCloseTo(-1, 12);
    expect(fit.dof).toBe(1);
    expect(fit.slopeSe).toBeCloseTo(0, 12);
  });

  it('keeps a fixed slope and averages the intercept', () => {
    const fit = fitLogLinear([{ group: '', x: 1, y: 4 }, { group: '', x: 2, y: 8 }], { slope: 3 });
    expect(fit.slope).toBe(3);
    expect(fit.slopeSe).toBeNull();
    expect(fit.intercepts.get('')!.value).toBeCloseTo(1.5, 12);
    expect(fit.dof).toBe(1);
  });

  it('refuses to fit a slope when every group sits at one x', () => {
    expect(() => fitLogLinear([{ group: 'a', x: 1, y: 1 }, { group: 'b', x: 2, y: 3 }])).toThrow(/no slope/);
  });
});
