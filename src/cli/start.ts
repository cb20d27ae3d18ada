/** `matchbook start`: a starter data folder of example files, and what to do next. */
import { buildDateIso } from '../site/dateIso.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';
import { StarterFolderError, writeStarter } from './starter.ts';

/** Writes the example data folder; resolves to the exit status (2 when the folder is not new or empty). */
export async function runStart(args: ParsedArgs, io: CliIo): Promise<number> {
  // The starter's issue date is the day it is written (or SOURCE_DATE_EPOCH's day, for repeatable runs).
  const issueDateIso = buildDateIso({ sourceDateEpoch: io.env.SOURCE_DATE_EPOCH, issueDate: new Date().toISOString().slice(0, 10) });
  let written: string[];
  try {
    written = writeStarter({ dataDir: args.dataDir, issueDateIso });
  } catch (error) {
    if (!(error instanceof StarterFolderError)) throw error;
    io.err(`matchbook: ${error.message}\n`);
    return 2;
  }
  const data = args.dataDir === 'data' ? '' : ` --data ${args.dataDir}`;
  io.out(
    [
      `wrote example data into ${args.dataDir}:`,
      ...written.map((path) => `  ${path}`),
      '',
      'Every file is marked EXAMPLE DATA: an invented engine, jet and boat that show the format.',
      'Replace them with your own definitions, taking the figures from the engine and jet makers.',
      '',
      'Next:',
      `  npx matchbook build${data}    write the site and chart books into out/; open out/index.html`,
      `  npx matchbook check${data}    after each edit: every problem with its file, line and field`,
      `  npx matchbook serve${data}    a local preview that rebuilds when you save a file`,
      '',
    ].join('\n'),
  );
  return 0;
}
