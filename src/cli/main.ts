/** Entry point of the `matchbook` command (run through tsx; see bin/matchbook.js). */
import { processIo } from './io.ts';
import { reportFailure, runCli } from './run.ts';

const io = processIo();
// Last line of defence: anything escaping runCli still ends as a message, never a stack trace.
process.on('uncaughtException', (error) => process.exit(reportFailure(error, io)));
process.on('unhandledRejection', (error) => process.exit(reportFailure(error, io)));
process.exitCode = await runCli(process.argv.slice(2), io);
