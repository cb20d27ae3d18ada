/**
 * `matchbook serve` in a real browser (Debian's /usr/bin/chromium driven by playwright-core): while the
 * data is broken, the page the user is looking at shows the problems at its top, with file:line:column
 * and the offending line under a caret; once the file is fixed the same page shows the fixed site,
 * without the test navigating or the server restarting. A half-written save (a file cut off mid-line)
 * is one of the broken states. The test waits for each state; it never asserts how long anything took.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REPO } from '../cli/runCli.ts';

const CHROMIUM = '/usr/bin/chromium';
const ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];
/** Long enough for a rebuild of the demo on a loaded 2-core machine; only a limit, never a measure. */
const WAIT_MS = 240_000;

let root: string;
let data: string;
let port: number;
let child: ChildProcess;
let context: BrowserContext;
let serverLog = '';

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const { port: p } = server.address() as { port: number };
  await new Promise<void>((done) => server.close(() => done()));
  return p;
}

async function waitForPage(url: string): Promise<void> {
  for (let attempt = 0; attempt < WAIT_MS / 500; attempt += 1) {
    const ok = await fetch(url).then((r) => r.ok, () => false);
    if (ok) return;
    await new Promise((done) => setTimeout(done, 500));
  }
  throw new Error(`gave up waiting for the first build at ${url}\n${serverLog}`);
}

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'matchbook-serve-browser-'));
  data = join(root, 'shop');
  cpSync(join(REPO, 'data'), data, { recursive: true });
  port = await freePort();
  child = spawn(process.execPath, [`${REPO}bin/matchbook.js`, 'serve', '--data', data, '--out', join(root, 'out'), '--port', String(port)], {
    cwd: root,
    env: { ...process.env, NO_COLOR: '1', SOURCE_DATE_EPOCH: '1767225600' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (b: Buffer) => (serverLog += b.toString()));
  child.stderr!.on('data', (b: Buffer) => (serverLog += b.toString()));
  await waitForPage(`http://localhost:${port}/boats/greyling/index.html`);
  context = await chromium.launchPersistentContext(join(root, 'profile'), { executablePath: CHROMIUM, headless: true, args: ARGS, viewport: { width: 1280, height: 900 } });
}, WAIT_MS + 60_000);

afterAll(async () => {
  await context?.close();
  child?.kill('SIGINT');
});

describe('matchbook serve shows what is wrong where the user is looking', () => {
  it('lists the problems on the open page, then reloads it to the fixed site', { timeout: 4 * WAIT_MS }, async () => {
    const file = join(data, 'boats', 'greyling.yaml');
    const good = readFileSync(file, 'utf8');
    const page = await context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (e) => pageErrors.push(e.message));
    await page.goto(`http://localhost:${port}/boats/greyling/index.html`, { waitUntil: 'load' });
    await expect(page.locator('h1').first().textContent()).resolves.toBe('Greyling (fishing boat)');
    expect(await page.locator('.build-problems').count()).toBe(0);

    // 1. A syntax error: the quote of the name never closes (line 4, column 7 of the file).
    writeFileSync(file, good.replace('name: Greyling (fishing boat)', 'name: "Greyling (fishing boat)'));
    const box = page.locator('.build-problems');
    await box.waitFor({ state: 'visible', timeout: WAIT_MS });
    await expect(box.locator('h2').textContent()).resolves.toBe('The data has 1 problem; fix it and save.');
    await expect(box.locator('code.where').first().textContent()).resolves.toBe(`${join(data, 'boats', 'greyling.yaml')}:4:7`);
    const item = (await box.locator('li').first().textContent()) ?? '';
    expect(item).toContain('found a " that opens the value of name but is never closed');
    // The offending line and a caret under the opening quote, in monospace.
    await expect(box.locator('pre').first().textContent()).resolves.toMatch(/^4 \| name: "Greyling \(fishing boat\)\n {2}\| {7}\^\n/);
    // The box is the first thing in the page's main content, above the cautions, which still show.
    const order = await page.evaluate(() => [...document.querySelectorAll('main > *')].slice(0, 2).map((e) => e.className));
    expect(order).toEqual(['build-problems', 'cautions']);
    // The page under it is the last good build.
    await expect(page.locator('h1').first().textContent()).resolves.toBe('Greyling (fishing boat)');
    mkdirSync(join(REPO, 'test-results'), { recursive: true });
    await page.screenshot({ path: join(REPO, 'test-results', 'serve-problems.png') });

    // Every served page shows the list, not only the one that was open.
    const index = await context.newPage();
    await index.goto(`http://localhost:${port}/index.html`, { waitUntil: 'load' });
    await expect(index.locator('.build-problems code.where').first().textContent()).resolves.toBe(`${join(data, 'boats', 'greyling.yaml')}:4:7`);
    await index.close();

    // 2. A half-written save: the file cut off in the middle of a line. Still a list, still serving.
    const cut = good.slice(0, good.indexOf('drive_line:') + 'drive_line:\n  rat'.length);
    writeFileSync(file, cut);
    await page.locator('.build-problems li', { hasText: 'greyling.yaml' }).filter({ hasNotText: 'never closed' }).first().waitFor({ timeout: WAIT_MS });
    const halfWritten = (await box.textContent()) ?? '';
    expect(halfWritten).toContain('greyling.yaml:');
    expect(halfWritten).not.toContain('never closed');

    // 3. Fixed, and renamed: the same page reloads by itself to the new site, without the list.
    writeFileSync(file, good.replace('name: Greyling (fishing boat)', 'name: Greyling Mended (demo)'));
    await page.locator('h1', { hasText: 'Greyling Mended (demo)' }).waitFor({ timeout: WAIT_MS });
    expect(await page.locator('.build-problems').count()).toBe(0);
    expect(pageErrors).toEqual([]);
    expect(child.exitCode).toBeNull();
    await page.screenshot({ path: join(REPO, 'test-results', 'serve-fixed.png') });
  });
});
