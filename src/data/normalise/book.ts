/** Book file → Book: each sheet's references checked, paper resolved (sheet's own or the book's). */
import { hpToKw } from '../../units.ts';
import { resolve, type Registry } from '../references.ts';
import type { RawBookFile, RawPaper, RawSheet } from '../schema/book.ts';
import type { Boat, Book, BookChartConditions, BookSheet, DataError, EngineFamily, FuelUnit, JetUnit, Paper, PowerUnit, SpeedUnit, UnitsOverride } from '../types.ts';
import { LIMITS } from '../schema/common.ts';
import { at } from '../validate.ts';
import { dataError } from '../errors.ts';
import type { YamlSource } from '../yamlSource.ts';
import { siteFields, toWater } from './conditions.ts';
import type { Normalised } from './shared.ts';

export interface BookRegistries {
  readonly engines: Registry<EngineFamily>;
  readonly jets: Registry<JetUnit>;
  readonly boats: Registry<Boat>;
  /** How many cautions site.yaml adds (a book's and the site's together stay within LIMITS.cautions). */
  readonly siteCautions?: number;
}

/** Normalise a validated book file against the loaded engines, jets and boats. */
export function normaliseBook(source: YamlSource, raw: RawBookFile, reg: BookRegistries): Normalised<Book> {
  const errors: DataError[] = [];
  const check = <T>(args: { path: (string | number)[]; id: string; registry: Registry<T>; what: string; dir: string }): void => {
    const r = resolve({ source, ...args });
    if (r.status === 'unknown') errors.push(r.error);
  };
  raw.sheets.forEach((s, i) => {
    if (s.kind === 'wallChart') {
      check({ path: ['sheets', i, 'engine'], id: s.engine, registry: reg.engines, what: 'engine families', dir: 'engines' });
      check({ path: ['sheets', i, 'jet'], id: s.jet, registry: reg.jets, what: 'jet units', dir: 'jets' });
    } else {
      check({ path: ['sheets', i, 'boat'], id: s.boat, registry: reg.boats, what: 'boats', dir: 'boats' });
      // A comparison needs options to compare: a boat without repower_options cannot have one.
      const boat = reg.boats.get(s.boat);
      if (s.kind === 'repowerSheet' && boat && !boat.repowerOptions) {
        errors.push(at(source, ['sheets', i, 'boat'], { expected: `must name a boat that lists repower_options for a repowerSheet (${boat.source.file} lists none)`, fix: `add 2 to 6 repower_options to ${boat.source.file}, or name another boat` }));
      }
    }
  });
  // A sheet's own paper keeps the book's bleed and crop marks unless it says otherwise.
  const paperOf = (s: RawSheet): RawPaper =>
    s.paper ? { ...s.paper, bleed_mm: s.paper.bleed_mm ?? raw.paper.bleed_mm, crop_marks: s.paper.crop_marks ?? raw.paper.crop_marks } : raw.paper;
  // One paper per book, unless the book asks for a mix: a stray paper: line is usually a leftover.
  if (!raw.mixed_paper) {
    const book = paperWords(raw.paper);
    raw.sheets.forEach((s, i) => {
      if (s.paper && paperWords(paperOf(s)) !== book) {
        errors.push(
          at(source, ['sheets', i, 'paper'], {
            expected: `must match the book's paper (${book}); a book prints on one paper size`,
            found: paperWords(paperOf(s)),
            fix: 'remove this paper: line, move the sheet to a book of its own, or add mixed_paper: true to the book',
          }),
        );
      }
    });
  }
  const siteCautions = reg.siteCautions ?? 0;
  if (raw.cautions && raw.cautions.length + siteCautions > LIMITS.cautions) {
    // Located at the cautions: key, as a list with too many entries is.
    const key = source.locate(['cautions'], { at: 'key' });
    errors.push(
      dataError({ file: source.file, line: key.line, column: key.column }, {
        field: 'cautions',
        expected: `must keep this book's and site.yaml's cautions together at most ${LIMITS.cautions} (every sheet prints every caution after the built-in ones)`,
        found: `${raw.cautions.length} here and ${siteCautions} in site.yaml`,
        fix: `merge or drop ${raw.cautions.length + siteCautions - LIMITS.cautions} of them, here or in site.yaml`,
      }),
    );
  }
  if (errors.length > 0) return { ok: false, errors, warnings: [] };
  const bookCautions = raw.cautions ? { bookId: raw.id, texts: raw.cautions } : undefined;
  const book: Book = {
    id: raw.id,
    title: raw.title,
    audience: raw.audience,
    sheets: raw.sheets.map((s) => {
      const units = toUnits({ ...raw.units, ...s.units });
      return { ...toSheet(s, toPaper(paperOf(s))), ...(bookCautions ? { bookCautions } : {}), ...(units ? { units } : {}) };
    }),
    ...(raw.cautions ? { extraCautions: raw.cautions } : {}),
    source: { file: source.file },
  };
  return { ok: true, value: book, warnings: [] };
}

/** The units a book's sheet gives (its own over the book's); undefined when it gives none. */
function toUnits(u: { power?: PowerUnit; speed?: SpeedUnit; speed_also?: SpeedUnit | 'none'; fuel?: FuelUnit }): UnitsOverride | undefined {
  const units: UnitsOverride = {
    ...(u.power !== undefined ? { powerUnitFirst: u.power } : {}),
    ...(u.speed !== undefined ? { speedUnit: u.speed } : {}),
    ...(u.speed_also !== undefined ? { speedAlso: u.speed_also === 'none' ? null : u.speed_also } : {}),
    ...(u.fuel !== undefined ? { fuelUnit: u.fuel } : {}),
  };
  return Object.keys(units).length > 0 ? units : undefined;
}

/** "A4 portrait", "4x6 landscape with 3 mm bleed": a paper as the file writes it, for messages. */
function paperWords(p: RawPaper): string {
  const marks = p.crop_marks === undefined || p.crop_marks === p.bleed_mm > 0 ? '' : p.crop_marks ? ' with crop marks' : ' without crop marks';
  return `${p.size} ${p.orientation}${p.bleed_mm > 0 ? ` with ${p.bleed_mm} mm bleed` : ''}${marks}`;
}

/** File paper → Paper; "4x6" is the 4 × 6 in card. */
export function toPaper(p: RawPaper): Paper {
  return { size: p.size === '4x6' ? 'Card4x6' : p.size, orientation: p.orientation, bleedMm: p.bleed_mm, ...(p.crop_marks !== undefined ? { cropMarks: p.crop_marks } : {}) };
}

function toSheet(s: RawSheet, paper: Paper): BookSheet {
  if (s.kind !== 'wallChart') return { kind: s.kind, boatId: s.boat, paper };
  const c = s.conditions ?? {};
  const cruisePowersKw = c.cruise_powers_kw ?? c.cruise_powers_hp?.map(hpToKw);
  const conditions: BookChartConditions = {
    ...(c.drive_line ? { driveLine: { ratio: c.drive_line.ratio, efficiency: c.drive_line.efficiency } } : {}),
    ...(c.water !== undefined ? { water: toWater(c.water) } : {}),
    ...(c.site ? { site: siteFields(c.site) } : {}),
    ...(cruisePowersKw ? { cruisePowersKw: [...cruisePowersKw].sort((a, b) => a - b) } : {}),
  };
  return { kind: 'wallChart', engineFamilyId: s.engine, jetId: s.jet, conditions, paper };
}
