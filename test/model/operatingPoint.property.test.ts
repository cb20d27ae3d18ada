import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { absorbedPowerKw } from '../../src/model/absorption.ts';
import { engineCurve } from '../../src/model/engineCurve.ts';
import { installationAbsorber, solveInstallation, type Installation } from '../../src/model/installation.ts';
import { arbGrazing, arbMatch, installationFrom, PROPERTY_RUNS } from './fixtures.ts';

/** Surplus (kW) of the installation's engine over its impeller at n, with optional factors. */
function surplus(inst: Installation, n: number, opts: { ratingFactor?: number; powerFactor?: number } = {}): number {
  const curve = engineCurve(inst.engine, { ambient: inst.ambient, powerFactor: opts.powerFactor });
  return curve.powerKwUnchecked(n) - absorbedPowerKw(installationAbsorber(inst, opts), n);
}

const factor = fc.double({ min: 1.0001, max: 1.5, noNaN: true });


describe('operatingPoint() on random tables and impellers', () => {
  it('balances engine and impeller power to a relative 1e-9 whenever it reports a crossing', () => {
    fc.assert(
      fc.property(arbMatch, (m) => {
        const inst = installationFrom(m);
        const op = solveInstallation(inst);
        for (const v of [op.speedRpm, op.powerKw, op.unusedPowerKw]) expect(Number.isFinite(v)).toBe(true);
        if (op.status === 'matched' || op.status === 'belowWindow' || op.status === 'aboveWindow') {
          const absorbed = absorbedPowerKw(installationAbsorber(inst), op.speedRpm);
          const available = engineCurve(inst.engine, { ambient: inst.ambient }).powerKwUnchecked(op.speedRpm);
          expect(Math.abs(available - absorbed)).toBeLessThanOrEqual(1e-9 * Math.max(absorbed, 1e-9));
          expect(op.powerKw).toBeCloseTo(absorbed, 12);
        }
        if (op.status === 'revLimited') expect(op.unusedPowerKw).toBeGreaterThan(0);
      }),
      PROPERTY_RUNS,
    );
  });

  it('agrees with a dense brute-force scan of the surplus', () => {
    fc.assert(
      fc.property(fc.oneof(arbMatch.map(installationFrom), arbGrazing), (inst) => {
        const curve = engineCurve(inst.engine, { ambient: inst.ambient });
        const absorber = installationAbsorber(inst);
        const op = solveInstallation(inst);
        const lo = curve.minRpm;
        const hi = Math.min(curve.maxRpm, inst.engine.limits.maxRpm);
        if (lo > hi) return;
        const s = (n: number) => curve.powerKwUnchecked(n) - absorbedPowerKw(absorber, n);
        const tol = (n: number) => 1e-9 * Math.max(1, absorbedPowerKw(absorber, n));
        const steps = 4000;
        let firstNegative = Number.POSITIVE_INFINITY;
        for (let j = 0; j <= steps; j++) {
          const n = lo + ((hi - lo) * j) / steps;
          const sn = s(n);
          // No grid point below the reported speed may already be clearly short of power…
          if (n < op.speedRpm * (1 - 1e-12)) expect(sn).toBeGreaterThan(-tol(n));
          if (sn < -tol(n) && firstNegative === Number.POSITIVE_INFINITY) firstNegative = n;
        }
        // …and the reported speed is no later than the first grid point that is.
        expect(op.speedRpm).toBeLessThanOrEqual(firstNegative);
        if (firstNegative === Number.POSITIVE_INFINITY && op.status !== 'revLimited' && op.status !== 'noCrossing') {
          // The scan saw no negative surplus: the solver found a crossing between grid points; it must be real.
          expect(Math.abs(s(op.speedRpm))).toBeLessThanOrEqual(tol(op.speedRpm));
        }
      }),
      { ...PROPERTY_RUNS, numRuns: 200 },
    );
  });

  it('never gives a higher WOT speed with a heavier impeller, denser water or a weaker engine', () => {
    fc.assert(
      fc.property(arbMatch, factor, (m, f) => {
        const inst = installationFrom(m);
        const base = solveInstallation(inst).speedRpm;
        const slack = 1e-9 * base;
        expect(solveInstallation(inst, { ratingFactor: f }).speedRpm).toBeLessThanOrEqual(base + slack);
        expect(solveInstallation({ ...inst, waterDensityKgM3: inst.waterDensityKgM3 * f }).speedRpm).toBeLessThanOrEqual(base + slack);
        expect(solveInstallation(inst, { powerFactor: 1 / f }).speedRpm).toBeLessThanOrEqual(base + slack);
      }),
      PROPERTY_RUNS,
    );
  });

  it('keeps positive surplus everywhere below the WOT speed (why the corners bound the band)', () => {
    // The monotonicity above rests on this: the answer is inf{n : surplus(n) < 0}.
    fc.assert(
      fc.property(arbMatch, fc.double({ min: 0, max: 1, noNaN: true }), (m, t) => {
        const inst = installationFrom(m);
        const op = solveInstallation(inst);
        const lo = engineCurve(inst.engine).minRpm;
        if (op.speedRpm <= lo) return;
        const n = lo + t * (op.speedRpm - lo) * (1 - 1e-9);
        expect(surplus(inst, n)).toBeGreaterThan(-1e-9 * Math.max(1, op.powerKw));
      }),
      PROPERTY_RUNS,
    );
  });
});
