/**
 * Invented test engines, impellers and random generators for the model tests (no real products).
 */
import fc from 'fast-check';
import { engineCurve } from '../../src/model/engineCurve.ts';
import type { Installation } from '../../src/model/installation.ts';
import type { Ambient, CurvePoint, EngineLimits, EngineSpec, ImpellerFamilySpec } from '../../src/model/types.ts';

export const REFERENCE_AIR: Ambient = { pressureKpa: 100, airTempC: 25, relativeHumidityPct: 30 };
export const LIMITS: EngineLimits = { idleRpm: 800, windowLowRpm: 5400, windowHighRpm: 6000, maxRpm: 6500 };
export const FAMILY: ImpellerFamilySpec = { referenceSpeedRpm: 1000, exponent: 3, tolerancePct: 5, referenceDensityKgM3: 1025 };

/** Rows from [rpm, kW] pairs. */
export function rows(pairs: readonly (readonly [number, number])[]): CurvePoint[] {
  return pairs.map(([speedRpm, powerKw]) => ({ speedRpm, powerKw }));
}

/** An invented petrol engine with the given table (or known point) and limits. */
export function testEngine(over: Partial<EngineSpec> & { points?: CurvePoint[] } = {}): EngineSpec {
  const { points, ...rest } = over;
  return {
    id: 'test/demo',
    label: 'Test engine (invented)',
    fuel: 'petrol',
    aspiration: 'natural',
    curve: { kind: 'table', points: points ?? rows([[2000, 60], [3000, 110], [4000, 160], [5000, 200], [6000, 220], [6500, 215]]) },
    limits: LIMITS,
    powerTolerancePct: 5,
    referenceAmbient: REFERENCE_AIR,
    conditionFactor: 1,
    ...rest,
  };
}

/** An installation at reference air with a 1 kW-rated impeller, direct drive, 0.97 efficiency. */
export function testInstallation(over: Partial<Installation> = {}): Installation {
  return {
    engine: testEngine(),
    ambient: REFERENCE_AIR,
    family: FAMILY,
    impeller: { id: 'mid', label: 'Mid', ratingKw: 1 },
    driveLine: { ratio: 1, efficiency: 0.97 },
    waterDensityKgM3: 1025,
    ...over,
  };
}

/** Random full-throttle tables: 2–24 rows, any shape (rises, flat runs, falls, dips), power ≥ 0. */
export const arbTable: fc.Arbitrary<CurvePoint[]> = fc
  .record({
    startRpm: fc.double({ min: 600, max: 2500, noNaN: true }),
    startKw: fc.double({ min: 5, max: 150, noNaN: true }),
    steps: fc.array(
      fc.record({
        dRpm: fc.double({ min: 50, max: 800, noNaN: true }),
        dKw: fc.oneof(fc.constant(0), fc.double({ min: -40, max: 80, noNaN: true })),
      }),
      { minLength: 1, maxLength: 23 },
    ),
  })
  .map(({ startRpm, startKw, steps }) => {
    const points: CurvePoint[] = [{ speedRpm: startRpm, powerKw: startKw }];
    for (const s of steps) {
      const last = points[points.length - 1];
      points.push({ speedRpm: last.speedRpm + s.dRpm, powerKw: Math.max(0, last.powerKw + s.dKw) });
    }
    return points;
  });

/** Random impeller and drive line whose absorption meets a random table near a chosen speed. */
export const arbMatch = fc.record({
  points: arbTable,
  at: fc.double({ min: 0.1, max: 1, noNaN: true }),
  load: fc.oneof(
    { weight: 2, arbitrary: fc.double({ min: 0.97, max: 1, noNaN: true }) },
    { weight: 2, arbitrary: fc.double({ min: 0.5, max: 1.05, noNaN: true }) },
    { weight: 1, arbitrary: fc.double({ min: 0.3, max: 3, noNaN: true }) },
  ),
  exponent: fc.double({ min: 2, max: 4, noNaN: true }),
  ratio: fc.double({ min: 0.5, max: 2.5, noNaN: true }),
  efficiency: fc.double({ min: 0.6, max: 1, noNaN: true }),
  maxShare: fc.double({ min: 0.3, max: 1.3, noNaN: true }),
  /** Aim exactly at a row, where a surplus just above zero can dip negative inside the next piece. */
  snapToRow: fc.boolean(),
});
export type RandomMatch = typeof arbMatch extends fc.Arbitrary<infer T> ? T : never;

/** Build an installation from a random match: the impeller rating puts absorbed ≈ load × available at `at`. */
export function installationFrom(m: RandomMatch): Installation {
  const first = m.points[0];
  const last = m.points[m.points.length - 1];
  const span = last.speedRpm - first.speedRpm;
  const maxRpm = first.speedRpm + m.maxShare * span;
  const limits: EngineLimits = {
    idleRpm: first.speedRpm * 0.8,
    windowLowRpm: first.speedRpm + 0.6 * (maxRpm - first.speedRpm),
    windowHighRpm: first.speedRpm + 0.85 * (maxRpm - first.speedRpm),
    maxRpm,
  };
  const engine = testEngine({ points: m.points, limits });
  // Aim anywhere along the curve, between rows too, so crossings inside pieces are common.
  const row = m.points[Math.min(m.points.length - 1, Math.floor(m.at * m.points.length))];
  const aimRpm = m.snapToRow ? row.speedRpm : first.speedRpm + m.at * span;
  const aimKw = Math.max(1, engineCurve(engine).powerKwUnchecked(aimRpm));
  const family: ImpellerFamilySpec = { ...FAMILY, exponent: m.exponent };
  // Engine-side absorption = rating · ((n/ratio)/1000)^k / efficiency; solve for the rating at the aim.
  const ratingKw = Math.max(1e-3, (m.load * aimKw * m.efficiency) / Math.pow(aimRpm / m.ratio / 1000, m.exponent));
  return testInstallation({
    engine,
    family,
    impeller: { id: 'rnd', label: 'Random', ratingKw },
    driveLine: { ratio: m.ratio, efficiency: m.efficiency },
    waterDensityKgM3: 1025,
  });
}

/**
 * The hard case for a solver: every row up to a random row j shows a hair (ε) of surplus, the rows after
 * j climb at least as fast as the impeller's n^k, yet between rows the surplus often dips below zero
 * (the interpolant leaves row j slower than the absorption curve does).
 */
export const arbGrazing = fc
  .record({
    m: arbMatch,
    rowShare: fc.double({ min: 0, max: 1, noNaN: true }),
    eps: fc.double({ min: 1e-4, max: 0.05, noNaN: true }),
    climb: fc.double({ min: 0, max: 0.3, noNaN: true }),
  })
  .map(({ m, rowShare, eps, climb }) => {
    const k = m.exponent;
    const j = Math.min(m.points.length - 2, Math.floor(rowShare * (m.points.length - 1)));
    const pj = Math.max(m.points[j].powerKw, 1);
    const points = m.points.map((p, i) =>
      i <= j ? p : { ...p, powerKw: Math.max(p.powerKw, pj * (p.speedRpm / m.points[j].speedRpm) ** k * (1 + climb)) },
    );
    const inst = installationFrom({ ...m, points });
    let c = Number.POSITIVE_INFINITY;
    for (let i = 0; i <= j; i++) c = Math.min(c, Math.max(points[i].powerKw, 1e-3) / points[i].speedRpm ** k);
    // Engine-side c = rating / (efficiency · (1000 · ratio)^k) at reference density.
    const ratingKw = c * (1 - eps) * inst.driveLine.efficiency * (1000 * inst.driveLine.ratio) ** k;
    return { ...inst, impeller: { ...inst.impeller, ratingKw } };
  });

/** fast-check settings: seeded so failures reproduce. */
export const PROPERTY_RUNS = { seed: 20240611, numRuns: 300 } as const;
