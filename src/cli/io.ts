import { terminalText } from '../data/errors.ts';

/** Where the command line writes: injectable so tests can capture output without a terminal. */
export interface CliIo {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  readonly env: Readonly<Record<string, string | undefined>>;
  /** True when stderr is a terminal (progress then rewrites one line). */
  readonly isTty: boolean;
}

/** The process's own streams and environment; everything written passes the one terminal escape (terminalText). */
export function processIo(): CliIo {
  return {
    out: (text) => process.stdout.write(terminalText(text)),
    err: (text) => process.stderr.write(terminalText(text)),
    env: process.env,
    isTty: Boolean(process.stderr.isTTY),
  };
}
