/** Boat file → Boat: references resolved against the loaded engines and jets, all units normalised. */
import { hpToKw, kmhToKn, lbToKg, mphToKn, usGalToLitres } from '../../units.ts';
import { isDataError, resolve, resolveMember, type Registry } from '../references.ts';
import type { RawBoatFile, RawCruise, RawTrial } from '../schema/boat.ts';
import type { Boat, CruiseSetting, DataError, EngineFamily, EngineVariant, JetUnit, SeaTrial, Site, Water } from '../types.ts';
import { at } from '../validate.ts';
import type { YamlSource } from '../yamlSource.ts';
import { toSite, toWater } from './conditions.ts';
import type { Normalised } from './shared.ts';

export interface BoatRegistries {
  readonly engines: Registry<EngineFamily>;
  readonly jets: Registry<JetUnit>;
}

/** Normalise a validated boat file; unknown references name what exists and the closest match. */
export function normaliseBoat(source: YamlSource, raw: RawBoatFile, reg: BoatRegistries): Normalised<Boat> {
  const errors: DataError[] = [];
  const warnings: DataError[] = [];
  const engine = resolveEngine({ source, raw, reg, errors });
  const jetLookup = resolve({ source, path: ['jet'], id: raw.jet, registry: reg.jets, what: 'jet units', dir: 'jets' });
  if (jetLookup.status === 'unknown') errors.push(jetLookup.error);
  const jet = jetLookup.status === 'found' ? jetLookup.value : undefined;
  if (jet) {
    const fitted = resolveMember({ source, path: ['impeller'], id: raw.impeller, members: jet.impellers, what: `impellers of ${jet.id}` });
    if (isDataError(fitted)) errors.push(fitted);
    raw.trials.forEach((t, i) => {
      const r = resolveMember({ source, path: ['trials', i, 'impeller'], id: t.impeller, members: jet.impellers, what: `impellers of ${jet.id}` });
      if (isDataError(r)) errors.push(r);
    });
  }
  if (engine) checkSpeeds({ source, raw, engine, errors, warnings });
  if (errors.length > 0 || !engine || !jet) return { ok: false, errors, warnings };

  const site = toSite(raw.site);
  const water = toWater(raw.water);
  const fuelTankL = raw.fuel_tank_l ?? (raw.fuel_tank_us_gal !== undefined ? usGalToLitres(raw.fuel_tank_us_gal) : undefined);
  const boat: Boat = {
    id: raw.id,
    name: raw.name,
    hull: {
      description: raw.hull.description,
      type: raw.hull.type,
      displacementKg: raw.hull.displacement_kg ?? lbToKg(raw.hull.displacement_lb ?? Number.NaN),
      ...(raw.hull.crouch_constant !== undefined ? { crouchConstant: raw.hull.crouch_constant } : {}),
    },
    engineFamilyId: engine.familyId,
    engineVariantId: engine.variantId,
    engine,
    jetId: jet.id,
    jet,
    impellerId: raw.impeller,
    driveLine: { ratio: raw.drive_line.ratio, efficiency: raw.drive_line.efficiency },
    water,
    site,
    cruise: raw.cruise.map(toCruise),
    ...(fuelTankL !== undefined ? { fuelTankL } : {}),
    ...(raw.fuel_reserve_pct !== undefined ? { fuelReservePct: raw.fuel_reserve_pct } : {}),
    trials: raw.trials.map((t) => toTrial(t, { site, water })).sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0)),
    ...(raw.notes !== undefined ? { notes: raw.notes } : {}),
    source: { file: source.file },
  };
  return { ok: true, value: boat, warnings };
}

function resolveEngine(args: { source: YamlSource; raw: RawBoatFile; reg: BoatRegistries; errors: DataError[] }): EngineVariant | undefined {
  const { source, raw, errors } = args;
  const fam = resolve({ source, path: ['engine'], id: raw.engine, registry: args.reg.engines, what: 'engine families', dir: 'engines' });
  if (fam.status === 'unknown') errors.push(fam.error);
  if (fam.status !== 'found') return undefined;
  const variants = fam.value.variants;
  if (raw.engine_variant === undefined) {
    if (variants.length === 1) return variants[0];
    errors.push(at(source, ['engine'], { expected: 'names a family with several variants, so engine_variant is needed', fix: `add engine_variant: one of ${variants.map((v) => v.variantId).join(', ')}` }));
    return undefined;
  }
  const members = variants.map((v) => ({ id: v.variantId, v }));
  const hit = resolveMember({ source, path: ['engine_variant'], id: raw.engine_variant, members, what: `variants of ${fam.value.id}` });
  if (isDataError(hit)) {
    errors.push(hit);
    return undefined;
  }
  return hit.v;
}

/** Cruise rpm must lie in [idle, max]; a trial above max rpm is kept (it was measured) but flagged. */
function checkSpeeds(args: { source: YamlSource; raw: RawBoatFile; engine: EngineVariant; errors: DataError[]; warnings: DataError[] }): void {
  const { idleRpm, maxRpm } = args.engine.limits;
  args.raw.cruise.forEach((c, i) => {
    if (c.rpm !== undefined && !(c.rpm >= idleRpm && c.rpm <= maxRpm)) {
      args.errors.push(at(args.source, ['cruise', i, 'rpm'], { expected: `must be between the engine's idle (${idleRpm}) and max (${maxRpm}) rpm` }));
    }
  });
  args.raw.trials.forEach((t, i) => {
    if (t.wot_rpm > maxRpm) {
      args.warnings.push(at(args.source, ['trials', i, 'wot_rpm'], { expected: `is above the engine's max_rpm (${maxRpm}); this impeller over-revs the engine` }));
    }
  });
}

function speedKn(r: { speed_kn?: number; speed_mph?: number; speed_kmh?: number }): number | undefined {
  if (r.speed_kn !== undefined) return r.speed_kn;
  if (r.speed_mph !== undefined) return mphToKn(r.speed_mph);
  return r.speed_kmh !== undefined ? kmhToKn(r.speed_kmh) : undefined;
}

function toCruise(c: RawCruise): CruiseSetting {
  if (c.power_kw !== undefined) return { kind: 'power', label: c.label, powerKw: c.power_kw };
  if (c.power_hp !== undefined) return { kind: 'power', label: c.label, powerKw: hpToKw(c.power_hp) };
  if (c.rpm !== undefined) return { kind: 'rpm', label: c.label, speedRpm: c.rpm };
  const typed = c.speed_kn !== undefined ? { value: c.speed_kn, unit: 'kn' as const } : c.speed_mph !== undefined ? { value: c.speed_mph, unit: 'mph' as const } : c.speed_kmh !== undefined ? { value: c.speed_kmh, unit: 'km/h' as const } : undefined;
  return { kind: 'speed', label: c.label, speedKn: speedKn(c) ?? Number.NaN, ...(typed ? { typed } : {}) };
}

function toTrial(t: RawTrial, boat: { site: Site; water: Water }): SeaTrial {
  const kn = speedKn(t);
  const loadKg = t.load_kg ?? (t.load_lb !== undefined ? lbToKg(t.load_lb) : undefined);
  return {
    date: t.date,
    impellerId: t.impeller,
    wotRpm: t.wot_rpm,
    ...(kn !== undefined ? { speedKn: kn } : {}),
    ...(loadKg !== undefined ? { loadKg } : {}),
    ambient: toSite(t.conditions, boat.site).ambient,
    water: t.water !== undefined ? toWater(t.water) : boat.water,
    ...(t.notes !== undefined ? { notes: t.notes } : {}),
  };
}
