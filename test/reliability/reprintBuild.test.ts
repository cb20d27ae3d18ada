/**
 * The reprint list on the demo, through the real command: a fresh output folder lists every sheet and
 * book as added; a second build of the same data lists all unchanged and leaves every sheet file as it
 * was; after one boat's file is edited it names exactly that boat's sheets, and the books holding them,
 * as changed (the checklist PDF's text, read by pdftotext, and the front page name them); after the data
 * revision is raised every sheet is changed only in its printed revision and date.
 */
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import type { ReprintList, SheetManifest } from '../../src/site/reprint.ts';
import { matchbook } from './cli.ts';
import { removeDir, tempDir } from './corpus.ts';
import { folded, pdfPages, tree, visibleText } from './outputTree.ts';

const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const root = tempDir('reprint');
const data = join(root, 'data');
const out = join(root, 'out');

type Tree = Map<string, Buffer>;
const builds: { tree: Tree; reprint: ReprintList; manifest: SheetManifest; checklist: string }[] = [];

async function build(): Promise<void> {
  const run = await matchbook(['build', '--data', data, '--out', out], { env: ENV });
  if (run.status !== 0) throw new Error(`build failed:\n${run.stderr}`);
  const t = tree(out);
  builds.push({
    tree: t,
    reprint: JSON.parse(t.get('reprint.json')!.toString('utf8')) as ReprintList,
    manifest: JSON.parse(t.get('sheets.json')!.toString('utf8')) as SheetManifest,
    checklist: folded(pdfPages(join(out, 'reprint.pdf')).join(' ')),
  });
}

/** The demo's sheets of one boat and the books holding any of them, as the plan gives them. */
async function sheetsOfBoat(boatId: string): Promise<{ slugs: string[]; books: string[] }> {
  const loaded = await loadProject(data);
  if (!loaded.ok) throw new Error('demo data does not load');
  const plan = planSheets(loaded.project);
  const slugs = plan.sheets.filter((s) => s.request.kind !== 'wallChart' && s.request.boatId === boatId).map((s) => s.slug);
  const books = [...plan.byBook].filter(([, s]) => s.some((slug) => slugs.includes(slug))).map(([id]) => id);
  return { slugs, books };
}

let greyling: { slugs: string[]; books: string[] };

beforeAll(async () => {
  cpSync('data', data, { recursive: true });
  await build();
  await build();
  const boat = join(data, 'boats', 'greyling.yaml');
  const text = readFileSync(boat, 'utf8');
  expect(text).toContain('displacement_kg: 1150');
  writeFileSync(boat, text.replace('displacement_kg: 1150', 'displacement_kg: 1240'));
  greyling = await sheetsOfBoat('greyling');
  await build();
  const site = join(data, 'site.yaml');
  writeFileSync(site, readFileSync(site, 'utf8').replace(/^data_revision: .*$/m, 'data_revision: 2026-12 rev 2 (demo)'));
  await build();
}, 900_000);
afterAll(() => removeDir(root));

const slugs = (list: readonly { slug: string }[]) => list.map((s) => s.slug).sort();

describe('the reprint list of the demo', () => {
  it('of a fresh output folder lists every sheet and book as added, and the checklist says so', () => {
    const [{ reprint, manifest, checklist }] = builds;
    expect(reprint.basis).toBe('noPreviousBuild');
    expect(manifest.sheets.length).toBe(27);
    expect(reprint.sheets.counts).toEqual({ added: 27, changed: 0, removed: 0, unchanged: 0, revisionAndDateOnly: 0 });
    expect(slugs(reprint.sheets.added)).toEqual(slugs(manifest.sheets));
    expect(reprint.books.counts.added).toBe(3);
    expect(checklist).toContain('This output folder held no earlier build, so every sheet is listed as new');
    for (const s of manifest.sheets) expect(checklist).toContain(`${s.slug}.pdf`);
  });

  it('of a second build of the same data lists all unchanged, and every other file is the same bytes', () => {
    const [first, second] = builds;
    expect(second.reprint.basis).toBe('previousBuild');
    expect(second.reprint.sheets.counts).toEqual({ added: 0, changed: 0, removed: 0, unchanged: 27, revisionAndDateOnly: 0 });
    expect(second.reprint.books.counts).toEqual({ added: 0, changed: 0, removed: 0, unchanged: 3 });
    expect([...second.tree.keys()]).toEqual([...first.tree.keys()]);
    // Only the list of changes itself and the front page that tells it differ.
    const differing = [...first.tree].filter(([p, b]) => !b.equals(second.tree.get(p)!)).map(([p]) => p);
    expect(differing.sort()).toEqual(['index.html', 'reprint.json', 'reprint.pdf']);
    expect(second.checklist).toContain('Nothing to reprint');
  });

  it("after one boat's file is edited names exactly that boat's sheets and the books holding them as changed", () => {
    const [, before, after] = builds;
    const { reprint } = after;
    expect(greyling.slugs.length).toBe(4); // spec sheet, console card, upgrade sheet, a book's 4 × 6 in card
    expect(slugs(reprint.sheets.changed)).toEqual([...greyling.slugs].sort());
    expect(reprint.sheets.changed.every((s) => s.change === 'content')).toBe(true);
    expect(reprint.sheets.counts).toEqual({ added: 0, changed: 4, removed: 0, unchanged: 23, revisionAndDateOnly: 0 });
    expect(reprint.books.changed.map((b) => b.id).sort()).toEqual([...greyling.books].sort());
    expect(greyling.books.length).toBeGreaterThan(0);
    for (const b of reprint.books.changed) expect(b.reprintSheets?.every((s) => greyling.slugs.includes(s)), b.id).toBe(true);
    // Unchanged sheets keep byte-identical files: SVG, PNG and PDF of every page.
    const unchanged = new Set(reprint.sheets.unchanged.map((s) => s.slug));
    const files = [...after.tree.keys()].filter((p) => p.startsWith('sheets/') && unchanged.has(p.slice(7).replace(/(-page-\d+)?\.(svg|png|pdf)$/, '')));
    expect(files.length).toBeGreaterThanOrEqual(22 * 3);
    for (const p of files) expect(after.tree.get(p)!.equals(before.tree.get(p)!), p).toBe(true);
    for (const slug of greyling.slugs) expect(after.tree.get(`sheets/${slug}.pdf`)!.equals(before.tree.get(`sheets/${slug}.pdf`)!), slug).toBe(false);
    // The checklist names each changed sheet by title and file, and each changed book.
    for (const s of reprint.sheets.changed) {
      expect(after.checklist).toContain(s.title);
      expect(after.checklist).toContain(`${s.slug}.pdf`);
    }
    for (const b of reprint.books.changed) expect(after.checklist).toContain(b.title);
    expect(after.checklist).toContain('Changed sheets to print (4)');
    expect(after.checklist).toMatch(/Cautions.*sea trial/);
    // The front page counts the changes and links each changed sheet where it is shown.
    const index = after.tree.get('index.html')!.toString('utf8');
    expect(visibleText(index)).toContain('4 sheets changed, none new, none removed, 23 unchanged.');
    for (const s of reprint.sheets.changed) expect(index).toContain(`href="${s.href}"`);
    expect(index).toContain('href="reprint.pdf" download');
  });

  it('after the data revision is raised calls every sheet changed only in its printed revision and date', () => {
    const { reprint, checklist } = builds[3];
    expect(reprint.previous?.dataRevision).toBe('2026-11 rev 1 (demo)');
    expect(reprint.dataRevision).toBe('2026-12 rev 2 (demo)');
    expect(reprint.sheets.counts).toEqual({ added: 0, changed: 27, removed: 0, unchanged: 0, revisionAndDateOnly: 27 });
    expect(checklist).toContain('Changed only in the printed issue date and data revision (27)');
    expect(checklist).not.toContain('Changed sheets to print');
    expect(visibleText(builds[3].tree.get('index.html')!.toString('utf8'))).toContain('27 sheets differ only in the issue date and data revision printed on them.');
  });
});
