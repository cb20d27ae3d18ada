/**
 * Air conditions and engine power. Both standards below define a correction factor CF that multiplies
 * power observed in some air to give power in the standard's reference air (CF > 1 in thin or hot air).
 * A curve published for reference air R gives at site S:  P_S = P_R · CF(R) / CF(S),
 * so the factor is exactly 1 when S equals R, whatever R is.
 * This estimates; it does not certify a rating.
 */
import type { Ambient, Aspiration, Fuel, PowerCorrection } from './types.ts';
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

/**
 * Spark ignition: ISO 1585 form, αa = (99 / pd)^1.2 · (T / 298)^0.6, pd = dry-air pressure kPa, T in kelvin
 * (shared/REFERENCES.md: from a transcription, not the ISO text). Reference 99 kPa dry air, 298 K.
 */
export function isoSparkIgnitionCorrection(ambient: Ambient): number {
  const pdKpa = dryAirPressureKpa(ambient);
  return Math.pow(99 / pdKpa, 1.2) * Math.pow((ambient.airTempC + 273.15) / 298, 0.6);
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

/**
 * The correction an engine uses when its data names none: SAE J1349 for spark ignition (petrol) and the
 * ISO 1585 compression-ignition factor with fm = 1.2 for diesels (see DEFAULT_ENGINE_FACTOR_FM).
 */
export function defaultCorrection(fuel: Fuel): PowerCorrection {
  return fuel === 'petrol' ? { standard: 'sae-j1349' } : { standard: 'iso-1585-ci', engineFactorFm: DEFAULT_ENGINE_FACTOR_FM };
}

/** The correction factor CF of one standard in some air: observed power × CF = power in the standard's reference air. */
export function correctionFactor(correction: PowerCorrection, ambient: Ambient, aspiration: Aspiration): number {
  switch (correction.standard) {
    case 'sae-j1349':
      return sparkIgnitionCorrection(ambient);
    case 'iso-1585-si':
      return isoSparkIgnitionCorrection(ambient);
    case 'iso-1585-ci':
      return compressionIgnitionCorrection(ambient, aspiration, correction.engineFactorFm ?? DEFAULT_ENGINE_FACTOR_FM);
  }
}

/**
 * Factor (<1 when air is thinner/hotter) that multiplies power in reference air to give power at site:
 * CF(reference) / CF(site), with the engine's own standard or its fuel's default.
 */
export function ambientPowerFactor(args: { fuel: Fuel; aspiration: Aspiration; site: Ambient; reference: Ambient; correction?: PowerCorrection }): number {
  const correction = args.correction ?? defaultCorrection(args.fuel);
  return correctionFactor(correction, args.reference, args.aspiration) / correctionFactor(correction, args.site, args.aspiration);
}

/** Dry-air partial pressure, kPa: barometric minus water vapour (relative humidity × saturation pressure). */
export function dryAirPressureKpa(ambient: Ambient): number {
  return ambient.pressureKpa - (ambient.relativeHumidityPct / 100) * waterVapourPressureKpa(ambient.airTempC);
}

