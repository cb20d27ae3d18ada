/** `matchbook build`: the whole site and chart books, swapped into the output folder atomically. */
import { discardAllWork } from '../site/atomicDir.ts';
import { buildSite } from '../site/buildSite.ts';
import type { FaultHook } from '../site/drawSheets.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';
import { progressPrinter } from './progress.ts';

/**
 * MATCHBOOK_TEST_FAULT=STAGE or STAGE:N (scene, render, books, files, pages, swap): the N-th step of
 * that stage fails (default the first). Only the tests of interrupted builds set it. A scene or render
 * fails as a sheet that cannot be drawn would (exit 1), any other stage as a fault of ours (exit 3).
 */
export function testFault(spec: string | undefined): FaultHook | undefined {
  const m = /^(scene|render|books|files|pages|swap)(?::(\d+))?$/.exec(spec ?? '');
  if (!m) return undefined;
  let left = Number(m[2] ?? 1);
  return (stage, name) => {
    if (stage !== m[1] || (left -= 1) > 0) return;
    const error = new Error(`failure injected by MATCHBOOK_TEST_FAULT at ${stage} ${name}`);
    if (stage === 'scene' || stage === 'render') error.name = 'LayoutError';
    throw error;
  };
}

/** Builds and prints progress and a summary; resolves to the exit status. */
export async function runBuild(args: ParsedArgs, io: CliIo): Promise<number> {
  const startMs = performance.now();
  // Ctrl+C or a SIGTERM mid-build: the staging folder goes (the old output is put back if the swap was
  // half done), and the process ends with 128 + the signal's number, as shells expect.
  const stops = (['SIGINT', 'SIGTERM'] as const).map((signal) => {
    const stop = () => {
      discardAllWork();
      io.err(`\nmatchbook: stopped by ${signal}; nothing written, ${args.outDir} is unchanged.\n`);
      process.exit(signal === 'SIGINT' ? 130 : 143);
    };
    process.once(signal, stop);
    return () => process.off(signal, stop);
  });
  let outcome: Awaited<ReturnType<typeof buildSite>>;
  try {
    outcome = await buildSite({
      dataDir: args.dataDir,
      outDir: args.outDir,
      sourceDateEpoch: io.env.SOURCE_DATE_EPOCH,
      print: args.print,
      onProgress: progressPrinter(io),
      fault: testFault(io.env.MATCHBOOK_TEST_FAULT),
    });
  } finally {
    for (const off of stops) off();
  }
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
