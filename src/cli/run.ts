/**
 * The top of the command line: parse, dispatch, and turn every failure into a plain message and an
 * exit status (0 done, 1 invalid data, 2 misuse, 3 internal failure). No stack trace reaches a user.
 */
import { parseArgs, UsageError } from './args.ts';
import { helpText } from './help.ts';
import type { CliIo } from './io.ts';
import { OutputFolderError } from '../site/atomicDir.ts';
import { BuildDateError } from '../site/dateIso.ts';
import { ServeAddressError } from '../site/devServer.ts';
import { terminalSafe } from '../data/errors.ts';

export const EXIT_OK = 0;
export const EXIT_INVALID_DATA = 1;
export const EXIT_MISUSE = 2;
export const EXIT_INTERNAL = 3;

/** Runs one matchbook command; resolves to the exit status. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    const args = parseArgs(argv);
    switch (args.command) {
      case 'help':
        io.out(helpText(args.helpFor));
        return EXIT_OK;
      // Commands load lazily: help answers at once, and check never loads the renderers or Eleventy.
      case 'build':
        return await (await import('./build.ts')).runBuild(args, io);
      case 'check':
        return await (await import('./check.ts')).runCheck(args, io);
      case 'serve':
        return await (await import('./serve.ts')).runServe(args, io);
      case 'start':
        return await (await import('./start.ts')).runStart(args, io);
      case 'add-trial':
        return await (await import('./addTrial.ts')).runAddTrial(args, io);
    }
  } catch (error) {
    return reportFailure(error, io);
  }
}

/** Prints one failure as a sentence and picks its exit status. */
export function reportFailure(error: unknown, io: CliIo): number {
  if (error instanceof UsageError || error instanceof OutputFolderError || error instanceof BuildDateError || error instanceof ServeAddressError) {
    io.err(`matchbook: ${terminalSafe(error.message)}\n${error instanceof UsageError ? 'Run "matchbook --help" for usage.\n' : ''}`);
    return EXIT_MISUSE;
  }
  if (error instanceof Error && error.name === 'SheetDrawError') {
    io.err(`matchbook: ${terminalSafe(error.message)}\nmatchbook: nothing written; the output folder is unchanged.\n`);
    return EXIT_INVALID_DATA;
  }
  const message = error instanceof Error ? error.message : String(error);
  io.err(
    `matchbook: the build stopped unexpectedly: ${terminalSafe(message.split('\n')[0])}\n` +
      'This is a fault in matchbook, not in your data; please report it with the command you ran.\n',
  );
  return EXIT_INTERNAL;
}
