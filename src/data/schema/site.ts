/** Schema of data/site.yaml: the shop's name, units preference and data revision. */
import * as z from 'zod';
import { atMost, isoDate, LIMITS, text } from './common.ts';

export const siteFile = () =>
  z
    .strictObject({
      shop_name: text().max(LIMITS.nameChars, { error: `must be at most ${LIMITS.nameChars} characters (every sheet's header prints it)` }),
      contact_line: text().max(LIMITS.contactLineChars, { error: `must be at most ${LIMITS.contactLineChars} characters (every sheet's header prints it)` }),
      units: z
        .strictObject({
          power: powerUnit().default('kW'),
          speed: speedUnit().default('kn'),
          speed_also: speedAlso().optional(),
          fuel: fuelUnit().default('L/h'),
        })
        .default({ power: 'kW', speed: 'kn', fuel: 'L/h' }),
      data_revision: text().max(LIMITS.dataRevisionChars, { error: `must be at most ${LIMITS.dataRevisionChars} characters (every sheet's footer prints it)` }),
      issue_date: isoDate(),
      cautions: cautionList()
        .optional()
        .describe("Extra cautions, printed after the built-in ones (sea trial, maker's maximum rpm, qualified marine technician), which always print; one sentence each"),
    })
    .meta({ title: 'matchbook site settings', description: 'Shop name, units and data revision: data/site.yaml' });

export const powerUnit = () => z.enum(['kW', 'hp'], { error: 'must be kW or hp' });
export const speedUnit = () => z.enum(['kn', 'mph', 'km/h'], { error: 'must be kn, mph or km/h' });
/** A second speed unit printed in brackets, or none. */
export const speedAlso = () => z.enum(['kn', 'mph', 'km/h', 'none'], { error: 'must be kn, mph, km/h or none' });
export const fuelUnit = () => z.enum(['L/h', 'US gal/h', 'imp gal/h'], { error: 'must be L/h, US gal/h or imp gal/h' });

/** Units a book or one of its sheets prints in; each one left out is the site's (or the book's). */
export const unitsOverride = () =>
  z.strictObject({ power: powerUnit().optional(), speed: speedUnit().optional(), speed_also: speedAlso().optional(), fuel: fuelUnit().optional() });

/** A shop's own cautions (site.yaml or a book): sentences of up to LIMITS.cautionChars, at most LIMITS.cautions. */
export const cautionList = () =>
  atMost(
    z
      .array(text().max(LIMITS.cautionChars, { error: `must be at most ${LIMITS.cautionChars} characters (every sheet prints every caution); shorten it or split it in two` }), { error: 'must be a list of sentences' })
      .min(1, { error: 'must list at least one caution, or be left out' }),
    LIMITS.cautions,
    'every sheet prints every caution after the built-in ones; merge or drop some',
  );

export type RawSiteFile = z.infer<ReturnType<typeof siteFile>>;
