/**
 * The smaller match chart on boat sheets: the boat's engine variant at its site, every impeller of its
 * jet (same styles as on the wall chart), the WOT point of each, the fitted one in bold.
 */
import type { Boat, PowerUnit } from '../../data/types.ts';
import type { Box } from '../../scene/types.ts';
import type { BoatResult } from '../../analysis/index.ts';
import { isWarning } from '../../analysis/index.ts';
import { rpmText } from '../kit/format.ts';
import { matchChart, type MatchChart } from './matchChart.ts';
import type { EngineSeries } from './seriesTypes.ts';
import { engineSeries, impellerSeries } from './series.ts';
import { pointSuffix } from '../words.ts';

/** A point of the operating region (rpm, kW). */
export interface RegionPoint {
  readonly speedRpm: number;
  readonly powerKw: number;
}

/**
 * Rpm and power ranges cropped to the operating region: every drawn impeller's WOT point with the ends of
 * its band, any extra points (an upgrade sheet's new WOT points), the WOT window and the maximum rpm, plus
 * a margin. The curves are clipped to the plot, so the answer, not the whole engine curve, fills it.
 */
export function boatDomains(result: BoatResult, extra: readonly RegionPoint[] = []): { rpm: [number, number]; powerKw: [number, number] } {
  const points = [...result.alternatives.flatMap((a) => [a.band.low, a.band.nominal, a.band.high]), ...extra];
  const rpms = [...points.map((p) => p.speedRpm), result.limits.windowLowRpm, result.limits.windowHighRpm, result.limits.maxRpm];
  const rpmLo = Math.min(...rpms);
  const rpmHi = Math.max(...rpms);
  const rpmMargin = Math.max(RPM_MARGIN * (rpmHi - rpmLo), MIN_RPM_MARGIN);
  const powers = points.map((p) => p.powerKw);
  const kwLo = Math.min(...powers);
  const kwHi = Math.max(...powers);
  // Room above and below the points for their labels, at least a share of the power so a flat row of
  // points does not blow up the scale.
  const kwMargin = Math.max(POWER_MARGIN * (kwHi - kwLo), MIN_POWER_MARGIN * kwHi);
  return { rpm: [rpmLo - rpmMargin, rpmHi + rpmMargin], powerKw: [Math.max(0, kwLo - kwMargin), kwHi + kwMargin] };
}

/** Margins of the cropped ranges: shares of the span, and the least (rpm; share of the highest power). */
const RPM_MARGIN = 0.06;
const MIN_RPM_MARGIN = 60;
const POWER_MARGIN = 0.25;
const MIN_POWER_MARGIN = 0.06;

/**
 * Most impellers a boat chart draws: six keeps every curve its own colour (style.ts) and the labels
 * readable in a half-page chart; a larger jet shows the six around the fitted one (its tables list all).
 */
export const BOAT_CHART_IMPELLERS = 6;

/** The ids of the impellers a boat chart draws: all, or the `most` consecutive ones around the fitted one. */
export function chartImpellerIds(boat: Boat, most = BOAT_CHART_IMPELLERS): string[] {
  const ids = boat.jet.impellers.map((i) => i.id);
  if (ids.length <= most) return ids;
  const fitted = Math.max(0, ids.indexOf(boat.impellerId));
  const start = Math.min(Math.max(0, fitted - Math.floor((most - 1) / 2)), ids.length - most);
  return ids.slice(start, start + most);
}

/** The sentence a sheet prints under a chart that leaves impellers out ('' when it draws them all). */
export function chartImpellersNote(boat: Boat): string {
  const shown = chartImpellerIds(boat);
  const all = boat.jet.impellers;
  if (shown.length === all.length) return '';
  const label = (id: string) => all.find((i) => i.id === id)?.label ?? id;
  return `The chart draws the ${shown.length} impellers around the fitted one (${label(shown[0])} to ${label(shown[shown.length - 1])}) of the jet's ${all.length}; the table lists every one.`;
}

/** Match chart for one boat in a box. `engines` overrides the site curve (upgrade sheets). */
export function boatChart(args: { boat: Boat; result: BoatResult; box: Box; sizePt: number; powerUnitFirst: PowerUnit; engines?: readonly EngineSeries[]; points?: 'all' | 'fitted'; /** More points the plot must hold (upgrade WOT points). */ region?: readonly RegionPoint[]; where: string }): MatchChart {
  const { boat } = args;
  // A jet with many impellers: the chart draws those around the fitted one, styled as on every sheet.
  const ids = new Set(chartImpellerIds(boat));
  const result = { ...args.result, alternatives: args.result.alternatives.filter((a) => ids.has(a.impellerId)) };
  const engines = args.engines ?? engineSeries({ family: boatFamily(boat), ambient: boat.site.ambient });
  const impellers = impellerSeries({ jet: boat.jet, driveLine: boat.driveLine, waterDensityKgM3: boat.water.densityKgM3 }).filter((s) => ids.has(s.id));
  const shown = args.points === 'fitted' ? result.alternatives.filter((a) => a.fitted === 'yes') : result.alternatives;
  const d = boatDomains(result, args.region);
  return matchChart({
    box: args.box,
    sizePt: args.sizePt,
    powerUnitFirst: args.powerUnitFirst,
    rpmDomain: d.rpm,
    powerKwDomain: d.powerKw,
    impellers,
    engines,
    points: shown.map((a) => ({
      key: `impeller:${a.impellerId}|engine:${result.engineVariantId}`,
      impellerId: a.impellerId,
      filled: true,
      speedRpm: a.band.nominal.speedRpm,
      powerKw: a.band.nominal.powerKw,
      text: `${a.fitted === 'yes' ? 'Fitted: ' : ''}${rpmText(a.band.nominal.speedRpm)} rpm${pointSuffix(a.band.nominal.status)}`,
      warn: isWarning(a.band.nominal.status),
      band: { low: a.band.low, high: a.band.high },
    })),
    window: { lowRpm: result.limits.windowLowRpm, highRpm: result.limits.windowHighRpm },
    maxRpm: result.limits.maxRpm,
    cruise: [],
    markerMm: 2.4,
    clipToPlot: true,
    where: args.where,
  });
}

/** A one-variant family view of the boat's engine, so the chart draws only what is fitted. */
function boatFamily(boat: Boat) {
  return { id: boat.engineFamilyId, label: boat.engine.label, maker: '', fuel: boat.engine.fuel, variants: [boat.engine], source: boat.source };
}
