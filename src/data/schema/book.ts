/** Schema of data/books/<id>.yaml: a chart book for one audience, its sheets and paper. */
import * as z from 'zod';
import { atMost, conditions, driveLine, LIMITS, powerHp, powerKw, slug, text, unitChoices, water } from './common.ts';
import { cautionList, unitsOverride } from './site.ts';

export const PAPER_SIZES = ['A3', 'A4', 'A5', 'A6', 'Letter', 'Legal', 'Tabloid', '4x6'] as const;

const paperFields = {
  size: z.enum(PAPER_SIZES, { error: `must be one of ${PAPER_SIZES.join(', ')}` }),
  orientation: z.enum(['portrait', 'landscape'], { error: 'must be portrait or landscape' }).default('portrait'),
};
const bleed = () => z.union([z.literal(0), z.literal(3)], { error: 'must be 0 or 3 (mm)' });

/** Crop marks outside the bleed; without it, a sheet gets them exactly when it has bleed. */
const cropMarks = () => z.boolean({ error: 'must be true or false (without it, crop marks come with bleed)' }).optional();

export const paper = () => z.strictObject({ ...paperFields, bleed_mm: bleed().default(0), crop_marks: cropMarks() });

/** A sheet's own paper: without bleed_mm or crop_marks it keeps the book's (a print shop trims the whole book alike). */
const sheetPaper = () => z.strictObject({ ...paperFields, bleed_mm: bleed().optional(), crop_marks: cropMarks() });

const chartConditions = () =>
  unitChoices(
    z.strictObject({
      drive_line: driveLine().optional(),
      water: water().optional(),
      site: conditions().optional(),
      cruise_powers_kw: atMost(z.array(powerKw(), { error: 'must be a list of powers in kW' }), LIMITS.cruisePowersPerChart, 'a wall chart draws each as a labelled line').optional(),
      cruise_powers_hp: atMost(z.array(powerHp(), { error: 'must be a list of powers in hp' }), LIMITS.cruisePowersPerChart, 'a wall chart draws each as a labelled line').optional(),
    }),
    [{ keys: ['cruise_powers_kw', 'cruise_powers_hp'], required: false }],
  );

const boatSheet = <K extends string>(kind: K) => z.strictObject({ kind: z.literal(kind), boat: slug(), paper: sheetPaper().optional(), units: unitsOverride().optional() });

export const SHEET_KINDS = ['wallChart', 'specSheet', 'consoleCard', 'upgradeSheet', 'repowerSheet'] as const;

const sheet = () =>
  z.discriminatedUnion(
    'kind',
    [
      z.strictObject({ kind: z.literal('wallChart'), engine: slug(), jet: slug(), conditions: chartConditions().optional(), paper: sheetPaper().optional(), units: unitsOverride().optional() }),
      boatSheet('specSheet'),
      boatSheet('consoleCard'),
      boatSheet('upgradeSheet'),
      boatSheet('repowerSheet'),
    ],
    { error: `must be a sheet whose kind is one of ${SHEET_KINDS.join(', ')}` },
  );

export const bookFile = () =>
  z
    .strictObject({
      id: slug(),
      title: text(),
      audience: z.enum(['shop', 'dealer', 'owner'], { error: 'must be shop, dealer or owner' }),
      paper: paper(),
      /** Units the book's sheets print in, each one left out the site's. */
      units: unitsOverride().optional(),
      /** A book prints on one paper; a sheet's own paper that differs is refused unless this is true. */
      mixed_paper: z.boolean({ error: 'must be true or false' }).default(false),
      sheets: z.array(sheet(), { error: 'must be a list of sheets' }).min(1, { error: 'must list at least one sheet' }),
      cautions: cautionList()
        .optional()
        .describe("Cautions of this book, printed on its sheets after the built-in ones and site.yaml's (together at most 6); one sentence each"),
    })
    .meta({ title: 'matchbook chart book', description: 'A chart book for one audience: data/books/<id>.yaml' });

export type RawBookFile = z.infer<ReturnType<typeof bookFile>>;
export type RawPaper = z.infer<ReturnType<typeof paper>>;
export type RawSheet = RawBookFile['sheets'][number];
