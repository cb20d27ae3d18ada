/**
 * Seeded mutations of the valid demo files for the fuzz properties: drop a key, duplicate a key,
 * retype a value, perturb a number, cut the text, insert random characters. Each mutation carries
 * plain numbers that the apply step folds into range, so fast-check can shrink them.
 */
import fc from 'fast-check';
import type { SourceFile } from '../../src/data/load.ts';
import { demoFiles } from '../data/helpers.ts';

/** Runs per property from an environment variable (MATCHBOOK_FUZZ_RUNS, MATCHBOOK_BUILD_FUZZ_RUNS), else fallback. */
export function fuzzRuns(args: { name: string; fallback: number }): number {
  const n = Number(process.env[args.name]);
  return Number.isInteger(n) && n > 0 ? n : args.fallback;
}

/** The demo data as loader input, paths "data/…" (the data tests' helper). */
export const demoSources = demoFiles;

export type Mutation =
  | { readonly kind: 'dropKey' | 'duplicateKey'; readonly at: number }
  | { readonly kind: 'retype'; readonly at: number; readonly value: string }
  | { readonly kind: 'perturb'; readonly at: number; readonly number: number }
  | { readonly kind: 'cut'; readonly at: number }
  | { readonly kind: 'insert'; readonly at: number; readonly text: string };

/** Values a careless edit or a bad export leaves where a value was. */
const ODD_VALUES = ['"x"', 'true', '[]', '{}', '-1', '0', '.nan', '.inf', '-.inf', '1e999', '~', '"4,2"', '', '"2.15 kW"', '[1, 2, 3]', '!!binary aGk=', '*nothing', '&a 1', '1_000', '0x1F', '12:30', '"\\u0000"'];

export const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constantFrom('dropKey' as const, 'duplicateKey' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('retype' as const), at: fc.nat(), value: fc.constantFrom(...ODD_VALUES) }),
  fc.record({
    kind: fc.constant('perturb' as const),
    at: fc.nat(),
    number: fc.oneof(fc.double({ noNaN: false }), fc.integer({ min: -100000, max: 100000 }), fc.double({ min: -1e-6, max: 1e-6 })),
  }),
  fc.record({ kind: fc.constant('cut' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('insert' as const), at: fc.nat(), text: fc.oneof(fc.string({ maxLength: 8 }), fc.string({ unit: 'binary', maxLength: 8 }), fc.constantFrom('\t', '\r', '\n  ', ': ', '- ', '[', '{', '"', "'", '#', '&', '*', '|', '>', '%', '@', '`', '\ufeff', '\u0000')) }),
);

const KEY_LINE = /^\s*(-\s+)?[a-z_0-9]+:/;

/** Apply one mutation to a text; `at` is folded into the range of the chosen place. */
export function applyMutation(text: string, m: Mutation): string {
  const lines = text.split('\n');
  const keyLines = lines.flatMap((l, i) => (KEY_LINE.test(l) ? [i] : []));
  switch (m.kind) {
    case 'dropKey':
    case 'duplicateKey': {
      if (keyLines.length === 0) return text;
      const i = keyLines[m.at % keyLines.length];
      return [...lines.slice(0, i), ...(m.kind === 'duplicateKey' ? [lines[i], lines[i]] : []), ...lines.slice(i + 1)].join('\n');
    }
    case 'retype': {
      if (keyLines.length === 0) return text;
      const i = keyLines[m.at % keyLines.length];
      const colon = lines[i].indexOf(':');
      return [...lines.slice(0, i), `${lines[i].slice(0, colon + 1)} ${m.value}`, ...lines.slice(i + 1)].join('\n');
    }
    case 'perturb': {
      const numbers = [...text.matchAll(/-?\d+(\.\d+)?/g)];
      if (numbers.length === 0) return text;
      const hit = numbers[m.at % numbers.length];
      return text.slice(0, hit.index) + String(m.number) + text.slice(hit.index + hit[0].length);
    }
    case 'cut':
      return text.slice(0, m.at % (text.length + 1));
    case 'insert': {
      const at = m.at % (text.length + 1);
      return text.slice(0, at) + m.text + text.slice(at);
    }
  }
}

/** One to three mutations of one demo file, chosen by index. */
export const mutatedDemo: fc.Arbitrary<{ file: number; mutations: Mutation[] }> = fc.record({
  file: fc.nat(),
  mutations: fc.array(mutation, { minLength: 1, maxLength: 3 }),
});

/** The demo sources with the chosen file mutated; also returns the mutated path. */
export function mutateDemo(demo: readonly SourceFile[], pick: { file: number; mutations: readonly Mutation[] }): { files: SourceFile[]; path: string } {
  const target = demo[pick.file % demo.length];
  const text = pick.mutations.reduce(applyMutation, target.text);
  return { files: demo.map((f) => (f === target ? { path: f.path, text } : f)), path: target.path };
}

/** Every number reachable from value (cycles and shared objects visited once), with its path. */
export function numbersIn(value: unknown, path = '', seen = new Set<object>()): { path: string; value: number }[] {
  if (typeof value === 'number') return [{ path, value }];
  if (typeof value !== 'object' || value === null || seen.has(value)) return [];
  seen.add(value);
  return Object.entries(value).flatMap(([k, v]) => numbersIn(v, `${path}.${k}`, seen));
}
