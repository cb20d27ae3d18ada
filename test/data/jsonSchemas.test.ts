import { readFileSync } from 'node:fs';
import { Ajv, type ValidateFunction } from 'ajv';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { jsonSchemaFor, jsonSchemaText, SCHEMA_KINDS, type SchemaKind } from '../../src/data/jsonSchemas.ts';
import { demoFiles } from './helpers.ts';

const KIND_OF_DIR: Record<string, SchemaKind> = { engines: 'engine', jets: 'jet', boats: 'boat', books: 'book' };
const kindOf = (path: string): SchemaKind => (path.endsWith('/site.yaml') ? 'site' : KIND_OF_DIR[path.split('/').at(-2)!]);

// ajv is an independent JSON Schema validator: the committed schemas must agree with the loader.
const ajv = new Ajv({ allErrors: true, strict: true, strictRequired: false });
const validators = Object.fromEntries(SCHEMA_KINDS.map((k) => [k, ajv.compile(jsonSchemaFor(k))])) as Record<SchemaKind, ValidateFunction>;

describe('the JSON Schemas in schema/ are generated from the loader schema and agree with it', () => {
  it.each(SCHEMA_KINDS)('schema/%s.schema.json is up to date with src/data/schema', (kind) => {
    expect(readFileSync(`schema/${kind}.schema.json`, 'utf8')).toBe(jsonSchemaText(kind));
  });

  it.each(demoFiles().filter((f) => f.path.endsWith('.yaml')).map((f) => [f.path, f.text]))('ajv accepts the demo file %s', (path, text) => {
    const validate = validators[kindOf(path)];
    expect(validate(parse(text)), JSON.stringify(validate.errors)).toBe(true);
  });

  it('each demo file names its schema by a relative path for the YAML language server', () => {
    for (const f of demoFiles().filter((x) => x.path.endsWith('.yaml'))) {
      const rel = f.path === 'data/site.yaml' ? '../schema/site.schema.json' : `../../schema/${kindOf(f.path)}.schema.json`;
      expect(f.text.split('\n')[0]).toBe(`# yaml-language-server: $schema=${rel}`);
    }
  });

  // Fixtures whose mistake a JSON Schema can express (types, ranges, required, unknown keys, unit choices).
  it.each([
    ['wrong-type', 'jets/kelpspindle-riffle.yaml', '/impellers/2/rating_kw'],
    ['negative-rating', 'jets/kelpspindle-riffle.yaml', '/impellers/2/rating_kw'],
    ['missing-field', 'boats/reedshank.yaml', ''],
    ['unknown-field', 'jets/kelpspindle-riffle.yaml', '/impellers/2'],
    ['unit-choice', 'jets/kelpspindle-riffle.yaml', '/impellers/2'],
    ['out-of-range', 'jets/kelpspindle-riffle.yaml', '/exponent'],
  ])('ajv rejects the %s fixture at the same place the loader reports', (fixture, file, pointer) => {
    const text = readFileSync(`test/fixtures/data/${fixture}/${file}`, 'utf8');
    const validate = validators[kindOf(`data/${file}`)];
    expect(validate(parse(text))).toBe(false);
    expect(validate.errors!.map((e) => e.instancePath)).toContain(pointer);
  });
});
