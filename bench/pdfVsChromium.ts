/**
 * Our PDF renderer against headless Chromium printing the same sheets (our SVG, one page per sheet at
 * the sheet's paper size). Time with and without the browser's start, total file size, and whether two
 * runs give identical bytes.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { loadProject } from '../src/data/load.ts';
import { planSheets } from '../src/site/planSheets.ts';
import { renderPdf, renderSvg } from '../src/render/index.ts';
import type { Scene } from '../src/scene/types.ts';
import { sheetScene } from '../src/sheets/index.ts';

const ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

async function ours(scenes: readonly Scene[]): Promise<{ ms: number; files: Uint8Array[] }> {
  const start = performance.now();
  const files: Uint8Array[] = [];
  for (const scene of scenes) {
    files.push(await renderPdf([scene], { title: scene.title, subject: scene.subject, keywords: scene.keywords, dateIso: scene.dateIso }));
  }
  return { ms: performance.now() - start, files };
}

async function chromiumPdfs(scenes: readonly Scene[]): Promise<{ ms: number; startMs: number; files: Uint8Array[] }> {
  const start = performance.now();
  const context = await chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'matchbook-bench-profile-')), {
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ARGS,
  });
  const page = await context.newPage();
  const startMs = performance.now() - start;
  const files: Uint8Array[] = [];
  for (const scene of scenes) {
    const css = `@page { size: ${scene.widthMm}mm ${scene.heightMm}mm; margin: 0 } body { margin: 0 }`;
    await page.setContent(`<!doctype html><style>${css}</style>${renderSvg(scene)}`.replace(/<\?xml[^>]*\?>/, ''));
    files.push(new Uint8Array(await page.pdf({ preferCSSPageSize: true, printBackground: true })));
  }
  await context.close();
  return { ms: performance.now() - start, startMs, files };
}

const same = (a: readonly Uint8Array[], b: readonly Uint8Array[]) =>
  a.length === b.length && a.every((f, i) => Buffer.compare(Buffer.from(f), Buffer.from(b[i])) === 0);
const bytes = (files: readonly Uint8Array[]) => files.reduce((n, f) => n + f.length, 0);

export interface PdfComparison {
  /** Markdown lines comparing the two on every demo sheet. */
  readonly lines: string[];
  /** Chromium's time without its start over ours. */
  readonly faster: number;
  /** Chromium's total bytes over ours. */
  readonly smaller: number;
}

/** Our PDFs against Chromium's on every demo sheet. */
export async function comparePdf(args: { dataDir: string; sourceDateEpoch: string }): Promise<PdfComparison> {
  const loaded = await loadProject(args.dataDir);
  if (!loaded.ok) throw new Error('demo data does not load');
  const dateIso = new Date(Number(args.sourceDateEpoch) * 1000).toISOString().slice(0, 10);
  const scenes = planSheets(loaded.project).sheets.map((p) => sheetScene(p.request, { project: loaded.project, dateIso }));
  await ours(scenes); // warm up fonts and the JIT, as the browser gets its start excluded below
  const a = await ours(scenes);
  const b = await ours(scenes);
  const c1 = await chromiumPdfs(scenes);
  const c2 = await chromiumPdfs(scenes);
  const ratio = (x: number, y: number) => `${(x / y).toFixed(1)}×`;
  const lines = [
    `| PDF of ${scenes.length} demo sheets | matchbook | Chromium page.pdf() | Ratio |`,
    '| --- | ---: | ---: | ---: |',
    `| time, with browser start | ${a.ms.toFixed(0)} ms | ${c1.ms.toFixed(0)} ms | ${ratio(c1.ms, a.ms)} faster |`,
    `| time, without browser start | ${a.ms.toFixed(0)} ms | ${(c1.ms - c1.startMs).toFixed(0)} ms | ${ratio(c1.ms - c1.startMs, a.ms)} faster |`,
    `| total size | ${(bytes(a.files) / 1024).toFixed(0)} KiB | ${(bytes(c1.files) / 1024).toFixed(0)} KiB | ${ratio(bytes(c1.files), bytes(a.files))} smaller |`,
    `| two runs byte-identical | ${same(a.files, b.files) ? 'yes' : 'no'} | ${same(c1.files, c2.files) ? 'yes' : 'no'} | |`,
  ];
  return { lines, faster: (c1.ms - c1.startMs) / a.ms, smaller: bytes(c1.files) / bytes(a.files) };
}
