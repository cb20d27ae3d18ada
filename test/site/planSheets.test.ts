import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { bookSheetRequest } from '../../src/analysis/index.ts';
import { boatSheetRequests, planSheets } from '../../src/site/planSheets.ts';
import type { Project } from '../../src/data/types.ts';

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
      'wall-chart-harrowgate-v8-tarnwell-212',
      'wall-chart-brindlecombe-td6-vennick-260',
      'wall-chart-corbrick-four-tarnwell-212-salt-cruise-45-75kw',
    ]);
    expect(slugs).toContain('spec-brine-lark-letter-portrait');
    expect(slugs.filter((s) => s.includes('a3-landscape'))).toEqual([]);
  });
});
