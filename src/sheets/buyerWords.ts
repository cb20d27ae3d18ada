/**
 * A spec sheet's words for a buyer: the answer first (top speed, full-throttle rpm and whether the
 * impeller suits the engine, cruise speed and fuel), each other impeller of the jet in plain words
 * against the fitted one, and the working (tolerances, calibration statistics, sources) in one short
 * technical note. Wording of our own, for a reader with no engineering training.
 */
import type { BandResult, BoatResult, CruiseRow, MatchStatus } from '../analysis/index.ts';
import type { SiteConfig, SpeedUnit } from '../data/types.ts';
import { numberText, rpmBandText, rpmText } from './kit/format.ts';
import type { Cell, Column } from './kit/table.ts';
import { INK, WARN } from './kit/style.ts';
import { isWarning } from '../analysis/index.ts';
import { distanceText, distanceUnit, estimatesNote, fuelWords, reserveText, speedHeader, speedText, speedWithUnit, trialDatesText } from './boatTables.ts';
import { calibrationText } from './trialTables.ts';

/** Whether an impeller suits the engine, in a buyer's words (completes "Impeller X …"). */
const SUITS: Readonly<Record<MatchStatus, string>> = {
  matched: 'suits this engine',
  aboveWindow: 'is a little light for this engine',
  belowWindow: 'is too heavy for this engine',
  revLimited: 'is too light for this engine',
  noCrossing: 'does not work with this engine',
};

/** Where full-throttle rpm lands against the engine's range, in a buyer's words. */
export const LANDS: Readonly<Record<MatchStatus, string>> = {
  matched: 'in the recommended range',
  aboveWindow: 'above the recommended range',
  belowWindow: 'below the recommended range: the engine labours',
  revLimited: 'at the rev limit: the engine over-revs',
  noCrossing: 'no steady full-throttle speed',
};

/** "38 kn". */

/** The fitted impeller's figures as the sheet shows them (calibrated first). */
function fittedFigures(result: BoatResult): { band: BandResult; topKn?: number } {
  const fitted = result.alternatives.find((a) => a.fitted === 'yes');
  return { band: result.calibrated?.wot ?? result.wot, topKn: fitted?.calibratedTopSpeedKn ?? fitted?.topSpeedKn };
}

/** The sheet's answer: a headline (top speed and full-throttle rpm) and lines on the match and on cruising. */
export function buyerAnswer(result: BoatResult, speedUnit: SpeedUnit, units: Pick<SiteConfig, 'speedAlso' | 'fuelUnit'> = { fuelUnit: 'L/h' }): { headline: string; match: string; cruise: string } {
  const { band, topKn } = fittedFigures(result);
  const n = band.nominal;
  const top = topKn !== undefined ? `Top speed about ${speedWithUnit(topKn, speedUnit, units.speedAlso)}` : 'Top speed not estimated';
  const headline = `${top} at full throttle, ${rpmText(n.speedRpm)} rpm`;
  const range = `${rpmText(result.limits.windowLowRpm)}–${rpmText(result.limits.windowHighRpm)} rpm`;
  const on = result.calibrated ? ` (calibrated to ${trialDatesText(result)})` : '';
  const match = `Impeller ${result.impellerLabel} ${SUITS[n.status]}: full throttle should settle between ${rpmBandText(band.low.speedRpm, band.high.speedRpm)}${on}, ${LANDS[n.status]} (${range}; never above ${rpmText(result.limits.maxRpm)} rpm).`;
  return { headline, match, cruise: cruiseLine(result.calibrated?.cruise ?? result.cruise, speedUnit, reserveText(result), units) };
}

/** One sentence on cruising: the fastest cruise setting with an estimated speed, or why none has one. */
function cruiseLine(rows: readonly CruiseRow[], unit: SpeedUnit, reservePct: string, units: Pick<SiteConfig, 'speedAlso' | 'fuelUnit'>): string {
  const usable = rows.filter((r) => r.status === 'ok' && r.speedKn !== undefined && r.speedRpm !== undefined);
  const best = usable.sort((a, b) => b.speedKn! - a.speedKn!)[0];
  if (best) {
    const fuel = best.fuelLPerH !== undefined ? `, ${fuelWords(best.fuelLPerH, units.fuelUnit)}` : '';
    const range = best.rangeWithReserveNm !== undefined && best.hoursWithReserve !== undefined ? `; a tank lasts about ${numberText(best.hoursWithReserve, 1, 'running time')} hours, about ${distanceText(best.rangeWithReserveNm, unit)} ${distanceUnit(unit)}, keeping ${reservePct} in reserve` : '';
    return `Cruising (${best.label}): about ${speedWithUnit(best.speedKn!, unit, units.speedAlso)} at ${rpmText(best.speedRpm!)} rpm${fuel}${range}.`;
  }
  if (rows.length === 0) return '';
  return 'Cruising: every cruise setting of this boat is below planing speed, where no speed is estimated.';
}

/** "one step heavier", "two steps lighter" (steps between impellers of the jet by rating). */
function stepsText(steps: number): string {
  const n = Math.abs(steps);
  const count = ['', 'one step', 'two steps', 'three steps', 'four steps', 'five steps'][n] ?? `${n} steps`;
  return `${count} ${steps > 0 ? 'heavier' : 'lighter'}`;
}

/** "about 150 rpm lower" against the fitted impeller's most likely rpm (rounded to 10 rpm). */
function rpmChangeText(deltaRpm: number): string {
  const d = Math.round(Math.abs(deltaRpm) / 10) * 10;
  if (d < 20) return 'about the same rpm';
  return `about ${d} rpm ${deltaRpm > 0 ? 'higher' : 'lower'}`;
}

/** Each impeller of the jet against the fitted one, in plain words ("one step heavier: about 150 rpm lower, in the recommended range"). */
export function alternativeWords(result: BoatResult): { impellerId: string; label: string; fitted: boolean; words: string; rpm: number; topKn?: number; status: MatchStatus }[] {
  const byRating = [...result.alternatives].sort((a, b) => a.ratingKw - b.ratingKw);
  const fittedAt = byRating.findIndex((a) => a.fitted === 'yes');
  const fitted = byRating[fittedAt];
  const fittedRpm = (fitted?.calibratedBand ?? fitted?.band)?.nominal.speedRpm;
  return result.alternatives.map((a) => {
    const b = (a.calibratedBand ?? a.band).nominal;
    const base = { impellerId: a.impellerId, label: a.label, rpm: b.speedRpm, topKn: a.calibratedTopSpeedKn ?? a.topSpeedKn, status: b.status };
    if (a.fitted === 'yes' || fittedRpm === undefined) return { ...base, fitted: a.fitted === 'yes', words: a.fitted === 'yes' ? `fitted: ${LANDS[b.status]}` : LANDS[b.status] };
    const steps = byRating.indexOf(a) - fittedAt;
    const still = b.status === 'matched' && (fitted.calibratedBand ?? fitted.band).nominal.status === 'matched' ? 'still in the recommended range' : LANDS[b.status];
    return { ...base, fitted: false, words: `${stepsText(steps)}: ${rpmChangeText(b.speedRpm - fittedRpm)}, ${still}` };
  });
}

/** The technical note printed small at the end: what the rpm band covers, the calibration's statistics, the estimates' sources. */
export function technicalNote(result: BoatResult, tolerances: { impellerPct: number; enginePct: number }, opts: { compact: boolean }): string {
  const planing = `Below about ${numberText(result.estimates.hull.planingFromKn, 0, 'planing speed')} kn this hull is not taken as planing, so no speed is estimated there.`;
  if (opts.compact) {
    const dates = result.calibrated ? `Calibrated to the sea trials of ${result.calibrated.calibration.trialDates.join(', ')}. ` : '';
    return `Technical note. ${dates}Figures are estimates from a physical model; the working is on this boat's page of the site. ${result.estimates.hull.note} ${planing}`;
  }
  const covers = `impeller rating ± ${tolerances.impellerPct} % and engine power ± ${tolerances.enginePct} %`;
  const band = result.calibrated ? `${result.calibrated.bandNote} The data-sheet range covers ${covers}.` : `The full-throttle range covers ${covers}.`;
  const cal = result.calibrated ? ` ${calibrationText(result)}` : '';
  return `Technical note. ${band}${cal} ${estimatesNote(result)} ${planing}`;
}

/** The other impellers as a table: each in plain words against the fitted one, its full-throttle rpm and top speed. */
export function otherImpellerRows(result: BoatResult, speedUnit: SpeedUnit, also?: SpeedUnit): { columns: Column[]; rows: Cell[][] } {
  return {
    columns: [
      { header: 'Impeller', align: 'left', wrap: true },
      { header: 'Against the fitted one', align: 'left', wrap: true },
      { header: 'Full throttle (rpm)', align: 'right' },
      { header: speedHeader(speedUnit, 'Top', also), align: 'right' },
    ],
    rows: alternativeWords(result).map((a) => {
      const weight = a.fitted ? ('bold' as const) : ('regular' as const);
      const warn = isWarning(a.status);
      return [
        { text: a.fitted ? `${a.label} (fitted)` : a.label, weight },
        { text: a.words, weight: warn ? 'bold' : weight, colour: warn ? WARN : INK },
        { text: rpmText(a.rpm), weight },
        { text: a.topKn !== undefined ? speedText(a.topKn, speedUnit, also) : '–', weight },
      ];
    }),
  };
}
