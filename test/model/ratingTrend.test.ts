import { describe, expect, it } from 'vitest';
import { ratingTrend, type TrendInput } from '../../src/model/index.ts';

/** Trials on successive dates with the given effective ratings (kW); rpm does not enter the rule. */
const trials = (ratings: readonly number[]): TrendInput[] => ratings.map((ratingKw, i) => ({ date: `2026-0${1 + Math.floor(i / 2)}-${i % 2 === 0 ? '10' : '20'}`, wotRpm: 4800, ratingKw }));

// The rule of docs/model.md (our choice, no source): baseline = first 3 trials, limits mean ± 3·s·√(1 + 1/3),
// s the baseline's sample standard deviation, at least 2 % of its mean. Every number below is worked by hand.
describe('ratingTrend() flags a later trial outside the first trials’ limits', () => {
  it('with a tight baseline the 2 % reading floor sets the limits', () => {
    // Baseline 10.0, 10.1, 9.9: mean 10.0, s = √((0² + 0.1² + 0.1²) / 2) = 0.1 < 0.2 (2 % of 10), so s = 0.2;
    // half-width 3 · 0.2 · √(4/3) = 0.69282: limits 9.30718 to 10.69282.
    const steady = ratingTrend(trials([10.0, 10.1, 9.9, 9.6]));
    expect(steady.baseline!.meanKw).toBeCloseTo(10.0, 12);
    expect(steady.baseline!.sdKw).toBeCloseTo(0.1, 12);
    expect(steady.baseline!.usedSdKw).toBeCloseTo(0.2, 12);
    expect(steady.baseline!.lowKw).toBeCloseTo(9.30718, 5);
    expect(steady.baseline!.highKw).toBeCloseTo(10.69282, 5);
    expect(steady.verdict).toBe('steady');
    expect(steady.points[3].driftPct).toBeCloseTo(-4, 10);
    // 9.2 is below 9.30718: the impeller absorbs less (rpm risen); 10.8 above 10.69282: more load (rpm fallen).
    expect(ratingTrend(trials([10.0, 10.1, 9.9, 9.2])).verdict).toBe('absorbsLess');
    expect(ratingTrend(trials([10.0, 10.1, 9.9, 10.8])).verdict).toBe('absorbsMore');
    // Just inside either limit: not raised.
    expect(ratingTrend(trials([10.0, 10.1, 9.9, 9.31])).verdict).toBe('steady');
    expect(ratingTrend(trials([10.0, 10.1, 9.9, 10.69])).verdict).toBe('steady');
  });

  it('with a scattered baseline its own spread sets the limits', () => {
    // Baseline 10, 10.6, 9.4: mean 10, s = √((0 + 0.36 + 0.36) / 2) = 0.6; half-width 3 · 0.6 · √(4/3) = 2.07846.
    const t = ratingTrend(trials([10, 10.6, 9.4, 8.0]));
    expect(t.baseline!.usedSdKw).toBeCloseTo(0.6, 12);
    expect(t.baseline!.lowKw).toBeCloseTo(7.92154, 5);
    expect(t.verdict).toBe('steady'); // 8.0 > 7.92154
    expect(ratingTrend(trials([10, 10.6, 9.4, 7.9])).verdict).toBe('absorbsLess'); // 7.9 < 7.92154
  });

  it('is raised only by the latest trial, and needs a trial after the baseline', () => {
    // An earlier trial outside (9.0 < 9.30718), the latest back inside (a cleared intake): marked, not raised.
    const back = ratingTrend(trials([10.0, 10.1, 9.9, 9.0, 9.95]));
    expect(back.points.map((p) => p.outside)).toEqual([false, false, false, true, false]);
    expect(back.verdict).toBe('steady');
    expect(ratingTrend(trials([10.0, 10.1, 9.9])).verdict).toBe('tooFew');
    expect(ratingTrend(trials([10.0, 8.0])).verdict).toBe('tooFew');
    expect(ratingTrend(trials([10.0, 8.0])).baseline).toBeUndefined();
  });

  it('orders the trials by date whatever order they come in', () => {
    const t = ratingTrend([...trials([10.0, 10.1, 9.9, 9.2])].reverse());
    expect(t.points.map((p) => p.ratingKw)).toEqual([10.0, 10.1, 9.9, 9.2]);
    expect(t.verdict).toBe('absorbsLess');
  });
});
