/**
 * Plain result records shared by the wall-chart and boat analyses: JSON-serialisable (finite numbers
 * and strings only), built from model outputs. docs/results.md documents every field.
 */
import type { ChartConditions, Site, Water } from '../data/types.ts';
import type { DriveLineSpec, EngineCurve, EngineLimits, MatchStatus, OperatingBand, OperatingPoint } from '../model/index.ts';
import { bandVerdict, STATUS_WORDS, worstStatus } from './status.ts';

export interface PointResult {
  readonly speedRpm: number;
  readonly powerKw: number;
  readonly status: MatchStatus;
  readonly statusText: string;
  /** > 0 only when the engine rides the limiter: power left unused there, kW. */
  readonly unusedPowerKw: number;
}

export interface BandResult {
  readonly nominal: PointResult;
  /** Heavy corner: impeller +tol, engine −tol, densest water. */
  readonly low: PointResult;
  /** Light corner: impeller −tol, engine +tol, lightest water. */
  readonly high: PointResult;
  /** Most serious status among the three. */
  readonly worstStatus: MatchStatus;
  readonly verdict: string;
}

export interface ConditionsResult {
  readonly driveRatio: number;
  readonly driveEfficiency: number;
  readonly waterKind: string;
  readonly waterDensityKgM3: number;
  readonly siteLabel: string;
  readonly pressureKpa: number;
  readonly airTempC: number;
  readonly relativeHumidityPct: number;
  /** Present when the site was given by altitude. */
  readonly altitudeM?: number;
}

export interface CurveKeyNumbers {
  readonly peakPowerKw: number;
  readonly peakPowerRpm: number;
  /** Where the curve is defined, rpm. */
  readonly fromRpm: number;
  readonly toRpm: number;
  /** Product of condition factor, site-air correction and extra factor applied to the published curve. */
  readonly appliedFactor: number;
}

export interface LimitsResult {
  readonly idleRpm: number;
  readonly windowLowRpm: number;
  readonly windowHighRpm: number;
  readonly maxRpm: number;
}

/** A model operating point as a plain record. */
export function pointResult(p: OperatingPoint): PointResult {
  return { speedRpm: p.speedRpm, powerKw: p.powerKw, status: p.status, statusText: STATUS_WORDS[p.status], unusedPowerKw: p.unusedPowerKw };
}

/** A model band as a plain record with its verdict. */
export function bandResult(b: OperatingBand): BandResult {
  return { nominal: pointResult(b.nominal), low: pointResult(b.lowRpm), high: pointResult(b.highRpm), worstStatus: worstStatus(b), verdict: bandVerdict(b) };
}

/** Conditions as a plain record. */
export function conditionsResult(args: { driveLine: DriveLineSpec; water: Water; site: Site }): ConditionsResult {
  const { driveLine, water, site } = args;
  return {
    driveRatio: driveLine.ratio,
    driveEfficiency: driveLine.efficiency,
    waterKind: water.kind,
    waterDensityKgM3: water.densityKgM3,
    siteLabel: site.label,
    pressureKpa: site.ambient.pressureKpa,
    airTempC: site.ambient.airTempC,
    relativeHumidityPct: site.ambient.relativeHumidityPct,
    ...(site.altitudeM !== undefined ? { altitudeM: site.altitudeM } : {}),
  };
}

/** Conditions of a wall chart as a plain record. */
export function chartConditionsResult(c: ChartConditions): ConditionsResult {
  return conditionsResult(c);
}

/**
 * Peak of a curve. Every Hermite piece of the model's curve is monotone between its knots, so the
 * maximum sits at a knot: the largest piece end value is exact.
 */
export function curveKeyNumbers(curve: EngineCurve): CurveKeyNumbers {
  let peakPowerKw = -Infinity;
  let peakPowerRpm = curve.minRpm;
  for (const p of curve.pieces) {
    if (p.y0 > peakPowerKw) [peakPowerKw, peakPowerRpm] = [p.y0, p.x0];
    if (p.y1 > peakPowerKw) [peakPowerKw, peakPowerRpm] = [p.y1, p.x1];
  }
  if (curve.pieces.length === 0) {
    peakPowerKw = curve.powerKwUnchecked(curve.minRpm);
    peakPowerRpm = curve.minRpm;
  }
  return { peakPowerKw, peakPowerRpm, fromRpm: curve.minRpm, toRpm: curve.maxRpm, appliedFactor: curve.appliedFactor };
}

/** Limits as a plain record. */
export function limitsResult(l: EngineLimits): LimitsResult {
  return { idleRpm: l.idleRpm, windowLowRpm: l.windowLowRpm, windowHighRpm: l.windowHighRpm, maxRpm: l.maxRpm };
}
