/**
 * Results of one engine-family wall chart: every variant against every impeller of one jet unit under
 * one set of chart conditions, plus the constant-power cruise crossings. Pure composition of model calls.
 */
import type { ChartConditions, EngineFamily, EngineVariant, JetUnit } from '../data/types.ts';
import { cruiseRpmAtPower, engineCurve, operatingBand, type ImpellerSpec, type Installation } from '../model/index.ts';
import {
  bandResult,
  chartConditionsResult,
  curveKeyNumbers,
  limitsResult,
  type BandResult,
  type ConditionsResult,
  type CurveKeyNumbers,
  type LimitsResult,
} from './results.ts';

export interface WallChartVariant {
  readonly variantId: string;
  readonly engineId: string;
  readonly label: string;
  readonly limits: LimitsResult;
  /** The curve as published (with the engine's condition factor), at its reference air. */
  readonly reference: CurveKeyNumbers;
  /** The curve corrected to the chart's site air. */
  readonly site: CurveKeyNumbers;
  /** "yes" when the site correction moves the curve by more than 0.1 %. */
  readonly siteDiffers: 'yes' | 'no';
}

export interface WallChartImpeller {
  readonly impellerId: string;
  readonly label: string;
  readonly ratingKw: number;
  readonly ratingLowKw: number;
  readonly ratingHighKw: number;
}

export interface WallChartPairing {
  readonly variantId: string;
  readonly impellerId: string;
  readonly band: BandResult;
}

export interface CruiseCrossing {
  readonly impellerId: string;
  readonly speedRpm: number;
  /** Variants whose nominal WOT point is below this crossing (they cannot hold this power). */
  readonly beyondWotFor: readonly string[];
}

export interface WallChartResult {
  readonly kind: 'wallChart';
  readonly engineFamilyId: string;
  readonly engineFamilyLabel: string;
  readonly jetId: string;
  readonly jetLabel: string;
  readonly conditions: ConditionsResult;
  readonly exponent: number;
  readonly tolerancePct: number;
  readonly variants: readonly WallChartVariant[];
  readonly impellers: readonly WallChartImpeller[];
  readonly pairings: readonly WallChartPairing[];
  readonly cruise: readonly { readonly powerKw: number; readonly crossings: readonly CruiseCrossing[] }[];
}

/** The installation a wall chart solves for one variant and impeller under its conditions. */
export function chartInstallation(args: { variant: EngineVariant; jet: JetUnit; impeller: ImpellerSpec; conditions: ChartConditions }): Installation {
  const { conditions } = args;
  return {
    engine: args.variant,
    ambient: conditions.site.ambient,
    family: args.jet.family,
    impeller: args.impeller,
    driveLine: conditions.driveLine,
    waterDensityKgM3: conditions.water.densityKgM3,
  };
}

/** Analyses one engine family against one jet unit (powers kW, speeds rpm). */
export function analyseWallChart(args: { family: EngineFamily; jet: JetUnit; conditions: ChartConditions }): WallChartResult {
  const { family, jet, conditions } = args;
  const tol = jet.family.tolerancePct / 100;
  const variants = family.variants.map((v): WallChartVariant => {
    const reference = curveKeyNumbers(engineCurve(v));
    const site = curveKeyNumbers(engineCurve(v, { ambient: conditions.site.ambient }));
    return {
      variantId: v.variantId,
      engineId: v.id,
      label: v.label,
      limits: limitsResult(v.limits),
      reference,
      site,
      siteDiffers: Math.abs(site.appliedFactor / reference.appliedFactor - 1) > 1e-3 ? 'yes' : 'no',
    };
  });
  const impellers = jet.impellers.map((i) => ({ impellerId: i.id, label: i.label, ratingKw: i.ratingKw, ratingLowKw: i.ratingKw * (1 - tol), ratingHighKw: i.ratingKw * (1 + tol) }));
  const pairings = family.variants.flatMap((variant) =>
    jet.impellers.map((impeller) => ({
      variantId: variant.variantId,
      impellerId: impeller.id,
      band: bandResult(operatingBand(chartInstallation({ variant, jet, impeller, conditions }))),
    })),
  );
  const cruise = conditions.cruisePowersKw.map((powerKw) => ({
    powerKw,
    crossings: cruiseRpmAtPower({ family: jet.family, impellers: jet.impellers, driveLine: conditions.driveLine, waterDensityKgM3: conditions.water.densityKgM3, powerKw }).map((c) => ({
      impellerId: c.impellerId,
      speedRpm: c.speedRpm,
      beyondWotFor: pairings.filter((p) => p.impellerId === c.impellerId && p.band.nominal.speedRpm < c.speedRpm).map((p) => p.variantId),
    })),
  }));
  return {
    kind: 'wallChart',
    engineFamilyId: family.id,
    engineFamilyLabel: family.label,
    jetId: jet.id,
    jetLabel: jet.label,
    conditions: chartConditionsResult(conditions),
    exponent: jet.family.exponent,
    tolerancePct: jet.family.tolerancePct,
    variants,
    impellers,
    pairings,
    cruise,
  };
}
