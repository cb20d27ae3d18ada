/**
 * Boat pages, parsed back with htmlparser2: a boat with sea trials shows the calibrated figures first,
 * labelled with the trial dates, and the data-sheet figures beside them; the same boat without its trials
 * says nothing about a calibration. Every figure is compared with the analysis it comes from, rounded as
 * printed (rpm to 10, speed and fuel to whole units), and the fuel column is recomputed by hand.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { analyseBoat, isWarning, STATUS_WORDS, type BoatResult } from '../../src/analysis/index.ts';
import type { Project } from '../../src/data/types.ts';
import { boatPage } from '../../src/site/pages/pages.ts';
import { rpmText } from '../../src/sheets/kit/format.ts';
import { byId, demoProject, pageFacts, pageTables, pageText, tableStarting, viewOf, type ParsedCell, type ParsedTable } from './demoSite.ts';

const CALIBRATED_TO = 'calibrated to sea trials of 2026-03-14, 2026-03-21';
const WARNING_WORDS = new Set(Object.entries(STATUS_WORDS).filter(([s]) => isWarning(s as never)).map(([, w]) => w));

let project: Project;
let result: BoatResult;
let page: string;
let tables: ParsedTable[];
/** The demo's calibrated boat with its sea trials taken out. */
let bare: { result: BoatResult; page: string; tables: ParsedTable[] };

function pageOf(p: Project, boatId: string): string {
  const view = viewOf(p);
  return boatPage(view, view.boats.find((b) => b.id === boatId)!);
}

beforeAll(async () => {
  project = await demoProject();
  const boat = project.boats.find((b) => b.id === 'reedshank')!;
  result = analyseBoat({ boat, project });
  page = pageOf(project, 'reedshank');
  tables = pageTables(page);
  const withoutTrials: Project = { ...project, boats: project.boats.map((b) => (b.id === boat.id ? { ...b, trials: [] } : b)) };
  const barePage = pageOf(withoutTrials, boat.id);
  bare = { result: analyseBoat({ boat: { ...boat, trials: [] }, project: withoutTrials }), page: barePage, tables: pageTables(barePage) };
});

const num = (c: ParsedCell) => Number(c.text.replace('−', '-').replace('+', ''));

describe('a boat page with sea trials', () => {
  it('labels the impeller, cruise and upgrade tables and the headline with the trial dates', () => {
    expect(result.calibrated?.calibration.trialDates).toEqual(['2026-03-14', '2026-03-21']);
    for (const start of ['Predicted WOT speed with each', 'Cruise settings with the fitted impeller', 'WOT speed after an engine power change']) {
      expect(tableStarting(tables, start).caption).toContain(CALIBRATED_TO);
    }
    const facts = pageFacts(page);
    const cal = result.calibrated!.wot;
    expect(facts.get('Calibrated WOT')?.text).toBe(
      `${rpmText(cal.nominal.speedRpm)} rpm (${rpmText(cal.low.speedRpm)}–${rpmText(cal.high.speedRpm)} rpm), ${Math.round(cal.nominal.powerKw)} kW, ${CALIBRATED_TO}`,
    );
    expect(facts.get('Data-sheet WOT')).toMatchObject({ text: expect.stringMatching(new RegExp(`^${rpmText(result.wot.nominal.speedRpm)} rpm `)), classes: ['data-sheet'] });
    expect(facts.get('Verdict')?.text).toBe(cal.verdict);
  });

  it('prints each impeller’s calibrated WOT rpm with the data-sheet rpm beside it, and the calibration moved them', () => {
    const t = tableStarting(tables, 'Predicted WOT speed with each');
    expect(t.rows).toHaveLength(result.alternatives.length);
    let moved = 0;
    result.alternatives.forEach((a, i) => {
      const row = t.rows[i];
      expect(t.cell(row, 'WOT rpm').text).toBe(rpmText(a.calibratedBand!.nominal.speedRpm));
      expect(t.cell(row, 'Low rpm').text).toBe(rpmText(a.calibratedBand!.low.speedRpm));
      expect(t.cell(row, 'Data-sheet WOT rpm').text).toBe(rpmText(a.band.nominal.speedRpm));
      expect(t.cell(row, 'Data-sheet WOT rpm').classes).toContain('data-sheet');
      expect(num(t.cell(row, 'Top speed (kn, est.)'))).toBe(Math.round(a.calibratedTopSpeedKn!));
      if (t.cell(row, 'WOT rpm').text !== t.cell(row, 'Data-sheet WOT rpm').text) moved += 1;
    });
    // A fitted engine power factor of 0.979 moves every WOT point by tens of rpm.
    expect(moved).toBeGreaterThan(0);
  });

  it('marks lugging and over-revving impellers in bold words in a marked cell, and no other status', () => {
    const t = tableStarting(tables, 'Predicted WOT speed with each');
    const statuses = t.rows.map((r) => t.cell(r, 'Status'));
    expect(statuses.some((c) => c.text === 'Too light: over-revs')).toBe(true);
    expect(statuses.some((c) => c.text === 'Too heavy: lugs')).toBe(true);
    for (const c of statuses) {
      const warn = WARNING_WORDS.has(c.text);
      expect(c.classes.includes('warn'), c.text).toBe(warn);
      expect(c.strong, c.text).toBe(warn);
    }
  });

  it('gives cruise rows calibrated rpm, data-sheet rpm beside them, and estimated speed and fuel labelled as estimates', () => {
    const t = tableStarting(tables, 'Cruise settings with the fitted impeller');
    const cal = result.calibrated!.cruise;
    expect(t.head.map((h) => h.text)).toEqual(expect.arrayContaining(['Speed (kn, est.)', 'Fuel (L/h, est.)', 'Fuel (US gal/h, est.)', 'Data-sheet rpm']));
    cal.forEach((c, i) => {
      const row = t.rows[i];
      expect(row[0].text).toBe(c.label);
      expect(t.cell(row, 'Engine rpm').text).toBe(rpmText(c.speedRpm!));
      expect(t.cell(row, 'Data-sheet rpm').text).toBe(rpmText(result.cruise[i].speedRpm!));
      expect(num(t.cell(row, 'Speed (kn, est.)'))).toBe(Math.round(c.speedKn!));
      // Fuel flow = brake power × BSFC / fuel density (common practice, no source), by hand from the analysis'
      // power, BSFC (g/kWh) and density (kg/L): e.g. 87.1 kW × 350 g/kWh = 30.5 kg/h ÷ 0.74 kg/L = 41 L/h.
      const e = result.calibrated!.estimates;
      const litresPerHour = (c.powerKw! * e.bsfcGPerKwh) / 1000 / e.fuelKgPerL;
      expect(num(t.cell(row, 'Fuel (L/h, est.)'))).toBe(Math.round(litresPerHour));
      // 1 US gallon = 3.785411784 L (exact by definition, NIST SP 811 B.8).
      expect(num(t.cell(row, 'Fuel (US gal/h, est.)'))).toBeCloseTo(litresPerHour / 3.785411784, 1);
    });
  });

  it('names the best impeller for each engine upgrade with its WOT rpm and estimated top speed', () => {
    const t = tableStarting(tables, 'WOT speed after an engine power change');
    const rows = result.calibrated!.upgrade;
    expect(t.rows).toHaveLength(rows.length);
    rows.forEach((u, i) => {
      const row = t.rows[i];
      expect(row[0].text).toBe(`+${u.changePct} %`);
      expect(t.cell(row, 'WOT rpm').text).toBe(rpmText(u.wot.speedRpm));
      expect(t.cell(row, 'Data-sheet WOT rpm').text).toBe(rpmText(result.upgrade[i].wot.speedRpm));
      const best = result.alternatives.find((a) => a.impellerId === u.best?.impellerId);
      expect(t.cell(row, 'Best impeller').text).toBe(best ? `${best.label}${best.fitted === 'yes' ? ' (fitted)' : ''}` : 'none inside the window');
      if (u.best) expect(num(t.cell(row, 'Its top speed (kn, est.)'))).toBe(Math.round(u.best.speedKn));
    });
  });

  it('tabulates each sea trial: model − measured adds up from the printed rpm, rating against nominal and the tolerance', () => {
    const section = byId(page, 'trials');
    expect(section).not.toBeNull();
    const t = tableStarting(tables, 'Sea trials');
    const trials = result.calibrated!.calibration.trials;
    expect(t.rows).toHaveLength(trials.length);
    trials.forEach((trial, i) => {
      const row = t.rows[i];
      expect(row[0]).toMatchObject({ text: trial.date, tag: 'th', scope: 'row' });
      const measured = num(t.cell(row, 'Measured rpm'));
      const model = num(t.cell(row, 'Model rpm'));
      expect(measured).toBe(trial.wotRpm);
      expect(model).toBe(Math.round(trial.predictedRpm));
      expect(num(t.cell(row, 'Model − measured (rpm)'))).toBe(model - measured);
      // Effective rating over nominal, in per cent: (2.4071 / 2.35 − 1) × 100 = +2.4 % for the 2026-03-14 run.
      const deviation = (trial.effectiveRatingKw! / trial.nominalRatingKw - 1) * 100;
      expect(t.cell(row, 'Rating vs nominal').text).toBe(`+${deviation.toFixed(1)} %`);
      expect(t.cell(row, 'Rating inside ± 5 %').text).toBe(Math.abs(deviation) <= 5 ? 'yes' : 'no');
    });
    expect(pageText(page)).toContain('Calibrated to the sea trials of 2026-03-14, 2026-03-21: engine power factor');
    expect(pageText(page)).toContain(result.calibrated!.bandNote);
  });
});

describe('the same boat without sea trials', () => {
  it('says nothing about a calibration: no calibrated label, data-sheet column, trial table or section', () => {
    expect(bare.result.calibrated).toBeUndefined();
    expect(byId(bare.page, 'trials')).toBeNull();
    const text = pageText(bare.page);
    for (const phrase of ['calibrated to', 'Calibrated WOT', 'Data-sheet', 'Sea trials', 'model calibrated']) expect(text).not.toContain(phrase);
    for (const t of bare.tables) expect(t.head.map((h) => h.text).join(' | ')).not.toMatch(/Data-sheet|Measured/);
    const facts = pageFacts(bare.page);
    expect(facts.get('Predicted WOT')?.text).toMatch(new RegExp(`^${rpmText(bare.result.wot.nominal.speedRpm)} rpm `));
    expect([...facts.keys()].filter((k) => /WOT/.test(k))).toEqual(['Predicted WOT']);
  });

  it('still prints estimated speed and fuel, on the data-sheet model', () => {
    const t = tableStarting(bare.tables, 'Cruise settings with the fitted impeller');
    expect(t.caption).toBe(`Cruise settings with the fitted impeller (${bare.result.impellerLabel})`);
    bare.result.cruise.forEach((c, i) => {
      expect(t.cell(t.rows[i], 'Engine rpm').text).toBe(rpmText(c.speedRpm!));
      expect(num(t.cell(t.rows[i], 'Speed (kn, est.)'))).toBe(Math.round(c.speedKn!));
      expect(num(t.cell(t.rows[i], 'Fuel (L/h, est.)'))).toBe(Math.round(c.fuelLPerH!));
    });
    const alt = tableStarting(bare.tables, 'Predicted WOT speed with each');
    bare.result.alternatives.forEach((a, i) => expect(alt.cell(alt.rows[i], 'WOT rpm').text).toBe(rpmText(a.band.nominal.speedRpm)));
  });
});

describe('a boat fitted with an impeller that over-revs its engine', () => {
  it('marks the verdict, prints the limiter rpm once and marks every over-revving upgrade row', () => {
    // Demo data refitted (invented what-if): the Greyling with the lightest Kelpspindle impeller rides its limiter.
    const refit: Project = { ...project, boats: project.boats.map((b) => (b.id === 'greyling' ? { ...b, impellerId: 'wisp' } : b)) };
    const r = analyseBoat({ boat: refit.boats.find((b) => b.id === 'greyling')!, project: refit });
    expect(r.wot.nominal.status).toBe('revLimited');
    const html = pageOf(refit, 'greyling');
    const facts = pageFacts(html);
    expect(facts.get('Verdict')).toMatchObject({ text: r.wot.verdict, classes: ['warn'], strong: true });
    expect(facts.get('Predicted WOT')?.text).toBe(`${rpmText(r.limits.maxRpm)} rpm, ${Math.round(r.wot.nominal.powerKw)} kW`);
    const t = tableStarting(pageTables(html), 'WOT speed after an engine power change');
    r.upgrade.forEach((u, i) => expect(t.cell(t.rows[i], 'Status').classes.includes('warn')).toBe(isWarning(u.wot.status)));
  });
});

describe('every table of a boat page', () => {
  it('is a real table: a caption, a column header per column, a row header first in each row', () => {
    for (const t of [...tables, ...bare.tables]) {
      expect(t.caption.length, t.caption).toBeGreaterThan(10);
      expect(t.head.every((h) => h.tag === 'th' && h.scope === 'col'), t.caption).toBe(true);
      for (const row of t.rows) {
        expect(row).toHaveLength(t.head.length);
        expect(row[0]).toMatchObject({ tag: 'th', scope: 'row' });
      }
    }
  });
});

describe('a boat page whose sea trials the calibration refuses', () => {
  it('says the trials were not used and why, with no calibrated figures', () => {
    // Trials far below what the data predicts (invented): the engine would need about a third of its power.
    const boat = project.boats.find((b) => b.id === 'reedshank')!;
    const slow: Project = {
      ...project,
      boats: project.boats.map((b) => (b.id === boat.id ? { ...b, trials: b.trials.map((t) => ({ ...t, wotRpm: Math.round(t.wotRpm * 0.7) })) } : b)),
    };
    const text = pageText(pageOf(slow, boat.id));
    expect(text).toContain('Sea trials not used');
    expect(text).toMatch(/The sea trials were not used: to fit them the engine would make \d+ % of its published power/);
    expect(text).not.toContain(CALIBRATED_TO);
  });
});
