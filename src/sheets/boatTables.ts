/**
 * Tables shared by the boat sheets: fitted combination, cruise settings, alternative impellers. A boat with
 * usable sea trials gets its figures on the calibrated model first and the data-sheet figure beside them in
 * a narrower, softer column, so the difference is visible.
 */
import type { Boat, FuelUnit, PowerUnit, SiteConfig, SpeedUnit } from '../data/types.ts';
import { isWarning, toleranceNote, type BandResult, type BoatResult, type CruiseRow } from '../analysis/index.ts';
import { knToKmh, knToMph, litresToImpGal, litresToUsGal } from '../units.ts';
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

/** A cruise setting as the boat file asks it: "105 kW", "3400 rpm", "32 kn" ('–' when the row's setting is gone). */
export function cruiseAsked(row: CruiseRow, boat: Boat, unit: PowerUnit, speedUnit: SpeedUnit): string {
  const setting = boat.cruise.find((c) => c.label === row.label);
  if (!setting) return '–';
  if (setting.kind === 'power') return powerText(setting.powerKw, unit);
  if (setting.kind === 'rpm') return `${rpmText(setting.speedRpm)} rpm`;
  return `${askedSpeedText(setting, speedUnit)} ${speedUnit}`;
}

/**
 * A cruise speed as asked, in a unit: the number as typed when the unit is the one it was typed in (28 mph
 * stays "28"), else converted to a tenth.
 */
export function askedSpeedText(setting: { speedKn: number; typed?: { value: number; unit: SpeedUnit } }, unit: SpeedUnit): string {
  if (setting.typed?.unit === unit) return String(setting.typed.value);
  const v = unit === 'mph' ? knToMph(setting.speedKn) : unit === 'km/h' ? knToKmh(setting.speedKn) : setting.speedKn;
  return numberText(v, 1, 'cruise speed');
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

/** Boat speed in the site's unit, whole numbers (estimates: a decimal would claim too much); with a second unit, "29 (25)". */
export function speedText(speedKn: number, unit: SpeedUnit, also?: SpeedUnit): string {
  const one = (u: SpeedUnit) => numberText(u === 'mph' ? knToMph(speedKn) : u === 'km/h' ? knToKmh(speedKn) : speedKn, 0, 'boat speed');
  return also && also !== unit ? `${one(unit)} (${one(also)})` : one(unit);
}

/** A speed with its unit: "29 mph", or with a second unit in brackets "29 mph (25 kn)". */
export function speedWithUnit(speedKn: number, unit: SpeedUnit, also?: SpeedUnit): string {
  return also && also !== unit ? `${speedText(speedKn, unit)} ${unit} (${speedText(speedKn, also)} ${also})` : `${speedText(speedKn, unit)} ${unit}`;
}

/** Fuel flow in the sheet's unit: whole litres an hour, gallons an hour to a tenth. */
export function fuelText(litresPerHour: number, unit: FuelUnit): string {
  if (unit === 'L/h') return numberText(litresPerHour, 0, 'fuel flow');
  return numberText(unit === 'US gal/h' ? litresToUsGal(litresPerHour) : litresToImpGal(litresPerHour), 1, 'fuel flow');
}

/** "about 67 L of fuel an hour", "about 17.7 US gallons of fuel an hour". */
export function fuelWords(litresPerHour: number, unit: FuelUnit): string {
  const words = unit === 'L/h' ? 'L' : unit === 'US gal/h' ? 'US gallons' : 'imperial gallons';
  return `about ${fuelText(litresPerHour, unit)} ${words} of fuel an hour`;
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
export function speedHeader(unit: SpeedUnit, what = 'Speed', also?: SpeedUnit): string {
  return also && also !== unit ? `${what}, ${unit} (${also}), est.` : `${what} (${unit}, est.)`;
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
export function cruiseRows(boat: Boat, result: BoatResult, unit: PowerUnit, speedUnit: SpeedUnit = 'kn', units: Pick<SiteConfig, 'speedAlso' | 'fuelUnit'> = { fuelUnit: 'L/h' }): { columns: Column[]; rows: Cell[][]; sameRpmAsDataSheet: boolean } {
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
      right(speedHeader(speedUnit, 'Speed', units.speedAlso)),
      right(`Fuel (${units.fuelUnit}, est.)`),
      ...(range ? [right('Time (h, est.)'), right(`Range (${distanceUnit(speedUnit)}, est.)`)] : []),
      words('Note'),
    ],
    rows: shown.map((row, i) => [
      row.label,
      cruiseAsked(row, boat, unit, speedUnit),
      rpmOf(row),
      ...(cal ? [soft(rpmOf(result.cruise[i]))] : []),
      row.powerKw !== undefined ? powerText(row.powerKw, unit).replace(` ${unit}`, '') : '–',
      row.speedKn !== undefined ? speedText(row.speedKn, speedUnit, units.speedAlso) : '–',
      row.fuelLPerH !== undefined ? fuelText(row.fuelLPerH, units.fuelUnit) : '–',
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
  return reservePctText(result.estimates.fuelReservePct);
}

/** A reserve share as printed: "10 %", "12.5 %". */
export function reservePctText(pct: number): string {
  return `${numberText(pct, pct % 1 === 0 ? 0 : 1, 'fuel reserve')} %`;
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
