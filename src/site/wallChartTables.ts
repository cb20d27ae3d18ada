/** The numbers of one wall chart as real HTML tables (what the chart shows, readable without it). */
import type { WallChartResult } from '../analysis/wallChart.ts';
import type { PowerUnit } from '../data/types.ts';
import { powerText, rpmText } from '../sheets/kit/format.ts';
import { powerCell, ratingCell } from './cells.ts';
import type { TableView } from './siteView.ts';

/** Predicted WOT operating points (nominal and tolerance band) and cruise crossings of one wall chart. */
export function wallChartTables(r: WallChartResult, unit: PowerUnit): TableView[] {
  const variantLabel = new Map(r.variants.map((v) => [v.variantId, v.label]));
  const impeller = new Map(r.impellers.map((i) => [i.impellerId, i]));
  const wot: TableView = {
    caption: `Predicted WOT speed, ${r.engineFamilyLabel} with ${r.jetLabel}`,
    head: ['Impeller', 'Engine', `Rating (${unit})`, 'WOT rpm', 'Low rpm', 'High rpm', `Power (${unit})`, 'Verdict'],
    numeric: [2, 3, 4, 5, 6],
    rows: r.pairings.map((p) => [
      impeller.get(p.impellerId)?.label ?? p.impellerId,
      variantLabel.get(p.variantId) ?? p.variantId,
      ratingCell(impeller.get(p.impellerId)?.ratingKw ?? Number.NaN, unit),
      rpmText(p.band.nominal.speedRpm),
      rpmText(p.band.low.speedRpm),
      rpmText(p.band.high.speedRpm),
      powerCell(p.band.nominal.powerKw, unit),
      p.band.verdict,
    ]),
    note:
      `Low and high: impeller rating ±${r.tolerancePct} %, engine power within its tolerance` +
      `, ${r.conditions.waterKind} water ${r.conditions.waterDensityKgM3.toFixed(1)} kg/m³, site ${r.conditions.siteLabel}.`,
  };
  if (r.cruise.length === 0) return [wot];
  const cruise: TableView = {
    caption: `Engine rpm at constant cruise power, ${r.jetLabel} impellers`,
    head: [`Cruise power (${unit})`, ...r.impellers.map((i) => i.label)],
    numeric: r.impellers.map((_, i) => i + 1),
    rows: r.cruise.map((c) => [
      powerText(c.powerKw, unit),
      ...r.impellers.map((i) => {
        const crossing = c.crossings.find((x) => x.impellerId === i.impellerId);
        if (!crossing) return '–';
        return `${rpmText(crossing.speedRpm)}${crossing.beyondWotFor.length > 0 ? ' *' : ''}`;
      }),
    ]),
    note: '* beyond the WOT speed of at least one engine variant: that engine cannot hold this power with this impeller.',
  };
  return [wot, cruise];
}
