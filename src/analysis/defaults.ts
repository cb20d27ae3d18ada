/**
 * The wall charts a project gets when its books do not ask for others: one per engine family and jet
 * unit that some boat pairs with it (every jet when no boat uses the family), under default conditions.
 */
import type { ChartConditions, EngineFamily, Project, SheetRequest } from '../data/types.ts';
import { engineCurve, FRESH_WATER_KG_M3 } from '../model/index.ts';
import { hpToKw, kwToHp } from '../units.ts';
import type { PowerUnit } from '../data/types.ts';
import { curveKeyNumbers } from './results.ts';

/** Sea level ISA pressure, 25 °C, 50 % RH: a warm day at the coast (common practice, no source). */
export const DEFAULT_SITE = Object.freeze({
  label: 'Sea level, 25 °C, 50 % RH',
  ambient: Object.freeze({ pressureKpa: 101.325, airTempC: 25, relativeHumidityPct: 50 }),
  altitudeM: 0,
});

/** Fractions of the largest variant's peak power drawn as cruise lines. */
export const DEFAULT_CRUISE_FRACTIONS: readonly number[] = [0.4, 0.6, 0.8];

/** Rounds a power to a readable step in the unit people read it in: 5 below 200, else 10. */
function roundPowerKw(powerKw: number, unit: PowerUnit): number {
  const value = unit === 'kW' ? powerKw : kwToHp(powerKw);
  const step = value < 200 ? 5 : 10;
  const rounded = Math.max(step, Math.round(value / step) * step);
  return unit === 'kW' ? rounded : hpToKw(rounded);
}

/** Default chart conditions for a family: direct drive, 0.97 efficiency, fresh water, sea-level air. */
export function defaultChartConditions(family: EngineFamily, powerUnit: PowerUnit): ChartConditions {
  const peakKw = Math.max(...family.variants.map((v) => curveKeyNumbers(engineCurve(v)).peakPowerKw));
  return {
    driveLine: { ratio: 1, efficiency: 0.97 },
    water: { kind: 'fresh', densityKgM3: FRESH_WATER_KG_M3 },
    site: DEFAULT_SITE,
    cruisePowersKw: DEFAULT_CRUISE_FRACTIONS.map((f) => roundPowerKw(f * peakKw, powerUnit)),
  };
}

/** One A3-landscape wall chart request per (engine family × jet unit paired with it by a boat). */
export function defaultWallCharts(project: Project): SheetRequest[] {
  return project.engines.flatMap((family) => {
    const paired = new Set(project.boats.filter((b) => b.engineFamilyId === family.id).map((b) => b.jetId));
    const jets = paired.size > 0 ? project.jets.filter((j) => paired.has(j.id)) : project.jets;
    const conditions = defaultChartConditions(family, project.site.powerUnitFirst);
    return jets.map((jet) => ({
      kind: 'wallChart' as const,
      engineFamilyId: family.id,
      jetId: jet.id,
      conditions,
      paper: { size: 'A3' as const, orientation: 'landscape' as const, bleedMm: 0 },
    }));
  });
}
