/**
 * The preview server of `matchbook serve` (issue #14, class 5), in-process on a small folder: every bad
 * request gets a 4xx and the next request is still answered; nothing outside the folder is served; it
 * listens on the loopback address and says which port it really got; a taken port is a
 * ServeAddressError with the fix. Status codes as RFC 9110 defines them (§15.5.1 400 Bad Request,
 * §15.5.4 403 Forbidden, §15.5.5 404 Not Found, §15.5.6 405 Method Not Allowed, §15.5.20 421
 * Misdirected Request, §15.4.2 301 Moved Permanently); percent-encoding as RFC 3986 §2.1 (a "%" must be
 * followed by two hex digits) and UTF-8 as RFC 3629 (%C3%28 is not a character).
 */
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { connect, createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { EVENTS_PATH, ServeAddressError, startDevServer, type DevServer } from '../../src/site/devServer.ts';

let root: string;
let server: DevServer;

/** Sends raw bytes, returns the status line's code (or "closed" when the server closed without one). */
function raw(port: number, request: string, host = '127.0.0.1'): Promise<{ status: number | 'closed'; text: string }> {
  return new Promise((done, fail) => {
    const socket = connect(port, host);
    let text = '';
    socket.on('data', (b) => (text += b.toString('latin1')));
    socket.on('error', fail);
    socket.on('close', () => {
      const m = /^HTTP\/1\.1 (\d{3})/.exec(text);
      done({ status: m ? Number(m[1]) : 'closed', text });
    });
    socket.write(request);
  });
}

const get = (path: string, headers = 'Host: localhost\r\n') => raw(server.port, `GET ${path} HTTP/1.1\r\n${headers}Connection: close\r\n\r\n`);

beforeAll(async () => {
  const base = mkdtempSync(join(tmpdir(), 'matchbook-devserver-'));
  root = join(base, 'out');
  mkdirSync(join(root, 'boats', 'greyling'), { recursive: true });
  writeFileSync(join(root, 'index.html'), '<!doctype html><title>Index</title><body><h1>Demo index</h1></body>\n');
  writeFileSync(join(root, 'boats', 'greyling', 'index.html'), '<!doctype html><body><h1>Greyling</h1></body>\n');
  writeFileSync(join(root, 'sheet.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  writeFileSync(join(root, '.matchbook-output'), 'marker');
  writeFileSync(join(base, 'secret.txt'), 'SECRET=outside the served folder');
  symlinkSync(join(base, 'secret.txt'), join(root, 'leak.txt'));
  symlinkSync(base, join(root, 'up'));
  server = await startDevServer({ root, host: '127.0.0.1', port: 0, tries: 1 });
});

afterAll(async () => {
  await server?.close();
});

describe('the preview server answers every request and keeps serving', () => {
  it('listens on 127.0.0.1 and says the port the system gave', async () => {
    expect(server.url).toBe(`http://127.0.0.1:${server.port}/`);
    expect(server.port).toBeGreaterThan(0);
    expect(server.everyInterface).toBe(false);
    const page = await get('/');
    expect(page.status).toBe(200);
    expect(page.text).toContain('<h1>Demo index</h1>');
    // The page reloads itself after a rebuild: the script listens on the announcements.
    expect(page.text).toContain(`new EventSource("${EVENTS_PATH}")`);
  });

  const BAD: readonly [string, string, number][] = [
    ['a % not followed by two hex digits', 'GET /%E0%A4%A HTTP/1.1', 400],
    ['a % followed by non-hex', 'GET /boats/%zz HTTP/1.1', 400],
    ['percent-encoded bytes that are not UTF-8', 'GET /%C3%28 HTTP/1.1', 400],
    ['an encoded NUL', 'GET /index.html%00.svg HTTP/1.1', 400],
    ['an encoded backslash', 'GET /..%5c..%5csecret.txt HTTP/1.1', 400],
    ['dot segments sent raw', 'GET /../secret.txt HTTP/1.1', 403],
    ['dot segments percent-encoded', 'GET /%2e%2e/%2e%2e/secret.txt HTTP/1.1', 403],
    ['an encoded slash and dots', 'GET /boats%2f..%2f..%2f..%2fsecret.txt HTTP/1.1', 403],
    ['a link in the folder to a file outside it', 'GET /leak.txt HTTP/1.1', 403],
    ['a link in the folder to a folder outside it', 'GET /up/secret.txt HTTP/1.1', 403],
    ['the hidden marker file', 'GET /.matchbook-output HTTP/1.1', 404],
    ['a missing page', 'GET /boats/nobody/ HTTP/1.1', 404],
    ['a POST', 'POST / HTTP/1.1', 405],
    ['a DELETE', 'DELETE /index.html HTTP/1.1', 405],
    ['an absolute-form target', 'GET http://example.invalid/ HTTP/1.1', 400],
    ['an asterisk target', 'OPTIONS * HTTP/1.1', 405],
  ];
  for (const [what, line, status] of BAD) {
    it(`${what}: ${status}, and the next request is served`, async () => {
      const r = await raw(server.port, `${line}\r\nHost: localhost\r\nConnection: close\r\n\r\n`);
      expect(r.status, r.text).toBe(status);
      expect(r.text).not.toContain('SECRET');
      expect((await get('/index.html')).status).toBe(200);
    });
  }

  it('a Host header naming another machine is refused (421) while it listens on loopback', async () => {
    expect((await get('/', 'Host: attacker.example\r\n')).status).toBe(421);
    expect((await get('/', 'Host: 127.0.0.1:9\r\n')).status).toBe(200);
    expect((await get('/', 'Host: [::1]\r\n')).status).toBe(200);
  });

  it('bytes that are no HTTP at all: 400 and the connection closes; the server goes on', async () => {
    const r = await raw(server.port, 'HELLO THERE\r\n\r\n');
    expect(r.status).toBe(400);
    const overlong = await raw(server.port, `GET /${'a'.repeat(100_000)} HTTP/1.1\r\nHost: localhost\r\n\r\n`);
    expect([400, 431, 'closed']).toContain(overlong.status);
    expect((await get('/index.html')).status).toBe(200);
  });

  it('a folder without its slash is redirected to it, other files get their type', async () => {
    const r = await get('/boats/greyling');
    expect(r.status).toBe(301);
    expect(r.text).toMatch(/\r\nLocation: \/boats\/greyling\/\r\n/i);
    expect((await get('/boats/greyling/')).text).toContain('<h1>Greyling</h1>');
    const svg = await get('/sheet.svg');
    expect(svg.text).toMatch(/\r\nContent-Type: image\/svg\+xml\r\n/i);
    expect(svg.text).not.toContain('EventSource');
  });

  it('announces a rebuild to open pages', async () => {
    const seen = await new Promise<string>((done, fail) => {
      const socket = connect(server.port, '127.0.0.1');
      let text = '';
      socket.on('error', fail);
      socket.on('data', (b) => {
        text += b.toString();
        if (text.includes('data: 0\n\n') && !text.includes('data: 1')) server.reload();
        if (text.includes('data: 1\n\n')) {
          socket.destroy();
          done(text);
        }
      });
      socket.write(`GET ${EVENTS_PATH} HTTP/1.1\r\nHost: localhost\r\n\r\n`);
    });
    expect(seen).toMatch(/Content-Type: text\/event-stream/i);
    expect(seen.indexOf('data: 0')).toBeLessThan(seen.indexOf('data: 1'));
  });
});

describe('ports that cannot be had', () => {
  async function occupy(port: number): Promise<Server> {
    const s = createServer();
    await new Promise<void>((done, fail) => {
      s.once('error', fail);
      s.listen(port, '127.0.0.1', done);
    });
    return s;
  }

  it('a taken port asked for exactly: ServeAddressError naming it and another port to use', async () => {
    const taken = await occupy(0);
    const port = (taken.address() as { port: number }).port;
    try {
      const error = await startDevServer({ root, host: '127.0.0.1', port, tries: 1 }).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(ServeAddressError);
      expect((error as Error).message).toBe(
        `port ${port} on 127.0.0.1 is in use by another program; stop that program, or choose another port, for example --port ${port + 1} (--port 0 lets the system choose)`,
      );
    } finally {
      taken.close();
    }
  });

  it('the default port taken: the next free one is used and its real address told; none free is a sentence too', async () => {
    // Three ports in a row, held by us; the range logic is then checked on them.
    const first = await occupy(0);
    const port = (first.address() as { port: number }).port;
    const more: Server[] = [first];
    try {
      more.push(await occupy(port + 1));
      const moved = await startDevServer({ root, host: '127.0.0.1', port, tries: 3 });
      expect(moved.url).toBe(`http://127.0.0.1:${port + 2}/`);
      await moved.close();
      more.push(await occupy(port + 2));
      const error = await startDevServer({ root, host: '127.0.0.1', port, tries: 3 }).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(ServeAddressError);
      expect((error as Error).message).toBe(`ports ${port} to ${port + 2} on 127.0.0.1 are all in use by other programs; name a free one with --port N, or --port 0 to let the system choose`);
    } finally {
      for (const s of more) s.close();
    }
  });

  it('an address this machine does not have (192.0.2.1, TEST-NET-1 of RFC 5737): a sentence with the fix', async () => {
    const error = await startDevServer({ root, host: '192.0.2.1', port: 0, tries: 1 }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ServeAddressError);
    expect((error as Error).message).toContain('this machine has no address 192.0.2.1 to listen on; leave out --host');
  });
});
