/** Schema of data/jets/<id>.yaml: a jet unit (housing) and its impeller family. */
import * as z from 'zod';
import { atMost, between, label, LIMITS, name, positiveBetween, RANGES, slug, text, tolerancePct, unitChoices, water } from './common.ts';

export const impeller = () =>
  unitChoices(
    z.strictObject({
      id: slug(),
      label: label(),
      /** Shaft power absorbed at the family's reference speed and water density. */
      rating_kw: positiveBetween(RANGES.ratingKw[0], RANGES.ratingKw[1], 'kW').describe('Power absorbed at the reference speed and water, kW').optional(),
      rating_hp: positiveBetween(RANGES.ratingHp[0], RANGES.ratingHp[1], 'hp').describe('Power absorbed at the reference speed and water, hp (550 ft·lbf/s)').optional(),
      notes: text().optional(),
    }),
    [{ keys: ['rating_kw', 'rating_hp'], required: true }],
  );

export const jetFile = () =>
  z
    .strictObject({
      id: slug(),
      label: name(),
      maker: name(),
      notes: text().optional(),
      /** Impeller speed at which the ratings are stated. */
      reference_speed_rpm: between(100, 10000, 'rpm').describe('Impeller speed at which ratings are stated, rpm').default(1000),
      /** k in P ∝ n^k: 3 is the ideal cube law. */
      exponent: between(2, 4).describe('Absorption exponent k in P ∝ n^k (3 = cube law)').default(3),
      tolerance_pct: tolerancePct().describe('± % manufacturing tolerance on every rating').default(5),
      reference_water: water().default('fresh'),
      impellers: atMost(
        z.array(impeller(), { error: 'must be a list of impellers, each with id, label and rating_kw or rating_hp' }).min(1, { error: 'must list at least one impeller' }),
        LIMITS.impellersPerJet,
        'a wall chart gives each impeller a row; put further impellers in a second jet file',
      ),
    })
    .meta({ title: 'matchbook jet unit', description: 'A jet unit with its impeller family: data/jets/<id>.yaml' });

export type RawJetFile = z.infer<ReturnType<typeof jetFile>>;
