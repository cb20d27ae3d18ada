/**
 * Match statuses in words a technician reads at a glance, for tables, cards and the results JSON.
 * Our own wording; the model's `reason` sentence stays the long explanation.
 */
import type { MatchStatus, OperatingBand } from '../model/index.ts';

/** Short status words for a table cell. */
export const STATUS_WORDS: Readonly<Record<MatchStatus, string>> = Object.freeze({
  matched: 'Good match',
  belowWindow: 'Too heavy: lugs',
  aboveWindow: 'Light: above window',
  revLimited: 'Too light: over-revs',
  noCrossing: 'No operating point',
});

/** What a tolerance corner may do, completing "within tolerance it may …". */
const CORNER_PHRASE: Readonly<Record<MatchStatus, string>> = Object.freeze({
  matched: 'stay in the window',
  belowWindow: 'lug below the window',
  aboveWindow: 'run above the window',
  revLimited: 'over-rev',
  noCrossing: 'leave the engine table',
});

/** True for statuses that must be warned about (engine harmed or limiter reached). */
export function isWarning(status: MatchStatus): boolean {
  return status === 'belowWindow' || status === 'revLimited' || status === 'noCrossing';
}

/** One verdict for a band: the nominal status, plus what the tolerance corners may do when it differs. */
export function bandVerdict(band: OperatingBand): string {
  const note = toleranceNote({ nominal: band.nominal.status, low: band.lowRpm.status, high: band.highRpm.status });
  const nominal = STATUS_WORDS[band.nominal.status];
  return note === '' ? nominal : `${nominal}; within tolerance it ${note}`;
}

/** The most serious status in a band, for colouring and sorting (over-rev first, then lugging). */
export function worstStatus(band: OperatingBand): MatchStatus {
  const order: readonly MatchStatus[] = ['revLimited', 'noCrossing', 'belowWindow', 'aboveWindow', 'matched'];
  const present = [band.nominal.status, band.lowRpm.status, band.highRpm.status];
  return order.find((s) => present.includes(s)) ?? band.nominal.status;
}

/** What the tolerance corners add to the nominal status ("may over-rev"), or "" when they agree. */
export function toleranceNote(statuses: { nominal: MatchStatus; low: MatchStatus; high: MatchStatus }): string {
  const others = [statuses.low, statuses.high].filter((s, i, all) => s !== statuses.nominal && all.indexOf(s) === i);
  return others.length === 0 ? '' : `may ${others.map((s) => CORNER_PHRASE[s]).join(' or ')}`;
}
