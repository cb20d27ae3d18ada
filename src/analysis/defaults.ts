/**
 * The wall charts a project gets when its books do not ask for others: one per engine family and jet
 * unit that some boat pairs with it (every jet when no boat uses the family). Conditions come from the
 * boats that pair the two: their most common drive line, and their water and site when all of them share
 * one; anything the boats do not settle stays standard (direct drive, fresh water, a warm day at the coast).
 */
import type { Boat, BookSheet, ChartConditions, EngineFamily, Project, SheetRequest, Site, Water } from '../data/types.ts';
import type { DriveLineSpec } from '../model/index.ts';
import { engineCurve, FRESH_WATER_KG_M3 } from '../model/index.ts';
import { hpToKw, kwToHp } from '../units.ts';
import type { PowerUnit } from '../data/types.ts';
import { curveKeyNumbers } from './results.ts';
import { applySite, SEA_LEVEL_SITE } from '../data/normalise/conditions.ts';

/**
 * The site a sheet assumes when nothing says otherwise: the same sea-level site (ISA pressure, 25 °C,
 * 30 % RH) a boat or a book gets when its file states none, so a default wall chart and a book's agree.
 */
export const DEFAULT_SITE: Site = SEA_LEVEL_SITE;

/** Direct drive with 3 % lost in couplings and bearings (DOMAIN.md: 0.95–0.98, common practice). */
export const DEFAULT_DRIVE_LINE: DriveLineSpec = Object.freeze({ ratio: 1, efficiency: 0.97 });

/** Fresh water at the reference density. */
export const DEFAULT_WATER: Water = Object.freeze({ kind: 'fresh', densityKgM3: FRESH_WATER_KG_M3 });

/** Fractions of the largest variant's peak power drawn as cruise lines. */
export const DEFAULT_CRUISE_FRACTIONS: readonly number[] = [0.4, 0.6, 0.8];

/** Rounds a power to a readable step in the unit people read it in: 5 below 200, else 10. */
function roundPowerKw(powerKw: number, unit: PowerUnit): number {
  const value = unit === 'kW' ? powerKw : kwToHp(powerKw);
  const step = value < 200 ? 5 : 10;
  const rounded = Math.max(step, Math.round(value / step) * step);
  return unit === 'kW' ? rounded : hpToKw(rounded);
}

/** The boats that pair an engine family with a jet unit, sorted by boat id. */
export function pairingBoats(project: Pick<Project, 'boats'>, engineFamilyId: string, jetId: string): Boat[] {
  return project.boats.filter((b) => b.engineFamilyId === engineFamilyId && b.jetId === jetId).sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

const sameDriveLine = (a: DriveLineSpec, b: DriveLineSpec): boolean => a.ratio === b.ratio && a.efficiency === b.efficiency;
const sameWater = (a: Water, b: Water): boolean => a.kind === b.kind && a.densityKgM3 === b.densityKgM3;
const sameSite = (a: Site, b: Site): boolean =>
  a.label === b.label &&
  a.altitudeM === b.altitudeM &&
  a.ambient.pressureKpa === b.ambient.pressureKpa &&
  a.ambient.airTempC === b.ambient.airTempC &&
  a.ambient.relativeHumidityPct === b.ambient.relativeHumidityPct;

/** The drive line most of the boats use; a tie goes to the one whose first boat (by id) comes first. */
function commonDriveLine(boats: readonly Boat[]): DriveLineSpec {
  let best: { driveLine: DriveLineSpec; count: number } | undefined;
  for (const boat of boats) {
    const count = boats.filter((b) => sameDriveLine(b.driveLine, boat.driveLine)).length;
    // Boats come sorted by id, so the first boat seen with a drive line wins a tie.
    if (!best || count > best.count) best = { driveLine: boat.driveLine, count };
  }
  return best ? { ratio: best.driveLine.ratio, efficiency: best.driveLine.efficiency } : DEFAULT_DRIVE_LINE;
}

/** The value every boat shares, else the fallback. */
function shared<T>(values: readonly T[], same: (a: T, b: T) => boolean, fallback: T): T {
  return values.length > 0 && values.every((v) => same(v, values[0])) ? values[0] : fallback;
}

/**
 * Default chart conditions for a family drawn against a jet, taken from the boats that pair them (pass
 * none for standard conditions); cruise lines at 40/60/80 % of the largest variant's peak power (kW).
 */
export function defaultChartConditions(family: EngineFamily, powerUnit: PowerUnit, boats: readonly Boat[] = []): ChartConditions {
  const peakKw = Math.max(...family.variants.map((v) => curveKeyNumbers(engineCurve(v)).peakPowerKw));
  return {
    driveLine: commonDriveLine(boats),
    water: shared(boats.map((b) => b.water), sameWater, DEFAULT_WATER),
    site: shared<Site>(boats.map((b) => b.site), sameSite, DEFAULT_SITE),
    cruisePowersKw: DEFAULT_CRUISE_FRACTIONS.map((f) => roundPowerKw(f * peakKw, powerUnit)),
  };
}

/** One A3-landscape wall chart request per (engine family × jet unit paired with it by a boat). */
export function defaultWallCharts(project: Project): SheetRequest[] {
  return project.engines.flatMap((family) => {
    const paired = new Set(project.boats.filter((b) => b.engineFamilyId === family.id).map((b) => b.jetId));
    const jets = paired.size > 0 ? project.jets.filter((j) => paired.has(j.id)) : project.jets;
    return jets.map((jet) => ({
      kind: 'wallChart' as const,
      engineFamilyId: family.id,
      jetId: jet.id,
      conditions: defaultChartConditions(family, project.site.powerUnitFirst, pairingBoats(project, family.id, jet.id)),
      paper: { size: 'A3' as const, orientation: 'landscape' as const, bleedMm: 0 },
    }));
  });
}

/**
 * A book's sheet as a request: a wall chart's conditions completed field by field from the pairing's
 * default chart (its boats' drive line, water and site, the automatic cruise lines), so a book chart that
 * gives no conditions is the very chart the pairing gets anyway, and one that gives some differs only there.
 */
export function bookSheetRequest(project: Pick<Project, 'boats' | 'engines' | 'site'>, sheet: BookSheet): SheetRequest {
  if (sheet.kind !== 'wallChart') return sheet;
  const family = project.engines.find((f) => f.id === sheet.engineFamilyId);
  if (!family) throw new Error(`book sheet names engine family "${sheet.engineFamilyId}", which the loader should have refused`);
  const base = defaultChartConditions(family, project.site.powerUnitFirst, pairingBoats(project, family.id, sheet.jetId));
  const given = sheet.conditions;
  return {
    ...sheet,
    conditions: {
      driveLine: given.driveLine ?? base.driveLine,
      water: given.water ?? base.water,
      site: given.site ? applySite(given.site, base.site) : base.site,
      cruisePowersKw: given.cruisePowersKw ?? base.cruisePowersKw,
    },
  };
}

/** One way a chart's conditions differ from another's: a file-name word and the words for a title. */
export interface ConditionsDifference {
  /** "ratio-1p55", "salt", "1500m", "cruise-80-120-160kw". */
  readonly slug: string;
  /** "reduction 1.55:1", "salt water", "1500 m altitude", "cruise lines at 80, 120, 160 kW". */
  readonly words: string;
}

const num = (n: number): string => String(Math.round(n * 100) / 100);

/** How chart conditions a differ from b, in a fixed order; empty when they are the same. */
export function conditionsDifferences(a: ChartConditions, b: ChartConditions, powerUnit: PowerUnit = 'kW'): ConditionsDifference[] {
  const out: ConditionsDifference[] = [];
  const word = (slug: string, words: string) => out.push({ slug, words });
  if (a.driveLine.ratio !== b.driveLine.ratio) word(`ratio-${num(a.driveLine.ratio).replace('.', 'p')}`, a.driveLine.ratio === 1 ? 'direct drive' : `reduction ${a.driveLine.ratio.toFixed(2)}:1`);
  if (a.driveLine.efficiency !== b.driveLine.efficiency) word(`eff-${Math.round(a.driveLine.efficiency * 100)}`, `${Math.round(a.driveLine.efficiency * 100)} % drive line`);
  if (!sameWater(a.water, b.water)) {
    word(a.water.kind === 'custom' ? `water-${Math.round(a.water.densityKgM3)}` : a.water.kind, a.water.kind === 'custom' ? `water of ${Math.round(a.water.densityKgM3)} kg/m³` : `${a.water.kind} water`);
  }
  const sa = a.site.ambient;
  const sb = b.site.ambient;
  if (a.site.altitudeM !== b.site.altitudeM || sa.pressureKpa !== sb.pressureKpa) {
    if (a.site.altitudeM !== undefined) word(`${num(a.site.altitudeM).replace('.', 'p')}m`, `${num(a.site.altitudeM)} m altitude`);
    else word(`${num(sa.pressureKpa).replace('.', 'p')}kpa`, `air at ${num(sa.pressureKpa)} kPa`);
  }
  if (sa.airTempC !== sb.airTempC) word(`${num(sa.airTempC).replace('.', 'p')}c`, `air at ${num(sa.airTempC)} °C`);
  if (sa.relativeHumidityPct !== sb.relativeHumidityPct) word(`rh-${num(sa.relativeHumidityPct).replace('.', 'p')}`, `${num(sa.relativeHumidityPct)} % relative humidity`);
  const kw = (c: readonly number[]): string => c.map((p) => Math.round(p)).join('-');
  if (kw(a.cruisePowersKw) !== kw(b.cruisePowersKw)) {
    const shown = a.cruisePowersKw.map((p) => Math.round(powerUnit === 'kW' ? p : kwToHp(p))).join(', ');
    word(a.cruisePowersKw.length > 0 ? `cruise-${kw(a.cruisePowersKw)}kw` : 'no-cruise', a.cruisePowersKw.length > 0 ? `cruise lines at ${shown} ${powerUnit}` : 'no cruise lines');
  }
  return out;
}
