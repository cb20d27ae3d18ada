/**
 * The match chart: impeller absorption curves with tolerance bands, engine full-throttle curves, the
 * recommended WOT window, the rev limit, constant-power cruise lines and the WOT operating points, each
 * directly labelled. Shared by the wall chart (everything) and the boat sheets (smaller).
 */
import type { Box, SceneNode } from '../../scene/types.ts';
import type { PowerUnit } from '../../data/types.ts';
import type { EngineCurve } from '../../model/index.ts';
import { chartArea, chartAxes, chartGrid } from '../kit/axes.ts';
import { hermitePath, polylinePath, powerLawPoints, powerLawVisibleRpm, type PowerLaw } from '../kit/curves.ts';
import { placeLabels, type LabelRequest, type PlacedLabels } from '../kit/labels.ts';
import { marker, markerBox } from '../kit/markers.ts';
import { plotScales, type PlotScales } from '../kit/scales.ts';
import { INK, INK_SOFT, PAPER_WHITE, STROKE, WARN, WINDOW_FILL, stroke, type SeriesStyle } from '../kit/style.ts';
import { bandArea } from './bandArea.ts';

export interface ImpellerSeries {
  readonly id: string;
  readonly label: string;
  readonly law: PowerLaw;
  /** Rating tolerance as a fraction (0.05 = ±5 %). */
  readonly tolerance: number;
  readonly style: SeriesStyle;
}

export interface EngineSeries {
  readonly id: string;
  readonly label: string;
  readonly site: EngineCurve;
  /** The published curve, drawn thin and dashed when it differs from the site curve. */
  readonly reference?: EngineCurve;
  readonly referenceLabel?: string;
  /** Line width (mm); variants differ by weight as well as label. */
  readonly widthMm: number;
  readonly dashMm: readonly number[];
}

export interface ChartPoint {
  readonly key: string;
  readonly impellerId: string;
  /** Filled markers for the first variant, open for others. */
  readonly filled: boolean;
  readonly speedRpm: number;
  readonly powerKw: number;
  readonly text: string;
  readonly warn: boolean;
}

export interface MatchChartArgs {
  readonly box: Box;
  readonly sizePt: number;
  readonly powerUnitFirst: PowerUnit;
  readonly rpmDomain: readonly [number, number];
  readonly powerKwDomain: readonly [number, number];
  readonly impellers: readonly ImpellerSeries[];
  readonly engines: readonly EngineSeries[];
  readonly points: readonly ChartPoint[];
  readonly window: { readonly lowRpm: number; readonly highRpm: number };
  readonly maxRpm: number;
  readonly cruise: readonly { readonly powerKw: number; readonly text: string; readonly crossings: readonly { readonly impellerId: string; readonly speedRpm: number }[] }[];
  readonly markerMm: number;
  readonly where: string;
}

export interface MatchChart {
  readonly node: SceneNode;
  readonly scales: PlotScales;
  readonly notes: PlacedLabels['notes'];
}

const line = (x0: number, y0: number, x1: number, y1: number) => [
  { op: 'M' as const, x: x0, y: y0 },
  { op: 'L' as const, x: x1, y: y1 },
];

/** Lays out a match chart in a box (mm). */
export function matchChart(args: MatchChartArgs): MatchChart {
  const area = chartArea(args.box, args.sizePt);
  const scales = plotScales({ area, rpmDomain: args.rpmDomain, powerKwDomain: args.powerKwDomain, powerUnitFirst: args.powerUnitFirst });
  const top = area.y;
  const bottom = area.y + area.height;
  const under: SceneNode[] = [chartGrid(scales)];
  const data: SceneNode[] = [];
  const labels: LabelRequest[] = [];
  // Window and rev-limit names sit in the strip above the plot, clear of the data.
  const topLabels: LabelRequest[] = [];
  const obstacles: Box[] = [];
  const sizePt = args.sizePt;

  const wx0 = scales.x(Math.max(args.window.lowRpm, scales.x.domain()[0]));
  const wx1 = scales.x(Math.min(args.window.highRpm, scales.x.domain()[1]));
  if (wx1 > wx0) {
    under.push({ type: 'rect', role: 'wot-window', x: wx0, y: top, width: wx1 - wx0, height: area.height, fill: { colour: WINDOW_FILL, opacity: 0.14 } });
    for (const x of [wx0, wx1]) under.push({ type: 'path', role: 'wot-window-edge', segments: line(x, top, x, bottom), stroke: stroke(WINDOW_FILL, STROKE.rule, [2, 1]) });
    topLabels.push({ key: 'window', x: (wx0 + wx1) / 2, y: top, text: 'WOT window', sizePt, weight: 'bold', prefer: [[0, -1], [-1, -1], [1, -1]] });
  }

  for (const imp of args.impellers) {
    const lower = { coefficient: imp.law.coefficient * (1 - imp.tolerance), exponent: imp.law.exponent };
    const upper = { coefficient: imp.law.coefficient * (1 + imp.tolerance), exponent: imp.law.exponent };
    const band = bandArea(lower, upper, scales);
    if (band) under.push({ type: 'path', role: 'tolerance-band', key: `impeller:${imp.id}`, segments: band, fill: { colour: imp.style.colour, opacity: 0.13 } });
    const range = powerLawVisibleRpm(imp.law, scales);
    if (!range) continue;
    const pts = powerLawPoints(imp.law, scales, range);
    data.push({ type: 'path', role: 'absorption-curve', key: `impeller:${imp.id}`, segments: polylinePath(pts), stroke: { ...stroke(imp.style.colour, STROKE.series, imp.style.dashMm), join: 'round' } });
    const end = pts[pts.length - 1];
    labels.push({ key: `impeller-label:${imp.id}`, x: end.x, y: end.y, text: imp.label, sizePt, weight: 'bold', prefer: [[-1, 1], [1, 1], [-1, 0]] });
  }

  for (const eng of args.engines) {
    if (eng.reference) {
      data.push({ type: 'path', role: 'engine-curve-reference', key: `engine:${eng.id}`, segments: hermitePath(eng.reference.pieces, scales), stroke: stroke(INK_SOFT, STROKE.rule, [3, 1.2]) });
      const [rLo, rHi] = scales.x.domain();
      const rAt = Math.min(Math.max(rLo + 0.06 * (rHi - rLo), eng.reference.minRpm), eng.reference.maxRpm);
      const rY = scales.y(eng.reference.powerKwUnchecked(rAt));
      if (eng.referenceLabel && rY >= top && rY <= bottom) labels.push({ key: `engine-reference-label:${eng.id}`, x: scales.x(rAt), y: rY, text: eng.referenceLabel, sizePt, prefer: [[1, -1], [0, -1], [1, 1]] });
    }
    const segs = hermitePath(eng.site.pieces, scales);
    data.push({ type: 'path', role: 'engine-curve', key: `engine:${eng.id}`, segments: segs, stroke: { ...stroke(INK, eng.widthMm, eng.dashMm), join: 'round' } });
    // Named where the curve enters the plot at the left: variants' curves are furthest from the crowd of
    // WOT points there, and the label sits just above its own curve.
    const [xLo] = scales.x.domain();
    const at = Math.min(Math.max(xLo, eng.site.minRpm), eng.site.maxRpm);
    const y = scales.y(eng.site.powerKwUnchecked(at));
    if (segs.length > 0 && y >= top && y <= bottom) labels.push({ key: `engine-label:${eng.id}`, x: scales.x(at) + 1, y, text: eng.label, sizePt, weight: 'bold', prefer: [[1, -1], [1, 1]] });
  }

  const maxX = scales.x(args.maxRpm);
  if (maxX <= area.x + area.width) {
    data.push({ type: 'path', role: 'rev-limit', segments: line(maxX, top, maxX, bottom), stroke: stroke(WARN, STROKE.engine, [4, 1.5]) });
    topLabels.push({ key: 'rev-limit', x: maxX, y: top, text: `Max ${Math.round(args.maxRpm)} rpm`, sizePt, weight: 'bold', prefer: [[0, -1], [1, -1], [-1, -1]] });
  }

  for (const c of args.cruise) {
    const y = scales.y(c.powerKw);
    if (y < top || y > bottom) continue;
    data.push({ type: 'path', role: 'cruise-line', key: `cruise:${c.powerKw}`, segments: line(area.x, y, area.x + area.width, y), stroke: stroke(INK_SOFT, STROKE.rule, [0.8, 1.2]) });
    labels.push({ key: `cruise-label:${c.powerKw}`, x: area.x + 0.5, y, text: c.text, sizePt, prefer: [[1, -1], [1, 1]] });
    for (const cross of c.crossings) {
      const x = scales.x(cross.speedRpm);
      if (x < area.x || x > area.x + area.width) continue;
      data.push({ type: 'circle', role: 'cruise-crossing', key: `cruise:${c.powerKw}|impeller:${cross.impellerId}`, cx: x, cy: y, r: 0.8, fill: { colour: PAPER_WHITE }, stroke: stroke(INK, STROKE.rule) });
      obstacles.push(markerBox(x, y, 1.6));
    }
  }

  const pointLabels: LabelRequest[] = [];
  for (const p of args.points) {
    const imp = args.impellers.find((i) => i.id === p.impellerId);
    if (!imp) continue;
    const cx = scales.x(p.speedRpm);
    const cy = scales.y(p.powerKw);
    data.push(marker({ shape: imp.style.marker, cx, cy, sizeMm: args.markerMm, colour: p.warn ? WARN : INK, fill: p.filled ? imp.style.colour : PAPER_WHITE, role: 'operating-point', key: p.key }));
    obstacles.push(markerBox(cx, cy, args.markerMm));
    pointLabels.push({ key: p.key, x: cx, y: cy, text: p.text, sizePt, weight: p.warn ? 'bold' : 'regular', colour: p.warn ? WARN : INK, prefer: [[-1, -1], [1, 1]] });
  }

  const bounds = { x: area.x + 0.4, y: area.y + 0.4, width: area.width - 0.8, height: area.height - 0.8 };
  const placed = placeLabels([...pointLabels, ...labels], { bounds, obstacles, where: args.where });
  const strip = { x: area.x, y: args.box.y, width: area.width, height: area.y - args.box.y };
  const placedTop = placeLabels(topLabels, { bounds: strip, obstacles: [], where: args.where });
  const node: SceneNode = {
    type: 'group',
    role: 'match-chart',
    children: [...under, ...data, chartAxes(scales, { sizePt, where: args.where }), { type: 'group', role: 'chart-labels', children: [...placed.nodes, ...placedTop.nodes] }],
  };
  return { node, scales, notes: [...placed.notes, ...placedTop.notes] };
}
