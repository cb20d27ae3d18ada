/**
 * Building blocks shared by the file schemas. Every message here is our own wording; the same zod
 * schemas generate the JSON Schemas for editors (scripts/gen-schemas.ts), so ranges live here once.
 */
import * as z from 'zod';

export const SLUG_PATTERN = /^[a-z0-9]+(-[a-z0-9]+)*$/;
export const ISO_DATE_PATTERN = /^\d{4}-\d{2}-\d{2}$/;

/** Lower-case slug: ids of files, variants, impellers, and references to them. */
export const slug = () =>
  z.string().regex(SLUG_PATTERN, { error: 'must be a lower-case id like "harbour-boat-2" (letters a–z, digits, single hyphens)' });

/**
 * Characters no user text may hold, wherever it is printed (sheets, pages, PDF titles, the terminal):
 * C0 and C1 controls other than tab and line breaks, DEL, the soft hyphen, zero-width and invisible
 * format characters, bidirectional marks, embeddings, overrides and isolates (an override can reverse
 * a name in a page title), line and paragraph separators, interlinear annotation marks, U+FEFF, the
 * non-characters U+FFFE and U+FFFF, and lone UTF-16 surrogates (a YAML escape such as "\ud800"; with the u flag a surrogate pair is one
 * character and never matches).
 */
export const INVISIBLE_CHARS =
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u00ad\u061c\u115f\u1160\u180e\u200b-\u200f\u2028-\u202e\u2060-\u2064\u2066-\u206f\u3164\ufeff\ufff9-\ufffb\uffa0\ufffe\uffff\ud800-\udfff]/u;

/** \u202e: how a character is written in a YAML double-quoted string (and in check's messages). */
export function escapedChar(ch: string): string {
  const code = ch.codePointAt(0) ?? 0;
  return code > 0xffff ? `\\U${code.toString(16).padStart(8, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
}

/** U+202E for "\u202e". */
export function codePointName(ch: string): string {
  return `U+${(ch.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}`;
}

/**
 * Text a person typed. Runs of spaces, tabs and line breaks become one space and the ends are trimmed
 * (a folded `>` block or a pasted tab prints the same on paper and on the page); an invisible or
 * control character (INVISIBLE_CHARS) is refused at the character, so nothing is silently dropped on
 * the sheets and kept in the HTML.
 */
export const text = () =>
  z
    .string()
    .overwrite((s) => s.replace(/[ \t\r\n]+/g, ' ').trim())
    .min(1, { error: 'must not be empty' })
    .superRefine((s, ctx) => {
      const hit = INVISIBLE_CHARS.exec(s);
      if (!hit) return;
      ctx.addIssue({
        code: 'custom',
        message: 'must hold only printable characters (no control, zero-width or bidirectional-control characters)',
        params: { char: hit[0], found: `"${escapedChar(hit[0])}" (${codePointName(hit[0])})`, fix: 'delete it: it is invisible, or would hide or reorder text on the sheets and pages' },
      });
    });

/**
 * What the sheets are laid out for (docs/sheets.md, "Limits every sheet lays out"): every catalogue
 * inside these prints on every paper its sheets are made for; past them `check` says which field to trim.
 */
export const LIMITS = {
  /** Impeller, variant and cruise labels: a table cell, a curve's end label, a ladder row. */
  labelChars: 16,
  /** Boat, engine family and jet names: a sheet title. */
  nameChars: 60,
  impellersPerJet: 24,
  variantsPerFamily: 6,
  cruisePerBoat: 8,
  /** Constant-power lines a wall chart draws (conditions.cruise_powers_kw / _hp). */
  cruisePowersPerChart: 8,
  cautions: 6,
  cautionChars: 300,
  /** site.yaml's contact line, printed under the shop name in every sheet's header. */
  contactLineChars: 120,
  /** site.yaml's data revision, printed in every sheet's footer. */
  dataRevisionChars: 40,
} as const;

const tooLong = (max: number, what: string) => `must be at most ${max} characters (${what})`;

/** A short label printed in table cells and beside curves. */
export const label = () => text().max(LIMITS.labelChars, { error: tooLong(LIMITS.labelChars, 'tables and curve labels print it') });

/** A name printed in sheet titles. */
export const name = () => text().max(LIMITS.nameChars, { error: tooLong(LIMITS.nameChars, 'sheet titles print it') });

/** A list with at most max entries, told in words of what the sheets can show. */
export const atMost = <T extends z.ZodType>(list: z.ZodArray<T>, max: number, why: string) => list.max(max, { error: `must have at most ${max} entries (${why})` });

/** A calendar date written YYYY-MM-DD (checked to exist: no 2026-02-30). */
export const isoDate = () =>
  z
    .string()
    .regex(ISO_DATE_PATTERN, { error: 'must be a date written YYYY-MM-DD, e.g. 2026-05-14' })
    .refine(isRealDate, { error: 'must be a real calendar date (YYYY-MM-DD)' });

function isRealDate(s: string): boolean {
  const d = new Date(`${s}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
}

/** A number > 0. */
export const positive = () => z.number().positive({ error: 'must be a positive number' });

/**
 * A quantity that is > 0 and lies in [min, max]: zero or a negative value is told "must be a positive
 * number" (the first check stops there), a tiny or huge one the range. Every numeric field has a range
 * (docs/data-format.md, "Ranges of every number"), so no value can underflow or overflow the model.
 */
export const positiveBetween = (min: number, max: number, unit = '', positiveError = 'must be a positive number') => {
  const error = `must be between ${min} and ${max}${unit ? ` ${unit}` : ''}`;
  return z.number().positive({ error: positiveError, abort: true }).min(min, { error }).max(max, { error });
};

/** A number in [min, max] with the unit named in the message. */
export const between = (min: number, max: number, unit = '') => {
  const error = `must be between ${min} and ${max}${unit ? ` ${unit}` : ''}`;
  return z.number().min(min, { error }).max(max, { error });
};

/** Ranges shared by several fields (docs/data-format.md, "Ranges of every number"). */
export const RANGES = {
  /** Engine speed, rpm: below any idle, above any marine engine's rev limit (common practice, no source). */
  rpm: [100, 20000],
  /** Power, kW: a fraction of a kW at a low table row up to the largest engines a waterjet is fitted to. */
  powerKw: [0.1, 10000],
  powerHp: [0.1, 13400],
  /** A curve row or known point, in its own unit (power in kW, hp, PS; torque in N·m, lbf·ft). */
  curveValue: [0.1, 100000],
  /** Impeller rating at the reference speed, kW / hp: small jets at a low reference speed to large ones at a high one. */
  ratingKw: [0.01, 10000],
  ratingHp: [0.01, 13400],
  speedKn: [1, 120],
  speedMph: [1, 140],
  speedKmh: [2, 220],
} as const;

/** Engine speed, rpm. */
export const rpm = () => between(RANGES.rpm[0], RANGES.rpm[1], 'rpm');

/** Power in kW or hp (cruise settings, constant-power lines, known points). */
export const powerKw = () => positiveBetween(RANGES.powerKw[0], RANGES.powerKw[1], 'kW');
export const powerHp = () => positiveBetween(RANGES.powerHp[0], RANGES.powerHp[1], 'hp');

/** A ± percentage tolerance, 0–25 %. */
export const tolerancePct = () => between(0, 25, '%');

/** Water density range the model accepts: brackish lakes to dense brine, kg/m³. */
export const waterDensity = () => between(950, 1100, 'kg/m³');

/** fresh, salt, or a measured density. */
export const water = () =>
  z.union([z.enum(['fresh', 'salt']), z.strictObject({ density_kg_m3: waterDensity() })], {
    error: 'must be fresh, salt, or a mapping with density_kg_m3 (950–1100)',
  });

export const driveLine = () =>
  z.strictObject({
    ratio: positiveBetween(0.2, 10, '', 'must be a positive number (engine rpm per impeller rpm; 1 for direct drive)'),
    efficiency: positiveBetween(0.5, 1, '', 'must be greater than 0 and at most 1').default(0.97),
  });

/** A set of unit-named keys of which exactly one (required) or at most one may be given. */
export interface UnitChoice {
  readonly keys: readonly string[];
  readonly required: boolean;
}

/** Meta key carrying the unit choices to the JSON Schema generator, which turns them into oneOf/not. */
export const UNIT_CHOICES_META = 'x-unit-choices';

/**
 * Enforce unit choices on an object schema ("rating_kw or rating_hp, not both").
 * Runs even when other fields failed, so one pass reports everything.
 */
export function unitChoices<T extends z.ZodObject>(schema: T, choices: readonly UnitChoice[]) {
  return schema
    .superRefine(
      (value, ctx) => {
        if (typeof value !== 'object' || value === null) return;
        for (const { keys, required } of choices) {
          const given = keys.filter((k) => (value as Record<string, unknown>)[k] !== undefined);
          if (given.length > 1) {
            ctx.addIssue({ code: 'custom', path: [given[1]], message: `must not be given together with ${given[0]}: give only one of ${keys.join(', ')}` });
          } else if (given.length === 0 && required) {
            ctx.addIssue({ code: 'custom', path: [], message: `must give one of ${keys.join(', ')}`, params: { found: 'none of them' } });
          }
        }
      },
      { when: () => true },
    )
    .meta({ [UNIT_CHOICES_META]: choices.map((c) => ({ keys: [...c.keys], required: c.required })) });
}

/** Air and pressure where a boat runs or a curve was measured. Altitude or pressure, not both. */
const conditionsShape = {
  label: text().optional(),
  altitude_m: between(-500, 6000, 'm').describe('Altitude above sea level, m (pressure from the standard atmosphere)'),
  pressure_kpa: between(40, 110, 'kPa'),
  pressure_hpa: between(400, 1100, 'hPa'),
  pressure_inhg: between(12, 32.5, 'inHg'),
  air_temp_c: between(-40, 60, '°C'),
  air_temp_f: between(-40, 140, '°F'),
  humidity_pct: between(0, 100, '%').describe('Relative humidity, % (default 30)'),
};

export const PRESSURE_KEYS = ['altitude_m', 'pressure_kpa', 'pressure_hpa', 'pressure_inhg'] as const;
export const TEMPERATURE_KEYS = ['air_temp_c', 'air_temp_f'] as const;

export function optionalShape<T extends Record<string, z.ZodType>>(shape: T) {
  return Object.fromEntries(Object.entries(shape).map(([k, v]) => [k, v.optional()])) as { [K in keyof T]: z.ZodOptional<T[K]> };
}

export const conditions = () =>
  unitChoices(z.strictObject(optionalShape(conditionsShape)), [
    { keys: PRESSURE_KEYS, required: false },
    { keys: TEMPERATURE_KEYS, required: false },
  ]);

export type RawConditions = z.infer<ReturnType<typeof conditions>>;
