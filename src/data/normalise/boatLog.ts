/**
 * A boat's sea-trial log (trialLog.ts) joined to the boat: each row's impeller resolved against the
 * boat's jet, a trial logged in both places refused (it would count twice), an rpm above the engine's
 * maximum kept but warned of, as for a trial in the boat file. Logs with no boat are warned of.
 */
import { posix } from 'node:path';
import { didYouMean } from '../closest.ts';
import { dataError } from '../errors.ts';
import type { SourceFile } from '../files.ts';
import type { RawTrial } from '../schema/boat.ts';
import { readTrialLog, type LogRow } from '../trialLog.ts';
import type { DataError, EngineVariant, JetUnit } from '../types.ts';
import type { YamlSource } from '../yamlSource.ts';

/** A CSV file in a boats/ folder: a trial log, or a file that means to be one. */
export function isTrialLog(path: string): boolean {
  const parts = path.replace(/\\/g, '/').split('/');
  return parts.length > 1 && parts[parts.length - 2] === 'boats' && /\.csv$/i.test(parts[parts.length - 1]);
}

/** Warnings for CSV files in boats/ that no boat reads: misnamed, or the boat file is missing. */
export function strayLogs(args: { logs: readonly string[]; boatIds: readonly string[] }): DataError[] {
  return args.logs.flatMap((path) => {
    const name = posix.basename(path);
    const id = name.endsWith('.trials.csv') ? name.slice(0, -'.trials.csv'.length) : undefined;
    if (id !== undefined && args.boatIds.includes(id)) return [];
    const place = { file: path, line: 1, column: 1 };
    if (id === undefined) {
      return [dataError(place, { field: '', expected: 'is not read: a sea-trial log is named after its boat, <boat id>.trials.csv', found: `"${name}"`, fix: 'rename it, e.g. to reedshank.trials.csv beside boats/reedshank.yaml' })];
    }
    return [dataError(place, { field: '', expected: `is not read: it is the trial log of a boat "${id}", and there is no boats/${id}.yaml`, found: `"${name}"`, fix: `${didYouMean(id, args.boatIds)}rename it after its boat (boats: ${args.boatIds.join(', ') || 'none yet'})` })];
  });
}

/** One logged trial as the boat's normaliser takes it: the row in a boat file's form, and where it is. */
export interface LoggedTrial {
  readonly raw: RawTrial;
  readonly recordedBy?: string;
  readonly origin: { readonly file: string; readonly line: number };
}

/** The log's trials checked against the boat (rows in file order), or the problems found. */
export function boatLogTrials(args: { boatSource: YamlSource; yamlTrials: readonly RawTrial[]; log: SourceFile | undefined; jet: JetUnit; engine: EngineVariant | undefined }): { trials: LoggedTrial[]; errors: DataError[]; warnings: DataError[] } {
  const { log, jet } = args;
  if (!log) return { trials: [], errors: [], warnings: [] };
  const file = log.path.replace(/\\/g, '/');
  if (log.unreadable) {
    const { line = 1, column = 1, ...problem } = log.unreadable;
    return { trials: [], errors: [dataError({ file, line, column }, { field: '', ...problem })], warnings: [] };
  }
  const read = readTrialLog({ file, text: log.text });
  if (!read.ok) return { trials: [], errors: read.errors, warnings: [] };
  const errors: DataError[] = [];
  const warnings: DataError[] = [];
  const known = jet.impellers.map((i) => i.id);
  const yamlLine = (i: number) => args.boatSource.locate(['trials', i]).line;
  const trials = read.rows.flatMap((row): LoggedTrial[] => {
    const t = row.raw;
    const before = errors.length;
    if (!known.includes(t.impeller)) {
      errors.push(dataError(row.place('impeller'), { field: row.field('impeller'), expected: `must name one of the impellers of ${jet.id}`, found: `"${t.impeller}"`, fix: `${didYouMean(t.impeller, known)}known: ${known.join(', ')}` }));
    }
    const twin = args.yamlTrials.findIndex((y) => y.date === t.date && y.impeller === t.impeller && y.wot_rpm === t.wot_rpm);
    if (twin >= 0) {
      errors.push(dataError(row.place('date'), { field: row.field('date'), expected: `is a trial the boat file also lists (${args.boatSource.file}:${yamlLine(twin)}, same date, impeller and rpm): it would count twice`, found: t.date, fix: 'keep it in one place: delete the row, or the trial in the boat file' }));
    }
    const maxRpm = args.engine?.limits.maxRpm;
    if (maxRpm !== undefined && t.wot_rpm > maxRpm) {
      warnings.push(dataError(row.place('wot_rpm'), { field: row.field('wot_rpm'), expected: `is above the engine's max_rpm (${maxRpm}); this impeller over-revs the engine`, found: String(t.wot_rpm) }));
    }
    return errors.length > before ? [] : [logged(row, file)];
  });
  return { trials, errors, warnings };
}

function logged(row: LogRow, file: string): LoggedTrial {
  return { raw: row.raw, ...(row.recordedBy !== undefined ? { recordedBy: row.recordedBy } : {}), origin: { file, line: row.line } };
}
