/**
 * Fuel at a steady power: mass flow = brake power × BSFC, volume flow = mass flow / fuel density.
 * When the engine data give no BSFC, a typical part-load figure for the fuel is used and marked so.
 * Range at a steady speed: hours = usable litres / (L/h); distance = hours × speed.
 */
import { ModelInputError } from './errors.ts';
import { litresToUsGal } from '../units.ts';
import type { Fuel } from './types.ts';

/**
 * Typical brake specific fuel consumption at part load, g/kWh: petrol about 300–400 (we take 350), diesel
 * about 220–260 (we take 240). Common practice, no source; real engines vary, give bsfc in the engine file.
 */
export const TYPICAL_BSFC_G_PER_KWH: Readonly<Record<Fuel, number>> = Object.freeze({ petrol: 350, diesel: 240 });

/** Typical fuel densities, kg/L: petrol about 0.74, diesel about 0.84. Common practice, no source. */
export const TYPICAL_FUEL_KG_PER_L: Readonly<Record<Fuel, number>> = Object.freeze({ petrol: 0.74, diesel: 0.84 });

/**
 * A tenth of the tank kept in reserve for the time and range figures (common practice, no source); a boat
 * may keep more (fuel_reserve_pct; a third is the rule of thirds: a third out, a third back, a third in reserve).
 */
export const DEFAULT_RESERVE_FRACTION = 0.1;

export interface FuelFlow {
  readonly kgPerHour: number;
  readonly litresPerHour: number;
  readonly usGalPerHour: number;
  readonly bsfcGPerKwh: number;
  /** 'engine' when the engine data gave BSFC, 'typical' otherwise. */
  readonly bsfcSource: 'engine' | 'typical';
  readonly fuelKgPerL: number;
}

/** Fuel flow (kg/h, L/h, US gal/h) of an engine making powerKw of brake power. */
export function fuelFlow(args: { powerKw: number; fuel: Fuel; bsfcGPerKwh?: number }): FuelFlow {
  const fromEngine = args.bsfcGPerKwh !== undefined && args.bsfcGPerKwh > 0;
  const bsfcGPerKwh = fromEngine ? args.bsfcGPerKwh! : TYPICAL_BSFC_G_PER_KWH[args.fuel];
  const fuelKgPerL = TYPICAL_FUEL_KG_PER_L[args.fuel];
  const kgPerHour = (args.powerKw * bsfcGPerKwh) / 1000;
  const litresPerHour = kgPerHour / fuelKgPerL;
  return { kgPerHour, litresPerHour, usGalPerHour: litresToUsGal(litresPerHour), bsfcGPerKwh, bsfcSource: fromEngine ? 'engine' : 'typical', fuelKgPerL };
}

export interface FuelRange {
  /** Running time to an empty tank, hours. */
  readonly hoursToEmpty: number;
  /** Distance to an empty tank at the given speed, nautical miles (null without a speed). */
  readonly rangeToEmptyNm: number | null;
  /** Running time keeping the reserve, hours. */
  readonly hoursWithReserve: number;
  readonly rangeWithReserveNm: number | null;
  readonly reserveFraction: number;
}

/** Endurance (h) and range (nm) for a tank (L) at a fuel flow (L/h) and speed (kn), to empty and with a reserve. */
export function fuelRange(args: { tankL: number; litresPerHour: number; speedKn?: number; reserveFraction?: number }): FuelRange {
  const reserveFraction = args.reserveFraction ?? DEFAULT_RESERVE_FRACTION;
  if (!(reserveFraction >= 0 && reserveFraction < 1)) {
    throw new ModelInputError(`fuel reserve must be a fraction from 0 up to (not including) 1, found ${reserveFraction}; 1/3 is the rule of thirds`);
  }
  const hoursToEmpty = args.tankL / args.litresPerHour;
  const hoursWithReserve = hoursToEmpty * (1 - reserveFraction);
  const nm = (h: number) => (args.speedKn === undefined ? null : h * args.speedKn);
  return { hoursToEmpty, rangeToEmptyNm: nm(hoursToEmpty), hoursWithReserve, rangeWithReserveNm: nm(hoursWithReserve), reserveFraction };
}
