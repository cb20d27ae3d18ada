import { describe, expect, it } from 'vitest';
import { analyseBoat } from '../../src/analysis/index.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { demoFiles, demoWith } from '../data/helpers.ts';

/**
 * Greyling's engine is a known point (constant torque: A(n) = P₀ · n / n₀) and its jet family's exponent is
 * k = 3, so in the boat's own air and water each trial's effective rating is
 *   R = A(n) · η / ((n / ratio / n_ref)^k · ρ/ρ_ref) = C · n^(1 − k) = C · n^−2,
 * with C the same for every trial (the air correction, η, ratio, n_ref and ρ cancel in ratios). The rule
 * (docs/model.md, our choice): baseline = the first 3 trials, limits mean ± 3 · max(s, 2 % of mean) · √(4/3).
 */
function worked(rpms: readonly number[]) {
  const r = rpms.map((n) => n ** -2);
  const base = r.slice(0, 3);
  const mean = base.reduce((a, b) => a + b, 0) / 3;
  const sd = Math.sqrt(base.reduce((a, x) => a + (x - mean) ** 2, 0) / 2);
  const half = 3 * Math.max(sd, 0.02 * mean) * Math.sqrt(1 + 1 / 3);
  const last = r[r.length - 1];
  return { driftPct: (last / mean - 1) * 100, outside: Math.abs(last - mean) > half, halfPct: (half / mean) * 100 };
}

function greylingWithLog(rpms: readonly number[]) {
  const rows = rpms.map((n, i) => `202${4 + Math.floor(i / 2)}-0${4 + (i % 2) * 3}-12,gale,${n}`).join('\n');
  const r = loadProjectFromFiles(demoWith('data/boats/greyling.trials.csv', `date,impeller,wot_rpm\n${rows}\n`), { dataDir: 'data' });
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return analyseBoat({ boat: r.project.boats.find((b) => b.id === 'greyling')!, project: r.project });
}

describe('the wear flag from a boat’s trial log', () => {
  it('is not raised while the latest trial stays inside the limits', () => {
    const rpms = [5600, 5610, 5590, 5620, 5650];
    const w = worked(rpms);
    expect(w.outside).toBe(false); // −1.8 % against limits of ±6.9 %
    const result = greylingWithLog(rpms);
    const gale = result.trend!.impellers.find((i) => i.impellerId === 'gale')!;
    expect(gale.verdict).toBe('steady');
    expect(gale.points[4].driftPct!).toBeCloseTo(w.driftPct, 6);
    expect(result.trend!.flag).toBeUndefined();
    expect(result.lastTrial).toEqual({ date: '2026-04-12', wotRpm: 5650 });
  });

  it('is raised in plain words when full-throttle rpm has risen past them', () => {
    const rpms = [5600, 5610, 5590, 5700, 5850];
    const w = worked(rpms);
    expect(w.outside).toBe(true); // (5600/5850)² − 1 ≈ −8.4 % against ±6.9 %
    const flag = greylingWithLog(rpms).trend!.flag!;
    expect(flag.direction).toBe('absorbsLess');
    expect(flag.driftPct).toBeCloseTo(w.driftPct, 6);
    expect([flag.date, flag.wotRpm]).toEqual(['2026-04-12', 5850]);
    expect(flag.meaning).toContain('the impeller absorbs less');
    expect(flag.meaning).toContain('a blocked intake');
    expect(flag.action).toContain('the impeller, the intake and the wear ring');
    expect(flag.action).toContain('the engine checked');
  });

  it('tells falling rpm apart: the engine delivers less or the boat is heavier', () => {
    const rpms = [5600, 5610, 5590, 5500, 5350];
    expect(worked(rpms).outside).toBe(true); // (5600/5350)² − 1 ≈ +9.6 %
    const flag = greylingWithLog(rpms).trend!.flag!;
    expect(flag.direction).toBe('absorbsMore');
    expect(flag.meaning).toContain('the engine delivers less');
    expect(flag.meaning).toContain('the boat is heavier');
  });

  it('the demo’s Sorrel Belle log raises it: three seasons, the last trial outside', () => {
    const r = loadProjectFromFiles(demoFiles(), { dataDir: 'data' });
    if (!r.ok) throw new Error('demo did not load');
    const result = analyseBoat({ boat: r.project.boats.find((b) => b.id === 'sorrel-belle')!, project: r.project });
    const pebble = result.trend!.impellers.find((i) => i.impellerId === 'pebble')!;
    expect(new Set(pebble.points.map((p) => p.date.slice(0, 4)))).toEqual(new Set(['2024', '2025', '2026']));
    expect(pebble.points.filter((p) => p.outside === 'yes').map((p) => p.date)).toEqual(['2026-06-20']);
    expect(result.trend!.flag?.direction).toBe('absorbsLess');
    // Every other demo boat with trials keeps no flag.
    for (const b of r.project.boats.filter((x) => x.id !== 'sorrel-belle')) expect(analyseBoat({ boat: b, project: r.project }).trend?.flag, b.id).toBeUndefined();
  });
});
