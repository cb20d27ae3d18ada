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
  /** Tick count asked of d3 for both power axes (at least two ticks inside the plot on each). */
  readonly yTicks: number;
}

/** Aim for one labelled tick every ~22 mm: dense enough to read values, sparse enough to stay legible. */
const MM_PER_TICK = 22;

/** A niced power domain may be at most this much wider than the data asked for (fraction of its span). */
const MAX_NICE_GROWTH = 0.25;
/** Finest rounding tried for the power domain (d3 tick count). */
const FINEST_NICE_COUNT = 20;

/**
 * Scales for a plot area; rpm kept as asked, the power domain widened to round values in the left unit
 * unless `nicePower` is false (ticks are round either way). A short plot gets fewer power ticks, never
 * a wider power range: the domain is rounded to the coarsest step that widens it by at most a quarter.
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
  if (args.nicePower ?? true) yLeft.domain(tightNiceDomain(yLeft.domain() as [number, number], yTickCount(area)));
  const [l0, l1] = yLeft.domain();
  const y = scaleLinear()
    .domain([powerToKw(l0, leftUnit), powerToKw(l1, leftUnit)])
    .range([area.y + area.height, area.y]);
  const yRight = scaleLinear()
    .domain([kwToPower(y.domain()[0], rightUnit), kwToPower(y.domain()[1], rightUnit)])
    .range([area.y + area.height, area.y]);
  return { area, x, y, yLeft, yRight, leftUnit, rightUnit, yTicks: powerTickCount([yLeft, yRight], yTickCount(area)) };
}

/**
 * The domain rounded outwards to round values: d3's nice() with the wanted tick count when that widens
 * the span by at most MAX_NICE_GROWTH, else with the least finer rounding that does (e.g. 194–486 kW with
 * two ticks: step 200 would give 0–600; step 50 gives 150–500).
 */
function tightNiceDomain(domain: readonly [number, number], wanted: number): [number, number] {
  const span = domain[1] - domain[0];
  let best: [number, number] = [domain[0], domain[1]];
  for (let count = wanted; count <= FINEST_NICE_COUNT; count++) {
    best = scaleLinear().domain([domain[0], domain[1]]).nice(count).domain() as [number, number];
    if (best[1] - best[0] <= span * (1 + MAX_NICE_GROWTH)) break;
  }
  return best;
}

/** The least tick count from `wanted` up that puts at least two ticks on every given axis. */
function powerTickCount(axes: readonly ScaleLinear<number, number>[], wanted: number): number {
  let count = wanted;
  while (count < FINEST_NICE_COUNT && axes.some((a) => a.ticks(count).length < 2)) count++;
  return count;
}

/** Number of x ticks asked of d3 for this plot width. */
export function xTickCount(area: Box): number {
  return Math.max(2, Math.round(area.width / MM_PER_TICK));
}

/** Number of y ticks asked of d3 for this plot height. */
export function yTickCount(area: Box): number {
  return Math.max(2, Math.round(area.height / MM_PER_TICK));
}
