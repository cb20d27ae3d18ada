/**
 * The match chart: impeller absorption curves with tolerance bands, engine full-throttle curves, the
 * recommended WOT window, the rev limit, constant-power cruise lines and the WOT operating points, each
 * directly labelled. Shared by the wall chart (everything) and the boat sheets (smaller).
 */
import type { Box, SceneNode } from '../../scene/types.ts';
import type { PowerUnit } from '../../data/types.ts';
import { chartArea, chartAxes, chartGrid } from '../kit/axes.ts';
import { placeLabels, type LabelMark, type LabelRequest, type PlacedLabels } from '../kit/labels.ts';
import { marker, markerBox } from '../kit/markers.ts';
import { plotScales, type PlotScales } from '../kit/scales.ts';
import { INK, PAPER_WHITE, STROKE, WARN, stroke } from '../kit/style.ts';
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
  /** The WOT band's ends (rpm, kW): their rpm range is drawn as a tolerance bar through the point. */
  readonly band?: { readonly low: { readonly speedRpm: number; readonly powerKw: number }; readonly high: { readonly speedRpm: number; readonly powerKw: number } };
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
  /** Clip the curves and bands to the plot (a chart cropped to the operating region). */
  readonly clipToPlot?: boolean;
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
      const ref = eng.reference;
      const rAt = leftmostInside(scales, (rpm) => ref.powerKwUnchecked(rpm), Math.max(rLo + 0.06 * (rHi - rLo), ref.minRpm), ref.maxRpm);
      if (eng.referenceLabel && rAt !== null) labels.push({ key: `engine-reference-label:${eng.id}`, x: scales.x(rAt), y: scales.y(ref.powerKwUnchecked(rAt)), text: eng.referenceLabel, sizePt, prefer: [[1, -1], [0, -1], [1, 1]] });
    }
    data.push(layers.site);
    // Named where the curve enters the plot at the left: variants' curves are furthest from the crowd of
    // WOT points there, and the label sits just above its own curve.
    const at = leftmostInside(scales, (rpm) => eng.site.powerKwUnchecked(rpm), eng.site.minRpm, eng.site.maxRpm);
    if (layers.siteSegments > 0 && at !== null) labels.push({ key: `engine-label:${eng.id}`, x: scales.x(at) + 1, y: scales.y(eng.site.powerKwUnchecked(at)), text: eng.label, sizePt, weight: 'bold', prefer: [[1, -1], [1, 1]] });
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

  const pointLabels: (LabelRequest & { marks: string[] })[] = [];
  const marks: LabelMark[] = [];
  const bars: SceneNode[] = [];
  for (const { point: p, imp, cx, cy } of pointsOnChart(scales, args.points, args.impellers)) {
    if (p.band) bars.push(toleranceBar(scales, p.band, p.powerKw, p.key));
    data.push(marker({ shape: imp.style.marker, cx, cy, sizeMm: args.markerMm, colour: INK, fill: p.warn ? WARN : p.filled ? imp.style.colour : PAPER_WHITE, role: 'operating-point', key: p.key }));
    const box = markerBox(cx, cy, args.markerMm);
    obstacles.push(box);
    marks.push({ key: p.key, x: cx, y: cy, box });
    // Points that pile up (every impeller at the rev limit) and say the same thing share one label.
    const same = pointLabels.find((l) => l.text === p.text && Math.hypot(l.x - cx, l.y - cy) < args.markerMm);
    if (same) {
      same.marks.push(p.key);
      continue;
    }
    pointLabels.push({ key: p.key, x: cx, y: cy, text: p.text, sizePt, weight: p.warn ? 'bold' : 'regular', colour: p.warn ? WARN : INK, prefer: [[-1, -1], [1, 1]], marks: [p.key] });
  }
  // Tolerance bars go under the markers.
  data.splice(data.length - marks.length, 0, ...bars);

  const bounds = { x: area.x + 0.4, y: area.y + 0.4, width: area.width - 0.8, height: area.height - 0.8 };
  const placed = placeLabels([...pointLabels, ...labels], { bounds, obstacles, where: args.where, marks });
  const strip = { x: area.x, y: args.box.y, width: area.width, height: area.y - args.box.y };
  const placedTop = placeLabels(topLabels, { bounds: strip, obstacles: [], where: args.where, numbersBefore: placed.notes.length });
  const node: SceneNode = {
    type: 'group',
    role: 'match-chart',
    children: [
      ...(args.clipToPlot ? [{ type: 'group' as const, role: 'plot-clip', clip: area, children: [...under, ...data] }] : [...under, ...data]),
      chartAxes(scales, { sizePt, where: args.where }),
      { type: 'group', role: 'chart-labels', children: [...placed.nodes, ...placedTop.nodes] },
    ],
  };
  return { node, scales, notes: [...placed.notes, ...placedTop.notes] };
}

/** A WOT band's rpm range as a horizontal bar with end ticks at the point's power: its tolerance bar (mm). */
function toleranceBar(scales: PlotScales, band: NonNullable<ChartPoint['band']>, powerKw: number, key: string): SceneNode {
  const y = scales.y(powerKw);
  const [a, b] = [scales.x(band.low.speedRpm), scales.x(band.high.speedRpm)];
  // End ticks 1.6 mm tall.
  const segments = [
    { op: 'M' as const, x: a, y },
    { op: 'L' as const, x: b, y },
    ...[a, b].flatMap((x) => [{ op: 'M' as const, x, y: y - 0.8 }, { op: 'L' as const, x, y: y + 0.8 }]),
  ];
  return { type: 'path', role: 'tolerance-bar', key, segments, stroke: stroke(INK, STROKE.rule) };
}

/** The lowest rpm in [minRpm, maxRpm] and the x domain where a curve is inside the plot (1 mm clear of its edges), or null. */
function leftmostInside(scales: PlotScales, powerKw: (rpm: number) => number, minRpm: number, maxRpm: number): number | null {
  const [lo, hi] = scales.x.domain();
  const a = Math.max(lo, minRpm);
  const b = Math.min(hi, maxRpm);
  const top = scales.area.y + 1;
  const bottom = scales.area.y + scales.area.height - 1;
  for (let i = 0; i <= 64 && b > a; i += 1) {
    const rpm = a + ((b - a) * i) / 64;
    const y = scales.y(powerKw(rpm));
    if (y >= top && y <= bottom) return rpm;
  }
  return null;
}
