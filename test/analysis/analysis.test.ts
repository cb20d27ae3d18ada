import { describe, expect, it } from 'vitest';
import type { Boat, EngineVariant, Project } from '../../src/data/types.ts';
import { analyseBoat, analyseWallChart, defaultWallCharts } from '../../src/analysis/index.ts';
import { boat, family, jet, project } from '../sheets/fixtures/demoProject.ts';

/** Every leaf of a JSON value is a finite number or a string. */
function plainLeaves(value: unknown, path = '$'): string[] {
  if (typeof value === 'string') return [];
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => plainLeaves(v, `${path}[${i}]`));
  if (value && typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    return Object.entries(value).flatMap(([k, v]) => plainLeaves(v, `${path}.${k}`));
  }
  return [path];
}

const request = defaultWallCharts(project)[0];
if (request.kind !== 'wallChart') throw new Error('expected a wall chart');

describe('analyseWallChart()', () => {
  const result = analyseWallChart({ family, jet, conditions: request.conditions });

  it('returns plain JSON: finite numbers and strings only, unchanged by a JSON round trip', () => {
    expect(plainLeaves(result)).toEqual([]);
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it('solves every variant against every impeller, with low <= nominal <= high rpm', () => {
    expect(result.pairings).toHaveLength(family.variants.length * jet.impellers.length);
    for (const p of result.pairings) {
      expect(p.band.low.speedRpm).toBeLessThanOrEqual(p.band.nominal.speedRpm);
      expect(p.band.nominal.speedRpm).toBeLessThanOrEqual(p.band.high.speedRpm);
    }
  });

  it('puts each cruise crossing where the affinity law P = rating·(n/n_ref)³/efficiency gives that power', () => {
    // Affinity law as in docs (DOMAIN.md): n = n_ref·(P·η / rating)^(1/3) for fresh water at the reference density.
    const c = result.cruise[0];
    const impeller = jet.impellers[0];
    const expected = 1000 * ((c.powerKw * 0.97) / impeller.ratingKw) ** (1 / 3);
    expect(c.crossings[0].speedRpm).toBeCloseTo(expected, 6);
  });

  it('reports the peak of the published curve at a table row', () => {
    // The invented standard table peaks at its last row, 155 kW at 5400 rpm.
    expect(result.variants[0].reference.peakPowerKw).toBeCloseTo(155, 9);
    expect(result.variants[0].reference.peakPowerRpm).toBe(5400);
  });
});

describe('defaultWallCharts()', () => {
  it('draws cruise lines at 40, 60 and 80 % of the largest peak, rounded to 5 kW, on A3 landscape', () => {
    // Largest peak: 155 kW × 1.19 = 184.45 kW → 73.8, 110.7, 147.6 kW → 75, 110, 150.
    expect(request.conditions.cruisePowersKw).toEqual([75, 110, 150]);
    expect(request.paper).toEqual({ size: 'A3', orientation: 'landscape', bleedMm: 0 });
    expect(request.conditions.driveLine).toEqual({ ratio: 1, efficiency: 0.97 });
  });

  it('makes one chart per family and paired jet, or per jet when no boat uses the family', () => {
    const otherJet = { ...jet, id: 'ploverkite-surge' };
    const withBoat: Project = { ...project, jets: [jet, otherJet] };
    expect(defaultWallCharts(withBoat).map((r) => (r.kind === 'wallChart' ? r.jetId : ''))).toEqual(['ploverkite-drift']);
    const noBoats: Project = { ...withBoat, boats: [] };
    expect(defaultWallCharts(noBoats).map((r) => (r.kind === 'wallChart' ? r.jetId : ''))).toEqual(['ploverkite-drift', 'ploverkite-surge']);
  });
});

describe('analyseBoat()', () => {
  const result = analyseBoat({ boat, project });

  it('returns plain JSON', () => {
    expect(plainLeaves(result)).toEqual([]);
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it('lists every impeller of the jet as an alternative and marks the fitted one', () => {
    expect(result.alternatives.map((a) => a.impellerId)).toEqual(jet.impellers.map((i) => i.id));
    expect(result.alternatives.filter((a) => a.fitted === 'yes').map((a) => a.impellerId)).toEqual([boat.impellerId]);
  });

  it('turns power and rpm cruise settings into rpm and power through the affinity law', () => {
    const [economy, fast] = result.cruise;
    // 50 kW with impeller B (1.15 kW at 1000 rpm, η 0.97): n = 1000·(50·0.97/1.15)^(1/3) ≈ 3480.6 rpm (hand calculation).
    expect(economy.speedRpm).toBeCloseTo(1000 * ((50 * 0.97) / 1.15) ** (1 / 3), 6);
    expect(fast.powerKw).toBeCloseTo((1.15 * 4 ** 3) / 0.97, 9);
  });

  it('moves WOT rpm by the square root of the power ratio for a constant-torque engine (cube law)', () => {
    // DOMAIN.md: with a known point and constant torque, P_engine ∝ n and P_impeller ∝ n³, so n ∝ sqrt(power factor):
    // +21 % power → exactly +10 % rpm, as long as the engine stays below its maximum speed.
    const engine: EngineVariant = { ...boat.engine, curve: { kind: 'knownPoint', point: { speedRpm: 4000, powerKw: 120 } }, limits: { ...boat.engine.limits, maxRpm: 9000, windowHighRpm: 8000 } };
    const ctBoat: Boat = { ...boat, engine, site: { ...boat.site, ambient: engine.referenceAmbient } };
    const r = analyseBoat({ boat: ctBoat, project: { ...project, boats: [ctBoat] } });
    const base = r.wot.nominal.speedRpm;
    const plus20 = r.upgrade.find((u) => u.changePct === 20)!.wot.speedRpm;
    expect(plus20 / base).toBeCloseTo(Math.sqrt(1.2), 9);
    // The rpm-gain table inverts it: +10 % rpm needs +21 % power.
    const gain = r.rpmGains[0];
    expect(gain.powerChangePct! / 100).toBeCloseTo((gain.targetRpm / base) ** 2 - 1, 6);
  });

  it('says an rpm gain past the maximum speed is not reachable', () => {
    const last = result.rpmGains[result.rpmGains.length - 1];
    expect(last.targetRpm).toBeGreaterThan(boat.engine.limits.maxRpm);
    expect(last.status).toBe('unreachable');
  });
});
