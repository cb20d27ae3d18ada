/**
 * The rule for user text as `check` and `build` apply it (issue class: text that only the build
 * rejects): a character the sheet font cannot draw is a located error in both, at the character where it
 * is typed or where its YAML escape starts (never at 1:1, never at the same character in a comment); an
 * override or other invisible character is refused by both the same way, so no page title can be
 * reversed; the shop's name, contact line and data revision, printed on every sheet, have limits that
 * every catalogue at the layout limits lays out, and past them both refuse them in site.yaml.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { LIMITS } from '../../src/data/schema/common.ts';
import { buildSite } from '../../src/site/buildSite.ts';
import { checkSite } from '../../src/site/checkSite.ts';

const root = mkdtempSync(join(tmpdir(), 'matchbook-usertext-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));
let n = 0;

/** A copy of a data folder with one file's text changed; returns the data folder. */
function copyWith(base: string, file: string, change: (text: string) => string): string {
  const dir = join(root, `case-${(n += 1)}`, 'data');
  cpSync(base, dir, { recursive: true });
  writeFileSync(join(dir, file), change(readFileSync(join(dir, file), 'utf8')));
  return dir;
}

const firstLine = (text: string) => text.split('\n')[0];
const lineOf = (text: string, start: string) => text.split('\n').findIndex((l) => l.startsWith(start)) + 1;

/** check's report and the build's, both refusing. */
async function bothRefuse(dataDir: string): Promise<{ check: string; build: string }> {
  const check = await checkSite(dataDir);
  const build = await buildSite({ dataDir, outDir: join(dataDir, '..', 'out') });
  expect(check.exitCode).toBe(1);
  expect(build.ok).toBe(false);
  return { check: check.text, build: build.ok ? '' : build.errorsText };
}

describe('a character the sheet font cannot draw', () => {
  it('written as a YAML escape (\\U0001F6A4) is located at the escape, in check and build alike', async () => {
    const dir = copyWith('data', 'boats/greyling.yaml', (t) => t.replace(/^name: .*$/m, 'name: "Greyling \\U0001F6A4"'));
    const line = lineOf(readFileSync(join(dir, 'boats/greyling.yaml'), 'utf8'), 'name: ');
    const { check, build } = await bothRefuse(dir);
    // 'name: "Greyling ' is 16 characters: the escape starts in column 17.
    const expected = `${dir}/boats/greyling.yaml:${line}:17 name must use characters the sheet font (Source Sans 3: Latin, Greek, Cyrillic) can print, found "🚤" (U+1F6A4)`;
    expect(firstLine(check)).toBe(`${expected} — replace it or spell it out; emoji and right-to-left scripts cannot be printed on the sheets`);
    expect(firstLine(build)).toBe(firstLine(check));
  });

  it('written as a surrogate pair of escapes is located at the first of them', async () => {
    const dir = copyWith('data', 'boats/greyling.yaml', (t) => t.replace(/^name: .*$/m, 'name: "Grey\\ud83d\\udea4ling"'));
    const line = lineOf(readFileSync(join(dir, 'boats/greyling.yaml'), 'utf8'), 'name: ');
    const { check } = await bothRefuse(dir);
    expect(firstLine(check)).toMatch(new RegExp(`greyling\\.yaml:${line}:12 name must use characters`));
  });

  it('is located where the text holds it, not at the same character in a comment above', async () => {
    const dir = copyWith('data', 'boats/greyling.yaml', (t) => t.replace(/^name: (.*)$/m, '# the owner calls her 🚤\nname: $1 🚤'));
    const text = readFileSync(join(dir, 'boats/greyling.yaml'), 'utf8');
    const line = lineOf(text, 'name: ');
    const column = text.split('\n')[line - 1].indexOf('🚤') + 1;
    const { check } = await bothRefuse(dir);
    expect(firstLine(check)).toMatch(new RegExp(`greyling\\.yaml:${line}:${column} name must use characters`));
  });

  it('is named by the field as the file spells it (a trial note, a hull description)', async () => {
    const dir = copyWith('data', 'boats/reedshank.yaml', (t) => t.replace('Felt heavy out of the hole.', 'Felt heavy ☃ out of the hole.').replace(/description: (.*)/, 'description: $1 ☃'));
    const { check } = await bothRefuse(dir);
    // One error per character and file, at its first use: the hull description comes first in the file.
    expect(check).toMatch(/reedshank\.yaml:\d+:\d+ hull\.description must use characters the sheet font .* found "☃" \(U\+2603\)/);
  });
});

describe('an invisible or bidirectional-control character', () => {
  it('is refused by check and build with the same located sentence, so no page title can be reversed', async () => {
    const dir = copyWith('data', 'boats/greyling.yaml', (t) => t.replace(/^name: .*$/m, 'name: "Greyling \\u202eriver"'));
    const line = lineOf(readFileSync(join(dir, 'boats/greyling.yaml'), 'utf8'), 'name: ');
    const { check, build } = await bothRefuse(dir);
    expect(firstLine(check)).toBe(
      `${dir}/boats/greyling.yaml:${line}:17 name must hold only printable characters (no control, zero-width or bidirectional-control characters), found "\\u202e" (U+202E) — delete it: it is invisible, or would hide or reorder text on the sheets and pages`,
    );
    expect(firstLine(build)).toBe(firstLine(check));
    // Nothing was written: no page carries the name.
    expect(() => readFileSync(join(dir, '..', 'out', 'index.html'))).toThrow();
  });
});

describe("the shop's lines printed on every sheet", () => {
  const CASES = [
    ['shop_name', LIMITS.nameChars],
    ['contact_line', LIMITS.contactLineChars],
    ['data_revision', LIMITS.dataRevisionChars],
  ] as const;
  /** Words of four letters and a space, cut to exactly n characters. */
  const words = (n: number) => 'Wxyz '.repeat(n).slice(0, n - 1) + 'W';

  it.each(CASES)('%s at its limit (%i characters) lays out with the demo data and both stress catalogues at the layout limits', { timeout: 120_000 }, async (key, max) => {
    for (const base of ['data', 'test/fixtures/stress/max-names', 'test/fixtures/stress/max-cautions']) {
      const dir = copyWith(base, 'site.yaml', (t) => t.replace(new RegExp(`^${key}: .*$`, 'm'), `${key}: "${words(max)}"`));
      const check = await checkSite(dir);
      expect(check.text, base).toMatch(/^OK /);
    }
  });

  it.each(CASES)('%s one character past its limit is refused in site.yaml, at the field', async (key, max) => {
    const dir = copyWith('data', 'site.yaml', (t) => t.replace(new RegExp(`^${key}: .*$`, 'm'), `${key}: "${words(max + 1)}"`));
    const line = lineOf(readFileSync(join(dir, 'site.yaml'), 'utf8'), `${key}: `);
    const { check, build } = await bothRefuse(dir);
    expect(firstLine(check)).toMatch(new RegExp(`^${dir}/site\\.yaml:${line}:${key.length + 3} ${key} must be at most ${max} characters \\(every sheet's (header|footer) prints it\\)`));
    expect(firstLine(build)).toBe(firstLine(check));
  });
});
