/** Spawn the real command line (node --import tsx src/cli/main.ts) from any folder, without blocking. */
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const REPO_DIR = fileURLToPath(new URL('../../', import.meta.url));
const MAIN = fileURLToPath(new URL('../../src/cli/main.ts', import.meta.url));
// Absolute, so the command runs with any working folder.
const TSX = import.meta.resolve('tsx');

export interface Run {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Run `matchbook ...args` in cwd (default the repository) with extra environment variables. */
export function matchbook(args: readonly string[], opts: { cwd?: string; env?: Record<string, string> } = {}): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', TSX, MAIN, ...args], {
      cwd: opts.cwd ?? REPO_DIR,
      env: { ...process.env, NO_COLOR: '1', TZ: 'UTC', ...opts.env },
    });
    const [out, err]: [Buffer[], Buffer[]] = [[], []];
    child.stdout.on('data', (b: Buffer) => out.push(b));
    child.stderr.on('data', (b: Buffer) => err.push(b));
    child.on('error', reject);
    child.on('close', (status) => resolve({ status, stdout: Buffer.concat(out).toString('utf8'), stderr: Buffer.concat(err).toString('utf8') }));
  });
}

/** Map over items with at most `limit` promises in flight (spawning 70 processes at once would thrash 2 cores). */
export async function mapLimit<T, R>(items: readonly T[], limit: number, run: (item: T) => Promise<R>): Promise<R[]> {
  const results: R[] = new Array(items.length);
  let next = 0;
  const worker = async (): Promise<void> => {
    while (next < items.length) {
      const i = next++;
      results[i] = await run(items[i]);
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
  return results;
}

/** Text that shows a stack trace or a raw JavaScript failure reached the user. */
export const STACK_TRACE = /\n\s+at [\w.<>]+ \(|node:internal|\bTypeError\b|\bReferenceError\b|\bRangeError\b|ERR_[A-Z_]+/;
