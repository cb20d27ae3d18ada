/** Water densities live with the other published reference values (src/standards), shared by data and model. */
export { FRESH_WATER_KG_M3, SALT_WATER_KG_M3 } from '../standards/water.ts';
