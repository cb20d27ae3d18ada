/** Analyses: plain, JSON-serialisable results composed from model calls over the validated project. */
export { analyseWallChart, chartInstallation, type WallChartResult, type WallChartPairing, type WallChartVariant, type WallChartImpeller, type CruiseCrossing } from './wallChart.ts';
export { analyseBoat, boatInstallation, RPM_GAINS, UPGRADE_STEPS_PCT, windowPlace, type BoatResult, type CalibratedFigures, type CruiseRow, type AlternativeRow, type UpgradeRow, type RpmGainRow, type WindowPlace } from './boat.ts';
export { analyseRepower, repowerBoat, type RepowerOptionResult, type RepowerResult } from './repower.ts';
export { calibratedBand, calibratedBandNote, FIT_SE_MULTIPLE, READING_SCATTER_PCT } from './boatCalibratedBand.ts';
export { bookSheetRequest, conditionsDifferences, defaultWallCharts, defaultChartConditions, pairingBoats, DEFAULT_SITE, DEFAULT_CRUISE_FRACTIONS, type ConditionsDifference } from './defaults.ts';
export { STATUS_WORDS, bandVerdict, isWarning, toleranceNote, worstStatus } from './status.ts';
export type { PointResult, BandResult, ConditionsResult, CurveKeyNumbers, LimitsResult } from './results.ts';
export { boatTrend, TREND_RULE, WEAR_ACTION, type ImpellerTrend, type TrendPointResult, type TrendResult, type WearFlag } from './boatTrend.ts';
export { boatCalibration, boatTrials, calibratedBoatInstallation, calibrationResult, type CalibrationResult, type TrialRow } from './boatCalibration.ts';
export {
  boatEstimates,
  FUEL_NOTE,
  SPEED_GAINS_PCT,
  SPEED_NOTE,
  type BoatEstimates,
  type CruiseEstimate,
  type HullResult,
  type SpeedGainRow,
  type TopSpeedRow,
  type UpgradeEstimate,
} from './boatEstimates.ts';
export { absorptionLaw, engineCurveAt, pieceBetween, type AbsorptionLaw, type EngineCurve, type HermitePiece } from './chartCurves.ts';
export type { MatchStatus, Ambient, DriveLineSpec } from '../model/index.ts';
