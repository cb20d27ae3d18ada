/**
 * The marks a match chart is made of, one function per layer, so the boat charts and the wall-chart
 * panels draw impellers, engine curves, the WOT window, the rev limit and cruise lines the same way.
 * Each returns scene nodes in mm from the chart's scales; placing words is left to the caller.
 */
import type { Box, SceneNode } from '../../scene/types.ts';
import { hermitePath, polylinePath, powerLawPoints, powerLawVisibleRpm } from '../kit/curves.ts';
import { markerBox } from '../kit/markers.ts';
import type { PlotScales } from '../kit/scales.ts';
import { INK, INK_SOFT, PAPER_WHITE, STROKE, WINDOW_EDGE, WINDOW_FILL, WINDOW_OPACITY, stroke } from '../kit/style.ts';
import { limitLine } from '../kit/warningMarks.ts';
import { bandArea } from './bandArea.ts';
import type { EngineSeries, ImpellerSeries } from './seriesTypes.ts';

/** A straight line from (x0, y0) to (x1, y1), mm. */
export const line = (x0: number, y0: number, x1: number, y1: number) => [
  { op: 'M' as const, x: x0, y: y0 },
  { op: 'L' as const, x: x1, y: y1 },
];

/** The recommended WOT window as the one green band, with solid edges, or nothing when it is off the chart. */
export function windowBand(scales: PlotScales, window: { readonly lowRpm: number; readonly highRpm: number }): { nodes: SceneNode[]; x0: number; x1: number } | null {
  const { area } = scales;
  const x0 = scales.x(Math.max(window.lowRpm, scales.x.domain()[0]));
  const x1 = scales.x(Math.min(window.highRpm, scales.x.domain()[1]));
  if (!(x1 > x0)) return null;
  const bottom = area.y + area.height;
  const nodes: SceneNode[] = [{ type: 'rect', role: 'wot-window', x: x0, y: area.y, width: x1 - x0, height: area.height, fill: { colour: WINDOW_FILL, opacity: WINDOW_OPACITY } }];
  for (const x of [x0, x1]) nodes.push({ type: 'path', role: 'wot-window-edge', segments: line(x, area.y, x, bottom), stroke: stroke(WINDOW_EDGE, STROKE.rule) });
  return { nodes, x0, x1 };
}

/** Every impeller's tolerance band and absorption curve, and where each curve leaves the plot (mm). */
export function impellerLayers(scales: PlotScales, impellers: readonly ImpellerSeries[]): { bands: SceneNode[]; curves: SceneNode[]; ends: { id: string; label: string; x: number; y: number }[] } {
  const bands: SceneNode[] = [];
  const curves: SceneNode[] = [];
  const ends: { id: string; label: string; x: number; y: number }[] = [];
  for (const imp of impellers) {
    const lower = { coefficient: imp.law.coefficient * (1 - imp.tolerance), exponent: imp.law.exponent };
    const upper = { coefficient: imp.law.coefficient * (1 + imp.tolerance), exponent: imp.law.exponent };
    const band = bandArea(lower, upper, scales);
    if (band) bands.push({ type: 'path', role: 'tolerance-band', key: `impeller:${imp.id}`, segments: band, fill: { colour: imp.style.colour, opacity: 0.13 } });
    const range = powerLawVisibleRpm(imp.law, scales);
    if (!range) continue;
    const pts = powerLawPoints(imp.law, scales, range);
    curves.push({ type: 'path', role: 'absorption-curve', key: `impeller:${imp.id}`, segments: polylinePath(pts), stroke: { ...stroke(imp.style.colour, STROKE.series, imp.style.dashMm), join: 'round' } });
    const end = pts[pts.length - 1];
    ends.push({ id: imp.id, label: imp.label, x: end.x, y: end.y });
  }
  return { bands, curves, ends };
}

/** An engine's full-throttle curve at site (heavy) and, where it differs, as published (thin, dashed). */
export function engineLayers(scales: PlotScales, eng: EngineSeries): { reference: SceneNode | null; site: SceneNode; siteSegments: number } {
  const reference: SceneNode | null = eng.reference
    ? { type: 'path', role: 'engine-curve-reference', key: `engine:${eng.id}`, segments: hermitePath(eng.reference.pieces, scales), stroke: stroke(INK_SOFT, STROKE.rule, [3, 1.2]) }
    : null;
  const segments = hermitePath(eng.site.pieces, scales);
  const site: SceneNode = { type: 'path', role: 'engine-curve', key: `engine:${eng.id}`, segments, stroke: { ...stroke(INK, eng.widthMm, eng.dashMm), join: 'round' } };
  return { reference, site, siteSegments: segments.length };
}

/** The maximum engine speed as the hatched limit line (solid ink, hatch past it), or null when it is right of the chart. */
export function revLimitLine(scales: PlotScales, maxRpm: number): { node: SceneNode; x: number } | null {
  const { area } = scales;
  const x = scales.x(maxRpm);
  const right = area.x + area.width;
  if (x > right) return null;
  return { node: { type: 'group', role: 'rev-limit-line', children: limitLine({ x, y0: area.y, y1: area.y + area.height, depthMm: Math.min(1.6, right - x), widthMm: STROKE.series, role: 'rev-limit' }) }, x };
}

/** A constant-power cruise line across the plot with an open circle where each impeller needs that power. */
export function cruiseLayer(
  scales: PlotScales,
  cruise: { readonly powerKw: number; readonly crossings: readonly { readonly impellerId: string; readonly speedRpm: number }[] },
  radiusMm: number,
): { nodes: SceneNode[]; obstacles: Box[]; y: number } | null {
  const { area } = scales;
  const y = scales.y(cruise.powerKw);
  if (y < area.y || y > area.y + area.height) return null;
  const nodes: SceneNode[] = [{ type: 'path', role: 'cruise-line', key: `cruise:${cruise.powerKw}`, segments: line(area.x, y, area.x + area.width, y), stroke: stroke(INK_SOFT, STROKE.rule, [0.8, 1.2]) }];
  const obstacles: Box[] = [];
  for (const cross of cruise.crossings) {
    const x = scales.x(cross.speedRpm);
    if (x < area.x || x > area.x + area.width) continue;
    nodes.push({ type: 'circle', role: 'cruise-crossing', key: `cruise:${cruise.powerKw}|impeller:${cross.impellerId}`, cx: x, cy: y, r: radiusMm, fill: { colour: PAPER_WHITE }, stroke: stroke(INK, STROKE.rule) });
    obstacles.push(markerBox(x, y, 2 * radiusMm));
  }
  return { nodes, obstacles, y };
}

/** The points whose impeller is on the chart, with that impeller's series and the point's place (mm). */
export function pointsOnChart<P extends { readonly impellerId: string; readonly speedRpm: number; readonly powerKw: number }>(
  scales: PlotScales,
  points: readonly P[],
  impellers: readonly ImpellerSeries[],
): { point: P; imp: ImpellerSeries; cx: number; cy: number }[] {
  return points.flatMap((point) => {
    const imp = impellers.find((i) => i.id === point.impellerId);
    return imp ? [{ point, imp, cx: scales.x(point.speedRpm), cy: scales.y(point.powerKw) }] : [];
  });
}
