/**
 * The hand-written stress catalogues of test/fixtures/stress/ (invented data at the limits of
 * docs/sheets.md, "Limits every sheet lays out"): (A) max-impellers — a jet of 24 impellers and an engine
 * family of 6 variants, every label 16 characters, as wall charts on A3 landscape and Tabloid portrait
 * (each continuing over pages), a spec sheet and a card; (B) max-cautions — 6 shop cautions of 300 characters and 8 cruise settings
 * with 16-character labels on each of two boats; (C) max-names — boat, engine, jet and maker names of 60
 * characters. Each goes through the real command line: `check` then `build` exit 0, and every book PDF
 * (its text read back with pdftotext of poppler-utils) holds every impeller, variant and cruise label,
 * every boat, engine and jet name and every caution sentence whole. A sheet may shorten a label with an
 * ellipsis where its column is narrow, so a text counts when it is whole somewhere in the book.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { matchbook, REPO } from '../cli/runCli.ts';

const STRESS = join(REPO, 'test/fixtures/stress');
const EPOCH = { SOURCE_DATE_EPOCH: '1767225600' }; // 2026-01-01 UTC
const out = mkdtempSync(join(tmpdir(), 'matchbook-stress-'));
afterAll(() => rmSync(out, { recursive: true, force: true }));

interface Labelled {
  readonly label: string;
}

const yamlIn = (dir: string, sub: string): Record<string, unknown>[] =>
  readdirSync(join(dir, sub))
    .filter((f) => f.endsWith('.yaml'))
    .sort()
    .map((f) => parse(readFileSync(join(dir, sub, f), 'utf8')) as Record<string, unknown>);

/** Every text of the catalogue a book must print whole, read from its YAML files. */
function mustPrint(dir: string): string[] {
  const site = parse(readFileSync(join(dir, 'site.yaml'), 'utf8')) as { cautions?: string[] };
  const engines = yamlIn(dir, 'engines') as { label: string; variants: Labelled[] }[];
  const jets = yamlIn(dir, 'jets') as { label: string; impellers: Labelled[] }[];
  const boats = yamlIn(dir, 'boats') as { name: string; cruise: Labelled[] }[];
  return [
    ...engines.flatMap((e) => [e.label, ...e.variants.map((v) => v.label)]),
    ...jets.flatMap((j) => [j.label, ...j.impellers.map((i) => i.label)]),
    ...boats.flatMap((b) => [b.name, ...b.cruise.map((c) => c.label)]),
    ...(site.cautions ?? []),
  ];
}

/**
 * Text compared without its line breaks: whitespace and hyphens removed on both sides, so a caution
 * wrapped over lines, or a word broken at a line end, still matches.
 */
const squeezed = (s: string): string => s.replace(/[\s\u00ad\u2010\u2011-]+/g, '');

/** The text of a PDF in content order (`-raw`: a table cell's wrapped lines stay together). */
function pdfText(file: string): string {
  const r = spawnSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`pdftotext ${file}: ${r.stderr}`);
  return r.stdout;
}

const CATALOGUES = [{ name: 'max-impellers' }, { name: 'max-cautions' }, { name: 'max-names' }] as const;

describe('the stress catalogues are at the limits they claim', () => {
  it('A: 24 impellers and 6 engine variants, every label 16 characters', () => {
    const a = join(STRESS, 'max-impellers');
    const [jetA] = yamlIn(a, 'jets') as { impellers: Labelled[] }[];
    const [engineA] = yamlIn(a, 'engines') as { variants: Labelled[] }[];
    expect(jetA.impellers.map((i) => i.label.length)).toEqual(Array(24).fill(16));
    expect(engineA.variants.map((v) => v.label.length)).toEqual(Array(6).fill(16));
  });
  it('B: 6 cautions of 300 characters, 8 cruise labels of 16 on each boat; C: 60-character names and makers', () => {
    const b = join(STRESS, 'max-cautions');
    const siteB = parse(readFileSync(join(b, 'site.yaml'), 'utf8')) as { cautions: string[] };
    expect(siteB.cautions.map((c) => c.length)).toEqual(Array(6).fill(300));
    const boatsB = yamlIn(b, 'boats') as { cruise: Labelled[] }[];
    expect(boatsB.map((x) => x.cruise.map((c) => c.label.length))).toEqual([Array(8).fill(16), Array(8).fill(16)]);
    const c = join(STRESS, 'max-names');
    const [boatC] = yamlIn(c, 'boats') as { name: string }[];
    const [engineC] = yamlIn(c, 'engines') as { label: string; maker: string }[];
    const [jetC] = yamlIn(c, 'jets') as { label: string; maker: string }[];
    expect([boatC.name, engineC.label, engineC.maker, jetC.label, jetC.maker].map((s) => s.length)).toEqual([60, 60, 60, 60, 60]);
  });
});

describe.each(CATALOGUES)('stress catalogue $name', ({ name }) => {
  const data = join(STRESS, name);
  it('passes check, builds, and every book PDF prints every label, name and caution whole', { timeout: 300_000 }, () => {
    const check = matchbook(['check', '--data', data], EPOCH);
    expect(check.status, check.stdout + check.stderr).toBe(0);
    const site = join(out, name);
    const build = matchbook(['build', '--data', data, '--out', site], EPOCH);
    expect(build.status, build.stderr).toBe(0);
    const books = readdirSync(join(site, 'books')).filter((f) => f.endsWith('.pdf'));
    expect(books.length).toBeGreaterThan(0);
    const texts = mustPrint(data);
    expect(texts.length).toBeGreaterThan(4);
    for (const book of books) {
      const text = squeezed(pdfText(join(site, 'books', book)));
      const missing = texts.filter((t) => !text.includes(squeezed(t)));
      expect(missing, `${book} lacks`).toEqual([]);
    }
  });
});
