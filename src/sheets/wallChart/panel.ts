/**
 * The wall chart's secondary engineering panel: power against engine speed for every variant and every
 * impeller on one plot, the rpm range cropped to where the engines run at WOT. One power unit (the
 * site's first) with the other in a conversion note; curves named by direct labels at their ends inside
 * the plot; WOT points small (the ladder carries the figures), warnings as the reserved warning square;
 * maximum rpm as the hatched limit line; constant-power cruise lines dotted.
 */
import type { PowerUnit } from '../../data/types.ts';
import { isWarning, type WallChartResult } from '../../analysis/index.ts';
import type { Box, SceneNode } from '../../scene/types.ts';
import { cruiseLayer, engineLayers, impellerLayers, pointsOnChart } from '../chart/layers.ts';
import type { EngineSeries, ImpellerSeries } from '../chart/seriesTypes.ts';
import { chartArea, chartAxes, chartGrid } from '../kit/axes.ts';
import { ascentMm, label, linePitchMm } from '../kit/block.ts';
import { powerText } from '../kit/format.ts';
import { placeLabels, type LabelRequest, type PlacedLabels } from '../kit/labels.ts';
import { markerBox } from '../kit/markers.ts';
import { plotScales, type PlotScales } from '../kit/scales.ts';
import { INK, INK_SOFT, PAPER_WHITE, STROKE, WARN, stroke } from '../kit/style.ts';
import { kwToPower } from '../kit/units.ts';
import { limitLine } from '../kit/warningMarks.ts';
import type { PanelDomains } from './domains.ts';

export interface PanelArgs {
  readonly box: Box;
  readonly sizePt: number;
  readonly headingPt: number;
  readonly powerUnit: PowerUnit;
  readonly domains: PanelDomains;
  readonly result: WallChartResult;
  readonly impellers: readonly ImpellerSeries[];
  readonly engines: readonly EngineSeries[];
  readonly engineLabels: readonly string[];
  readonly where: string;
}

const POINT_MM = 2.2;

/** "Power in kW · 1 kW = 1.341 hp" (NIST SP 811 horsepower, as in src/units.ts). */
export function conversionNote(unit: PowerUnit): string {
  const other: PowerUnit = unit === 'kW' ? 'hp' : 'kW';
  const factor = unit === 'kW' ? kwToPower(1, 'hp') : 1 / kwToPower(1, 'hp');
  return `Power in ${unit} · 1 ${unit} = ${factor.toFixed(3)} ${other}`;
}

/**
 * Most impellers the panel draws: past this many absorption curves (each with its name at its end) the
 * plot turns into a thicket no one reads from a wall, so a page with more leaves the panel out and says so.
 */
export const PANEL_MAX_IMPELLERS = 8;

/** Least height (mm) worth drawing the panel in. */
export const PANEL_MIN_HEIGHT_MM = 62;

/** Lays out the panel in its box (mm). */
export function powerPanel(args: PanelArgs): { node: SceneNode; scales: PlotScales; notes: PlacedLabels['notes'] } {
  const { sizePt, where, result } = args;
  const headTop = args.box.y;
  const heading = label({ x: args.box.x, y: headTop + ascentMm(args.headingPt, 'bold'), text: 'Power against engine speed at WOT', sizePt: args.headingPt, weight: 'bold', role: 'panel-heading', key: 'panel:power', where });
  const note = label({ x: args.box.x, y: headTop + linePitchMm(args.headingPt, 'bold') + ascentMm(sizePt), text: conversionNote(args.powerUnit), sizePt, colour: INK_SOFT, role: 'unit-note', where });
  const topMm = linePitchMm(args.headingPt, 'bold') + linePitchMm(sizePt) + 1.5;
  const area = chartArea(args.box, sizePt, { sides: { left: true, right: false }, topMm });
  const scales = plotScales({ area, rpmDomain: args.domains.rpm, powerKwDomain: args.domains.powerKw, powerUnitFirst: args.powerUnit, nicePower: false });
  const right = area.x + area.width;
  const bottom = area.y + area.height;

  const under: SceneNode[] = [chartGrid(scales)];
  const data: SceneNode[] = [];
  const obstacles: Box[] = [];
  const labels: LabelRequest[] = [];
  for (const c of result.cruise.filter((q) => args.domains.cruisePowersKw.includes(q.powerKw))) {
    const layer = cruiseLayer(scales, c, 0.9);
    if (!layer) continue;
    data.push(...layer.nodes);
    obstacles.push(...layer.obstacles);
    labels.push({ key: `cruise-label:${c.powerKw}`, x: area.x + 0.5, y: layer.y, text: `cruise ${powerText(c.powerKw, args.powerUnit)}`, sizePt, prefer: [[1, -1], [1, 1]] });
  }
  const imps = impellerLayers(scales, args.impellers);
  data.push(...imps.curves);
  for (const end of imps.ends) labels.push({ key: `impeller-label:${end.id}`, x: end.x, y: end.y, text: end.label, sizePt, weight: 'bold', prefer: [[-1, 1], [-1, 0], [1, 1], [-1, -1]] });
  args.engines.forEach((eng, i) => {
    const layer = engineLayers(scales, eng);
    data.push(layer.site);
    const endRpm = Math.min(eng.site.maxRpm, args.domains.rpm[1]);
    const y = scales.y(eng.site.powerKwUnchecked(endRpm));
    labels.push({ key: `engine-label:${eng.id}`, x: scales.x(endRpm), y, text: args.engineLabels[i], sizePt, weight: 'bold', prefer: [[-1, -1], [-1, 1], [1, -1]] });
  });
  // One limit line per distinct maximum rpm, named at the top.
  for (const maxRpm of [...new Set(result.variants.map((v) => v.limits.maxRpm))]) {
    const x = scales.x(maxRpm);
    if (x > right) continue;
    data.push(...limitLine({ x, y0: area.y, y1: bottom, depthMm: Math.min(1.6, right - x), role: 'rev-limit', key: `limit:${maxRpm}` }));
    labels.push({ key: `limit-label:${maxRpm}`, x, y: area.y + 0.5, text: `max ${maxRpm}`, sizePt, prefer: [[-1, 1]] });
  }

  const points = result.pairings.map((p) => ({ key: `impeller:${p.impellerId}|engine:${p.variantId}`, impellerId: p.impellerId, speedRpm: p.band.nominal.speedRpm, powerKw: p.band.nominal.powerKw, warn: isWarning(p.band.nominal.status) }));
  const markers: SceneNode[] = [];
  for (const { point: p, cx, cy } of pointsOnChart(scales, points, args.impellers)) {
    const r = POINT_MM / 2;
    markers.push(p.warn
      ? { type: 'rect', role: 'operating-point', key: p.key, x: cx - r, y: cy - r, width: 2 * r, height: 2 * r, fill: { colour: WARN }, stroke: stroke(INK, STROKE.rule) }
      : { type: 'circle', role: 'operating-point', key: p.key, cx, cy, r: r * 0.9, fill: { colour: PAPER_WHITE }, stroke: stroke(INK, STROKE.rule) });
    obstacles.push(markerBox(cx, cy, POINT_MM));
  }
  const bounds = { x: area.x + 0.4, y: area.y + 0.4, width: area.width - 0.8, height: area.height - 0.8 };
  const placed = placeLabels(labels, { bounds, obstacles, where });
  const node: SceneNode = {
    type: 'group',
    role: 'wall-chart-panel',
    key: 'panel:power',
    children: [heading, note, ...under, ...data, ...markers, chartAxes(scales, { sizePt, where, sides: { left: true, right: false } }), { type: 'group', role: 'chart-labels', children: [...placed.nodes] }],
  };
  return { node, scales, notes: placed.notes };
}


