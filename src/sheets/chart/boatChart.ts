/**
 * The smaller match chart on boat sheets: the boat's engine variant at its site, every impeller of its
 * jet (same styles as on the wall chart), the WOT point of each, the fitted one in bold.
 */
import type { Boat, PowerUnit } from '../../data/types.ts';
import type { Box } from '../../scene/types.ts';
import type { BoatResult } from '../../analysis/index.ts';
import type { EngineCurve } from '../../analysis/index.ts';
import { isWarning } from '../../analysis/index.ts';
import { rpmText } from '../kit/format.ts';
import { matchChart, type MatchChart } from './matchChart.ts';
import type { EngineSeries } from './seriesTypes.ts';
import { engineSeries, impellerSeries } from './series.ts';
import { pointSuffix } from '../words.ts';

/**
 * Rpm and power ranges around a boat's WOT points and cruise settings. The power range also holds every
 * engine curve drawn (site and published) across the rpm range, so no curve leaves the plot (never clipped).
 */
export function boatDomains(result: BoatResult, curves: readonly EngineCurve[] = []): { rpm: [number, number]; powerKw: [number, number] } {
  const rpms = result.alternatives.flatMap((a) => [a.band.low.speedRpm, a.band.high.speedRpm]);
  const cruiseRpms = result.cruise.flatMap((c) => (c.speedRpm !== undefined ? [c.speedRpm] : []));
  const lo = Math.floor((Math.min(result.limits.windowLowRpm * 0.8, ...rpms, ...cruiseRpms) * 0.95) / 100) * 100;
  const hi = result.limits.maxRpm * 1.04;
  const powers = result.alternatives.flatMap((a) => [a.band.low.powerKw, a.band.high.powerKw]);
  const drawn = curves.flatMap((c) => curveValuesKw(c, lo, hi));
  const peak = Math.max(...powers, ...drawn);
  return { rpm: [lo, hi], powerKw: [Math.min(peak * 0.4, ...drawn.map((kw) => kw * 0.96)), peak * 1.08] };
}

/**
 * The values (kW) that bound an engine curve over [loRpm, hiRpm]: its ends there and its knots inside.
 * The curve is monotone between knots (monotone Hermite pieces), so its extremes are among these.
 */
function curveValuesKw(curve: EngineCurve, loRpm: number, hiRpm: number): number[] {
  const a = Math.min(Math.max(loRpm, curve.minRpm), curve.maxRpm);
  const b = Math.min(Math.max(hiRpm, curve.minRpm), curve.maxRpm);
  const knots = curve.pieces.map((p) => p.x0).filter((x) => x > a && x < b);
  return [a, b, ...knots].map((x) => curve.powerKwUnchecked(x));
}

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
export function boatChart(args: { boat: Boat; result: BoatResult; box: Box; sizePt: number; powerUnitFirst: PowerUnit; engines?: readonly EngineSeries[]; points?: 'all' | 'fitted'; where: string }): MatchChart {
  const { boat } = args;
  // A jet with many impellers: the chart draws those around the fitted one, styled as on every sheet.
  const ids = new Set(chartImpellerIds(boat));
  const result = { ...args.result, alternatives: args.result.alternatives.filter((a) => ids.has(a.impellerId)) };
  const engines = args.engines ?? engineSeries({ family: boatFamily(boat), ambient: boat.site.ambient });
  const impellers = impellerSeries({ jet: boat.jet, driveLine: boat.driveLine, waterDensityKgM3: boat.water.densityKgM3 }).filter((s) => ids.has(s.id));
  const shown = args.points === 'fitted' ? result.alternatives.filter((a) => a.fitted === 'yes') : result.alternatives;
  const d = boatDomains(result, engines.flatMap((e) => [e.site, ...(e.reference ? [e.reference] : [])]));
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
    })),
    window: { lowRpm: result.limits.windowLowRpm, highRpm: result.limits.windowHighRpm },
    maxRpm: result.limits.maxRpm,
    cruise: [],
    markerMm: 2.4,
    where: args.where,
  });
}

/** A one-variant family view of the boat's engine, so the chart draws only what is fitted. */
function boatFamily(boat: Boat) {
  return { id: boat.engineFamilyId, label: boat.engine.label, maker: '', fuel: boat.engine.fuel, variants: [boat.engine], source: boat.source };
}
