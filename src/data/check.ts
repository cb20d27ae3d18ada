/** `matchbook check`: load the data and print every error, or a one-line summary of what loaded. */
import { loadProject } from './load.ts';
import { printedError } from './errors.ts';
import type { DataError, Project } from './types.ts';

/** Check the data folder; exit code 1 when any error was found. Text ends with a newline. */
export async function checkData(dataDir: string): Promise<{ exitCode: 0 | 1; text: string }> {
  const result = await loadProject(dataDir);
  const warnings = result.warnings.map((w) => `warning: ${w.message}`);
  if (!result.ok) {
    const files = new Set(result.errors.map((e) => e.file)).size;
    const summary = `${plural(result.errors.length, 'error')} in ${plural(files, 'file')}; nothing was built from ${dataDir}. Fix them and run check again.`;
    return { exitCode: 1, text: [...result.errors.map(printedError), ...warnings, summary].join('\n') + '\n' };
  }
  return { exitCode: 0, text: [...warnings, summarise(dataDir, result.project, result.warnings)].join('\n') + '\n' };
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
