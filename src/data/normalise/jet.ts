/** Jet unit file → JetUnit: ratings in kW at the family's reference speed and water density. */
import { hpToKw } from '../../units.ts';
import type { RawJetFile } from '../schema/jet.ts';
import type { JetUnit } from '../types.ts';
import type { YamlSource } from '../yamlSource.ts';
import { toWater } from './conditions.ts';
import { duplicateIds, type Normalised } from './shared.ts';

/** Normalise a validated jet file; duplicate impeller ids are errors. */
export function normaliseJet(source: YamlSource, raw: RawJetFile): Normalised<JetUnit> {
  const errors = duplicateIds(source, raw.impellers, ['impellers']);
  if (errors.length > 0) return { ok: false, errors, warnings: [] };
  const jet: JetUnit = {
    id: raw.id,
    label: raw.label,
    maker: raw.maker,
    family: {
      referenceSpeedRpm: raw.reference_speed_rpm,
      exponent: raw.exponent,
      tolerancePct: raw.tolerance_pct,
      referenceDensityKgM3: toWater(raw.reference_water).densityKgM3,
    },
    impellers: raw.impellers.map((imp) => ({
      id: imp.id,
      label: imp.label,
      ratingKw: imp.rating_kw ?? hpToKw(imp.rating_hp ?? Number.NaN),
    })),
    ...(raw.notes !== undefined ? { notes: raw.notes } : {}),
    source: { file: source.file },
  };
  return { ok: true, value: jet, warnings: [] };
}
