/**
 * Published reference values of air shared by the data layer (altitude → pressure) and the model
 * (dry-air pressure for the power corrections): the U.S. Standard Atmosphere 1976 and the IAPWS-IF97
 * saturation-pressure equation of water. Pure functions, no project types.
 */

// IAPWS-IF97 saturation-pressure equation (region 4), coefficients n1…n10.
const N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
  0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;

/** Saturation vapour pressure of water, kPa, at tempC (IAPWS-IF97; extrapolated below 0 °C). */
export function waterVapourPressureKpa(tempC: number): number {
  const tK = tempC + 273.15;
  const theta = tK + N[8] / (tK - N[9]);
  const a = theta * theta + N[0] * theta + N[1];
  const b = N[2] * theta * theta + N[3] * theta + N[4];
  const c = N[5] * theta * theta + N[6] * theta + N[7];
  const pMpa = Math.pow((2 * c) / (-b + Math.sqrt(b * b - 4 * a * c)), 4);
  return pMpa * 1000;
}

// U.S. Standard Atmosphere 1976, lowest layer: sea-level values, lapse rate and the constants that
// give the exponent g0·M0 / (R*·Lb) = 5.255 876….
const P0_PA = 101325;
const T0_K = 288.15;
const LAPSE_K_PER_M = 0.0065;
const G0_M_S2 = 9.80665;
const M0_KG_PER_KMOL = 28.9644;
const R_STAR_J_PER_KMOL_K = 8314.32;
const EARTH_RADIUS_M = 6356766;
const EXPONENT = (G0_M_S2 * M0_KG_PER_KMOL) / (R_STAR_J_PER_KMOL_K * LAPSE_K_PER_M);

/** Standard pressure (kPa) at a geometric altitude in metres (U.S. Standard Atmosphere 1976, below 11 km). */
export function isaPressureKpa(altitudeM: number): number {
  if (!(altitudeM >= -5000 && altitudeM <= 11000)) {
    throw new RangeError(
      `altitude must be between -5000 and 11000 m for the standard atmosphere, found ${altitudeM} m; give the site pressure instead`,
    );
  }
  // Geopotential altitude H = r0·z / (r0 + z) is what the layer formula uses.
  const hGeopotentialM = (EARTH_RADIUS_M * altitudeM) / (EARTH_RADIUS_M + altitudeM);
  return (P0_PA * Math.pow(1 - (LAPSE_K_PER_M * hGeopotentialM) / T0_K, EXPONENT)) / 1000;
}
