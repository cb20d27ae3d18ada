/**
 * `matchbook serve`: the preview answers with the built site, and saving a boat file rebuilds the
 * page. It listens on the loopback address only and prints the address it really listens on; a bad
 * request is a 4xx and the server goes on; a taken port or an address the machine lacks is a usage
 * error (exit 2). The test waits for each state (polling), it never asserts how long anything took.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { connect } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { matchbook, REPO } from './runCli.ts';

/** Polls url until its body satisfies ok(); returns that body. */
async function waitFor(url: string, ok: (body: string) => boolean, what: string): Promise<string> {
  for (let attempt = 0; attempt < 600; attempt += 1) {
    const body = await fetch(url).then((r) => (r.ok ? r.text() : ''), () => '');
    if (ok(body)) return body;
    await new Promise((done) => setTimeout(done, 500));
  }
  throw new Error(`gave up waiting for ${what} at ${url}`);
}

/** Starts serve with --port 0 and resolves to the address it prints. */
function serve(args: readonly string[]): { child: ChildProcess; address: Promise<string> } {
  const child = spawn(process.execPath, [`${REPO}bin/matchbook.js`, 'serve', ...args, '--port', '0'], {
    cwd: REPO,
    env: { ...process.env, NO_COLOR: '1', SOURCE_DATE_EPOCH: '1767225600' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  const address = new Promise<string>((done, fail) => {
    child.stdout!.on('data', (b: Buffer) => {
      out += b.toString();
      const m = /^serving \S+ at (http:\/\/\S+\/)/m.exec(out);
      if (m) done(m[1]);
    });
    child.on('exit', (code) => fail(new Error(`serve ended with ${code} before printing its address: ${out}`)));
  });
  return { child, address };
}

/** Whether a TCP connection to host:port is accepted. */
const accepts = (host: string, port: number): Promise<boolean> =>
  new Promise((done) => {
    const socket = connect(port, host);
    socket.on('connect', () => {
      socket.destroy();
      done(true);
    });
    socket.on('error', () => done(false));
  });

describe('matchbook serve', () => {
  it('serves on 127.0.0.1 only, survives bad requests, and rebuilds a boat page when its YAML file is saved', { timeout: 600_000 }, async () => {
    const root = mkdtempSync(join(tmpdir(), 'matchbook-serve-'));
    const data = join(root, 'data');
    cpSync(join(REPO, 'data'), data, { recursive: true });
    const { child, address } = serve(['--data', data, '--out', join(root, 'out')]);
    try {
      const url = await address;
      // The address printed is the one listened on: loopback, with the port the system gave.
      expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
      const port = Number(/:(\d+)\/$/.exec(url)![1]);
      const page = `${url}boats/greyling/index.html`;
      const first = await waitFor(page, (b) => b.includes('<h1>'), 'the first build');
      expect(first).toContain('<h1>Greyling (fishing boat)</h1>');
      // 127.0.0.2 is loopback too (RFC 1122 §3.2.1.3: all of 127/8), but not the address bound: refused.
      expect(await accepts('127.0.0.1', port)).toBe(true);
      expect(await accepts('127.0.0.2', port)).toBe(false);
      // A malformed percent-encoding (RFC 3986 §2.1) is a 400, and the server keeps serving.
      expect((await fetch(`${url}%E0%A4%A`)).status).toBe(400);
      expect((await fetch(`${url}..%2f..%2fetc%2fpasswd`)).status).toBe(403);
      expect((await fetch(page)).status).toBe(200);
      // The same port asked for again: a usage error naming the port and the fix.
      const again = matchbook(['serve', '--data', data, '--out', join(root, 'out2'), '--port', String(port)]);
      expect(again.status).toBe(2);
      expect(again.stderr).toBe(
        `matchbook: port ${port} on 127.0.0.1 is in use by another program; stop that program, or choose another port, for example --port ${port + 1} (--port 0 lets the system choose)\n`,
      );
      const file = join(data, 'boats', 'greyling.yaml');
      writeFileSync(file, readFileSync(file, 'utf8').replace(/^name: .*$/m, 'name: Greyling Renamed (demo)'));
      const second = await waitFor(page, (b) => b.includes('Greyling Renamed'), 'the rebuild');
      expect(second).toContain('<h1>Greyling Renamed (demo)</h1>');
      expect(second).not.toContain('<h1>Greyling (fishing boat)</h1>');
      expect(child.exitCode).toBeNull();
    } finally {
      child.kill('SIGINT');
    }
  });

  it('--host 0.0.0.0 listens on every interface and says so', { timeout: 300_000 }, async () => {
    const root = mkdtempSync(join(tmpdir(), 'matchbook-serve-all-'));
    const empty = join(root, 'data');
    cpSync(join(REPO, 'data'), empty, { recursive: true });
    const { child, address } = serve(['--data', empty, '--out', join(root, 'out'), '--host', '0.0.0.0']);
    let out = '';
    child.stdout!.on('data', (b: Buffer) => (out += b.toString()));
    try {
      const url = await address;
      const port = Number(/:(\d+)\/$/.exec(url)![1]);
      expect(url).toBe(`http://0.0.0.0:${port}/`);
      expect(await accepts('127.0.0.2', port)).toBe(true);
      await waitFor(url, () => out.includes('every network interface'), 'the note');
      expect(out).toContain(`(every network interface: other machines can reach it; on this one http://127.0.0.1:${port}/)`);
    } finally {
      child.kill('SIGINT');
    }
  });

  it('an address the machine does not have, or a malformed one, is a usage error', () => {
    // 192.0.2.1 is TEST-NET-1 (RFC 5737): documentation only, never a machine's own address.
    const missing = matchbook(['serve', '--host', '192.0.2.1', '--port', '0']);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toContain('this machine has no address 192.0.2.1 to listen on; leave out --host');
    const malformed = matchbook(['serve', '--host', 'a b']);
    expect(malformed.status).toBe(2);
    expect(malformed.stderr).toContain('--host must be an IP address or a host name');
    expect(`${missing.stderr}${malformed.stderr}`).not.toMatch(/fault in matchbook|\n\s+at /);
  });
});

