/** Where the command line writes: injectable so tests can capture output without a terminal. */
export interface CliIo {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  readonly env: Readonly<Record<string, string | undefined>>;
  /** True when stderr is a terminal (progress then rewrites one line). */
  readonly isTty: boolean;
}

/** The process's own streams and environment. */
export function processIo(): CliIo {
  return {
    out: (text) => process.stdout.write(text),
    err: (text) => process.stderr.write(text),
    env: process.env,
    isTty: Boolean(process.stderr.isTTY),
  };
}
