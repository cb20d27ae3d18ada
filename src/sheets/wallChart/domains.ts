/**
 * The common scales of the wall-chart panels: rpm from a little below the lowest WOT point to a little
 * past the highest maximum speed; power from a little below the lowest operating point, cruise line or
 * full-throttle curve shown to a little above the highest peak. Every panel uses the same ranges so the
 * variants compare at a glance.
 */
import type { WallChartResult } from '../../analysis/index.ts';
import type { EngineSeries } from '../chart/seriesTypes.ts';

export interface PanelDomains {
  readonly rpm: [number, number];
  readonly powerKw: [number, number];
  /** The cruise lines worth drawing: at least one impeller needs that power inside the rpm range. */
  readonly cruisePowersKw: readonly number[];
}

/** Air around the data: 4 % in rpm below the lowest point, 3 % past the limit, 6 % in power. */
const RPM_BELOW = 0.96;
const RPM_ABOVE = 1.03;
const POWER_BELOW = 0.94;
const POWER_ABOVE = 1.04;

/** Ranges (rpm, kW) shared by every panel of a wall chart. */
export function panelDomains(result: WallChartResult, engines: readonly EngineSeries[]): PanelDomains {
  const nominal = result.pairings.map((p) => p.band.nominal);
  const maxRpm = Math.max(...result.variants.map((v) => v.limits.maxRpm));
  // Rounded out to 100 rpm so the first and last grid lines fall on round numbers.
  const rpmLo = Math.floor((Math.min(...nominal.map((n) => n.speedRpm)) * RPM_BELOW) / 100) * 100;
  const rpmHi = Math.ceil((maxRpm * RPM_ABOVE) / 100) * 100;
  const peakKw = Math.max(...result.variants.flatMap((v) => [v.site.peakPowerKw, ...(v.siteDiffers === 'yes' ? [v.reference.peakPowerKw] : [])]));
  const cruisePowersKw = result.cruise
    .filter((c) => c.powerKw < peakKw && c.crossings.some((x) => x.speedRpm >= rpmLo && x.speedRpm <= rpmHi))
    .map((c) => c.powerKw);
  // Where the full-throttle curves enter the plot at the left: the range must hold them (never clipped).
  const curvesAtLeft = engines.flatMap((e) => [e.site, ...(e.reference ? [e.reference] : [])].map((c) => c.powerKwUnchecked(Math.min(Math.max(rpmLo, c.minRpm), c.maxRpm))));
  const lowKw = Math.min(...nominal.map((n) => n.powerKw), ...cruisePowersKw, ...curvesAtLeft);
  return { rpm: [rpmLo, rpmHi], powerKw: [lowKw * POWER_BELOW, peakKw * POWER_ABOVE], cruisePowersKw };
}
