/** Test helpers: the demo data as files, overlaid with a fixture folder's files. */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import type { SourceFile } from '../../src/data/load.ts';

const walk = (dir: string): string[] =>
  readdirSync(dir)
    .sort()
    .flatMap((n) => (statSync(join(dir, n)).isDirectory() ? walk(join(dir, n)) : [join(dir, n)]));

/** Every file under data/, paths as "data/jets/x.yaml". */
export function demoFiles(): SourceFile[] {
  return walk('data').map((p) => ({ path: p.replace(/\\/g, '/'), text: readFileSync(p, 'utf8') }));
}

/** The demo files with test/fixtures/data/<name>/… laid over them (same relative path replaces). */
export function demoWithFixture(name: string): SourceFile[] {
  const dir = join('test/fixtures/data', name);
  const files = new Map(demoFiles().map((f) => [f.path, f.text]));
  for (const p of walk(dir)) files.set(`data/${relative(dir, p).replace(/\\/g, '/')}`, readFileSync(p, 'utf8'));
  return [...files].map(([path, text]) => ({ path, text }));
}

/** The demo files with one file's text replaced (or added). */
export function demoWith(path: string, text: string): SourceFile[] {
  return [...demoFiles().filter((f) => f.path !== path), { path, text }];
}
