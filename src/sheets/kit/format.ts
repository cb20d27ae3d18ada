/**
 * Numbers as they are printed. Every formatter refuses a non-finite value with a LayoutError, so a
 * sheet can never show NaN, Infinity or undefined.
 */
import type { PowerUnit } from '../../data/types.ts';
import { LayoutError } from './errors.ts';
import { kwToPower } from './units.ts';

function finite(value: number, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new LayoutError('format', `${what} must be a finite number, found ${String(value)}`);
  }
  return value;
}

/** Engine speed rounded to 10 rpm: "4150". Readers compare tachometers to about that. */
export function rpmText(speedRpm: number): string {
  const r = Math.round(finite(speedRpm, 'engine speed') / 10) * 10;
  return String(r);
}

/** "4150 rpm". */
export function rpmWithUnit(speedRpm: number): string {
  return `${rpmText(speedRpm)} rpm`;
}

/** "4020–4280 rpm" (en dash), low first. */
export function rpmRangeText(lowRpm: number, highRpm: number): string {
  const [a, b] = lowRpm <= highRpm ? [lowRpm, highRpm] : [highRpm, lowRpm];
  return `${rpmText(a)}–${rpmText(b)} rpm`;
}

/** A band that may collapse to one value (at the limiter): "5400 rpm" rather than "5400–5400 rpm". */
export function rpmBandText(lowRpm: number, highRpm: number): string {
  return rpmText(lowRpm) === rpmText(highRpm) ? rpmWithUnit(lowRpm) : rpmRangeText(lowRpm, highRpm);
}

/** Power in one unit, whole numbers (two decimals below 10, so small impeller ratings keep their digits): "210 kW". */
export function powerText(powerKw: number, unit: PowerUnit): string {
  const v = kwToPower(finite(powerKw, 'power'), unit);
  const digits = Math.abs(v) < 10 ? 2 : 0;
  return `${v.toFixed(digits)} ${unit}`;
}

/** Power in the site's first unit with the other in brackets: "210 kW (282 hp)". */
export function powerBothText(powerKw: number, first: PowerUnit): string {
  const second: PowerUnit = first === 'kW' ? 'hp' : 'kW';
  return `${powerText(powerKw, first)} (${powerText(powerKw, second)})`;
}

/** Signed percentage: "+10 %", "−5 %" (true minus sign). */
export function percentText(pct: number, opts?: { digits?: number }): string {
  const v = finite(pct, 'percentage');
  const s = Math.abs(v).toFixed(opts?.digits ?? 0);
  const sign = v > 0 ? '+' : v < 0 && Number(s) !== 0 ? '−' : '';
  return `${sign}${s} %`;
}

/** Plain number with fixed decimals. */
export function numberText(value: number, digits: number, what = 'value'): string {
  return finite(value, what).toFixed(digits);
}
