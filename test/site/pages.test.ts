import { describe, expect, it } from 'vitest';
import { boatPage, indexPage } from '../../src/site/pages/pages.ts';
import { table } from '../../src/site/pages/parts.ts';
import type { BoatView, SheetView, SiteView } from '../../src/site/siteView.ts';

const sheet: SheetView = {
  slug: 'spec-a',
  kind: 'specSheet',
  title: 'Boat A: spec sheet',
  description: 'A chart of power against engine speed.',
  svgInline: () => '<svg xmlns="http://www.w3.org/2000/svg" width="210mm" height="297mm" viewBox="0 0 210 297"></svg>',
  printPage: 'p2100x2970',
  widthMm: 210,
  heightMm: 297,
  downloads: { svg: 'sheets/spec-a.svg', png: 'sheets/spec-a.png', pdf: 'sheets/spec-a.pdf' },
};

const boat: BoatView = {
  id: 'a',
  name: 'Boat A (demo)',
  href: 'boats/a/index.html',
  facts: [['Engine', 'Demo engine']],
  links: [],
  sheets: [sheet],
  tables: [],
  resultsHref: 'results/boats/a.json',
  csvLinks: [{ label: 'impellers as CSV', href: 'results/boats/a.impellers.csv' }],
};

const site: SiteView = {
  shopName: 'Demo shop',
  contactLine: 'Demo contact',
  dataRevision: 'rev 1',
  dateIso: '2026-01-01',
  cautions: ['Confirm by a sea trial.', 'Never exceed maximum rpm.'],
  families: [],
  familySummary: { caption: 'Engine families', head: ['Engine family'], numeric: [], rows: [] },
  jets: [],
  boats: [boat],
  repowers: [],
  boatSummary: { caption: 'Boats', head: ['Boat', 'Status'], numeric: [], rows: [[{ text: 'Boat A (demo)', href: 'boats/a/index.html' }, { text: 'Too light: over-revs', mark: 'warn' }]] },
  books: [],
  schemas: [],
  guides: [],
};

describe('pages', () => {
  it('table() writes a real table: caption, column headers, row headers and right-aligned numbers', () => {
    const out = table({ caption: 'WOT', head: ['Impeller', 'rpm'], rows: [['K1', '4150']], numeric: [1], note: 'n' }).value;
    expect(out).toContain('<caption>WOT</caption>');
    expect(out).toContain('<th scope="col">Impeller</th><th scope="col" class="num">rpm</th>');
    expect(out).toContain('<tr><th scope="row">K1</th><td class="num">4150</td></tr>');
    expect(out).toContain('<p class="table-note">n</p>');
  });

  it('table() links a cell from the page back to the root, puts a warning in bold in a marked cell, and marks data-sheet figures', () => {
    const out = table(
      {
        caption: 'Boats',
        head: ['Boat', 'Status', 'Data-sheet rpm', 'Based on'],
        rows: [[{ text: 'A & B', href: 'boats/a/index.html' }, { text: 'Too light: over-revs', mark: 'warn' }, { text: '5200', mark: 'dataSheet' }, 'Sea trials of 2026-03-14']],
        numeric: [2],
        nowrap: [3],
        words: [1],
      },
      '../../',
    ).value;
    expect(out).toContain('<th scope="row"><a href="../../boats/a/index.html">A &amp; B</a></th>');
    expect(out).toContain('<td class="words warn"><strong>Too light: over-revs</strong></td>');
    expect(out).toContain('<td class="num data-sheet">5200</td>');
    expect(out).toContain('<td class="nowrap">Sea trials of 2026-03-14</td>');
  });

  it('a boat page carries the cautions, the inline sheet with its text alternative, downloads and a print page of its size', () => {
    const out = boatPage(site, boat);
    expect(out).toContain('<li>Confirm by a sea trial.</li><li>Never exceed maximum rpm.</li>');
    expect(out).toContain('<body class="with-sheets">');
    expect(out).toContain('@page p2100x2970 { size: 210mm 297mm; margin: 0; }');
    expect(out).toContain('style="page: p2100x2970"');
    expect(out).toContain('<p id="desc-spec-a">A chart of power against engine speed.</p>');
    expect(out).toContain('<div class="sheet-art"><svg xmlns="http://www.w3.org/2000/svg" width="210mm"');
    for (const ext of ['pdf', 'svg', 'png']) expect(out).toContain(`href="../../sheets/spec-a.${ext}" download`);
    expect(out).toContain('href="../../results/boats/a.json" download');
    expect(out).toContain('<a href="../../results/boats/a.impellers.csv" download>impellers as CSV</a>');
    expect(out).toContain('href="../../assets/site.css"');
    expect(out).not.toMatch(/<script/i);
  });

  it('the index links every boat relative to the root and needs no script', () => {
    const out = indexPage(site);
    expect(out).toContain('<a href="boats/a/index.html">Boat A (demo)</a>');
    expect(out).toContain('No engine families defined.');
    expect(out).not.toMatch(/<script/i);
    expect(out).not.toContain('with-sheets');
  });
});
