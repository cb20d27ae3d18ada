/** Tables shared by the boat sheets: fitted combination, cruise settings, alternative impellers. */
import type { Boat, PowerUnit, SpeedUnit } from '../data/types.ts';
import { isWarning, toleranceNote, type BoatResult, type CruiseRow } from '../analysis/index.ts';
import { knToKmh, knToMph } from '../units.ts';
import { numberText, powerBothText, powerText, rpmBandText, rpmText } from './kit/format.ts';
import type { Cell, Column } from './kit/table.ts';
import { INK, WARN } from './kit/style.ts';
import { conditionsText } from './words.ts';

const left = (header: string): Column => ({ header, align: 'left' });
const right = (header: string): Column => ({ header, align: 'right' });

/** Fitted combination as item/value rows. */
export function fittedRows(boat: Boat, result: BoatResult, unit: PowerUnit): { columns: Column[]; rows: Cell[][] } {
  const imp = boat.jet.impellers.find((i) => i.id === boat.impellerId);
  return {
    columns: [left('Fitted'), left('')],
    rows: [
      ['Engine', `${boat.engine.label} (${boat.engine.fuel}), max ${rpmText(result.limits.maxRpm)} rpm, WOT window ${rpmText(result.limits.windowLowRpm)}–${rpmText(result.limits.windowHighRpm)} rpm`],
      ['Jet unit', boat.jet.label],
      ['Impeller', `${result.impellerLabel}${imp ? `, rated ${powerText(imp.ratingKw, unit)} at ${rpmText(boat.jet.family.referenceSpeedRpm)} rpm ± ${boat.jet.family.tolerancePct} %` : ''}`],
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
  needsSpeedModel: 'needs a speed estimate (not yet computed)',
};

/** Boat speed in the site's unit, whole numbers (estimates: a decimal would claim too much). */
export function speedText(speedKn: number, unit: SpeedUnit): string {
  const v = unit === 'mph' ? knToMph(speedKn) : unit === 'km/h' ? knToKmh(speedKn) : speedKn;
  return numberText(v, 0, 'boat speed');
}

/** Column header for estimated speeds: "Speed (kn, est.)". */
export function speedHeader(unit: SpeedUnit, what = 'Speed'): string {
  return `${what} (${unit}, est.)`;
}

/** Cruise settings: what was asked, engine rpm and power, estimated speed and fuel, a note. */
export function cruiseRows(boat: Boat, result: BoatResult, unit: PowerUnit, speedUnit: SpeedUnit = 'kn'): { columns: Column[]; rows: Cell[][] } {
  return {
    columns: [left('Cruise setting'), right('Asked'), right('Engine rpm'), right(`Power (${unit})`), right(speedHeader(speedUnit)), right('Fuel (L/h, est.)'), left('Note')],
    rows: result.cruise.map((row) => [
      row.label,
      cruiseAsked(row, boat, unit),
      row.speedRpm !== undefined ? rpmText(row.speedRpm) : '–',
      row.powerKw !== undefined ? powerText(row.powerKw, unit).replace(` ${unit}`, '') : '–',
      row.speedKn !== undefined ? speedText(row.speedKn, speedUnit) : '–',
      row.fuelLPerH !== undefined ? numberText(row.fuelLPerH, 0, 'fuel flow') : '–',
      CRUISE_NOTES[row.status] || '–',
    ]),
  };
}

/** One sentence on where the speed and fuel estimates come from. */
export function estimatesNote(result: BoatResult): string {
  const e = result.estimates;
  const bsfc = e.bsfcSource === 'engine' ? `${e.bsfcGPerKwh} g/kWh from the engine data` : `a typical ${e.bsfcGPerKwh} g/kWh`;
  return `Speed and fuel are estimates. Speed: Crouch’s planing formula on shaft power and ${Math.round(e.hull.displacementKg)} kg loaded. ${e.hull.note} Fuel: ${bsfc} and ${e.fuelKgPerL} kg/L (typical).`;
}

/** Every impeller of the jet with its predicted WOT band, status and estimated top speed. */
export function alternativeRows(result: BoatResult, unit: PowerUnit, speedUnit: SpeedUnit = 'kn'): { columns: Column[]; rows: Cell[][] } {
  return {
    columns: [left('Impeller'), right('WOT band'), right('Nominal'), right(`Power (${unit})`), right(speedHeader(speedUnit, 'Top')), left('Status'), left('Within tolerance')],
    rows: result.alternatives.map((a) => {
      const b = a.band;
      const warn = isWarning(b.nominal.status);
      const bold = a.fitted === 'yes' ? ('bold' as const) : ('regular' as const);
      return [
        { text: a.fitted === 'yes' ? `${a.label} (fitted)` : a.label, weight: bold },
        { text: rpmBandText(b.low.speedRpm, b.high.speedRpm), weight: bold },
        { text: rpmText(b.nominal.speedRpm), weight: bold },
        { text: powerText(b.nominal.powerKw, unit).replace(` ${unit}`, ''), weight: bold },
        { text: a.topSpeedKn !== undefined ? speedText(a.topSpeedKn, speedUnit) : '–', weight: bold },
        { text: b.nominal.statusText, weight: warn ? 'bold' : bold, colour: warn ? WARN : INK },
        toleranceNote({ nominal: b.nominal.status, low: b.low.status, high: b.high.status }) || '–',
      ];
    }),
  };
}

/** "Predicted WOT 5070 rpm (4910–5220 rpm), 154 kW (207 hp): Good match". */
export function wotHeadline(result: BoatResult, unit: PowerUnit): string {
  const b = result.wot;
  return `Predicted WOT ${rpmText(b.nominal.speedRpm)} rpm (band ${rpmBandText(b.low.speedRpm, b.high.speedRpm)}), ${powerBothText(b.nominal.powerKw, unit)}: ${b.nominal.statusText}`;
}
