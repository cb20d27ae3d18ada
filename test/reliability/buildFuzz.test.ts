/**
 * Fuzzing past the loader: demo data with a few numbers changed that still loads is analysed, laid out
 * and rendered to SVG (PNG and PDF skipped for speed). Each run either gives SVG and results free of
 * NaN and Infinity, or stops with one of the two typed, user-fixable errors that name the sheet.
 * Each run analyses every boat the changed file reaches and draws one of their sheets (or wall charts).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseBoat, analyseWallChart } from '../../src/analysis/index.ts';
import { planSheets, type PlannedSheet } from '../../src/site/planSheets.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';
import { renderSvg } from '../../src/render/index.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { STACK_TRACE } from './cli.ts';
import { demoSources, fuzzRuns, mutateDemo, numbersIn, type Mutation } from './mutations.ts';

const demo = demoSources();
const DATE_ISO = '2026-11-02';
/** The errors a user fixes in the data (src/site/errors.ts tells them apart by name the same way). */
const TYPED = new Set(['LayoutError', 'UnsupportedCharacterError', 'ModelInputError']);

/** Numbers moved by a factor, or replaced: changes that often still load and stress the physics. */
const numberChange: fc.Arbitrary<Mutation> = fc.record({
  kind: fc.constant('perturb' as const),
  at: fc.nat(),
  number: fc.oneof(
    fc.double({ min: 0.01, max: 20000, noNaN: true }).map((x) => Number(x.toPrecision(4))),
    fc.integer({ min: 0, max: 12000 }),
    fc.constantFrom(0.001, 1, 2, 100, 999, 1000, 1100, 5999, 6000, 29999),
  ),
});

/** The planned sheets drawn from the mutated file (all sheets for site.yaml and books). */
function sheetsFrom(project: Project, path: string): PlannedSheet[] {
  const plan = planSheets(project);
  const [, kind, name] = /^data\/(?:(engines|jets|boats|books)\/)?(.+)\.yaml$/.exec(path) ?? [];
  const boatsUsing = (field: 'engineFamilyId' | 'jetId') => new Set(project.boats.filter((b) => b[field] === name).map((b) => b.id));
  const touches = (p: PlannedSheet): boolean => {
    const r = p.request;
    if (kind === 'boats') return r.kind !== 'wallChart' && r.boatId === name;
    if (kind === 'engines') return r.kind === 'wallChart' ? r.engineFamilyId === name : boatsUsing('engineFamilyId').has(r.boatId);
    if (kind === 'jets') return r.kind === 'wallChart' ? r.jetId === name : boatsUsing('jetId').has(r.boatId);
    if (kind === 'books') return (plan.byBook.get(name) ?? []).includes(p.slug);
    return true;
  };
  return plan.sheets.filter(touches);
}

describe('analysis, sheets and SVG on mutated demo data that still loads (seeded fuzz)', () => {
  it('give finite results and NaN-free SVG, or a typed error naming the sheet', () => {
    const outcomes = { drawn: 0, refused: 0 };
    fc.assert(
      fc.property(fc.record({ file: fc.nat(), mutations: fc.array(numberChange, { minLength: 1, maxLength: 2 }) }), fc.nat(), (pick, sheetIndex) => {
        const { files, path } = mutateDemo(demo, pick);
        const loaded = loadProjectFromFiles(files);
        fc.pre(loaded.ok);
        if (!loaded.ok) return;
        const project = loaded.project;
        const candidates = sheetsFrom(project, path);
        // One sheet per run, chosen by the run: enough runs cover every kind within the time budget.
        const { slug, request } = candidates[sheetIndex % candidates.length];
        // Every boat the changed file reaches is analysed; one sheet is drawn.
        const reached = new Set(candidates.flatMap((c) => (c.request.kind === 'wallChart' ? [] : [c.request.boatId])));
        for (const boat of project.boats.filter((b) => reached.has(b.id))) {
          expect(numbersIn(analyseBoat({ boat, project })).filter((n) => !Number.isFinite(n.value))).toEqual([]);
        }
        if (request.kind === 'wallChart') {
          const family = project.engines.find((f) => f.id === request.engineFamilyId)!;
          const jet = project.jets.find((j) => j.id === request.jetId)!;
          expect(numbersIn(analyseWallChart({ family, jet, conditions: request.conditions })).filter((n) => !Number.isFinite(n.value))).toEqual([]);
        }
        try {
          const svg = renderSvg(sheetScene(request, { project, dateIso: DATE_ISO }));
          expect(svg, slug).not.toMatch(/NaN|Infinity|undefined/);
          outcomes.drawn++;
        } catch (error) {
          const e = error as Error;
          expect(TYPED.has(e.name), `${slug}: ${e.name}: ${e.message}`).toBe(true);
          expect(e.message).not.toMatch(STACK_TRACE);
          outcomes.refused++;
        }
      }),
      { seed: 6_2027, numRuns: fuzzRuns({ name: 'MATCHBOOK_BUILD_FUZZ_RUNS', fallback: 200 }) },
    );
    expect(outcomes.drawn).toBeGreaterThan(0);
  });
});
