/**
 * A book may add cautions of its own (up to 6 of up to 300 characters, together with site.yaml's), printed
 * on its sheets after the built-in ones and the site's (the project's rule for user cautions: added,
 * never instead of the built-in ones; common practice, no source).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { scenePages } from '../../src/scene/types.ts';
import { BUILT_IN_CAUTIONS, sheetScene } from '../../src/sheets/index.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { texts } from '../sheets/sceneWalk.ts';
import { demoFiles, demoWith } from './helpers.ts';

const CARDS = 'data/books/owner-console-cards.yaml';
const SITE = 'data/site.yaml';
const KILL_CORD = 'Wear the kill-cord lanyard whenever the engine runs.';

const cautionText = (scene: ReturnType<typeof sheetScene>): string =>
  scenePages(scene)
    .flatMap((p) => texts(p).filter((t) => t.role === 'caution').map((t) => t.text))
    .join(' ');

describe("a book's own cautions", () => {
  it("print on the book's sheets after the built-in ones, and only there (the demo owner book)", () => {
    const r = loadProjectFromFiles(demoFiles());
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
    const { project } = r;
    expect(project.books.find((b) => b.id === 'owner-console-cards')?.extraCautions).toEqual([KILL_CORD]);
    const plan = planSheets(project);
    const scene = (slug: string) => sheetScene(plan.sheets.find((s) => s.slug === slug)!.request, { project, dateIso: '2026-01-01' });
    const bookCard = cautionText(scene('card-reedshank-card4x6-landscape-bleed-mph-kn-usgal'));
    expect(bookCard).toContain(KILL_CORD);
    // After every built-in caution.
    for (const c of BUILT_IN_CAUTIONS) expect(bookCard.indexOf(KILL_CORD.slice(0, 20))).toBeGreaterThan(bookCard.indexOf(c.slice(0, 20)));
    // The boat's own card and the dealer book's sheets do not carry it.
    expect(cautionText(scene('card-reedshank'))).not.toContain('kill-cord');
    expect(cautionText(scene('spec-reedshank'))).not.toContain('kill-cord');
  });

  it('give a book sheet its own file, named after the book when nothing else tells it from the default one', () => {
    const cards = readFileSync(CARDS, 'utf8').replace('  size: 4x6          # 4 × 6 in card\n  orientation: landscape\n  bleed_mm: 3        # for a print shop: crop marks and bleed', '  size: A6\n  orientation: landscape').replace(/^units:.*\n/m, '');
    const r = loadProjectFromFiles(demoWith(CARDS, cards));
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
    // The A6 landscape card is every boat's own card; with the book's caution it is a sheet of its own.
    expect(planSheets(r.project).byBook.get('owner-console-cards')).toEqual(['card-reedshank-owner-console-cards', 'card-cloudpail-express-owner-console-cards', 'card-greyling-owner-console-cards']);
  });

  it("refuses more than 6 together with site.yaml's, at the book's cautions: line, with the counts and the fix", () => {
    const site = readFileSync(SITE, 'utf8');
    const five = `${site.replace(/\ncautions:[\s\S]*$/, '')}\ncautions:\n${[1, 2, 3, 4, 5].map((i) => `  - "Shop caution ${i} (test)."`).join('\n')}\n`;
    const cards = readFileSync(CARDS, 'utf8').replace(/cautions:\n[\s\S]*$/, 'cautions:\n  - "Book caution 1 (test)."\n  - "Book caution 2 (test)."\n');
    const files = demoWith(SITE, five).map((f) => (f.path.endsWith(CARDS) || f.path === CARDS ? { ...f, text: cards } : f));
    const r = loadProjectFromFiles(files);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    // Located at the cautions: key, as a list with too many entries is.
    const line = cards.split('\n').findIndex((l) => l.startsWith('cautions:')) + 1;
    expect(r.errors.map((e) => e.message)).toEqual([
      `${CARDS}:${line}:1 cautions must keep this book's and site.yaml's cautions together at most 6 (every sheet prints every caution after the built-in ones), found 2 here and 5 in site.yaml — merge or drop 1 of them, here or in site.yaml`,
    ]);
  });

  it('refuses a book caution over 300 characters at its line', () => {
    const long = 'x'.repeat(301);
    const cards = readFileSync(CARDS, 'utf8').replace(`  - "${KILL_CORD}"`, `  - "${long}"`);
    const r = loadProjectFromFiles(demoWith(CARDS, cards));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const line = cards.split('\n').findIndex((l) => l.includes(long)) + 1;
    expect(r.errors[0].message).toMatch(new RegExp(`^${CARDS}:${line}:\\d+ cautions\\[0\\] must be at most 300 characters`));
  });
});
