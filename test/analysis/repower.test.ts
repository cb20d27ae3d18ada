/**
 * The repower comparison: each option is the boat with that install swapped in, analysed as a boat. The
 * checks build each option's installation by hand from the loaded definitions and work its figures out
 * independently: the WOT point with the model's solver (the operating point is the model's own job, tested
 * against its sources in test/model), then Crouch's planing formula V = C / sqrt(W / P) (W in lb, P shaft
 * horsepower; Crouch's formula as in any planing-boat handbook), the affinity-law absorption
 * P = rating · (n / ratio / n_ref)^k · ρ/ρ_ref / efficiency (pump affinity laws, e.g. Karassik's Pump
 * Handbook), fuel = P · BSFC / density, and time and range = tank × (1 − reserve) / flow (× speed).
 * Conversion factors: 1 lb = 0.45359237 kg, 1 hp = 0.745699872 kW (NIST SP 811, appendix B).
 */
import { describe, expect, it } from 'vitest';
import { analyseBoat, analyseRepower } from '../../src/analysis/index.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';
import { TYPICAL_CROUCH_CONSTANTS } from '../../src/model/index.ts';
import { byHand, LB_KG } from './repowerByHand.ts';
import { demoFiles, demoWith } from '../data/helpers.ts';
import { readFileSync } from 'node:fs';


const GREYLING = 'data/boats/greyling.yaml';
const OPTIONS = `
repower_options:
  - label: As fitted
  - label: Storm, heavier
    impeller: storm
    weight_change_kg: 25
  - label: Strider swap
    engine: copperwhistle-strider
    engine_variant: economy
    impeller: breeze
    weight_change_lb: 120
`;

function load(files = demoWith(GREYLING, readFileSync(GREYLING, 'utf8') + OPTIONS)): Project {
  const r = loadProjectFromFiles(files);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.project;
}

describe('analyseRepower()', () => {
  it('gives each option the figures of the boat with that install swapped in, worked out by hand', () => {
    const project = load();
    const boat = project.boats.find((b) => b.id === 'greyling')!;
    const r = analyseRepower({ boat, project })!;
    expect(r.options.map((o) => o.label)).toEqual(['As fitted', 'Storm, heavier', 'Strider swap']);
    // Greyling states no hull constant and has no sea trials: the typical runabout constant (model/speed.ts).
    const C = TYPICAL_CROUCH_CONSTANTS.runabout;
    expect(r.hull.crouchConstant).toBe(C);
    const asked = [
      { family: 'thimblefinch-trotter', variant: 'standard', jet: 'kelpspindle-riffle', impeller: 'gale', addKg: 0 },
      { family: 'thimblefinch-trotter', variant: 'standard', jet: 'kelpspindle-riffle', impeller: 'storm', addKg: 25 },
      { family: 'copperwhistle-strider', variant: 'economy', jet: 'kelpspindle-riffle', impeller: 'breeze', addKg: 120 * LB_KG },
    ];
    const speedSetting = boat.cruise.find((c) => c.kind === 'speed')!;
    expect(speedSetting.kind === 'speed' && speedSetting.typed?.unit).toBe('mph');
    asked.forEach((a, i) => {
      const o = r.options[i];
      const h = byHand(project, boat, a, C);
      expect([o.engineFamilyId, o.engineVariantId, o.jetId, o.impellerId]).toEqual([a.family, a.variant, a.jet, a.impeller]);
      expect(o.displacementKg).toBeCloseTo(h.displacementKg, 9);
      expect(o.wot.nominal.speedRpm).toBeCloseTo(h.wot.speedRpm, 6);
      expect(o.wot.nominal.status).toBe(h.wot.status);
      expect(o.wot.nominal.status === 'matched').toBe(h.inWindow);
      expect(o.topSpeedKn).toBeCloseTo(h.topKn, 6);
      expect(o.wotFuelLPerH).toBeCloseTo(h.wotFlow, 6);
      const row = o.cruise.find((c) => c.label === speedSetting.label)!;
      const s = h.atSpeed(speedSetting.kind === 'speed' ? speedSetting.speedKn : Number.NaN);
      expect(row.speedRpm).toBeCloseTo(s.rpm, 4);
      expect(row.fuelLPerH).toBeCloseTo(s.flow, 6);
      expect(row.hoursWithReserve).toBeCloseTo(s.hours, 6);
      expect(row.rangeWithReserveNm).toBeCloseTo(s.rangeNm, 6);
      // An rpm setting stays at its rpm on every engine.
      expect(o.cruise.find((c) => c.kind === 'rpm')?.speedRpm).toBe(1200);
    });
    expect(r.options.map((o) => o.fitted)).toEqual(['yes', 'no', 'no']);
    // The sentence's list: exactly the options whose WOT lies inside their own engine's window.
    expect(r.matchedLabels).toEqual(asked.flatMap((a, i) => (byHand(project, boat, a, C).inWindow ? [r.options[i].label] : [])));
    expect(r.options.map((o) => o.wot.nominal.status)).toContain('matched');
    expect(r.options.some((o) => o.wot.nominal.status !== 'matched')).toBe(true);
  });

  it('keeps the hull constant the boat’s sea trials measured, and calibrates no option with those trials', () => {
    const project = load(demoFiles());
    const boat = project.boats.find((b) => b.id === 'reedshank')!;
    const own = analyseBoat({ boat, project });
    expect(own.estimates.hull.source).toBe('trial');
    const r = analyseRepower({ boat, project })!;
    expect(r.hull.crouchConstant).toBe(own.estimates.hull.crouchConstant);
    const fitted = r.options.find((o) => o.fitted === 'yes')!;
    // The fitted option stands on the data sheet like the others: its WOT is the boat's data-sheet WOT, not the calibrated one.
    expect(fitted.wot.nominal.speedRpm).toBeCloseTo(own.wot.nominal.speedRpm, 9);
    expect(own.calibrated?.wot.nominal.speedRpm).not.toBeCloseTo(own.wot.nominal.speedRpm, 0);
    const h = byHand(project, boat, { family: 'copperwhistle-strider', variant: 'race', jet: 'kelpspindle-riffle', impeller: 'squall', addKg: 15 }, own.estimates.hull.crouchConstant);
    const race = r.options.find((o) => o.label === 'Race tune')!;
    expect(race.topSpeedKn).toBeCloseTo(h.topKn, 6);
  });

  it('gives nothing for a boat without repower options', () => {
    const project = load(demoFiles());
    expect(analyseRepower({ boat: project.boats.find((b) => b.id === 'greyling')!, project })).toBeUndefined();
  });
});
