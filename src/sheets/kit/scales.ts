/**
 * The scales of one chart, built once and handed to everything that draws on it (the only place
 * that calls scaleLinear). x: engine rpm → mm; y: kW → mm; plus the same y axis expressed in the
 * site's first and second power units for the tick labels.
 */
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import type { Box } from '../../scene/types.ts';
import type { PowerUnit } from '../../data/types.ts';
import { kwToPower, powerToKw } from './units.ts';

export interface PlotScales {
  readonly area: Box;
  /** Engine speed (rpm) → mm across the page. */
  readonly x: ScaleLinear<number, number>;
  /** Power (kW) → mm down the page (larger power higher up). */
  readonly y: ScaleLinear<number, number>;
  /** Power in the left unit → mm; its ticks label the left axis. */
  readonly yLeft: ScaleLinear<number, number>;
  /** Power in the right unit → mm; its ticks label the right axis. */
  readonly yRight: ScaleLinear<number, number>;
  readonly leftUnit: PowerUnit;
  readonly rightUnit: PowerUnit;
}

/** Aim for one labelled tick every ~22 mm: dense enough to read values, sparse enough to stay legible. */
const MM_PER_TICK = 22;

/**
 * Scales for a plot area; rpm kept as asked, the power domain widened to round values in the left unit
 * unless `nicePower` is false (ticks are round either way).
 */
export function plotScales(args: {
  area: Box;
  rpmDomain: readonly [number, number];
  powerKwDomain: readonly [number, number];
  powerUnitFirst: PowerUnit;
  nicePower?: boolean;
}): PlotScales {
  const { area } = args;
  const leftUnit = args.powerUnitFirst;
  const rightUnit: PowerUnit = leftUnit === 'kW' ? 'hp' : 'kW';
  const x = scaleLinear()
    .domain([args.rpmDomain[0], args.rpmDomain[1]])
    .range([area.x, area.x + area.width]);
  const yLeft = scaleLinear()
    .domain([kwToPower(args.powerKwDomain[0], leftUnit), kwToPower(args.powerKwDomain[1], leftUnit)])
    .range([area.y + area.height, area.y]);
  if (args.nicePower ?? true) yLeft.nice(yTickCount(area));
  const [l0, l1] = yLeft.domain();
  const y = scaleLinear()
    .domain([powerToKw(l0, leftUnit), powerToKw(l1, leftUnit)])
    .range([area.y + area.height, area.y]);
  const yRight = scaleLinear()
    .domain([kwToPower(y.domain()[0], rightUnit), kwToPower(y.domain()[1], rightUnit)])
    .range([area.y + area.height, area.y]);
  return { area, x, y, yLeft, yRight, leftUnit, rightUnit };
}

/** Number of x ticks asked of d3 for this plot width. */
export function xTickCount(area: Box): number {
  return Math.max(2, Math.round(area.width / MM_PER_TICK));
}

/** Number of y ticks asked of d3 for this plot height. */
export function yTickCount(area: Box): number {
  return Math.max(2, Math.round(area.height / MM_PER_TICK));
}
