/** `matchbook build`: the whole site and chart books, swapped into the output folder atomically. */
import { buildSite } from '../site/buildSite.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';
import { progressPrinter } from './progress.ts';

/** Builds and prints progress and a summary; resolves to the exit status. */
export async function runBuild(args: ParsedArgs, io: CliIo): Promise<number> {
  const startMs = performance.now();
  const outcome = await buildSite({
    dataDir: args.dataDir,
    outDir: args.outDir,
    sourceDateEpoch: io.env.SOURCE_DATE_EPOCH,
    onProgress: progressPrinter(io),
  });
  if (outcome.warningsText !== '') io.err(outcome.warningsText);
  if (!outcome.ok) {
    io.err(outcome.errorsText);
    io.err(`matchbook: nothing written; ${args.outDir} is unchanged.\n`);
    return 1;
  }
  const c = outcome.counts;
  const seconds = ((performance.now() - startMs) / 1000).toFixed(1);
  io.out(
    `built ${args.outDir}: ${c.pages} pages, ${c.sheets} sheets (SVG, PNG, PDF), ${c.books} books, ` +
      `${c.boats} boats, ${c.families} engine families, ${c.files} files in ${seconds} s\n`,
  );
  return 0;
}
