/** Schema of data/boats/<id>.yaml: one boat with its engine, jet, impeller, water, site and trials. */
import * as z from 'zod';
import { atMost, between, conditions, driveLine, isoDate, label, LIMITS, name, positiveBetween, powerHp, powerKw, RANGES, rpm, slug, text, unitChoices, water } from './common.ts';

/** The least loaded displacement a boat file takes, kg (a repower option's weight change may not go below it). */
export const MIN_DISPLACEMENT_KG = 50;
export const HULL_TYPES = ['runabout', 'cruiser', 'high-speed-runabout', 'workboat', 'race'] as const;
const SPEED_KEYS = ['speed_kn', 'speed_mph', 'speed_kmh'] as const;
/** Boat speed: a zero speed is no speed to cruise at or to have measured on a trial. */
const speedFields = {
  speed_kn: positiveBetween(RANGES.speedKn[0], RANGES.speedKn[1], 'kn').optional(),
  speed_mph: positiveBetween(RANGES.speedMph[0], RANGES.speedMph[1], 'mph').optional(),
  speed_kmh: positiveBetween(RANGES.speedKmh[0], RANGES.speedKmh[1], 'km/h').optional(),
};

const hull = () =>
  unitChoices(
    z.strictObject({
      description: text(),
      type: z.enum(HULL_TYPES, { error: `must be one of ${HULL_TYPES.join(', ')}` }),
      displacement_kg: between(MIN_DISPLACEMENT_KG, 100000, 'kg').optional(),
      displacement_lb: between(110, 220000, 'lb').optional(),
      /** Crouch's hull constant C in V = C / sqrt(lb/shp). */
      crouch_constant: between(50, 300).optional(),
    }),
    [{ keys: ['displacement_kg', 'displacement_lb'], required: true }],
  );

export const CRUISE_KEYS = ['power_kw', 'power_hp', 'rpm', ...SPEED_KEYS] as const;

const cruise = () =>
  unitChoices(
    z.strictObject({ label: label(), power_kw: powerKw().optional(), power_hp: powerHp().optional(), rpm: rpm().optional(), ...speedFields }),
    [{ keys: CRUISE_KEYS, required: true }],
  );

/** One sea-trial record, as a boat file's trials list holds it and as each row of a trial log reads (trialLog.ts). */
export const trialRecord = () =>
  unitChoices(
    z.strictObject({
      date: isoDate(),
      impeller: slug(),
      wot_rpm: rpm(),
      ...speedFields,
      load_kg: between(0, 50000, 'kg').optional(),
      load_lb: between(0, 110000, 'lb').optional(),
      conditions: conditions().optional(),
      water: water().optional(),
      notes: text().optional(),
    }),
    [
      { keys: SPEED_KEYS, required: false },
      { keys: ['load_kg', 'load_lb'], required: false },
    ],
  );

/** Repower options a comparison sheet sets side by side: at least two to compare, at most what a row of A4 columns holds. */
export const REPOWER_OPTIONS = { min: 2, max: 6 } as const;

/**
 * One repower option: the boat with another engine (family and variant), jet unit or impeller; what it
 * leaves out is the boat's own. A weight change (a heavier engine, a lighter jet) moves the loaded
 * displacement the speed estimates use.
 */
const repowerOption = () =>
  unitChoices(
    z.strictObject({
      label: label().describe('The option as the comparison names it (a column heading)'),
      engine: slug().optional().describe("Engine family id; the boat's own when left out"),
      engine_variant: slug().optional().describe("Variant of that family; the boat's own variant when the family is the boat's, else needed when the family has several"),
      jet: slug().optional().describe("Jet unit id; the boat's own when left out"),
      impeller: slug().optional().describe("Impeller of that jet; the boat's own when the jet is the boat's, else needed"),
      weight_change_kg: between(-5000, 5000, 'kg').optional().describe('Weight this option adds to the loaded boat (negative: lighter)'),
      weight_change_lb: between(-11000, 11000, 'lb').optional(),
    }),
    [{ keys: ['weight_change_kg', 'weight_change_lb'], required: false }],
  );

const repowerOptions = () =>
  z
    .array(repowerOption(), { error: 'must be a list of repower options' })
    .min(REPOWER_OPTIONS.min, { error: `must list at least ${REPOWER_OPTIONS.min} options (a comparison sets options side by side)` })
    .max(REPOWER_OPTIONS.max, { error: `must have at most ${REPOWER_OPTIONS.max} entries (the comparison sheet prints each option as a column of A4)` });

export const boatFile = () =>
  unitChoices(
    z.strictObject({
      id: slug(),
      name: name(),
      notes: text().optional(),
      hull: hull(),
      /** Engine family id (data/engines/<id>.yaml) and, when it has several, the variant id. */
      engine: slug().describe('Engine family id: the file name in data/engines/ without .yaml'),
      engine_variant: slug().optional(),
      jet: slug().describe('Jet unit id: the file name in data/jets/ without .yaml'),
      impeller: slug().describe('Id of the fitted impeller in that jet unit'),
      drive_line: driveLine().default({ ratio: 1, efficiency: 0.97 }),
      water: water(),
      site: conditions().default({}),
      cruise: atMost(z.array(cruise(), { error: 'must be a list of cruise settings' }), LIMITS.cruisePerBoat, 'the sheets list each cruise setting on its own row; keep the ones the owner uses').default([]),
      fuel_tank_l: between(1, 100000, 'L').optional(),
      fuel_tank_us_gal: between(0.3, 26000, 'US gal').optional(),
      /** Share of the tank kept in reserve for the time and range figures; 10 % when absent. */
      fuel_reserve_pct: between(0, 50, '%').optional(),
      trials: z.array(trialRecord(), { error: 'must be a list of sea-trial records' }).default([]),
      /** Options a buyer compares on the repower comparison sheet. */
      repower_options: repowerOptions().optional(),
    }),
    [{ keys: ['fuel_tank_l', 'fuel_tank_us_gal'], required: false }],
  ).meta({ title: 'matchbook boat', description: 'One boat and its installation: data/boats/<id>.yaml' });

export type RawBoatFile = z.infer<ReturnType<typeof boatFile>>;
export type RawCruise = RawBoatFile['cruise'][number];
export type RawTrial = RawBoatFile['trials'][number];
export type RawRepowerOption = NonNullable<RawBoatFile['repower_options']>[number];
