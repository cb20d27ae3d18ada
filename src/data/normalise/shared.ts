/** Pieces every normaliser uses. */
import type { DataError } from '../types.ts';
import { at } from '../validate.ts';
import type { PathSegment, YamlSource } from '../yamlSource.ts';

/** A normaliser's answer: the typed object, or the located errors; warnings either way. */
export type Normalised<T> =
  | { readonly ok: true; readonly value: T; readonly warnings: readonly DataError[] }
  | { readonly ok: false; readonly errors: readonly DataError[]; readonly warnings: readonly DataError[] };

/** Errors for ids that repeat within one list (variants, impellers), at the repeat. */
export function duplicateIds(source: YamlSource, items: readonly { id: string }[], listPath: PathSegment[]): DataError[] {
  const firstIndex = new Map<string, number>();
  return items.flatMap((item, i) => {
    const first = firstIndex.get(item.id);
    if (first === undefined) {
      firstIndex.set(item.id, i);
      return [];
    }
    return [at(source, [...listPath, i, 'id'], { expected: `must be unique in ${listPath.join('.')} (already used by ${listPath.join('.')}[${first}])`, fix: 'give each entry its own id' })];
  });
}
