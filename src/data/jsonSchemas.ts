/**
 * JSON Schemas for editors, generated from the same zod schemas the loader uses (draft-07, which
 * YAML editors support best). Unit choices ("rating_kw or rating_hp") become oneOf / not-anyOf.
 */
import * as z from 'zod';
import { UNIT_CHOICES_META, type UnitChoice } from './schema/common.ts';
import { boatFile, bookFile, engineFile, jetFile, siteFile } from './schema/index.ts';

export const SCHEMA_KINDS = ['engine', 'jet', 'boat', 'book', 'site'] as const;
export type SchemaKind = (typeof SCHEMA_KINDS)[number];

const BUILDERS: Record<SchemaKind, () => z.ZodType> = { engine: engineFile, jet: jetFile, boat: boatFile, book: bookFile, site: siteFile };

/** The JSON Schema of one file kind, as a plain object. */
export function jsonSchemaFor(kind: SchemaKind): Record<string, unknown> {
  const raw = z.toJSONSchema(BUILDERS[kind](), { target: 'draft-7', io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
  return expandUnitChoices({ ...raw, $id: `https://matchbook.invalid/schema/${kind}.schema.json` }) as Record<string, unknown>;
}

/** Serialised as committed in schema/<kind>.schema.json. */
export function jsonSchemaText(kind: SchemaKind): string {
  return `${JSON.stringify(jsonSchemaFor(kind), null, 2)}\n`;
}

/** Replace our x-unit-choices marker with standard keywords, everywhere in the tree (returns a copy). */
function expandUnitChoices(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(expandUnitChoices);
  if (typeof node !== 'object' || node === null) return node;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(node)) if (k !== UNIT_CHOICES_META) out[k] = expandUnitChoices(v);
  const choices = (node as Record<string, unknown>)[UNIT_CHOICES_META] as UnitChoice[] | undefined;
  if (choices) {
    const rules = choices.map((c) =>
      c.required
        ? { oneOf: c.keys.map((k) => ({ required: [k] })) }
        : { not: { anyOf: pairs(c.keys).map((pair) => ({ required: pair })) } },
    );
    out.allOf = [...((out.allOf as unknown[]) ?? []), ...rules];
  }
  return out;
}

function pairs(keys: readonly string[]): string[][] {
  return keys.flatMap((a, i) => keys.slice(i + 1).map((b) => [a, b]));
}
