/**
 * `matchbook add-trial`: one sea trial added at the end of a boat's log (boats/<id>.trials.csv). The
 * data folder must load first (the boat and its impeller must exist); the log with the new row is then
 * checked by the loader, by the same rules as every row, before anything is written; the file is
 * replaced atomically, keeping every byte already in it.
 */
import { readFile } from 'node:fs/promises';
import { writeFileAtomic, type AtomicFs } from '../data/atomicFile.ts';
import { didYouMean } from '../data/closest.ts';
import { printedError } from '../data/errors.ts';
import { loadProject } from '../data/load.ts';
import { trialLogPath, type LogColumn } from '../data/trialLog.ts';
import { appendTrialRow, MissingColumnsError } from '../data/trialLogAppend.ts';
import type { DataError } from '../data/types.ts';
import { TRIAL_OPTIONS, UsageError, type ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';

const REQUIRED = ['--boat', '--date', '--impeller', '--rpm'] as const;

/** Adds the trial; resolves to the exit status (1 the data or the new trial has a problem, 2 misuse). */
export async function runAddTrial(args: ParsedArgs, io: CliIo, opts: { fs?: AtomicFs } = {}): Promise<number> {
  const missing = REQUIRED.filter((o) => args.trial[o] === undefined);
  if (missing.length > 0) throw new UsageError(`add-trial needs ${missing.join(', ')}, for example: matchbook add-trial --boat reedshank --date 2026-09-14 --impeller gust --rpm 4900`);
  const loaded = await loadProject(args.dataDir);
  if (!loaded.ok) {
    io.err(`${loaded.errors.map(printedError).join('\n')}\nmatchbook: the data folder ${args.dataDir} has problems; fix them first (matchbook check lists them). Nothing written.\n`);
    return 1;
  }
  const boatId = args.trial['--boat'];
  const boat = loaded.project.boats.find((b) => b.id === boatId);
  if (!boat) {
    const ids = loaded.project.boats.map((b) => b.id);
    throw new UsageError(`--boat must name a boat of ${args.dataDir}/boats/, found "${boatId}"; ${didYouMean(boatId, ids)}boats: ${ids.join(', ') || 'none yet'}`);
  }
  const logPath = trialLogPath(boat.source.file);
  const existing = await readFile(logPath, 'utf8').catch((err: { code?: string }) => (err.code === 'ENOENT' ? undefined : Promise.reject(err)));
  const cells = Object.fromEntries(Object.entries(args.trial).flatMap(([o, v]) => (TRIAL_OPTIONS[o] ? [[TRIAL_OPTIONS[o], v]] : []))) as Partial<Record<LogColumn, string>>;
  let appended;
  try {
    appended = appendTrialRow({ existing, cells });
  } catch (error) {
    if (!(error instanceof MissingColumnsError)) throw error;
    const options = error.columns.map(optionOf).join(', ');
    io.err(`matchbook: ${logPath}:1:1 the header row has no column ${error.columns.join(', ')} for ${options}; add the column name to the header row, or leave out ${options}. Nothing written.\n`);
    return 1;
  }
  const checked = await loadProject(args.dataDir, { replace: { path: logPath, text: appended.text } });
  if (!checked.ok) {
    io.err(`${checked.errors.map((e) => (e.file === logPath && e.line === appended.line ? newRowError(e) : printedError(e))).join('\n')}\nmatchbook: the trial was not added; ${logPath} is unchanged.\n`);
    return 1;
  }
  try {
    await writeFileAtomic(logPath, Buffer.from(appended.text, 'utf8'), { ...(opts.fs ? { fs: opts.fs } : {}) });
  } catch (error) {
    const code = (error as { code?: string }).code ?? (error instanceof Error ? error.message : String(error));
    io.err(`matchbook: could not write ${logPath} (${code}): check that the folder can be written to and the disk has room. The log is unchanged.\n`);
    return 1;
  }
  const count = checked.project.boats.find((b) => b.id === boat.id)?.trials.length ?? 0;
  const warnings = checked.warnings.filter((w) => w.file === logPath && w.line === appended.line).map((w) => `warning: ${w.message}\n`).join('');
  io.out(`${warnings}added the trial of ${args.trial['--date']} (${args.trial['--impeller']}, ${args.trial['--rpm']} rpm) to ${logPath}, row ${appended.line}; ${boat.name} now has ${count} sea trial${count === 1 ? '' : 's'}.\n`);
  return 0;
}

/** The option a log column is filled from. */
function optionOf(column: string): string {
  return Object.entries(TRIAL_OPTIONS).find(([, c]) => c === column)?.[0] ?? column;
}

/** A problem of the new row, told by the option that gave the value. */
function newRowError(e: DataError): string {
  const column = /\(([a-z_]+)\)$/.exec(e.field)?.[1];
  const subject = column ? `${optionOf(column)} (column ${column})` : 'the new trial';
  return `matchbook: ${subject} ${e.expected}, found ${e.found}${e.fix ? ` — ${e.fix}` : ''}`;
}
