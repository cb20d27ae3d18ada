import { describe, expect, it } from 'vitest';
import type { EngineFamily, EngineVariant, Project, SheetRequest } from '../../src/data/types.ts';
import type { GroupNode, Scene, SceneNode } from '../../src/scene/types.ts';
import { analyseWallChart, chartInstallation, defaultWallCharts, isWarning } from '../../src/analysis/index.ts';
import { solveInstallation } from '../../src/model/index.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boxesOverlap, boxInside } from '../../src/sheets/kit/boxes.ts';
import { rpmText } from '../../src/sheets/kit/format.ts';
import { PAPER_WHITE, WARN } from '../../src/sheets/kit/style.ts';
import { family, jet, project } from './fixtures/demoProject.ts';
import { leaves, markBox, scaleFromTicks, texts } from './sceneWalk.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;
const ctx = { project, dateIso: '2026-11-02' };
const baseRequest = defaultWallCharts(project)[0] as WallChartRequest;

/** A variant of the invented family with its own power scale and limits (demo data). */
function variant(base: EngineVariant, variantId: string, label: string, scale: number, limits: EngineVariant['limits']): EngineVariant {
  if (base.curve.kind !== 'table') throw new Error('fixture expects a table curve');
  return { ...base, id: `harbour-30/${variantId}`, variantId, label, limits, curve: { kind: 'table', points: base.curve.points.map((p) => ({ ...p, powerKw: p.powerKw * scale })) } };
}

const [s210, s250] = family.variants;
// Invented: the sport tune revs further (window 5000–5400, max 5600) and so gets its own window and line.
const s290 = variant(s210, 's290', 'Harbour 3.0 S290 sport', 1.38, { idleRpm: 750, windowLowRpm: 5000, windowHighRpm: 5400, maxRpm: 5600 });
const threeFamily: EngineFamily = { ...family, variants: [s210, s250, s290] };
const fourFamily: EngineFamily = { ...family, variants: [s210, s250, s290, variant(s210, 's180', 'Harbour 3.0 S180 eco', 0.86, s210.limits)] };
const withFamily = (f: EngineFamily): Project => ({ ...project, engines: [f], boats: project.boats.map((b) => ({ ...b, engine: f.variants[0] })) });

/** The panel groups of a wall chart, in order. */
function panels(scene: Scene): GroupNode[] {
  return leavesAndGroups(scene.root).filter((n): n is GroupNode => n.type === 'group' && n.role === 'wall-chart-panel');
}
function leavesAndGroups(n: SceneNode): SceneNode[] {
  return n.type === 'group' ? [n, ...n.children.flatMap(leavesAndGroups)] : [n];
}
/** The same scene restricted to one panel, so the sceneWalk helpers read that panel's ticks only. */
const only = (scene: Scene, root: GroupNode): Scene => ({ ...scene, root });

describe.each([
  ['two variants (demo fixture)', family],
  ['three variants with different limits', threeFamily],
  ['four variants (wraps to a second row)', fourFamily],
])('wallChartScene() with %s', (_name, f) => {
  const p = withFamily(f);
  const request: WallChartRequest = { ...baseRequest, engineFamilyId: f.id };
  const scene = sheetScene(request, { ...ctx, project: p });
  const result = analyseWallChart({ family: f, jet, conditions: request.conditions });

  it('draws one panel per variant, each with one absorption series and one tolerance band per impeller', () => {
    expect(panels(scene).map((g) => g.key)).toEqual(f.variants.map((v) => `panel:${v.variantId}`));
    for (const g of panels(scene)) {
      const inPanel = leaves(only(scene, g));
      expect(inPanel.filter((n) => n.role === 'absorption-curve').map((n) => n.key)).toEqual(jet.impellers.map((i) => `impeller:${i.id}`));
      expect(inPanel.filter((n) => n.role === 'tolerance-band').map((n) => n.key)).toEqual(jet.impellers.map((i) => `impeller:${i.id}`));
      expect(inPanel.filter((n) => n.role === 'engine-curve')).toHaveLength(1);
    }
  });

  it('puts every operating point within 0.1 mm of the model on its own panel’s printed axes', () => {
    panels(scene).forEach((g, i) => {
      const v = f.variants[i];
      const x = scaleFromTicks(only(scene, g), 'x');
      const y = scaleFromTicks(only(scene, g), 'left');
      const points = leaves(only(scene, g)).filter((n) => n.role === 'operating-point');
      expect(points.map((n) => n.key)).toEqual(jet.impellers.map((imp) => `impeller:${imp.id}|engine:${v.variantId}`));
      for (const impeller of jet.impellers) {
        const op = solveInstallation(chartInstallation({ variant: v, jet, impeller, conditions: request.conditions }));
        const box = markBox(points.find((n) => n.key === `impeller:${impeller.id}|engine:${v.variantId}`)!)!;
        expect(Math.abs(box.x + box.width / 2 - x(op.speedRpm))).toBeLessThan(0.1);
        expect(Math.abs(box.y + box.height / 2 - y(op.powerKw))).toBeLessThan(0.1);
      }
    });
  });

  it('draws each panel’s WOT window and rev-limit line at that variant’s own limits', () => {
    panels(scene).forEach((g, i) => {
      const { limits } = f.variants[i];
      const x = scaleFromTicks(only(scene, g), 'x');
      const inPanel = leaves(only(scene, g));
      const band = markBox(inPanel.find((n) => n.role === 'wot-window')!)!;
      expect(band.x).toBeCloseTo(x(limits.windowLowRpm), 6);
      expect(band.x + band.width).toBeCloseTo(x(limits.windowHighRpm), 6);
      const revLimits = inPanel.filter((n) => n.role === 'rev-limit');
      expect(revLimits).toHaveLength(1);
      expect(markBox(revLimits[0])!.x).toBeCloseTo(x(limits.maxRpm), 6);
      expect(texts(only(scene, g)).map((t) => t.text)).toContain(`WOT window ${limits.windowLowRpm}–${limits.windowHighRpm} · max ${limits.maxRpm} rpm`);
    });
  });

  it('gives every panel the same scales, from below the lowest WOT point past the highest maximum rpm', () => {
    const all = panels(scene).map((g) => ({ x: scaleFromTicks(only(scene, g), 'x'), y: scaleFromTicks(only(scene, g), 'left'), frame: markBox(leaves(only(scene, g)).find((n) => n.role === 'plot-frame')!)! }));
    const mmPerRpm = all.map((s) => s.x(1000) - s.x(0));
    const mmPerKw = all.map((s) => s.y(0) - s.y(100));
    for (const m of mmPerRpm) expect(m).toBeCloseTo(mmPerRpm[0], 9);
    for (const m of mmPerKw) expect(m).toBeCloseTo(mmPerKw[0], 9);
    const { x, y, frame } = all[0];
    const rpmAt = (mm: number) => (mm - x(0)) / (x(1) - x(0));
    const kwAt = (mm: number) => (mm - y(0)) / (y(1) - y(0));
    const lowestRpm = Math.min(...result.pairings.map((q) => q.band.nominal.speedRpm));
    const highestMax = Math.max(...f.variants.map((v) => v.limits.maxRpm));
    expect(rpmAt(frame.x)).toBeLessThan(lowestRpm);
    expect(rpmAt(frame.x)).toBeGreaterThan(lowestRpm * 0.9);
    expect(rpmAt(frame.x + frame.width)).toBeGreaterThan(highestMax);
    expect(rpmAt(frame.x + frame.width)).toBeLessThan(highestMax * 1.06);
    const peakKw = Math.max(...result.variants.map((v) => Math.max(v.site.peakPowerKw, v.reference.peakPowerKw)));
    const shownCruise = leaves(scene).filter((n) => n.role === 'cruise-line').map((n) => Number(n.key!.slice('cruise:'.length)));
    const lowestKw = Math.min(...result.pairings.map((q) => q.band.nominal.powerKw), ...shownCruise);
    expect(kwAt(frame.y)).toBeGreaterThan(peakKw);
    expect(kwAt(frame.y)).toBeLessThan(peakKw * 1.15);
    expect(kwAt(frame.y + frame.height)).toBeLessThan(lowestKw);
    expect(kwAt(frame.y + frame.height)).toBeGreaterThan(lowestKw * 0.8);
  });

  it('labels each point with its rpm only and shows status by marker style', () => {
    for (const q of result.pairings) {
      const key = `impeller:${q.impellerId}|engine:${q.variantId}`;
      const labelled = texts(scene).filter((t) => t.key === key);
      expect(labelled.map((t) => t.text)).toEqual([rpmText(q.band.nominal.speedRpm)]);
      const marker = leaves(scene).find((n) => n.role === 'operating-point' && n.key === key)!;
      const ring = leaves(scene).filter((n) => n.role === 'warning-ring' && n.key === key);
      const warn = isWarning(q.band.nominal.status);
      expect(ring).toHaveLength(warn ? 1 : 0);
      if (ring[0]?.type === 'circle') expect(ring[0].stroke?.colour).toBe(WARN);
      expect(marker.type !== 'group' && marker.type !== 'text' && marker.fill?.colour === PAPER_WHITE).toBe(warn);
    }
  });

  it('keeps marks inside the safe area, text apart, and type at 10 pt or more on A3', () => {
    for (const n of leaves(scene)) {
      const box = markBox(n);
      if (box) expect(boxInside(box, scene.safeBox, 0.01), `${n.role}`).toBe(true);
    }
    const boxes = texts(scene).map((t) => ({ t, box: markBox(t)! }));
    for (let i = 0; i < boxes.length; i++) {
      expect(boxes[i].t.sizePt, boxes[i].t.text).toBeGreaterThanOrEqual(10);
      for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i].box, boxes[j].box, -0.01), `"${boxes[i].t.text}" / "${boxes[j].t.text}"`).toBe(false);
    }
  });

  it('tabulates one row per impeller with a WOT band and a status per variant, warnings bold and coloured', () => {
    const groups = texts(scene).filter((t) => t.role === 'table-group-header').map((t) => t.text);
    expect(groups).toHaveLength(f.variants.length);
    const cells = texts(scene).filter((t) => t.role === 'table-cell');
    expect(cells).toHaveLength(jet.impellers.length * (1 + 2 * f.variants.length));
    for (const c of cells.filter((t) => /over-revs|lugs/.test(t.text))) {
      expect(c.weight).toBe('bold');
      expect(c.colour).toBe(WARN);
    }
    expect(cells.filter((t) => /over-revs|lugs/.test(t.text))).toHaveLength(result.pairings.filter((q) => q.band.nominal.status === 'revLimited' || q.band.nominal.status === 'belowWindow').length);
  });
});

describe('wallChartScene() layout and wording', () => {
  it('wraps a fourth variant to a second row with plots as wide as the first row’s', () => {
    const scene = sheetScene({ ...baseRequest }, { ...ctx, project: withFamily(fourFamily) });
    const frames = panels(scene).map((g) => markBox(leaves(only(scene, g)).find((n) => n.role === 'plot-frame')!)!);
    expect(frames[3].y).toBeGreaterThan(frames[0].y + frames[0].height);
    expect(frames[3].x).toBeCloseTo(frames[0].x, 9);
    for (const fr of frames) expect(fr.width).toBeCloseTo(frames[0].width, 9);
  });

  it('states the conditions it was drawn for, and which pairing boats have that drive line', () => {
    const scene = sheetScene(baseRequest, ctx);
    const all = texts(scene).map((t) => t.text).join(' ');
    expect(all).toContain('Drive line: direct drive, 97 % efficient (as fitted in Gannet).');
    expect(all).toContain('Water: fresh, 999 kg/m³.');
    expect(texts(scene).find((t) => t.role === 'sheet-subtitle')!.text).toContain('direct drive, 97 % drive line, fresh water 999 kg/m³');
  });

  it('names each impeller once per panel', () => {
    const scene = sheetScene(baseRequest, ctx);
    for (const g of panels(scene)) {
      const names = texts(only(scene, g)).filter((t) => t.key?.startsWith('impeller-label:')).map((t) => t.text).sort();
      expect(names).toEqual(jet.impellers.map((i) => i.label).sort());
    }
  });
});
