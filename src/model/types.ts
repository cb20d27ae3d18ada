/**
 * Input types of the model layer. Every quantity carries its unit in its name:
 * powerKw (kilowatt), speedRpm (rev/min), densityKgM3, pressureKpa, airTempC, massKg, speedKn (knots).
 * The data layer (src/data) produces these, unit-normalised; the model never reads files.
 */

/** One point of a full-throttle curve: engine crankshaft speed and brake power. */
export interface CurvePoint {
  readonly speedRpm: number;
  readonly powerKw: number;
}

export type Fuel = 'petrol' | 'diesel';
export type Aspiration = 'natural' | 'turbocharged';

/** Air at the engine intake. Total barometric pressure; relative humidity 0–100 %. */
export interface Ambient {
  readonly pressureKpa: number;
  readonly airTempC: number;
  readonly relativeHumidityPct: number;
}

/**
 * The power-correction standard an engine's curve is corrected with: SAE J1349 (AUG2004, spark ignition),
 * ISO 1585 spark ignition, or ISO 1585 / ISO 15550 compression ignition with its engine factor fm (0.3–1.2).
 */
export type CorrectionStandard = 'sae-j1349' | 'iso-1585-si' | 'iso-1585-ci';

export interface PowerCorrection {
  readonly standard: CorrectionStandard;
  /** Engine factor fm of the compression-ignition formula (only for iso-1585-ci). */
  readonly engineFactorFm?: number;
}

/** Speed limits the engine maker states. idle < windowLow <= windowHigh <= max. */
export interface EngineLimits {
  readonly idleRpm: number;
  readonly windowLowRpm: number;
  readonly windowHighRpm: number;
  readonly maxRpm: number;
}

/** Where the full-throttle power comes from: a published table, or one known point (constant torque). */
export type CurveSource =
  | {
      readonly kind: 'table';
      readonly points: readonly CurvePoint[];
      /** Air the rows were measured in (a test-bench run); the curve is corrected from it to referenceAmbient. */
      readonly measuredIn?: Ambient;
    }
  | { readonly kind: 'knownPoint'; readonly point: CurvePoint };

/** One engine as the model needs it (one tune of a family). */
export interface EngineSpec {
  /** Unique id, "family/variant". */
  readonly id: string;
  readonly label: string;
  readonly fuel: Fuel;
  readonly aspiration: Aspiration;
  readonly curve: CurveSource;
  readonly limits: EngineLimits;
  /** ± % spread of the engine's real power about its published curve. */
  readonly powerTolerancePct: number;
  /** Conditions the published curve is corrected to. */
  readonly referenceAmbient: Ambient;
  /** Correction standard for air conditions; absent: SAE J1349 for petrol, ISO 1585 CI with fm = 1.2 for diesel. */
  readonly correction?: PowerCorrection;
  /** Multiplies the whole curve (1 = as published; 0.9 = a worn engine). */
  readonly conditionFactor: number;
  /** Brake specific fuel consumption, g/kWh, when the maker gives it. */
  readonly bsfcGPerKwh?: number;
}

/** The impeller family of one jet unit (housing): shared by all its impellers. */
export interface ImpellerFamilySpec {
  /** Impeller speed at which ratings are stated (default 1000 rpm). */
  readonly referenceSpeedRpm: number;
  /** Absorption exponent k in P ∝ n^k (ideal 3; allowed 2–4). */
  readonly exponent: number;
  /** ± % manufacturing tolerance on every rating. */
  readonly tolerancePct: number;
  /** Water density the ratings are stated for. */
  readonly referenceDensityKgM3: number;
}

/** One impeller: the shaft power it absorbs at the family's reference speed and density. */
export interface ImpellerSpec {
  readonly id: string;
  readonly label: string;
  readonly ratingKw: number;
}

/** Between engine and impeller. ratio = engine rpm / impeller rpm; efficiency in (0, 1]. */
export interface DriveLineSpec {
  readonly ratio: number;
  readonly efficiency: number;
}
