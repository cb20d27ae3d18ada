import { describe, expect, it } from 'vitest';
import { boatInstallation } from '../../src/analysis/index.ts';
import type { Boat, Paper, Project } from '../../src/data/types.ts';
import { crouchSpeedKn, solveInstallation } from '../../src/model/index.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boxesOverlap } from '../../src/sheets/kit/boxes.ts';
import { MAX_TRIAL_ROWS } from '../../src/sheets/trialTables.ts';
import { boat, project } from './fixtures/demoProject.ts';
import { markBox, texts } from './sceneWalk.ts';

/** The demo boat with n sea trials the model itself would give with the engine 5 % down (invented data). */
function trialBoat(n: number): Boat {
  const ids = ['b', 'd', 'c', 'e', 'a', 'b'];
  const trials = ids.slice(0, n).map((impellerId, i) => {
    const inst = boatInstallation(boat, boat.jet.impellers.find((x) => x.id === impellerId));
    const p = solveInstallation({ ...inst, engine: { ...inst.engine, conditionFactor: 0.95 } });
    const speedKn = crouchSpeedKn({ crouchConstant: 165, displacementKg: boat.hull.displacementKg, shaftPowerKw: p.powerKw * 0.97 });
    return { date: `2026-04-1${i}`, impellerId, wotRpm: p.speedRpm, speedKn, ambient: boat.site.ambient, water: boat.water };
  });
  return { ...boat, trials, fuelTankL: 120 };
}

const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const LETTER: Paper = { size: 'Letter', orientation: 'portrait', bleedMm: 3 };
const ctxFor = (b: Boat) => ({ project: { ...project, boats: [b] } as Project, dateIso: '2026-11-02' });

describe('spec sheet of a boat with sea trials', () => {
  it.each([
    [2, A4],
    [6, A4],
    [6, LETTER],
  ] as const)('lays out %i trials on %s paper with no overlapping text, listing the latest and the calibration', (n, paper) => {
    const b = trialBoat(n);
    const scene = sheetScene({ kind: 'specSheet', boatId: b.id, paper }, ctxFor(b));
    const all = texts(scene);
    const text = all.map((t) => t.text).join('\n');
    const listed = all.filter((t) => t.role !== undefined && /^2026-04-1\d$/.test(t.text)).map((t) => t.text);
    // The latest trials are listed, oldest of them first, at most MAX_TRIAL_ROWS; the rest are counted.
    expect(listed.length).toBeGreaterThanOrEqual(1);
    expect(listed.length).toBeLessThanOrEqual(Math.min(n, MAX_TRIAL_ROWS));
    expect(listed).toEqual(b.trials.slice(n - listed.length).map((t) => t.date));
    if (listed.length < n) expect(text).toContain(`${n - listed.length} older trial(s) not listed.`);
    expect(text).toMatch(/Calibrated\sto\sthe\ssea\strials\sof\s2026-04-10/);
    expect(text).toMatch(/Hull\sconstant\s165\scalibrated/);
    expect(text).not.toMatch(/NaN|Infinity|undefined|null/);
    const boxes = all.map((t) => markBox(t)!);
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i], boxes[j], -0.01), `${all[i].text} / ${all[j].text}`).toBe(false);
  });
});

describe('upgrade sheet and console card speeds', () => {
  it('print an estimated top-speed column and the best impeller for the new power', () => {
    const scene = sheetScene({ kind: 'upgradeSheet', boatId: boat.id, paper: A4 }, ctxFor(boat));
    const text = texts(scene).map((t) => t.text).join(' ');
    expect(text).toContain('Top (kn, est.)');
    expect(text).toContain('Best impeller for the new power');
    // The note wraps, so lines are joined with spaces before matching.
    expect(text).toMatch(/\+10 % top speed: \+\d+ % power with B 1\.15/);
  });

  it('gives the console card a speed column marked as an estimate', () => {
    const scene = sheetScene({ kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 0 } }, ctxFor(boat));
    const text = texts(scene).map((t) => t.text).join('\n');
    const speeds = texts(scene).filter((t) => t.role === 'cruise-speed').map((t) => t.text);
    expect(speeds.length).toBeGreaterThan(0);
    for (const s of speeds) expect(s).toMatch(/^~\d+ kn \(est\.\)$|^below planing: (speed not estimated|no estimate)$/);
    expect(speeds.some((s) => /^~\d+ kn \(est\.\)$/.test(s))).toBe(true);
  });
});
