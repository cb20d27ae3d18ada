import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/model/calibration.ts';
import { solveInstallation } from '../../src/model/installation.ts';
import {
  crouchConstantFromSpeed,
  crouchConstantsFromTrials,
  crouchSpeedKn,
  hullConstant,
  shaftPowerForSpeedKw,
  TYPICAL_CROUCH_CONSTANTS,
} from '../../src/model/speed.ts';
import { hpToKw, lbToKg } from '../../src/units.ts';
import { IMPELLERS, INST, makeTrials } from './fixtures/trialRig.ts';

// Crouch's formula V = C / sqrt(Δ[lb] / P[shp]) as cited in REFERENCES.md (naval-architecture handbooks,
// e.g. Gerr, The Propeller Handbook). No confirmed published worked example: the numbers below are
// hand-computed from the formula as cited.
describe('crouchSpeedKn()', () => {
  it('gives 33.54 kn for C = 150, 5000 lb and 250 shp (hand-computed: 150 / sqrt(20) = 33.541)', () => {
    const v = crouchSpeedKn({ crouchConstant: 150, displacementKg: lbToKg(5000), shaftPowerKw: hpToKw(250) });
    expect(v).toBeCloseTo(150 / Math.sqrt(20), 9);
    expect(v).toBeCloseTo(33.541, 3);
  });

  it('gives 40 kn for C = 200, 2500 lb and 100 shp (hand-computed: 200 / sqrt(25) = 40)', () => {
    expect(crouchSpeedKn({ crouchConstant: 200, displacementKg: lbToKg(2500), shaftPowerKw: hpToKw(100) })).toBeCloseTo(40, 9);
  });

  it('scales as sqrt(power / displacement): +10 % power gives +4.88 % speed for any boat', () => {
    // sqrt(1.1) = 1.048809 (REFERENCES.md: "+10 % power → +4.88 % speed").
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 250, noNaN: true }),
        fc.double({ min: 300, max: 30000, noNaN: true }),
        fc.double({ min: 10, max: 2000, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        (c, massKg, powerKw, massFactor) => {
          const v = crouchSpeedKn({ crouchConstant: c, displacementKg: massKg, shaftPowerKw: powerKw });
          const vMore = crouchSpeedKn({ crouchConstant: c, displacementKg: massKg, shaftPowerKw: powerKw * 1.1 });
          expect((vMore / v - 1) * 100).toBeCloseTo(4.88, 2);
          const vHeavier = crouchSpeedKn({ crouchConstant: c, displacementKg: massKg * massFactor, shaftPowerKw: powerKw });
          expect(vHeavier / v).toBeCloseTo(1 / Math.sqrt(massFactor), 9);
        },
      ),
      { seed: 7, numRuns: 200 },
    );
  });

  it('inverts to the constant and to the power it needs', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 250, noNaN: true }), fc.double({ min: 300, max: 30000, noNaN: true }), fc.double({ min: 10, max: 2000, noNaN: true }), (c, massKg, powerKw) => {
        const speedKn = crouchSpeedKn({ crouchConstant: c, displacementKg: massKg, shaftPowerKw: powerKw });
        expect(crouchConstantFromSpeed({ speedKn, displacementKg: massKg, shaftPowerKw: powerKw }) / c).toBeCloseTo(1, 12);
        expect(shaftPowerForSpeedKw({ crouchConstant: c, displacementKg: massKg, speedKn }) / powerKw).toBeCloseTo(1, 12);
      }),
      { seed: 11, numRuns: 200 },
    );
  });
});

describe('hullConstant()', () => {
  it('prefers a trial calibration, then the boat file, then the typical value from memory', () => {
    const measured = [{ date: '2026-05-01', constant: 170 }, { date: '2026-05-03', constant: 176 }];
    expect(hullConstant({ hullType: 'runabout', statedConstant: 160, measured })).toMatchObject({ value: 173, source: 'trial', trialDates: ['2026-05-01', '2026-05-03'] });
    expect(hullConstant({ hullType: 'runabout', statedConstant: 160, measured: [] })).toMatchObject({ value: 160, source: 'stated' });
    const typical = hullConstant({ hullType: 'high-speed-runabout', measured: [] });
    // 190 for high-speed runabouts: REFERENCES.md, Crouch constants by hull type (memory, not confirmed).
    expect(typical).toMatchObject({ value: 190, source: 'typical' });
    expect(typical.note).toMatch(/from memory/);
    expect(TYPICAL_CROUCH_CONSTANTS.runabout).toBe(150);
  });
});

describe('crouchConstantsFromTrials()', () => {
  it('recovers the constant a logged trial speed was made with, from the power at the measured rpm and the load aboard', () => {
    const [base] = makeTrials({ truth: { exponent: 3, conditionFactor: 1 }, runs: [{ impellerId: 'c32' }] });
    // At the WOT crossing the engine makes what the impeller takes; 0.97 of it reaches the jet shaft.
    const shaftPowerKw = solveInstallation(INST).powerKw * 0.97;
    const speedKn = crouchSpeedKn({ crouchConstant: 165, displacementKg: 1900 + 200, shaftPowerKw });
    const trial = { ...base, speedKn, loadKg: 200 };
    const cal = calibrate({ inst: INST, impellers: IMPELLERS, trials: [trial] });
    const [only] = crouchConstantsFromTrials({ inst: INST, calibration: cal, trials: [trial, { ...base, date: '2026-05-09' }], displacementKg: 1900 });
    expect(only.date).toBe(base.date);
    expect(only.constant).toBeCloseTo(165, 6);
  });
});
