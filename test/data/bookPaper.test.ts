/**
 * A book prints on one paper size unless it asks for a mix (common practice, no source: a print shop
 * runs one stock per job, and a book that mixes sizes by accident binds badly).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { demoWith } from './helpers.ts';

const CARDS = 'data/books/owner-console-cards.yaml';
const cards = readFileSync(CARDS, 'utf8');
const withStrayA6 = cards.replace('  - { kind: consoleCard, boat: greyling }', '  - kind: consoleCard\n    boat: greyling\n    paper: { size: A6, orientation: landscape }');

describe('one paper per book', () => {
  it('refuses a sheet whose own paper differs from the book, at its paper: line, with the fix', () => {
    expect(withStrayA6).not.toBe(cards);
    const r = loadProjectFromFiles(demoWith(CARDS, withStrayA6));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const line = withStrayA6.split('\n').findIndex((l) => l.includes('paper: { size: A6')) + 1;
    expect(r.errors.map((e) => e.message)).toEqual([
      `${CARDS}:${line}:12 sheets[2].paper must match the book's paper (4x6 landscape with 3 mm bleed); a book prints on one paper size, found A6 landscape with 3 mm bleed — remove this paper: line, move the sheet to a book of its own, or add mixed_paper: true to the book`,
    ]);
  });

  it('accepts the same sheet when the book says mixed_paper: true, and the mix reaches the sheet request', () => {
    const r = loadProjectFromFiles(demoWith(CARDS, withStrayA6.replace('sheets:\n', 'mixed_paper: true\nsheets:\n')));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const book = r.project.books.find((b) => b.id === 'owner-console-cards')!;
    // The sheet's own paper says no bleed_mm, so it keeps the book's 3 mm.
    expect(book.sheets.map((s) => `${s.paper.size} ${s.paper.orientation} ${s.paper.bleedMm}`)).toEqual(['Card4x6 landscape 3', 'Card4x6 landscape 3', 'A6 landscape 3']);
  });

  it("gives a sheet the bleed it states, else the book's", () => {
    const noBleed = withStrayA6.replace('paper: { size: A6, orientation: landscape }', 'paper: { size: A6, orientation: landscape, bleed_mm: 0 }').replace('sheets:\n', 'mixed_paper: true\nsheets:\n');
    const r = loadProjectFromFiles(demoWith(CARDS, noBleed));
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
    expect(r.project.books.find((b) => b.id === 'owner-console-cards')!.sheets[2].paper).toEqual({ size: 'A6', orientation: 'landscape', bleedMm: 0 });
  });

  it('accepts a sheet that repeats the book paper', () => {
    const same = cards.replace('  - { kind: consoleCard, boat: greyling }', '  - kind: consoleCard\n    boat: greyling\n    paper: { size: 4x6, orientation: landscape, bleed_mm: 3 }');
    expect(loadProjectFromFiles(demoWith(CARDS, same)).ok).toBe(true);
  });

  it("takes crop_marks from the book's paper, a sheet keeping the book's unless it says otherwise", () => {
    const unmarked = withStrayA6.replace('  bleed_mm: 3        # for a print shop: crop marks and bleed', '  bleed_mm: 3\n  crop_marks: false').replace('sheets:\n', 'mixed_paper: true\nsheets:\n');
    const r = loadProjectFromFiles(demoWith(CARDS, unmarked.replace('paper: { size: A6, orientation: landscape }', 'paper: { size: A6, orientation: landscape, crop_marks: true }')));
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
    const papers = r.project.books.find((b) => b.id === 'owner-console-cards')!.sheets.map((s) => s.paper);
    expect(papers.map((p) => p.cropMarks)).toEqual([false, false, true]);
  });

  it('refuses a crop_marks that is not true or false, at its line, saying what it defaults to', () => {
    const text = cards.replace('  bleed_mm: 3        # for a print shop: crop marks and bleed', '  bleed_mm: 3\n  crop_marks: yes please');
    const r = loadProjectFromFiles(demoWith(CARDS, text));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const line = text.split('\n').findIndex((l) => l.startsWith('  crop_marks:')) + 1;
    expect(r.errors.map((e) => e.message)).toEqual([`${CARDS}:${line}:15 paper.crop_marks must be true or false (without it, crop marks come with bleed), found "yes please"`]);
  });
});
