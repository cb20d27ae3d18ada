/**
 * `check` proves the build (issue: check runs the same layout as build): for generated on-disk catalogues
 * across the limits of docs/sheets.md ("Limits every sheet lays out") — 1–6 variants, 1–24 impellers,
 * 1–2 boats with 0–8 cruise settings, labels of 1–16 characters, names of 1–60, 0–6 cautions of up to 300
 * characters (split between site.yaml and the book), one book on a paper its sheet kind offers (either orientation) — and a share just one past a limit,
 * `checkSite` exits 0 exactly when the real `buildSite` succeeds; inside the limits both succeed, past a limit both fail; a build that
 * fails names the definition's file:line:column on every problem line, never only a sheet slug. When the build succeeds,
 * every page of every planned sheet keeps the print rules of test/sheets/sceneChecks.ts: no two text
 * boxes intersect, every mark inside the live (safe) area, no type under its floor (the project's own
 * rule: 8 pt, 10 pt on A3 and Tabloid; common practice for sheets read at arm's length, no source).
 *
 * Seeded (SEED below) so CI runs the same catalogues every time; NUM_RUNS full builds (PNG, PDF, pages).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { register } from 'tsx/esm/api';
import { afterAll, describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { scenePages } from '../../src/scene/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { buildSite } from '../../src/site/buildSite.ts';
import { checkSite } from '../../src/site/checkSite.ts';
import { buildDateIso } from '../../src/site/dateIso.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { createRenderPool } from '../../src/site/renderPool.ts';
import { sceneProblems } from '../sheets/sceneChecks.ts';
import { catalogueArbitrary, writeCatalogue, type GeneratedCatalogue } from './generatedCatalogue.ts';

/** fast-check seed: the same catalogues on every run. */
const SEED = 20261203;
const NUM_RUNS = 20;
const SOURCE_DATE_EPOCH = '1767225600'; // 2026-01-01 UTC

/** A located line as the data layer prints it: `boats/boat-1.yaml:3:1 …` (any folder before it). */
const LOCATED = /^\S*\.yaml:\d+:\d+ /m;

// Eleventy imports the .11ty.ts templates with Node's own import(), which vitest does not transform:
// the same loader bin/matchbook.js registers.
const unregister = register();
const renderer = createRenderPool();
const roots: string[] = [];
afterAll(async () => {
  await renderer.close();
  await unregister();
  for (const r of roots) rmSync(r, { recursive: true, force: true });
});

/** Every print-rule problem of every page of every planned sheet, named by slug and page. */
async function sceneRuleProblems(dataDir: string): Promise<string[]> {
  const loaded = await loadProject(dataDir);
  if (!loaded.ok) return ['the catalogue did not load after a successful build'];
  const project = loaded.project;
  const dateIso = buildDateIso({ sourceDateEpoch: SOURCE_DATE_EPOCH, issueDate: project.site.issueDate });
  const problems: string[] = [];
  for (const { slug, request } of planSheets(project).sheets) {
    const pages = scenePages(sheetScene(request, { project, dateIso }));
    pages.forEach((page, i) => problems.push(...sceneProblems(page, request.paper).map((p) => `${slug} page ${i + 1}: ${p}`)));
  }
  return problems;
}

describe('check succeeds exactly when build does (seeded property over on-disk catalogues)', () => {
  it(`for ${NUM_RUNS} generated catalogues (seed ${SEED}): same verdict, located failures, print rules kept`, { timeout: 600_000 }, async () => {
    const seen = { built: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(catalogueArbitrary(0.3), async (cat: GeneratedCatalogue) => {
        const root = mkdtempSync(join(tmpdir(), 'matchbook-checkbuild-'));
        roots.push(root);
        const dataDir = writeCatalogue(join(root, 'data'), cat);
        const check = await checkSite(dataDir, { sourceDateEpoch: SOURCE_DATE_EPOCH });
        const build = await buildSite({ dataDir, outDir: join(root, 'out'), sourceDateEpoch: SOURCE_DATE_EPOCH, renderer });
        const what = `past ${cat.past}, book ${cat.book.kind} ${cat.book.size} ${cat.book.orientation}`;
        expect(check.exitCode === 0, `${what}\ncheck: ${check.text}\nbuild: ${build.ok ? 'ok' : build.errorsText}`).toBe(build.ok);
        // Inside the limits every catalogue builds on every paper its sheet kind offers; one past a limit
        // both refuse, at the field.
        if (cat.past === 'none') expect(build.ok, `${what}\nbuild: ${build.ok ? 'ok' : build.errorsText}`).toBe(true);
        else expect(build.ok, what).toBe(false);
        if (!build.ok) {
          seen.refused++;
          expect(build.errorsText).toMatch(LOCATED);
          expect(check.text).toMatch(LOCATED);
          // Every problem line is located at a definition file, none only at a sheet slug.
          const problemLines = build.errorsText.split('\n').filter((l) => l !== '' && !/^\s/.test(l) && !/problems? in the data\.$/.test(l));
          for (const line of problemLines) expect(line).toMatch(/^\S*\.yaml:\d+:\d+ /);
          return;
        }
        seen.built++;
        expect(await sceneRuleProblems(dataDir), what).toEqual([]);
        rmSync(root, { recursive: true, force: true });
      }),
      { seed: SEED, numRuns: NUM_RUNS, endOnFailure: true },
    );
    // The seed reaches both sides of the equivalence.
    expect(seen.built).toBeGreaterThan(0);
    expect(seen.refused).toBeGreaterThan(0);
  });
});
