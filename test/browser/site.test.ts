/**
 * The built demo site in a real browser (Debian's /usr/bin/chromium driven by playwright-core; no
 * browser is ever downloaded): every page loads without console errors, every link and download
 * answers, each chart carries its series, the guides show their images, no page is wider than a phone,
 * the print view fits the paper, and screenshots are saved under test-results/ for a person to look at.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PDFDocument } from 'pdf-lib';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serveStatic, type StaticServer } from './staticServer.ts';

const CHROMIUM = '/usr/bin/chromium';
const ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];
const PX_PER_MM = 96 / 25.4;
const PT_PER_MM = 72 / 25.4;

let outDir: string;
let server: StaticServer;
let context: BrowserContext;

beforeAll(async () => {
  const work = mkdtempSync(join(tmpdir(), 'matchbook-browser-'));
  outDir = join(work, 'out');
  execFileSync(process.execPath, ['--import', 'tsx', 'src/cli/main.ts', 'build', '--data', 'data', '--out', outDir], {
    env: { ...process.env, SOURCE_DATE_EPOCH: '1767225600' },
    stdio: 'pipe',
  });
  server = await serveStatic(outDir);
  context = await chromium.launchPersistentContext(join(work, 'profile'), {
    executablePath: CHROMIUM,
    headless: true,
    args: ARGS,
    viewport: { width: 1280, height: 900 },
  });
}, 600_000);

afterAll(async () => {
  await context?.close();
  await server?.close();
});

/** Opens a page and collects console errors and failed requests while it loads. */
async function open(path: string): Promise<{ page: Page; problems: string[] }> {
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('requestfailed', (r) => problems.push(`failed: ${r.url()}`));
  page.on('response', (r) => {
    if (r.status() >= 400) problems.push(`${r.status()}: ${r.url()}`);
  });
  const response = await page.goto(`${server.origin}/${path}`, { waitUntil: 'load' });
  expect(response?.status(), path).toBe(200);
  return { page, problems };
}

/** Every same-site page reachable from the index. */
async function crawl(): Promise<string[]> {
  const seen = new Set<string>(['index.html']);
  const queue = ['index.html'];
  while (queue.length > 0) {
    const path = queue.shift() as string;
    const { page } = await open(path);
    const hrefs = await page.$$eval('a[href]', (as) => as.map((a) => (a as HTMLAnchorElement).href));
    await page.close();
    for (const href of hrefs) {
      const url = new URL(href);
      if (url.origin !== server.origin || !url.pathname.endsWith('.html')) continue;
      const rel = url.pathname.slice(1);
      if (!seen.has(rel)) {
        seen.add(rel);
        queue.push(rel);
      }
    }
  }
  return [...seen].sort();
}

// Builds and a browser on a busy 2-core machine: generous limits; speed is measured in npm run bench.
describe('the built demo site in Chromium', { timeout: 600_000 }, () => {
  it('has an index, a page per engine family, boat and book, and a page per guide', async () => {
    const pages = await crawl();
    expect(pages).toContain('index.html');
    for (const guide of ['sheets', 'model', 'data-format', 'results']) expect(pages).toContain(`guides/${guide}/index.html`);
    expect(pages.filter((p) => p.startsWith('families/')).length).toBeGreaterThan(0);
    expect(pages.filter((p) => p.startsWith('boats/')).length).toBeGreaterThan(0);
    expect(pages.filter((p) => p.startsWith('books/')).length).toBeGreaterThan(0);
  });

  it('loads every page without console errors and every link, image and download answers', async () => {
    const targets = new Set<string>();
    for (const path of await crawl()) {
      const { page, problems } = await open(path);
      expect(problems, path).toEqual([]);
      // The cautions are on every page.
      expect(await page.locator('.cautions li').count(), path).toBeGreaterThan(0);
      const refs = await page.$$eval('[href], [src]', (els) =>
        els.map((e) => (e as HTMLAnchorElement).href || (e as HTMLImageElement).src),
      );
      for (const ref of refs) {
        const url = new URL(ref);
        if (url.origin === server.origin) targets.add(url.pathname);
      }
      await page.close();
    }
    expect(targets.size).toBeGreaterThan(10);
    for (const target of targets) {
      const head = await fetch(`${server.origin}${target}`, { method: 'HEAD' });
      expect(head.status, target).toBe(200);
      expect(Number(head.headers.get('content-length')), target).toBeGreaterThan(0);
    }
  });

  it('draws one absorption curve per impeller on every wall chart', async () => {
    const { page } = await open('index.html');
    const familyHrefs = await page.$$eval('#families a', (as) => as.map((a) => a.getAttribute('href') as string));
    await page.close();
    expect(familyHrefs.length).toBeGreaterThan(0);
    for (const href of familyHrefs) {
      const id = href.split('/')[1];
      const results = JSON.parse(readFileSync(join(outDir, 'results', 'families', `${id}.json`), 'utf8'));
      const { page: family } = await open(href);
      const charts = family.locator('figure.sheet[data-sheet-kind="wallChart"]');
      expect(await charts.count(), href).toBe(results.charts.length);
      for (let i = 0; i < results.charts.length; i += 1) {
        const keys = await charts
          .nth(i)
          .locator('svg [data-role="absorption-curve"]')
          .evaluateAll((els) => els.map((e) => e.getAttribute('data-key') as string));
        // One absorption curve per impeller in the power panel under the rpm ladder.
        const chart = results.charts[i];
        const expected = chart.impellers.map((imp: { impellerId: string }) => `impeller:${imp.impellerId}`);
        expect(keys.sort(), `${href} chart ${i}`).toEqual(expected.sort());
        // Text alternative beside the chart.
        expect((await charts.nth(i).locator('.text-alternative p').textContent())?.length ?? 0).toBeGreaterThan(40);
      }
      await family.close();
    }
  });

  it('draws every alternative impeller on each boat\'s spec sheet', async () => {
    const { page: index } = await open('index.html');
    const boatHrefs = await index.$$eval('#boats a', (as) => as.map((a) => a.getAttribute('href') as string));
    await index.close();
    expect(boatHrefs.length).toBeGreaterThan(0);
    for (const href of boatHrefs) {
      const results = JSON.parse(readFileSync(join(outDir, 'results', 'boats', `${href.split('/')[1]}.json`), 'utf8'));
      const { page } = await open(href);
      const kinds = await page.$$eval('figure.sheet', (fs) => fs.map((f) => f.getAttribute('data-sheet-kind')));
      expect(kinds, href).toEqual(['specSheet', 'consoleCard', 'upgradeSheet']);
      const keys = await page
        .locator('figure.sheet[data-sheet-kind="specSheet"] svg [data-role="absorption-curve"]')
        .evaluateAll((els) => els.map((e) => e.getAttribute('data-key')));
      const expected = results.alternatives.map((a: { impellerId: string }) => `impeller:${a.impellerId}`);
      expect(keys.sort(), href).toEqual(expected.sort());
      await page.close();
    }
  });

  it('prints a boat page as its sheets, each on a page of its own paper size', async () => {
    const { page: index } = await open('index.html');
    const boatHref = (await index.locator('#boats a').first().getAttribute('href')) as string;
    await index.close();
    const { page } = await open(boatHref);
    await page.emulateMedia({ media: 'print' });
    const sheets = await page.$$eval('figure.sheet svg', (svgs) =>
      svgs.map((s) => ({ w: s.getBoundingClientRect().width, h: s.getBoundingClientRect().height, wAttr: s.getAttribute('width') })),
    );
    expect(sheets.length).toBeGreaterThan(1);
    for (const s of sheets) {
      const widthMm = Number.parseFloat(s.wAttr ?? '');
      expect(Math.abs(s.w - widthMm * PX_PER_MM)).toBeLessThan(1);
    }
    const pdf = await PDFDocument.load(await page.pdf({ preferCSSPageSize: true, printBackground: true }));
    expect(pdf.getPageCount()).toBe(sheets.length);
    pdf.getPages().forEach((p, i) => {
      expect(Math.abs(p.getWidth() - (sheets[i].w / PX_PER_MM) * PT_PER_MM)).toBeLessThan(1.5);
      expect(Math.abs(p.getHeight() - (sheets[i].h / PX_PER_MM) * PT_PER_MM)).toBeLessThan(1.5);
    });
    await page.close();
  });

  it('summarises every boat on the index in one table row with one link', async () => {
    const { page } = await open('index.html');
    const table = page.locator('#boats table');
    expect(await table.locator('caption').textContent()).toMatch(/^Boats: /);
    const rows = table.locator('tbody tr');
    const reedshankResults = JSON.parse(readFileSync(join(outDir, 'results', 'boats', 'reedshank.json'), 'utf8'));
    expect(await rows.count()).toBe(6);
    for (let i = 0; i < (await rows.count()); i += 1) {
      expect(await rows.nth(i).locator('a').count()).toBe(1);
      expect(await rows.nth(i).locator('th[scope="row"] a').getAttribute('href')).toMatch(/^boats\/[a-z0-9-]+\/index\.html$/);
    }
    const reedshank = rows.filter({ hasText: reedshankResults.name });
    expect(await reedshank.locator('td').last().textContent()).toBe('Sea trials of 2026-03-14, 2026-03-21');
    await page.close();
  });

  it('shows a calibrated boat’s sea trials, the data-sheet figures beside the calibrated ones, and warnings in bold', async () => {
    const results = JSON.parse(readFileSync(join(outDir, 'results', 'boats', 'reedshank.json'), 'utf8'));
    const { page } = await open('boats/reedshank/index.html');
    expect(await page.locator('#trials tbody tr').count()).toBe(results.calibrated.calibration.trials.length);
    const captions = await page.locator('#results caption').allTextContents();
    expect(captions.filter((c) => c.includes('calibrated to sea trials of 2026-03-14, 2026-03-21'))).toHaveLength(3);
    expect(await page.locator('#results td.data-sheet').count()).toBeGreaterThan(results.alternatives.length);
    // Lugging and over-revving impellers: marked cells whose words are bold, so the tint only repeats them.
    const warnings = await page.locator('#results td.warn strong').all();
    expect(warnings.length).toBeGreaterThan(0);
    for (const w of warnings) expect(Number(await w.evaluate((e) => getComputedStyle(e).fontWeight))).toBeGreaterThanOrEqual(700);
    await page.close();
  });

  it('shows every guide with its images drawn, its page marked in the navigation, and no page wider than a phone', async () => {
    const guides = (await crawl()).filter((p) => p.startsWith('guides/'));
    expect(guides).toHaveLength(4);
    let images = 0;
    for (const path of guides) {
      const { page } = await open(path);
      expect(await page.locator('nav[aria-label="Guides"] a[aria-current="page"]').getAttribute('href'), path).toBe(`../../${path}`);
      const sizes = await page.$$eval('.guide img', (els) => els.map((e) => (e as HTMLImageElement).naturalWidth));
      images += sizes.length;
      expect(sizes.every((w) => w > 100), path).toBe(true);
      await page.close();
    }
    expect(images).toBe(11); // the five sheet thumbnails of docs/sheets.md (the repower comparison too) and its print-run checklist, the three pages of its stress spec sheet and the two of its stress wall chart
    // A phone held upright (420 CSS px): long code words wrap, tables and sheets scroll inside their boxes.
    mkdirSync('test-results', { recursive: true });
    for (const path of await crawl()) {
      const { page } = await open(path);
      await page.setViewportSize({ width: 420, height: 900 });
      expect(await page.evaluate(() => document.documentElement.scrollWidth), path).toBeLessThanOrEqual(420);
      if (path === 'guides/sheets/index.html') await page.screenshot({ path: 'test-results/site-guide-phone.png' });
      await page.close();
    }
  });

  it('saves screenshots of the index and one boat page under test-results/', async () => {
    mkdirSync('test-results', { recursive: true });
    const { page: index } = await open('index.html');
    await index.screenshot({ path: 'test-results/site-index.png', fullPage: true });
    const boatHref = (await index.locator('#boats a').first().getAttribute('href')) as string;
    await index.close();
    const { page: boat } = await open(boatHref);
    await boat.screenshot({ path: 'test-results/site-boat.png', fullPage: true });
    await boat.close();
    const { page: calibrated } = await open('boats/reedshank/index.html');
    await calibrated.locator('main').screenshot({ path: 'test-results/site-boat-calibrated.png' });
    await calibrated.close();
    expect(readFileSync('test-results/site-boat.png').length).toBeGreaterThan(10_000);
  });
});
