/**
 * Air conditions and engine power. Both standards below define a correction factor CF that multiplies
 * power observed in some air to give power in the standard's reference air (CF > 1 in thin or hot air).
 * A curve published for reference air R gives at site S:  P_S = P_R · CF(R) / CF(S),
 * so the factor is exactly 1 when S equals R, whatever R is.
 * This estimates; it does not certify a rating.
 */
import type { Ambient, Aspiration, Fuel } from './types.ts';

/**
 * Spark ignition: SAE J1349 revision AUG2004 (unchanged in later revisions as far as we know):
 * CF = 1.176 · (99 / pd) · sqrt((T + 273) / 298) − 0.176, pd = dry-air pressure kPa, T in °C.
 * (The older JUN1990 revision used 1.18 and 0.18.)
 */
export function sparkIgnitionCorrection(ambient: Ambient): number {
  const pdKpa = dryAirPressureKpa(ambient);
  return 1.176 * (99 / pdKpa) * Math.sqrt((ambient.airTempC + 273) / 298) - 0.176;
}

/** Exponent fm used for compression ignition when the fuel delivery per stroke is unknown. */
export const DEFAULT_ENGINE_FACTOR_FM = 1.2;

/**
 * Compression ignition: ISO 1585 (1992) / ISO 15550 (2016) form, αc = fa^fm, T in kelvin, pd dry kPa;
 * naturally aspirated fa = (99/pd)·(T/298)^0.7, turbocharged fa = (99/pd)^0.7·(T/298)^1.5.
 * The standard sets fm = 0.036·qc − 1.14 (0.3…1.2) from fuel delivery qc; makers rarely publish qc,
 * so we use fm = 1.2, the upper limit, which gives the largest (most cautious) correction.
 */
export function compressionIgnitionCorrection(ambient: Ambient, aspiration: Aspiration, fm = DEFAULT_ENGINE_FACTOR_FM): number {
  const pdKpa = dryAirPressureKpa(ambient);
  const tRatio = (ambient.airTempC + 273.15) / 298;
  const fa = aspiration === 'natural' ? (99 / pdKpa) * Math.pow(tRatio, 0.7) : Math.pow(99 / pdKpa, 0.7) * Math.pow(tRatio, 1.5);
  return Math.pow(fa, fm);
}

/** Factor (<1 when air is thinner/hotter) that multiplies reference power to give power at site. */
export function ambientPowerFactor(args: { fuel: Fuel; aspiration: Aspiration; site: Ambient; reference: Ambient }): number {
  const cf = (a: Ambient) =>
    args.fuel === 'petrol' ? sparkIgnitionCorrection(a) : compressionIgnitionCorrection(a, args.aspiration);
  return cf(args.reference) / cf(args.site);
}

/** Dry-air partial pressure, kPa: barometric minus water vapour (relative humidity × saturation pressure). */
export function dryAirPressureKpa(ambient: Ambient): number {
  return ambient.pressureKpa - (ambient.relativeHumidityPct / 100) * waterVapourPressureKpa(ambient.airTempC);
}

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
