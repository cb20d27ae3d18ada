/**
 * The reprint list's comparison on hand-made sheet lists (what is added, changed, removed, unchanged;
 * which pages of a book to reprint), the reading of a previous list that is missing or broken, and the
 * revision-neutral hash that tells a sheet changed only in its printed date and revision.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { Scene } from '../../src/scene/types.ts';
import { OUTPUT_MARKER } from '../../src/site/atomicDir.ts';
import { checklistInput, compareBuilds, countsSentence, pageRanges, readPreviousBuild, revisionNeutralHash, type ManifestSheet, type SheetManifest } from '../../src/site/reprint.ts';

const sheet = (slug: string, sha256: string, pages = 1, contentSha256 = `c-${sha256}`): ManifestSheet => ({
  slug,
  title: `Title of ${slug}`,
  kind: 'specSheet',
  paper: 'A4 portrait',
  pages,
  sha256,
  contentSha256,
  href: `boats/x/index.html#sheet-${slug}`,
});

const manifest = (sheets: readonly ManifestSheet[], books: SheetManifest['books'] = [], dataRevision = 'r1'): SheetManifest => ({ kind: 'sheetManifest', version: 1, dataRevision, dateIso: '2026-01-01', sheets, books });

const dirs: string[] = [];
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

describe('compareBuilds', () => {
  it('sorts every sheet into added, changed, removed or unchanged by its PDF hash, and counts them', () => {
    const before = manifest([sheet('a', '1'), sheet('b', '2'), sheet('gone', '3')]);
    const now = manifest([sheet('a', '1'), sheet('b', '2x'), sheet('new', '4')]);
    const list = compareBuilds({ kind: 'manifest', manifest: before }, now);
    expect(list.basis).toBe('previousBuild');
    expect(list.previous).toEqual({ dataRevision: 'r1', dateIso: '2026-01-01' });
    expect(list.sheets.unchanged.map((s) => s.slug)).toEqual(['a']);
    expect(list.sheets.changed.map((s) => [s.slug, s.change])).toEqual([['b', 'content']]);
    expect(list.sheets.added.map((s) => s.slug)).toEqual(['new']);
    expect(list.sheets.removed.map((s) => s.slug)).toEqual(['gone']);
    // A removed sheet has no page to link to any more.
    expect(list.sheets.removed[0].href).toBeUndefined();
    expect(list.sheets.counts).toEqual({ added: 1, changed: 1, removed: 1, unchanged: 1, revisionAndDateOnly: 0 });
    expect(countsSentence(list)).toBe('1 sheet changed, 1 new, 1 removed, 1 unchanged.');
  });

  it('tells a sheet whose only change is its printed date and revision from one changed in content', () => {
    const before = manifest([sheet('a', '1', 1, 'same'), sheet('b', '2', 1, 'old')]);
    const now = manifest([sheet('a', '1x', 1, 'same'), sheet('b', '2x', 1, 'new')], [], 'r2');
    const list = compareBuilds({ kind: 'manifest', manifest: before }, now);
    expect(list.sheets.changed.map((s) => [s.slug, s.change])).toEqual([
      ['a', 'revisionAndDate'],
      ['b', 'content'],
    ]);
    expect(list.sheets.counts.revisionAndDateOnly).toBe(1);
    const input = checklistInput({ list, previous: { kind: 'manifest', manifest: before }, site: { shopName: 'S', contactLine: 'C', powerUnitFirst: 'kW', speedUnit: 'kn', fuelUnit: 'L/h', dataRevision: 'r2', issueDate: '2026-01-01' }, dateIso: '2026-01-01', paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } });
    expect(input.sections.find((s) => s.heading.startsWith('Changed sheets'))?.items.map((i) => i.title)).toEqual(['Title of b']);
    expect(input.sections.find((s) => s.heading.startsWith('Changed only in the printed'))?.items.map((i) => i.title)).toEqual(['Title of a']);
  });

  it('lists everything as added when there is nothing, or nothing readable, to compare with', () => {
    const now = manifest([sheet('a', '1'), sheet('b', '2')], [{ id: 'bk', title: 'Book', sha256: 'b1', sheets: ['a', 'b'], pages: 3, contentsPages: 1 }]);
    for (const previous of [{ kind: 'none' as const }, { kind: 'unreadable' as const, reason: 'x' }]) {
      const list = compareBuilds(previous, now);
      expect(list.basis).toBe(previous.kind === 'none' ? 'noPreviousBuild' : 'previousListUnreadable');
      expect(list.sheets.counts).toEqual({ added: 2, changed: 0, removed: 0, unchanged: 0, revisionAndDateOnly: 0 });
      expect(list.books.added).toEqual([{ id: 'bk', title: 'Book', pdfHref: 'books/bk.pdf', pages: 3 }]);
      expect(list.previous).toBeUndefined();
    }
  });

  it("names a changed book's pages to reprint after its contents page, each sheet's pages counted; the whole book when its pages move", () => {
    // Book pages: contents = 1, a = 2, b = 3–4 (two pages), c = 5, d = 6.
    const sheets = [sheet('a', '1'), sheet('b', '2', 2), sheet('c', '3'), sheet('d', '4')];
    const book = { id: 'bk', title: 'Book', sha256: 'old', sheets: ['a', 'b', 'c', 'd'], pages: 6, contentsPages: 1 };
    const before = manifest(sheets, [book]);
    const bChanged = manifest([sheets[0], sheet('b', '2y', 2), sheets[2], sheets[3]], [{ ...book, sha256: 'new' }]);
    const list = compareBuilds({ kind: 'manifest', manifest: before }, bChanged);
    expect(list.books.changed).toEqual([{ id: 'bk', title: 'Book', pdfHref: 'books/bk.pdf', pages: 6, reprintSheets: ['b'], reprintPages: [3, 4] }]);
    // A sheet that now takes three pages moves every later page: the whole book is reprinted.
    const longer = manifest([sheets[0], sheet('b', '2z', 3), sheets[2], sheets[3]], [{ ...book, sha256: 'new', pages: 7 }]);
    expect(compareBuilds({ kind: 'manifest', manifest: before }, longer).books.changed[0].reprintPages).toEqual([1, 2, 3, 4, 5, 6, 7]);
    // So does a sheet new to the book, even one unchanged elsewhere.
    const fewer = manifest(sheets, [{ ...book, sha256: 'fewer', sheets: ['a', 'b', 'c'], pages: 5 }]);
    const added = compareBuilds({ kind: 'manifest', manifest: fewer }, before).books.changed[0];
    expect(added.reprintSheets).toEqual(['d']);
    expect(added.reprintPages).toEqual([1, 2, 3, 4, 5, 6]);
    expect(pageRanges([3, 4, 6])).toBe('3\u20134, 6');
    expect(pageRanges([1, 2, 3, 4, 7, 9, 10])).toBe('1\u20134, 7, 9\u201310');
    // A book whose PDF is the same bytes is unchanged; a book no longer built is removed.
    const again = compareBuilds({ kind: 'manifest', manifest: before }, manifest(sheets, []));
    expect(again.books.removed).toEqual([{ id: 'bk', title: 'Book' }]);
    expect(compareBuilds({ kind: 'manifest', manifest: before }, before).books.counts).toEqual({ added: 0, changed: 0, removed: 0, unchanged: 1 });
  });
});

describe('readPreviousBuild', () => {
  const folder = (files: Record<string, string>): string => {
    const dir = mkdtempSync(join(tmpdir(), 'matchbook-reprint-'));
    dirs.push(dir);
    for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
    return dir;
  };

  it('reads the list a build left, and nothing from a folder matchbook did not write or that has no list', () => {
    const good = JSON.stringify(manifest([sheet('a', '1')]));
    expect(readPreviousBuild(folder({ [OUTPUT_MARKER]: '', 'sheets.json': good }))).toEqual({ kind: 'manifest', manifest: manifest([sheet('a', '1')]) });
    expect(readPreviousBuild(folder({ 'sheets.json': good }))).toEqual({ kind: 'none' });
    expect(readPreviousBuild(folder({ [OUTPUT_MARKER]: '' }))).toEqual({ kind: 'none' });
    expect(readPreviousBuild(join(tmpdir(), 'matchbook-no-such-folder-here'))).toEqual({ kind: 'none' });
  });

  it('calls a broken or foreign list unreadable, saying why, rather than failing the build', () => {
    const broken = readPreviousBuild(folder({ [OUTPUT_MARKER]: '', 'sheets.json': '{ not json' }));
    expect(broken.kind).toBe('unreadable');
    expect(broken.kind === 'unreadable' && broken.reason).toMatch(/^sheets\.json is not JSON/);
    const foreign = readPreviousBuild(folder({ [OUTPUT_MARKER]: '', 'sheets.json': JSON.stringify({ kind: 'sheetManifest', version: 1, sheets: [{ slug: 'a' }] }) }));
    expect(foreign).toEqual({ kind: 'unreadable', reason: 'sheets.json is not a sheet list this version of matchbook writes' });
  });
});

describe('revisionNeutralHash', () => {
  const scene = (footer: string, body: string, dateIso = '2026-01-01'): Scene => ({
    widthMm: 100,
    heightMm: 100,
    trimBox: { x: 0, y: 0, width: 100, height: 100 },
    safeBox: { x: 5, y: 5, width: 90, height: 90 },
    bleedMm: 0,
    title: 'T',
    description: 'D',
    subject: 'S',
    keywords: [],
    dateIso,
    root: {
      type: 'group',
      children: [
        { type: 'text', x: 5, y: 90, text: footer, sizePt: 8, weight: 'regular', anchor: 'start', colour: '#000000', widthMm: footer.length },
        { type: 'text', x: 5, y: 20, text: body, sizePt: 9, weight: 'regular', anchor: 'start', colour: '#000000', widthMm: body.length },
      ],
    },
  });

  it('is equal when only the printed date and revision differ, and differs when anything else does', () => {
    const a = revisionNeutralHash(scene('Issued 2026-01-01 · Data revision rev 1', '4200 rpm'), { dateIso: '2026-01-01', dataRevision: 'rev 1' });
    const b = revisionNeutralHash(scene('Issued 2026-02-01 · Data revision rev 12', '4200 rpm', '2026-02-01'), { dateIso: '2026-02-01', dataRevision: 'rev 12' });
    expect(b).toBe(a);
    const c = revisionNeutralHash(scene('Issued 2026-02-01 · Data revision rev 12', '4300 rpm', '2026-02-01'), { dateIso: '2026-02-01', dataRevision: 'rev 12' });
    expect(c).not.toBe(a);
    // The revision is neutralised only in texts that print the date: elsewhere a change of it is a change.
    const d = revisionNeutralHash(scene('Issued 2026-01-01 · Data revision rev 1', 'rev 1'), { dateIso: '2026-01-01', dataRevision: 'rev 1' });
    const e = revisionNeutralHash(scene('Issued 2026-01-01 · Data revision rev 2', 'rev 2'), { dateIso: '2026-01-01', dataRevision: 'rev 2' });
    expect(e).not.toBe(d);
  });
});
