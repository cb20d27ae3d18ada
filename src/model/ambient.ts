/**
 * Air conditions and engine power. Both standards below define a correction factor CF that multiplies
 * power observed in some air to give power in the standard's reference air (CF > 1 in thin or hot air).
 * A curve published for reference air R gives at site S:  P_S = P_R · CF(R) / CF(S),
 * so the factor is exactly 1 when S equals R, whatever R is.
 * This estimates; it does not certify a rating.
 */
import type { Ambient, Aspiration, Fuel } from './types.ts';
import { waterVapourPressureKpa } from '../standards/atmosphere.ts';

// Re-exported: published reference values shared with the data layer live in src/standards.
export { isaPressureKpa, waterVapourPressureKpa } from '../standards/atmosphere.ts';

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

