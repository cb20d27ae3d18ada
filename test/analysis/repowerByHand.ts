/**
 * A repower option's figures worked out by hand, for the tests: the option's installation built from the
 * loaded definitions, its WOT point from the model's solver (tested against its sources in test/model),
 * then Crouch's planing formula V = C / sqrt(W / P) (W in lb, P shaft horsepower; as in any planing-boat
 * handbook), the affinity-law absorption P = rating · (n / ratio / n_ref)^k · ρ/ρ_ref / efficiency (pump
 * affinity laws, e.g. Karassik's Pump Handbook), fuel = P · BSFC / density, time and range = tank × 0.9 /
 * flow (× speed) with the default tenth in reserve (common practice, no source). Conversion factors:
 * 1 lb = 0.45359237 kg, 1 hp = 0.745699872 kW (NIST SP 811, appendix B).
 */
import type { Boat, Project } from '../../src/data/types.ts';
import { solveInstallation, TYPICAL_BSFC_G_PER_KWH, TYPICAL_FUEL_KG_PER_L } from '../../src/model/index.ts';

export const LB_KG = 0.45359237;
export const HP_KW = 0.745699872;

export interface OptionAsked {
  readonly family: string;
  readonly variant: string;
  readonly jet: string;
  readonly impeller: string;
  readonly addKg: number;
}

/** The option's figures worked out by hand on the boat with that install. */
export function byHand(project: Project, boat: Boat, o: OptionAsked, crouchConstant: number) {
  const engine = project.engines.find((f) => f.id === o.family)!.variants.find((v) => v.variantId === o.variant)!;
  const jet = project.jets.find((j) => j.id === o.jet)!;
  const impeller = jet.impellers.find((i) => i.id === o.impeller)!;
  const wot = solveInstallation({ engine, ambient: boat.site.ambient, family: jet.family, impeller, driveLine: boat.driveLine, waterDensityKgM3: boat.water.densityKgM3 });
  const eff = boat.driveLine.efficiency;
  const lb = (boat.hull.displacementKg + o.addKg) / LB_KG;
  const topKn = crouchConstant / Math.sqrt(lb / ((wot.powerKw * eff) / HP_KW));
  const k = jet.family.exponent;
  const c = (impeller.ratingKw * (boat.water.densityKgM3 / jet.family.referenceDensityKgM3)) / eff / Math.pow(jet.family.referenceSpeedRpm * boat.driveLine.ratio, k);
  const bsfc = engine.bsfcGPerKwh ?? TYPICAL_BSFC_G_PER_KWH[engine.fuel];
  const litres = (kw: number) => (kw * bsfc) / 1000 / TYPICAL_FUEL_KG_PER_L[engine.fuel];
  const atSpeed = (kn: number) => {
    const engineKw = (Math.pow(kn / crouchConstant, 2) * lb * HP_KW) / eff;
    const flow = litres(engineKw);
    return { rpm: Math.pow(engineKw / c, 1 / k), flow, hours: (boat.fuelTankL! * 0.9) / flow, rangeNm: ((boat.fuelTankL! * 0.9) / flow) * kn };
  };
  const inWindow = wot.speedRpm >= engine.limits.windowLowRpm && wot.speedRpm <= engine.limits.windowHighRpm;
  // An rpm setting keeps its rpm; a power setting turns the impeller where it absorbs that power.
  const atPower = (kw: number) => Math.pow(kw / c, 1 / k);
  const atRpm = (rpm: number) => ({ flow: litres(c * Math.pow(rpm, k)) });
  return { wot, topKn, wotFlow: litres(wot.powerKw), atSpeed, atPower, atRpm, inWindow, limits: engine.limits, displacementKg: boat.hull.displacementKg + o.addKg };
}
