/**
 * Every case of the bad-input corpus (test/fixtures/bad) is refused with located errors — file, line,
 * column, field, the value found and what was expected — and `matchbook check` exits 1 on it.
 * Cases marked accepted (a byte-order mark, CR LF line endings, a stray .yml) load, as documented.
 */
import { readFileSync, truncateSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { checkData } from '../../src/data/check.ts';
import { terminalSafe } from '../../src/data/errors.ts';
import { loadProject } from '../../src/data/load.ts';
import type { DataError } from '../../src/data/types.ts';
import { MAX_FILE_BYTES } from '../../src/data/yamlSource.ts';
import { mapLimit, matchbook, STACK_TRACE } from './cli.ts';
import { listCases, materialise, removeDir, tempDir, type BadCase, type ExpectedError } from './corpus.ts';

const cases = listCases();
const work = tempDir('corpus');
afterAll(() => removeDir(work));

/** Materialise a case once per test file run. */
const dirs = new Map<string, string>();
function dataDirOf(c: BadCase): string {
  if (!dirs.has(c.name)) dirs.set(c.name, materialise(c, join(work, c.name)));
  return dirs.get(c.name)!;
}

function matches(e: DataError, x: ExpectedError, dataDir: string): boolean {
  return e.file === `${dataDir}/${x.file}` && e.line === x.line && e.column === x.column && e.field === x.field && e.found === x.found && e.expected.includes(x.expected);
}

function expectLocated(actual: readonly DataError[], wanted: readonly ExpectedError[], dataDir: string): void {
  for (const x of wanted) {
    const hit = actual.find((e) => matches(e, x, dataDir));
    expect(hit, `no error ${x.file}:${x.line}:${x.column} ${x.field} among\n${actual.map((e) => e.message).join('\n')}`).toBeDefined();
    // The printed sentence leads with the place and carries both the found and the expected text.
    expect(hit!.message.startsWith(`${dataDir}/${x.file}:${x.line}:${x.column} `)).toBe(true);
    // The sentence carries user text through the terminal escape (a key of ESC sequences shows as \u001b…).
    expect(hit!.message).toContain(terminalSafe(x.found));
    expect(hit!.message).toContain(x.expected);
  }
  // No cascade into files the case did not name.
  const named = new Set(wanted.map((x) => `${dataDir}/${x.file}`));
  expect(actual.filter((e) => !named.has(e.file)).map((e) => e.message)).toEqual([]);
  for (const e of actual) {
    expect(e.line).toBeGreaterThanOrEqual(1);
    expect(e.column).toBeGreaterThanOrEqual(1);
    expect(e.message).not.toMatch(STACK_TRACE);
  }
}

describe('the bad-input corpus', () => {
  it('holds at least 40 refused inputs and each names its expected errors', () => {
    const refused = cases.filter((c) => !c.accepted);
    expect(refused.length).toBeGreaterThanOrEqual(40);
    for (const c of refused) expect(c.errors.length, c.name).toBeGreaterThan(0);
  });

  it.each(cases.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
    const dataDir = dataDirOf(c);
    const result = await loadProject(dataDir);
    const report = await checkData(dataDir);
    if (c.accepted) {
      expect(result.ok, result.ok ? '' : result.errors.map((e) => e.message).join('\n')).toBe(true);
      expect(report.exitCode).toBe(0);
      expectLocated(result.warnings, c.warnings, dataDir);
      return;
    }
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expectLocated(result.errors, c.errors, dataDir);
    expect(report.exitCode).toBe(1);
    expect(report.text).toContain(result.errors[0].message);
  });
});

describe('generated large files', () => {
  const CURVE = 'engines/copperwhistle-strider.yaml';

  it('refuses a curve of 100 000 rows (a file of several MB) at its points list', async () => {
    const rows = Array.from({ length: 100_000 }, (_, i) => `    - [${1000 + i}, ${60 + (i % 300)}.25]`).join('\n');
    const text = `id: copperwhistle-strider\nlabel: Big\nmaker: Demo\nfuel: petrol\naspiration: natural\nidle_rpm: 650\nwot_window_rpm: [4600, 5000]\nmax_rpm: 5200\ncurve:\n  unit: hp\n  points:\n${rows}\nvariants:\n  - id: sport\n    label: 350 hp\n  - id: economy\n    label: 320\n  - id: race\n    label: 380\n`;
    expect(Buffer.byteLength(text)).toBeGreaterThan(2 * 1024 * 1024);
    expect(Buffer.byteLength(text)).toBeLessThan(MAX_FILE_BYTES);
    const dataDir = materialise({ name: 'bom-at-start', about: '', remove: [], errors: [], warnings: [], files: [], accepted: true }, join(work, 'several-mb'));
    writeFileSync(join(dataDir, CURVE), text);
    const result = await loadProject(dataDir);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expectLocated(result.errors, [{ file: CURVE, line: 11, column: 3, field: 'curve.points', found: 'a list of 100000 entries', expected: 'must have at most 200 rows' }], dataDir);
  });

  it('refuses a file over the size cap at 1:1 without reading it into the parser', async () => {
    const dataDir = materialise({ name: 'bom-at-start', about: '', remove: [], errors: [], warnings: [], files: [], accepted: true }, join(work, 'too-big'));
    writeFileSync(join(dataDir, CURVE), `notes: "${'x'.repeat(6 * 1024 * 1024)}"\n`);
    const result = await loadProject(dataDir);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expectLocated(result.errors, [{ file: CURVE, line: 1, column: 1, field: '', found: '6.0 MB', expected: 'must be at most 5 MB' }], dataDir);
  });

  it('refuses a 50 MB file by its size, before reading it (a sparse file: nothing is written)', async () => {
    const dataDir = materialise({ name: 'bom-at-start', about: '', remove: [], errors: [], warnings: [], files: [], accepted: true }, join(work, 'fifty-mb'));
    truncateSync(join(dataDir, CURVE), 50 * 1024 * 1024);
    const result = await loadProject(dataDir);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expectLocated(result.errors, [{ file: CURVE, line: 1, column: 1, field: '', found: '50.0 MB', expected: 'must be at most 5 MB' }], dataDir);
  });

  it('refuses 10,000 unknown keys with one located error each, at its own line', async () => {
    const JET = 'jets/kelpspindle-riffle.yaml';
    const dataDir = materialise({ name: 'bom-at-start', about: '', remove: [], errors: [], warnings: [], files: [], accepted: true }, join(work, 'many-keys'));
    const head = readFileSync(join(dataDir, JET), 'utf8');
    const lines = head.split('\n').length;
    writeFileSync(join(dataDir, JET), head + Array.from({ length: 10_000 }, (_, i) => `extra_${i}: ${i}\n`).join(''));
    const result = await loadProject(dataDir);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toHaveLength(10_000);
    expectLocated(result.errors, [0, 4999, 9999].map((i) => ({ file: JET, line: lines + i, column: 1, field: `extra_${i}`, found: `a field named "extra_${i}"`, expected: 'is not a field here' })), dataDir);
  });
});

/**
 * Spawning the command for all cases took 92 s on 2 cores (about 1.3 s each: tsx start-up), too slow
 * for the suite's budget, so every case goes through checkData above and this sample of one case per
 * family of fault goes through the real command line.
 */
const CLI_SAMPLE = ['yaml-tab-indentation', 'invalid-utf8', 'deep-block-nesting', 'alias-bomb', 'missing-site-file', 'unknown-engine-reference', 'window-above-max-rpm', 'bom-at-start'];

describe('matchbook check on a sample of the corpus, through the real command line', () => {
  it('exits 1 on refused cases and 0 on accepted ones, printing the first located error and no stack trace', async () => {
    const sample = CLI_SAMPLE.map((name) => cases.find((c) => c.name === name)!);
    const runs = await mapLimit(sample, 2, async (c) => ({ c, run: await matchbook(['check', '--data', dataDirOf(c)]) }));
    for (const { c, run } of runs) {
      expect(run.status, `${c.name}\n${run.stderr}`).toBe(c.accepted ? 0 : 1);
      expect(run.stderr + run.stdout, c.name).not.toMatch(STACK_TRACE);
      const first = c.errors[0];
      if (first) expect(run.stderr, c.name).toContain(`${dataDirOf(c)}/${first.file}:${first.line}:${first.column} ${first.field}`);
      else expect(run.stdout, c.name).toMatch(/^OK /m);
    }
  });
});
