/** data/site.yaml → SiteConfig. */
import type { RawSiteFile } from '../schema/site.ts';
import type { SiteConfig } from '../types.ts';

/** Normalise the validated site file (nothing can fail after the schema). */
export function normaliseSite(raw: RawSiteFile): SiteConfig {
  return {
    shopName: raw.shop_name,
    contactLine: raw.contact_line,
    powerUnitFirst: raw.units.power,
    speedUnit: raw.units.speed,
    ...(raw.units.speed_also !== undefined && raw.units.speed_also !== 'none' && raw.units.speed_also !== raw.units.speed ? { speedAlso: raw.units.speed_also } : {}),
    fuelUnit: raw.units.fuel,
    ...(raw.cautions !== undefined ? { extraCautions: raw.cautions } : {}),
    dataRevision: raw.data_revision,
    issueDate: raw.issue_date,
  };
}
