/** Boat file → Boat: references resolved against the loaded engines and jets, all units normalised. */
import { hpToKw, kmhToKn, lbToKg, mphToKn, usGalToLitres } from '../../units.ts';
import { isDataError, resolve, resolveMember, type Registry } from '../references.ts';
import { MIN_DISPLACEMENT_KG } from '../schema/boat.ts';
import type { RawBoatFile, RawCruise, RawRepowerOption, RawTrial } from '../schema/boat.ts';
import type { Boat, CruiseSetting, DataError, EngineFamily, EngineVariant, JetUnit, RepowerOption, SeaTrial, Site, Water } from '../types.ts';
import { at } from '../validate.ts';
import type { YamlSource } from '../yamlSource.ts';
import { toSite, toWater } from './conditions.ts';
import type { Normalised } from './shared.ts';
import { boatLogTrials } from './boatLog.ts';
import type { SourceFile } from '../files.ts';

export interface BoatRegistries {
  readonly engines: Registry<EngineFamily>;
  readonly jets: Registry<JetUnit>;
}

/** Normalise a validated boat file; unknown references name what exists and the closest match. */
export function normaliseBoat(source: YamlSource, raw: RawBoatFile, reg: BoatRegistries, log?: SourceFile): Normalised<Boat> {
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
  const repowerOptions = engine && jet && raw.repower_options ? resolveRepowerOptions({ source, options: raw.repower_options, own: { engine, jet, impellerId: raw.impeller }, reg, errors }) : undefined;
  const displacementKg = raw.hull.displacement_kg ?? lbToKg(raw.hull.displacement_lb ?? Number.NaN);
  checkRepowerWeights({ source, raw, displacementKg, errors });
  const logged = jet ? boatLogTrials({ boatSource: source, yamlTrials: raw.trials, log, jet, engine }) : { trials: [], errors: [], warnings: [] };
  errors.push(...logged.errors);
  warnings.push(...logged.warnings);
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
      displacementKg,
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
    ...(repowerOptions ? { repowerOptions } : {}),
    // The boat file's trials and the log's, in date order (a stable sort: on one day, the boat file's first, then the log's rows in order).
    trials: [
      ...raw.trials.map((t, i) => ({ ...toTrial(t, { site, water }), origin: { file: source.file, line: source.locate(['trials', i]).line } })),
      ...logged.trials.map((t) => ({ ...toTrial(t.raw, { site, water }), origin: t.origin, ...(t.recordedBy !== undefined ? { recordedBy: t.recordedBy } : {}) })),
    ].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0)),
    ...(raw.notes !== undefined ? { notes: raw.notes } : {}),
    source: { file: source.file },
  };
  return { ok: true, value: boat, warnings };
}

/**
 * A boat's repower options, each resolved: what an option leaves out is the boat's own (its family, its
 * variant when the family is the boat's, its jet, its impeller when the jet is the boat's). Unknown ids,
 * a variant or impeller left out where the boat's own cannot apply, repeated labels and a weight change
 * that leaves no boat are errors located at the option's field.
 */
function resolveRepowerOptions(args: { source: YamlSource; options: readonly RawRepowerOption[]; own: { engine: EngineVariant; jet: JetUnit; impellerId: string }; reg: BoatRegistries; errors: DataError[] }): RepowerOption[] {
  const { source, own, errors } = args;
  const resolved: RepowerOption[] = [];
  const labels = new Map<string, number>();
  args.options.forEach((o, i) => {
    const path = (field: string) => ['repower_options', i, field];
    const first = labels.get(o.label);
    if (first !== undefined) errors.push(at(source, path('label'), { expected: `must differ from every other option's label (option ${first + 1} is also "${o.label}")`, fix: 'name each option as the buyer should tell it apart' }));
    labels.set(o.label, i);
    const family = o.engine ?? own.engine.familyId;
    let engine: EngineVariant | undefined;
    const fam = resolve({ source, path: path('engine'), id: family, registry: args.reg.engines, what: 'engine families', dir: 'engines' });
    if (fam.status === 'unknown') errors.push(fam.error);
    if (fam.status === 'found') {
      const variants = fam.value.variants;
      const variantId = o.engine_variant ?? (family === own.engine.familyId ? own.engine.variantId : variants.length === 1 ? variants[0].variantId : undefined);
      if (variantId === undefined) {
        errors.push(at(source, path('engine'), { expected: `names a family with several variants, so this option needs engine_variant`, fix: `add engine_variant: one of ${variants.map((v) => v.variantId).join(', ')}` }));
      } else {
        const hit = resolveMember({ source, path: o.engine_variant !== undefined ? path('engine_variant') : path('engine'), id: variantId, members: variants.map((v) => ({ id: v.variantId, v })), what: `variants of ${family}` });
        if (isDataError(hit)) errors.push(hit);
        else engine = hit.v;
      }
    }
    const jetId = o.jet ?? own.jet.id;
    let jet: JetUnit | undefined;
    const jetLookup = resolve({ source, path: path('jet'), id: jetId, registry: args.reg.jets, what: 'jet units', dir: 'jets' });
    if (jetLookup.status === 'unknown') errors.push(jetLookup.error);
    let impellerId: string | undefined;
    if (jetLookup.status === 'found') {
      jet = jetLookup.value;
      impellerId = o.impeller ?? (jetId === own.jet.id ? own.impellerId : undefined);
      if (impellerId === undefined) {
        errors.push(at(source, path('jet'), { expected: `names another jet unit than the boat's, so this option needs impeller`, fix: `add impeller: one of ${jet.impellers.map((m) => m.id).join(', ')}` }));
      } else {
        const hit = resolveMember({ source, path: o.impeller !== undefined ? path('impeller') : path('jet'), id: impellerId, members: jet.impellers, what: `impellers of ${jetId}` });
        if (isDataError(hit)) {
          errors.push(hit);
          impellerId = undefined;
        }
      }
    }
    const weightChangeKg = o.weight_change_kg ?? (o.weight_change_lb !== undefined ? lbToKg(o.weight_change_lb) : undefined);
    if (engine && jet && impellerId !== undefined) {
      resolved.push({ label: o.label, engineFamilyId: engine.familyId, engineVariantId: engine.variantId, engine, jetId: jet.id, jet, impellerId, ...(weightChangeKg !== undefined ? { weightChangeKg } : {}) });
    }
  });
  return resolved;
}

/** A weight change may not leave the loaded boat lighter than the least displacement a boat file takes. */
function checkRepowerWeights(args: { source: YamlSource; raw: RawBoatFile; displacementKg: number; errors: DataError[] }): void {
  args.raw.repower_options?.forEach((o, i) => {
    const kg = o.weight_change_kg ?? (o.weight_change_lb !== undefined ? lbToKg(o.weight_change_lb) : 0);
    if (args.displacementKg + kg < MIN_DISPLACEMENT_KG) {
      const field = o.weight_change_kg !== undefined ? 'weight_change_kg' : 'weight_change_lb';
      args.errors.push(at(args.source, ['repower_options', i, field], { expected: `must leave the loaded boat at least ${MIN_DISPLACEMENT_KG} kg (the hull's ${Math.round(args.displacementKg)} kg plus this change is ${Math.round(args.displacementKg + kg)} kg)`, fix: 'give the weight this option adds or saves against the boat as it is' }));
    }
  });
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
