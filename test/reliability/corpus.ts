/**
 * The bad-input corpus: test/fixtures/bad/<case>/ holds case.json (what the case shows, files to
 * remove, the located errors expected) and only the files it replaces or adds, laid over a copy of the
 * valid demo data/ in a temporary folder.
 */
import { cpSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import type { DataError } from '../../src/data/types.ts';

export const CORPUS_DIR = 'test/fixtures/bad';
export const DEMO_DIR = 'data';

/**
 * One located error a case must produce: file is relative to the data folder, found is matched exactly,
 * expected as a part of the sentence.
 */
export type ExpectedError = Pick<DataError, 'file' | 'line' | 'column' | 'field' | 'found' | 'expected'>;

export interface BadCase {
  readonly name: string;
  readonly about: string;
  /** Demo files deleted before the overlay, relative to the data folder. */
  readonly remove: readonly string[];
  readonly errors: readonly ExpectedError[];
  /** True when the input looks odd but is accepted as documented (it must load). */
  readonly accepted: boolean;
  readonly warnings: readonly ExpectedError[];
  /** Overlay files, relative to the data folder. */
  readonly files: readonly string[];
}

const walk = (dir: string): string[] =>
  readdirSync(dir)
    .sort()
    .flatMap((n) => (statSync(join(dir, n)).isDirectory() ? walk(join(dir, n)) : [join(dir, n)]));

/** Every case of the corpus, in name order. */
export function listCases(): BadCase[] {
  return readdirSync(CORPUS_DIR)
    .sort()
    .map((name) => {
      const dir = join(CORPUS_DIR, name);
      const manifest = JSON.parse(readFileSync(join(dir, 'case.json'), 'utf8')) as Partial<BadCase> & { about: string; errors: ExpectedError[] };
      const files = walk(dir)
        .map((p) => relative(dir, p).replace(/\\/g, '/'))
        .filter((p) => p !== 'case.json');
      return { name, about: manifest.about, remove: manifest.remove ?? [], errors: manifest.errors, accepted: manifest.accepted ?? false, warnings: manifest.warnings ?? [], files };
    });
}

/** A fresh temporary folder; the caller removes it with removeDir. */
export function tempDir(prefix: string): string {
  return mkdtempSync(join(tmpdir(), `matchbook-${prefix}-`));
}

export function removeDir(dir: string): void {
  rmSync(dir, { recursive: true, force: true });
}

/** Copy the demo data into parent/data, apply the case, and return the data folder. */
export function materialise(c: BadCase, parent: string): string {
  const dataDir = join(parent, 'data');
  cpSync(DEMO_DIR, dataDir, { recursive: true });
  for (const p of c.remove) rmSync(join(dataDir, p), { force: true });
  cpSync(join(CORPUS_DIR, c.name), dataDir, { recursive: true, filter: (src) => !src.endsWith('case.json') });
  return dataDir;
}
