import { describe, expect, it } from 'vitest';
import type { Paper, SheetRequest } from '../../src/data/types.ts';
import { defaultWallCharts, boatInstallation } from '../../src/analysis/index.ts';
import { solveInstallation } from '../../src/model/index.ts';
import { renderSvg } from '../../src/render/index.ts';
import { sheetScene, sheetSlug } from '../../src/sheets/index.ts';
import { boxesOverlap, boxInside } from '../../src/sheets/kit/boxes.ts';
import { MIN_STROKE_MM } from '../../src/sheets/kit/style.ts';
import { boat, family, jet, project } from './fixtures/demoProject.ts';
import { leaves, markBox, scaleFromTicks, texts } from './sceneWalk.ts';
import { sceneProblems } from './sceneChecks.ts';
import { scenePages } from '../../src/scene/types.ts';

const ctx = { project, dateIso: '2026-11-02' };
const A4: Paper = { size: 'A4', orientation: 'portrait', bleedMm: 0 };
const requests: SheetRequest[] = [
  ...defaultWallCharts(project),
  { kind: 'wallChart', engineFamilyId: family.id, jetId: jet.id, conditions: (defaultWallCharts(project)[0] as Extract<SheetRequest, { kind: 'wallChart' }>).conditions, paper: { size: 'Tabloid', orientation: 'landscape', bleedMm: 3 } },
  { kind: 'specSheet', boatId: boat.id, paper: A4 },
  { kind: 'specSheet', boatId: boat.id, paper: { size: 'Letter', orientation: 'portrait', bleedMm: 3 } },
  { kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 3 } },
  { kind: 'consoleCard', boatId: boat.id, paper: { size: 'Card4x6', orientation: 'portrait', bleedMm: 0 } },
  { kind: 'upgradeSheet', boatId: boat.id, paper: A4 },
];
const name = (r: SheetRequest) => `${sheetSlug(r)}-${r.paper.size}-${r.paper.orientation}${r.paper.bleedMm ? '-bleed' : ''}`;

describe.each(requests.map((r) => [name(r), r] as const))('sheetScene() for %s', (_label, request) => {
  const scene = sheetScene(request, ctx);

  it('keeps every mark except crop marks inside the safe area', () => {
    for (const n of leaves(scene)) {
      if (n.role === 'crop-mark') continue;
      const box = markBox(n);
      if (box) expect(boxInside(box, scene.safeBox, 0.01), `${n.role} ${n.type === 'text' ? n.text : ''}`).toBe(true);
    }
  });

  it('lets no two text boxes overlap', () => {
    const boxes = texts(scene).map((t) => ({ t, box: markBox(t)! }));
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        expect(boxesOverlap(boxes[i].box, boxes[j].box, -0.01), `"${boxes[i].t.text}" / "${boxes[j].t.text}"`).toBe(false);
      }
    }
  });

  it('uses no type under the paper minimum (8 pt; 10 pt on A3/Tabloid) and no stroke under 0.5 pt', () => {
    const minPt = request.paper.size === 'A3' || request.paper.size === 'Tabloid' ? 10 : 8;
    for (const t of texts(scene)) expect(t.sizePt, t.text).toBeGreaterThanOrEqual(minPt);
    for (const n of leaves(scene)) if (n.type !== 'text' && n.type !== 'group' && n.stroke) expect(n.stroke.widthMm).toBeGreaterThanOrEqual(MIN_STROKE_MM);
  });

  it('prints no NaN, Infinity or undefined, dates from the context, and the cautions', () => {
    const all = texts(scene).map((t) => t.text).join('\n');
    expect(all).not.toMatch(/NaN|Infinity|undefined|null/);
    expect(all).toContain('Issued 2026-11-02');
    expect(all).toContain('Data revision 2026-11 rev 3');
    expect(texts(scene).filter((t) => t.role === 'caution').map((t) => t.text).join(' ')).toContain("maker's maximum rpm");
  });

  it('matches the SVG file snapshot', async () => {
    await expect(renderSvg(scene)).toMatchFileSnapshot(`../output/${name(request)}.svg`);
  });
});

// The wall chart's own checks (panels, shared scales, points, windows, table) are in wallChart.test.ts.

describe('boat sheets', () => {
  it('marks the fitted WOT point where the model puts it on the spec sheet', () => {
    const scene = sheetScene({ kind: 'specSheet', boatId: boat.id, paper: A4 }, ctx);
    const p = solveInstallation(boatInstallation(boat));
    const node = leaves(scene).find((n) => n.role === 'operating-point' && n.key === `impeller:${boat.impellerId}|engine:${boat.engineVariantId}`)!;
    const box = markBox(node)!;
    expect(Math.abs(box.x + box.width / 2 - scaleFromTicks(scene, 'x')(p.speedRpm))).toBeLessThan(0.1);
    expect(Math.abs(box.y + box.height / 2 - scaleFromTicks(scene, 'left')(p.powerKw))).toBeLessThan(0.1);
  });

  it('flows a spec sheet onto more A6 pages within the print rules instead of clipping', () => {
    const paper: Paper = { size: 'A6', orientation: 'portrait', bleedMm: 0 };
    const scene = sheetScene({ kind: 'specSheet', boatId: boat.id, paper }, ctx);
    expect(scenePages(scene).length).toBeGreaterThan(1);
    for (const page of scenePages(scene)) expect(sceneProblems(page, paper)).toEqual([]);
  });

  it('puts crop marks outside the trim only when the sheet has bleed', () => {
    const withBleed = sheetScene({ kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 3 } }, ctx);
    const without = sheetScene({ kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 0 } }, ctx);
    const marks = leaves(withBleed).filter((n) => n.role === 'crop-mark');
    expect(marks).toHaveLength(4);
    for (const m of marks) expect(boxesOverlap(markBox(m)!, withBleed.trimBox, -0.01)).toBe(false);
    expect(leaves(without).filter((n) => n.role === 'crop-mark')).toHaveLength(0);
  });

  it('names sheets with stable slugs', () => {
    expect(requests.map(sheetSlug)).toEqual([
      'wall-chart-harbour-30-tern-200',
      'wall-chart-harbour-30-tern-200',
      'spec-gannet',
      'spec-gannet',
      'card-gannet',
      'card-gannet',
      'upgrade-gannet',
    ]);
  });
});
