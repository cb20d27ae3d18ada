/**
 * Chart axes: plot frame, grid, rpm ticks along the bottom, power ticks on the left in the site's first
 * unit and on the right in the other unit, and axis titles. chartArea() reserves the margins the tick
 * labels need so nothing leaves the chart box.
 */
import type { Box, SceneNode } from '../../scene/types.ts';
import { measureTextMm } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm } from './block.ts';
import { LayoutError } from './errors.ts';
import type { PlotScales } from './scales.ts';
import { xTickCount } from './scales.ts';
import { GRID, INK, INK_SOFT, STROKE, stroke } from './style.ts';

const TICK_MM = 1.5;
const GAP_MM = 1;

/** Widest y tick label we allow for ("88888"); tick labels are checked against it after layout. */
function yLabelRoomMm(sizePt: number): number {
  return measureTextMm({ text: '88888', sizePt, weight: 'regular' });
}

/**
 * Which power axes carry tick labels and a title. Small multiples label only the outer sides of a row.
 * An unlabelled left side keeps its tick marks (on the grid lines, so every panel can still be read back
 * from its own ticks); an unlabelled right side draws nothing, as its other-unit ticks miss the grid.
 */
export interface AxisSides {
  readonly left: boolean;
  readonly right: boolean;
}

const BOTH_SIDES: AxisSides = { left: true, right: true };

/** Width (mm) one power axis takes beside the plot: ticks only, or ticks, labels and title. */
export function powerAxisWidthMm(sizePt: number, labelled: boolean): number {
  return labelled ? TICK_MM + GAP_MM + yLabelRoomMm(sizePt) + GAP_MM + linePitchMm(sizePt) : TICK_MM + GAP_MM;
}

/** The plot area inside a chart box, leaving room for ticks, tick labels, axis titles and a top strip (mm). */
export function chartArea(box: Box, sizePt: number, opts: { sides?: AxisSides; topMm?: number } = {}): Box {
  const sides = opts.sides ?? BOTH_SIDES;
  const left = powerAxisWidthMm(sizePt, sides.left);
  const right = powerAxisWidthMm(sizePt, sides.right);
  const bottom = TICK_MM + GAP_MM + linePitchMm(sizePt) * 2 + GAP_MM;
  // Room above the plot for annotation names (window, rev limit).
  const top = opts.topMm ?? linePitchMm(sizePt, 'bold') + 1.5;
  return { x: box.x + left, y: box.y + top, width: box.width - left - right, height: box.height - top - bottom };
}

/** Grid lines drawn under the data. */
export function chartGrid(scales: PlotScales): SceneNode {
  const { area } = scales;
  const nodes: SceneNode[] = [];
  for (const t of scales.x.ticks(xTickCount(area))) {
    const x = scales.x(t);
    nodes.push({ type: 'path', role: 'grid', segments: [{ op: 'M', x, y: area.y }, { op: 'L', x, y: area.y + area.height }], stroke: stroke(GRID, STROKE.grid) });
  }
  for (const t of scales.yLeft.ticks(scales.yTicks)) {
    const y = scales.yLeft(t);
    nodes.push({ type: 'path', role: 'grid', segments: [{ op: 'M', x: area.x, y }, { op: 'L', x: area.x + area.width, y }], stroke: stroke(GRID, STROKE.grid) });
  }
  return { type: 'group', role: 'chart-grid', children: nodes };
}

/** Frame, ticks, tick labels and titles drawn over the data. */
export function chartAxes(scales: PlotScales, args: { sizePt: number; where: string; sides?: AxisSides }): SceneNode {
  const { area } = scales;
  const { sizePt, where } = args;
  const sides = args.sides ?? BOTH_SIDES;
  const nodes: SceneNode[] = [{ type: 'rect', role: 'plot-frame', x: area.x, y: area.y, width: area.width, height: area.height, stroke: stroke(INK, STROKE.axis) }];
  const bottom = area.y + area.height;
  const right = area.x + area.width;
  // Each tick carries its value in its key ("x:4000", "left:150") so tests can rebuild the scales from the page.
  const tick = (key: string, x0: number, y0: number, x1: number, y1: number): SceneNode => ({ type: 'path', role: 'tick', key, segments: [{ op: 'M', x: x0, y: y0 }, { op: 'L', x: x1, y: y1 }], stroke: stroke(INK, STROKE.axis) });
  const asc = ascentMm(sizePt);
  for (const t of scales.x.ticks(xTickCount(area))) {
    const x = scales.x(t);
    nodes.push(tick(`x:${t}`, x, bottom, x, bottom + TICK_MM));
    nodes.push(label({ x, y: bottom + TICK_MM + GAP_MM + asc, text: String(t), sizePt, anchor: 'middle', role: 'tick-label-x', where }));
  }
  const room = yLabelRoomMm(sizePt);
  const yAxis = (scale: PlotScales['yLeft'], side: 'left' | 'right'): void => {
    if (side === 'right' && !sides.right) return;
    for (const t of scale.ticks(scales.yTicks)) {
      const y = scale(t);
      if (y < area.y - 0.01 || y > bottom + 0.01) continue;
      const x = side === 'left' ? area.x : right;
      const dir = side === 'left' ? -1 : 1;
      nodes.push(tick(`${side}:${t}`, x, y, x + dir * TICK_MM, y));
      if (!sides[side]) continue;
      const node = label({ x: x + dir * (TICK_MM + GAP_MM), y: y + asc * 0.35, text: String(t), sizePt, anchor: side === 'left' ? 'end' : 'start', role: `tick-label-${side}`, where });
      if (node.widthMm > room) throw new LayoutError(where, `the power tick label "${t}" is wider than the axis margin`);
      nodes.push(node);
    }
  };
  yAxis(scales.yLeft, 'left');
  yAxis(scales.yRight, 'right');
  // Axis titles.
  const xTitleY = bottom + TICK_MM + GAP_MM + linePitchMm(sizePt) + asc;
  nodes.push(label({ x: area.x + area.width / 2, y: xTitleY, text: 'Engine speed (rpm)', sizePt, weight: 'bold', anchor: 'middle', colour: INK, role: 'axis-title', where }));
  const titleOffset = TICK_MM + GAP_MM + room + GAP_MM;
  const midY = area.y + area.height / 2;
  if (sides.left) nodes.push(label({ x: area.x - titleOffset - linePitchMm(sizePt) + asc, y: midY, text: `Power (${scales.leftUnit})`, sizePt, weight: 'bold', anchor: 'middle', rotateDeg: 90, role: 'axis-title', where }));
  if (sides.right) nodes.push(label({ x: right + titleOffset + asc, y: midY, text: `Power (${scales.rightUnit})`, sizePt, anchor: 'middle', rotateDeg: 90, colour: INK_SOFT, role: 'axis-title', where }));
  return { type: 'group', role: 'chart-axes', children: nodes };
}
