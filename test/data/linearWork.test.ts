/**
 * A definition with many thousands of keys is checked in time linear in its size (issue class: inputs
 * that stall — the YAML parser's duplicate-key check compared every key with every earlier one, and
 * each unknown key was then looked up by a scan of its mapping: minutes for a file well inside 5 MB).
 * Never timed: the work is counted while the loader runs — every element an array method visits, every
 * character a string search, copy or split walks (work() below); a file four times as large must cost
 * about four times as much (a quadratic step would cost sixteen times). Loops written with for and
 * while are not counted, but every quadratic step found so far ran through these methods.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { demoWith } from './helpers.ts';

/** Array methods that call back once per element visited (sort: once per comparison). */
const CALLBACK_WALKS = ['find', 'findIndex', 'findLast', 'findLastIndex', 'some', 'every', 'filter', 'map', 'flatMap', 'forEach', 'reduce', 'reduceRight', 'sort'] as const;

type Fn = (...a: unknown[]) => unknown;

/**
 * Elements and characters walked by fn: one per callback call of the array methods above; for the
 * searches and copies of arrays and strings, the stretch they scanned or copied (indexOf from its start
 * to the hit, slice its result, split and regular-expression searches the whole string).
 */
function work(fn: () => void): number {
  let count = 0;
  const restore: (() => void)[] = [];
  const patch = (proto: object, name: string, cost: (self: { length: number }, args: unknown[], result: unknown) => number, wrapCallback = false) => {
    const target = proto as Record<string, Fn>;
    const original = target[name];
    target[name] = function (this: { length: number }, ...args: unknown[]) {
      if (wrapCallback && typeof args[0] === 'function') {
        const cb = args[0] as Fn;
        args[0] = function (this: unknown, ...a: unknown[]) {
          count += 1;
          return cb.apply(this, a);
        };
      }
      const result = original.apply(this, args);
      count += cost(this, args, result);
      return result;
    };
    restore.push(() => (target[name] = original));
  };
  const searched = (self: { length: number }, args: unknown[], result: unknown) => {
    const from = typeof args[1] === 'number' ? Math.max(0, args[1]) : 0;
    const hit = result as number | boolean;
    const len = typeof args[0] === 'string' ? args[0].length : 1;
    return typeof hit === 'number' && hit >= 0 ? hit + len - from : self.length - from;
  };
  const copied = (_self: unknown, _args: unknown[], result: unknown) => (result as { length: number }).length;
  const whole = (self: { length: number }) => self.length;
  for (const m of CALLBACK_WALKS) patch(Array.prototype, m, (self, args) => (m === 'sort' && typeof args[0] !== 'function' ? Math.ceil(self.length * Math.log2(self.length + 1)) : 0), true);
  patch(Array.prototype, 'indexOf', searched);
  patch(Array.prototype, 'includes', (self) => self.length);
  for (const m of ['slice', 'concat', 'join']) patch(Array.prototype, m, m === 'join' ? whole : copied);
  patch(String.prototype, 'indexOf', searched);
  patch(String.prototype, 'includes', (self) => self.length);
  patch(String.prototype, 'lastIndexOf', whole);
  patch(String.prototype, 'slice', copied);
  for (const m of ['split', 'replace', 'replaceAll', 'match', 'matchAll', 'search']) patch(String.prototype, m, whole);
  try {
    fn();
  } finally {
    for (const r of restore.reverse()) r();
  }
  return count;
}

const JET = 'data/jets/kelpspindle-riffle.yaml';
const BOAT = 'data/boats/reedshank.yaml';
const jet = readFileSync(JET, 'utf8');
const boat = readFileSync(BOAT, 'utf8');

/** The loader's work on the demo with one file replaced. */
const loadWork = (path: string, text: string) =>
  work(() => {
    const r = loadProjectFromFiles(demoWith(path, text));
    // Every case below is refused (unknown or repeated keys) or loads (trials): the answer is used, not just computed.
    expect(r.ok || r.errors.length > 0).toBe(true);
  });

const CASES: [string, string, (n: number) => string][] = [
  ['unknown keys at the top of a jet file', JET, (n) => jet + Array.from({ length: n }, (_, i) => `extra_${i}: ${i}\n`).join('')],
  ['unknown keys inside one impeller', JET, (n) => jet.replace('    rating_kw: 1.48\n', `    rating_kw: 1.48\n${Array.from({ length: n }, (_, i) => `    extra_${i}: ${i}\n`).join('')}`)],
  ['the same key repeated', JET, (n) => jet + Array.from({ length: n }, () => 'extra: 1\n').join('')],
  ['sea-trial rows of a boat (a valid 10,000-row table)', BOAT, (n) => boat.replace(/^trials:\n/m, `trials:\n${Array.from({ length: n }, (_, i) => `  - { date: 2026-03-14, impeller: squall, wot_rpm: ${4600 + (i % 200)} }\n`).join('')}`)],
];

describe('the loader does work linear in the size of a definition', () => {
  it.each(CASES)('%s: 4 times the keys, at most 5 times the work (2,500 against 10,000)', { timeout: 120_000 }, (_what, path, make) => {
    const small = loadWork(path, make(2500));
    const large = loadWork(path, make(10000));
    const base = loadWork(path, make(0));
    // The cost of the keys alone, without the rest of the demo data.
    const ratio = (large - base) / (small - base);
    expect(small - base).toBeGreaterThan(2500);
    expect(ratio).toBeGreaterThan(3);
    expect(ratio).toBeLessThan(5);
  });
});
