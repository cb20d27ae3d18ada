/**
 * References checked even where a file did not load, so `check` lists every problem in one run. A boat
 * or book file with a schema error is still read for the ids it names (engine, jet, impeller, variant,
 * boat), and a reference into an engine or jet file that did not load is checked against the ids that
 * file spells out. Without this, fixing one error could reveal a wrong reference that was there all
 * along. The messages are the ones normalising gives, so the loader's de-duplication keeps one of each.
 */
import { isDataError, resolve, resolveMember, type Registry } from './references.ts';
import type { Boat, DataError, EngineFamily, JetUnit } from './types.ts';
import { SLUG_PATTERN } from './schema/common.ts';
import type { YamlSource } from './yamlSource.ts';

/** Member ids (impellers of a jet, variants of a family) as each parsed file writes them, loaded or not. */
export type LooseIds = ReadonlyMap<string, readonly string[]>;

const isRecord = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

/** An id worth looking up: one that is not an id at all already has its own schema error. */
const isId = (x: unknown): x is string => typeof x === 'string' && SLUG_PATTERN.test(x);

/**
 * The ids of the list `key` (impellers, variants) in a parsed file's value — only when every entry has
 * a well-formed id and no id repeats. Otherwise the ids themselves are what is wrong (a duplicated or
 * mistyped id), and checking references against them would report mistakes that are not there.
 */
export function memberIds(value: unknown, key: string): string[] {
  const list = isRecord(value) ? value[key] : undefined;
  if (!Array.isArray(list)) return [];
  const ids = list.map((m) => (isRecord(m) ? m.id : undefined));
  const wellFormed = ids.every(isId) && new Set(ids).size === ids.length;
  return wellFormed ? (ids as string[]) : [];
}

const members = (ids: readonly string[]) => ids.map((id) => ({ id }));

/** Every wrong reference a boat file's value holds, whether or not the file passed its schema. */
export function looseBoatReferences(args: {
  source: YamlSource;
  engines: Registry<EngineFamily>;
  jets: Registry<JetUnit>;
  variantIds: LooseIds;
  impellerIds: LooseIds;
}): DataError[] {
  const { source } = args;
  const v = source.value;
  if (!isRecord(v)) return [];
  const errors: DataError[] = [];
  if (isId(v.engine)) {
    const fam = resolve({ source, path: ['engine'], id: v.engine, registry: args.engines, what: 'engine families', dir: 'engines' });
    if (fam.status === 'unknown') errors.push(fam.error);
    const ids = fam.status === 'found' ? fam.value.variants.map((x) => x.variantId) : (args.variantIds.get(v.engine) ?? []);
    if (fam.status !== 'unknown' && isId(v.engine_variant) && ids.length > 0) {
      const hit = resolveMember({ source, path: ['engine_variant'], id: v.engine_variant, members: members(ids), what: `variants of ${v.engine}` });
      if (isDataError(hit)) errors.push(hit);
    }
  }
  if (isId(v.jet)) {
    const jet = resolve({ source, path: ['jet'], id: v.jet, registry: args.jets, what: 'jet units', dir: 'jets' });
    if (jet.status === 'unknown') errors.push(jet.error);
    const ids = jet.status === 'found' ? jet.value.impellers.map((i) => i.id) : (args.impellerIds.get(v.jet) ?? []);
    if (jet.status !== 'unknown' && ids.length > 0) {
      const check = (path: (string | number)[], id: unknown) => {
        if (!isId(id)) return;
        const hit = resolveMember({ source, path, id, members: members(ids), what: `impellers of ${v.jet}` });
        if (isDataError(hit)) errors.push(hit);
      };
      check(['impeller'], v.impeller);
      if (Array.isArray(v.trials)) v.trials.forEach((t, i) => isRecord(t) && check(['trials', i, 'impeller'], t.impeller));
    }
  }
  return errors;
}

/** Every wrong reference a book file's sheets hold, whether or not the file passed its schema. */
export function looseBookReferences(args: { source: YamlSource; engines: Registry<EngineFamily>; jets: Registry<JetUnit>; boats: Registry<Boat> }): DataError[] {
  const { source } = args;
  const v = source.value;
  if (!isRecord(v) || !Array.isArray(v.sheets)) return [];
  const errors: DataError[] = [];
  const check = <T>(path: (string | number)[], id: unknown, registry: Registry<T>, what: string, dir: string) => {
    if (!isId(id)) return;
    const r = resolve({ source, path, id, registry, what, dir });
    if (r.status === 'unknown') errors.push(r.error);
  };
  v.sheets.forEach((s, i) => {
    if (!isRecord(s)) return;
    if (s.kind === 'wallChart') {
      check(['sheets', i, 'engine'], s.engine, args.engines, 'engine families', 'engines');
      check(['sheets', i, 'jet'], s.jet, args.jets, 'jet units', 'jets');
    } else {
      check(['sheets', i, 'boat'], s.boat, args.boats, 'boats', 'boats');
    }
  });
  return errors;
}
