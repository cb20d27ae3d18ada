/** Conditions and water from their file forms (any unit) to Ambient, Site and Water in kPa, °C, kg/m³. */
import { isaPressureKpa } from '../../standards/atmosphere.ts';
import type { Ambient } from '../../model/types.ts';
import { FRESH_WATER_KG_M3, SALT_WATER_KG_M3 } from '../../standards/water.ts';
import { fToC, hpaToKpa, inHgToKpa } from '../../units.ts';
import type { RawConditions } from '../schema/common.ts';
import type { Site, SiteFields, Water } from '../types.ts';

/**
 * Reference conditions of a curve when the file states none: 100 kPa total, 25 °C, 30 % relative
 * humidity, those of ISO 8665 for small-craft engines (from memory, see shared/REFERENCES.md).
 */
export const STANDARD_REFERENCE: Ambient = Object.freeze({ pressureKpa: 100, airTempC: 25, relativeHumidityPct: 30 });

/** Site when a file states none: sea level in the standard atmosphere, 25 °C, 30 % humidity. */
export const SEA_LEVEL_SITE: Site = Object.freeze({
  label: 'Sea level, 25 °C',
  ambient: Object.freeze({ pressureKpa: isaPressureKpa(0), airTempC: 25, relativeHumidityPct: 30 }),
  altitudeM: 0,
});

export type RawWater = 'fresh' | 'salt' | { density_kg_m3: number };

/** fresh / salt / measured density → Water. */
export function toWater(raw: RawWater): Water {
  if (raw === 'fresh') return { kind: 'fresh', densityKgM3: FRESH_WATER_KG_M3 };
  if (raw === 'salt') return { kind: 'salt', densityKgM3: SALT_WATER_KG_M3 };
  return { kind: 'custom', densityKgM3: raw.density_kg_m3 };
}

/** Conditions from a file, each field falling back to base (a trial falls back to its boat's site). */
export function toSite(raw: RawConditions | undefined, base: Site = SEA_LEVEL_SITE): Site {
  return applySite(siteFields(raw), base);
}

/** The site fields a file gives (any unit, in kPa and °C), without the ones it leaves out. */
export function siteFields(raw: RawConditions | undefined): SiteFields {
  const r = raw ?? {};
  const pressure = pressureFrom(r);
  const airTempC = r.air_temp_c ?? (r.air_temp_f !== undefined ? fToC(r.air_temp_f) : undefined);
  return {
    ...(r.label !== undefined ? { label: r.label } : {}),
    ...(pressure ? { pressureKpa: pressure.pressureKpa, ...(pressure.altitudeM !== undefined ? { altitudeM: pressure.altitudeM } : {}) } : {}),
    ...(airTempC !== undefined ? { airTempC } : {}),
    ...(r.humidity_pct !== undefined ? { relativeHumidityPct: r.humidity_pct } : {}),
  };
}

/** Site fields laid over a base site: what the fields leave out comes from the base; a new label when pressure or temperature changed. */
export function applySite(fields: SiteFields, base: Site = SEA_LEVEL_SITE): Site {
  const ambient: Ambient = {
    pressureKpa: fields.pressureKpa ?? base.ambient.pressureKpa,
    airTempC: fields.airTempC ?? base.ambient.airTempC,
    relativeHumidityPct: fields.relativeHumidityPct ?? base.ambient.relativeHumidityPct,
  };
  const altitudeM = fields.pressureKpa !== undefined ? fields.altitudeM : base.altitudeM;
  const changed = fields.pressureKpa !== undefined || fields.airTempC !== undefined;
  const label = fields.label ?? (changed ? describe(ambient, altitudeM) : base.label);
  return altitudeM === undefined ? { label, ambient } : { label, ambient, altitudeM };
}

function pressureFrom(r: RawConditions): { pressureKpa: number; altitudeM?: number } | undefined {
  if (r.altitude_m !== undefined) return { pressureKpa: isaPressureKpa(r.altitude_m), altitudeM: r.altitude_m };
  if (r.pressure_kpa !== undefined) return { pressureKpa: r.pressure_kpa };
  if (r.pressure_hpa !== undefined) return { pressureKpa: hpaToKpa(r.pressure_hpa) };
  if (r.pressure_inhg !== undefined) return { pressureKpa: inHgToKpa(r.pressure_inhg) };
  return undefined;
}

function describe(ambient: Ambient, altitudeM: number | undefined): string {
  const where = altitudeM === undefined ? `${ambient.pressureKpa.toFixed(1)} kPa` : altitudeM === 0 ? 'Sea level' : `${altitudeM} m altitude`;
  return `${where}, ${Math.round(ambient.airTempC * 10) / 10} °C`;
}
