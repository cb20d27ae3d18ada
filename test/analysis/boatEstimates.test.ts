import { describe, expect, it } from 'vitest';
import { boatInstallation } from '../../src/analysis/boat.ts';
import { boatCalibration, calibrationResult } from '../../src/analysis/boatCalibration.ts';
import { boatEstimates } from '../../src/analysis/boatEstimates.ts';
import type { Boat } from '../../src/data/types.ts';
import { crouchSpeedKn, solveInstallation } from '../../src/model/index.ts';
import { boat } from '../sheets/fixtures/demoProject.ts';

/** The demo boat with trials made by the nominal model itself, its engine 6 % down, speeds from C = 170. */
function boatWithTrials(): Boat {
  const runs = ['b', 'd', 'c'].map((impellerId, i) => {
    const inst = boatInstallation(boat, boat.jet.impellers.find((x) => x.id === impellerId));
    const p = solveInstallation({ ...inst, engine: { ...inst.engine, conditionFactor: 0.94 } });
    const speedKn = crouchSpeedKn({ crouchConstant: 170, displacementKg: boat.hull.displacementKg + 150, shaftPowerKw: p.powerKw * 0.97 });
    return { date: `2026-04-0${i + 1}`, impellerId, wotRpm: p.speedRpm, speedKn, loadKg: 150, ambient: boat.site.ambient, water: boat.water };
  });
  return { ...boat, trials: runs, fuelTankL: 120 };
}

function estimatesOf(b: Boat) {
  const inst = boatInstallation(b);
  const calibration = boatCalibration(b, inst);
  return { calibration, est: boatEstimates({ boat: b, inst, calibration, basis: 'calibrated' }), nominal: boatEstimates({ boat: b, inst, calibration, basis: 'nominal' }) };
}

describe('boatEstimates()', () => {
  it('uses the typical hull constant and the nominal model for a boat without trials', () => {
    const { est } = estimatesOf(boat);
    expect(est.basis).toBe('nominal');
    expect(est.hull).toMatchObject({ crouchConstant: 150, source: 'typical' });
    expect(est.topSpeeds.map((r) => r.impellerId)).toEqual(['a', 'b', 'c', 'd', 'e']);
    expect(est.topSpeeds.filter((r) => r.fitted === 'yes').map((r) => r.impellerId)).toEqual(['b']);
  });

  it('turns a speed setting into the power and rpm that give it, and back', () => {
    const { est } = estimatesOf(boat);
    const towing = est.cruise.find((c) => c.kind === 'speed')!;
    expect(towing.speedKn).toBe(22);
    expect(crouchSpeedKn({ crouchConstant: 150, displacementKg: 1250, shaftPowerKw: towing.powerKw! * 0.97 })).toBeCloseTo(22, 9);
    const economy = est.cruise.find((c) => c.kind === 'power')!;
    // Typical petrol 350 g/kWh and 0.74 kg/L (common practice, no source): 50 kW → 23.65 L/h.
    expect(economy.fuelLPerH).toBeCloseTo((50 * 0.35) / 0.74, 9);
  });

  it('calibrates the engine factor and the hull constant from logged trials and names their dates', () => {
    const b = boatWithTrials();
    const { calibration, est } = estimatesOf(b);
    // Three impellers spanning more than 3 % in rpm: exponent and engine factor are both fitted.
    expect(calibration.mode).toBe('exponentAndCondition');
    expect(calibration.exponent).toBeCloseTo(3, 6);
    expect(calibration.powerFactor).toBeCloseTo(0.94, 6);
    expect(est.basis).toBe('calibrated');
    expect(est.trialDates).toEqual(['2026-04-01', '2026-04-02', '2026-04-03']);
    expect(est.hull.source).toBe('trial');
    expect(est.hull.crouchConstant).toBeCloseTo(170, 6);
    expect(est.cruise.every((c) => c.rangeWithReserveNm! > 0)).toBe(true);
  });

  it('keeps rpm figures on the nominal model when asked, with the trial-calibrated hull constant', () => {
    const b = boatWithTrials();
    const { est, nominal } = estimatesOf(b);
    expect(nominal.basis).toBe('nominal');
    expect(nominal.trialDates).toEqual([]);
    expect(nominal.hull.crouchConstant).toBe(est.hull.crouchConstant);
    const fitted = (e: typeof est) => e.topSpeeds.find((r) => r.fitted === 'yes')!;
    // The nominal engine is 6 % stronger than the calibrated one, so it revs higher with the same impeller.
    expect(fitted(nominal).wotRpm).toBeGreaterThan(fitted(est).wotRpm);
    expect(fitted(est).wotRpm).toBeCloseTo(b.trials.find((t) => t.impellerId === 'b')!.wotRpm, 6);
  });

  it('gives upgrade rows with speed gains that grow with power, and a best impeller when one is matched', () => {
    const { est } = estimatesOf(boat);
    for (let i = 1; i < est.upgrade.length; i++) expect(est.upgrade[i].speedKn).toBeGreaterThanOrEqual(est.upgrade[i - 1].speedKn);
    expect(est.upgrade.some((u) => u.best !== undefined)).toBe(true);
    expect(est.speedGains.map((g) => g.gainPct)).toEqual([5, 10, 15]);
  });

  it('is plain JSON with finite numbers only', () => {
    const b = boatWithTrials();
    const { calibration, est } = estimatesOf(b);
    for (const record of [est, calibrationResult(b, calibration)]) {
      const text = JSON.stringify(record);
      expect(JSON.parse(text)).toEqual(record);
      expect(text).not.toMatch(/null|NaN|Infinity/);
    }
  });
});

describe('calibrationResult()', () => {
  it('lists each trial with its effective rating, tolerance verdict and residual', () => {
    const b = boatWithTrials();
    const r = calibrationResult(b, boatCalibration(b, boatInstallation(b)));
    expect(r.trials).toHaveLength(3);
    // An engine 6 % down pulls rpm down as a heavier impeller would: read against the published engine,
    // every rating comes out 1/0.94 − 1 = +6.38 % heavy, outside ±5 %.
    for (const t of r.trials) {
      expect(t.deviationPct).toBeCloseTo((1 / 0.94 - 1) * 100, 6);
      expect(t.insideTolerance).toBe('no');
      expect(Math.abs(t.residualRpm)).toBeLessThan(1e-6);
    }
    expect(r.exponentSource).toBe('fitted');
    expect(r.trialDates).toEqual(['2026-04-01', '2026-04-02', '2026-04-03']);
  });
});

describe('boatEstimates() below planing speed', () => {
  // The demo boat (1250 kg, fresh water) planes from Fn∇ = 3, about 19 kn (model/planing.ts).
  const slow: Boat = {
    ...boat,
    fuelTankL: 120,
    cruise: [
      { label: 'Trolling', kind: 'power', powerKw: 8 },
      { label: 'No-wake zone', kind: 'speed', speedKn: 5 },
      { label: 'Fast', kind: 'power', powerKw: 90 },
    ],
  };

  it('gives no speed for a cruise point below planing speed, but keeps its rpm, power and fuel', () => {
    const { est } = estimatesOf(slow);
    expect(est.hull.planingFromKn).toBeGreaterThan(18);
    expect(est.hull.planingFromKn).toBeLessThan(20);
    const [trolling, noWake, fast] = est.cruise;
    // Crouch at 8 kW would say 150 / sqrt(1250 kg / 8 kW) in lb and hp: about 9 kn, far below planing.
    expect(crouchSpeedKn({ crouchConstant: 150, displacementKg: 1250, shaftPowerKw: 8 * 0.97 })).toBeLessThan(est.hull.planingFromKn);
    expect(trolling).toMatchObject({ status: 'ok', speedBasis: 'belowPlaning', powerKw: 8 });
    expect(trolling.speedKn).toBeUndefined();
    expect(trolling.rangeWithReserveNm).toBeUndefined();
    // Typical petrol 350 g/kWh and 0.74 kg/L (common practice, no source).
    expect(trolling.fuelLPerH).toBeCloseTo((8 * 0.35) / 0.74, 9);
    expect(noWake).toEqual({ label: 'No-wake zone', kind: 'speed', status: 'belowPlaning', speedBasis: 'belowPlaning' });
    expect(fast.speedBasis).toBe('planing');
    expect(fast.speedKn).toBeGreaterThan(est.hull.planingFromKn);
  });
});
