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
import { profileSummary } from './profile.ts';

const ROOT = fileURLToPath(new URL('../', import.meta.url));
const EPOCH = '1767225600';

interface ChildFigures {
  readonly ms: number;
  /** User plus system CPU time of all threads: a figure the other load on a shared machine barely moves. */
  readonly cpuMs: number;
  readonly maxRssMb: number;
  readonly sheets: number;
  /** Wall time of the whole child process, Node's start and module loading included (set by the parent). */
  readonly processMs?: number;
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
  const start = performance.now();
  try {
    const text = execFileSync(process.execPath, ['--import', 'tsx', join(ROOT, 'bench/build.ts'), 'child', dataDir, outDir], {
      cwd: ROOT,
      encoding: 'utf8',
      maxBuffer: 1 << 24,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const figures = JSON.parse(text.trim().split('\n').pop() as string) as ChildFigures;
    return { ...figures, processMs: performance.now() - start };
  } catch (error) {
    const stderr = String((error as { stderr?: string }).stderr ?? error);
    return { failed: stderr.split('\n').find((l) => /Error: /.test(l))?.trim() ?? stderr.split('\n')[0] };
  }
}

function row(label: string, f: ChildFigures | { readonly failed: string }, goal: string): string {
  const line =
    'failed' in f
      ? `| ${label} | | failed: ${f.failed} | | | ${goal} |`
      : `| ${label} | ${f.sheets} | ${s(f.processMs ?? f.ms)} (build ${s(f.ms)}) | ${s(f.cpuMs)} | ${f.maxRssMb.toFixed(0)} MB | ${goal} |`;
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

type Outcome = ChildFigures | { readonly failed: string };
const ok = (f: Outcome): f is ChildFigures => !('failed' in f);
const wall = (f: ChildFigures): number => f.processMs ?? f.ms;

/** One row of the goal table: the figure, what was measured, the must and goal limits, and which hold. */
function goalRow(figure: string, measured: string, must: string, goal: string, verdict: { must: boolean; goal: boolean } | undefined): string {
  const met = verdict === undefined ? 'not measured' : verdict.goal ? 'goal met' : verdict.must ? 'must met' : 'not met';
  return `| ${figure} | ${measured} | ${must} | ${goal} | ${met} |`;
}

/** A fresh-process build of the 1,000-boat fleet after editing one boat file (the previous output in place). */
function editedFleetBuild(dataDir: string, outDir: string): Outcome {
  const file = join(dataDir, 'boats', 'gen-0500.yaml');
  writeFileSync(file, readFileSync(file, 'utf8').replace(/^name: .*$/m, 'name: Generated boat 500, edited (demo)'));
  return coldBuild(dataDir, outDir);
}

/** The demo built once more with `node --cpu-prof`: a summary of where each thread spends its time. */
function demoProfile(work: string): string[] {
  const dir = join(work, 'profile');
  try {
    execFileSync(process.execPath, ['--cpu-prof', `--cpu-prof-dir=${dir}`, '--import', 'tsx', join(ROOT, 'bench/build.ts'), 'child', join(ROOT, 'data'), join(work, 'profile-out')], {
      cwd: ROOT,
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    return profileSummary(dir);
  } catch (error) {
    return [`- profile failed: ${String(error).split('\n')[0]}`];
  }
}

/** Lines (Markdown) with every build figure and its goal. */
export async function runBuildBench(): Promise<string[]> {
  const work = mkdtempSync(join(tmpdir(), 'matchbook-bench-'));
  const lines: string[] = ['| Build | Sheets | Time (process) | CPU (all threads) | Peak memory (RSS, all threads) | Goal |', '| --- | ---: | ---: | ---: | ---: | --- |'];
  // One untimed build first: tsx compiles our TypeScript once per machine and caches it; "cold" below
  // means a fresh process with nothing of matchbook's in memory, as a user's second build is.
  coldBuild(join(ROOT, 'data'), join(work, 'warm-up-out'));
  const demo = coldBuild(join(ROOT, 'data'), join(work, 'demo-out'));
  lines.push(row('demo, cold', demo, '≤ 4 s (goal ≤ 3 s)'));
  const fleets = new Map<number, Outcome>();
  for (const boats of [10, 100, 1000]) {
    const dataDir = generateFleet({ demoDir: join(ROOT, 'data'), dir: join(work, `fleet-${boats}`), boats });
    const figures = coldBuild(dataDir, join(work, `fleet-${boats}-out`));
    fleets.set(boats, figures);
    lines.push(row(`${boats} generated boats, cold`, figures, boats === 1000 ? '≤ 60 s, ≤ 1 GB (goal ≤ 40 s, ≤ 600 MB)' : ''));
  }
  const edited = editedFleetBuild(join(work, 'fleet-1000'), join(work, 'fleet-1000-out'));
  lines.push(row('1000 generated boats, fresh process after editing one boat', edited, '≤ 5 s (goal ≤ 3 s)'));
  const warm = await warmRebuild(work).catch((error: Error) => ({ coldMs: Number.NaN, warmMs: Number.NaN, failed: error.message.split('\n')[0] }));
  if ('failed' in warm) lines.push(`| demo, warm rebuild | | failed: ${warm.failed} | | | < 1 s |`);
  else lines.push(`| demo, warm rebuild after editing one boat file (in-process cache, \`serve\`; first build ${s(warm.coldMs)}) | | ${s(warm.warmMs)} | | | < 1 s |`);
  process.stderr.write(`bench: warm rebuild ${s(warm.warmMs)}\n`);
  const pdf = await comparePdf({ dataDir: join(ROOT, 'data'), sourceDateEpoch: EPOCH });

  const f100 = fleets.get(100) as Outcome;
  const f1000 = fleets.get(1000) as Outcome;
  const growth = ok(f100) && ok(f1000) ? wall(f1000) / wall(f100) : undefined;
  const goals = [
    '### Goals of the speed issue (this run)',
    '',
    '| figure | measured | must | goal | status |',
    '| --- | ---: | ---: | ---: | --- |',
    goalRow('demo cold build, wall', ok(demo) ? s(wall(demo)) : 'failed', '≤ 4 s', '≤ 3 s', ok(demo) ? { must: wall(demo) <= 4000, goal: wall(demo) <= 3000 } : undefined),
    goalRow('1,000 boats cold, wall', ok(f1000) ? s(wall(f1000)) : 'failed', '≤ 60 s', '≤ 40 s', ok(f1000) ? { must: wall(f1000) <= 60_000, goal: wall(f1000) <= 40_000 } : undefined),
    goalRow('1,000 boats peak memory (RSS, all threads)', ok(f1000) ? `${f1000.maxRssMb.toFixed(0)} MB` : 'failed', '≤ 1 GB', '≤ 600 MB', ok(f1000) ? { must: f1000.maxRssMb <= 1024, goal: f1000.maxRssMb <= 600 } : undefined),
    goalRow('growth 100 → 1,000 boats (time ratio)', growth === undefined ? 'failed' : growth.toFixed(1), '≤ 11', 'linear (≤ 10)', growth === undefined ? undefined : { must: growth <= 11, goal: growth <= 10 }),
    goalRow('fresh-process `build` after editing one boat of 1,000', ok(edited) ? s(wall(edited)) : 'failed', '≤ 5 s', '≤ 3 s', ok(edited) ? { must: wall(edited) <= 5000, goal: wall(edited) <= 3000 } : undefined),
    goalRow('PDF vs Chromium page.pdf() without browser start, faster', `${pdf.faster.toFixed(1)}×`, '≥ 3×', '≥ 5×', { must: pdf.faster >= 3, goal: pdf.faster >= 5 }),
    goalRow('PDF vs Chromium page.pdf(), smaller', `${pdf.smaller.toFixed(1)}×`, '≥ 3×', '≥ 4×', { must: pdf.smaller >= 3, goal: pdf.smaller >= 4 }),
    '',
    'Wall times are of the whole fresh process (`node --import tsx`, start-up and module loading included); memory is the',
    "process's peak resident set, all threads included.",
    '',
    '### All build figures',
    '',
  ];
  process.stderr.write(`${goals.join('\n')}\n`);
  const profile = ['', '### CPU profile of the demo cold build (`node --cpu-prof`, every thread)', '', ...demoProfile(work)];
  return [...goals, ...lines, '', ...pdf.lines, ...profile];
}

if (process.argv[2] === 'child') {
  await childBuild(process.argv[3], process.argv[4]);
} else if (import.meta.url === `file://${process.argv[1]}`) {
  process.stdout.write(`${(await runBuildBench()).join('\n')}\n`);
}
