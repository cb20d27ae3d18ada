/** Public API of the physics model: pure functions, powers in kW, speeds in rpm. */
export type * from './types.ts';
export { ModelInputError } from './errors.ts';
export { engineCurve, type CurveKind, type CurveValue, type EngineCurve } from './engineCurve.ts';
export { hermiteSlope, hermiteValue, type HermitePiece } from './monotoneCubic.ts';
export {
  ambientPowerFactor,
  compressionIgnitionCorrection,
  correctionFactor,
  DEFAULT_ENGINE_FACTOR_FM,
  defaultCorrection,
  isoSparkIgnitionCorrection,
  dryAirPressureKpa,
  isaPressureKpa,
  sparkIgnitionCorrection,
  waterVapourPressureKpa,
} from './ambient.ts';
export { FRESH_WATER_KG_M3, SALT_WATER_KG_M3 } from './water.ts';
export { absorbedPowerKw, makeAbsorber, speedAtAbsorbedPowerRpm, type Absorber } from './absorption.ts';
export { operatingPoint, REASONS, type MatchStatus, type OperatingPoint } from './operatingPoint.ts';
export { installationAbsorber, solveInstallation, type Installation } from './installation.ts';
export { operatingBand, type OperatingBand } from './toleranceBand.ts';
export { cruiseAtRpm, cruiseRpmAtPower } from './cruise.ts';
export { swapFromKnownPoint } from './swap.ts';
export { powerChangeForRpm, upgradeOperatingPoint } from './upgrade.ts';
export { ratingFromPower, trialEffectiveRating, type TrialInput, type TrialRating, type TrialRatingStatus } from './trialRating.ts';
export { fitLogLinear, type LogFit, type LogPoint } from './logFit.ts';
export { calibrate, calibratedInstallation, MAX_EXPONENT_SE, MIN_RPM_SPAN, type Calibration, type CalibrationMode, type TrialResidual } from './calibration.ts';
export {
  crouchConstantFromSpeed,
  crouchConstantsFromTrials,
  crouchSpeedKn,
  hullConstant,
  loadedDisplacementKg,
  shaftPowerForSpeedKw,
  TYPICAL_CROUCH_CONSTANTS,
  type CrouchHullType,
  type HullConstant,
  type HullConstantSource,
} from './speed.ts';
export { PLANING_FROUDE_VOLUME, planingSpeedKn, volumeFroudeNumber } from './planing.ts';
export { DEFAULT_RESERVE_FRACTION, fuelFlow, fuelRange, TYPICAL_BSFC_G_PER_KWH, TYPICAL_FUEL_KG_PER_L, type FuelFlow, type FuelRange } from './fuel.ts';
export {
  bestImpeller,
  DEFAULT_CHANGES_PCT,
  impellerTopSpeeds,
  powerChangeForSpeedGain,
  upgradeWhatIf,
  whatIfPoint,
  type SpeedBasis,
  type SpeedGainNeed,
  type UpgradeStep,
  type WhatIfPoint,
} from './upgradeWhatIf.ts';
export { BASELINE_TRIALS, DRIFT_K, READING_FLOOR, ratingTrend, type Baseline, type RatingTrend, type TrendInput, type TrendPoint, type TrendVerdict } from './ratingTrend.ts';
