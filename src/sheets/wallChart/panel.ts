/**
 * One panel of the wall chart: one engine variant against every impeller. Under its heading (variant
 * name, its WOT window and maximum speed) a row of impeller names over the curve ends, then the plot:
 * tolerance bands and absorption curves, the variant's own WOT window and rev-limit line, cruise lines
 * with their crossings, its full-throttle curve at site and as published, and the WOT points marked by
 * status and labelled with their rpm only (the results table has the rest).
 */
import type { PowerUnit } from '../../data/types.ts';
import type { LimitsResult } from '../../analysis/index.ts';
import type { Box, SceneNode } from '../../scene/types.ts';
import { cruiseLayer, engineLayers, impellerLayers, pointsOnChart, revLimitLine, windowBand } from '../chart/layers.ts';
import type { EngineSeries, ImpellerSeries } from '../chart/seriesTypes.ts';
import { chartArea, chartAxes, chartGrid, type AxisSides } from '../kit/axes.ts';
import { ascentMm, label, linePitchMm } from '../kit/block.ts';
import { edgeLabelRow, type EdgeLabel } from '../kit/edgeLabels.ts';
import { rpmText, powerText } from '../kit/format.ts';
import { placeLabels, type LabelRequest, type PlacedLabels } from '../kit/labels.ts';
import { plotScales, type PlotScales } from '../kit/scales.ts';
import { INK_SOFT } from '../kit/style.ts';
import type { PanelDomains } from './domains.ts';
import { pointMarker, pointMarkerBox } from './pointMarker.ts';

export interface PanelPoint {
  readonly key: string;
  readonly impellerId: string;
  readonly speedRpm: number;
  readonly powerKw: number;
  readonly warn: boolean;
}

export interface PanelArgs {
  readonly box: Box;
  readonly sides: AxisSides;
  readonly sizePt: number;
  readonly headingPt: number;
  readonly powerUnitFirst: PowerUnit;
  readonly domains: PanelDomains;
  readonly impellers: readonly ImpellerSeries[];
  readonly engine: EngineSeries;
  readonly heading: string;
  readonly limits: LimitsResult;
  readonly points: readonly PanelPoint[];
  readonly cruise: readonly { readonly powerKw: number; readonly crossings: readonly { readonly impellerId: string; readonly speedRpm: number }[] }[];
  readonly markerMm: number;
  readonly variantId: string;
  readonly where: string;
}

/** Gap (mm) between the impeller names and the plot top, where their leaders run. */
const NAME_GAP_MM = 2.2;

/**
 * Heading nodes: the variant's name in bold over its window and limit, always on two lines so every panel
 * of a chart keeps the same plot height (the shared scales depend on it). Returns the height taken (mm).
 */
function panelHeading(args: PanelArgs, x: number): { nodes: SceneNode[]; heightMm: number } {
  const { limits, where } = args;
  const detail = `WOT window ${rpmText(limits.windowLowRpm)}–${rpmText(limits.windowHighRpm)} · max ${rpmText(limits.maxRpm)} rpm`;
  const nameY = args.box.y + ascentMm(args.headingPt, 'bold');
  const detailTop = args.box.y + linePitchMm(args.headingPt, 'bold');
  return {
    nodes: [
      label({ x, y: nameY, text: args.heading, sizePt: args.headingPt, weight: 'bold', role: 'panel-heading', key: `panel:${args.variantId}`, where }),
      label({ x, y: detailTop + ascentMm(args.sizePt), text: detail, sizePt: args.sizePt, colour: INK_SOFT, role: 'panel-limits', key: `panel:${args.variantId}`, where }),
    ],
    heightMm: linePitchMm(args.headingPt, 'bold') + linePitchMm(args.sizePt) + 1,
  };
}

/** Lays out one panel in its box (mm). */
export function wallChartPanel(args: PanelArgs): { node: SceneNode; scales: PlotScales; notes: PlacedLabels['notes'] } {
  const { sizePt, where } = args;
  // The plot's horizontal extent does not depend on the strip heights, so find it first for the heading.
  const probe = chartArea(args.box, sizePt, { sides: args.sides, topMm: 0 });
  const heading = panelHeading(args, probe.x);
  const nameRowMm = linePitchMm(sizePt, 'bold') + NAME_GAP_MM;
  const area = chartArea(args.box, sizePt, { sides: args.sides, topMm: heading.heightMm + nameRowMm });
  // The power range is kept as computed (not widened to round ticks) so it hugs the data.
  const scales = plotScales({ area, rpmDomain: args.domains.rpm, powerKwDomain: args.domains.powerKw, powerUnitFirst: args.powerUnitFirst, nicePower: false });
  const right = area.x + area.width;

  const under: SceneNode[] = [];
  const window = windowBand(scales, { lowRpm: args.limits.windowLowRpm, highRpm: args.limits.windowHighRpm });
  if (window) under.push(...window.nodes);
  under.push(chartGrid(scales));
  const imps = impellerLayers(scales, args.impellers);
  under.push(...imps.bands);
  const data: SceneNode[] = [...imps.curves];
  const obstacles: Box[] = [];
  const labels: LabelRequest[] = [];
  for (const c of args.cruise) {
    const layer = cruiseLayer(scales, c, 1);
    if (!layer) continue;
    data.push(...layer.nodes);
    obstacles.push(...layer.obstacles);
    labels.push({ key: `cruise-label:${c.powerKw}`, x: right - 0.5, y: layer.y, text: powerText(c.powerKw, args.powerUnitFirst), sizePt, prefer: [[-1, -1], [-1, 1]] });
  }
  const engine = engineLayers(scales, args.engine);
  if (engine.reference) data.push(engine.reference);
  data.push(engine.site);
  const revLimit = revLimitLine(scales, args.limits.maxRpm);
  if (revLimit) data.push(revLimit.node);

  // Impeller names: over the curve where it leaves through the top; inside the plot where it leaves right
  // (and for all of them when the top row is too short to hold every name).
  const atTop = imps.ends.filter((end) => end.y <= area.y + 0.01);
  const topNames: EdgeLabel[] = atTop.map((end) => ({ key: `impeller-label:${end.id}`, anchorX: end.x, text: end.label }));
  const names = edgeLabelRow({ labels: topNames, edgeY: area.y, fromMm: area.x, toMm: right, sizePt, gapMm: NAME_GAP_MM, role: 'impeller-name', where });
  for (const end of imps.ends.filter((e) => !names || !atTop.includes(e))) {
    labels.push({ key: `impeller-label:${end.id}`, x: end.x, y: end.y, text: end.label, sizePt, weight: 'bold', prefer: [[-1, 1], [-1, 0], [-1, -1]] });
  }

  const markers: SceneNode[] = [];
  const pointLabels: LabelRequest[] = [];
  for (const { point: p, imp, cx, cy } of pointsOnChart(scales, args.points, args.impellers)) {
    markers.push(...pointMarker({ shape: imp.style.marker, cx, cy, sizeMm: args.markerMm, colour: imp.style.colour, warn: p.warn, role: 'operating-point', key: p.key }));
    obstacles.push(pointMarkerBox({ cx, cy, sizeMm: args.markerMm, warn: p.warn }));
    pointLabels.push({ key: p.key, x: cx, y: cy, text: rpmText(p.speedRpm), sizePt, weight: p.warn ? 'bold' : 'regular', prefer: [[-1, -1], [1, 1], [1, -1], [-1, 1]] });
  }
  const bounds = { x: area.x + 0.4, y: area.y + 0.4, width: area.width - 0.8, height: area.height - 0.8 };
  const placed = placeLabels([...pointLabels, ...labels], { bounds, obstacles, where });
  const node: SceneNode = {
    type: 'group',
    role: 'wall-chart-panel',
    key: `panel:${args.variantId}`,
    children: [...heading.nodes, ...under, ...data, ...markers, chartAxes(scales, { sizePt, where, sides: args.sides }), { type: 'group', role: 'chart-labels', children: [...(names?.nodes ?? []), ...placed.nodes] }],
  };
  // Labels that found no room became numbered callouts; the sheet prints their notes.
  return { node, scales, notes: placed.notes };
}
