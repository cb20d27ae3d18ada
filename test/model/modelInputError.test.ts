/**
 * Every numerical loop of the model is bounded whatever its input (the piece search by pieces and a
 * depth of 60, the root refinement by 100 steps, the bisections by 60–100 steps), and a NaN or
 * non-finite input stops it at once with a typed ModelInputError naming the figures, which the site
 * reports at the definition that asked for the sheet (test/site/userText.test.ts covers the reporting of
 * the other typed errors the same way). No value here comes from a source: they are made to be absurd.
 */
import { describe, expect, it } from 'vitest';
import { makeAbsorber } from '../../src/model/absorption.ts';
import { engineCurve } from '../../src/model/engineCurve.ts';
import { ModelInputError } from '../../src/model/errors.ts';
import { firstCrossingRpm } from '../../src/model/firstCrossing.ts';
import { solveInstallation } from '../../src/model/installation.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { isUserFixable, SheetDrawError } from '../../src/site/errors.ts';
import { sheetDrawProblem } from '../../src/site/sheetProblems.ts';
import { demoFiles } from '../data/helpers.ts';
import { FAMILY, testEngine, testInstallation } from './fixtures.ts';

const absorber = makeAbsorber({ family: FAMILY, impeller: { id: 'mid', label: 'Mid', ratingKw: 1 }, driveLine: { ratio: 1, efficiency: 0.97 }, waterDensityKgM3: 1025 });

describe('the model stops at once on figures it cannot compute with', () => {
  it.each([
    ['a NaN coefficient', { ...absorber, coefficient: Number.NaN }, 800, 6500],
    ['an infinite coefficient', { ...absorber, coefficient: Number.POSITIVE_INFINITY }, 800, 6500],
    ['a zero coefficient (an underflowed rating)', { ...absorber, coefficient: 0 }, 800, 6500],
    ['a NaN exponent', { ...absorber, exponent: Number.NaN }, 800, 6500],
    ['a NaN speed range', absorber, Number.NaN, 6500],
  ])('firstCrossingRpm with %s throws ModelInputError', (_what, a, lo, hi) => {
    const curve = engineCurve(testEngine());
    expect(() => firstCrossingRpm(curve, a, lo, hi)).toThrow(ModelInputError);
    expect(() => firstCrossingRpm(curve, a, lo, hi)).toThrow(/cannot be solved: .* must be finite positive numbers; check/);
  });

  it('engineCurve with a NaN or infinite power factor throws ModelInputError, not a plain RangeError', () => {
    for (const conditionFactor of [Number.NaN, Number.POSITIVE_INFINITY, 0, -1]) {
      const error = (() => {
        try {
          engineCurve(testEngine({ conditionFactor }));
        } catch (e) {
          return e as Error;
        }
        return undefined;
      })();
      expect(error?.name).toBe('ModelInputError');
      expect(error?.message).toMatch(/power factor must be a positive number/);
    }
  });

  it('the solver still answers on a tiny but positive rating (bounded: no hang, a finite speed)', () => {
    const tiny = solveInstallation(testInstallation({ impeller: { id: 't', label: 'T', ratingKw: 1e-12 } }));
    expect(Number.isFinite(tiny.speedRpm)).toBe(true);
  });
});

describe('a ModelInputError reaching the site', () => {
  it('is a problem the user fixes in the data, said at the definition that asked for the sheet', () => {
    const error = new ModelInputError('the operating point cannot be solved: absorption coefficient NaN; check the impeller ratings');
    expect(isUserFixable(error)).toBe(true);
    const loaded = loadProjectFromFiles(demoFiles());
    if (!loaded.ok) throw new Error('demo must load');
    const problem = sheetDrawProblem(loaded.project, new SheetDrawError('spec-reedshank', error));
    expect(problem.message).toMatch(/^data\/books\/dealer-spec-sheets\.yaml:\d+:\d+ sheets\[0\] asks for a spec sheet \(boat reedshank, .*found the operating point cannot be solved: absorption coefficient NaN — check the impeller ratings$/);
  });
});
