/**
 * Water densities from ITTC Recommended Procedure 7.5-02-01-03 (Rev 02, 2011), "Fresh water and seawater
 * properties", at 15 °C; seawater at absolute salinity 35.165 g/kg. Ratings scale with ρ (affinity law).
 */

/** Fresh water at 15 °C, kg/m³ (ITTC 7.5-02-01-03). */
export const FRESH_WATER_KG_M3 = 999.1026;
/** Seawater (35.165 g/kg) at 15 °C, kg/m³ (ITTC 7.5-02-01-03). */
export const SALT_WATER_KG_M3 = 1026.021;
