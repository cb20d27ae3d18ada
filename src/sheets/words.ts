/** Short phrases shared by several sheets. */
import type { ConditionsResult } from '../analysis/index.ts';
import type { MatchStatus } from '../analysis/index.ts';

/** "direct drive, 97 % drive line, fresh water 999 kg/m³, Sea level, 25 °C, 50 % RH". */
export function conditionsText(c: ConditionsResult): string {
  const drive = c.driveRatio === 1 ? 'direct drive' : `reduction ${c.driveRatio.toFixed(2)}:1`;
  return `${drive}, ${Math.round(c.driveEfficiency * 100)} % drive line, ${c.waterKind} water ${Math.round(c.waterDensityKgM3)} kg/m³, ${c.siteLabel}`;
}

/** Word added after an operating point's rpm when it must be warned about. */
export function pointSuffix(status: MatchStatus): string {
  if (status === 'revLimited') return ' OVER-REVS';
  if (status === 'belowWindow') return ' lugs';
  if (status === 'noCrossing') return ' no point';
  return '';
}
