/**
 * Seeded property: plausible variations of the demo boats lay out on every paper their sheet kind is made
 * for, keeping the print rules; only content that truly cannot fit may raise a LayoutError, and its
 * message names the boat and what to change.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Paper, PaperSize, Project, SheetRequest } from '../../src/data/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
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
      { seed: 20261103, numRuns: Number(process.env.MATCHBOOK_LAYOUT_RUNS ?? 150), endOnFailure: true },
    );
  });
});
