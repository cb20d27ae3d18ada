/** The numbers of one boat as real HTML tables: WOT band, alternative impellers, cruise, upgrades. */
import type { BoatResult } from '../analysis/boat.ts';
import type { PowerUnit } from '../data/types.ts';
import { percentText, rpmText } from '../sheets/kit/format.ts';
import { powerCell, ratingCell } from './cells.ts';
import type { TableView } from './siteView.ts';

const CRUISE_STATUS: Readonly<Record<BoatResult['cruise'][number]['status'], string>> = {
  ok: 'Below WOT',
  aboveWot: 'Above WOT: not reachable',
  needsSpeedModel: 'Needs a speed estimate',
};

/** The tables of a boat page. */
export function boatTables(r: BoatResult, unit: PowerUnit): TableView[] {
  const alternatives: TableView = {
    caption: `Predicted WOT speed with each ${r.jetLabel} impeller (window ${rpmText(r.limits.windowLowRpm)}–${rpmText(r.limits.windowHighRpm)} rpm, maximum ${rpmText(r.limits.maxRpm)} rpm)`,
    head: ['Impeller', `Rating (${unit})`, 'WOT rpm', 'Low rpm', 'High rpm', 'Verdict'],
    numeric: [1, 2, 3, 4],
    rows: r.alternatives.map((a) => [
      a.fitted === 'yes' ? `${a.label} (fitted)` : a.label,
      ratingCell(a.ratingKw, unit),
      rpmText(a.band.nominal.speedRpm),
      rpmText(a.band.low.speedRpm),
      rpmText(a.band.high.speedRpm),
      a.band.verdict,
    ]),
    note: `Low and high: the tolerance corners of impeller rating and engine power; ${r.conditions.waterKind} water, site ${r.conditions.siteLabel}.`,
  };
  const cruise: TableView = {
    caption: `Cruise settings with the fitted impeller (${r.impellerLabel})`,
    head: ['Setting', 'Engine rpm', `Power (${unit})`, 'Note'],
    numeric: [1, 2],
    rows: r.cruise.map((c) => [
      c.label,
      c.speedRpm === undefined ? '–' : rpmText(c.speedRpm),
      c.powerKw === undefined ? '–' : powerCell(c.powerKw, unit),
      CRUISE_STATUS[c.status],
    ]),
  };
  const upgrade: TableView = {
    caption: 'WOT speed after an engine power change, same impeller',
    head: ['Power change', 'WOT rpm', `Power (${unit})`, 'Status'],
    numeric: [1, 2],
    rows: r.upgrade.map((u) => [percentText(u.changePct), rpmText(u.wot.speedRpm), powerCell(u.wot.powerKw, unit), u.wot.statusText]),
    note: 'An engine upgrade moves WOT speed by only about a third of the power change (cube law).',
  };
  return r.cruise.length > 0 ? [alternatives, cruise, upgrade] : [alternatives, upgrade];
}
