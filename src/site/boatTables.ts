/**
 * The numbers of one boat as real HTML tables: every impeller of its jet, the cruise settings and the
 * engine-power changes. A boat with usable sea trials shows the calibrated figures first, labelled with
 * the trial dates, and the data-sheet figures in columns beside them; without trials nothing mentions a
 * calibration. Speeds and fuel are estimates and their column heads say so.
 */
import { isWarning, type BoatResult, type CruiseRow } from '../analysis/index.ts';
import type { Boat, PowerUnit, SpeedUnit } from '../data/types.ts';
import { acrossBandText, askedSpeedText, distanceText, distanceUnit, estimatesNote, reserveText, speedHeader, speedText, trialDatesText } from '../sheets/boatTables.ts';
import { numberText, percentText, rpmBandText, rpmText } from '../sheets/kit/format.ts';
import { powerCell, ratingCell } from './cells.ts';
import type { CellView, TableView } from './siteView.ts';

/** Units and the boat a table is drawn for. */
export interface BoatTableArgs {
  readonly boat: Boat;
  readonly result: BoatResult;
  readonly unit: PowerUnit;
  readonly speedUnit: SpeedUnit;
}

const CRUISE_STATUS: Readonly<Record<CruiseRow['status'], string>> = {
  ok: 'Below WOT',
  aboveWot: 'Above WOT: not reachable',
  belowPlaning: 'Below planing speed: not estimated',
  needsSpeedModel: 'Needs a speed estimate',
};

/** A data-sheet figure beside a calibrated one. */
const dataSheet = (text: string): CellView => ({ text, mark: 'dataSheet' });
/** A status in words, marked when it must be warned about. */
const status = (text: string, warn: boolean): CellView => (warn ? { text, mark: 'warn' } : text);
/** An rpm band without its unit: "4780–4900", or one figure when both ends print alike (at the limiter). */
const bandCell = (lowRpm: number, highRpm: number): string => rpmBandText(lowRpm, highRpm).replace(' rpm', '');

/** ", calibrated to sea trials of 2026-03-14, 2026-03-21", or '' for a boat without usable trials. */
export function calibratedSuffix(result: BoatResult): string {
  const dates = trialDatesText(result);
  return dates === '' ? '' : `, calibrated to ${dates}`;
}

/** Every impeller of the jet on this boat: WOT band, power, estimated top speed, status; data-sheet figures beside calibrated ones. */
export function alternativesTable(args: BoatTableArgs): TableView {
  const { result: r, unit, speedUnit } = args;
  const cal = r.calibrated !== undefined;
  return {
    caption: `Predicted WOT speed with each ${r.jetLabel} impeller${calibratedSuffix(r)} (window ${rpmText(r.limits.windowLowRpm)}–${rpmText(r.limits.windowHighRpm)} rpm, maximum ${rpmText(r.limits.maxRpm)} rpm)`,
    head: [
      'Impeller',
      `Rating (${unit})`,
      'WOT rpm',
      'Low rpm',
      'High rpm',
      `Power (${unit})`,
      speedHeader(speedUnit, 'Top speed'),
      'Status',
      'Across the band',
      ...(cal ? ['Data-sheet WOT rpm', 'Data-sheet band (rpm)'] : []),
    ],
    numeric: [1, 2, 3, 4, 5, 6, ...(cal ? [9, 10] : [])],
    words: [7],
    rows: r.alternatives.map((a) => {
      const b = a.calibratedBand ?? a.band;
      const top = a.calibratedTopSpeedKn ?? a.topSpeedKn;
      return [
        a.fitted === 'yes' ? `${a.label} (fitted)` : a.label,
        ratingCell(a.ratingKw, unit),
        rpmText(b.nominal.speedRpm),
        rpmText(b.low.speedRpm),
        rpmText(b.high.speedRpm),
        powerCell(b.nominal.powerKw, unit),
        top === undefined ? '–' : speedText(top, speedUnit),
        status(b.nominal.statusText, isWarning(b.nominal.status)),
        acrossBandText(b),
        ...(cal ? [dataSheet(rpmText(a.band.nominal.speedRpm)), dataSheet(bandCell(a.band.low.speedRpm, a.band.high.speedRpm))] : []),
      ];
    }),
    note: cal
      ? `Low and high: the ends of the calibrated band. ${r.calibrated!.bandNote} Data-sheet figures: the model from the published ratings, before the sea trials. ${r.conditions.waterKind} water, site ${r.conditions.siteLabel}.`
      : `Low and high: the tolerance corners of impeller rating (± ${args.boat.jet.family.tolerancePct} %) and engine power (± ${args.boat.engine.powerTolerancePct} %); ${r.conditions.waterKind} water, site ${r.conditions.siteLabel}.`,
  };
}

/** What the cruise setting asks for, as written in the boat file. */
function askedText(boat: Boat, label: string, unit: PowerUnit, speedUnit: SpeedUnit): string {
  const setting = boat.cruise.find((c) => c.label === label);
  if (!setting) return '–';
  if (setting.kind === 'power') return `${powerCell(setting.powerKw, unit)} ${unit}`;
  if (setting.kind === 'rpm') return `${rpmText(setting.speedRpm)} rpm`;
  return `${askedSpeedText(setting, speedUnit)} ${speedUnit}`;
}

const optionalNumber = (value: number | undefined, digits: number, what: string): string => (value === undefined ? '–' : numberText(value, digits, what));

/** Cruise settings with the fitted impeller: rpm, power, estimated speed, fuel and range; data-sheet rpm and power beside calibrated ones. */
export function cruiseTable(args: BoatTableArgs): TableView {
  const { boat, result: r, unit, speedUnit } = args;
  const shown = r.calibrated?.cruise ?? r.cruise;
  const cal = r.calibrated !== undefined;
  const range = shown.some((c) => c.rangeWithReserveNm !== undefined);
  const head = [
    'Setting',
    'Asked',
    'Engine rpm',
    `Power (${unit})`,
    speedHeader(speedUnit),
    'Fuel (L/h, est.)',
    'Fuel (US gal/h, est.)',
    ...(range ? [`Time keeping ${reserveText(r)} (h, est.)`, `Range keeping ${reserveText(r)} (${distanceUnit(speedUnit)}, est.)`] : []),
    ...(cal ? ['Data-sheet rpm', `Data-sheet power (${unit})`] : []),
    'Note',
  ];
  return {
    caption: `Cruise settings with the fitted impeller (${r.impellerLabel})${calibratedSuffix(r)}`,
    head,
    numeric: Array.from({ length: head.length - 3 }, (_, i) => i + 2),
    rows: shown.map((c, i) => {
      const data = r.cruise[i];
      return [
        c.label,
        askedText(boat, c.label, unit, speedUnit),
        c.speedRpm === undefined ? '–' : rpmText(c.speedRpm),
        c.powerKw === undefined ? '–' : powerCell(c.powerKw, unit),
        c.speedKn === undefined ? '–' : speedText(c.speedKn, speedUnit),
        optionalNumber(c.fuelLPerH, 0, 'fuel flow'),
        optionalNumber(c.fuelUsGalPerH, 1, 'fuel flow'),
        ...(range ? [optionalNumber(c.hoursWithReserve, 1, 'running time'), c.rangeWithReserveNm === undefined ? '–' : distanceText(c.rangeWithReserveNm, speedUnit)] : []),
        ...(cal ? [dataSheet(data?.speedRpm === undefined ? '–' : rpmText(data.speedRpm)), dataSheet(data?.powerKw === undefined ? '–' : powerCell(data.powerKw, unit))] : []),
        status(c.status === 'ok' && c.speedBasis === 'belowPlaning' ? 'Below WOT; below planing speed, so no speed estimate' : CRUISE_STATUS[c.status], c.status === 'aboveWot'),
      ];
    }),
    note: `${estimatesNote(r)}${range ? ` Range: a ${boat.fuelTankL} L tank less a third kept in reserve.` : ''}`,
  };
}

/** WOT after engine power changes of +5 … +50 %: same impeller, and the impeller that would best use the new power. */
export function upgradeTable(args: BoatTableArgs): TableView {
  const { result: r, unit, speedUnit } = args;
  const rows = r.calibrated?.upgrade ?? r.upgrade;
  const cal = r.calibrated !== undefined;
  const label = (id: string) => {
    const a = r.alternatives.find((x) => x.impellerId === id);
    return a === undefined ? id : a.fitted === 'yes' ? `${a.label} (fitted)` : a.label;
  };
  return {
    caption: `WOT speed after an engine power change${calibratedSuffix(r)}`,
    head: [
      'Power change',
      'WOT rpm',
      `Power (${unit})`,
      'Status',
      speedHeader(speedUnit, 'Top speed'),
      'Speed gain (est.)',
      'Best impeller',
      'Its WOT rpm',
      speedHeader(speedUnit, 'Its top speed'),
      ...(cal ? ['Data-sheet WOT rpm'] : []),
    ],
    numeric: [1, 2, 4, 5, 7, 8, ...(cal ? [9] : [])],
    rows: rows.map((u, i) => [
      percentText(u.changePct),
      rpmText(u.wot.speedRpm),
      powerCell(u.wot.powerKw, unit),
      status(u.wot.statusText, isWarning(u.wot.status)),
      u.speedKn === undefined ? '–' : speedText(u.speedKn, speedUnit),
      u.speedGainPct === undefined ? '–' : percentText(u.speedGainPct, { digits: 1 }),
      u.best ? label(u.best.impellerId) : 'none inside the window',
      u.best ? rpmText(u.best.wotRpm) : '–',
      u.best ? speedText(u.best.speedKn, speedUnit) : '–',
      ...(cal ? [dataSheet(r.upgrade[i] ? rpmText(r.upgrade[i].wot.speedRpm) : '–')] : []),
    ]),
    note: 'Columns up to Speed gain: the fitted impeller kept. Best impeller: the one of this jet that takes the most of the new power while its WOT stays inside the window. An engine upgrade moves WOT speed by only about a third of the power change (cube law).',
  };
}

/** The tables of a boat page, in reading order. */
export function boatTables(args: BoatTableArgs): TableView[] {
  const cruise = args.result.cruise.length > 0 ? [cruiseTable(args)] : [];
  return [alternativesTable(args), ...cruise, upgradeTable(args)];
}
