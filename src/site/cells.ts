/** Numbers in table cells: the unit lives in the column head, so cells hold the bare number. */
import type { PowerUnit } from '../data/types.ts';
import { powerText } from '../sheets/kit/format.ts';
import { kwToPower } from '../sheets/kit/units.ts';

/** A power in the site's unit without the unit ("303"; one decimal below 10). */
export function powerCell(powerKw: number, unit: PowerUnit): string {
  return powerText(powerKw, unit).replace(` ${unit}`, '');
}

/**
 * An impeller rating with two decimals: ratings are small numbers (a few kW at 1000 rpm) that differ
 * by a few per cent between neighbours, so one decimal would hide the difference.
 */
export function ratingCell(ratingKw: number, unit: PowerUnit): string {
  const value = kwToPower(ratingKw, unit);
  if (!Number.isFinite(value)) throw new RangeError(`impeller rating must be finite, found ${ratingKw}`);
  return value.toFixed(2);
}
