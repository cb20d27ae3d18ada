import { describe, expect, it } from 'vitest';
import { analyseBoat, boatInstallation, READING_SCATTER_PCT, windowPlace } from '../../src/analysis/index.ts';
import type { Boat, Project } from '../../src/data/types.ts';
import { solveInstallation } from '../../src/model/index.ts';
import { boat, project } from '../sheets/fixtures/demoProject.ts';

/** The demo boat with WOT trials the model itself gives with the engine at `factor` (invented data), rpm offset by `offsets`. */
function trialBoat(args: { ids: readonly string[]; factor: number; offsets?: readonly number[] }): Boat {
  const trials = args.ids.map((impellerId, i) => {
    const inst = boatInstallation(boat, boat.jet.impellers.find((x) => x.id === impellerId));
    const p = solveInstallation({ ...inst, engine: { ...inst.engine, conditionFactor: args.factor } });
    return { date: `2026-05-0${i + 1}`, impellerId, wotRpm: p.speedRpm + (args.offsets?.[i] ?? 0), ambient: boat.site.ambient, water: boat.water };
  });
  return { ...boat, trials };
}

const analyse = (b: Boat) => analyseBoat({ boat: b, project: { ...project, boats: [b] } as Project });

/** WOT speed of an impeller with the engine truly at `factor` and the impeller's rating scaled by ratingFactor. */
function truthRpm(impellerId: string, factor: number, ratingFactor = 1): number {
  const inst = boatInstallation(boat, boat.jet.impellers.find((x) => x.id === impellerId));
  return solveInstallation({ ...inst, engine: { ...inst.engine, conditionFactor: factor } }, { ratingFactor }).speedRpm;
}

describe('calibrated WOT bands', () => {
  it('leave a boat without usable trials uncalibrated', () => {
    const r = analyse(boat);
    expect(r.calibrated).toBeUndefined();
    expect(r.alternatives.every((a) => a.calibratedBand === undefined)).toBe(true);
  });

  it('centre on the truth and span exactly the reading scatter for tried impellers when noise-free trials leave no fit error', () => {
    // Three impellers, engine 5 % down: the fit recovers factor 0.95 and exponent 3 with zero standard errors.
    const r = analyse(trialBoat({ ids: ['b', 'd', 'c'], factor: 0.95 }));
    const cal = r.calibrated!;
    expect(cal.calibration.powerFactor).toBeCloseTo(0.95, 6);
    for (const id of ['b', 'c', 'd']) {
      const band = r.alternatives.find((a) => a.impellerId === id)!.calibratedBand!;
      const truth = truthRpm(id, 0.95);
      expect(band.nominal.speedRpm).toBeCloseTo(truth, 3);
      const scatter = (READING_SCATTER_PCT / 100) * band.nominal.speedRpm;
      expect(band.low.speedRpm).toBeCloseTo(truth - scatter, 3);
      expect(band.high.speedRpm).toBeCloseTo(truth + scatter, 3);
    }
    expect(cal.wot).toEqual(r.alternatives.find((a) => a.fitted === 'yes')!.calibratedBand);
  });

  it('keep the family tolerance for impellers no trial ran, on top of the reading scatter', () => {
    const r = analyse(trialBoat({ ids: ['b', 'd', 'c'], factor: 0.95 }));
    for (const id of ['a', 'e']) {
      const band = r.alternatives.find((a) => a.impellerId === id)!.calibratedBand!;
      const scatter = (READING_SCATTER_PCT / 100) * band.nominal.speedRpm;
      // Heavy corner: rating +5 % (the family tolerance); light corner: rating −5 %; neither near the limiter here.
      expect(band.low.speedRpm).toBeCloseTo(truthRpm(id, 0.95, 1.05) - scatter, 3);
      expect(band.high.speedRpm).toBeCloseTo(Math.min(truthRpm(id, 0.95, 0.95) + scatter, boat.engine.limits.maxRpm), 3);
    }
  });

  it('widen to the largest residual when the trials scatter more than the reading allowance', () => {
    // Two trials of one impeller 120 rpm apart: the engine factor fits between them, residuals about ±60 rpm.
    const r = analyse(trialBoat({ ids: ['b', 'b'], factor: 1, offsets: [-60, 60] }));
    const c = r.calibrated!;
    const largest = Math.max(...c.calibration.trials.map((t) => Math.abs(t.residualRpm)));
    expect(largest).toBeGreaterThan((READING_SCATTER_PCT / 100) * c.wot.nominal.speedRpm);
    expect(c.bandNote).toContain(`largest residual ${Math.round(largest)} rpm`);
    // The fit's own standard error widens the corners too, so the band is at least nominal ± largest residual.
    expect(c.wot.high.speedRpm - c.wot.nominal.speedRpm).toBeGreaterThanOrEqual(largest - 1e-9);
    expect(c.wot.nominal.speedRpm - c.wot.low.speedRpm).toBeGreaterThanOrEqual(largest - 1e-9);
  });

  it('never end past the maximum rpm, and call an end that prints as the maximum the limiter', () => {
    let limited = 0;
    for (const factor of [1, 1.05, 1.1, 1.15]) {
      const r = analyse(trialBoat({ ids: ['b'], factor }));
      for (const a of r.alternatives) {
        for (const p of [a.calibratedBand!.low, a.calibratedBand!.nominal, a.calibratedBand!.high]) {
          expect(p.speedRpm).toBeLessThanOrEqual(boat.engine.limits.maxRpm);
          // Sheets print rpm to 10: 5395 rpm and above reads as the 5400 rpm maximum.
          if (p.speedRpm >= boat.engine.limits.maxRpm - 5) {
            expect(p.status).toBe('revLimited');
            limited += 1;
          }
        }
      }
    }
    expect(limited).toBeGreaterThan(0);
  });

  it('name the latest trial of the fitted impeller as the measured figure', () => {
    const r = analyse(trialBoat({ ids: ['b', 'd', 'b'], factor: 0.95, offsets: [0, 0, 12] }));
    expect(r.calibrated!.fittedMeasured).toEqual({ date: '2026-05-03', wotRpm: truthRpm('b', 0.95) + 12 });
    expect(analyse(trialBoat({ ids: ['d', 'c'], factor: 0.95 })).calibrated!.fittedMeasured).toBeUndefined();
  });
});

describe('rpm-gain targets', () => {
  const limits = boat.engine.limits; // window 4800–5200, maximum 5400 rpm

  it('are placed against the window, the maximum counting as beyond it', () => {
    expect(windowPlace(4799, limits)).toBe('belowWindow');
    expect(windowPlace(4800, limits)).toBe('withinWindow');
    expect(windowPlace(5200, limits)).toBe('withinWindow');
    expect(windowPlace(5201, limits)).toBe('aboveWindow');
    expect(windowPlace(5400, limits)).toBe('beyondMax');
  });

  it('list the top of the window as a target in rpm order, and mark the targets above it', () => {
    const r = analyse(boat);
    const targets = r.rpmGains.map((g) => g.targetRpm);
    expect(targets).toEqual([...targets].sort((a, b) => a - b));
    const top = r.rpmGains.find((g) => g.kind === 'windowTop')!;
    expect(top.targetRpm).toBe(limits.windowHighRpm);
    expect(top.gainRpm).toBeCloseTo(limits.windowHighRpm - r.wot.nominal.speedRpm, 9);
    for (const g of r.rpmGains) expect(g.window).toBe(windowPlace(g.targetRpm, limits));
    expect(r.rpmGains.some((g) => g.window === 'aboveWindow')).toBe(true);
    expect(r.rpmGains.filter((g) => g.window === 'beyondMax').every((g) => g.status === 'unreachable')).toBe(true);
  });

  it('rest on the calibrated model when the boat has trials', () => {
    const r = analyse(trialBoat({ ids: ['b', 'd', 'c'], factor: 0.95 }));
    const cal = r.calibrated!;
    expect(cal.rpmGains[0].targetRpm).toBeCloseTo(cal.wot.nominal.speedRpm + 100, 9);
    expect(cal.upgrade.find((u) => u.changePct === 10)!.wot.speedRpm).toBeCloseTo(
      solveInstallation({ ...boatInstallation(boat), engine: { ...boat.engine, conditionFactor: 0.95 } }, { powerFactor: 1.1 }).speedRpm,
      3,
    );
  });
});
