/**
 * The label rules of a boat chart (docs/sheets.md, "Spec sheet"): no two leaders cross, no leader passes
 * through a marker other than its own, each point label is nearer its own marker than any other; and the
 * chart is cropped to the operating region. Checked on the demo's spec and upgrade sheets, on the stress
 * catalogues (many impellers, long labels), and on the label placer itself with generated charts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Paper, Project } from '../../../src/data/types.ts';
import type { TextNode } from '../../../src/scene/types.ts';
import { textBox } from '../../../src/scene/text.ts';
import { sheetScene } from '../../../src/sheets/index.ts';
import { placeLabels } from '../../../src/sheets/kit/labels.ts';
import { markerBox } from '../../../src/sheets/kit/markers.ts';
import { demoProject } from '../fixtures/boatVariation.ts';
import { stressProject, type StressCase } from '../fixtures/stressProjects.ts';
import { chartFacts, labelRuleBreaches, plotFill, type ChartFacts } from './chartFacts.ts';

const demo = await demoProject();
const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const LETTER: Paper = { size: 'Letter', orientation: 'portrait', bleedMm: 3 };
const KINDS = ['specSheet', 'upgradeSheet'] as const;

const chartsOf = (project: Project, kind: (typeof KINDS)[number], boatId: string, paper: Paper) => chartFacts(sheetScene({ kind, boatId, paper }, { project, dateIso: '2026-11-02' }));

describe('boat charts keep the label rules', () => {
  it.each(KINDS)('on every demo boat’s %s', (kind) => {
    const breaches = demo.boats.flatMap((b) => chartsOf(demo, kind, b.id, A4).flatMap((f) => labelRuleBreaches(f).details.map((d) => `${b.id}: ${d}`)));
    expect(breaches).toEqual([]);
  });

  it.each(['A', 'ALL'] as const satisfies readonly StressCase[])('on stress catalogue %s (24 impellers, 16-character labels), spec and upgrade sheets, A4 and Letter', (which) => {
    const project = stressProject(demo, which);
    const breaches = KINDS.flatMap((kind) => [A4, LETTER].flatMap((paper) => chartsOf(project, kind, project.boats[0].id, paper).flatMap((f) => labelRuleBreaches(f).details.map((d) => `${kind} ${paper.size}: ${d}`))));
    expect(breaches).toEqual([]);
  });
});

describe('boat charts are cropped to the operating region', () => {
  it('spreads the demo spec sheets’ WOT points over at least half the plot width, every point and the window inside it', () => {
    for (const b of demo.boats) {
      const [f] = chartsOf(demo, 'specSheet', b.id, A4);
      expect(f.marks.length, b.id).toBeGreaterThanOrEqual(3);
      for (const m of f.marks) {
        expect(m.x, `${b.id} ${m.key}`).toBeGreaterThan(f.plot.x);
        expect(m.x).toBeLessThan(f.plot.x + f.plot.width);
        expect(m.y).toBeGreaterThan(f.plot.y);
        expect(m.y).toBeLessThan(f.plot.y + f.plot.height);
      }
      // Before the crop the points took 16–63 % of the width (their rpm spread over the whole engine curve).
      expect(plotFill(f).rpm, b.id).toBeGreaterThan(0.5);
    }
  });
});

/** Charts the placer might meet: 2–9 marks at least 4 mm apart in an 90 × 55 mm plot, labels of 4–18 characters. */
const generatedChart = fc
  .uniqueArray(fc.record({ col: fc.integer({ min: 0, max: 20 }), row: fc.integer({ min: 0, max: 12 }) }), { minLength: 2, maxLength: 9, selector: (p) => `${p.col},${p.row}` })
  .chain((cells) => fc.tuple(fc.constant(cells), fc.array(fc.string({ minLength: 4, maxLength: 18, unit: fc.constantFrom(...'0123456789 rpmOVERlugs') }), { minLength: cells.length, maxLength: cells.length })));

describe('placeLabels() with marks (generated charts)', () => {
  it('keeps the three rules for every label it places', () => {
    fc.assert(
      fc.property(generatedChart, ([cells, words]) => {
        const bounds = { x: 0, y: 0, width: 90, height: 55 };
        const marks = cells.map((c, i) => {
          const x = 3 + c.col * 4.2;
          const y = 3 + c.row * 4.1;
          return { key: `p${i}`, x, y, box: markerBox(x, y, 2.4) };
        });
        const requests = marks.map((m, i) => ({ key: m.key, x: m.x, y: m.y, text: words[i].trim() || 'x', sizePt: 8, marks: [m.key] }));
        const placed = placeLabels(requests, { bounds, obstacles: marks.map((m) => m.box), where: 'generated chart', marks });
        const facts: ChartFacts = {
          plot: bounds,
          marks,
          leaders: placed.nodes.flatMap((n) => (n.type === 'path' && n.role === 'leader' && n.segments[0].op === 'M' && n.segments[1].op === 'L' ? [{ key: n.key ?? '', x0: n.segments[0].x, y0: n.segments[0].y, x1: n.segments[1].x, y1: n.segments[1].y }] : [])),
          labels: placed.nodes.filter((n): n is TextNode => n.type === 'text').map((n) => ({ key: n.key ?? '', text: n.text, box: textBox(n) })),
        };
        expect(labelRuleBreaches(facts).details).toEqual([]);
      }),
      { seed: 20261204, numRuns: 150 },
    );
  });
});
