/**
 * One trial added at the end of a boat's log (matchbook add-trial): the row written by csv-stringify in
 * the log's own line ends after the bytes already there, which stay as they are; a new log gets the
 * header row first. The caller checks the result with the loader before writing it (same rules as
 * every row) and writes it with writeFileAtomic.
 */
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { LOG_COLUMNS, type LogColumn } from './trialLog.ts';

export interface AppendedLog {
  readonly text: string;
  /** Line of the new row in text (1-based). */
  readonly line: number;
}

/** existing: the log's text, undefined when there is none yet; cells: the new trial by column. */
export function appendTrialRow(args: { existing: string | undefined; cells: Partial<Record<LogColumn, string>> }): AppendedLog {
  const existing = args.existing;
  const eol = existing !== undefined && /\r\n/.test(existing) ? '\r\n' : '\n';
  const header = existing === undefined ? [...LOG_COLUMNS] : headerOf(existing);
  const known = header.filter((h): h is LogColumn => (LOG_COLUMNS as readonly string[]).includes(h));
  const missing = (Object.keys(args.cells) as LogColumn[]).filter((c) => args.cells[c] !== undefined && !known.includes(c));
  if (missing.length > 0) throw new MissingColumnsError(missing);
  const row = stringify([header.map((h) => args.cells[h as LogColumn] ?? '')], { record_delimiter: eol === '\r\n' ? 'windows' : 'unix', quoted_match: /[\r\n]/ });
  if (existing === undefined) {
    const head = stringify([header], { record_delimiter: 'unix' });
    return { text: head + row, line: 2 };
  }
  const base = existing === '' || /\n$/.test(existing) ? existing : existing + eol;
  return { text: base + row, line: base.split('\n').length };
}

/** The log has no column for a value the command was given. */
export class MissingColumnsError extends Error {
  constructor(readonly columns: readonly LogColumn[]) {
    super(`the log has no column ${columns.join(', ')}`);
  }
}

/** The header row's cell names (the first line that is not a comment or empty). */
function headerOf(text: string): string[] {
  const [head] = parse(text, { bom: true, comment: '#', comment_no_infix: true, skip_empty_lines: true, relax_column_count: true, to: 1 }) as string[][];
  return (head ?? []).map((c) => c.trim());
}
