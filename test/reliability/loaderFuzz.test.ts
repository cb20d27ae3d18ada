/**
 * Fuzzing the loader with seeded mutations of the valid demo files: it either succeeds with finite
 * numbers everywhere in the Project, or fails with located errors naming a file it was given —
 * never an exception, never a stack trace in a message.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { DataError } from '../../src/data/types.ts';
import { STACK_TRACE } from './cli.ts';
import { demoSources, fuzzRuns, mutateDemo, mutatedDemo, numbersIn } from './mutations.ts';

const demo = demoSources();
const paths = new Set(demo.map((f) => f.path));

function expectLocated(list: readonly DataError[]): void {
  for (const e of list) {
    expect(paths.has(e.file), e.message).toBe(true);
    expect(e.line).toBeGreaterThanOrEqual(1);
    expect(e.column).toBeGreaterThanOrEqual(1);
    expect(Number.isInteger(e.line) && Number.isInteger(e.column)).toBe(true);
    expect(e.message.startsWith(`${e.file}:${e.line}:${e.column} `), e.message).toBe(true);
    expect(e.expected.length, e.message).toBeGreaterThan(0);
    expect(e.found.length, e.message).toBeGreaterThan(0);
    expect(e.message).not.toMatch(STACK_TRACE);
  }
}

describe('loadProjectFromFiles() on mutated demo data (seeded fuzz)', () => {
  it('the unmutated demo loads, so every failure below is the mutation', () => {
    const result = loadProjectFromFiles(demo);
    expect(result.ok).toBe(true);
  });

  it('succeeds with finite numbers everywhere or fails with located errors, and never throws', () => {
    const outcomes = { loaded: 0, refused: 0 };
    fc.assert(
      fc.property(mutatedDemo, (pick) => {
        const { files } = mutateDemo(demo, pick);
        const result = loadProjectFromFiles(files);
        expectLocated(result.warnings);
        if (result.ok) {
          outcomes.loaded++;
          const bad = numbersIn(result.project).filter((n) => !Number.isFinite(n.value));
          expect(bad).toEqual([]);
        } else {
          outcomes.refused++;
          expect(result.errors.length).toBeGreaterThan(0);
          expectLocated(result.errors);
        }
      }),
      { seed: 6_2026, numRuns: fuzzRuns({ name: 'MATCHBOOK_FUZZ_RUNS', fallback: 2000 }) },
    );
    // Both branches must be exercised, or the mutations are too weak (or too strong) to test anything.
    expect(outcomes.loaded).toBeGreaterThan(0);
    expect(outcomes.refused).toBeGreaterThan(0);
  });
});
