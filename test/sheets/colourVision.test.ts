/**
 * Every sheet kind, seen in grey (a photocopy) and through a deuteranopia simulation, keeps its series,
 * its window and its warnings apart. Colours are converted here, in the test:
 * - sRGB to linear and relative luminance: IEC 61966-2-1 (sRGB) transfer function, ITU-R BT.709 weights;
 *   CIE L* from luminance (CIE 15); contrast ratio (L1 + 0.05) / (L2 + 0.05) as defined in WCAG 2.x.
 * - Deuteranopia: the severity-1.0 matrix of G. M. Machado, M. M. Oliveira and L. A. F. Fernandes,
 *   "A Physiologically-based Model for Simulation of Color Vision Deficiency", IEEE TVCG 15(6), 2009,
 *   applied to linear RGB (values confirmed against a public transcription of the paper's table).
 * - Colour differences: CIE 1976 ΔE*ab (D65 white).
 * The thresholds are ours (common practice, no source): 10 L* between neighbouring series in grey, every
 * series 10 L* darker than the grid, 12 ΔE between neighbouring series under deuteranopia, 5 L* between
 * the window and any tolerance band in grey, 4.5:1 for warning words.
 */
import { describe, expect, it } from 'vitest';
import type { SheetRequest } from '../../src/data/types.ts';
import type { Colour, SceneNode } from '../../src/scene/types.ts';
import { defaultWallCharts } from '../../src/analysis/index.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { GRID, ON_WARN, SERIES_COLOURS, WARN } from '../../src/sheets/kit/style.ts';
import { boat, project } from './fixtures/demoProject.ts';
import { leaves } from './sceneWalk.ts';

const DEUTERANOPIA = [
  [0.367322, 0.860646, -0.227968],
  [0.280085, 0.672501, 0.047413],
  [-0.01182, 0.04294, 0.968881],
];

const toLinear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
const linear = (hex: Colour, opacity = 1): number[] =>
  [1, 3, 5].map((i) => {
    // Composited over white paper in sRGB, as the renderers blend.
    const c = (parseInt(hex.slice(i, i + 2), 16) / 255) * opacity + (1 - opacity);
    return toLinear(c);
  });
const luminance = (l: readonly number[]) => 0.2126 * l[0] + 0.7152 * l[1] + 0.0722 * l[2];
const lightness = (y: number) => (y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y);
const contrast = (a: number, b: number) => (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05);
const deut = (l: readonly number[]) => DEUTERANOPIA.map((r) => Math.min(1, Math.max(0, r[0] * l[0] + r[1] * l[1] + r[2] * l[2])));
function lab(l: readonly number[]): number[] {
  const X = 0.4124 * l[0] + 0.3576 * l[1] + 0.1805 * l[2];
  const Y = 0.2126 * l[0] + 0.7152 * l[1] + 0.0722 * l[2];
  const Z = 0.0193 * l[0] + 0.1192 * l[1] + 0.9505 * l[2];
  const f = (t: number) => (t > 216 / 24389 ? Math.cbrt(t) : ((24389 / 27) * t + 16) / 116);
  const [fx, fy, fz] = [f(X / 0.95047), f(Y), f(Z / 1.08883)];
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}
const deltaE = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
const greyL = (hex: Colour, opacity = 1) => lightness(luminance(linear(hex, opacity)));

describe('colour conversions used below', () => {
  it('match published reference values', () => {
    // sRGB white and black: L* 100 and 0; mid grey #777777 has contrast 4.48:1 on white (WCAG 2 worked examples, from memory).
    expect(greyL('#ffffff')).toBeCloseTo(100, 6);
    expect(greyL('#000000')).toBeCloseTo(0, 6);
    expect(contrast(luminance(linear('#777777')), 1)).toBeCloseTo(4.48, 2);
    // Machado 2009: each row of a CVD matrix sums to 1, so greys stay grey.
    for (const row of DEUTERANOPIA) expect(row[0] + row[1] + row[2]).toBeCloseTo(1, 5);
  });
});

const wall = defaultWallCharts(project)[0] as Extract<SheetRequest, { kind: 'wallChart' }>;
const A4 = { size: 'A4', orientation: 'portrait', bleedMm: 0 } as const;
const requests: [string, SheetRequest][] = [
  ['wall chart', wall],
  ['spec sheet', { kind: 'specSheet', boatId: boat.id, paper: A4 }],
  ['upgrade sheet', { kind: 'upgradeSheet', boatId: boat.id, paper: A4 }],
  ['console card', { kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'portrait', bleedMm: 0 } }],
];

/** Roles that may use the warning colour: the reserved marks and warning words. */
const WARNING_ROLES = new Set(['warning-box', 'operating-point', 'legend-marker', 'cautions-bar', 'caution-bar', 'warning-bar', 'leader']);

const paints = (n: SceneNode): Colour[] => (n.type === 'group' ? [] : n.type === 'text' ? [n.colour] : [n.stroke?.colour, n.fill?.colour].filter((c): c is Colour => Boolean(c)));

describe.each(requests)('the %s in grey and under deuteranopia', (_name, request) => {
  const scene = sheetScene(request, { project, dateIso: '2026-11-02' });
  const all = leaves(scene);
  const curves = all.filter((n) => n.role === 'absorption-curve' && n.type === 'path');
  const series = curves.map((n) => (n.type === 'path' ? n.stroke!.colour : ''));

  it('uses the warning colour only for warnings: the reserved marks and bold warning words', () => {
    for (const n of all) {
      if (!paints(n).some((c) => c.toLowerCase() === WARN.toLowerCase())) continue;
      if (n.type === 'text') expect(n.weight, n.text).toBe('bold');
      else expect(WARNING_ROLES.has(n.role ?? ''), n.role).toBe(true);
    }
    for (const c of series) expect(deltaE(lab(linear(c)), lab(linear(WARN))), c).toBeGreaterThan(25);
  });

  it('keeps warning words at 4.5:1 or more in grey, as plain bold text or white on the warning box', () => {
    for (const n of all) {
      if (n.type !== 'text') continue;
      const onBox = n.colour === ON_WARN && all.some((b) => b.type === 'rect' && b.role === 'warning-box' && b.key === n.key && n.key !== undefined);
      if (onBox) expect(contrast(luminance(linear(n.colour)), luminance(linear(WARN)))).toBeGreaterThanOrEqual(4.5);
      else if (n.colour.toLowerCase() === WARN.toLowerCase()) expect(contrast(luminance(linear(n.colour)), 1)).toBeGreaterThanOrEqual(4.5);
    }
  });

  it('draws every series darker in grey than the grid, neighbours apart in grey and under deuteranopia', () => {
    const gridL = greyL(GRID);
    for (const c of series) expect(greyL(c), c).toBeLessThanOrEqual(gridL - 10);
    for (let i = 1; i < series.length; i++) {
      const [a, b] = [series[i - 1], series[i]];
      expect(Math.abs(greyL(a) - greyL(b)), `${a} / ${b}`).toBeGreaterThanOrEqual(10);
      expect(deltaE(lab(deut(linear(a))), lab(deut(linear(b)))), `${a} / ${b}`).toBeGreaterThanOrEqual(12);
    }
  });

  it('makes the WOT window the one band of its grey, with solid edges', () => {
    const windows = all.filter((n) => n.role === 'wot-window' && n.type === 'rect');
    const bands = all.filter((n) => n.role === 'tolerance-band');
    for (const w of windows) {
      if (w.type !== 'rect') continue;
      for (const b of bands) {
        if (b.type !== 'path' || !b.fill) continue;
        expect(Math.abs(greyL(w.fill!.colour, w.fill!.opacity) - greyL(b.fill.colour, b.fill.opacity)), b.fill.colour).toBeGreaterThanOrEqual(5);
      }
    }
    for (const e of all.filter((n) => n.role === 'wot-window-edge')) expect(e.type === 'path' && (e.stroke?.dashMm ?? []).length).toBe(0);
  });
});

describe('the series palette', () => {
  it('has neighbours apart in grey and under deuteranopia around the whole cycle', () => {
    const n = SERIES_COLOURS.length;
    for (let i = 0; i < n; i++) {
      const [a, b] = [SERIES_COLOURS[i], SERIES_COLOURS[(i + 1) % n]];
      expect(Math.abs(greyL(a) - greyL(b)), `${a} / ${b}`).toBeGreaterThanOrEqual(10);
      expect(deltaE(lab(deut(linear(a))), lab(deut(linear(b)))), `${a} / ${b}`).toBeGreaterThanOrEqual(12);
    }
  });
});

describe("the console card's warning at the helm", () => {
  // Each impeller of the demo jet fitted in turn: those whose fit warns print the warning in bold black
  // beside a bar of the warning colour, so the words keep their contrast in grey and any colour vision.
  const cards = boat.jet.impellers.map((imp) => {
    const fitted = { ...boat, impellerId: imp.id };
    const scene = sheetScene({ kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'landscape', bleedMm: 0 } }, { project: { ...project, boats: [fitted] }, dateIso: '2026-11-02' });
    return { id: imp.id, all: leaves(scene) };
  });
  const warned = cards.filter((c) => c.all.some((n) => n.role === 'wot-warning'));

  it('is raised for an impeller whose range leaves the window, and not when the range sits inside it', () => {
    expect(warned.map((c) => c.id)).toEqual(['a', 'b', 'c', 'd', 'e']);
    // The same boat with a window wide enough for impeller b's whole range (about 4750–5080 rpm): no warning, no bar.
    const wide = { ...boat, engine: { ...boat.engine, limits: { ...boat.engine.limits, windowLowRpm: 4600, windowHighRpm: 5300, maxRpm: 5600 } } };
    const calm = leaves(sheetScene({ kind: 'consoleCard', boatId: boat.id, paper: { size: 'A6', orientation: 'landscape', bleedMm: 0 } }, { project: { ...project, boats: [wide] }, dateIso: '2026-11-02' }));
    expect(calm.some((n) => n.role === 'wot-warning' || n.role === 'warning-bar')).toBe(false);
  });

  it('is bold black words (at least 4.5:1 on white in grey and under deuteranopia) beside a warning bar as tall as they are', () => {
    for (const { id, all } of warned) {
      const words = all.filter((n) => n.type === 'text' && n.role === 'wot-warning');
      const bar = all.find((n) => n.type === 'rect' && n.role === 'warning-bar');
      expect(bar, id).toBeDefined();
      for (const w of words) {
        if (w.type !== 'text') continue;
        expect(w.weight).toBe('bold');
        expect(contrast(luminance(linear(w.colour)), 1), id).toBeGreaterThanOrEqual(4.5);
        expect(contrast(luminance(deut(linear(w.colour))), 1), id).toBeGreaterThanOrEqual(4.5);
        if (bar?.type === 'rect') {
          expect(bar.fill?.colour).toBe(WARN);
          expect(w.x).toBeGreaterThan(bar.x + bar.width);
          expect(w.y).toBeGreaterThan(bar.y);
          expect(w.y).toBeLessThan(bar.y + bar.height);
        }
      }
    }
  });
});
