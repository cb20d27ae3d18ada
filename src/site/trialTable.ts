/**
 * A boat's sea trials on its page: each trial's measured WOT rpm against the calibrated model, the
 * effective impeller rating against the published one and the family tolerance, and what the trials
 * calibrated, in sentences. Only boats with usable trials get either.
 */
import type { BoatResult, TrialRow } from '../analysis/index.ts';
import { numberText, percentText } from '../sheets/kit/format.ts';
import { calibrationText, exactRpmText, RESIDUAL_HEADER } from '../sheets/trialTables.ts';
import type { CalibrationView, CellView, TableView } from './siteView.ts';

const TRIAL_NOTES: Readonly<Record<string, string>> = {
  measured: '',
  atLimiter: 'At the limiter: the rating is an upper bound',
  offCurve: 'Rpm outside the engine table',
};

/** "+6", "−6", "0": model − measured from the two printed (whole-rpm) figures, so a reader's subtraction agrees. */
export function residualText(t: Pick<TrialRow, 'predictedRpm' | 'wotRpm'>): string {
  const residual = Math.round(t.predictedRpm) - Math.round(t.wotRpm);
  return `${residual > 0 ? '+' : residual < 0 ? '−' : ''}${numberText(Math.abs(residual), 0, 'residual')}`;
}

function insideCell(t: TrialRow): CellView {
  if (t.deviationPct === undefined) return '–';
  return t.insideTolerance === 'yes' ? 'yes' : { text: 'no', mark: 'warn' };
}

function noteCell(t: TrialRow): string {
  const notes = [TRIAL_NOTES[t.status] ?? t.status, t.usedInFit === 'yes' ? '' : 'Not used in the fit'];
  if (t.speedKn !== undefined) notes.push(`${numberText(t.speedKn, 1, 'trial speed')} kn logged`);
  return notes.filter((n) => n !== '').join('; ') || '–';
}

/** Every sea trial of a calibrated boat, in date order. */
function trialTable(result: BoatResult, tolerancePct: number): TableView {
  const trials = result.calibrated?.calibration.trials ?? [];
  const label = (id: string) => result.alternatives.find((a) => a.impellerId === id)?.label ?? id;
  const ordered = [...trials].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  return {
    caption: `Sea trials: measured WOT rpm against the model calibrated to them`,
    head: ['Date', 'Impeller', 'Measured rpm', 'Model rpm', `${RESIDUAL_HEADER} (rpm)`, 'Rating vs nominal', `Rating inside ± ${tolerancePct} %`, 'Note'],
    numeric: [2, 3, 4, 5],
    rows: ordered.map((t) => [
      t.date,
      label(t.impellerId),
      exactRpmText(t.wotRpm),
      exactRpmText(t.predictedRpm),
      residualText(t),
      t.deviationPct === undefined ? '–' : percentText(t.deviationPct, { digits: 1 }),
      insideCell(t),
      noteCell(t),
    ]),
    note: 'Rating vs nominal: the impeller rating that makes the engine settle at the measured rpm in that trial’s water and air, against the published rating. Rpm to 1 rpm here so the difference column adds up.',
  };
}

/** The sea trials, what they calibrated and what the calibrated bands cover; why they were refused; null for a boat without trials. */
export function calibrationView(result: BoatResult, tolerances: { impellerPct: number; enginePct: number }): CalibrationView | null {
  const cal = result.calibrated;
  if (!cal && result.trialsNotUsed) return { heading: 'Sea trials not used', paragraphs: [result.trialsNotUsed] };
  if (!cal) return null;
  return {
    heading: 'Sea trials and calibration',
    trials: trialTable(result, tolerances.impellerPct),
    paragraphs: [
      calibrationText(result),
      cal.bandNote,
      `The data-sheet band covers impeller rating ± ${tolerances.impellerPct} % and engine power ± ${tolerances.enginePct} %.`,
    ],
  };
}
