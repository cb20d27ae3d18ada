/**
 * The front page's summaries, parsed back with htmlparser2: one row per boat with its combination,
 * predicted WOT band (calibrated for a boat with sea trials), window and status in words, lugging and
 * over-revving marked in bold in a marked cell (never by colour alone); one row per engine family with
 * its variants, windows and maximum rpm. One link per row, to that boat's or family's page.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { analyseBoat, isWarning } from '../../src/analysis/index.ts';
import type { Project } from '../../src/data/types.ts';
import { indexPage } from '../../src/site/pages/pages.ts';
import { rpmText } from '../../src/sheets/kit/format.ts';
import { demoProject, pageTables, tableStarting, viewOf, type ParsedTable } from './demoSite.ts';

let project: Project;
let boats: ParsedTable;
let families: ParsedTable;

beforeAll(async () => {
  project = await demoProject();
  const tables = pageTables(indexPage(viewOf(project)));
  boats = tableStarting(tables, 'Boats:');
  families = tableStarting(tables, 'Engine families:');
});

describe('the index’s boat summary', () => {
  it('has one row per boat, its name linking to its page and nothing else linked', () => {
    expect(boats.rows.map((r) => r[0].text)).toEqual(project.boats.map((b) => b.name));
    expect(boats.rows.map((r) => r[0].href)).toEqual(project.boats.map((b) => `boats/${b.id}/index.html`));
    for (const row of boats.rows) expect(row.slice(1).filter((c) => c.href !== undefined)).toEqual([]);
    expect(boats.head.map((h) => h.text)).toEqual(['Boat', 'Engine', 'Jet unit, fitted impeller', 'Predicted WOT rpm (band)', 'Window (rpm)', 'Max (rpm)', 'Status', 'Based on']);
  });

  it('gives each boat its combination, WOT band (calibrated where trials exist), window and maximum from the analysis', () => {
    project.boats.forEach((boat, i) => {
      const r = analyseBoat({ boat, project });
      const band = r.calibrated?.wot ?? r.wot;
      const row = boats.rows[i];
      expect(boats.cell(row, 'Engine').text).toBe(boat.engine.label);
      expect(boats.cell(row, 'Jet unit, fitted impeller').text).toBe(`${boat.jet.label}, ${r.impellerLabel}`);
      const [low, high] = [rpmText(band.low.speedRpm), rpmText(band.high.speedRpm)];
      expect(boats.cell(row, 'Predicted WOT rpm (band)').text).toBe(`${rpmText(band.nominal.speedRpm)}${low === high ? '' : ` (${low}–${high})`}`);
      expect(boats.cell(row, 'Window (rpm)').text).toBe(`${boat.engine.limits.windowLowRpm}–${boat.engine.limits.windowHighRpm}`);
      expect(boats.cell(row, 'Max (rpm)').text).toBe(String(boat.engine.limits.maxRpm));
      expect(boats.cell(row, 'Status').text).toBe(band.verdict);
      // Reedshank's two trials are in its boat file; Sorrel Belle's seven in its trial log (data/boats/sorrel-belle.trials.csv).
      const basedOn: Readonly<Record<string, string>> = { reedshank: 'Sea trials of 2026-03-14, 2026-03-21', 'sorrel-belle': '7 sea trials, 2024-04-20 to 2026-06-20' };
      expect(boats.cell(row, 'Based on').text).toBe(basedOn[boat.id] ?? 'Data sheet');
    });
  });

  it('marks a boat that over-revs or lugs in bold words in a marked cell, and the good matches not at all', () => {
    // Demo boats refitted with the lightest and the heaviest impeller of their jet (invented what-ifs).
    const refit = (pick: 'lightest' | 'heaviest'): Project => ({
      ...project,
      boats: project.boats.map((b) => {
        const sorted = [...b.jet.impellers].sort((x, y) => x.ratingKw - y.ratingKw);
        return { ...b, impellerId: (pick === 'lightest' ? sorted[0] : sorted[sorted.length - 1]).id, trials: [] };
      }),
    });
    const seen = new Set<string>();
    for (const p of [project, refit('lightest'), refit('heaviest')]) {
      const t = tableStarting(pageTables(indexPage(viewOf(p))), 'Boats:');
      p.boats.forEach((boat, i) => {
        const status = analyseBoat({ boat, project: p }).wot.nominal.status;
        const cell = t.cell(t.rows[i], 'Status');
        expect(cell.classes.includes('warn'), `${boat.id}: ${cell.text}`).toBe(isWarning(status));
        expect(cell.strong, `${boat.id}: ${cell.text}`).toBe(isWarning(status));
        if (isWarning(status)) expect(cell.text).toMatch(/^(Too light: over-revs|Too heavy: lugs|No operating point)/);
        // An engine on its limiter across the whole band prints one rpm, never "6000 (6000–6000)".
        expect(t.cell(t.rows[i], 'Predicted WOT rpm (band)').text).not.toMatch(/(\d+) \(\1–\1\)/);
        seen.add(status);
      });
    }
    // The refits reach both warnings, so the marking was exercised on each.
    expect([...seen]).toEqual(expect.arrayContaining(['revLimited', 'belowWindow', 'matched']));
  });
});

describe('the index’s engine-family summary', () => {
  it('has one row per family linking to its page, with variants, windows and maxima as in the data', () => {
    expect(families.rows.map((r) => r[0].href)).toEqual(project.engines.map((f) => `families/${f.id}/index.html`));
    project.engines.forEach((f, i) => {
      const row = families.rows[i];
      expect(row[0].text).toBe(f.label);
      expect(families.cell(row, 'Variants').text).toBe(f.variants.map((v) => v.variantLabel).join('; '));
      expect(families.cell(row, 'Boats').text).toBe(String(project.boats.filter((b) => b.engineFamilyId === f.id).length));
      for (const v of f.variants) {
        expect(families.cell(row, 'Window (rpm)').text).toContain(`${v.limits.windowLowRpm}–${v.limits.windowHighRpm}`);
        expect(families.cell(row, 'Max (rpm)').text).toContain(String(v.limits.maxRpm));
      }
    });
  });

  it('names the variants a window belongs to when a family’s variants differ', () => {
    // Demo data: the Copperwhistle Strider race tune has its own window (4800–5200) and maximum (5400).
    const row = families.rows[project.engines.findIndex((f) => f.id === 'copperwhistle-strider')];
    expect(families.cell(row, 'Window (rpm)').text).toBe('4600–5000 (250 kW, 229 kW economy); 4800–5200 (271 kW race)');
    expect(families.cell(row, 'Max (rpm)').text).toBe('5200 (250 kW, 229 kW economy); 5400 (271 kW race)');
    const single = families.rows[project.engines.findIndex((f) => f.id === 'thimblefinch-trotter')];
    expect(families.cell(single, 'Window (rpm)').text).toBe('5400–5800');
  });
});
