import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { bookSheetRequest } from '../../src/analysis/index.ts';
import { boatSheetRequests, planSheets } from '../../src/site/planSheets.ts';
import type { Project } from '../../src/data/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { withCropMarks } from '../../src/standards/paper.ts';

async function demo(): Promise<Project> {
  const loaded = await loadProject('data');
  if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('\n'));
  return loaded.project;
}

describe('planSheets()', () => {
  it('gives every boat a spec sheet, a console card and an upgrade sheet', async () => {
    const project = await demo();
    const plan = planSheets(project);
    for (const boat of project.boats) {
      expect(plan.byBoat.get(boat.id)).toEqual([`spec-${boat.id}`, `card-${boat.id}`, `upgrade-${boat.id}`]);
    }
    expect(boatSheetRequests(project.boats[0]).map((r) => r.kind)).toEqual(['specSheet', 'consoleCard', 'upgradeSheet']);
  });

  it('draws a sheet asked for twice once, and gives one asked for on other paper its own file', async () => {
    const project = await demo();
    const plan = planSheets(project);
    const slugs = plan.sheets.map((s) => s.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
    const requests = plan.sheets.map((s) => JSON.stringify(s.request));
    expect(new Set(requests).size).toBe(requests.length);
    // Every book sheet is one of the planned sheets, in the book's order.
    for (const book of project.books) {
      const bookSlugs = plan.byBook.get(book.id) ?? [];
      expect(bookSlugs.length).toBe(book.sheets.length);
      bookSlugs.forEach((slug, i) => {
        const planned = plan.sheets.find((s) => s.slug === slug);
        expect(planned?.request).toEqual(bookSheetRequest(project, book.sheets[i]));
      });
    }
  });

  it('names sheets only with plain lower-case file-name words', async () => {
    for (const { slug } of planSheets(await demo()).sheets) expect(slug).toMatch(/^[a-z0-9][a-z0-9._-]*$/);
  });

  it('names a book sheet after what differs from the default sheet: conditions, then paper only when it differs', async () => {
    const plan = planSheets(await demo());
    const slugs = plan.sheets.map((s) => s.slug);
    // data/books/shop-wall-charts.yaml: same A3 landscape paper as the default charts; two give no conditions
    // (the default charts themselves), one salt water and its own cruise lines (60 and 100 hp are 44.7 and
    // 74.6 kW, 1 hp = 0.7457 kW, NIST SP 811).
    expect(plan.byBook.get('shop-wall-charts')).toEqual([
      'wall-chart-copperwhistle-strider-kelpspindle-riffle',
      'wall-chart-anvilmoth-hauler-gullbobbin-shoal',
      'wall-chart-thimblefinch-trotter-kelpspindle-riffle-salt-cruise-45-75kw',
    ]);
    expect(slugs).toContain('spec-brine-lark-letter-portrait');
    expect(slugs.filter((s) => s.includes('a3-landscape'))).toEqual([]);
  });

  it('gives every sheet, the boats\' and wall charts\' as well as the books\', the bleed and crop marks of the command line', async () => {
    const project = await demo();
    const asBooks = planSheets(project);
    const bled = planSheets(project, { bleedMm: 5 });
    expect(bled.sheets.length).toBe(asBooks.sheets.length);
    for (const { request } of bled.sheets) {
      expect(request.paper.bleedMm).toBe(5);
      expect(withCropMarks(request.paper)).toBe(true);
    }
    // The scene grows by the bleed and the marks' slug: 5 mm bleed + 5 mm marks + 2 mm clear = 12 mm.
    const wallChart = bled.sheets.find((s) => s.request.kind === 'wallChart')!;
    const scene = sheetScene(wallChart.request, { project, dateIso: '2026-12-03' });
    expect([scene.bleedMm, scene.trimBox.x, scene.trimBox.y, scene.widthMm]).toEqual([5, 12, 12, 420 + 24]);
    // --no-crop-marks keeps each sheet's bleed (the demo's console-card book has 3 mm) and drops the marks,
    // which the file name says; --bleed 0 leaves no sheet with bleed.
    const unmarked = planSheets(project, { cropMarks: false });
    const cards = unmarked.byBook.get('owner-console-cards')!.map((slug) => unmarked.sheets.find((s) => s.slug === slug)!);
    expect(cards.map((c) => [c.request.paper.bleedMm, withCropMarks(c.request.paper)])).toEqual(cards.map(() => [3, false]));
    expect(cards.every((c) => c.slug.includes('-bleed-no-marks'))).toBe(true);
    expect(planSheets(project, { bleedMm: 0 }).sheets.filter((s) => s.request.paper.bleedMm > 0)).toEqual([]);
  });
});

describe('repower comparisons in the plan', () => {
  it('plan one A4 comparison per boat that lists repower options, shared with the book that asks for it', async () => {
    const project = await demo();
    const plan = planSheets(project);
    const withOptions = project.boats.filter((b) => b.repowerOptions).map((b) => b.id);
    expect(withOptions).toEqual(['reedshank']);
    expect([...plan.byRepower]).toEqual([['reedshank', ['repower-reedshank']]]);
    expect(plan.byBook.get('dealer-spec-sheets')).toContain('repower-reedshank');
    expect(plan.sheets.filter((s) => s.request.kind === 'repowerSheet')).toHaveLength(1);
  });
});
