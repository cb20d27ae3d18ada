/**
 * A wall chart draws up to LIMITS.cruisePowersPerChart constant-power lines (a book sheet's
 * conditions.cruise_powers_kw / _hp): at that limit it lays out, with the demo data and with the stress
 * catalogue of 60-character names, for lines spread over the whole power range and for lines crowded
 * half a horsepower apart (their labels must still find room); one more is refused at the list
 * (test/data/limits.test.ts). A layout limit of ours, no source.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { LIMITS } from '../../src/data/schema/common.ts';
import { checkSite } from '../../src/site/checkSite.ts';

const root = mkdtempSync(join(tmpdir(), 'matchbook-powerlines-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

const SPREAD = [0.1, 1, 10, 100, 1000, 5000, 9000, 13400];
const CROWDED = [100, 100.5, 101, 101.5, 102, 102.5, 103, 103.5];

describe(`a wall chart with ${LIMITS.cruisePowersPerChart} constant-power lines`, () => {
  it.each([
    ['spread over the whole range', SPREAD],
    ['crowded half a horsepower apart', CROWDED],
  ])('%s lays out with the demo data and the stress catalogue', { timeout: 120_000 }, async (_what, powers) => {
    expect(powers).toHaveLength(LIMITS.cruisePowersPerChart);
    const list = `[${powers.join(', ')}]`;
    const cases = [
      { base: 'data', book: 'books/shop-wall-charts.yaml', edit: (t: string) => t.replace('cruise_powers_hp: [60, 100]', `cruise_powers_hp: ${list}`) },
      { base: 'test/fixtures/stress/max-names', book: 'books/stress-book.yaml', edit: (t: string) => t.replace('  - kind: wallChart\n', `  - kind: wallChart\n    conditions: { cruise_powers_hp: ${list} }\n`) },
    ];
    for (const c of cases) {
      const dir = join(mkdtempSync(join(root, 'case-')), 'data');
      cpSync(c.base, dir, { recursive: true });
      const text = readFileSync(join(dir, c.book), 'utf8');
      const edited = c.edit(text);
      expect(edited, c.base).not.toBe(text);
      writeFileSync(join(dir, c.book), edited);
      const check = await checkSite(dir);
      expect(check.text, c.base).toMatch(/^OK /);
    }
  });
});
