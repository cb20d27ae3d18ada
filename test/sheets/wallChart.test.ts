import { describe, expect, it } from 'vitest';
import type { EngineFamily, EngineVariant, Project, SheetRequest } from '../../src/data/types.ts';
import type { Scene, SceneNode } from '../../src/scene/types.ts';
import { analyseWallChart, chartInstallation, defaultWallCharts, isWarning } from '../../src/analysis/index.ts';
import { solveInstallation } from '../../src/model/index.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { boxesOverlap, boxInside } from '../../src/sheets/kit/boxes.ts';
import { rpmText } from '../../src/sheets/kit/format.ts';
import { ON_WARN, WARN } from '../../src/sheets/kit/style.ts';
import { LADDER_WORDS, ladderRpmRange } from '../../src/sheets/wallChart/ladder.ts';
import { family, jet, project } from './fixtures/demoProject.ts';
import { leaves, markBox, texts } from './sceneWalk.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;
const ctx = { project, dateIso: '2026-11-02' };
const baseRequest = defaultWallCharts(project)[0] as WallChartRequest;

/** A variant of the invented family with its own power scale and limits (demo data). */
function variant(base: EngineVariant, variantId: string, label: string, scale: number, limits: EngineVariant['limits']): EngineVariant {
  if (base.curve.kind !== 'table') throw new Error('fixture expects a table curve');
  return { ...base, id: `quaymoth-skipper/${variantId}`, variantId, label, limits, curve: { kind: 'table', points: base.curve.points.map((p) => ({ ...p, powerKw: p.powerKw * scale })) } };
}

const [standardTune, upratedTune] = family.variants;
// Invented: the sport tune revs further (window 5000–5400, max 5600) and so gets its own window and line.
const sportTune = variant(standardTune, 'sport', 'Skipper sport', 1.38, { idleRpm: 750, windowLowRpm: 5000, windowHighRpm: 5400, maxRpm: 5600 });
const threeFamily: EngineFamily = { ...family, variants: [standardTune, upratedTune, sportTune] };
const fourFamily: EngineFamily = { ...family, variants: [standardTune, upratedTune, sportTune, variant(standardTune, 'eco', 'Skipper eco', 0.86, standardTune.limits)] };
const withFamily = (f: EngineFamily): Project => ({ ...project, engines: [f], boats: project.boats.map((b) => ({ ...b, engine: f.variants[0] })) });

/** Leaves of the scene with a role and key. */
const byRole = (scene: Scene, role: string) => leaves(scene).filter((n) => n.role === role);
/** Centre x (mm) of a mark. */
const midX = (n: SceneNode) => {
  const b = markBox(n)!;
  return b.x + b.width / 2;
};

describe.each([
  ['two variants (demo fixture)', family],
  ['three variants with different limits', threeFamily],
  ['four variants (wraps to a second row)', fourFamily],
])('wallChartScene() with %s', (_name, f) => {
  const p = withFamily(f);
  const request: WallChartRequest = { ...baseRequest, engineFamilyId: f.id };
  const scene = sheetScene(request, { ...ctx, project: p });
  const result = analyseWallChart({ family: f, jet, conditions: request.conditions });

  it('draws one ladder row per impeller, lightest first, and one column per variant', () => {
    const rows = texts(scene).filter((t) => t.role === 'ladder-impeller');
    const lightestFirst = [...jet.impellers].sort((a, b) => a.ratingKw - b.ratingKw);
    expect(rows.map((t) => t.key)).toEqual(lightestFirst.map((i) => `impeller:${i.id}`));
    for (let i = 1; i < rows.length; i++) expect(rows[i].y).toBeGreaterThan(rows[i - 1].y);
    const cells = texts(scene).filter((t) => t.role === 'ladder-rpm');
    expect(cells).toHaveLength(jet.impellers.length * f.variants.length);
  });

  it('prints each predicted WOT rpm in bold 14 pt or more and its status word in 12 pt or more, a warning in the warning box', () => {
    // Issue 13: read at 1.5 m on A3 (common practice, no source: 14 pt headline figures, 12 pt status words).
    for (const q of result.pairings) {
      const key = `impeller:${q.impellerId}|engine:${q.variantId}`;
      const figure = texts(scene).find((t) => t.role === 'ladder-rpm' && t.key === key)!;
      expect(figure.text).toBe(rpmText(q.band.nominal.speedRpm));
      expect(figure.sizePt).toBeGreaterThanOrEqual(14);
      expect(figure.weight).toBe('bold');
      const word = texts(scene).find((t) => t.role === 'ladder-status' && t.key === key)!;
      expect(word.text).toBe(LADDER_WORDS[q.band.nominal.status]);
      expect(word.sizePt).toBeGreaterThanOrEqual(12);
      const box = leaves(scene).find((n) => n.role === 'warning-box' && n.key === key);
      expect(Boolean(box)).toBe(isWarning(q.band.nominal.status));
      if (box && box.type === 'rect') {
        expect(box.fill?.colour).toBe(WARN);
        expect(word.colour).toBe(ON_WARN);
        expect(word.weight).toBe('bold');
      }
    }
  });

  it('places the WOT mark, its tolerance bar, the window and the stop line of each cell on one rpm scale', () => {
    const [lo, hi] = ladderRpmRange(result);
    for (const q of result.pairings) {
      const key = `impeller:${q.impellerId}|engine:${q.variantId}`;
      const v = f.variants.find((x) => x.variantId === q.variantId)!;
      const strip = markBox(byRole(scene, 'ladder-strip').find((n) => n.key === key)!)!;
      const x = (rpm: number) => strip.x + ((rpm - lo) / (hi - lo)) * strip.width;
      // The model's own operating point for this pairing, solved again here.
      const impeller = jet.impellers.find((i) => i.id === q.impellerId)!;
      const op = solveInstallation(chartInstallation({ variant: v, jet, impeller, conditions: request.conditions }));
      expect(Math.abs(midX(byRole(scene, 'operating-point').find((n) => n.key === key && n.type !== 'text')!) - x(op.speedRpm))).toBeLessThan(0.35);
      const bar = markBox(byRole(scene, 'tolerance-bar').find((n) => n.key === key)!)!;
      expect(bar.x).toBeCloseTo(x(q.band.low.speedRpm), 6);
      expect(bar.x + bar.width).toBeCloseTo(x(q.band.high.speedRpm), 6);
      const win = markBox(byRole(scene, 'wot-window').find((n) => n.key === key)!)!;
      expect(win.x).toBeCloseTo(x(v.limits.windowLowRpm), 6);
      expect(win.x + win.width).toBeCloseTo(x(v.limits.windowHighRpm), 6);
      expect(markBox(byRole(scene, 'rev-limit').find((n) => n.key === key)!)!.x).toBeCloseTo(x(v.limits.maxRpm), 6);
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

});

describe('wallChartScene() layout and wording', () => {
  it('states the conditions it was drawn for, and which pairing boats have that drive line', () => {
    const scene = sheetScene(baseRequest, ctx);
    const all = texts(scene).map((t) => t.text).join(' ');
    expect(all).toContain('Drive line: direct drive, 97 % efficient (as fitted in Gannet).');
    expect(all).toContain('Water: fresh, 999 kg/m³.');
    expect(texts(scene).find((t) => t.role === 'sheet-subtitle')!.text).toContain('direct drive, 97 % drive line, fresh water 999 kg/m³');
  });

  it('draws a power panel in one unit with a conversion note, every impeller curve named once', () => {
    const scene = sheetScene(baseRequest, ctx);
    const panel = leaves(scene).filter((n) => n.role === 'absorption-curve');
    expect(panel.map((n) => n.key)).toEqual(jet.impellers.map((i) => `impeller:${i.id}`));
    const names = texts(scene).filter((t) => t.key?.startsWith('impeller-label:')).map((t) => t.text).sort();
    expect(names).toEqual(jet.impellers.map((i) => i.label).sort());
    expect(texts(scene).find((t) => t.role === 'unit-note')!.text).toBe('Power in kW · 1 kW = 1.341 hp');
    expect(texts(scene).filter((t) => t.role === 'tick-label-right')).toHaveLength(0);
  });
});
