/** References between files (a boat names an engine, a jet, an impeller): resolve or say what exists. */
import { didYouMean } from './closest.ts';
import type { DataError } from './types.ts';
import { at } from './validate.ts';
import type { PathSegment, YamlSource } from './yamlSource.ts';

/**
 * Definitions by id. A null entry is a file that exists but did not load: references to it are not
 * reported again (its own errors say what is wrong).
 */
export type Registry<T> = ReadonlyMap<string, T | null>;

export type Lookup<T> = { status: 'found'; value: T } | { status: 'broken' } | { status: 'unknown'; error: DataError };

/**
 * The folder `dir` (engines, jets, boats) beside the one holding `file`, as the user named the data
 * folder: "../shop/boats/a.yaml" and "jets" give "../shop/jets/".
 */
export function folderBeside(file: string, dir: string): string {
  const parts = file.replace(/\\/g, '/').split('/').slice(0, -2);
  return [...parts, dir, ''].join('/');
}

/** Resolve id in registry; the error names the known ids, the closest match and the folder they live in. */
export function resolve<T>(args: { source: YamlSource; path: PathSegment[]; id: string; registry: Registry<T>; what: string; dir: string }): Lookup<T> {
  const where = folderBeside(args.source.file, args.dir);
  const { id, registry } = args;
  if (registry.has(id)) {
    const value = registry.get(id);
    return value === null || value === undefined ? { status: 'broken' } : { status: 'found', value };
  }
  const known = [...registry.keys()].sort();
  const fix = known.length === 0 ? `there are no ${args.what} in ${where} yet` : `${didYouMean(id, known)}known: ${known.join(', ')}`;
  return { status: 'unknown', error: at(args.source, args.path, { expected: `must name one of the ${args.what} in ${where}`, fix }) };
}

/** Resolve an id among a definition's members (a family's variants, a jet's impellers). */
export function resolveMember<T extends { readonly id: string }>(args: { source: YamlSource; path: PathSegment[]; id: string; members: readonly T[]; what: string }): T | DataError {
  const member = args.members.find((m) => m.id === args.id);
  if (member) return member;
  const known = args.members.map((m) => m.id);
  return at(args.source, args.path, { expected: `must name one of the ${args.what}`, fix: `${didYouMean(args.id, known)}known: ${known.join(', ')}` });
}

/** Narrow resolveMember's answer. */
export function isDataError(x: unknown): x is DataError {
  return typeof x === 'object' && x !== null && 'message' in x && 'line' in x && 'file' in x;
}
