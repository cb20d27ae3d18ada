/** Number formatting shared by the SVG writers. */

/** Fixed precision for mm values (3 decimals = 1 µm) so snapshots are stable. */
export function num(value: number): string {
  const fixed = Number(value.toFixed(3));
  return Object.is(fixed, -0) ? '0' : String(fixed);
}
