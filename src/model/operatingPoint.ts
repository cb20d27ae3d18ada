/**
 * The wide-open-throttle operating point: the lowest engine speed at which the power the engine can make
 * stops exceeding the power the impeller absorbs, i.e. inf { n : available(n) − absorbed(n) < 0 } over the
 * part of the curve at or below the maximum speed. Defined this way it can only move down when the
 * impeller gets heavier or the engine weaker, which is what makes corner-only tolerance bands valid.
 */
import { absorbedPowerKw, type Absorber } from './absorption.ts';
import type { EngineCurve } from './engineCurve.ts';
import { firstCrossingRpm } from './firstCrossing.ts';
import type { EngineLimits } from './types.ts';

export type MatchStatus = 'matched' | 'belowWindow' | 'aboveWindow' | 'revLimited' | 'noCrossing';

export interface OperatingPoint {
  readonly status: MatchStatus;
  /** Always finite: the crossing, or the limiter speed, or the table end. */
  readonly speedRpm: number;
  /** Engine power at that speed (what the impeller takes). */
  readonly powerKw: number;
  /** > 0 only when revLimited: available minus absorbed at maxRpm. */
  readonly unusedPowerKw: number;
  /** One plain sentence for people. */
  readonly reason: string;
}

// Fixed sentences (no number formatting) keep the solver allocation-light; numbers are in the fields.
export const REASONS = Object.freeze({
  matched: 'The impeller takes all of the engine’s full-throttle power inside the recommended WOT window.',
  belowWindow: 'The engine cannot reach the recommended WOT window: the impeller is too heavy and the engine lugs.',
  aboveWindow: 'The engine settles above the recommended WOT window but below its maximum speed: the impeller is light.',
  revLimited:
    'The impeller cannot load the engine even at its maximum speed: the engine would over-rev and ride the rev limiter. A heavier impeller is needed.',
  tooHeavyAtStart:
    'The impeller already takes more power than the engine makes at the lowest speed of its table, so there is no operating point in the table: the impeller is far too heavy, or the table needs rows at lower speeds.',
  tableEndsLow:
    'The engine table ends below the maximum speed while the engine still makes more power than the impeller takes, so the operating point lies beyond the table: add rows up to the maximum speed.',
  tableAboveMax:
    'The engine table starts above the engine’s maximum speed, so there is nothing to match: check the rpm column of the table and the maximum speed.',
  singlePoint:
    'The engine table has a single row, so there is no curve to cross: give two or more rows, or state the engine as a known point (constant torque).',
});

function point(status: MatchStatus, speedRpm: number, powerKw: number, unusedPowerKw: number, reason: string): OperatingPoint {
  return { status, speedRpm, powerKw, unusedPowerKw, reason };
}

/** WOT operating point (rpm, kW) of an engine curve against an impeller absorption curve, with a status. */
export function operatingPoint(args: { curve: EngineCurve; absorber: Absorber; limits: EngineLimits }): OperatingPoint {
  const { curve, absorber, limits } = args;
  const lo = curve.minRpm;
  if (curve.pieces.length === 0) return point('noCrossing', lo, curve.powerKwUnchecked(lo), 0, REASONS.singlePoint);
  if (lo > limits.maxRpm) return point('noCrossing', lo, curve.powerKwUnchecked(lo), 0, REASONS.tableAboveMax);
  const hi = curve.maxRpm < limits.maxRpm ? curve.maxRpm : limits.maxRpm;
  const first = curve.pieces[0];
  const availableLoKw = lo === first.x0 ? first.y0 : curve.powerKwUnchecked(lo);
  if (availableLoKw - absorbedPowerKw(absorber, lo) < 0) return point('noCrossing', lo, availableLoKw, 0, REASONS.tooHeavyAtStart);

  const crossingRpm = firstCrossingRpm(curve, absorber, lo, hi);
  if (crossingRpm >= 0) {
    // At the crossing engine and impeller power agree (to ~1e-13); the absorption law is the cheaper side.
    const powerKw = absorbedPowerKw(absorber, crossingRpm);
    if (crossingRpm < limits.windowLowRpm) return point('belowWindow', crossingRpm, powerKw, 0, REASONS.belowWindow);
    if (crossingRpm > limits.windowHighRpm) return point('aboveWindow', crossingRpm, powerKw, 0, REASONS.aboveWindow);
    return point('matched', crossingRpm, powerKw, 0, REASONS.matched);
  }
  const availableHiKw = curve.powerKwUnchecked(hi);
  if (hi < limits.maxRpm) return point('noCrossing', hi, availableHiKw, 0, REASONS.tableEndsLow);
  // The limiter holds the engine at maxRpm part-throttled: it delivers only what the impeller takes there.
  const absorbedHiKw = absorbedPowerKw(absorber, hi);
  return point('revLimited', hi, absorbedHiKw, availableHiKw - absorbedHiKw, REASONS.revLimited);
}
