/** Entry point of the `matchbook` command (run through tsx; see bin/matchbook.js). */
import { processIo } from './io.ts';

const io = processIo();

/** Even a failure to load matchbook's own modules ends as a message, never a stack trace. */
function fatal(error: unknown): number {
  const message = error instanceof Error ? error.message.split('\n')[0] : String(error);
  io.err(`matchbook: could not start: ${message}\nThis is a fault in matchbook, not in your data; please report it.\n`);
  return 3;
}

try {
  const { reportFailure, runCli } = await import('./run.ts');
  process.on('uncaughtException', (error) => process.exit(reportFailure(error, io)));
  process.on('unhandledRejection', (error) => process.exit(reportFailure(error, io)));
  process.exitCode = await runCli(process.argv.slice(2), io);
} catch (error) {
  process.exitCode = fatal(error);
}
