/**
 * Seeded property: plausible variations of the demo boats lay out on every paper their sheet kind is made
 * for, keeping the print rules; only content that truly cannot fit may raise a LayoutError, and its
 * message names the boat and what to change.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Paper, PaperSize, Project, SheetRequest } from '../../src/data/types.ts';
import { LayoutError, sheetScene } from '../../src/sheets/index.ts';
import { boatVariation, demoProject, variedBoat } from './fixtures/boatVariation.ts';
import { sceneProblems } from './sceneChecks.ts';

const demo = await demoProject();
const variation = boatVariation(demo);

/** Papers each boat sheet is made for (docs/sheets.md): spec and upgrade sheets page-sized, cards small. */
const PAPERS: Record<'specSheet' | 'upgradeSheet' | 'consoleCard', readonly Paper[]> = {
  specSheet: [paper('A4'), paper('Letter')],
  upgradeSheet: [paper('A4'), paper('Letter')],
  consoleCard: [paper('A6'), paper('Card4x6'), paper('A6', 'landscape'), paper('Card4x6', 'landscape'), paper('A5')],
};

function paper(size: PaperSize, orientation: 'portrait' | 'landscape' = 'portrait'): Paper {
  return { size, orientation, bleedMm: 0 };
}

/** Papers a page-sized sheet is not made for: it lays out, or refuses in words. */
const OTHER_PAPERS: readonly Paper[] = [paper('A5'), paper('A6'), paper('Card4x6'), paper('A4', 'landscape'), paper('Letter', 'landscape'), paper('A5', 'landscape')];

const kinds = ['specSheet', 'upgradeSheet', 'consoleCard'] as const;

describe('boat sheets lay out for plausible boats (seeded property)', () => {
  it('spec sheet, upgrade sheet and console card lay out on their papers, keeping the print rules', () => {
    fc.assert(
      fc.property(variation, (v) => {
        const boat = variedBoat(demo, v);
        const project: Project = { ...demo, boats: demo.boats.map((b) => (b.id === boat.id ? boat : b)) };
        for (const kind of kinds) {
          const papers = PAPERS[kind];
          const request = { kind, boatId: boat.id, paper: papers[v.paper % papers.length] } as SheetRequest;
          const scene = sheetScene(request, { project, dateIso: '2026-11-02' });
          expect(sceneProblems(scene, request.paper), `${kind} on ${request.paper.size} ${request.paper.orientation}`).toEqual([]);
        }
      }),
      { seed: Number(process.env.MATCHBOOK_LAYOUT_SEED ?? 20261103), numRuns: Number(process.env.MATCHBOOK_LAYOUT_RUNS ?? 150), endOnFailure: true },
    );
  });

  it('on papers too small for a spec or upgrade sheet, it lays out or raises a LayoutError naming the boat and the fix', () => {
    fc.assert(
      fc.property(variation, fc.constantFrom('specSheet' as const, 'upgradeSheet' as const), (v, kind) => {
        const boat = variedBoat(demo, v);
        const project: Project = { ...demo, boats: demo.boats.map((b) => (b.id === boat.id ? boat : b)) };
        const request = { kind, boatId: boat.id, paper: OTHER_PAPERS[v.paper % OTHER_PAPERS.length] } as SheetRequest;
        try {
          expect(sceneProblems(sheetScene(request, { project, dateIso: '2026-11-02' }), request.paper)).toEqual([]);
        } catch (e) {
          expect(e).toBeInstanceOf(LayoutError);
          expect((e as Error).message).toContain(boat.id);
          expect((e as Error).message).toMatch(/use (larger|wider) paper|shorten/);
        }
      }),
      { seed: 20261104, numRuns: 40, endOnFailure: true },
    );
  });
});
