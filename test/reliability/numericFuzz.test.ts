/**
 * Every numeric field of every file kind (read from the JSON Schemas, test/reliability/numericFields.ts)
 * set in a copy of the demo data at its bounds, just inside and just past them, and at extreme
 * magnitudes (1e-300, 1e300, -0, 0, huge negative, Number.MAX_VALUE), or anywhere inside its range; then
 * the real `check` (checkSite) and the real build (buildSite) on disk. For every such file:
 *   - neither throws (a throw is what the command line reports as exit 3, "a fault in matchbook");
 *   - check succeeds exactly when the build does;
 *   - a refusal names a definition's file:line:column on every problem line, with no stack trace;
 *   - a good build has no NaN, Infinity or undefined in any SVG sheet, page or results file.
 * The build is the whole build (every sheet laid out, results, pages through Eleventy) except that the
 * render step writes the SVG only: PNG and PDF are drawn from the same scene (test/reliability/
 * demoBuild.test.ts checks them on the demo), and skipping them keeps a run under a second.
 * Seeded; MATCHBOOK_NUMERIC_FUZZ_RUNS raises the count (800 were run once while writing it).
 */
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import fc from 'fast-check';
import { register } from 'tsx/esm/api';
import { afterAll, describe, expect, it } from 'vitest';
import { renderSvg } from '../../src/render/index.ts';
import { buildSite } from '../../src/site/buildSite.ts';
import { checkSite } from '../../src/site/checkSite.ts';
import type { SheetRenderer } from '../../src/site/renderPool.ts';
import { STACK_TRACE } from './cli.ts';
import { fuzzRuns } from './mutations.ts';
import { demoWithNumber, fieldPath, inRange, NUMERIC_FIELDS, stressValues } from './numericFields.ts';

const SEED = 20261214;
const SOURCE_DATE_EPOCH = '1767225600'; // 2026-01-01 UTC
/** A problem line as the data layer prints it: `…/boats/x.yaml:3:1 …`. */
const LOCATED = /^\S*\.yaml:\d+:\d+ /;

// Eleventy imports the .11ty.ts templates with Node's own import(): the loader bin/matchbook.js registers.
const unregister = register();
const root = mkdtempSync(join(tmpdir(), 'matchbook-numfuzz-'));
afterAll(async () => {
  await unregister();
  rmSync(root, { recursive: true, force: true });
});

/** The render step of a build with the SVG only (see the head of this file). */
const svgOnly: SheetRenderer = {
  render: async (scene) => ({
    svg: renderSvg(scene),
    pdf: new Uint8Array(),
    png: new Uint8Array(),
    ...(scene.morePages ? { morePages: scene.morePages.map((page) => ({ svg: renderSvg(page), png: new Uint8Array() })) } : {}),
  }),
  renderBook: async () => new Uint8Array(),
  close: async () => {},
};

const files = (dir: string): string[] => readdirSync(dir).flatMap((n) => (statSync(join(dir, n)).isDirectory() ? files(join(dir, n)) : [join(dir, n)]));

/** Problem lines of a report: not the indented source excerpts, warnings or the closing count. */
const problemLines = (text: string) => text.split('\n').filter((l) => l !== '' && !/^\s/.test(l) && !l.startsWith('warning: ') && !/(problems? in the data|Fix them and run check again)\.$/.test(l));

/** A field and a value: a stress value (index into stressValues), or any value inside the range. */
const change = fc.record({
  field: fc.nat({ max: NUMERIC_FIELDS.length - 1 }),
  pick: fc.nat({ max: 7 }),
  value: fc.oneof({ weight: 3, arbitrary: fc.nat().map((i) => ({ stress: i })) }, { weight: 2, arbitrary: fc.double({ min: 0, max: 1, noNaN: true }).map((u) => ({ inside: u })) }),
});

describe('every numeric field at its bounds and at extreme magnitudes: check ⇔ build, never a fault (seeded fuzz)', () => {
  it('a located error in check and build, or a good build with finite figures', { timeout: 600_000 }, async () => {
    const seen = { built: 0, refused: 0, insideRefused: 0 };
    let run = 0;
    await fc.assert(
      fc.asyncProperty(change, async ({ field: index, pick, value }) => {
        const field = NUMERIC_FIELDS[index];
        const stress = stressValues(field);
        const number =
          'stress' in value ? stress[value.stress % stress.length] : field.only ? field.only[Math.floor(value.inside * field.only.length) % field.only.length] : Number((field.min + value.inside * (field.max - field.min)).toPrecision(6));
        const made = demoWithNumber({ field, number, pick })!;
        const what = `${made.path} ${fieldPath(made.at)} = ${number}`;
        const dir = join(root, `run-${(run += 1)}`);
        const dataDir = join(dir, 'data');
        for (const f of made.files) {
          const to = join(dir, f.path);
          mkdirSync(dirname(to), { recursive: true });
          writeFileSync(to, f.text);
        }
        let check: Awaited<ReturnType<typeof checkSite>>;
        let build: Awaited<ReturnType<typeof buildSite>>;
        try {
          check = await checkSite(dataDir, { sourceDateEpoch: SOURCE_DATE_EPOCH });
          build = await buildSite({ dataDir, outDir: join(dir, 'out'), sourceDateEpoch: SOURCE_DATE_EPOCH, renderer: svgOnly });
        } catch (error) {
          throw new Error(`${what}: a fault (exit 3): ${(error as Error).stack}`);
        }
        const verdicts = `${what}\ncheck: ${check.text}\nbuild: ${build.ok ? 'ok' : build.errorsText}`;
        expect(check.exitCode === 0, verdicts).toBe(build.ok);
        if (!build.ok) {
          seen.refused++;
          if (inRange(field, number)) seen.insideRefused++;
          for (const line of [...problemLines(check.text), ...problemLines(build.errorsText)]) expect(line, verdicts).toMatch(LOCATED);
          expect(check.text + build.errorsText, verdicts).not.toMatch(STACK_TRACE);
          // A value outside its range is refused at its own field.
          if (!inRange(field, number)) expect(check.text, verdicts).toContain(` ${fieldPath(made.at)} must be`);
        } else {
          seen.built++;
          // The guides are the prose of docs/, which may name NaN on purpose; no figure is computed there.
          const out = join(dir, 'out');
          for (const file of files(out).filter((f) => /\.(svg|html|json)$/.test(f) && !f.startsWith(join(out, 'guides')))) {
            expect(readFileSync(file, 'utf8'), `${what}: ${file}`).not.toMatch(/\bNaN\b|\bInfinity\b|\bundefined\b/);
          }
        }
        rmSync(dir, { recursive: true, force: true });
      }),
      { seed: SEED, numRuns: fuzzRuns({ name: 'MATCHBOOK_NUMERIC_FUZZ_RUNS', fallback: 150 }), endOnFailure: true },
    );
    // The seed reaches both sides of the equivalence.
    expect(seen.built).toBeGreaterThan(0);
    expect(seen.refused).toBeGreaterThan(0);
  });
});
