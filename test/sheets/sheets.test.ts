import { describe, expect, it } from 'vitest';
import type { Paper, SheetRequest } from '../../src/data/types.ts';
import { defaultWallCharts, boatInstallation } from '../../src/analysis/index.ts';
import { solveInstallation } from '../../src/model/index.ts';
import { renderSvg } from '../../src/render/index.ts';
import { sheetScene, sheetSlug } from '../../src/sheets/index.ts';
import { boxesOverlap, boxInside } from '../../src/sheets/kit/boxes.ts';
import { MIN_STROKE_MM } from '../../src/sheets/kit/style.ts';
import { ESTIMATES_LINE, SHEET_KIND_NAMES } from '../../src/sheets/kit/frame.ts';
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

  it('uses no type under the paper minimum (8 pt; 10 pt on A3/Tabloid) and no stroke under 0.5 pt but the crop marks\' hairlines', () => {
    const minPt = request.paper.size === 'A3' || request.paper.size === 'Tabloid' ? 10 : 8;
    for (const t of texts(scene)) expect(t.sizePt, t.text).toBeGreaterThanOrEqual(minPt);
    // Crop marks are cut off with the slug: they are hairlines for the cutter's eye, not lines of the sheet.
    for (const n of leaves(scene)) if (n.type !== 'text' && n.type !== 'group' && n.stroke && n.role !== 'crop-mark') expect(n.stroke.widthMm).toBeGreaterThanOrEqual(MIN_STROKE_MM);
  });

  it('prints no NaN, Infinity or undefined, dates from the context, and the cautions', () => {
    const all = texts(scene).map((t) => t.text).join('\n');
    expect(all).not.toMatch(/NaN|Infinity|undefined|null/);
    const revision = texts(scene).filter((t) => t.role === 'revision-line').map((t) => t.text);
    expect(revision.length).toBeGreaterThan(0);
    for (const line of revision) expect(['Data revision 2026-11 rev 3 · issued 2026-11-02', 'Rev. 2026-11 rev 3 · 2026-11-02']).toContain(line);
    expect(texts(scene).filter((t) => t.role === 'estimates-line').map((t) => t.text)).toContain(ESTIMATES_LINE);
    // Every page carries the cautions: the block, or on the front of a two-sided card its one-line form.
    for (const page of scenePages(scene)) {
      const cautions = texts(page).filter((t) => t.role === 'caution' || t.role === 'caution-line').map((t) => t.text).join(' ');
      expect(cautions).toMatch(/maker's maximum rpm/);
    }
  });

  it('matches the SVG file snapshot', async () => {
    await expect(renderSvg(scene)).toMatchFileSnapshot(`../output/${name(request)}.svg`);
  });
});

// The wall chart's own checks (panels, shared scales, points, windows, table) are in wallChart.test.ts.

describe('one title block on every sheet kind', () => {
  const kindOf = (r: SheetRequest) => SHEET_KIND_NAMES[r.kind].toUpperCase();
  it.each(requests.map((r) => [name(r), r] as const))('%s: kind line, revision, title, subtitle and shop in the same places and weights', (_n, request) => {
    const scene = sheetScene(request, ctx);
    const pages = scenePages(scene);
    for (const [i, page] of pages.entries()) {
      const t = texts(page);
      const one = (role: string) => {
        const found = t.filter((n) => n.role === role);
        expect(found.length, `${role} on page ${i + 1}`).toBe(1);
        return found[0];
      };
      const kind = one('sheet-kind');
      const revision = one('revision-line');
      const title = one('sheet-title');
      const subtitle = t.filter((n) => n.role === 'sheet-subtitle')[0];
      const shop = t.filter((n) => n.role === 'shop-name')[0];
      // The kind names the sheet, with its page when it has more than one.
      expect(kind.text).toBe(pages.length === 1 ? kindOf(request) : request.kind === 'wallChart' ? `${kindOf(request)} · page ${i + 1} of ${pages.length}` : `${kindOf(request)} · page ${i + 1}`);
      expect(kind.weight).toBe('bold');
      expect(revision.weight).toBe('regular');
      expect(kind.sizePt).toBe(revision.sizePt);
      // Top to bottom: kind line (revision beside it or under it), title, subtitle; the shop at the title's right or under the subtitle.
      expect(revision.y).toBeGreaterThanOrEqual(kind.y - 1e-6);
      expect(title.y).toBeGreaterThan(revision.y);
      expect(subtitle.y).toBeGreaterThan(title.y);
      expect(title.weight).toBe('bold');
      expect(title.sizePt).toBeGreaterThan(subtitle.sizePt);
      expect(shop.text.startsWith(project.site.shopName)).toBe(true);
      expect(shop.y).toBeGreaterThanOrEqual(title.y - title.sizePt * 0.3528);
      expect(one('estimates-line').text).toBe(ESTIMATES_LINE);
      expect(kind.x).toBeCloseTo(title.x, 6);
    }
  });
});

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
      'wall-chart-quaymoth-skipper-ploverkite-drift',
      'wall-chart-quaymoth-skipper-ploverkite-drift',
      'spec-gannet',
      'spec-gannet',
      'card-gannet',
      'card-gannet',
      'upgrade-gannet',
    ]);
  });
});
