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
          power: z.enum(['kW', 'hp'], { error: 'must be kW or hp' }).default('kW'),
          speed: z.enum(['kn', 'mph', 'km/h'], { error: 'must be kn, mph or km/h' }).default('kn'),
        })
        .default({ power: 'kW', speed: 'kn' }),
      data_revision: text().max(LIMITS.dataRevisionChars, { error: `must be at most ${LIMITS.dataRevisionChars} characters (every sheet's footer prints it)` }),
      issue_date: isoDate(),
      cautions: cautionList()
        .optional()
        .describe("Extra cautions, printed after the built-in ones (sea trial, maker's maximum rpm, qualified marine technician), which always print; one sentence each"),
    })
    .meta({ title: 'matchbook site settings', description: 'Shop name, units and data revision: data/site.yaml' });

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
