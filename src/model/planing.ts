/**
 * Where planing begins. Crouch's formula (speed.ts) holds for a hull on the plane only; below that a boat
 * rides in its own wave and the formula's speed means nothing, so the estimates stop there.
 *
 * The volume Froude number  Fn∇ = V / sqrt(g · ∇^(1/3))  (∇ the displaced volume, m³) is the usual measure
 * of a planing hull's speed; planing hulls are taken to be fully planing from about Fn∇ = 3 (Savitsky,
 * "Hydrodynamic Design of Planing Hulls", Marine Technology 1964, FROM MEMORY: the paper sets the planing
 * range above Fn∇ ≈ 3 and calls 1–3 the semi-planing, transition range). We use 3: an estimate is given
 * only where the hull is surely on the plane.
 */
import { STANDARD_GRAVITY_M_S2, msToKn } from '../units.ts';

/** Volume Froude number from which the speed estimates apply (see the file comment). */
export const PLANING_FROUDE_VOLUME = 3;

/** The lowest speed (kn) at which a hull of this loaded displacement (kg) in water of this density (kg/m³) is taken as planing. */
export function planingSpeedKn(args: { displacementKg: number; waterDensityKgM3: number }): number {
  const volumeM3 = args.displacementKg / args.waterDensityKgM3;
  return msToKn(PLANING_FROUDE_VOLUME * Math.sqrt(STANDARD_GRAVITY_M_S2 * Math.cbrt(volumeM3)));
}

/** Volume Froude number of a speed (kn) for a hull of this displacement (kg) and water density (kg/m³). */
export function volumeFroudeNumber(args: { speedKn: number; displacementKg: number; waterDensityKgM3: number }): number {
  return (args.speedKn / planingSpeedKn(args)) * PLANING_FROUDE_VOLUME;
}
