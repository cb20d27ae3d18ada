/**
 * Progress of a build ("sheets 12/40"): on a terminal one line rewritten in place; elsewhere (CI logs)
 * at most about twenty lines per build so a thousand-boat build does not flood the log.
 */
import type { CliIo } from './io.ts';

/** A progress callback that reports done/total sheets to stderr. */
export function progressPrinter(io: CliIo): (done: number, total: number) => void {
  return (done, total) => {
    const step = Math.max(1, Math.ceil(total / 20));
    const line = `sheets ${done}/${total}`;
    if (io.isTty) io.err(`\r${line}${done === total ? '\n' : ''}`);
    else if (done === total || done % step === 0) io.err(`${line}\n`);
  };
}
