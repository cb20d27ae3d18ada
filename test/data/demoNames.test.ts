/**
 * Guards the demo's names (issue 13): the demo data must not drift back to real makers' coding or to real
 * places. What it guards:
 * - impeller ids and labels are words, never a code of one or two letters and digits ("K21", "v58");
 * - jet units and engine families are named by a word, never a maker's name with three digits ("Xxx 212");
 * - engine variant ids are use words, never letters and a power figure ("td-420");
 * - no demo file, example file, fixture that presents as demo, or the docs bring back an earlier demo name
 *   that pointed at a real maker, model family, town or country (the deny list below).
 *
 * The real-world check behind the new names (Lanternmoss Basin, Brinekettle Harbour, the Fernlatch River,
 * Lake Sorrelwing, Cloudpail Lake; Copperwhistle, Anvilmoth, Thimblefinch, Kelpspindle, Gullbobbin) was
 * done from memory, with no source: none is a place, maker or product we know of. This test cannot check
 * the world; it only keeps the scheme and keeps the old names out.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';

const walk = (dir: string): string[] =>
  readdirSync(dir)
    .sort()
    .flatMap((n) => (statSync(join(dir, n)).isDirectory() ? walk(join(dir, n)) : [join(dir, n)]));

/** A code of one or two letters and one to three digits, as makers number impellers ("K21", "v-58"). */
const LETTERS_AND_DIGITS = /^[A-Za-z]{1,2}[- ]?\d{1,3}[A-Za-z]?$/;
/** A maker's name with a three-digit model number ("Name 212", "name-260"). */
const NAME_AND_THREE_DIGITS = /\b[A-Za-z]{3,}[- ]\d{3}\b/;
/** A variant id made of letters and a power figure ("td-420", "sport-350"). */
const LETTERS_AND_POWER = /^[a-z]+-\d{2,4}$/;

/**
 * Earlier demo names that pointed at real makers' naming, a real engine family, real towns or one country
 * (from memory, no source), and the earlier impeller codes.
 */
const DENIED = [
  'harrowgate', 'brindlecombe', 'corbrick', 'tarnwell', 'vennick', 'kauri', 'kettering', 'braided', 'small-block',
  'eastmouth', 'harbourline', 'swiftwater', 'tarn hollow', 'tarn-hollow', 'ember reach', 'ember-reach', 'ember river',
  'on the ember', 'td6', 'northgate', 'skerry', 'tern 200', 'tern-200',
  'k16', 'k19', 'k21', 'k23', 'k26', 'k30', 'v45', 'v52', 'v58', 'v64', 'v72',
];
const deniedIn = (text: string): string[] => DENIED.filter((d) => new RegExp(`(^|[^a-z0-9])${d.replace(/[.-]/g, '\\$&')}([^a-z0-9]|$)`, 'i').test(text));

async function demo(): Promise<Project> {
  const loaded = await loadProject('data');
  if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('\n'));
  return loaded.project;
}

describe('the demo names follow our own scheme (docs/data-format.md, "The demo data")', () => {
  it('the patterns catch the codes they are meant to catch', () => {
    // The guards themselves, on the kinds of code they refuse and on names of our scheme.
    for (const code of ['K21', 'v58', 'AB12', 'k-21', 'Q07x']) expect(code, code).toMatch(LETTERS_AND_DIGITS);
    for (const word of ['Gust', 'Boulder', 'Sample A']) expect(word, word).not.toMatch(LETTERS_AND_DIGITS);
    for (const model of ['Maker 212 jet unit', 'maker-260']) expect(model, model).toMatch(NAME_AND_THREE_DIGITS);
    for (const model of ['Kelpspindle Riffle jet unit', 'Copperwhistle Strider 5.1 L V6']) expect(model, model).not.toMatch(NAME_AND_THREE_DIGITS);
    expect(deniedIn('Lake Kettering (demo)')).toEqual(['kettering']);
    expect(deniedIn('impeller: k21')).toEqual(['k21']);
    expect(deniedIn('impeller: k210, remembered')).toEqual([]);
  });

  it('names every impeller by a word, every jet and engine by a word, every variant by its use', async () => {
    const p = await demo();
    const impellers = p.jets.flatMap((j) => j.impellers.flatMap((i) => [i.id, i.label]));
    expect(impellers.length).toBe(22);
    for (const name of impellers) {
      expect(name, name).not.toMatch(LETTERS_AND_DIGITS);
      expect(name, name).not.toMatch(/\d/);
    }
    for (const jet of p.jets) for (const name of [jet.id, jet.label]) expect(name, name).not.toMatch(NAME_AND_THREE_DIGITS);
    for (const family of p.engines) {
      for (const name of [family.id, family.label]) expect(name, name).not.toMatch(NAME_AND_THREE_DIGITS);
      for (const v of family.variants) expect(v.variantId, v.variantId).not.toMatch(LETTERS_AND_POWER);
    }
    for (const maker of [...p.jets.map((j) => j.maker), ...p.engines.map((e) => e.maker)]) expect(maker).toMatch(/\(fictional\)$/);
  });

  it('sets the demo in the invented Lanternmoss Basin, and says so', () => {
    expect(readFileSync('data/site.yaml', 'utf8')).toMatch(/Lanternmoss Basin/);
    for (const path of walk('data/boats')) expect(readFileSync(path, 'utf8'), path).toMatch(/invented Lanternmoss Basin/);
    expect(readFileSync('docs/data-format.md', 'utf8')).toMatch(/invented region, the \*\*Lanternmoss Basin\*\*/);
  });

  it('keeps every earlier name out of the demo, the example files, the demo-like fixtures and the docs', () => {
    const paths = [
      ...walk('data'),
      ...walk('starter'),
      ...walk('test/fixtures/data'),
      ...walk('test/fixtures/bad'),
      'test/sheets/fixtures/demoProject.ts',
      ...walk('docs').filter((p) => p.endsWith('.md')),
      'README.md',
      'DEVELOPERS.md',
    ];
    const found = paths.flatMap((path) => [path, readFileSync(path, 'utf8')].flatMap((text) => deniedIn(text).map((d) => `${path}: ${d}`)));
    expect([...new Set(found)]).toEqual([]);
    // The example files of `matchbook start` keep to the scheme too.
    for (const path of walk('starter')) expect(readFileSync(path, 'utf8'), path).not.toMatch(NAME_AND_THREE_DIGITS);
  });
});
