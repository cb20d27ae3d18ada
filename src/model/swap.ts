/**
 * Impeller swap from one known WOT point, with no engine curve: assume constant torque near the point
 * (P = P0 · n / n0) and the absorption law P = c · n^k. With impeller A at (n0, P0), c_A = P0 / n0^k and
 * c_B = c_A · rating_B / rating_A; solving P0·n/n0 = c_B·n^k gives
 *   n = n0 · (rating_A / rating_B)^(1/(k−1)),   P = P0 · n / n0.
 * With k = 3 speed scales by the square root of the rating ratio.
 */

/** Constant-torque estimate from one known WOT point: rpm and power with another impeller (closed form). */
export function swapFromKnownPoint(args: {
  knownRpm: number;
  knownPowerKw: number;
  fromRatingKw: number;
  toRatingKw: number;
  exponent: number;
}): { speedRpm: number; powerKw: number } {
  const speedRpm = args.knownRpm * Math.pow(args.fromRatingKw / args.toRatingKw, 1 / (args.exponent - 1));
  return { speedRpm, powerKw: (args.knownPowerKw * speedRpm) / args.knownRpm };
}
