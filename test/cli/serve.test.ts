/**
 * `matchbook serve`: the dev server answers with the built site, and saving a boat file rebuilds the
 * page. The test waits for each state (polling), it never asserts how long anything took.
 */
import { spawn } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { REPO } from './runCli.ts';

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const { port } = server.address() as { port: number };
  await new Promise<void>((done) => server.close(() => done()));
  return port;
}

/** Polls url until its body satisfies ok(); returns that body. */
async function waitFor(url: string, ok: (body: string) => boolean, what: string): Promise<string> {
  for (let attempt = 0; attempt < 600; attempt += 1) {
    const body = await fetch(url).then((r) => (r.ok ? r.text() : ''), () => '');
    if (ok(body)) return body;
    await new Promise((done) => setTimeout(done, 500));
  }
  throw new Error(`gave up waiting for ${what} at ${url}`);
}

describe('matchbook serve', () => {
  it('serves the site and rebuilds a boat page when its YAML file is saved', { timeout: 600_000 }, async () => {
    const root = mkdtempSync(join(tmpdir(), 'matchbook-serve-'));
    const data = join(root, 'data');
    cpSync(join(REPO, 'data'), data, { recursive: true });
    const port = await freePort();
    const child = spawn(process.execPath, [`${REPO}bin/matchbook.js`, 'serve', '--data', data, '--out', join(root, 'out'), '--port', String(port)], {
      cwd: REPO,
      env: { ...process.env, NO_COLOR: '1', SOURCE_DATE_EPOCH: '1767225600' },
      stdio: 'ignore',
    });
    try {
      const page = `http://localhost:${port}/boats/greyling/index.html`;
      const first = await waitFor(page, (b) => b.includes('<h1>'), 'the first build');
      expect(first).toContain('<h1>Greyling (fishing boat)</h1>');
      const file = join(data, 'boats', 'greyling.yaml');
      writeFileSync(file, readFileSync(file, 'utf8').replace(/^name: .*$/m, 'name: Greyling Renamed (demo)'));
      const second = await waitFor(page, (b) => b.includes('Greyling Renamed'), 'the rebuild');
      expect(second).toContain('<h1>Greyling Renamed (demo)</h1>');
      expect(second).not.toContain('<h1>Greyling (fishing boat)</h1>');
    } finally {
      child.kill('SIGINT');
    }
  });
});
