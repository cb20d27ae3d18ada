/**
 * The preview server of `matchbook serve`: a small static HTTP server for the output folder, of our
 * own so that every part of it is ours to hold to a promise.
 *
 * - It listens on the loopback address (127.0.0.1) unless asked for another host, and tells the
 *   address it really listens on (the port the system gave, the next one when the default was taken).
 * - Every request it cannot answer gets a 4xx and the server keeps serving: a method other than GET or
 *   HEAD (405), a malformed percent-encoding, a NUL or backslash in the path (400), a path that leaves
 *   the folder, directly or through a link (403), a Host header that is not this machine while it
 *   listens on loopback (421, against DNS rebinding), a missing or hidden file (404). A fault of ours
 *   in one answer is a 500 for that answer only.
 * - Nothing outside the output folder is served.
 * - Each HTML page it sends carries a one-line script that listens on /.matchbook/events and reloads
 *   the page when a newer build is announced; the files on disk are not changed.
 * - A port in use, an address this machine does not have, or a port that needs privileges is a
 *   ServeAddressError with one sentence and the fix (a usage error), never a fault.
 */
import { createReadStream, existsSync, readFileSync, realpathSync, statSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import { isIP, type AddressInfo } from 'node:net';
import { extname, join, resolve, sep } from 'node:path';

export class ServeAddressError extends Error {}

export interface DevServerOptions {
  /** The folder served (the output folder); it may not exist yet while the first build runs. */
  readonly root: string;
  /** The address to listen on; 127.0.0.1 keeps the preview on this machine. */
  readonly host: string;
  /** The first port to try; 0 lets the system choose a free one. */
  readonly port: number;
  /** How many ports from `port` on to try when one is taken (1: exactly `port`). */
  readonly tries: number;
}

export interface DevServer {
  /** The address really listened on, as a URL ("http://127.0.0.1:8080/"). */
  readonly url: string;
  readonly port: number;
  /** True when the server listens on every interface (0.0.0.0 or ::), so other machines may reach it. */
  readonly everyInterface: boolean;
  /** Tells every open page that a new build is there (they reload). */
  reload(): void;
  close(): Promise<void>;
}

/** The path of the reload announcements; a dot folder, so no built file can take its place. */
export const EVENTS_PATH = '/.matchbook/events';

const TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.csv': 'text/csv; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.json': 'application/json',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.pdf': 'application/pdf',
  '.ttf': 'font/ttf',
  '.txt': 'text/plain; charset=utf-8',
};

const LOOPBACK_NAMES = new Set(['localhost', '127.0.0.1', '[::1]']);

function isLoopback(host: string): boolean {
  return host === 'localhost' || host === '::1' || /^127\.\d+\.\d+\.\d+$/.test(host);
}

/** The name part of a Host header ("localhost:8080" → "localhost", "[::1]:80" → "[::1]"). */
function hostName(header: string | undefined): string {
  const h = (header ?? '').toLowerCase();
  if (h.startsWith('[')) return h.slice(0, h.indexOf(']') + 1);
  return h.replace(/:\d*$/, '');
}

function plain(res: ServerResponse, status: number, text: string, headers: Record<string, string> = {}): void {
  res.writeHead(status, { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store', 'X-Content-Type-Options': 'nosniff', ...headers });
  res.end(`${text}\n`);
}

/** The script each served page gets: reload when the build announced differs from the one served. */
function reloadScript(generation: number): string {
  return `<script>(()=>{const s=new EventSource(${JSON.stringify(EVENTS_PATH)});s.onmessage=(e)=>{if(e.data!==${JSON.stringify(String(generation))})location.reload()}})()</script>`;
}

/** Where a request path leads inside root, or the status that refuses it. */
type Target = { readonly file: string; readonly redirect?: undefined } | { readonly redirect: string } | { readonly status: number; readonly why: string };

function locate(root: string, rawPath: string): Target {
  let path: string;
  try {
    path = decodeURIComponent(rawPath);
  } catch {
    return { status: 400, why: 'the address holds a malformed percent-encoding (a % not followed by two hex digits of UTF-8)' };
  }
  if (path.includes('\0') || path.includes('\\')) return { status: 400, why: 'the address holds a NUL or a backslash' };
  const base = resolve(root);
  const file = resolve(base, `.${path}`);
  if (file !== base && !file.startsWith(`${base}${sep}`)) return { status: 403, why: 'the address leads outside the served folder' };
  // Hidden names (the output marker, work folders) are not part of the site.
  if (path.split('/').some((part) => part.startsWith('.'))) return { status: 404, why: 'no such page' };
  if (!existsSync(file)) return { status: 404, why: 'no such page' };
  // A link inside the folder must not lead out of it either.
  const real = realpathSync(file);
  const realBase = realpathSync(base);
  if (real !== realBase && !real.startsWith(`${realBase}${sep}`)) return { status: 403, why: 'the address leads outside the served folder' };
  if (statSync(real).isDirectory()) {
    if (!rawPath.endsWith('/')) return { redirect: `${rawPath}/` };
    const index = join(real, 'index.html');
    return existsSync(index) ? { file: index } : { status: 404, why: 'no such page' };
  }
  return { file: real };
}

/** Starts listening; rejects with ServeAddressError when the address cannot be had. */
export async function startDevServer(opts: DevServerOptions): Promise<DevServer> {
  const root = resolve(opts.root);
  const events = new Set<ServerResponse>();
  let generation = 0;
  const guardHost = isLoopback(opts.host);

  const answer = (req: IncomingMessage, res: ServerResponse): void => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return plain(res, 405, 'the preview answers GET and HEAD only', { Allow: 'GET, HEAD' });
    if (guardHost && !LOOPBACK_NAMES.has(hostName(req.headers.host))) {
      return plain(res, 421, 'this preview answers only to localhost, 127.0.0.1 or [::1]');
    }
    const raw = req.url ?? '';
    if (!raw.startsWith('/')) return plain(res, 400, 'the address must be a path starting with /');
    const rawPath = raw.replace(/[?#].*$/s, '');
    if (rawPath === EVENTS_PATH) {
      res.writeHead(200, { 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-store', Connection: 'keep-alive' });
      res.write(`data: ${generation}\n\n`);
      events.add(res);
      req.on('close', () => events.delete(res));
      return;
    }
    if (!existsSync(root)) return plain(res, 503, 'the first build is still running; this page answers when it is done', { 'Retry-After': '2' });
    const target = locate(root, rawPath);
    if ('status' in target) return plain(res, target.status, target.why);
    if (target.redirect !== undefined) {
      res.writeHead(301, { Location: target.redirect, 'Cache-Control': 'no-store' });
      res.end();
      return;
    }
    const type = TYPES[extname(target.file).toLowerCase()] ?? 'application/octet-stream';
    const headers = { 'Content-Type': type, 'Cache-Control': 'no-store', 'X-Content-Type-Options': 'nosniff' };
    if (type.startsWith('text/html')) {
      const html = readFileSync(target.file, 'utf8');
      const script = reloadScript(generation);
      const body = Buffer.from(html.includes('</body>') ? html.replace('</body>', `${script}</body>`) : `${html}${script}`);
      res.writeHead(200, { ...headers, 'Content-Length': String(body.length) });
      res.end(req.method === 'HEAD' ? undefined : body);
      return;
    }
    res.writeHead(200, { ...headers, 'Content-Length': String(statSync(target.file).size) });
    if (req.method === 'HEAD') return void res.end();
    const stream = createReadStream(target.file);
    stream.on('error', () => res.destroy());
    stream.pipe(res);
  };

  const server: Server = createServer((req, res) => {
    try {
      answer(req, res);
    } catch (error) {
      // A fault of ours in one answer: that answer is a 500, the server goes on.
      if (!res.headersSent) plain(res, 500, `matchbook could not answer this request (${error instanceof Error ? error.message : String(error)})`);
      else res.destroy();
    }
  });
  // A request Node cannot even parse: 400, and the connection closes; the server goes on.
  server.on('clientError', (_error, socket) => {
    if (socket.writable) socket.end('HTTP/1.1 400 Bad Request\r\nConnection: close\r\nContent-Length: 0\r\n\r\n');
    else socket.destroy();
  });

  const port = await listen(server, opts);
  const address = server.address() as AddressInfo;
  const shownHost = address.family === 'IPv6' ? `[${address.address}]` : address.address;
  const everyInterface = address.address === '0.0.0.0' || address.address === '::';
  return {
    url: `http://${shownHost}:${port}/`,
    port,
    everyInterface,
    reload() {
      generation += 1;
      for (const res of events) res.write(`data: ${generation}\n\n`);
    },
    close: () =>
      new Promise<void>((done) => {
        for (const res of events) res.end();
        events.clear();
        server.close(() => done());
        server.closeAllConnections();
      }),
  };
}

/** Listens on the first free port of the range; a port problem becomes a sentence with the fix. */
async function listen(server: Server, opts: DevServerOptions): Promise<number> {
  const last = opts.port === 0 ? 0 : Math.min(65535, opts.port + Math.max(1, opts.tries) - 1);
  for (let port = opts.port; ; port += 1) {
    try {
      await new Promise<void>((done, fail) => {
        const onError = (error: Error) => {
          server.off('listening', onListening);
          fail(error);
        };
        const onListening = () => {
          server.off('error', onError);
          done();
        };
        server.once('error', onError);
        server.once('listening', onListening);
        server.listen(port, opts.host);
      });
      return (server.address() as AddressInfo).port;
    } catch (error) {
      const code = (error as { code?: string }).code;
      if (code === 'EADDRINUSE' && port < last) continue;
      throw addressError(code, error, { ...opts, port: opts.port, last });
    }
  }
}

function addressError(code: string | undefined, error: unknown, o: DevServerOptions & { last: number }): unknown {
  const where = isIP(o.host) === 6 ? `[${o.host}]` : o.host;
  switch (code) {
    case 'EADDRINUSE':
      return new ServeAddressError(
        o.last > o.port
          ? `ports ${o.port} to ${o.last} on ${where} are all in use by other programs; name a free one with --port N, or --port 0 to let the system choose`
          : `port ${o.port} on ${where} is in use by another program; stop that program, or choose another port, for example --port ${o.port === 65535 ? 8080 : o.port + 1} (--port 0 lets the system choose)`,
      );
    case 'EACCES':
    case 'EPERM':
      return new ServeAddressError(`port ${o.port} on ${where} may not be used without administrator rights (ports below 1024 need them); choose --port 8080 or another above 1023`);
    case 'EADDRNOTAVAIL':
    case 'ENOTFOUND':
    case 'EAI_AGAIN':
    case 'EAFNOSUPPORT':
      return new ServeAddressError(`this machine has no address ${o.host} to listen on; leave out --host (this machine only, 127.0.0.1), or give one of this machine's own addresses`);
    default:
      return error;
  }
}
