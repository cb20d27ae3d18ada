/** Tables shared by the boat sheets: fitted combination, cruise settings, alternative impellers. */
import type { Boat, PowerUnit } from '../data/types.ts';
import { isWarning, toleranceNote, type BoatResult, type CruiseRow } from '../analysis/index.ts';
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

/** Cruise settings: what was asked, engine rpm and power, a note. */
export function cruiseRows(boat: Boat, result: BoatResult, unit: PowerUnit): { columns: Column[]; rows: Cell[][] } {
  return {
    columns: [left('Cruise setting'), right('Asked'), right('Engine rpm'), right(`Power (${unit})`), left('Note')],
    rows: result.cruise.map((row) => [
      row.label,
      cruiseAsked(row, boat, unit),
      row.speedRpm !== undefined ? rpmText(row.speedRpm) : '–',
      row.powerKw !== undefined ? powerText(row.powerKw, unit).replace(` ${unit}`, '') : '–',
      CRUISE_NOTES[row.status] || '–',
    ]),
  };
}

/** Every impeller of the jet with its predicted WOT band and status. */
export function alternativeRows(result: BoatResult, unit: PowerUnit): { columns: Column[]; rows: Cell[][] } {
  return {
    columns: [left('Impeller'), right('WOT band'), right('Nominal'), right(`Power (${unit})`), left('Status'), left('Within tolerance')],
    rows: result.alternatives.map((a) => {
      const b = a.band;
      const warn = isWarning(b.nominal.status);
      const bold = a.fitted === 'yes' ? ('bold' as const) : ('regular' as const);
      return [
        { text: a.fitted === 'yes' ? `${a.label} (fitted)` : a.label, weight: bold },
        { text: rpmBandText(b.low.speedRpm, b.high.speedRpm), weight: bold },
        { text: rpmText(b.nominal.speedRpm), weight: bold },
        { text: powerText(b.nominal.powerKw, unit).replace(` ${unit}`, ''), weight: bold },
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
