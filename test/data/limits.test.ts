/**
 * The limits the sheets are laid out for (docs/sheets.md, "Limits every sheet lays out"): a catalogue at
 * a limit loads; one past it is refused by `check` at the field or list, with the limit and what to do.
 * The limits themselves are ours (what a wall chart, spec sheet and console card hold; no source).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { LIMITS } from '../../src/data/schema/common.ts';
import { demoWith } from './helpers.ts';

const JET = 'data/jets/kelpspindle-riffle.yaml';
const BOAT = 'data/boats/reedshank.yaml';
const ENGINE = 'data/engines/copperwhistle-strider.yaml';
const SITE = 'data/site.yaml';

/** The demo jet with n impellers: the six demo ones, then invented ones with ratings rising 0.1 kW a step. */
function jetWith(n: number, label = (i: number) => `X${i}`): string {
  const head = readFileSync(JET, 'utf8').split('impellers:')[0];
  const demo = ['wisp', 'breeze', 'gust', 'squall', 'gale', 'storm'];
  const rows = Array.from({ length: n }, (_, i) => `  - id: ${demo[i] ?? `x${i}`}\n    label: ${label(i)}\n    rating_kw: ${(1.5 + i * 0.1).toFixed(2)}\n`);
  return `${head}impellers:\n${rows.join('')}`;
}

function boatWithCruise(n: number): string {
  const text = readFileSync(BOAT, 'utf8');
  const rows = Array.from({ length: n }, (_, i) => `  - label: Setting ${i + 1}\n    rpm: ${2000 + i * 200}\n`).join('');
  return text.replace(/^cruise:\n(?: {2}.*\n)+/m, `cruise:\n${rows}`);
}

function siteWithCautions(n: number, chars: number): string {
  const sentence = (i: number) => `Shop caution ${i + 1}: ${'keep the intake grate clear '.repeat(20)}`.slice(0, chars - 1) + '.';
  return `${readFileSync(SITE, 'utf8')}cautions:\n${Array.from({ length: n }, (_, i) => `  - "${sentence(i)}"\n`).join('')}`;
}

const errorsOf = (path: string, text: string) => {
  const r = loadProjectFromFiles(demoWith(path, text));
  return r.ok ? [] : r.errors.map((e) => e.message);
};

const lineOf = (text: string, needle: string) => text.split('\n').findIndex((l) => l.startsWith(needle)) + 1;

describe('the limits the sheets are laid out for', () => {
  it('are the ones the issue names', () => {
    expect(LIMITS).toEqual({ labelChars: 16, nameChars: 60, impellersPerJet: 24, variantsPerFamily: 6, cruisePerBoat: 8, cruisePowersPerChart: 8, cautions: 6, cautionChars: 300, contactLineChars: 120, dataRevisionChars: 40 });
  });

  it('load a jet with 24 impellers of 16-character labels; refuse 25 at the impellers: line', () => {
    expect(errorsOf(JET, jetWith(24, (i) => `IMPELLER-${String(i).padStart(2, '0')}-ABCD`))).toEqual([]);
    const text = jetWith(25);
    expect(errorsOf(JET, text)).toEqual([
      `${JET}:${lineOf(text, 'impellers:')}:1 impellers must have at most 24 entries (a wall chart gives each impeller a row; put further impellers in a second jet file), found a list of 25 entries`,
    ]);
  });

  it('refuse a 17-character impeller label at its line', () => {
    const text = jetWith(6, (i) => (i === 2 ? 'SEVENTEEN-CHARS-X' : `K${i}`));
    expect(errorsOf(JET, text)).toEqual([`${JET}:${lineOf(text, '    label: SEVENTEEN') }:12 impellers[2].label must be at most 16 characters (tables and curve labels print it), found "SEVENTEEN-CHARS-X" (17 characters)`]);
  });

  it('refuse a 61-character jet name, and load one of 60', () => {
    const jet = readFileSync(JET, 'utf8');
    expect(errorsOf(JET, jet.replace('label: Kelpspindle Riffle jet unit', `label: ${'J'.repeat(60)}`))).toEqual([]);
    expect(errorsOf(JET, jet.replace('label: Kelpspindle Riffle jet unit', `label: ${'J'.repeat(61)}`))).toEqual([
      `${JET}:4:8 label must be at most 60 characters (sheet titles print it), found "${'J'.repeat(46)}… (61 characters)`,
    ]);
  });

  it('load a boat with 8 cruise settings; refuse 9 at the cruise: line', () => {
    expect(errorsOf(BOAT, boatWithCruise(8))).toEqual([]);
    const text = boatWithCruise(9);
    expect(errorsOf(BOAT, text)).toEqual([
      `${BOAT}:${lineOf(text, 'cruise:')}:1 cruise must have at most 8 entries (the sheets list each cruise setting on its own row; keep the ones the owner uses), found a list of 9 entries`,
    ]);
  });

  it('load a wall chart with 8 constant-power lines; refuse 9 at the list', () => {
    const BOOK = 'data/books/shop-wall-charts.yaml';
    const book = readFileSync(BOOK, 'utf8');
    const powers = (n: number) => `cruise_powers_hp: [${Array.from({ length: n }, (_, i) => 60 + 20 * i).join(', ')}]`;
    expect(errorsOf(BOOK, book.replace('cruise_powers_hp: [60, 100]', powers(8)))).toEqual([]);
    const text = book.replace('cruise_powers_hp: [60, 100]', powers(9));
    const line = lineOf(text, '      cruise_powers_hp:');
    expect(errorsOf(BOOK, text)).toEqual([
      `${BOOK}:${line}:7 sheets[2].conditions.cruise_powers_hp must have at most 8 entries (a wall chart draws each as a labelled line), found a list of 9 entries`,
    ]);
  });

  it('load 6 shop cautions of 300 characters; refuse a seventh, and a caution of 301 characters', () => {
    // The demo owner book adds one caution of its own, which counts toward the 6 (test/data/bookCautions.test.ts).
    expect(errorsOf(SITE, siteWithCautions(5, 300))).toEqual([]);
    expect(errorsOf(SITE, siteWithCautions(6, 300))).toEqual([
      `data/books/owner-console-cards.yaml:${lineOf(readFileSync('data/books/owner-console-cards.yaml', 'utf8'), 'cautions:')}:1 cautions must keep this book's and site.yaml's cautions together at most 6 (every sheet prints every caution after the built-in ones), found 1 here and 6 in site.yaml — merge or drop 1 of them, here or in site.yaml`,
    ]);
    const seven = siteWithCautions(7, 300);
    expect(errorsOf(SITE, seven)).toEqual([
      `${SITE}:${lineOf(seven, 'cautions:')}:1 cautions must have at most 6 entries (every sheet prints every caution after the built-in ones; merge or drop some), found a list of 7 entries`,
    ]);
    const long = siteWithCautions(1, 301);
    expect(errorsOf(SITE, long)[0]).toMatch(new RegExp(`^${SITE}:${lineOf(long, '  - "Shop')}:5 cautions\\[0\\] must be at most 300 characters \\(every sheet prints every caution\\); shorten it or split it in two, found "Shop caution 1`));
  });

  it('refuse a seventh engine variant at the variants: line', () => {
    const engine = readFileSync(ENGINE, 'utf8');
    const extra = Array.from({ length: 4 }, (_, i) => `  - id: extra-${i}\n    label: Extra ${i}\n`).join('');
    const text = engine.replace(/\n(?=[a-z_]+:|$)(?![\s\S]*\nvariants:)/, '\n').replace(/(\nvariants:\n(?:(?: {2}.*| {4}.*)?\n)+)/, `$1${extra}`);
    const errors = errorsOf(ENGINE, text);
    expect(errors).toHaveLength(1);
    expect(errors[0]).toMatch(new RegExp(`^${ENGINE}:${lineOf(text, 'variants:')}:1 variants must have at most 6 entries \\(a wall chart gives each variant a column; put further variants in a second engine family file\\), found a list of 7 entries$`));
  });
});
