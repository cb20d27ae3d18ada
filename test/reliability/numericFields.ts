/**
 * Every numeric field of every file kind, read from the generated JSON Schemas (so a field added to a
 * schema is fuzzed without anyone remembering to list it), and a way to set any of them to any number
 * in a copy of the demo data: the field's own value where the demo has one, else the field added where
 * a technician would add it (a variant's own known point, a measured water density, a diesel's fm).
 */
import { parse, stringify } from 'yaml';
import { jsonSchemaFor, SCHEMA_KINDS, type SchemaKind } from '../../src/data/jsonSchemas.ts';
import type { SourceFile } from '../../src/data/load.ts';
import { demoFiles } from '../data/helpers.ts';

export interface NumericField {
  readonly kind: SchemaKind;
  /** The field as the JSON Schema nests it: `impellers[].rating_kw`, `wot_window_rpm[1]`, `curve.points[][0]`. */
  readonly field: string;
  readonly min: number;
  readonly max: number;
  /** Only these values (`bleed_mm`: 0 or 3). */
  readonly only?: readonly number[];
}

interface SchemaNode {
  type?: string;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  const?: unknown;
  properties?: Record<string, SchemaNode>;
  items?: SchemaNode | SchemaNode[];
  prefixItems?: SchemaNode[];
  anyOf?: SchemaNode[];
  oneOf?: SchemaNode[];
  allOf?: SchemaNode[];
}

/** Walk one JSON Schema: every number node with its field path, bounds and consts. */
function walk(node: SchemaNode | undefined, field: string, out: Map<string, { min?: number; max?: number; consts: number[]; unbounded: boolean }>): void {
  if (!node || typeof node !== 'object') return;
  const entry = () => {
    if (!out.has(field)) out.set(field, { consts: [], unbounded: false });
    return out.get(field)!;
  };
  if (typeof node.const === 'number') entry().consts.push(node.const);
  else if (node.type === 'number' || node.type === 'integer') {
    const e = entry();
    const min = node.minimum ?? node.exclusiveMinimum;
    if (min === undefined || node.maximum === undefined) e.unbounded = true;
    e.min = min;
    e.max = node.maximum;
  }
  for (const [k, v] of Object.entries(node.properties ?? {})) walk(v, field ? `${field}.${k}` : k, out);
  if (Array.isArray(node.items)) node.items.forEach((it, i) => walk(it, `${field}[${i}]`, out));
  else if (node.items) walk(node.items, `${field}[]`, out);
  node.prefixItems?.forEach((it, i) => walk(it, `${field}[${i}]`, out));
  for (const list of [node.anyOf, node.oneOf, node.allOf]) list?.forEach((it) => walk(it, field, out));
}

/** Numeric fields of one kind's JSON Schema; `unbounded` lists any without both bounds (must be none). */
export function numericFieldsOf(kind: SchemaKind): { fields: NumericField[]; unbounded: string[] } {
  const out = new Map<string, { min?: number; max?: number; consts: number[]; unbounded: boolean }>();
  walk(jsonSchemaFor(kind) as SchemaNode, '', out);
  const fields: NumericField[] = [];
  const unbounded: string[] = [];
  for (const [field, e] of out) {
    if (e.unbounded) unbounded.push(field);
    else if (e.consts.length > 0) fields.push({ kind, field, min: Math.min(...e.consts), max: Math.max(...e.consts), only: [...new Set(e.consts)] });
    else fields.push({ kind, field, min: e.min!, max: e.max! });
  }
  return { fields, unbounded };
}

export const NUMERIC_FIELDS: readonly NumericField[] = SCHEMA_KINDS.flatMap((k) => numericFieldsOf(k).fields);

type Path = (string | number)[];
type Obj = Record<string, unknown>;

/** Keys of which a file may give one (setting one removes the others beside it); `in` limits a group to one parent. */
const ONE_OF: readonly { keys: readonly string[]; in?: string }[] = [
  { keys: ['rating_kw', 'rating_hp'] },
  { keys: ['displacement_kg', 'displacement_lb'] },
  { keys: ['power_kw', 'power_hp', 'power_ps', 'torque_nm', 'torque_lbf_ft'], in: 'known_point' },
  { keys: ['power_kw', 'power_hp', 'rpm', 'speed_kn', 'speed_mph', 'speed_kmh'], in: 'cruise' },
  { keys: ['speed_kn', 'speed_mph', 'speed_kmh'], in: 'trials' },
  { keys: ['load_kg', 'load_lb'] },
  { keys: ['fuel_tank_l', 'fuel_tank_us_gal'] },
  { keys: ['altitude_m', 'pressure_kpa', 'pressure_hpa', 'pressure_inhg'] },
  { keys: ['air_temp_c', 'air_temp_f'] },
  { keys: ['cruise_powers_kw', 'cruise_powers_hp'] },
  { keys: ['curve', 'known_point'] },
];

/** Remove the keys that may not stand beside key in node (its unit choice); parent is the key above node. */
function clearChoice(node: Obj, key: string, parent: string | number | undefined): void {
  for (const group of ONE_OF) {
    if (!group.keys.includes(key) || (group.in !== undefined && group.in !== parent)) continue;
    for (const k of group.keys) if (k !== key) delete node[k];
  }
}

/** Which demo file holds (or receives) a field of each kind; the first that has the field's parent wins. */
const FILES: Record<SchemaKind, readonly string[]> = {
  site: ['data/site.yaml'],
  engine: ['data/engines/copperwhistle-strider.yaml', 'data/engines/thimblefinch-trotter.yaml', 'data/engines/anvilmoth-hauler.yaml'],
  jet: ['data/jets/kelpspindle-riffle.yaml', 'data/jets/gullbobbin-shoal.yaml'],
  boat: ['data/boats/reedshank.yaml', 'data/boats/brine-lark.yaml', 'data/boats/sorrel-belle.yaml', 'data/boats/greyling.yaml', 'data/boats/floodmoth-two.yaml', 'data/boats/cloudpail-express.yaml'],
  book: ['data/books/shop-wall-charts.yaml', 'data/books/owner-console-cards.yaml', 'data/books/dealer-spec-sheets.yaml'],
};

const isObj = (x: unknown): x is Obj => typeof x === 'object' && x !== null && !Array.isArray(x);

/** `impellers[].rating_kw` → ['impellers', '[]', 'rating_kw']; `wot_window_rpm[1]` → ['wot_window_rpm', 1]. */
function segments(field: string): (string | number)[] {
  return field.split('.').flatMap((part) => {
    const [name, ...rest] = part.split('[');
    return [name, ...rest.map((r) => (r === ']' ? '[]' : Number(r.slice(0, -1))))];
  });
}

/** A demo file's value, a concrete path to the field in it (list entries chosen by `pick`), ready to set. */
interface Placement {
  readonly path: string;
  readonly value: Obj;
  readonly at: Path;
}

/** Make room for field in a copy of value: pick list entries, add what the field needs beside it. */
function place(kind: SchemaKind, value: Obj, field: string, pick: number): Path | undefined {
  const segs = segments(field);
  const at: Path = [];
  let node: unknown = value;
  for (let i = 0; i < segs.length; i++) {
    const seg = segs[i];
    const last = i === segs.length - 1;
    if (seg === '[]') {
      if (!Array.isArray(node) || node.length === 0) return undefined;
      const index = pick % node.length;
      at.push(index);
      node = node[index];
      continue;
    }
    if (typeof seg === 'number') {
      if (!Array.isArray(node)) return undefined;
      at.push(seg);
      node = node[seg];
      continue;
    }
    if (!isObj(node)) return undefined;
    at.push(seg);
    if (last) {
      // One of a unit choice: the others beside it go.
      clearChoice(node, seg, parentKey(at));
      if (node[seg] === undefined) node[seg] = 1;
      return at;
    }
    if (node[seg] === undefined || (seg === 'water' || seg === 'reference_water' ? !isObj(node[seg]) : false)) {
      const made = companion({ kind, owner: node, key: seg, root: value });
      if (made === undefined) return undefined;
      clearChoice(node, seg, parentKey(at));
      node[seg] = made;
    }
    node = node[seg];
  }
  return at;
}

/** The key whose value holds the field's mapping: `cruise` for ['cruise', 0, 'rpm'], `known_point` for ['known_point', 'rpm']. */
function parentKey(at: Path): string | undefined {
  for (let i = at.length - 2; i >= 0; i--) if (typeof at[i] === 'string') return at[i] as string;
  return undefined;
}

/** What a technician writes when adding the object that holds the field. */
function companion(args: { kind: SchemaKind; owner: Obj; key: string; root: Obj }): unknown {
  const { owner, key, root } = args;
  switch (key) {
    case 'known_point': {
      const window = (owner.wot_window_rpm ?? root.wot_window_rpm) as number[] | undefined;
      return { rpm: window ? Math.round((window[0] + window[1]) / 2) : 4800, power_kw: 200 };
    }
    case 'power_correction':
      return root.fuel === 'diesel' ? { standard: 'iso-1585-ci' } : undefined;
    case 'water':
    case 'reference_water':
      return { density_kg_m3: 1000 };
    case 'curve':
      return isObj(root.curve) ? structuredClone(root.curve) : undefined;
    case 'wot_window_rpm':
      return Array.isArray(root.wot_window_rpm) ? [...root.wot_window_rpm] : undefined;
    case 'reference_conditions':
    case 'site':
    case 'conditions':
    case 'drive_line':
      return key === 'drive_line' ? { ratio: 1, efficiency: 0.97 } : {};
    case 'paper':
      return isObj(root.paper) ? { ...root.paper } : undefined;
    case 'cruise_powers_kw':
    case 'cruise_powers_hp':
      return [100, 150];
    default:
      return undefined;
  }
}

/** The demo data with one numeric field set to number (a list entry chosen by pick), or undefined when no demo file can hold it. */
export function demoWithNumber(args: { field: NumericField; number: number; pick?: number }): { files: SourceFile[]; path: string; at: Path; text: string } | undefined {
  const demo = demoFiles();
  for (const path of FILES[args.field.kind]) {
    const file = demo.find((f) => f.path === path)!;
    const value = parse(file.text) as Obj;
    const at = place(args.field.kind, value, args.field.field, args.pick ?? 0);
    if (!at) continue;
    setIn(value, at, args.number);
    const header = file.text.split('\n').filter((l) => l.startsWith('#')).slice(0, 2).join('\n');
    const text = `${header}\n${stringify(value, { lineWidth: 0 })}`;
    return { files: demo.map((f) => (f === file ? { path, text } : f)), path, at, text };
  }
  return undefined;
}

function setIn(value: Obj, at: Path, number: number): void {
  let node: unknown = value;
  for (const seg of at.slice(0, -1)) node = (node as Record<string | number, unknown>)[seg];
  (node as Record<string | number, unknown>)[at[at.length - 1]] = number;
}

/** The concrete path as the loader names fields: `impellers[2].rating_kw`. */
export function fieldPath(at: Path): string {
  return at.map((s, i) => (typeof s === 'number' ? `[${s}]` : i === 0 ? s : `.${s}`)).join('');
}

/**
 * The values that stress a field: its bounds, just inside and just past them, zero and minus zero, and
 * extreme magnitudes either side (1e-300 underflows a product to 0, 1e300 overflows one to Infinity).
 */
export function stressValues(field: NumericField): number[] {
  if (field.only) return [...field.only, 1, -3, 1e-300, 1e300];
  const { min, max } = field;
  const step = (x: number) => Math.max(Math.abs(x), 1) * 1e-6;
  return [min, max, min + step(min), max - step(max), min - step(min), max + step(max), 0, -0, 1e-300, -1e-300, 1e300, -1e300, Number.MAX_VALUE, Number.MIN_VALUE];
}

/** True when number lies inside the field's range (what the schema must accept). */
export function inRange(field: NumericField, number: number): boolean {
  if (field.only) return field.only.includes(number);
  return number >= field.min && number <= field.max && (field.min > 0 ? number > 0 : true);
}
