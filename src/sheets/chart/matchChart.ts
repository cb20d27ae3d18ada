/**
 * The match chart: impeller absorption curves with tolerance bands, engine full-throttle curves, the
 * recommended WOT window, the rev limit, constant-power cruise lines and the WOT operating points, each
 * directly labelled. Shared by the wall chart (everything) and the boat sheets (smaller).
 */
import type { Box, SceneNode } from '../../scene/types.ts';
import type { PowerUnit } from '../../data/types.ts';
import { chartArea, chartAxes, chartGrid } from '../kit/axes.ts';
import { placeLabels, type LabelRequest, type PlacedLabels } from '../kit/labels.ts';
import { marker, markerBox } from '../kit/markers.ts';
import { plotScales, type PlotScales } from '../kit/scales.ts';
import { INK, PAPER_WHITE, WARN } from '../kit/style.ts';
import type { EngineSeries, ImpellerSeries } from './seriesTypes.ts';
import { cruiseLayer, engineLayers, impellerLayers, pointsOnChart, revLimitLine, windowBand } from './layers.ts';

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

  const window = windowBand(scales, args.window);
  if (window) {
    under.push(...window.nodes);
    topLabels.push({ key: 'window', x: (window.x0 + window.x1) / 2, y: top, text: 'WOT window', sizePt, weight: 'bold', prefer: [[0, -1], [-1, -1], [1, -1]] });
  }

  const imps = impellerLayers(scales, args.impellers);
  under.push(...imps.bands);
  data.push(...imps.curves);
  for (const end of imps.ends) labels.push({ key: `impeller-label:${end.id}`, x: end.x, y: end.y, text: end.label, sizePt, weight: 'bold', prefer: [[-1, 1], [1, 1], [-1, 0]] });

  for (const eng of args.engines) {
    const layers = engineLayers(scales, eng);
    if (eng.reference && layers.reference) {
      data.push(layers.reference);
      const [rLo, rHi] = scales.x.domain();
      const rAt = Math.min(Math.max(rLo + 0.06 * (rHi - rLo), eng.reference.minRpm), eng.reference.maxRpm);
      const rY = scales.y(eng.reference.powerKwUnchecked(rAt));
      if (eng.referenceLabel && rY >= top && rY <= bottom) labels.push({ key: `engine-reference-label:${eng.id}`, x: scales.x(rAt), y: rY, text: eng.referenceLabel, sizePt, prefer: [[1, -1], [0, -1], [1, 1]] });
    }
    data.push(layers.site);
    // Named where the curve enters the plot at the left: variants' curves are furthest from the crowd of
    // WOT points there, and the label sits just above its own curve.
    const [xLo] = scales.x.domain();
    const at = Math.min(Math.max(xLo, eng.site.minRpm), eng.site.maxRpm);
    const y = scales.y(eng.site.powerKwUnchecked(at));
    if (layers.siteSegments > 0 && y >= top && y <= bottom) labels.push({ key: `engine-label:${eng.id}`, x: scales.x(at) + 1, y, text: eng.label, sizePt, weight: 'bold', prefer: [[1, -1], [1, 1]] });
  }

  const revLimit = revLimitLine(scales, args.maxRpm);
  if (revLimit) {
    data.push(revLimit.node);
    topLabels.push({ key: 'rev-limit', x: revLimit.x, y: top, text: `Max ${Math.round(args.maxRpm)} rpm`, sizePt, weight: 'bold', prefer: [[0, -1], [1, -1], [-1, -1]] });
  }

  for (const c of args.cruise) {
    const layer = cruiseLayer(scales, c, 0.8);
    if (!layer) continue;
    data.push(...layer.nodes);
    obstacles.push(...layer.obstacles);
    labels.push({ key: `cruise-label:${c.powerKw}`, x: area.x + 0.5, y: layer.y, text: c.text, sizePt, prefer: [[1, -1], [1, 1]] });
  }

  const pointLabels: LabelRequest[] = [];
  for (const { point: p, imp, cx, cy } of pointsOnChart(scales, args.points, args.impellers)) {
    data.push(marker({ shape: imp.style.marker, cx, cy, sizeMm: args.markerMm, colour: INK, fill: p.warn ? WARN : p.filled ? imp.style.colour : PAPER_WHITE, role: 'operating-point', key: p.key }));
    obstacles.push(markerBox(cx, cy, args.markerMm));
    // Points that pile up (every impeller at the rev limit) and say the same thing share one label.
    if (pointLabels.some((l) => l.text === p.text && Math.hypot(l.x - cx, l.y - cy) < args.markerMm)) continue;
    pointLabels.push({ key: p.key, x: cx, y: cy, text: p.text, sizePt, weight: p.warn ? 'bold' : 'regular', colour: p.warn ? WARN : INK, prefer: [[-1, -1], [1, 1]] });
  }

  const bounds = { x: area.x + 0.4, y: area.y + 0.4, width: area.width - 0.8, height: area.height - 0.8 };
  const placed = placeLabels([...pointLabels, ...labels], { bounds, obstacles, where: args.where });
  const strip = { x: area.x, y: args.box.y, width: area.width, height: area.y - args.box.y };
  const placedTop = placeLabels(topLabels, { bounds: strip, obstacles: [], where: args.where, numbersBefore: placed.notes.length });
  const node: SceneNode = {
    type: 'group',
    role: 'match-chart',
    children: [...under, ...data, chartAxes(scales, { sizePt, where: args.where }), { type: 'group', role: 'chart-labels', children: [...placed.nodes, ...placedTop.nodes] }],
  };
  return { node, scales, notes: [...placed.notes, ...placedTop.notes] };
}
