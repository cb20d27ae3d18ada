/**
 * A boat's sea-trial log (docs/data-format.md, "Sea-trial log"): boats/<boat id>.trials.csv beside the
 * boat file, comma-separated, a header row naming the columns, one trial a row, any number of "#"
 * comment lines before the header. csv-parse reads the records; each row then passes the same schema as
 * a trial in the boat file (schema/boat.ts, trialRecord), so both forms obey one set of rules, and every
 * problem names the file, the line (the spreadsheet's row), the column and the column's name.
 */
import { parse, CsvError } from 'csv-parse/sync';
import { didYouMean } from './closest.ts';
import { dataError, shorten, type Place } from './errors.ts';
import { lfLineBreaks } from './lineBreaks.ts';
import { trialRecord, type RawTrial } from './schema/boat.ts';
import type { DataError } from './types.ts';
import { validate } from './validate.ts';
import type { Located, PathSegment, YamlSource } from './yamlSource.ts';

/** The columns a log may have, in the order the add-trial command writes them. */
export const LOG_COLUMNS = ['date', 'impeller', 'wot_rpm', 'speed_kn', 'load_kg', 'air_temp_c', 'humidity_pct', 'pressure_hpa', 'altitude_m', 'water', 'recorded_by', 'notes'] as const;
export type LogColumn = (typeof LOG_COLUMNS)[number];
export const REQUIRED_LOG_COLUMNS: readonly LogColumn[] = ['date', 'impeller', 'wot_rpm'];
const NUMBER_COLUMNS: ReadonlySet<LogColumn> = new Set(['wot_rpm', 'speed_kn', 'load_kg', 'air_temp_c', 'humidity_pct', 'pressure_hpa', 'altitude_m']);
/** Columns that sit under conditions: in a boat file's trial. */
const CONDITION_COLUMNS: ReadonlySet<LogColumn> = new Set(['air_temp_c', 'humidity_pct', 'pressure_hpa', 'altitude_m']);
/** Rows a log may hold: some decades of trials (a bound, so a pasted-in export cannot swamp the build). */
export const MAX_LOG_ROWS = 2000;

/** The log that belongs beside a boat file: boats/reedshank.yaml → boats/reedshank.trials.csv. */
export function trialLogPath(boatFile: string): string {
  return boatFile.replace(/\.yaml$/, '.trials.csv');
}

/** One row of the log that passed the trial schema, with where its cells are. */
export interface LogRow {
  readonly line: number;
  readonly raw: RawTrial;
  readonly recordedBy?: string;
  /** Where the cell of a column is (the row's start when the log has no such column). */
  place(column: LogColumn): Place;
  /** "row 7, column C (wot_rpm)": the cell as a spreadsheet user finds it. */
  field(column: LogColumn): string;
}

export type LogRead = { ok: true; rows: LogRow[] } | { ok: false; errors: DataError[] };

interface Cell {
  readonly value: string;
  readonly quoted: boolean;
}
interface Record {
  readonly cells: readonly Cell[];
  readonly line: number;
}

/** Read a trial log's text. Never throws. */
export function readTrialLog(args: { file: string; text: string }): LogRead {
  const { file } = args;
  const text = lfLineBreaks(args.text).replace(/^\ufeff/, '');
  const whole = (expected: string, found: string, fix: string, line = 1): LogRead => ({ ok: false, errors: [dataError({ file, line, column: 1 }, { field: '', expected, found, fix })] });
  let records: Record[];
  try {
    records = (
      parse(text, {
        delimiter: ',',
        comment: '#',
        comment_no_infix: true,
        skip_empty_lines: true,
        relax_column_count: true,
        info: true,
        cast: (value, ctx) => ({ value, quoted: ctx.quoting }),
      }) as unknown as { record: Cell[]; info: { lines: number } }[]
    ).map((r) => ({ cells: r.record, line: startLine(r.record, r.info.lines) }));
  } catch (err) {
    if (!(err instanceof CsvError)) throw err;
    const lines = (err as unknown as { lines?: unknown }).lines;
    return whole('could not be read as CSV', shorten(err.message.replace(/^[^:]*:\s*/, ''), 80), 'check the quotes on that line: a cell that holds a comma is written "like, this", a quote inside it doubled ("")', typeof lines === 'number' && lines >= 1 ? lines : 1);
  }
  const [head, ...body] = records;
  if (!head) {
    return whole(`must start with a header row naming the columns, e.g. "${REQUIRED_LOG_COLUMNS.join(',')}"`, text.trim() === '' ? 'an empty file' : 'only comment lines', 'write the header row, or delete the file (the boat then has only the trials in its own file)');
  }
  const placeOf = (r: Record, index: number) => cellPlace({ file, cells: r.cells, line: r.line, index });
  const errors: DataError[] = [];
  const columns = readHeader({ file, head, placeOf, errors });
  if (!columns) return { ok: false, errors };
  const dataRows = body.filter((r) => r.cells.some((c) => c.value.trim() !== ''));
  if (dataRows.length > MAX_LOG_ROWS) {
    return whole(`must hold at most ${MAX_LOG_ROWS} trials`, `${dataRows.length} rows`, 'move the oldest seasons into a file of their own outside the data folder', dataRows[MAX_LOG_ROWS].line);
  }
  const rows: LogRow[] = [];
  for (const r of dataRows) {
    const row = readRow({ file, record: r, columns, placeOf, errors });
    if (row) rows.push(row);
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, rows };
}

/** The header: every cell a known column, none twice, the required ones there; column index by name. */
function readHeader(args: { file: string; head: Record; placeOf: (r: Record, i: number) => Place; errors: DataError[] }): Map<LogColumn, number> | undefined {
  const { head, errors } = args;
  const before = errors.length;
  const columns = new Map<LogColumn, number>();
  if (head.cells.length === 1 && head.cells[0].value.includes(';')) {
    errors.push(dataError({ file: args.file, line: head.line, column: 1 }, { field: 'the header row', expected: 'must separate the columns with commas', found: `"${shorten(head.cells[0].value, 40)}"`, fix: 'save the sheet as CSV with commas (a spreadsheet may offer "CSV (comma delimited)")' }));
    return undefined;
  }
  head.cells.forEach((cell, index) => {
    const name = cell.value.trim();
    const field = `column ${letter(index)} of the header row`;
    const place = args.placeOf(head, index);
    if (!(LOG_COLUMNS as readonly string[]).includes(name)) {
      errors.push(dataError(place, { field, expected: 'must name a column of the trial log', found: name === '' ? 'an empty cell' : `"${shorten(name, 32)}"`, fix: `${didYouMean(name, LOG_COLUMNS)}columns: ${LOG_COLUMNS.join(', ')}` }));
      return;
    }
    const col = name as LogColumn;
    if (columns.has(col)) {
      errors.push(dataError(place, { field, expected: `names ${col} a second time (also column ${letter(columns.get(col)!)})`, found: `"${col}"`, fix: 'keep one of the two columns' }));
      return;
    }
    columns.set(col, index);
  });
  const missing = REQUIRED_LOG_COLUMNS.filter((c) => !columns.has(c));
  if (missing.length > 0) {
    errors.push(dataError({ file: args.file, line: head.line, column: 1 }, { field: 'the header row', expected: `must have the columns ${REQUIRED_LOG_COLUMNS.join(', ')}`, found: `no ${missing.join(' and no ')}`, fix: `add ${missing.join(', ')} to the header row` }));
  }
  return errors.length > before ? undefined : columns;
}

/** One row: required cells filled, numbers read, then the trial schema; problems into errors. */
function readRow(args: { file: string; record: Record; columns: ReadonlyMap<LogColumn, number>; placeOf: (r: Record, i: number) => Place; errors: DataError[] }): LogRow | undefined {
  const { record: r, columns, errors } = args;
  const before = errors.length;
  const field = (c: LogColumn) => (columns.has(c) ? `row ${r.line}, column ${letter(columns.get(c)!)} (${c})` : `row ${r.line} (${c})`);
  const place = (c: LogColumn): Place => (columns.has(c) ? args.placeOf(r, columns.get(c)!) : { file: args.file, line: r.line, column: 1 });
  const cellText = (c: LogColumn) => (columns.has(c) ? (r.cells[columns.get(c)!]?.value ?? '').trim() : '');
  const reported = new Set<LogColumn>();
  const problem = (c: LogColumn, expected: string, found: string, fix: string) => {
    reported.add(c);
    errors.push(dataError(place(c), { field: field(c), expected, found, fix }));
  };
  const width = Math.max(...columns.values()) + 1;
  if (r.cells.length > width) {
    errors.push(dataError(args.placeOf(r, width), {
      field: `row ${r.line}, column ${letter(width)}`,
      expected: `is past the header's last column (${letter(width - 1)}): the row has ${r.cells.length} cells, the header ${width}`,
      found: `"${shorten(r.cells[width].value, 24)}"`,
      fix: 'a note holding a comma is written in quotes ("like, this"); or name the extra column in the header',
    }));
  }
  const value: { [key: string]: unknown } = {};
  const conditions: { [key: string]: unknown } = {};
  for (const c of LOG_COLUMNS) {
    const raw = cellText(c);
    if (raw === '') {
      if (REQUIRED_LOG_COLUMNS.includes(c)) problem(c, `must hold the trial's ${c}`, columns.has(c) && r.cells.length > columns.get(c)! ? 'an empty cell' : `nothing (the row has ${r.cells.length} cells)`, 'fill it in, or delete the row');
      continue;
    }
    if (c === 'recorded_by') continue;
    let v: unknown = raw;
    if (NUMBER_COLUMNS.has(c) || (c === 'water' && /^[\d.]/.test(raw))) {
      if (!/^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(raw)) {
        const fix = /^[+-]?\d+,\d+$/.test(raw) ? 'write the decimal with a point; a comma separates the cells' : 'write the number alone with digits and a decimal point; the unit is in the column name';
        problem(c, c === 'water' ? 'must be fresh, salt or the measured density in kg/m³' : 'must be a number', `"${shorten(raw, 24)}"`, fix);
        continue;
      }
      v = c === 'water' ? { density_kg_m3: Number(raw) } : Number(raw);
    }
    if (CONDITION_COLUMNS.has(c)) conditions[c] = v;
    else value[c] = v;
  }
  if (Object.keys(conditions).length > 0) value.conditions = conditions;
  const columnOf = (path: readonly PathSegment[]): LogColumn => (path[0] === 'conditions' && typeof path[1] === 'string' ? (path[1] as LogColumn) : ((path[0] as LogColumn | undefined) ?? 'date'));
  const source: YamlSource = {
    file: args.file,
    value,
    locate: (path): Located => {
      const c = columnOf(path);
      const p = place(c);
      const raw = cellText(c);
      return { line: p.line, column: p.column, found: raw === '' ? 'nothing' : NUMBER_COLUMNS.has(c) ? raw : `"${shorten(raw, 40)}"`, exists: raw !== '' };
    },
    locateChar: (path, ch) => {
      const c = columnOf(path);
      const p = place(c);
      const at = [...cellText(c)].indexOf(ch);
      return { line: p.line, column: p.column + Math.max(0, at) + (columns.has(c) && r.cells[columns.get(c)!]?.quoted ? 1 : 0) };
    },
  };
  const checked = validate(source, trialRecord());
  if (!checked.ok) {
    for (const e of checked.errors) {
      const c = (LOG_COLUMNS as readonly string[]).find((name) => e.field === name || e.field.endsWith(`.${name}`)) as LogColumn | undefined;
      if (c && reported.has(c)) continue;
      // A "give one of" choice (altitude_m or pressure_hpa) is named at the row: it is about two cells.
      errors.push(dataError({ file: e.file, line: e.line, column: e.column }, { field: c ? field(c) : `row ${r.line}`, expected: e.expected, found: e.found, ...(e.fix ? { fix: e.fix.replace(/^add (\w+): with /, 'fill in the $1 cell with ') } : {}) }));
    }
  }
  const by = cellText('recorded_by');
  const byChecked = by === '' ? undefined : checkedText({ source, text: by, field: field('recorded_by'), place: place('recorded_by'), errors });
  if (errors.length > before || !checked.ok) return undefined;
  return { line: r.line, raw: checked.value, ...(byChecked ? { recordedBy: byChecked } : {}), place, field };
}

/** recorded_by is no field of a boat file's trial: the same printable-text rule, on its own. */
function checkedText(args: { source: YamlSource; text: string; field: string; place: Place; errors: DataError[] }): string | undefined {
  const hit = /[\u0000-\u001f\u007f-\u009f\u00ad\u061c\u180e\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff]/.exec(args.text);
  if (!hit) return args.text.replace(/\s+/g, ' ');
  args.errors.push(dataError(args.place, { field: args.field, expected: 'must hold only printable characters', found: `U+${hit[0].codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`, fix: 'delete it: it is invisible, or would hide or reorder text on the pages' }));
  return undefined;
}

/** Line a record starts on: csv-parse counts to its end; a quoted cell may hold line breaks. */
function startLine(cells: readonly Cell[], endLine: number): number {
  return endLine - cells.reduce((n, c) => n + (c.value.match(/\n/g)?.length ?? 0), 0);
}

/** 1-based line and column of a cell, from the cells before it as csv-parse read them (a quoted cell: its quotes and doubled quotes). */
function cellPlace(args: { file: string; cells: readonly Cell[]; line: number; index: number }): Place {
  let line = args.line;
  let column = 1;
  for (let i = 0; i < Math.min(args.index, args.cells.length); i++) {
    const c = args.cells[i];
    const written = c.quoted ? `"${c.value.replace(/"/g, '""')}"` : c.value;
    const parts = written.split('\n');
    if (parts.length > 1) [line, column] = [line + parts.length - 1, 1];
    column += [...parts[parts.length - 1]].length + 1;
  }
  return { file: args.file, line, column };
}

/** Spreadsheet column letters: 0 → A, 25 → Z, 26 → AA. */
function letter(index: number): string {
  let n = index + 1;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}
