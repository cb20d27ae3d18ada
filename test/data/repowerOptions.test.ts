/** Repower options in a boat file: resolved against the engines and jets, with errors located at the field. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { demoWith } from './helpers.ts';

const FILE = 'data/boats/greyling.yaml';
const base = readFileSync(FILE, 'utf8');

function errorsOf(options: string): { message: string; line: number; column: number; field: string }[] {
  const r = loadProjectFromFiles(demoWith(FILE, `${base}repower_options:\n${options}`));
  if (r.ok) throw new Error('expected the boat to be refused');
  return r.errors.filter((e) => e.file === FILE);
}

/** 1-based line of the last line of the file holding `text` (after the repower_options key). */
function lineOf(options: string, text: string): number {
  const lines = `${base}repower_options:\n${options}`.split('\n');
  const from = lines.findIndex((l) => l.startsWith('repower_options:'));
  const hits = lines.flatMap((l, i) => (i > from && l.includes(text) ? [i + 1] : []));
  return hits[hits.length - 1];
}

const two = (second: string) => `  - label: As fitted\n  - label: Other\n${second}`;

describe('repower_options of a boat', () => {
  it('resolve, each left-out field the boat’s own, with a weight change in lb as kg', () => {
    const r = loadProjectFromFiles(demoWith(FILE, `${base}repower_options:\n${two('    impeller: storm\n    weight_change_lb: -22.046226\n')}  - { label: Strider, engine: copperwhistle-strider, engine_variant: race, impeller: wisp }\n`));
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
    const o = r.project.boats.find((b) => b.id === 'greyling')!.repowerOptions!;
    expect(o.map((x) => [x.label, x.engineFamilyId, x.engineVariantId, x.jetId, x.impellerId])).toEqual([
      ['As fitted', 'thimblefinch-trotter', 'standard', 'kelpspindle-riffle', 'gale'],
      ['Other', 'thimblefinch-trotter', 'standard', 'kelpspindle-riffle', 'storm'],
      ['Strider', 'copperwhistle-strider', 'race', 'kelpspindle-riffle', 'wisp'],
    ]);
    // 22.046226 lb = 10.0000 kg (1 lb = 0.45359237 kg, NIST SP 811).
    expect(o[1].weightChangeKg).toBeCloseTo(-10, 4);
    expect(o[0].weightChangeKg).toBeUndefined();
    expect(o[2].engine.limits.maxRpm).toBe(5400);
  });

  it.each([
    ['an unknown engine family', '    engine: copperwhistle-stridr\n', 'copperwhistle-stridr', 'repower_options[1].engine', /must name one of the engine families.*did you mean copperwhistle-strider/],
    ['an unknown variant', '    engine: copperwhistle-strider\n    engine_variant: turbo\n', 'turbo', 'repower_options[1].engine_variant', /must name one of the variants of copperwhistle-strider.*known: sport, economy, race/],
    ['a family of several variants without engine_variant', '    engine: copperwhistle-strider\n', 'copperwhistle-strider', 'repower_options[1].engine', /several variants, so this option needs engine_variant.*sport, economy, race/],
    ['an unknown jet unit', '    jet: gullbobin-shoal\n    impeller: pebble\n', 'gullbobin-shoal', 'repower_options[1].jet', /must name one of the jet units/],
    ['another jet without impeller', '    jet: gullbobbin-shoal\n', 'gullbobbin-shoal', 'repower_options[1].jet', /another jet unit than the boat's, so this option needs impeller.*grit, granule/],
    ['an impeller not in the jet', '    jet: gullbobbin-shoal\n    impeller: gust\n', 'gust', 'repower_options[1].impeller', /must name one of the impellers of gullbobbin-shoal/],
    ['a repeated label', '  - label: Other\n', 'label: Other', 'repower_options[2].label', /must differ from every other option's label \(option 2 is also "Other"\)/],
    ['a weight change that leaves no boat', '    weight_change_kg: -1120\n', 'weight_change_kg', 'repower_options[1].weight_change_kg', /at least 50 kg \(the hull's 1150 kg plus this change is 30 kg\)/],
    ['both weight units', '    weight_change_kg: 10\n    weight_change_lb: 22\n', 'weight_change_lb', 'repower_options[1].weight_change_lb', /must not be given together with weight_change_kg/],
  ])('refuse %s, located at the option’s field', (_what, second, at, field, words) => {
    const options = two(second);
    const errors = errorsOf(options);
    const hit = errors.find((e) => e.field === field);
    expect(hit, errors.map((e) => e.message).join('\n')).toBeDefined();
    expect(hit!.message).toMatch(words);
    // The repeated label's error sits on the later of the two entries.
    expect(hit!.line).toBe(lineOf(options, at));
    expect(hit!.message.startsWith(`${FILE}:${hit!.line}:`)).toBe(true);
  });

  it('refuse fewer than two options and more than six, at the list', () => {
    const one = errorsOf('  - label: Alone\n');
    expect(one.map((e) => e.message).join('\n')).toMatch(/repower_options must list at least 2 options/);
    const seven = errorsOf(Array.from({ length: 7 }, (_, i) => `  - label: Option ${i + 1}\n`).join(''));
    const e = seven.find((x) => x.field === 'repower_options')!;
    expect(e.message).toMatch(/must have at most 6 entries \(the comparison sheet prints each option as a column of A4\)/);
    expect(e.line).toBe(base.split('\n').length);
  });

  it('a book’s repowerSheet must name a boat that lists them, located at the entry’s boat', () => {
    const BOOK = 'data/books/dealer-spec-sheets.yaml';
    const text = readFileSync(BOOK, 'utf8').replace('{ kind: repowerSheet, boat: reedshank }', '{ kind: repowerSheet, boat: greyling }');
    const r = loadProjectFromFiles(demoWith(BOOK, text));
    if (r.ok) throw new Error('expected the book to be refused');
    const e = r.errors.find((x) => x.file === BOOK)!;
    const line = text.split('\n').findIndex((l) => l.includes('kind: repowerSheet, boat: greyling')) + 1;
    expect(e.message).toMatch(new RegExp(`^${BOOK}:${line}:\\d+ sheets\\[\\d+\\]\\.boat must name a boat that lists repower_options for a repowerSheet \\(data/boats/greyling.yaml lists none\\)`));
  });
});

