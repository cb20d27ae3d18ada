/**
 * The full-throttle power curve of one engine as the solvers and charts use it.
 * A table becomes a monotone cubic through its rows (see monotoneCubic.ts); a known point becomes
 * constant torque through that point (P = P0 · n / n0) between idle and maximum speed.
 * The curve never extrapolates: outside its rows powerAt() answers with a status, not a number.
 */
import { ModelInputError } from './errors.ts';
import { ambientPowerFactor } from './ambient.ts';
import { hermiteMaxSlope, hermiteValue, monotonePieces, type HermitePiece } from './monotoneCubic.ts';
import type { Ambient, EngineSpec } from './types.ts';

export type CurveValue =
  | { status: 'ok'; powerKw: number }
  | { status: 'belowRange' | 'aboveRange'; nearestRpm: number };

/** table: two or more rows; singlePoint: a table of one row (defined at that speed only); constantTorque: a known point. */
export type CurveKind = 'table' | 'singlePoint' | 'constantTorque';

export interface EngineCurve {
  readonly minRpm: number;
  readonly maxRpm: number;
  powerAt(speedRpm: number): CurveValue;
  /** Fast path for solvers and drawing; caller guarantees minRpm <= speedRpm <= maxRpm. */
  powerKwUnchecked(speedRpm: number): number;
  /** Exact cubic Hermite pieces (rpm, kW) for drawing: on [x0,x1] with values y0,y1 and slopes m0,m1. Each piece is monotone. */
  readonly pieces: readonly HermitePiece[];
  readonly kind: CurveKind;
  /** Product of condition factor, ambient factor and extra power factor applied to the published values. */
  readonly appliedFactor: number;
  /** Solver shortcut per piece: ln of its lowest power (kW) and ln of its end speed (rpm). */
  readonly screen: PieceScreen;
}

/**
 * A piece holds surplus everywhere when its lowest power exceeds what the impeller takes at its end,
 * min(y0, y1) > c·x1^k, i.e. ln min(y0, y1) − k·ln x1 > ln c: one multiply-add per piece, any k.
 * For the usual k = 3 the running minimum of the left side is stored too; it only falls, so the first
 * piece that can hold a crossing is found by binary search.
 */
export interface PieceScreen {
  readonly lnFloorKw: Float64Array;
  readonly lnEndRpm: Float64Array;
  /** min over pieces 0..i of lnFloorKw − 3·lnEndRpm. */
  readonly runningMinCube: Float64Array;
  /** Steepest slope of each whole piece, kW/rpm. */
  readonly maxSlopeKwPerRpm: Float64Array;
}

function screenOf(pieces: readonly HermitePiece[]): PieceScreen {
  const n = pieces.length;
  const lnFloorKw = new Float64Array(n);
  const lnEndRpm = new Float64Array(n);
  const runningMinCube = new Float64Array(n);
  const maxSlopeKwPerRpm = new Float64Array(n);
  let least = Number.POSITIVE_INFINITY;
  pieces.forEach((p, i) => {
    lnFloorKw[i] = Math.log(Math.min(p.y0, p.y1));
    lnEndRpm[i] = Math.log(p.x1);
    least = Math.min(least, lnFloorKw[i] - 3 * lnEndRpm[i]);
    runningMinCube[i] = least;
    maxSlopeKwPerRpm[i] = hermiteMaxSlope(p, p.x0, p.x1);
  });
  return Object.freeze({ lnFloorKw, lnEndRpm, runningMinCube, maxSlopeKwPerRpm });
}

/** Full-throttle curve of one engine, scaled by condition factor, ambient correction and an extra factor. */
export function engineCurve(engine: EngineSpec, opts: { ambient?: Ambient; powerFactor?: number } = {}): EngineCurve {
  const ambientFactor = opts.ambient
    ? ambientPowerFactor({ fuel: engine.fuel, aspiration: engine.aspiration, site: opts.ambient, reference: engine.referenceAmbient, correction: engine.correction })
    : 1;
  // Rows measured in other air (a test bench) are first corrected to the engine's reference air.
  const measuredIn = engine.curve.kind === 'table' ? engine.curve.measuredIn : undefined;
  const benchFactor = measuredIn
    ? ambientPowerFactor({ fuel: engine.fuel, aspiration: engine.aspiration, site: engine.referenceAmbient, reference: measuredIn, correction: engine.correction })
    : 1;
  const factor = engine.conditionFactor * ambientFactor * benchFactor * (opts.powerFactor ?? 1);
  if (!(factor > 0 && Number.isFinite(factor))) {
    throw new ModelInputError(`engine ${engine.id}: power factor must be a positive number, found ${factor}; check condition_factor and the site air`);
  }
  const source = engine.curve;
  if (source.kind === 'knownPoint') {
    const { speedRpm, powerKw } = source.point;
    const lo = engine.limits.idleRpm;
    const hi = engine.limits.maxRpm;
    if (!(speedRpm > 0 && powerKw > 0 && Number.isFinite(speedRpm) && Number.isFinite(powerKw))) {
      throw new ModelInputError(`engine ${engine.id}: the known point needs rpm > 0 and power > 0, found ${speedRpm} rpm, ${powerKw} kW`);
    }
    if (!(lo > 0 && hi > lo)) {
      throw new ModelInputError(`engine ${engine.id}: idle speed must be above 0 and below the maximum speed, found idle ${lo} rpm, max ${hi} rpm`);
    }
    const slope = (powerKw * factor) / speedRpm;
    const piece = Object.freeze({ x0: lo, x1: hi, y0: slope * lo, y1: slope * hi, m0: slope, m1: slope });
    return fromPieces([piece], 'constantTorque', factor);
  }
  const xs = source.points.map((p) => p.speedRpm);
  const ys = source.points.map((p) => p.powerKw * factor);
  checkTable(engine.id, xs, ys);
  if (xs.length === 1) return singlePoint(xs[0], ys[0], factor);
  return fromPieces(monotonePieces(xs, ys), 'table', factor);
}

function checkTable(engineId: string, xs: readonly number[], ys: readonly number[]): void {
  if (xs.length === 0) throw new ModelInputError(`engine ${engineId}: the power table has no rows; give at least two (rpm, power) rows`);
  for (let i = 0; i < xs.length; i++) {
    if (!(Number.isFinite(xs[i]) && xs[i] > 0 && Number.isFinite(ys[i]) && ys[i] >= 0)) {
      throw new ModelInputError(`engine ${engineId}: table row ${i + 1} must have rpm > 0 and power >= 0, found ${xs[i]} rpm, ${ys[i]} kW`);
    }
    if (i > 0 && !(xs[i] > xs[i - 1])) {
      throw new ModelInputError(
        `engine ${engineId}: table speeds must increase row by row, found ${xs[i]} rpm after ${xs[i - 1]} rpm; sort the rows and remove repeats`,
      );
    }
  }
}

/** Binary search for the piece with x0 <= x (the last piece for x at the top end). */
function pieceIndex(pieces: readonly HermitePiece[], x: number): number {
  let lo = 0;
  let hi = pieces.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (pieces[mid].x0 <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function fromPieces(pieces: readonly HermitePiece[], kind: CurveKind, appliedFactor: number): EngineCurve {
  const frozen = Object.freeze(pieces.slice());
  const minRpm = frozen[0].x0;
  const maxRpm = frozen[frozen.length - 1].x1;
  const powerKwUnchecked = (speedRpm: number): number => hermiteValue(frozen[pieceIndex(frozen, speedRpm)], speedRpm);
  return Object.freeze({
    minRpm,
    maxRpm,
    pieces: frozen,
    kind,
    appliedFactor,
    screen: screenOf(frozen),
    powerKwUnchecked,
    powerAt(speedRpm: number): CurveValue {
      if (speedRpm < minRpm) return { status: 'belowRange', nearestRpm: minRpm };
      if (speedRpm > maxRpm) return { status: 'aboveRange', nearestRpm: maxRpm };
      if (!(speedRpm === speedRpm)) return { status: 'belowRange', nearestRpm: minRpm };
      return { status: 'ok', powerKw: powerKwUnchecked(speedRpm) };
    },
  });
}

/** A table of one row: defined at that speed only; solvers report it rather than guess a shape. */
function singlePoint(speedRpm: number, powerKw: number, appliedFactor: number): EngineCurve {
  return Object.freeze({
    minRpm: speedRpm,
    maxRpm: speedRpm,
    pieces: Object.freeze([]),
    kind: 'singlePoint' as const,
    appliedFactor,
    screen: screenOf([]),
    powerKwUnchecked: () => powerKw,
    powerAt(rpm: number): CurveValue {
      if (rpm === speedRpm) return { status: 'ok', powerKw };
      return rpm < speedRpm || !(rpm === rpm) ? { status: 'belowRange', nearestRpm: speedRpm } : { status: 'aboveRange', nearestRpm: speedRpm };
    },
  });
}
