/** Sea-trial table and calibration sentence for the boat sheets (shown only when the boat has trials). */
import type { BoatResult } from '../analysis/index.ts';
import { numberText, percentText } from './kit/format.ts';
import { INK, WARN } from './kit/style.ts';
import type { Cell, Column } from './kit/table.ts';

const left = (header: string): Column => ({ header, align: 'left' });
const right = (header: string): Column => ({ header, align: 'right' });
const words = (header: string): Column => ({ header, align: 'left', wrap: true });

const TRIAL_STATUS: Readonly<Record<string, string>> = {
  measured: '',
  atLimiter: 'at limiter: rating is an upper bound',
  offCurve: 'rpm outside the engine table',
};

/** Most trials a boat sheet lists (the latest by date); the calibration still uses all of them. */
export const MAX_TRIAL_ROWS = 4;

/** Engine speed to 1 rpm, the precision of the trial table, so its residual column adds up from what is printed. */
export function exactRpmText(speedRpm: number): string {
  return numberText(Math.round(speedRpm), 0, 'engine speed');
}

/** Header of the residual column: the sign convention the numbers follow. */
export const RESIDUAL_HEADER = 'Model − measured';

/** One row per sea trial (the latest few): measured and calibrated-model WOT rpm to 1 rpm, their difference, effective rating against nominal. */
export function trialRows(result: BoatResult, tolerancePct: number, opts: { maxRows?: number } = {}): { columns: Column[]; rows: Cell[][]; hidden: number } {
  const all = result.calibrated?.calibration.trials ?? [];
  // Latest first by ISO date, then keep the table's order chronological.
  const trials = [...all].sort((a, b) => (a.date < b.date ? 1 : a.date > b.date ? -1 : 0)).slice(0, opts.maxRows ?? MAX_TRIAL_ROWS).reverse();
  return {
    hidden: all.length - trials.length,
    columns: [left('Trial'), words('Impeller'), right('Measured WOT'), right('Calibrated model'), right(RESIDUAL_HEADER), right('Rating vs nominal'), words(`Rating within ± ${tolerancePct} %`)],
    rows: trials.map((t) => {
      const off = t.insideTolerance === 'no' && t.deviationPct !== undefined;
      // The residual is taken from the two printed (rounded) figures, so a reader's subtraction always agrees.
      const residual = Math.round(t.predictedRpm) - Math.round(t.wotRpm);
      return [
        t.date,
        result.alternatives.find((a) => a.impellerId === t.impellerId)?.label ?? t.impellerId,
        `${exactRpmText(t.wotRpm)} rpm`,
        `${exactRpmText(t.predictedRpm)} rpm`,
        `${residual > 0 ? '+' : residual < 0 ? '−' : ''}${numberText(Math.abs(residual), 0, 'residual')} rpm`,
        t.deviationPct !== undefined ? percentText(t.deviationPct, { digits: 1 }) : '–',
        TRIAL_STATUS[t.status] || { text: off ? 'no' : 'yes', weight: off ? 'bold' : 'regular', colour: off ? WARN : INK },
      ];
    }),
  };
}

/** "Calibrated to the sea trials of …": what was fitted, caveats. */
export function calibrationText(result: BoatResult): string {
  const cal = result.calibrated;
  if (!cal) return '';
  const c = cal.calibration;
  const se = (v: number | undefined, d: number) => (v === undefined ? '' : ` ± ${numberText(v, d, 'standard error')}`);
  const k = `exponent ${numberText(c.exponent, 2, 'exponent')}${se(c.exponentSe, 2)}`;
  const factor = `engine power factor ${numberText(c.powerFactor, 3, 'power factor')}${se(c.powerFactorSe, 3)}`;
  const fittedWhat =
    c.mode === 'conditionOnly' ? `${factor} fitted, ${k} kept from the jet data`
    : c.mode === 'exponentAndCondition' ? `${k} and ${factor} fitted`
    : c.mode === 'exponentAndRatings' ? `${k} and the tried impellers’ ratings fitted (${c.ratingFactors.map((r) => `${r.impellerId} ×${numberText(r.factor, 3, 'rating factor')}`).join(', ')})`
    : 'nothing fitted';
  const dates = c.trialDates.length > 0 ? c.trialDates.join(', ') : 'none usable';
  return `Calibrated to the sea trials of ${dates}: ${fittedWhat}. ${c.notes.join(' ')}`.trim();
}
