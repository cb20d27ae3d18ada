/**
 * Located data errors: one sentence a technician can act on, naming file, line, column, field,
 * the value found, what was expected and, where it helps, the fix.
 */
import type { DataError } from './types.ts';

/** What a check reports before it is given its place in a file. */
export interface Problem {
  readonly field: string;
  readonly found: string;
  readonly expected: string;
  readonly fix?: string;
}

/** A place in a file, 1-based line and column. */
export interface Place {
  readonly file: string;
  readonly line: number;
  readonly column: number;
}

/** Build the DataError and its printed sentence: "file:line:col field expected, found X — fix". */
export function dataError(place: Place, problem: Problem, detail?: readonly string[]): DataError {
  const subject = problem.field === '' ? 'the file' : problem.field;
  const fix = problem.fix ? ` — ${problem.fix}` : '';
  return {
    ...(detail && detail.length > 0 ? { detail: detail.map(terminalSafe) } : {}),
    file: place.file,
    line: place.line,
    column: place.column,
    field: problem.field,
    found: problem.found,
    expected: problem.expected,
    ...(problem.fix ? { fix: problem.fix } : {}),
    message: terminalSafe(`${place.file}:${place.line}:${place.column} ${subject} ${problem.expected}, found ${problem.found}${fix}`),
  };
}

/** The error as printed: its sentence, then any detail lines (the source line, a caret) indented under it. */
export function printedError(error: DataError): string {
  return error.detail ? [error.message, ...error.detail.map((l) => `    ${l}`)].join('\n') : error.message;
}

/**
 * Characters that must never reach a terminal raw: C0 and C1 controls (ESC sequences can clear the
 * screen or fake an "OK"), DEL, zero-width and bidi-control characters. Our own wording holds none, so
 * escaping the whole sentence treats keys, values and file names alike.
 */
const UNSAFE_FOR_TERMINAL = /[\u0000-\u001f\u007f-\u009f\u00ad\u061c\u180e\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff]/g;

/** text with every terminal-unsafe character written as \\u001b (JSON's spelling), so it shows instead of acting. */
export function terminalSafe(text: string): string {
  return text.replace(UNSAFE_FOR_TERMINAL, (ch) => `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/**
 * A whole output of the command line made terminal-safe: every line through terminalSafe, the line
 * breaks kept, and a carriage return kept only at the very start (the progress line rewrites itself).
 * The last escape before the terminal: whatever user text a message carries (a key, a value, a file or
 * folder name given on the command line), it shows instead of acting. Idempotent on escaped text.
 */
export function terminalText(text: string): string {
  const rewrite = text.startsWith('\r') ? '\r' : '';
  return rewrite + text.slice(rewrite.length).split('\n').map(terminalSafe).join('\n');
}

/** Sort by file, line, column, then message, and drop exact repeats (one variant's fault reported per file once). */
export function sortErrors(errors: readonly DataError[]): DataError[] {
  const seen = new Set<string>();
  const unique = errors.filter((e) => (seen.has(e.message) ? false : (seen.add(e.message), true)));
  return unique.sort(
    (a, b) =>
      compareText(a.file, b.file) || a.line - b.line || a.column - b.column || compareText(a.message, b.message),
  );
}

/** Code-point order, independent of the machine's locale (deterministic output). */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Shorten a found value for a one-line message. */
export function shorten(text: string, maxChars = 48): string {
  const oneLine = text.replace(/\s+/g, ' ').trim();
  return oneLine.length > maxChars ? `${oneLine.slice(0, maxChars - 1)}…` : oneLine;
}

/** Render a JavaScript value the way a technician would recognise it from the file. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'nothing (an empty value)';
  if (typeof value === 'string') return shorten(JSON.stringify(value));
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return '.nan (not a number)';
    if (!Number.isFinite(value)) return value > 0 ? '.inf (infinity)' : '-.inf (minus infinity)';
    return String(value);
  }
  if (value instanceof Uint8Array) return 'binary data (!!binary)';
  if (value instanceof Set) return `a set of ${value.size} ${value.size === 1 ? 'entry' : 'entries'} (!!set)`;
  if (value instanceof Date) return `a timestamp (${Number.isNaN(value.getTime()) ? 'invalid' : value.toISOString()})`;
  if (Array.isArray(value)) return `a list of ${value.length} ${value.length === 1 ? 'entry' : 'entries'}`;
  if (typeof value === 'object') return 'a mapping (key: value lines)';
  return shorten(String(value));
}

/** impellers[2].rating_kw: a field path as a technician reads it (list positions count from 0). */
export function fieldName(path: readonly (string | number)[]): string {
  return path.map((seg, i) => (typeof seg === 'number' ? `[${seg}]` : i === 0 ? seg : `.${seg}`)).join('');
}
