import { describe, expect, it } from 'vitest';
import type { Installation } from '../../src/model/installation.ts';
import { solveInstallation } from '../../src/model/installation.ts';
import {
  bestImpeller,
  DEFAULT_CHANGES_PCT,
  impellerTopSpeeds,
  powerChangeForSpeedGain,
  upgradeWhatIf,
} from '../../src/model/upgradeWhatIf.ts';
import { IMPELLERS, INST } from './fixtures/trialRig.ts';

// A flat-topped engine: 200 kW from 4000 to 6500 rpm, so with the cube law the WOT speed after a power
// change x is n0·(1 + x)^(1/3) exactly (DOMAIN.md: "an engine upgrade of x % moves WOT speed by only
// (1 + x)^(1/k) − 1", common practice, no source) and Crouch speed rises by sqrt(1 + x).
const FLAT: Installation = {
  ...INST,
  engine: {
    ...INST.engine,
    curve: {
      kind: 'table',
      points: [
        { speedRpm: 2000, powerKw: 80 },
        { speedRpm: 3000, powerKw: 150 },
        { speedRpm: 4000, powerKw: 200 },
        { speedRpm: 5000, powerKw: 200 },
        { speedRpm: 6500, powerKw: 200 },
      ],
    },
  },
  impeller: IMPELLERS[4],
};
const SPEED = { crouchConstant: 160, displacementKg: 1800 };

describe('upgradeWhatIf()', () => {
  it('raises WOT rpm by (1 + x)^(1/3) and speed by sqrt(1 + x) on a flat-topped engine', () => {
    const { base, steps } = upgradeWhatIf({ inst: FLAT, impellers: IMPELLERS, speed: SPEED });
    expect(steps.map((s) => s.changePct)).toEqual(DEFAULT_CHANGES_PCT);
    for (const s of steps.filter((x) => x.fitted.point.status !== 'revLimited')) {
      const x = s.changePct / 100;
      expect(s.fitted.point.speedRpm / base.point.speedRpm).toBeCloseTo(Math.cbrt(1 + x), 9);
      expect(s.fitted.speedKn / base.speedKn).toBeCloseTo(Math.sqrt(1 + x), 9);
    }
  });

  it('raises WOT rpm by (1 + x)^(1/(k−1)) on a known-point (constant-torque) engine', () => {
    // Constant torque: f·P0·n/n0 = c·n³ gives n ∝ f^(1/2) (swap.ts derivation with the factor on the engine side).
    const known: Installation = { ...INST, engine: { ...INST.engine, curve: { kind: 'knownPoint', point: { speedRpm: 6000, powerKw: 230 } } }, impeller: IMPELLERS[4] };
    const { base, steps } = upgradeWhatIf({ inst: known, impellers: IMPELLERS, speed: SPEED, changesPct: [10] });
    expect(steps[0].fitted.point.speedRpm / base.point.speedRpm).toBeCloseTo(Math.sqrt(1.1), 9);
  });

  it('finds a heavier matched impeller that uses more of a bigger engine than the fitted one', () => {
    const light: Installation = { ...FLAT, impeller: IMPELLERS[1] };
    const { steps } = upgradeWhatIf({ inst: light, impellers: IMPELLERS, speed: SPEED, changesPct: [50] });
    const { fitted, best } = steps[0];
    expect(best).not.toBeNull();
    expect(best!.point.status).toBe('matched');
    expect(IMPELLERS.find((i) => i.id === best!.impellerId)!.ratingKw).toBeGreaterThan(29);
    expect(best!.point.powerKw).toBeGreaterThanOrEqual(fitted.point.powerKw - 1e-9);
    expect(best!.speedKn).toBeGreaterThanOrEqual(fitted.speedKn - 1e-9);
  });

  it('returns no best impeller when none of the family is matched', () => {
    expect(bestImpeller({ inst: FLAT, impellers: [IMPELLERS[0]], speed: SPEED, powerFactor: 3 })).toBeNull();
  });
});

describe('impellerTopSpeeds()', () => {
  it('lists every impeller, lighter ones revving higher', () => {
    const rows = impellerTopSpeeds({ inst: FLAT, impellers: IMPELLERS, speed: SPEED });
    expect(rows.map((r) => r.impellerId)).toEqual(IMPELLERS.map((i) => i.id));
    for (let i = 1; i < rows.length; i++) expect(rows[i].point.speedRpm).toBeLessThan(rows[i - 1].point.speedRpm);
  });
});

describe('powerChangeForSpeedGain()', () => {
  it('needs +21 % power for +10 % speed with the fitted impeller on a flat-topped engine (1.1² = 1.21)', () => {
    const need = powerChangeForSpeedGain({ inst: FLAT, impellers: IMPELLERS, gainPct: 10 });
    expect(need.fittedChangePct).toBeCloseTo(21, 6);
    expect(need.targetPowerKw).toBeCloseTo(solveInstallation(FLAT).powerKw * 1.21, 9);
  });

  it('agrees with the forward what-if: that change gives that speed gain', () => {
    const need = powerChangeForSpeedGain({ inst: INST, impellers: IMPELLERS, gainPct: 5 });
    expect(need.fittedChangePct).not.toBeNull();
    const { base, steps } = upgradeWhatIf({ inst: INST, impellers: IMPELLERS, speed: SPEED, changesPct: [need.fittedChangePct!] });
    expect(steps[0].fitted.speedKn / base.speedKn).toBeCloseTo(1.05, 6);
    expect(need.rematchedChangePct).not.toBeNull();
    expect(need.rematchedChangePct!).toBeLessThanOrEqual(need.fittedChangePct! + 1e-6);
  });

  it('says null when the fitted impeller hits the rev limiter before the speed gain', () => {
    const light: Installation = { ...INST, impeller: IMPELLERS[0] };
    expect(powerChangeForSpeedGain({ inst: light, impellers: IMPELLERS, gainPct: 30 }).fittedChangePct).toBeNull();
  });
});
