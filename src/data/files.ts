/** Which file is which: engines/, jets/, boats/, books/ hold one definition each; site.yaml sits at the root. */
import type { Problem } from './errors.ts';

export type FileKind = 'engine' | 'jet' | 'boat' | 'book' | 'site';

/**
 * One file handed to the loader. unreadable says why the text could not be had (too large, no
 * permission, not UTF-8) and, when known, where in the file (1-based; 1:1 otherwise).
 */
export interface SourceFile {
  readonly path: string;
  readonly text: string;
  readonly unreadable?: Omit<Problem, 'field'> & { readonly line?: number; readonly column?: number };
}

export const KIND_DIRS: Readonly<Record<string, FileKind>> = Object.freeze({ engines: 'engine', jets: 'jet', boats: 'boat', books: 'book' });

export type Classified =
  | { readonly kind: FileKind; readonly stem: string; readonly root: string }
  | { readonly kind: 'ignored'; readonly reason?: Omit<Problem, 'field'> };

/** Classify a path (either separator) by its folder and extension. */
export function classify(path: string): Classified {
  const parts = path.replace(/\\/g, '/').split('/');
  const name = parts[parts.length - 1];
  const parent = parts.length > 1 ? parts[parts.length - 2] : '';
  // Object.hasOwn: a folder named like an object-prototype word (constructor, __proto__) is no kind.
  const kind = Object.hasOwn(KIND_DIRS, parent) ? KIND_DIRS[parent] : undefined;
  if (name.endsWith('.yml')) {
    return { kind: 'ignored', reason: { expected: 'is not read: definition files end in .yaml', found: `"${name}"`, fix: `rename it to ${name.slice(0, -4)}.yaml` } };
  }
  if (!name.endsWith('.yaml')) return { kind: 'ignored' };
  if (kind) return { kind, stem: name.slice(0, -'.yaml'.length), root: parts.slice(0, -2).join('/') };
  if (name === 'site.yaml') return { kind: 'site', stem: 'site', root: parts.slice(0, -1).join('/') };
  return { kind: 'ignored', reason: { expected: 'is not read: YAML files belong in engines/, jets/, boats/, books/, or are site.yaml', found: `"${name}"`, fix: 'move it into the folder of its kind' } };
}
