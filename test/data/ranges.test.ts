/**
 * Every number of every file kind has a physical range (docs/data-format.md, "Ranges of every number"):
 * the generated JSON Schemas bound every numeric field on both sides, the table in the guide gives the
 * same bounds field by field, and for every field at its bounds, just past them and at extreme
 * magnitudes (1e-300, 1e300, -0, huge negative) the loader and an independent JSON Schema validator
 * (ajv) agree: inside the range accepted, outside it a located error at the value's line and column.
 * The ranges themselves are common practice, no source, unless the guide names one.
 */
import { readFileSync } from 'node:fs';
import { Ajv, type ValidateFunction } from 'ajv';
import { LineCounter, parseDocument, parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { jsonSchemaFor, SCHEMA_KINDS, type SchemaKind } from '../../src/data/jsonSchemas.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { boatFile, bookFile, engineFile, jetFile, siteFile } from '../../src/data/schema/index.ts';
import { validate } from '../../src/data/validate.ts';
import { parseYaml } from '../../src/data/yamlSource.ts';
import { demoWith as demoWithFile } from './helpers.ts';
import { demoWithNumber, fieldPath, inRange, NUMERIC_FIELDS, numericFieldsOf, stressValues, type NumericField } from '../reliability/numericFields.ts';

/** How a range error reads (a positive number, between min and max, 0 or 3). */
const RANGE_WORDS = /^must be (a positive number|between -?[\d.]+ and [\d.]+|greater than 0|0 or 3)/;
const SCHEMAS = { engine: engineFile(), jet: jetFile(), boat: boatFile(), book: bookFile(), site: siteFile() } as const;
const ajv = new Ajv({ allErrors: true, strict: true, strictRequired: false });
const validators = Object.fromEntries(SCHEMA_KINDS.map((k) => [k, ajv.compile(jsonSchemaFor(k))])) as Record<SchemaKind, ValidateFunction>;

/** The guide's table: field (as the table spells it, shared pieces folded) → [min, max] or the allowed values. */
function guideRanges(): Map<string, { kinds: string[]; range: number[] }> {
  const text = readFileSync('docs/data-format.md', 'utf8');
  const section = text.split('## Ranges of every number')[1].split('\n## ')[0];
  const rows = section.split('\n').filter((l) => l.startsWith('| `'));
  const out = new Map<string, { kinds: string[]; range: number[] }>();
  const num = (s: string) => Number(s.replace('−', '-'));
  for (const row of rows) {
    const [fields, kinds, , range] = row.split('|').slice(1).map((c) => c.trim());
    const bounds = /^(−?[\d.]+) or (−?[\d.]+)$/.exec(range) ?? /^(−?[\d.]+)–(−?[\d.]+)$/.exec(range);
    if (!bounds) throw new Error(`no range in the row ${row}`);
    for (const f of fields.matchAll(/`([^`]+)`/g)) out.set(f[1], { kinds: kinds.split(', '), range: [num(bounds[1]), num(bounds[2])] });
  }
  return out;
}

/** A JSON Schema field as the guide names it: variants take the family's row, shared pieces one row each. */
function guideName(field: NumericField): string {
  let f = field.field.replace(/^variants\[\]\./, '').replace(/^wot_window_rpm\[\d\]$/, 'wot_window_rpm[]');
  if (/(^|\.)(reference_)?water\.density_kg_m3$/.test(f)) return 'water.density_kg_m3';
  f = f.replace(/^sheets\[\]\.conditions\.drive_line\./, 'drive_line.');
  if (field.kind === 'boat') f = f.replace(/^(site|trials\[\]\.conditions)\./, 'conditions.');
  if (field.kind === 'book') f = f.replace(/^sheets\[\]\.conditions\.site\./, 'conditions.');
  return f;
}

describe('ranges of every number', () => {
  it.each(SCHEMA_KINDS)('every numeric field of the %s JSON Schema has a lower and an upper bound', (kind) => {
    const { fields, unbounded } = numericFieldsOf(kind);
    expect(unbounded).toEqual([]);
    // site.yaml holds no number today; every other kind does.
    if (kind !== 'site') expect(fields.length).toBeGreaterThan(0);
  });

  it('the guide lists every numeric field with the bounds of the JSON Schema, and nothing else', () => {
    const guide = guideRanges();
    const used = new Set<string>();
    for (const field of NUMERIC_FIELDS) {
      const name = guideName(field);
      const row = guide.get(name);
      expect(row, `${field.kind} ${field.field} (${name}) has no row in docs/data-format.md`).toBeDefined();
      expect(row!.kinds, `${field.kind} ${field.field}`).toContain(field.kind);
      expect(row!.range, `${field.kind} ${field.field}`).toEqual(field.only ? [...field.only].sort((a, b) => a - b) : [field.min, field.max]);
      used.add(name);
    }
    expect([...guide.keys()].filter((k) => !used.has(k))).toEqual([]);
  });

  it('covers the numbers the issue names, among about a hundred fields', () => {
    const names = NUMERIC_FIELDS.map((f) => `${f.kind}:${f.field}`);
    expect(names).toEqual(expect.arrayContaining(['jet:impellers[].rating_kw', 'boat:drive_line.ratio', 'boat:drive_line.efficiency', 'boat:cruise[].speed_kn', 'boat:hull.displacement_kg', 'engine:curve.points[][1]']));
    expect(NUMERIC_FIELDS.length).toBeGreaterThan(90);
  });
});

describe('every numeric field at its bounds, just past them and at extreme magnitudes', () => {
  const cases = NUMERIC_FIELDS.flatMap((field) => stressValues(field).map((number) => ({ field, number })));

  it(`loader and ajv agree on all ${cases.length} cases: inside accepted, outside a located error at the value`, () => {
    let refused = 0;
    for (const { field, number } of cases) {
      const made = demoWithNumber({ field, number });
      expect(made, `${field.kind} ${field.field}`).toBeDefined();
      const { path, at, text } = made!;
      const name = fieldPath(at);
      const what = `${path} ${name} = ${number}`;
      const parsed = parseYaml({ file: path, text });
      expect(parsed.ok, what).toBe(true);
      if (!parsed.ok) continue;
      // The file's own schema: what `check` says of this file before any cross-file check.
      const v = validate(parsed.source, SCHEMAS[field.kind]);
      // Range errors only: a value inside its range may still break a rule joining two fields (idle < window).
      const here = v.ok ? [] : v.errors.filter((e) => e.field === name && RANGE_WORDS.test(e.expected));
      // ajv on the same text, at the same JSON pointer.
      const ajvOk = validators[field.kind](parse(text));
      const pointer = `/${at.join('/')}`;
      const ajvHere = ajvOk ? [] : (validators[field.kind].errors ?? []).filter((e) => e.instancePath === pointer);
      if (inRange(field, number)) {
        expect(here, what).toEqual([]);
        expect(ajvHere, what).toEqual([]);
        continue;
      }
      refused++;
      expect(here.length, `${what}: the loader must refuse it at the field`).toBeGreaterThan(0);
      expect(ajvHere.length, `${what}: the JSON Schema must refuse it`).toBeGreaterThan(0);
      // Located at the value itself, as an independent reading of the text gives it.
      const lc = new LineCounter();
      const doc = parseDocument(text, { lineCounter: lc });
      const node = doc.getIn(at, true) as { range?: [number, number] } | undefined;
      const pos = lc.linePos(node!.range![0]);
      expect([here[0].line, here[0].column], what).toEqual([pos.line, pos.col]);
      expect(here[0].found, what).toBe(text.slice(node!.range![0], node!.range![1]));
    }
    expect(refused).toBeGreaterThan(cases.length / 2);
  });

  it('a torque row inside its own range that gives more power than any engine is refused at the row, as is a known point', () => {
    const ENGINE = 'data/engines/anvilmoth-hauler.yaml';
    const text = readFileSync(ENGINE, 'utf8');
    const row = text.split('\n').findIndex((l) => l.includes('[3800, 790]')) + 1;
    const r = loadProjectFromFiles(demoWithFile(ENGINE, text.replace('[3800, 790]', '[3800, 90000]')));
    // P = T·2πn/60 = 90000 N·m × 2π × 3800 / 60 / 1000 = 35814 kW (NIST SP 811: kW = N·m × rpm / 9549.297).
    expect(r.ok ? [] : r.errors.map((e) => e.message)).toEqual([
      `${ENGINE}:${row}:14 curve.points[6][1] must give a power between 0.1 and 10000 kW, the powers of engines a waterjet is fitted to; it gives 35814 kW at 3800 rpm, found 90000 — check the unit of the table and the value`,
    ]);
    const THIMBLEFINCH = 'data/engines/thimblefinch-trotter.yaml';
    const known = readFileSync(THIMBLEFINCH, 'utf8').replace('power_hp: 158', 'power_hp: 13000').replace('known_point:', 'curve_scale: 2\nknown_point:');
    const k = loadProjectFromFiles(demoWithFile(THIMBLEFINCH, known));
    expect(k.ok ? [] : k.errors.map((e) => `${e.field} ${e.expected}`)).toEqual([
      'known_point.power_hp must give a power between 0.1 and 10000 kW (after curve_scale), the powers of engines a waterjet is fitted to; it gives 19388 kW at 5600 rpm',
    ]);
  });

  it('a cruise speed of zero, a rating of 1e-300 or 1e300 are located errors of the whole project load', () => {
    const messages = (field: string, number: number) => {
      const f = NUMERIC_FIELDS.find((x) => x.field === field)!;
      const r = loadProjectFromFiles(demoWithNumber({ field: f, number })!.files);
      return r.ok ? [] : r.errors.map((e) => e.message);
    };
    expect(messages('cruise[].speed_kn', 0)).toEqual([expect.stringMatching(/^data\/boats\/reedshank\.yaml:\d+:\d+ cruise\[0\]\.speed_kn must be a positive number, found 0$/)]);
    expect(messages('impellers[].rating_kw', 1e-300)).toEqual([expect.stringMatching(/^data\/jets\/kelpspindle-riffle\.yaml:\d+:\d+ impellers\[0\]\.rating_kw must be between 0\.01 and 10000 kW, found 1e-300$/)]);
    expect(messages('impellers[].rating_kw', 1e300)).toEqual([expect.stringMatching(/impellers\[0\]\.rating_kw must be between 0\.01 and 10000 kW, found 1e\+300$/)]);
  });
});
