/**
 * `npm run bench`: every benchmark, printed and written to docs/performance.md. Speed is measured
 * here, never in tests. The model bench (bench/model.ts) joins when it is present.
 */
import { existsSync, writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import { fileURLToPath } from 'node:url';
import { runBuildBench } from './build.ts';

const ROOT = fileURLToPath(new URL('../', import.meta.url));

async function modelLines(): Promise<string[]> {
  if (!existsSync(`${ROOT}bench/model.ts`)) return ['(bench/model.ts not present)'];
  const { runModelBench } = (await import('./model.ts')) as { runModelBench: () => Promise<string[]> };
  return runModelBench();
}

const machine = `${cpus().length} × ${cpus()[0]?.model ?? 'CPU'}, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}`;
const model = await modelLines();
const build = await runBuildBench();
const report = [
  '# Performance',
  '',
  'Measured by `npm run bench` (this file is rewritten by it). Goals from the project brief. Wall times',
  'on a shared machine vary by a factor of two between runs. Tests never time anything; speed lives here.',
  '',
  `Machine: ${machine}.`,
  '',
  '## Model',
  '',
  ...model.map((l) => `- ${l}`),
  '',
  '## Build',
  '',
  ...build,
  '',
  '## How the build stays fast',
  '',
  '- Every analysis, scene and file is computed once per build in src/site and handed to Eleventy as one',
  '  global data object (a class instance, so Eleventy does not deep-copy it into every page).',
  '- SVG, PDF and PNG of each sheet, and the book PDFs, render in a pool of worker threads (one per core)',
  '  while the main thread builds the next scenes; at most four sheets are in flight, and pages read each',
  '  inline SVG back from its file, so memory does not grow with the fleet.',
  '- A PNG is drawn from an SVG whose text is already glyph outlines, so resvg lays out no text (about twice as fast); its encoder is ours (zlib level 2).',
  '- In a long-lived process (`matchbook serve`, the warm-rebuild bench) scenes are cached by a hash of the',
  '  definitions they are drawn from and files by a hash of the scene, so only changed sheets are redone.',
  '',
  '## Where the time goes',
  '',
  '- The profile above (one demo build, every thread) is the map: the two render workers are the critical path',
  '  (each busy nearly the whole build: pdf-lib and @pdf-lib/fontkit shaping and subsetting each sheet\'s fonts',
  '  again per file, resvg filling the 150 dpi PNG, zlib/pako), while the main thread waits about half the',
  '  time after shaping every new string with fontkit (about 1 s) and loading modules through tsx. Every',
  '  thread, the tsx loader threads included, pays for module loading (about 0.4 s each). On two cores the',
  '  build is CPU-bound: the busy time of all threads over two is about the wall time, so every saved CPU second counts.',
  '- What limits the goals, in order: per-sheet render CPU in the workers (PDF drawing and per-file font',
  '  subsets, then the PNG), text shaping on the main thread, start-up through tsx; a fresh-process build',
  '  after one edit redoes everything, as nothing persists between processes yet.',
  '- Timings were taken on a 2-core machine shared with other work; the CPU column is the steadier figure.',
  '',
];
const text = report.join('\n');
writeFileSync(`${ROOT}docs/performance.md`, text);
process.stdout.write(`${text}\n`);
