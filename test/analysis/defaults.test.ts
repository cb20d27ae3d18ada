import { toSite } from '../../src/data/normalise/conditions.ts';
import { describe, expect, it } from 'vitest';
import type { Boat, Project, SheetRequest } from '../../src/data/types.ts';
import { defaultChartConditions, defaultWallCharts, DEFAULT_SITE } from '../../src/analysis/index.ts';
import { pairingBoats } from '../../src/analysis/defaults.ts';
import { loadProject } from '../../src/data/load.ts';
import { FRESH_WATER_KG_M3, SALT_WATER_KG_M3 } from '../../src/model/index.ts';
import { boat, family, jet, project } from '../sheets/fixtures/demoProject.ts';

type WallChartRequest = Extract<SheetRequest, { kind: 'wallChart' }>;

const salt = { kind: 'salt' as const, densityKgM3: SALT_WATER_KG_M3 };
const lake = { label: 'Lake at 900 m (demo)', ambient: { pressureKpa: 90.8, airTempC: 20, relativeHumidityPct: 40 }, altitudeM: 900 };
/** An invented boat of the fixture fleet with its own id and drive line. */
const aBoat = (id: string, ratio: number, efficiency: number, more: Partial<Boat> = {}): Boat => ({ ...boat, id, name: `${id} (demo)`, driveLine: { ratio, efficiency }, ...more });
const chartFor = (boats: readonly Boat[]): WallChartRequest => {
  const p: Project = { ...project, boats };
  return defaultWallCharts(p).find((r): r is WallChartRequest => r.kind === 'wallChart' && r.jetId === jet.id)!;
};

describe('defaultWallCharts() conditions', () => {
  it('takes the most common drive line of the boats that pair the family with the jet', () => {
    const r = chartFor([aBoat('alder', 1, 0.97), aBoat('birch', 1.55, 0.96), aBoat('cedar', 1.55, 0.96)]);
    expect(r.conditions.driveLine).toEqual({ ratio: 1.55, efficiency: 0.96 });
  });

  it('breaks a drive-line tie by boat id, whatever order the boats come in', () => {
    const r = chartFor([aBoat('zulu', 1, 0.97), aBoat('alpha', 1.3, 0.95)]);
    expect(r.conditions.driveLine).toEqual({ ratio: 1.3, efficiency: 0.95 });
  });

  it('counts only boats that pair this family with this jet', () => {
    const otherJet = { ...jet, id: 'ploverkite-surge' };
    const p: Project = { ...project, jets: [jet, otherJet], boats: [aBoat('alder', 1, 0.97), aBoat('birch', 1.8, 0.96, { jetId: 'ploverkite-surge', jet: otherJet }), aBoat('cedar', 1.8, 0.96, { jetId: 'ploverkite-surge', jet: otherJet })] };
    const byJet = Object.fromEntries(defaultWallCharts(p).map((r) => [(r as WallChartRequest).jetId, (r as WallChartRequest).conditions.driveLine.ratio]));
    expect(byJet).toEqual({ 'ploverkite-drift': 1, 'ploverkite-surge': 1.8 });
    expect(pairingBoats(p, family.id, 'ploverkite-surge').map((b) => b.id)).toEqual(['birch', 'cedar']);
  });

  it('keeps the water and site of the boats only when all of them share it', () => {
    const shared = chartFor([aBoat('alder', 1, 0.97, { water: salt, site: lake }), aBoat('birch', 1, 0.97, { water: salt, site: lake })]);
    expect(shared.conditions.water).toEqual(salt);
    expect(shared.conditions.site).toEqual(lake);
    const mixed = chartFor([aBoat('alder', 1, 0.97, { water: salt, site: lake }), aBoat('birch', 1, 0.97)]);
    expect(mixed.conditions.water).toEqual({ kind: 'fresh', densityKgM3: FRESH_WATER_KG_M3 });
    expect(mixed.conditions.site).toEqual(DEFAULT_SITE);
  });

  it('uses direct drive and standard water and air when no boat pairs them', () => {
    // Direct drive at 0.97: DOMAIN.md gives 0.95–0.98 as the usual drive-line efficiency (common practice).
    const c = defaultChartConditions(family, 'kW');
    expect(c.driveLine).toEqual({ ratio: 1, efficiency: 0.97 });
    expect(c.water.densityKgM3).toBe(FRESH_WATER_KG_M3);
    expect(c.site).toEqual(DEFAULT_SITE);
    // One set of conditions everywhere: the site a boat or book file without a site gets (30 % RH, the
    // ISO 8665 reference humidity, from memory; sea-level ISA pressure 101.325 kPa, ISO 2533).
    expect(c.site.ambient).toEqual({ pressureKpa: 101.325, airTempC: 25, relativeHumidityPct: 30 });
    expect(c.site).toEqual(toSite(undefined));
  });

  it('draws the demo Thimblefinch four against the Kelpspindle Riffle through the 1.55 reduction its boat uses', async () => {
    const loaded = await loadProject('data');
    if (!loaded.ok) throw new Error(loaded.errors.map((e) => e.message).join('\n'));
    const r = defaultWallCharts(loaded.project).find((q): q is WallChartRequest => q.kind === 'wallChart' && q.engineFamilyId === 'thimblefinch-trotter' && q.jetId === 'kelpspindle-riffle')!;
    // data/boats/greyling.yaml: the only boat pairing them, reduction 1.55 at 0.96.
    expect(r.conditions.driveLine).toEqual({ ratio: 1.55, efficiency: 0.96 });
  });
});
