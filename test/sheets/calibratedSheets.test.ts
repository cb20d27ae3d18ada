import { describe, expect, it } from 'vitest';
import { analyseBoat, boatInstallation } from '../../src/analysis/index.ts';
import type { Boat, Paper, Project, SheetRequest } from '../../src/data/types.ts';
import { solveInstallation, type MatchStatus } from '../../src/model/index.ts';
import type { Scene, SceneNode, TextNode } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { CARD_FIGURE_PT, cardWarning } from '../../src/sheets/consoleCard.ts';
import { rpmBandText, rpmText } from '../../src/sheets/kit/format.ts';
import { RESIDUAL_HEADER } from '../../src/sheets/trialTables.ts';
import { TARGET_WORDS } from '../../src/sheets/upgradeSheet.ts';
import { boat, project } from './fixtures/demoProject.ts';
import { texts } from './sceneWalk.ts';

/** The demo boat with two trials the model gives with the engine 4 % down, tachometer readings off by +37 and −23 rpm (invented data). */
function trialBoat(): Boat {
  const runs = [
    { impellerId: 'b', date: '2026-06-02', offsetRpm: 37 },
    { impellerId: 'd', date: '2026-06-09', offsetRpm: -23 },
  ].map((t) => {
    const inst = boatInstallation(boat, boat.jet.impellers.find((x) => x.id === t.impellerId));
    const p = solveInstallation({ ...inst, engine: { ...inst.engine, conditionFactor: 0.96 } });
    return { date: t.date, impellerId: t.impellerId, wotRpm: Math.round(p.speedRpm) + t.offsetRpm, ambient: boat.site.ambient, water: boat.water };
  });
  return { ...boat, trials: runs };
}

const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const CARD: Paper = { size: 'Card4x6', orientation: 'landscape', bleedMm: 3 };
const ctxFor = (b: Boat) => ({ project: { ...project, boats: [b] } as Project, dateIso: '2026-11-02' });
const sheet = (b: Boat, kind: SheetRequest['kind'], paper: Paper) => sheetScene({ kind, boatId: b.id, paper } as SheetRequest, ctxFor(b));
const textOf = (scene: Scene, role?: string) => texts(scene).filter((t) => role === undefined || t.role === role).map((t) => t.text).join(' ');

/** The text rows of the table whose group has this role: cells grouped by baseline, left to right. */
function tableRows(scene: Scene, role: string): string[][] {
  const find = (n: SceneNode): SceneNode | undefined => (n.role === role ? n : n.type === 'group' ? n.children.map(find).find((x) => x) : undefined);
  const group = find(scene.root);
  if (!group || group.type !== 'group') throw new Error(`no table "${role}"`);
  const cells = group.children.filter((n): n is TextNode => n.type === 'text');
  const rows = new Map<number, TextNode[]>();
  for (const c of cells) rows.set(Math.round(c.y * 100), [...(rows.get(Math.round(c.y * 100)) ?? []), c]);
  return [...rows.entries()].sort(([a], [b]) => a - b).map(([, r]) => r.sort((p, q) => p.x - q.x).map((c) => c.text));
}

/** "−23 rpm" / "+6 rpm" / "4821 rpm" → number (true minus sign). */
const rpmValue = (s: string) => Number(s.replace(' rpm', '').replace('−', '-').replace('+', ''));

describe('boat sheets of a boat with sea trials', () => {
  const b = trialBoat();
  const result = analyseBoat({ boat: b, project: ctxFor(b).project });
  const cal = result.calibrated!;

  it('leads the spec sheet with the calibrated top speed and WOT rpm, says whether the impeller suits the engine and names the trials', () => {
    const scene = sheet(b, 'specSheet', A4);
    const fitted = result.alternatives.find((a) => a.fitted === 'yes')!;
    expect(textOf(scene, 'buyer-headline')).toBe(`Top speed about ${Math.round(fitted.calibratedTopSpeedKn!)} kn at full throttle, ${rpmText(cal.wot.nominal.speedRpm)} rpm`);
    const answer = textOf(scene, 'buyer-answer');
    expect(answer).toContain(`between ${rpmBandText(cal.wot.low.speedRpm, cal.wot.high.speedRpm)} (calibrated to sea trials of 2026-06-02, 2026-06-09)`);
    // The statistics go to the technical note at the end, not the answer.
    expect(answer).not.toMatch(/standard error|factor|±/);
    const note = textOf(scene, 'technical-note');
    expect(note).toMatch(/^Technical note\./);
    expect(note).toContain('Calibrated bands cover');
    expect(note).toContain('engine power factor');
    // The engine is 4 % down on its data sheet: calibration moves the fitted impeller's WOT below the data-sheet figure.
    expect(cal.wot.nominal.speedRpm).toBeLessThan(result.wot.nominal.speedRpm - 10);
  });

  it('prints every other impeller on the calibrated model in plain words against the fitted one', () => {
    const rows = tableRows(sheet(b, 'specSheet', A4), 'alternatives-table');
    expect(rows[0]).toEqual(['Impeller', 'Against the fitted one', 'Full throttle (rpm)', 'Top (kn, est.)']);
    const fittedRpm = result.alternatives.find((a) => a.fitted === 'yes')!.calibratedBand!.nominal.speedRpm;
    for (const [i, a] of result.alternatives.entries()) {
      const row = rows[i + 1];
      expect(row[2]).toBe(rpmText(a.calibratedBand!.nominal.speedRpm));
      if (a.fitted === 'yes') continue;
      // Heavier impellers (higher rating) pull rpm down, lighter ones let it rise (cube law; DOMAIN.md).
      const heavier = a.ratingKw > result.alternatives.find((x) => x.fitted === 'yes')!.ratingKw;
      expect(row[1]).toMatch(heavier ? /steps? heavier: about \d+ rpm lower/ : /steps? lighter: about \d+ rpm higher/);
      const said = Number(/about (\d+) rpm/.exec(row[1])![1]);
      expect(Math.abs(said - Math.abs(a.calibratedBand!.nominal.speedRpm - fittedRpm))).toBeLessThanOrEqual(5);
    }
  });

  it('states the residual convention in the trial table header and prints residuals that equal model − measured as shown', () => {
    const rows = tableRows(sheet(b, 'specSheet', A4), 'trials-table');
    const header = rows[0];
    expect(header).toContain(RESIDUAL_HEADER);
    expect(RESIDUAL_HEADER).toBe('Model − measured');
    const [measured, model, residual] = ['Measured WOT', 'Calibrated model', RESIDUAL_HEADER].map((h) => header.indexOf(h));
    expect(rows.slice(1)).toHaveLength(2);
    for (const [i, row] of rows.slice(1).entries()) {
      // Every rpm to 1 rpm, and the residual adds up from the two printed figures.
      expect(row[measured]).toMatch(/^\d+ rpm$/);
      expect(row[model]).toMatch(/^\d+ rpm$/);
      expect(rpmValue(row[residual])).toBe(rpmValue(row[model]) - rpmValue(row[measured]));
      // Same sign as the analysis's predicted − measured (the readings were offset by +37 and −23 rpm).
      const t = cal.calibration.trials[i];
      expect(Math.sign(rpmValue(row[residual]))).toBe(Math.sign(Math.round(t.predictedRpm) - Math.round(t.wotRpm)));
    }
    expect(rows.slice(1).map((r) => Math.sign(rpmValue(r[residual])))).toEqual([-1, 1]);
  });

  it('puts the calibrated range and the measured rpm with its date on the console card, numbers large', () => {
    const scene = sheet(b, 'consoleCard', CARD);
    const range = texts(scene).find((t) => t.role === 'wot-range')!;
    expect(range.text).toBe(rpmBandText(cal.wot.low.speedRpm, cal.wot.high.speedRpm));
    expect(range.sizePt).toBeGreaterThanOrEqual(24);
    const measured = texts(scene).find((t) => t.role === 'wot-measured')!;
    expect(measured.text).toBe(`Measured ${b.trials[0].wotRpm} rpm on 2026-06-02.`);
    // The line naming the trials gives way first on a full card; the measured line keeps its date.
    const calibrationLine = textOf(scene, 'wot-calibration');
    if (calibrationLine !== '') expect(calibrationLine).toBe('Range calibrated to sea trials of 2026-06-02, 2026-06-09.');
    expect(textOf(scene, 'cruise-rpm')).toContain(`${rpmText(cal.cruise[0].speedRpm!)} rpm`);
    // What the owner reads at the helm is large: the most likely rpm, the rpm never to pass, each cruise rpm.
    const figures = texts(scene).filter((t) => ['wot-likely', 'wot-never-above', 'cruise-rpm'].includes(t.role ?? ''));
    expect(figures.map((t) => t.role)).toEqual(expect.arrayContaining(['wot-likely', 'wot-never-above', 'cruise-rpm']));
    for (const t of figures) expect(t.sizePt, t.text).toBeGreaterThanOrEqual(CARD_FIGURE_PT);
    expect(textOf(scene, 'wot-likely')).toBe(`${rpmText(cal.wot.nominal.speedRpm)} rpm`);
    expect(textOf(scene, 'wot-never-above')).toBe(`${rpmText(b.engine.limits.maxRpm)} rpm`);
  });

  it('rests the upgrade sheet on the calibrated model and marks rpm targets above the window', () => {
    const scene = sheet(b, 'upgradeSheet', A4);
    const upgrade = tableRows(scene, 'upgrade-table');
    expect(upgrade[1].slice(0, 2)).toEqual(['As now', rpmText(cal.wot.nominal.speedRpm)]);
    const gains = tableRows(scene, 'rpm-gain-table');
    expect(gains[0]).toEqual(['Gain', 'Target WOT', 'Power change needed', 'Target against the window']);
    expect(gains.slice(1)).toHaveLength(cal.rpmGains.length);
    for (const [i, g] of cal.rpmGains.entries()) {
      const row = gains[i + 1];
      expect(row[3]).toBe(TARGET_WORDS[g.window]);
      if (g.targetRpm > b.engine.limits.windowHighRpm) expect(row[3]).not.toBe('Within window');
      if (g.window === 'beyondMax') expect(row[2]).toBe('–');
    }
    expect(gains.some((r) => r[3] === 'Above window: not a target')).toBe(true);
    expect(gains.some((r) => r[0].endsWith('(window top)') && r[1] === `${rpmText(b.engine.limits.windowHighRpm)} rpm` && r[3] === 'Within window')).toBe(true);
  });
});

describe('boat sheets of a boat without sea trials', () => {
  it.each([
    ['specSheet', A4],
    ['consoleCard', CARD],
    ['upgradeSheet', A4],
  ] as const)('%s mentions no calibration and prints the data-sheet headline', (kind, paper) => {
    const scene = sheet(boat, kind, paper);
    const all = textOf(scene);
    expect(all).not.toMatch(/calibrated to|Calibrated WOT|Calibrated bands|data-sheet model|Data sheet|Measured \d+ rpm on/);
    if (kind === 'specSheet') expect(textOf(scene, 'buyer-headline')).toMatch(/^Top speed about \d+ kn at full throttle, \d+ rpm$/);
  });
});

describe('cardWarning()', () => {
  const limits = { idleRpm: 700, windowLowRpm: 4800, windowHighRpm: 5200, maxRpm: 5400 };
  const point = (speedRpm: number, status: MatchStatus) => ({ speedRpm, powerKw: 100, status, statusText: '', unusedPowerKw: 0 });
  const band = (low: MatchStatus, nominal: MatchStatus, high: MatchStatus) => ({ low: point(4700, low), nominal: point(5000, nominal), high: point(5300, high), worstStatus: nominal, verdict: '' });

  it('warns firmly when the most likely WOT over-revs or lugs, naming the limiter or the window', () => {
    expect(cardWarning(band('revLimited', 'revLimited', 'revLimited'), limits)).toBe('Warning: over-revs, runs into the 5400 rpm limiter. Have a heavier impeller fitted.');
    expect(cardWarning(band('belowWindow', 'belowWindow', 'matched'), limits)).toBe('Warning: lugs below the WOT window (4800–5200 rpm). Have a lighter impeller fitted.');
  });

  it('cautions when only an end of the range may, and stays silent for a fit inside the window', () => {
    expect(cardWarning(band('matched', 'matched', 'revLimited'), limits)).toMatch(/^Caution: may over-rev/);
    expect(cardWarning(band('belowWindow', 'matched', 'aboveWindow'), limits)).toBe('Caution: may lug at the low end (window 4800–5200 rpm).');
    expect(cardWarning(band('matched', 'matched', 'aboveWindow'), limits)).toBe('Caution: may run above the WOT window (4800–5200 rpm) at the top of the range.');
    expect(cardWarning(band('matched', 'matched', 'matched'), limits)).toBe('');
  });

  it('cautions when the most likely WOT runs above the window short of the limiter: usable, a heavier impeller suits better', () => {
    expect(cardWarning(band('aboveWindow', 'aboveWindow', 'aboveWindow'), limits)).toBe('Caution: runs above the WOT window (4800–5200 rpm). A heavier impeller suits the engine better.');
  });
});

describe('sea trials the calibration refuses', () => {
  /** Trials that would need the engine at about a third of its published power (invented data). */
  function implausibleBoat(): Boat {
    const runs = ['b', 'd'].map((impellerId, i) => {
      const inst = boatInstallation(boat, boat.jet.impellers.find((x) => x.id === impellerId));
      const p = solveInstallation({ ...inst, engine: { ...inst.engine, conditionFactor: 0.35 } });
      return { date: `2026-06-0${i + 2}`, impellerId, wotRpm: Math.round(p.speedRpm), ambient: boat.site.ambient, water: boat.water };
    });
    return { ...boat, trials: runs };
  }

  it('leave the figures as published and say on the spec sheet why the trials were not used', () => {
    const b = implausibleBoat();
    const result = analyseBoat({ boat: b, project: { ...project, boats: [b] } as Project });
    expect(result.calibrated).toBeUndefined();
    expect(result.trialsNotUsed).toMatch(/sea trials were not used/);
    const words = textOf(sheet(b, 'specSheet', A4), 'technical-note');
    expect(words).toMatch(/sea trials were not used/);
    expect(words).toMatch(/qualified marine/);
  });
});
