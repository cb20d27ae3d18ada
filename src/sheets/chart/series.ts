/**
 * Chart series built from the data through the model: one absorption series per impeller (styled by its
 * place in the jet's list, so an impeller looks the same on every sheet) and one engine series per variant.
 */
import type { EngineFamily, EngineVariant, JetUnit } from '../../data/types.ts';
import { absorptionLaw, engineCurveAt, type Ambient, type DriveLineSpec } from '../../analysis/index.ts';
import { seriesStyle, STROKE } from '../kit/style.ts';
import type { EngineSeries, ImpellerSeries } from './seriesTypes.ts';

/** Absorption series of every impeller of a jet, referred to the engine shaft. */
export function impellerSeries(args: { jet: JetUnit; driveLine: DriveLineSpec; waterDensityKgM3: number }): ImpellerSeries[] {
  return args.jet.impellers.map((impeller, i) => {
    const law = absorptionLaw({ family: args.jet.family, impeller, driveLine: args.driveLine, waterDensityKgM3: args.waterDensityKgM3 });
    return { id: impeller.id, label: impeller.label, law, tolerance: args.jet.family.tolerancePct / 100, style: seriesStyle(i) };
  });
}

/** Variant dash patterns (mm): solid, long dash, dash-dot. */
const ENGINE_DASHES: readonly (readonly number[])[] = [[], [6, 1.6], [6, 1.4, 1.2, 1.4]];

/** The words that tell variants of a family apart: each label without the words all labels share at the start. */
export function variantShortLabels(variants: readonly EngineVariant[]): string[] {
  const words = variants.map((v) => v.label.split(/\s+/));
  if (variants.length < 2) return variants.map((v) => v.label);
  let shared = 0;
  while (words.every((w) => w.length > shared + 1 && w[shared] === words[0][shared])) shared += 1;
  return words.map((w) => w.slice(shared).join(' '));
}

/** Engine series of a family's variants: site-corrected curve, plus the published one where they differ. */
export function engineSeries(args: { family: EngineFamily; ambient: Ambient }): EngineSeries[] {
  const shorts = variantShortLabels(args.family.variants);
  return args.family.variants.map((v, i) => {
    const site = engineCurveAt(v, { ambient: args.ambient });
    const reference = engineCurveAt(v);
    const differs = Math.abs(site.appliedFactor / reference.appliedFactor - 1) > 1e-3;
    return {
      id: v.variantId,
      label: differs ? `${shorts[i]} at site` : shorts[i],
      site,
      ...(differs ? { reference, referenceLabel: `${shorts[i]} as published` } : {}),
      widthMm: STROKE.engine,
      dashMm: ENGINE_DASHES[i % ENGINE_DASHES.length],
    };
  });
}
