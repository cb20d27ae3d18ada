/** Runs the real `matchbook` command in a child process, as a user would. */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const REPO = fileURLToPath(new URL('../../', import.meta.url));

export interface CliRun {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** `node bin/matchbook.js ...args` from the repository folder. */
export function matchbook(args: readonly string[], env: Record<string, string> = {}): CliRun {
  const r = spawnSync(process.execPath, [`${REPO}bin/matchbook.js`, ...args], {
    cwd: REPO,
    env: { ...process.env, NO_COLOR: '1', ...env },
    encoding: 'utf8',
    maxBuffer: 1 << 24,
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}
