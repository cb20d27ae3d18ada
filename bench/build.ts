/**
 * Build benchmarks: the demo cold, generated fleets of 10, 100 and 1,000 boats (time and peak memory,
 * each in a child process so maxRSS belongs to that build alone), one warm rebuild after editing one
 * boat file, and our PDF against headless Chromium's page.pdf() for the same sheets.
 * Run all benches: npm run bench. Child mode: node --import tsx bench/build.ts child <dataDir> <outDir>.
 */
import { execFileSync } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildSite } from '../src/site/buildSite.ts';
import { createBuildCache } from '../src/site/renderCache.ts';
import { createRenderPool } from '../src/site/renderPool.ts';
import { generateFleet } from './fleet.ts';
import { comparePdf } from './pdfVsChromium.ts';

const ROOT = fileURLToPath(new URL('../', import.meta.url));
const EPOCH = '1767225600';

interface ChildFigures {
  readonly ms: number;
  /** User plus system CPU time of all threads: a figure the other load on a shared machine barely moves. */
  readonly cpuMs: number;
  readonly maxRssMb: number;
  readonly sheets: number;
}

/** One cold build in this process; prints its figures as JSON (child mode). */
async function childBuild(dataDir: string, outDir: string): Promise<void> {
  const start = performance.now();
  const outcome = await buildSite({ dataDir, outDir, sourceDateEpoch: EPOCH });
  if (!outcome.ok) throw new Error(outcome.errorsText);
  const figures: ChildFigures = {
    ms: performance.now() - start,
    cpuMs: (process.resourceUsage().userCPUTime + process.resourceUsage().systemCPUTime) / 1000,
    maxRssMb: process.resourceUsage().maxRSS / 1024,
    sheets: outcome.counts.sheets,
  };
  process.stdout.write(`${JSON.stringify(figures)}\n`);
}

/** One cold build in a child process; its figures, or the first line of why it failed. */
function coldBuild(dataDir: string, outDir: string): ChildFigures | { readonly failed: string } {
  try {
    const text = execFileSync(process.execPath, ['--import', 'tsx', join(ROOT, 'bench/build.ts'), 'child', dataDir, outDir], {
      cwd: ROOT,
      encoding: 'utf8',
      maxBuffer: 1 << 24,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    return JSON.parse(text.trim().split('\n').pop() as string) as ChildFigures;
  } catch (error) {
    const stderr = String((error as { stderr?: string }).stderr ?? error);
    return { failed: stderr.split('\n').find((l) => /Error: /.test(l))?.trim() ?? stderr.split('\n')[0] };
  }
}

function row(label: string, f: ChildFigures | { readonly failed: string }, goal: string): string {
  const line =
    'failed' in f
      ? `| ${label} | | failed: ${f.failed} | | | ${goal} |`
      : `| ${label} | ${f.sheets} | ${s(f.ms)} | ${s(f.cpuMs)} | ${f.maxRssMb.toFixed(0)} MB | ${goal} |`;
  process.stderr.write(`bench: ${line}\n`);
  return line;
}

/** The demo built twice in one process with one cache; the second time after editing one boat file. */
async function warmRebuild(work: string): Promise<{ coldMs: number; warmMs: number }> {
  const dataDir = join(work, 'warm-data');
  cpSync(join(ROOT, 'data'), dataDir, { recursive: true });
  const outDir = join(work, 'warm-out');
  const cache = createBuildCache();
  const renderer = createRenderPool();
  let start = performance.now();
  const first = await buildSite({ dataDir, outDir, sourceDateEpoch: EPOCH, cache, renderer });
  if (!first.ok) throw new Error(first.errorsText);
  const coldMs = performance.now() - start;
  const file = join(dataDir, 'boats', 'greyling.yaml');
  writeFileSync(file, readFileSync(file, 'utf8').replace(/^name: .*$/m, 'name: Greyling II (edited, demo)'));
  start = performance.now();
  const outcome = await buildSite({ dataDir, outDir, sourceDateEpoch: EPOCH, cache, renderer });
  const warmMs = performance.now() - start;
  await renderer.close();
  if (!outcome.ok) throw new Error(outcome.errorsText);
  return { coldMs, warmMs };
}

const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

/** Lines (Markdown) with every build figure and its goal. */
export async function runBuildBench(): Promise<string[]> {
  const work = mkdtempSync(join(tmpdir(), 'matchbook-bench-'));
  const lines: string[] = ['| Build | Sheets | Time | CPU (all threads) | Peak memory | Goal |', '| --- | ---: | ---: | ---: | ---: | --- |'];
  // One untimed build first: tsx compiles our TypeScript once per machine and caches it; "cold" below
  // means a fresh process with nothing of matchbook's in memory, as a user's second build is.
  coldBuild(join(ROOT, 'data'), join(work, 'warm-up-out'));
  lines.push(row('demo, cold', coldBuild(join(ROOT, 'data'), join(work, 'demo-out')), '< 5 s'));
  for (const boats of [10, 100, 1000]) {
    const dataDir = generateFleet({ demoDir: join(ROOT, 'data'), dir: join(work, `fleet-${boats}`), boats });
    const figures = coldBuild(dataDir, join(work, `fleet-${boats}-out`));
    lines.push(row(`${boats} generated boats, cold`, figures, boats === 1000 ? '< 60 s, < 1 GB' : ''));
  }
  const warm = await warmRebuild(work).catch((error: Error) => ({ coldMs: Number.NaN, warmMs: Number.NaN, failed: error.message.split('\n')[0] }));
  if ('failed' in warm) lines.push(`| demo, warm rebuild | | failed: ${warm.failed} | | | < 1 s |`);
  else lines.push(`| demo, warm rebuild after editing one boat file (in-process cache; first build ${s(warm.coldMs)}) | | ${s(warm.warmMs)} | | | < 1 s |`);
  process.stderr.write(`bench: warm rebuild ${s(warm.warmMs)}\n`);
  lines.push('', ...(await comparePdf({ dataDir: join(ROOT, 'data'), sourceDateEpoch: EPOCH })));
  return lines;
}

if (process.argv[2] === 'child') {
  await childBuild(process.argv[3], process.argv[4]);
} else if (import.meta.url === `file://${process.argv[1]}`) {
  process.stdout.write(`${(await runBuildBench()).join('\n')}\n`);
}
