/**
 * Books that read like books: a contents page listing each sheet with the page it starts on, every page
 * of the book numbered "page n of N" beside the book's running title, and one PDF bookmark per sheet.
 * The page numbers are checked against a count made here from the sheets' own pages; the outline is read
 * back from the PDF with pdf-lib.
 */
import { PDFDict, PDFDocument, PDFHexString, PDFName, PDFNumber, PDFString, type PDFRef } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import type { Book, Paper, SheetRequest } from '../../src/data/types.ts';
import { renderPdf } from '../../src/render/index.ts';
import { scenePages } from '../../src/scene/types.ts';
import { bookContentsScene } from '../../src/sheets/bookPages.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { bookPages } from '../../src/site/bookPages.ts';
import { boat, project, site } from '../sheets/fixtures/demoProject.ts';
import { sceneProblems } from '../sheets/sceneChecks.ts';
import { texts } from '../sheets/sceneWalk.ts';

const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const A6: Paper = { size: 'A6', orientation: 'landscape', bleedMm: 0 };
const ctx = { project, dateIso: '2026-11-02' };
const book: Book = { id: 'demo-book', title: 'Demo dealer book', audience: 'dealer', sheets: [], source: { file: 'data/books/demo-book.yaml' } };

async function outlineTitles(pdf: Uint8Array): Promise<{ titles: string[]; pages: number[] }> {
  const doc = await PDFDocument.load(pdf);
  const refs = doc.getPages().map((p) => p.ref.toString());
  const outlines = doc.context.lookup(doc.catalog.get(PDFName.of('Outlines'))) as PDFDict;
  const titles: string[] = [];
  const pages: number[] = [];
  let item = outlines.get(PDFName.of('First')) as PDFRef | undefined;
  while (item) {
    const dict = doc.context.lookup(item) as PDFDict;
    const t = dict.get(PDFName.of('Title')) as PDFHexString | PDFString;
    titles.push(t.decodeText());
    const dest = doc.context.lookup(dict.get(PDFName.of('Dest'))) as unknown as { get(i: number): PDFRef };
    pages.push(refs.indexOf(dest.get(0).toString()));
    item = dict.get(PDFName.of('Next')) as PDFRef | undefined;
  }
  expect((outlines.get(PDFName.of('Count')) as PDFNumber).asNumber()).toBe(titles.length);
  return { titles, pages };
}

describe('a book of sheets', () => {
  const requests: SheetRequest[] = [
    { kind: 'specSheet', boatId: boat.id, paper: A4 },
    // A spec sheet on an A6 card flows over several pages: its pages count in the numbering.
    { kind: 'specSheet', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 0 } },
    { kind: 'upgradeSheet', boatId: boat.id, paper: A4 },
  ];
  const scenes = requests.map((r) => sheetScene(r, ctx));
  const counts = scenes.map((s) => scenePages(s).length);
  const { pages, outline } = bookPages({ book, project, scenes, firstPaper: A4, dateIso: '2026-11-02' });

  it('opens with a contents page giving the page each sheet starts on', () => {
    expect(counts[1]).toBeGreaterThan(1);
    const contents = texts(pages[0]);
    expect(contents.find((t) => t.role === 'sheet-kind')?.text).toBe('CONTENTS');
    expect(contents.find((t) => t.role === 'sheet-title')?.text).toBe(book.title);
    const cells = contents.filter((t) => t.role === 'table-cell').map((t) => t.text);
    // Counted here: the contents is page 1, the sheets follow in order.
    let next = 2;
    let from = 0;
    for (const [i, s] of scenes.entries()) {
      const at = cells.indexOf(s.title, from);
      from = at + 2;
      expect(at, s.title).toBeGreaterThanOrEqual(0);
      expect(cells[at + 1]).toBe(counts[i] === 1 ? `${next}` : `${next}–${next + counts[i] - 1}`);
      next += counts[i];
    }
    expect(pages.length).toBe(next - 1);
    expect(contents.filter((t) => t.role === 'caution').map((t) => t.text).join(' ')).toContain("maker's maximum rpm");
  });

  it('numbers every page "page n of N" after the running title, inside the print rules', () => {
    for (const [i, page] of pages.entries()) {
      const numbers = texts(page).filter((t) => t.role === 'book-page-number');
      expect(numbers.map((t) => t.text)).toEqual([`${book.title} · page ${i + 1} of ${pages.length}`]);
      // The print rules' type floor depends only on the paper's size class: A4 here, or the A6 card.
      expect(sceneProblems(page, page.widthMm < 150 ? { size: 'A6', orientation: 'portrait', bleedMm: 0 } : A4)).toEqual([]);
    }
  });

  it('keeps the page number whole and shortens the running title where the footer has no room', () => {
    const long = 'A book title long enough to crowd out the page number on a small card, and then some more words';
    const card = bookPages({ book: { ...book, title: long }, project, scenes: [sheetScene({ kind: 'consoleCard', boatId: boat.id, paper: A6 }, ctx)], firstPaper: A6, dateIso: '2026-11-02' }).pages;
    for (const [i, page] of card.entries()) {
      const [n] = texts(page).filter((t) => t.role === 'book-page-number');
      expect(n.text.endsWith(`page ${i + 1} of ${card.length}`)).toBe(true);
      expect(n.text.length).toBeLessThan(long.length);
      expect(sceneProblems(page, A6)).toEqual([]);
    }
  });

  it('gives the PDF one bookmark per sheet, at its first page, and one for the contents', async () => {
    expect(outline.length).toBe(pages.length);
    const pdf = await renderPdf(pages, { title: book.title, subject: 'test', keywords: [], dateIso: '2026-11-02', outline });
    const read = await outlineTitles(pdf);
    expect(read.titles).toEqual(['Contents', ...scenes.map((s) => s.title)]);
    expect(read.pages).toEqual([0, 1, 1 + counts[0], 1 + counts[0] + counts[1]]);
  });

  it('lets a long contents flow over pages and counts its own pages in the numbering', () => {
    const entries = Array.from({ length: 40 }, (_, i) => ({ title: `Demo boat ${i + 1} with a fairly long name: console card`, pages: 1 + (i % 2) }));
    const scene = bookContentsScene({ title: 'Demo fleet cards', audience: 'owner', site, entries, paper: A6, dateIso: '2026-11-02', where: 'book fleet: contents' });
    const own = scenePages(scene);
    expect(own.length).toBeGreaterThan(1);
    const cells = own.flatMap(texts).filter((t) => t.role === 'table-cell').map((t) => t.text);
    expect(cells[cells.indexOf(entries[0].title) + 1]).toBe(`${own.length + 1}`);
    expect(cells[cells.indexOf(entries[1].title) + 1]).toBe(`${own.length + 2}–${own.length + 3}`);
    for (const page of own) expect(sceneProblems(page, A6)).toEqual([]);
  });
});
