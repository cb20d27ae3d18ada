/**
 * The two promises of the output folder: two builds of the same data, in different folders at different
 * times, give byte-identical trees; and a build that fails leaves the previous output untouched while a
 * successful one leaves no file of a removed boat behind.
 */
import { cpSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse, stringify } from 'yaml';
import { matchbook, REPO } from '../cli/runCli.ts';

function tree(root: string): Map<string, Buffer> {
  const files = new Map<string, Buffer>();
  const walk = (dir: string) => {
    for (const name of readdirSync(dir).sort()) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else files.set(relative(root, path), readFileSync(path));
    }
  };
  walk(root);
  return files;
}

function sandbox(): string {
  return mkdtempSync(join(tmpdir(), 'matchbook-repro-'));
}

const EPOCH = { SOURCE_DATE_EPOCH: '1767225600' };

describe('build output', () => {
  it('is byte-identical for two builds of the same data in different folders, naming no folder of this machine', { timeout: 600_000 }, async () => {
    // The same data copied to two places, built into two places, a second apart.
    const [dataA, dataB] = [join(sandbox(), 'data'), join(sandbox(), 'copy', 'of-data')];
    for (const dir of [dataA, dataB]) cpSync(join(REPO, 'data'), dir, { recursive: true });
    const a = join(sandbox(), 'site-a');
    const b = join(sandbox(), 'elsewhere', 'site-b');
    const first = matchbook(['build', '--data', dataA, '--out', a], EPOCH);
    expect(first.status, first.stderr).toBe(0);
    await new Promise((done) => setTimeout(done, 1100)); // a different second on the clock
    // A folder that does not exist yet, two levels down.
    const second = matchbook(['build', '--data', dataB, '--out', b], EPOCH);
    expect(second.status, second.stderr).toBe(0);
    const ta = tree(a);
    const tb = tree(b);
    expect([...tb.keys()]).toEqual([...ta.keys()]);
    expect(ta.size).toBeGreaterThan(50);
    for (const [path, bytes] of ta) expect(Buffer.compare(bytes, tb.get(path) as Buffer), path).toBe(0);
    // The printed date is the one SOURCE_DATE_EPOCH gives (1767225600 s = 2026-01-01 UTC).
    expect(ta.get('index.html')?.toString('utf8')).toContain('issued 2026-01-01');
    for (const [path, bytes] of ta) expect(bytes.includes(dataA), path).toBe(false);
  });

  it('stays as it was when a data file breaks between two builds, and drops a removed boat', { timeout: 600_000 }, () => {
    const root = sandbox();
    const data = join(root, 'data');
    const out = join(root, 'out');
    cpSync(join(REPO, 'data'), data, { recursive: true });
    expect(matchbook(['build', '--data', data, '--out', out], EPOCH).status).toBe(0);
    const before = tree(out);
    expect([...before.keys()].some((p) => p.startsWith('boats/greyling/'))).toBe(true);

    const jet = join(data, 'jets', 'kelpspindle-riffle.yaml');
    const good = readFileSync(jet, 'utf8');
    writeFileSync(jet, `${good}\nthis line is: [not valid yaml\n`);
    expect(matchbook(['build', '--data', data, '--out', out], EPOCH).status).toBe(1);
    const after = tree(out);
    expect([...after.keys()]).toEqual([...before.keys()]);
    for (const [path, bytes] of before) expect(Buffer.compare(bytes, after.get(path) as Buffer), path).toBe(0);
    expect(readdirSync(root).sort()).toEqual(['data', 'out']);

    writeFileSync(jet, good);
    rmSync(join(data, 'boats', 'greyling.yaml'));
    for (const f of readdirSync(join(data, 'books'))) {
      const p = join(data, 'books', f);
      const book = parse(readFileSync(p, 'utf8')) as { sheets: { boat?: string }[] };
      writeFileSync(p, stringify({ ...book, sheets: book.sheets.filter((s) => s.boat !== 'greyling') }));
    }
    const r = matchbook(['build', '--data', data, '--out', out], EPOCH);
    expect(r.status, r.stderr).toBe(0);
    const third = [...tree(out).keys()];
    expect(third.filter((p) => p.includes('greyling'))).toEqual([]);
    expect(third.length).toBeGreaterThan(20);
  });
});
