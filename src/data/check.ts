/**
 * The words of `matchbook check`: every error, or a one-line summary of what loaded. The layout half of
 * the check (every sheet laid out as the build would) is in src/site/checkSite.ts.
 */
import { loadProject } from './load.ts';
import { printedError, sortErrors } from './errors.ts';
import type { DataError, Project } from './types.ts';

export interface CheckReport {
  readonly exitCode: 0 | 1;
  /** Every error (sorted by file, line, column), the warnings, then a count or the summary. Ends with a newline. */
  readonly text: string;
}

/** Check the definitions of the data folder only (no layout); exit code 1 when any error was found. */
export async function checkData(dataDir: string): Promise<CheckReport> {
  const result = await loadProject(dataDir);
  return result.ok ? checkReport({ dataDir, errors: [], warnings: result.warnings, project: result.project }) : checkReport({ dataDir, errors: result.errors, warnings: result.warnings });
}

/** The printed report of a check: every error with its lines, then the count; or the one-line summary. */
export function checkReport(args: { dataDir: string; errors: readonly DataError[]; warnings: readonly DataError[]; project?: Project }): CheckReport {
  const { dataDir } = args;
  const errors = sortErrors(args.errors);
  const warnings = args.warnings.map((w) => `warning: ${w.message}`);
  if (errors.length > 0 || !args.project) {
    const files = new Set(errors.map((e) => e.file)).size;
    const summary = `${plural(errors.length, 'error')} in ${plural(files, 'file')}; nothing was built from ${dataDir}. Fix them and run check again.`;
    return { exitCode: 1, text: [...errors.map(printedError), ...warnings, summary].join('\n') + '\n' };
  }
  return { exitCode: 0, text: [...warnings, summarise(dataDir, args.project, args.warnings)].join('\n') + '\n' };
}

function summarise(dataDir: string, p: Project, warnings: readonly DataError[]): string {
  const variants = p.engines.reduce((n, e) => n + e.variants.length, 0);
  const impellers = p.jets.reduce((n, j) => n + j.impellers.length, 0);
  const trials = p.boats.reduce((n, b) => n + b.trials.length, 0);
  const sheets = p.books.reduce((n, b) => n + b.sheets.length, 0);
  return (
    `OK ${dataDir}: ${plural(p.engines.length, 'engine family', 'engine families')} (${plural(variants, 'variant')}), ` +
    `${plural(p.jets.length, 'jet unit')} (${plural(impellers, 'impeller')}), ${plural(p.boats.length, 'boat')} (${plural(trials, 'sea trial')}), ` +
    `${plural(p.books.length, 'book')} (${plural(sheets, 'sheet')}), ${plural(warnings.length, 'warning')}`
  );
}

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}
