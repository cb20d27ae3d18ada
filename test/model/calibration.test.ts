import { describe, expect, it } from 'vitest';
import {
  calibrate,
  calibratedInstallation,
  solveInstallation,
  swapFromKnownPoint,
  trialEffectiveRating,
  type Installation,
} from '../../src/model/index.ts';
import { IMPELLERS, INST, LAKE_AIR, makeTrials, REFERENCE_AIR, seededRandom, type Truth } from './fixtures/trialRig.ts';

// Synthetic trials come from the model itself with known "true" parameters (fixtures/trialRig.ts); the
// checks are that the calibration recovers what went in. Noise: uniform ±25 rpm, seeded (mulberry32).
const ALL = IMPELLERS.map((i) => ({ impellerId: i.id }));
const HEAVY_AT_TWO_SITES = ['c32', 'd36', 'e40'].flatMap((impellerId) => [
  { impellerId },
  { impellerId, ambient: LAKE_AIR, waterDensityKgM3: 999.1 },
]);
const K32: Truth = { exponent: 3.2, conditionFactor: 0.92 };
// Rating offsets +4 % (inside ±5 %), −7 % (outside), +2 % (inside), with exponent 2.8.
const K28_OFFSETS: Truth = { exponent: 2.8, conditionFactor: 1, ratingFactors: { c32: 1.04, d36: 0.93, e40: 1.02 } };

describe('trialEffectiveRating()', () => {
  it('recovers rating offsets inside and outside the family tolerance in closed form', () => {
    const truth: Truth = { exponent: 3, conditionFactor: 1, ratingFactors: { b29: 1.03, d36: 0.92 } };
    const trials = makeTrials({ truth, runs: [{ impellerId: 'b29' }, { impellerId: 'd36', ambient: LAKE_AIR, waterDensityKgM3: 999.1 }] });
    const [b, d] = trials.map((trial) =>
      trialEffectiveRating({ ...INST, impeller: IMPELLERS.find((i) => i.id === trial.impellerId)!, trial }),
    );
    expect(b.status).toBe('measured');
    expect(b.effectiveRatingKw).toBeCloseTo(29 * 1.03, 6);
    expect(b.deviationPct).toBeCloseTo(3, 6);
    expect(b.insideTolerance).toBe(true);
    expect(d.effectiveRatingKw).toBeCloseTo(36 * 0.92, 6);
    expect(d.insideTolerance).toBe(false);
  });

  it('marks a trial at the rev limiter, whose rating is only an upper bound', () => {
    const trial = { date: '2026-06-01', impellerId: 'a26', wotRpm: 6290, ambient: REFERENCE_AIR, waterDensityKgM3: 1025 };
    expect(trialEffectiveRating({ ...INST, impeller: IMPELLERS[0], trial }).status).toBe('atLimiter');
  });

  it('marks a trial outside the engine table instead of extrapolating', () => {
    const trial = { date: '2026-06-01', impellerId: 'e40', wotRpm: 1500, ambient: REFERENCE_AIR, waterDensityKgM3: 1025 };
    const r = trialEffectiveRating({ ...INST, impeller: IMPELLERS[4], trial });
    expect(r.status).toBe('offCurve');
    expect(r.effectiveRatingKw).toBeNaN();
  });
});

describe('calibrate()', () => {
  it('fits exponent 3.2 and an engine factor 0.92 from five impellers, noise-free to 1e-6', () => {
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials: makeTrials({ truth: K32, runs: ALL }) });
    expect(cal.mode).toBe('exponentAndCondition');
    expect(Math.abs(cal.exponent - 3.2)).toBeLessThan(1e-6);
    expect(Math.abs(cal.powerFactor - 0.92)).toBeLessThan(1e-6);
    for (const r of cal.residuals) expect(Math.abs(r.residualRpm)).toBeLessThan(1e-6);
  });

  it('fits exponent 3.2 within 0.2 and the engine factor within 10 % under ±25 rpm noise (seeds 1–20)', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const trials = makeTrials({ truth: K32, runs: ALL, noiseRpm: 25, random: seededRandom(seed) });
      const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials });
      expect(cal.mode).toBe('exponentAndCondition');
      expect(Math.abs(cal.exponent - 3.2)).toBeLessThan(0.2);
      expect(cal.exponentSe).toBeGreaterThan(0);
      expect(Math.abs(cal.powerFactor / 0.92 - 1)).toBeLessThan(0.1);
      // The fitted model reproduces every trial to within the noise plus the fit's own slack.
      for (const r of cal.residuals) expect(Math.abs(r.residualRpm)).toBeLessThan(60);
    }
  });

  it('fits exponent 2.8 and each tried rating when one impeller runs at two sites, noise-free to 1e-6', () => {
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials: makeTrials({ truth: K28_OFFSETS, runs: HEAVY_AT_TWO_SITES }) });
    expect(cal.mode).toBe('exponentAndRatings');
    expect(Math.abs(cal.exponent - 2.8)).toBeLessThan(1e-6);
    for (const [id, f] of Object.entries(K28_OFFSETS.ratingFactors!)) expect(Math.abs(cal.ratingFactors[id] - f)).toBeLessThan(1e-6);
    expect(cal.ratingFactors.b29).toBeUndefined();
  });

  it('fits exponent 2.8 within 0.2 and tried ratings within 10 % under ±25 rpm noise (seeds 1–20)', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const trials = makeTrials({ truth: K28_OFFSETS, runs: HEAVY_AT_TWO_SITES, noiseRpm: 25, random: seededRandom(seed) });
      const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials });
      expect(cal.mode).toBe('exponentAndRatings');
      expect(Math.abs(cal.exponent - 2.8)).toBeLessThan(0.2);
      for (const [id, f] of Object.entries(K28_OFFSETS.ratingFactors!)) expect(Math.abs(cal.ratingFactors[id] / f - 1)).toBeLessThan(0.1);
    }
  });

  it('keeps the family exponent and says why when only one impeller was tried', () => {
    const trials = makeTrials({ truth: { exponent: 3, conditionFactor: 0.9 }, runs: [{ impellerId: 'c32' }, { impellerId: 'c32' }] });
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials });
    expect(cal.mode).toBe('conditionOnly');
    expect(cal.exponent).toBe(3);
    expect(Math.abs(cal.powerFactor - 0.9)).toBeLessThan(1e-6);
    expect(cal.notes.join(' ')).toMatch(/cannot be told apart/);
  });

  it('keeps the family exponent when the trials span too narrow an rpm range', () => {
    const close = [{ id: 'p', label: 'P', ratingKw: 32 }, { id: 'q', label: 'Q', ratingKw: 32.6 }, { id: 'r', label: 'R', ratingKw: 33.1 }];
    const trials = close.map((imp, i) => ({
      date: `2026-07-0${i + 1}`,
      impellerId: imp.id,
      wotRpm: solveInstallation({ ...INST, impeller: imp }).speedRpm,
      ambient: REFERENCE_AIR,
      waterDensityKgM3: 1025,
    }));
    const cal = calibrate({ inst: INST, impellers: close, trials });
    expect(cal.mode).toBe('conditionOnly');
    expect(cal.notes.join(' ')).toMatch(/too narrow/);
  });

  it('leaves trials at the rev limiter out of the fit and says so', () => {
    const trials = [
      ...makeTrials({ truth: { exponent: 3, conditionFactor: 1 }, runs: [{ impellerId: 'd36' }] }),
      { date: '2026-06-09', impellerId: 'a26', wotRpm: 6300, ambient: REFERENCE_AIR, waterDensityKgM3: 1025 },
    ];
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials });
    expect(cal.residuals.map((r) => r.usedInFit)).toEqual([true, false]);
    expect(cal.notes.join(' ')).toMatch(/1 trial\(s\) at the rev limiter/);
  });

  it('anchors a known-point engine’s constant-torque line at the measured point', () => {
    const inst: Installation = {
      ...INST,
      engine: { ...INST.engine, curve: { kind: 'knownPoint', point: { speedRpm: 5800, powerKw: 230 } } },
    };
    const trial = { date: '2026-08-01', impellerId: 'c32', wotRpm: 5400, ambient: REFERENCE_AIR, waterDensityKgM3: 1025 };
    const cal = calibrate({ inst, impellers: IMPELLERS, trials: [trial] });
    expect(cal.anchoredConstantTorque).toBe(true);
    expect(Math.abs(cal.residuals[0].residualRpm)).toBeLessThan(1e-6);
    // The calibrated prediction for another impeller matches the constant-torque closed form (swap.ts).
    const anchorKw = solveInstallation(calibratedInstallation(inst, cal)).powerKw;
    const predicted = solveInstallation(calibratedInstallation(inst, cal, IMPELLERS[4])).speedRpm;
    const closed = swapFromKnownPoint({ knownRpm: 5400, knownPowerKw: anchorKw, fromRatingKw: 32, toRatingKw: 40, exponent: 3 });
    expect(predicted).toBeCloseTo(closed.speedRpm, 6);
  });

  it('names the trial and the choices when a trial names an unknown impeller', () => {
    const trial = { date: '2026-08-02', impellerId: 'zz', wotRpm: 5400, ambient: REFERENCE_AIR, waterDensityKgM3: 1025 };
    expect(() => calibrate({ inst: INST, impellers: IMPELLERS, trials: [trial] })).toThrow(/sea trial 2026-08-02: impeller "zz".*a26, b29/);
  });
});

describe('calibrate() on implausible trials', () => {
  // Plausibility bounds are common practice, no source (PLAUSIBLE_FACTOR_RANGE in calibration.ts).
  it('refuses trials that would need the engine at 40 % of its published power, and says why', () => {
    const truth: Truth = { exponent: 3, conditionFactor: 0.4 };
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials: makeTrials({ truth, runs: ALL }) });
    expect(cal.mode).toBe('none');
    expect(cal.powerFactor).toBe(1);
    expect(cal.exponent).toBe(INST.family.exponent);
    expect(cal.notes.join(' ')).toMatch(/engine would make 40 % of its published power, outside the plausible 60 %–125 %/);
    expect(cal.notes.join(' ')).toMatch(/qualified marine technician/);
  });

  it('still fits an engine at 70 % of its published power (a worn engine)', () => {
    const truth: Truth = { exponent: 3, conditionFactor: 0.7 };
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials: makeTrials({ truth, runs: ALL }) });
    expect(cal.mode).not.toBe('none');
    expect(Math.abs(cal.powerFactor - 0.7)).toBeLessThan(1e-6);
  });
});
