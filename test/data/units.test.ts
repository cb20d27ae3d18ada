import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';
import { demoFiles } from './helpers.ts';

// Factors from NIST SP 811 (2008), Appendix B.8/B.9:
const KW_PER_HP = 0.7456998715822702; // horsepower (550 ft·lbf/s) = 745.699 871 582 270 2 W
const KG_PER_LB = 0.45359237; // pound (avoirdupois), exact
const L_PER_US_GAL = 3.785411784; // U.S. liquid gallon, exact
const KPA_PER_INHG = 3.386389; // inch of mercury, conventional, 3.386 389 E+03 Pa
const M_PER_NMI = 1852; // nautical mile, exact
const M_PER_MI = 1609.344; // statute mile, exact

const RPM = [2000, 3000, 4000, 5000, 5200];
const HP = [142, 224, 301, 350, 345];

function engineYaml(id: string, unit: string, values: readonly number[]): string {
  const rows = RPM.map((rpm, i) => `    - [${rpm}, ${values[i]}]`).join('\n');
  return `id: ${id}\nlabel: Test ${id}\nmaker: Test\nfuel: petrol\naspiration: natural\nidle_rpm: 650\nwot_window_rpm: [4600, 5000]\nmax_rpm: 5200\ncurve:\n  unit: ${unit}\n  points:\n${rows}\nvariants:\n  - id: only\n    label: only\n`;
}

function load(extra: { path: string; text: string }[]): Project {
  const result = loadProjectFromFiles([...demoFiles(), ...extra]);
  if (!result.ok) throw new Error(result.errors.map((e) => e.message).join('\n'));
  return result.project;
}

const powersOf = (p: Project, id: string) => {
  const curve = p.engines.find((e) => e.id === id)!.variants[0].curve;
  if (curve.kind !== 'table') throw new Error('expected a table');
  return curve.points.map((pt) => pt.powerKw);
};

describe('the loader normalises every unit to kW, kg, litres, knots, kPa, °C', () => {
  it('loads a curve given in hp, in kW and as torque in lbf·ft to the same kW within 1e-9', () => {
    const kw = HP.map((hp) => hp * KW_PER_HP);
    // hp = lbf·ft × rpm × 2π / 33 000 exactly (1 hp = 550 ft·lbf/s), so torque = hp × 33 000 / (2π rpm).
    const lbfFt = HP.map((hp, i) => (hp * 33000) / (2 * Math.PI * RPM[i]));
    const p = load([
      { path: 'data/engines/as-hp.yaml', text: engineYaml('as-hp', 'hp', HP) },
      { path: 'data/engines/as-kw.yaml', text: engineYaml('as-kw', 'kW', kw) },
      { path: 'data/engines/as-torque.yaml', text: engineYaml('as-torque', 'lbf·ft', lbfFt) },
    ]);
    for (const id of ['as-hp', 'as-kw', 'as-torque']) {
      powersOf(p, id).forEach((got, i) => expect(Math.abs(got - kw[i])).toBeLessThan(1e-9));
    }
    // 350 hp = 260.994 955 053 794 6 kW (NIST SP 811 factor × 350).
    expect(powersOf(p, 'as-hp')[3]).toBeCloseTo(260.9949550537946, 9);
  });

  it('loads a torque table in N·m through P = T·2πn/60', () => {
    // 1000 N·m at 3000 rpm = 1000 × 2π × 50 W = 314.159 265 kW (definition of the radian and the watt).
    const p = load([{ path: 'data/engines/as-nm.yaml', text: engineYaml('as-nm', 'N·m', [1000, 1000, 1000, 1000, 1000]) }]);
    expect(powersOf(p, 'as-nm')[1]).toBeCloseTo(100 * Math.PI, 9);
  });

  it('converts impeller ratings in hp with the NIST horsepower', () => {
    const p = load([]);
    const pebble = p.jets.find((j) => j.id === 'gullbobbin-shoal')!.impellers.find((i) => i.id === 'pebble')!;
    expect(pebble.ratingKw).toBeCloseTo(9.0 * KW_PER_HP, 12);
  });

  it('loads a boat written in lb, US gal, mph, °F and inHg as kg, litres, knots, °C and kPa', () => {
    const imperial = [
      'id: imperial',
      'name: Imperial test boat',
      'hull: { description: test, type: runabout, displacement_lb: 3000 }',
      'engine: thimblefinch-trotter',
      'jet: kelpspindle-riffle',
      'impeller: gale',
      'water: { density_kg_m3: 1010 }',
      'site: { pressure_inhg: 29.92, air_temp_f: 77, humidity_pct: 50 }',
      'cruise: [{ label: fast, speed_mph: 30 }, { label: eco, power_hp: 100 }]',
      'fuel_tank_us_gal: 40',
      'trials: [{ date: 2026-05-01, impeller: gale, wot_rpm: 5500, speed_mph: 40, load_lb: 400 }]',
    ].join('\n');
    const boat = load([{ path: 'data/boats/imperial.yaml', text: `${imperial}\n` }]).boats.find((b) => b.id === 'imperial')!;
    expect(boat.hull.displacementKg).toBeCloseTo(3000 * KG_PER_LB, 9);
    expect(boat.fuelTankL).toBeCloseTo(40 * L_PER_US_GAL, 9);
    expect(boat.site.ambient.pressureKpa).toBeCloseTo(29.92 * KPA_PER_INHG, 4);
    expect(boat.site.ambient.airTempC).toBeCloseTo(25, 12); // (77 − 32) × 5/9
    expect(boat.cruise[0]).toEqual({ kind: 'speed', label: 'fast', speedKn: expect.closeTo((30 * M_PER_MI) / M_PER_NMI, 9), typed: { value: 30, unit: 'mph' } });
    expect(boat.cruise[1]).toEqual({ kind: 'power', label: 'eco', powerKw: expect.closeTo(100 * KW_PER_HP, 9) });
    expect(boat.trials[0].speedKn).toBeCloseTo((40 * M_PER_MI) / M_PER_NMI, 9);
    expect(boat.trials[0].loadKg).toBeCloseTo(400 * KG_PER_LB, 9);
    expect(boat.water).toEqual({ kind: 'custom', densityKgM3: 1010 });
  });

  it('turns an altitude into the standard-atmosphere pressure', () => {
    // U.S. Standard Atmosphere 1976 table: 2000 m → 79.501 kPa (rounded table; within a few pascals).
    const text = 'id: high\nname: High\nhull: { description: t, type: runabout, displacement_kg: 1000 }\nengine: thimblefinch-trotter\njet: kelpspindle-riffle\nimpeller: gale\nwater: fresh\nsite: { altitude_m: 2000 }\n';
    const boat = load([{ path: 'data/boats/high.yaml', text }]).boats.find((b) => b.id === 'high')!;
    expect(Math.abs(boat.site.ambient.pressureKpa - 79.501)).toBeLessThan(0.005);
    expect(boat.site.altitudeM).toBe(2000);
  });
});
