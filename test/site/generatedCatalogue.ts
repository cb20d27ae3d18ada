/**
 * Small on-disk catalogues for build-level property tests: site.yaml, one engine family, one jet, one or
 * two boats and one book, written as YAML into a folder. Every name and number is invented test data
 * (the files say so); the engine curve and ratings are the starter example's, spread so some impellers
 * lug and some over-rev. A catalogue is inside the limits of docs/sheets.md unless `past` names the one
 * limit it goes one past.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { stringify } from 'yaml';
import { LIMITS } from '../../src/data/schema/common.ts';
import { BOAT_SHEET_PAPERS, WALL_CHART_PAPERS } from '../../src/sheets/index.ts';

/** The one limit a catalogue goes one past, or none. */
export type PastLimit = 'none' | 'impellerLabel' | 'variantLabel' | 'cruiseLabel' | 'boatName' | 'engineName' | 'jetName' | 'makerName' | 'impellers' | 'variants' | 'cruise' | 'cautions' | 'cautionChars';

export type SheetKind = 'wallChart' | 'specSheet' | 'consoleCard' | 'upgradeSheet';

export interface GeneratedCatalogue {
  readonly impellerLabels: readonly string[];
  readonly variantLabels: readonly string[];
  /** One list of cruise labels per boat (one or two boats). */
  readonly cruiseLabels: readonly (readonly string[])[];
  readonly boatNames: readonly string[];
  readonly engineName: string;
  readonly jetName: string;
  readonly makerName: string;
  readonly cautions: readonly string[];
  /** How many of the cautions (the last ones) the book lists instead of site.yaml. */
  readonly bookCautions: number;
  readonly book: { readonly kind: SheetKind; readonly size: string; readonly orientation: 'portrait' | 'landscape'; readonly bleedMm: 0 | 3 };
  readonly past: PastLimit;
}

/** Paper sizes as a book file spells them (the sheets' list says Card4x6). */
const yamlSize = (size: string): string => (size === 'Card4x6' ? '4x6' : size);

/** The papers a sheet kind offers: the boat sheets' list of src/sheets/papers.ts; wall charts are made for A3 and Tabloid. */
export const KIND_PAPERS: Readonly<Record<SheetKind, readonly string[]>> = {
  wallChart: WALL_CHART_PAPERS.map(yamlSize),
  specSheet: BOAT_SHEET_PAPERS.specSheet.map(yamlSize),
  upgradeSheet: BOAT_SHEET_PAPERS.upgradeSheet.map(yamlSize),
  consoleCard: BOAT_SHEET_PAPERS.consoleCard.map(yamlSize),
};

const LETTERS = 'abcdefghijklmnopqrstuvwxyz';
const WORDS = ['Alder', 'brisk', 'Cobalt', 'drift', 'Ember', 'fern', 'Gannet', 'heron', 'Isle', 'juniper', 'Kestrel', 'loam', 'Marram', 'north', 'Otter', 'pine', 'Quill', 'reed', 'Sedge', 'tide', '2', '47', 'No.9', 'mk', 'X'];

/** Text of exactly n ≥ 1 characters from the words chosen by the seed list, never starting or ending in a space. */
function textOf(n: number, seeds: readonly number[]): string {
  let out = '';
  for (let i = 0; out.length < n; i++) out += (out === '' ? '' : ' ') + WORDS[seeds[i % seeds.length] % WORDS.length];
  out = out.slice(0, n);
  return out.endsWith(' ') ? `${out.slice(0, -1)}${LETTERS[n % 26]}` : out;
}

const text = (min: number, max: number): fc.Arbitrary<string> =>
  fc.tuple(fc.integer({ min, max }), fc.array(fc.nat(), { minLength: 1, maxLength: 8 })).map(([n, seeds]) => textOf(n, seeds));

/** A caution sentence of n characters (invented wording). */
function cautionOf(n: number, i: number): string {
  const words = ['Generated', 'test', 'caution', `${i + 1}:`, 'rinse', 'the', 'intake', 'grate', 'after', 'each', 'run', 'and', 'report', 'any', 'vibration', 'to', 'the', 'workshop.'];
  let out = '';
  for (let k = 0; out.length < n; k++) out += (out === '' ? '' : ' ') + words[k % words.length];
  out = out.slice(0, n);
  return out.endsWith(' ') ? `${out.slice(0, -1)}.` : out;
}

const PAST: readonly PastLimit[] = ['impellerLabel', 'variantLabel', 'cruiseLabel', 'boatName', 'engineName', 'jetName', 'makerName', 'impellers', 'variants', 'cruise', 'cautions', 'cautionChars'];

/** Catalogues inside the limits, and (share `pastShare` of 1) ones just past one limit. */
export function catalogueArbitrary(pastShare = 0.25): fc.Arbitrary<GeneratedCatalogue> {
  const L = LIMITS;
  const label = text(1, L.labelChars);
  const name = text(1, L.nameChars);
  return fc
    .record({
      impellerLabels: fc.array(label, { minLength: 1, maxLength: L.impellersPerJet }),
      variantLabels: fc.array(label, { minLength: 1, maxLength: L.variantsPerFamily }),
      cruiseLabels: fc.array(fc.array(label, { minLength: 0, maxLength: L.cruisePerBoat }), { minLength: 1, maxLength: 2 }),
      boatNames: fc.array(name, { minLength: 2, maxLength: 2 }),
      engineName: name,
      jetName: name,
      makerName: name,
      cautionChars: fc.array(fc.integer({ min: 1, max: L.cautionChars }), { minLength: 0, maxLength: L.cautions }),
      kind: fc.constantFrom<SheetKind>('wallChart', 'specSheet', 'consoleCard', 'upgradeSheet'),
      paperPick: fc.nat(),
      bookCautionPick: fc.nat(),
      orientation: fc.constantFrom<'portrait' | 'landscape'>('portrait', 'landscape'),
      bleedMm: fc.constantFrom<0 | 3>(0, 3),
      past: fc.integer({ min: 0, max: 999 }).map((x) => (x < pastShare * 1000 ? PAST[x % PAST.length] : 'none')),
      // The biggest cases are the interesting ones: a share at the limits exactly.
      atLimits: fc.integer({ min: 0, max: 3 }).map((x) => x === 0),
    })
    .map((r) => {
      const sizes = KIND_PAPERS[r.kind];
      let cat: GeneratedCatalogue = {
        impellerLabels: r.impellerLabels,
        variantLabels: r.variantLabels,
        cruiseLabels: r.cruiseLabels,
        boatNames: r.boatNames.slice(0, r.cruiseLabels.length),
        engineName: r.engineName,
        jetName: r.jetName,
        makerName: r.makerName,
        cautions: r.cautionChars.map((n, i) => cautionOf(n, i)),
        bookCautions: r.bookCautionPick % (r.cautionChars.length + 1),
        book: {
          kind: r.kind,
          size: sizes[r.paperPick % sizes.length],
          orientation: r.orientation,
          bleedMm: r.bleedMm,
        },
        past: r.past,
      };
      if (r.atLimits) cat = { ...cat, ...atTheLimits() };
      return goPast(cat, r.past);
    });
}

/** Every count and length at its limit. */
function atTheLimits(): Pick<GeneratedCatalogue, 'impellerLabels' | 'variantLabels' | 'cruiseLabels' | 'boatNames' | 'engineName' | 'jetName' | 'makerName' | 'cautions'> {
  const L = LIMITS;
  const labels = (n: number, k: number) => Array.from({ length: n }, (_, i) => textOf(L.labelChars, [k + i, i * 3 + 1, 7]));
  return {
    impellerLabels: labels(L.impellersPerJet, 0),
    variantLabels: labels(L.variantsPerFamily, 5),
    cruiseLabels: [labels(L.cruisePerBoat, 9)],
    boatNames: [textOf(L.nameChars, [4, 11, 2])],
    engineName: textOf(L.nameChars, [0, 13, 5]),
    jetName: textOf(L.nameChars, [16, 3, 8]),
    makerName: textOf(L.nameChars, [10, 1, 12]),
    cautions: Array.from({ length: L.cautions }, (_, i) => cautionOf(L.cautionChars, i)),
  };
}

/** The catalogue with one thing one past its limit. */
function goPast(cat: GeneratedCatalogue, past: PastLimit): GeneratedCatalogue {
  const L = LIMITS;
  const longer = (n: number) => textOf(n + 1, [2, 9, 14]);
  switch (past) {
    case 'none':
      return cat;
    case 'impellerLabel':
      return { ...cat, impellerLabels: [...cat.impellerLabels.slice(0, -1), longer(L.labelChars)] };
    case 'variantLabel':
      return { ...cat, variantLabels: [longer(L.labelChars), ...cat.variantLabels.slice(1)] };
    case 'cruiseLabel':
      return { ...cat, cruiseLabels: [[...cat.cruiseLabels[0], longer(L.labelChars)].slice(-L.cruisePerBoat), ...cat.cruiseLabels.slice(1)] };
    case 'boatName':
      return { ...cat, boatNames: [longer(L.nameChars), ...cat.boatNames.slice(1)] };
    case 'engineName':
      return { ...cat, engineName: longer(L.nameChars) };
    case 'jetName':
      return { ...cat, jetName: longer(L.nameChars) };
    case 'makerName':
      return { ...cat, makerName: longer(L.nameChars) };
    case 'impellers':
      return { ...cat, impellerLabels: Array.from({ length: L.impellersPerJet + 1 }, (_, i) => cat.impellerLabels[i % cat.impellerLabels.length]) };
    case 'variants':
      return { ...cat, variantLabels: Array.from({ length: L.variantsPerFamily + 1 }, (_, i) => cat.variantLabels[i % cat.variantLabels.length]) };
    case 'cruise':
      return { ...cat, cruiseLabels: [Array.from({ length: L.cruisePerBoat + 1 }, (_, i) => `Setting ${i + 1}`), ...cat.cruiseLabels.slice(1)] };
    case 'cautions':
      return { ...cat, cautions: Array.from({ length: L.cautions + 1 }, (_, i) => cat.cautions[i] ?? cautionOf(40, i)) };
    case 'cautionChars':
      return { ...cat, cautions: [cautionOf(L.cautionChars + 1, 0), ...cat.cautions.slice(1)] };
  }
}

const HEADER = '# GENERATED TEST DATA: invented names and numbers for a property test. Not a real product, boat or shop.\n';

/** Writes the catalogue as a data folder in dir (created) and returns dir. */
export function writeCatalogue(dir: string, cat: GeneratedCatalogue): string {
  for (const sub of ['engines', 'jets', 'boats', 'books']) mkdirSync(join(dir, sub), { recursive: true });
  // The last bookCautions of the cautions go in the book, the others in site.yaml (the limit is on both together).
  const split = Math.min(cat.bookCautions, cat.cautions.length);
  const siteCautions = cat.cautions.slice(0, cat.cautions.length - split);
  const bookCautions = cat.cautions.slice(cat.cautions.length - split);
  const yaml = (file: string, value: unknown) => writeFileSync(join(dir, file), HEADER + stringify(value, { lineWidth: 0 }));
  yaml('site.yaml', {
    shop_name: 'Generated Test Shop (test data)',
    contact_line: 'Test data only · test@example.invalid',
    units: { power: 'kW', speed: 'kn' },
    data_revision: 'generated rev 1',
    issue_date: '2026-01-01',
    ...(siteCautions.length > 0 ? { cautions: siteCautions } : {}),
  });
  const n = cat.impellerLabels.length;
  yaml('jets/test-jet.yaml', {
    id: 'test-jet',
    label: cat.jetName,
    maker: cat.makerName,
    notes: 'Generated test data.',
    reference_speed_rpm: 1000,
    exponent: 3,
    tolerance_pct: 5,
    // Lightest first, 1.0 to 2.2 kW at 1000 rpm: the starter engine matches near 1.45 kW.
    impellers: cat.impellerLabels.map((label, i) => ({ id: `imp-${i + 1}`, label, rating_kw: Number((1.0 + (n > 1 ? (1.2 * i) / (n - 1) : 0.45)).toFixed(3)) })),
  });
  yaml('engines/test-engine.yaml', {
    id: 'test-engine',
    label: cat.engineName,
    maker: cat.makerName,
    fuel: 'petrol',
    aspiration: 'natural',
    notes: 'Generated test data.',
    idle_rpm: 700,
    wot_window_rpm: [4800, 5200],
    max_rpm: 5400,
    power_tolerance_pct: 5,
    curve: { unit: 'kW', points: [[1000, 38], [2000, 85], [3000, 130], [4000, 170], [4500, 186], [5000, 197], [5200, 200], [5400, 198]] },
    variants: cat.variantLabels.map((label, i) => ({ id: `v${i + 1}`, label, ...(i > 0 ? { curve_scale: Number((0.85 + 0.06 * i).toFixed(2)) } : {}) })),
  });
  cat.boatNames.forEach((name, b) => {
    yaml(`boats/boat-${b + 1}.yaml`, {
      id: `boat-${b + 1}`,
      name,
      notes: 'Generated test data.',
      hull: { description: '5.5 m generated test hull', type: 'runabout', displacement_kg: 1200 + 200 * b },
      engine: 'test-engine',
      engine_variant: `v${Math.min(b + 1, cat.variantLabels.length)}`,
      jet: 'test-jet',
      impeller: `imp-${Math.ceil(n / 2)}`,
      drive_line: { ratio: 1, efficiency: 0.97 },
      water: 'fresh',
      site: { label: 'Test Water', altitude_m: 100, air_temp_c: 20, humidity_pct: 50 },
      cruise: cat.cruiseLabels[b].map((label, i) => (i % 3 === 0 ? { label, rpm: 2500 + 250 * i } : i % 3 === 1 ? { label, power_kw: 60 + 10 * i } : { label, speed_kn: 15 + 2 * i })),
      fuel_tank_l: 120,
    });
  });
  const { book } = cat;
  const sheet = book.kind === 'wallChart' ? { kind: 'wallChart', engine: 'test-engine', jet: 'test-jet', conditions: { cruise_powers_kw: [80, 120] } } : { kind: book.kind, boat: 'boat-1' };
  yaml('books/test-book.yaml', {
    id: 'test-book',
    title: 'Generated test book (test data)',
    audience: 'shop',
    paper: { size: book.size, orientation: book.orientation, bleed_mm: book.bleedMm },
    sheets: [sheet],
    ...(bookCautions.length > 0 ? { cautions: bookCautions } : {}),
  });
  return dir;
}
