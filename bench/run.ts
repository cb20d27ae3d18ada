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
  'Measured by `npm run bench` (this file is rewritten by it). Goals from the project brief; timings',
  'vary between runs by roughly ±10 %. Tests never time anything; speed lives here.',
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
  '- Every analysis, scene and file is computed once per build in src/build and handed to Eleventy as one',
  '  global data object (a class instance, so Eleventy does not deep-copy it into every page).',
  '- A PNG is rasterised from the SVG already rendered, not from the scene a second time.',
  '- In a long-lived process (`matchbook serve`, the warm-rebuild bench) rendered SVG, PDF and PNG are',
  '  cached by a SHA-256 of the scene, so only sheets whose content changed are rendered again.',
  '',
];
const text = report.join('\n');
writeFileSync(`${ROOT}docs/performance.md`, text);
process.stdout.write(`${text}\n`);
