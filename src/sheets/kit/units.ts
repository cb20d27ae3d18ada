/**
 * Power units on sheets. Conversions come from src/units.ts (exact NIST SP 811 factors) so the sheets
 * and the model never disagree about a horsepower.
 */
import { hpToKw, kwToHp } from '../../units.ts';
import type { PowerUnit } from '../../data/types.ts';

/** kW → the given unit. */
export function kwToPower(kw: number, unit: PowerUnit): number {
  return unit === 'kW' ? kw : kwToHp(kw);
}

/** The given unit → kW. */
export function powerToKw(value: number, unit: PowerUnit): number {
  return unit === 'kW' ? value : hpToKw(value);
}
