/**
 * The boat and its results as the sea-trial-calibrated model sees them, for the match chart on boat sheets:
 * engine curve scaled by the fitted power factor, the fitted absorption exponent and fitted ratings, and
 * every impeller's point and band from the calibrated figures. The chart then draws curves and points from
 * one model, and the data-sheet engine curve stays beside the calibrated one for comparison.
 */
import type { Boat } from '../data/types.ts';
import { engineCurveAt, type BoatResult } from '../analysis/index.ts';
import type { EngineSeries } from './chart/seriesTypes.ts';
import { STROKE } from './kit/style.ts';

/** Boat, results and engine series for a chart on the calibrated model; null without a calibration. */
export function calibratedChartView(boat: Boat, result: BoatResult): { boat: Boat; result: BoatResult; engines: EngineSeries[] } | null {
  const cal = result.calibrated;
  if (!cal) return null;
  const c = cal.calibration;
  const factorOf = (id: string) => c.ratingFactors.find((r) => r.impellerId === id)?.factor ?? 1;
  const engine = { ...boat.engine, conditionFactor: boat.engine.conditionFactor * c.powerFactor };
  const jet = {
    ...boat.jet,
    family: { ...boat.jet.family, exponent: c.exponent },
    impellers: boat.jet.impellers.map((i) => ({ ...i, ratingKw: i.ratingKw * factorOf(i.id) })),
  };
  const view: Boat = { ...boat, engine, jet };
  const viewResult: BoatResult = {
    ...result,
    cruise: cal.cruise,
    alternatives: result.alternatives.map((a) => ({ ...a, band: a.calibratedBand ?? a.band })),
  };
  const engines: EngineSeries[] = [
    {
      id: boat.engineVariantId,
      label: `${boat.engine.label} calibrated`,
      site: engineCurveAt(engine, { ambient: boat.site.ambient }),
      reference: engineCurveAt(boat.engine, { ambient: boat.site.ambient }),
      referenceLabel: `${boat.engine.label} data sheet`,
      widthMm: STROKE.engine,
      dashMm: [],
    },
  ];
  return { boat: view, result: viewResult, engines };
}
