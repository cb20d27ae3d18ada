/**
 * Tables shared by the boat sheets: fitted combination, cruise settings, alternative impellers. A boat with
 * usable sea trials gets its figures on the calibrated model first and the data-sheet figure beside them in
 * a narrower, softer column, so the difference is visible.
 */
import type { Boat, PowerUnit, SpeedUnit } from '../data/types.ts';
import { isWarning, toleranceNote, type BandResult, type BoatResult, type CruiseRow } from '../analysis/index.ts';
import { knToKmh, knToMph } from '../units.ts';
import { numberText, powerBothText, powerText, rpmBandText, rpmText } from './kit/format.ts';
import type { Cell, Column } from './kit/table.ts';
import { INK, INK_SOFT, WARN } from './kit/style.ts';
import { conditionsText } from './words.ts';

const left = (header: string): Column => ({ header, align: 'left' });
const right = (header: string): Column => ({ header, align: 'right' });
/** A text column that may wrap onto more lines when the table is too wide. */
const words = (header: string): Column => ({ header, align: 'left', wrap: true });

/** Fitted combination as item/value rows. */
export function fittedRows(boat: Boat, result: BoatResult, unit: PowerUnit): { columns: Column[]; rows: Cell[][] } {
  const imp = boat.jet.impellers.find((i) => i.id === boat.impellerId);
  return {
    columns: [words('Fitted'), words('')],
    rows: [
      ['Engine', `${boat.engine.label} (${boat.engine.fuel}), max ${rpmText(result.limits.maxRpm)} rpm, WOT window ${rpmText(result.limits.windowLowRpm)}–${rpmText(result.limits.windowHighRpm)} rpm`],
      ['Jet unit, impeller', `${boat.jet.label}, impeller ${result.impellerLabel}${imp ? ` rated ${powerText(imp.ratingKw, unit)} at ${rpmText(boat.jet.family.referenceSpeedRpm)} rpm ± ${boat.jet.family.tolerancePct} %` : ''}`],
      ['Conditions', conditionsText(result.conditions)],
    ],
  };
}

function cruiseAsked(row: CruiseRow, boat: Boat, unit: PowerUnit): string {
  const setting = boat.cruise.find((c) => c.label === row.label);
  if (!setting) return '–';
  if (setting.kind === 'power') return powerText(setting.powerKw, unit);
  if (setting.kind === 'rpm') return `${rpmText(setting.speedRpm)} rpm`;
  return `${numberText(setting.speedKn, 1, 'cruise speed')} kn`;
}

const CRUISE_NOTES: Readonly<Record<CruiseRow['status'], string>> = {
  ok: '',
  aboveWot: 'more than WOT: not reachable',
  belowPlaning: 'below planing speed: not estimated',
  needsSpeedModel: 'needs a speed estimate (not yet computed)',
};

/** What the note column says of a cruise row: why a figure is missing, or '–'. */
function cruiseNote(row: CruiseRow): string {
  if (row.status === 'ok' && row.speedBasis === 'belowPlaning') return 'below planing speed: speed not estimated';
  return CRUISE_NOTES[row.status] || '–';
}

/** Boat speed in the site's unit, whole numbers (estimates: a decimal would claim too much). */
export function speedText(speedKn: number, unit: SpeedUnit): string {
  const v = unit === 'mph' ? knToMph(speedKn) : unit === 'km/h' ? knToKmh(speedKn) : speedKn;
  return numberText(v, 0, 'boat speed');
}

/** Distance unit that goes with a speed unit: nautical miles with knots, statute miles with mph, km with km/h. */
export function distanceUnit(unit: SpeedUnit): 'nm' | 'mi' | 'km' {
  return unit === 'mph' ? 'mi' : unit === 'km/h' ? 'km' : 'nm';
}

/** A range given in nautical miles, in the distance unit of the speed unit, whole numbers. */
export function distanceText(nm: number, unit: SpeedUnit): string {
  // 1 nm = 1852 m exactly; per hour the same factors as the speed conversions (NIST SP 811).
  const v = unit === 'mph' ? knToMph(nm) : unit === 'km/h' ? knToKmh(nm) : nm;
  return numberText(v, 0, 'range');
}

/** Column header for estimated speeds: "Speed (kn, est.)". */
export function speedHeader(unit: SpeedUnit, what = 'Speed'): string {
  return `${what} (${unit}, est.)`;
}

/** A data-sheet figure printed beside a calibrated one: softer ink, never bold. */
const soft = (text: string): Cell => ({ text, colour: INK_SOFT });
/** Header of the data-sheet columns. */
export const DATA_SHEET_HEADER = 'Data sheet';

/** Most trial dates listed one by one; more are given as a count and a date range. */
const MAX_LISTED_DATES = 3;

/** "sea trials of 2026-03-14, 2026-03-21" (or "6 sea trials, 2026-04-10 to 2026-04-15"), '' without a calibration. */
export function trialDatesText(result: BoatResult): string {
  const dates = [...(result.calibrated?.calibration.trialDates ?? [])].sort();
  if (dates.length === 0) return '';
  if (dates.length > MAX_LISTED_DATES) return `${dates.length} sea trials, ${dates[0]} to ${dates[dates.length - 1]}`;
  return `sea trial${dates.length > 1 ? 's' : ''} of ${dates.join(', ')}`;
}

/** Cruise settings: what was asked, engine rpm (calibrated, with the data-sheet rpm where it differs) and power, estimated speed and fuel, a note. */
export function cruiseRows(boat: Boat, result: BoatResult, unit: PowerUnit, speedUnit: SpeedUnit = 'kn'): { columns: Column[]; rows: Cell[][]; sameRpmAsDataSheet: boolean } {
  const shown = result.calibrated?.cruise ?? result.cruise;
  // The data-sheet column earns its room only where calibration moved a printed rpm (a fitted engine factor
  // alone leaves every cruise rpm where it was: the impeller's law sets rpm at a given power).
  const rpmOf = (row: CruiseRow) => (row.speedRpm !== undefined ? rpmText(row.speedRpm) : '–');
  const cal = shown !== result.cruise && shown.some((row, i) => rpmOf(row) !== rpmOf(result.cruise[i]));
  // With a tank: time and range keeping the boat's reserve (the heading names it).
  const range = shown.some((row) => row.rangeWithReserveNm !== undefined);
  return {
    sameRpmAsDataSheet: shown !== result.cruise && !cal,
    columns: [
      { ...words('Cruise setting'), shorten: true },
      right('Asked'),
      right('Engine rpm'),
      ...(cal ? [{ ...right(DATA_SHEET_HEADER), optional: true }] : []),
      right(`Power (${unit})`),
      right(speedHeader(speedUnit)),
      right('Fuel (L/h, est.)'),
      ...(range ? [right('Time (h, est.)'), right(`Range (${distanceUnit(speedUnit)}, est.)`)] : []),
      words('Note'),
    ],
    rows: shown.map((row, i) => [
      row.label,
      cruiseAsked(row, boat, unit),
      rpmOf(row),
      ...(cal ? [soft(rpmOf(result.cruise[i]))] : []),
      row.powerKw !== undefined ? powerText(row.powerKw, unit).replace(` ${unit}`, '') : '–',
      row.speedKn !== undefined ? speedText(row.speedKn, speedUnit) : '–',
      row.fuelLPerH !== undefined ? numberText(row.fuelLPerH, 0, 'fuel flow') : '–',
      ...(range ? [row.hoursWithReserve !== undefined ? numberText(row.hoursWithReserve, 1, 'running time') : '–', row.rangeWithReserveNm !== undefined ? distanceText(row.rangeWithReserveNm, speedUnit) : '–'] : []),
      cruiseNote(row),
    ]),
  };
}

/** One sentence on where the speed and fuel estimates come from. */
export function estimatesNote(result: BoatResult): string {
  const e = result.estimates;
  const bsfc = e.bsfcSource === 'engine' ? `${e.bsfcGPerKwh} g/kWh from the engine data` : `a typical ${e.bsfcGPerKwh} g/kWh`;
  const reserve = (result.calibrated?.cruise ?? result.cruise).some((c) => c.rangeWithReserveNm !== undefined) ? ` Time and range keep ${reserveText(result)} of the tank in reserve.` : '';
  return `Speed and fuel are estimates. Speed: Crouch’s planing formula on shaft power and ${Math.round(e.hull.displacementKg)} kg loaded. ${e.hull.note} Fuel: ${bsfc} and ${e.fuelKgPerL} kg/L (typical).${reserve}`;
}

/** The reserve the time and range figures keep: "10 %". */
export function reserveText(result: BoatResult): string {
  return `${numberText(result.estimates.fuelReservePct, result.estimates.fuelReservePct % 1 === 0 ? 0 : 1, 'fuel reserve')} %`;
}

/** A band whose ends share its most likely status, in words. */
const SAME_ACROSS: Readonly<Record<BandResult['nominal']['status'], string>> = {
  matched: 'stays in the window',
  aboveWindow: 'stays above the window',
  belowWindow: 'lugs throughout',
  revLimited: 'over-revs throughout',
  noCrossing: 'no point throughout',
};

/** What the band's ends add to the most likely status, in a technician's words. */
export function acrossBandText(band: BandResult): string {
  const note = toleranceNote({ nominal: band.nominal.status, low: band.low.status, high: band.high.status });
  return note !== '' ? note : SAME_ACROSS[band.nominal.status];
}

/** "Predicted WOT 5070 rpm (band 4910–5220 rpm), 154 kW (207 hp): Good match", or "Calibrated WOT …" on the calibrated model. */
export function wotHeadline(result: BoatResult, unit: PowerUnit): string {
  const b = result.calibrated?.wot ?? result.wot;
  return `${result.calibrated ? 'Calibrated' : 'Predicted'} WOT ${rpmText(b.nominal.speedRpm)} rpm (band ${rpmBandText(b.low.speedRpm, b.high.speedRpm)}), ${powerBothText(b.nominal.powerKw, unit)}: ${b.nominal.statusText}`;
}
