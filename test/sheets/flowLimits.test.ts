/**
 * Sheets flow for every catalogue inside the documented limits (docs/sheets.md, "Limits"), on every paper
 * their kind is made for (src/sheets/papers.ts), both orientations, with and without bleed: no LayoutError,
 * no two text boxes intersect, every text box inside the safe area, no type under the floor, on every page
 * (sceneProblems); and nothing is lost: every impeller label, cruise label, caution and name is printed in
 * full somewhere on the sheet's pages. The print floors are the project's own rules (8 pt on A4 and smaller,
 * 10 pt on A3/Tabloid; common practice for sheets read at arm's length, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Paper, Project, SheetRequest } from '../../src/data/types.ts';
import { scenePages, type Scene } from '../../src/scene/types.ts';
import { analyseBoat, defaultWallCharts } from '../../src/analysis/index.ts';
import { BOAT_SHEET_PAPERS, BUILT_IN_CAUTIONS, cautionsFor, sheetScene, WALL_CHART_PAPERS } from '../../src/sheets/index.ts';
import { CONTINUING_CAUTION } from '../../src/sheets/kit/cautions.ts';
import { demoProject } from './fixtures/boatVariation.ts';
import { catalogueProject, LIMITS, stressProject, type Catalogue, type StressCase } from './fixtures/stressProjects.ts';
import { sceneProblems } from './sceneChecks.ts';
import { texts } from './sceneWalk.ts';

const demo = await demoProject();
type Kind = keyof typeof BOAT_SHEET_PAPERS;
const KINDS: readonly Kind[] = ['specSheet', 'upgradeSheet', 'consoleCard'];

/** Every paper a kind is made for: both orientations; bleed on the portrait ones. */
function papersOf(kind: Kind): Paper[] {
  return BOAT_SHEET_PAPERS[kind].flatMap((size) => [
    { size, orientation: 'portrait', bleedMm: 0 },
    { size, orientation: 'landscape', bleedMm: 0 },
    { size, orientation: 'portrait', bleedMm: 3 },
  ] as Paper[]);
}

/** The words of a sheet's pages in reading order (wrapped lines joined by a space), of one role or all. */
function sheetWords(scene: Scene, role?: string): string {
  return scenePages(scene)
    .flatMap((p) => texts(p).filter((t) => role === undefined || t.role === role).map((t) => t.text))
    .join(' ')
    .replace(/\s+/g, ' ');
}

/** What a kind must print in full for the stressed boat (cautions are checked on their own lines, which may continue on the next page). */
function mustPrint(kind: Kind, project: Project): string[] {
  const boat = project.boats[0];
  const name = [boat.name];
  // A card lists cruise rpm: a speed setting below planing speed has none (no speed model there), so it is left off.
  if (kind === 'consoleCard') {
    const result = analyseBoat({ boat, project });
    return [...name, ...(result.calibrated?.cruise ?? result.cruise).filter((c) => c.status !== 'belowPlaning').map((c) => c.label)];
  }
  if (kind === 'upgradeSheet') return [...name, boat.engine.label, boat.jet.label];
  return [...name, boat.engine.label, boat.jet.label, ...boat.jet.impellers.map((i) => i.label), ...boat.cruise.map((c) => c.label)];
}

function problemsOf(kind: Kind, project: Project, paper: Paper): string[] {
  const request = { kind, boatId: project.boats[0].id, paper } as SheetRequest;
  const scene = sheetScene(request, { project, dateIso: '2026-12-03' });
  const problems = scenePages(scene).flatMap((page, i) => sceneProblems(page, paper).map((p) => `page ${i + 1}: ${p}`));
  const words = sheetWords(scene);
  for (const text of mustPrint(kind, project)) if (!words.includes(text)) problems.push(`not printed in full: "${text}"`);
  // Each piece of a cautions block that continues starts with the built-in ones again: the shop's are
  // read with those repeats taken out, so one split over a page break reads whole.
  const cautionWords = sheetWords(scene, 'caution');
  const shopWords = BUILT_IN_CAUTIONS.reduce((words, c) => words.split(c).join(' '), cautionWords).replace(/\s+/g, ' ');
  for (const text of cautionsFor(project.site)) {
    const whole = text.replace(/\s+/g, ' ');
    if (!(BUILT_IN_CAUTIONS.includes(text) ? cautionWords : shopWords).includes(whole)) problems.push(`caution not printed in full: "${text}"`);
  }
  // Every page that shows cautions shows the built-in ones whole.
  for (const [i, page] of scenePages(scene).entries()) {
    const here = texts(page).filter((t) => t.role === 'caution').map((t) => t.text).join(' ').replace(/\s+/g, ' ');
    if (here !== '' && !BUILT_IN_CAUTIONS.every((c) => here.includes(c))) problems.push(`page ${i + 1}: cautions without every built-in one`);
  }
  // Every page is the same paper.
  for (const page of scenePages(scene)) if (page.widthMm !== scene.widthMm || page.heightMm !== scene.heightMm) problems.push('a page of another size');
  // A spec or upgrade sheet that continues carries the built-in cautions at the foot of every page.
  if (kind !== 'consoleCard' && scenePages(scene).length > 1) {
    scenePages(scene).forEach((page, i) => {
      const line = texts(page).filter((t) => t.role === 'caution-line').map((t) => t.text).join(' ');
      if (line !== CONTINUING_CAUTION) problems.push(`page ${i + 1}: no caution line at its foot`);
    });
  }
  return problems;
}

const CASES: readonly StressCase[] = ['A', 'B', 'C', 'ALL'];

describe.each(KINDS)('%s at the limits', (kind) => {
  it.each(CASES)('stress catalogue %s lays out on every paper it is made for, printing everything', (which) => {
    const project = stressProject(demo, which);
    const problems = papersOf(kind).flatMap((paper) => problemsOf(kind, project, paper).map((p) => `${paper.size} ${paper.orientation} bleed ${paper.bleedMm}: ${p}`));
    expect(problems.join("\n")).toBe("");
  });
});

describe('a sheet that does not fit one page', () => {
  it('continues on further pages of the same paper, titled with the page, each inside the print rules', () => {
    const project = stressProject(demo, 'ALL');
    const paper: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
    const scene = sheetScene({ kind: 'specSheet', boatId: project.boats[0].id, paper }, { project, dateIso: '2026-12-03' });
    const pages = scenePages(scene);
    expect(pages.length).toBeGreaterThan(1);
    expect(texts(pages[0]).find((t) => t.role === 'sheet-kind')?.text).toBe('SPEC SHEET · page 1');
    expect(texts(pages[1]).find((t) => t.role === 'sheet-kind')?.text).toBe('SPEC SHEET · page 2');
    expect(pages[1].title).toBe(`${project.boats[0].name}: spec sheet, page 2 of ${pages.length}`);
    // The one-page demo sheet stays one page.
    expect(scenePages(sheetScene({ kind: 'specSheet', boatId: demo.boats[0].id, paper }, { project: demo, dateIso: '2026-12-03' })).length).toBe(1);
  });
});

describe('the stress catalogues are at the limits they claim', () => {
  it('24 impellers and 6 variants with 16-character labels; 6 cautions of 300 characters; 8 cruise settings; 60-character names', () => {
    const all = stressProject(demo, 'ALL');
    const boat = all.boats[0];
    const family = all.engines.find((f) => f.id === boat.engineFamilyId)!;
    expect(boat.jet.impellers.map((i) => i.label.length)).toEqual(Array(24).fill(16));
    expect(family.variants.map((v) => v.variantLabel.length)).toEqual(Array(6).fill(60).map((n, i) => (family.variants[i].id === boat.engine.id ? n : 16)));
    expect(all.site.extraCautions?.map((c) => c.length)).toEqual(Array(6).fill(300));
    expect(boat.cruise.map((c) => c.label.length)).toEqual(Array(8).fill(16));
    expect([boat.name.length, boat.engine.label.length, boat.jet.label.length]).toEqual([60, 60, 60]);
  });
});

describe('catalogues across the limits (seeded property)', () => {
  const catalogue: fc.Arbitrary<Catalogue> = fc.record({
    impellers: fc.integer({ min: 1, max: LIMITS.impellers }),
    impellerChars: fc.integer({ min: 1, max: LIMITS.labelChars }),
    variants: fc.integer({ min: 1, max: LIMITS.variants }),
    variantChars: fc.integer({ min: 1, max: LIMITS.labelChars }),
    cautions: fc.integer({ min: 0, max: LIMITS.cautions }),
    cautionChars: fc.integer({ min: 20, max: LIMITS.cautionChars }),
    cruise: fc.integer({ min: 0, max: LIMITS.cruise }),
    cruiseChars: fc.integer({ min: 1, max: LIMITS.labelChars }),
    nameChars: fc.integer({ min: 1, max: LIMITS.nameChars }),
  });
  it.each(KINDS)('%s: every generated catalogue lays out on a paper it is made for, keeping the print rules', (kind) => {
    const papers = papersOf(kind);
    fc.assert(
      fc.property(catalogue, fc.nat(), (cat, pick) => {
        const project = catalogueProject(demo, cat);
        expect(problemsOf(kind, project, papers[pick % papers.length])).toEqual([]);
      }),
      { seed: 20261203, numRuns: 25, endOnFailure: true },
    );
  });
});

describe('wall chart at the limits', () => {
  /** A3 and Tabloid (the papers it is made for, src/sheets/papers.ts), both orientations, with and without bleed. */
  const papers: Paper[] = WALL_CHART_PAPERS.flatMap((size) => [
    { size, orientation: 'landscape', bleedMm: 0 },
    { size, orientation: 'portrait', bleedMm: 0 },
    { size, orientation: 'landscape', bleedMm: 3 },
  ] as Paper[]);

  it.each(CASES)('stress catalogue %s: every impeller of every variant on some page, each page inside the print rules', (which) => {
    const project = stressProject(demo, which);
    const boat = project.boats[0];
    const family = project.engines.find((f) => f.id === boat.engineFamilyId)!;
    const problems: string[] = [];
    for (const paper of papers) {
      const request = { ...defaultWallCharts(project).find((r) => r.kind === 'wallChart' && r.engineFamilyId === family.id && r.jetId === boat.jet.id)!, paper } as SheetRequest;
      const scene = sheetScene(request, { project, dateIso: '2026-12-03' });
      const pages = scenePages(scene);
      const where = `${paper.size} ${paper.orientation} bleed ${paper.bleedMm}`;
      pages.forEach((page, i) => problems.push(...sceneProblems(page, paper).map((p) => `${where} page ${i + 1}: ${p}`)));
      // Each (impeller, variant) cell's predicted rpm is printed exactly once over the pages.
      const cells = pages.flatMap((page) => texts(page).filter((t) => t.role === 'ladder-rpm').map((t) => t.key));
      for (const imp of boat.jet.impellers) {
        for (const v of family.variants) {
          const n = cells.filter((k) => k === `impeller:${imp.id}|engine:${v.variantId}`).length;
          if (n !== 1) problems.push(`${where}: ${imp.label} × ${v.label} printed ${n} times`);
        }
      }
      // Every impeller label whole, the cautions on every page, every page the same paper.
      const words = sheetWords(scene);
      for (const imp of boat.jet.impellers) if (!words.includes(imp.label)) problems.push(`${where}: impeller label not printed in full: "${imp.label}"`);
      for (const [i, page] of pages.entries()) {
        const cautionWords = texts(page).filter((t) => t.role === 'caution').map((t) => t.text).join(' ').replace(/\s+/g, ' ');
        for (const text of cautionsFor(project.site)) if (!cautionWords.includes(text.replace(/\s+/g, ' '))) problems.push(`${where} page ${i + 1}: caution not printed in full: "${text.slice(0, 40)}…"`);
        if (page.widthMm !== scene.widthMm || page.heightMm !== scene.heightMm) problems.push(`${where}: a page of another size`);
      }
    }
    expect(problems.join('\n')).toBe('');
  });

  it('continues over pages of the same paper when six variants are too wide for one, each page titled with its number and its variants', () => {
    const project = stressProject(demo, 'A');
    const boat = project.boats[0];
    const family = project.engines.find((f) => f.id === boat.engineFamilyId)!;
    const paper: Paper = { size: 'A3', orientation: 'landscape', bleedMm: 0 };
    const request = { ...defaultWallCharts(project).find((r) => r.kind === 'wallChart' && r.engineFamilyId === family.id && r.jetId === boat.jet.id)!, paper } as SheetRequest;
    const pages = scenePages(sheetScene(request, { project, dateIso: '2026-12-03' }));
    expect(pages.length).toBe(2);
    expect(texts(pages[0]).find((t) => t.role === 'sheet-kind')?.text).toBe('WALL CHART · page 1 of 2');
    expect(texts(pages[1]).find((t) => t.role === 'sheet-kind')?.text).toBe('WALL CHART · page 2 of 2');
    // Three variants a page, in the family's order; each page's subtitle names its own.
    const headingsOf = (i: number) => texts(pages[i]).filter((t) => t.role === 'ladder-rpm').map((t) => t.key!.split('|engine:')[1]);
    expect([...new Set(headingsOf(0))]).toEqual(family.variants.slice(0, 3).map((v) => v.variantId));
    expect([...new Set(headingsOf(1))]).toEqual(family.variants.slice(3).map((v) => v.variantId));
    const subtitle = texts(pages[1]).filter((t) => t.role === 'sheet-subtitle').map((t) => t.text).join(' ');
    expect(subtitle).toContain(family.variants[3].label);
    expect(subtitle).not.toContain(family.variants[0].label);
  });
});
