import { describe, expect, it } from 'vitest';
import { checkData } from '../../src/data/check.ts';
import { loadProject } from '../../src/data/load.ts';
import type { Project } from '../../src/data/types.ts';
import { solveInstallation } from '../../src/model/installation.ts';
import { bookSheetRequest } from '../../src/analysis/index.ts';
import { demoFiles } from './helpers.ts';

async function demo(): Promise<Project> {
  const result = await loadProject('data');
  if (!result.ok) throw new Error(result.errors.map((e) => e.message).join('\n'));
  expect(result.warnings).toEqual([]);
  return result.project;
}

const ids = (xs: readonly { id: string }[]) => xs.map((x) => x.id);

describe('the demo data in data/ is an invented fleet that exercises every feature', () => {
  it('loads without errors or warnings, every list sorted by id', async () => {
    const p = await demo();
    expect(ids(p.engines)).toEqual(['anvilmoth-hauler', 'copperwhistle-strider', 'thimblefinch-trotter']);
    expect(ids(p.jets)).toEqual(['gullbobbin-shoal', 'kelpspindle-riffle']);
    expect(ids(p.boats)).toEqual(['brine-lark', 'cloudpail-express', 'floodmoth-two', 'greyling', 'reedshank', 'sorrel-belle']);
    expect(ids(p.books)).toEqual(['dealer-spec-sheets', 'owner-console-cards', 'shop-wall-charts']);
  });

  it('says in every file that it is demo data', () => {
    for (const f of demoFiles()) expect(f.text, f.path).toMatch(/DEMO DATA/);
  });

  it('covers a hp table with tunes, a torque table, a single known point, 4–6 impellers per jet', async () => {
    const p = await demo();
    const v8 = p.engines.find((e) => e.id === 'copperwhistle-strider')!;
    expect(v8.variants.map((v) => v.variantId)).toEqual(['sport', 'economy', 'race']);
    expect(p.engines.find((e) => e.id === 'thimblefinch-trotter')!.variants[0].curve.kind).toBe('knownPoint');
    expect(p.engines.find((e) => e.id === 'thimblefinch-trotter')!.fuel).toBe('petrol'); // written "gasoline"
    for (const jet of p.jets) expect(jet.impellers.length).toBeGreaterThanOrEqual(4);
    // A 0.915 tune scales the whole published curve: 250 kW × 0.915 at 5000 rpm.
    const at5000 = (variant: number) => {
      const c = v8.variants[variant].curve;
      return c.kind === 'table' ? c.points.find((pt) => pt.speedRpm === 5000)!.powerKw : NaN;
    };
    expect(at5000(1) / at5000(0)).toBeCloseTo(0.915, 12);
  });

  it('has a salt-water boat, a boat at about 1800 m, and sea trials on two impellers', async () => {
    const p = await demo();
    expect(p.boats.filter((b) => b.water.kind === 'salt').map((b) => b.id)).toEqual(['brine-lark']);
    const high = p.boats.find((b) => b.id === 'cloudpail-express')!;
    expect(high.site.altitudeM).toBe(1800);
    // Standard atmosphere at 1800 m is about 81.5 kPa (U.S. Standard Atmosphere 1976 formula).
    expect(high.site.ambient.pressureKpa).toBeGreaterThan(81);
    expect(high.site.ambient.pressureKpa).toBeLessThan(82);
    const trials = p.boats.find((b) => b.id === 'reedshank')!.trials;
    expect(new Set(trials.map((t) => t.impellerId)).size).toBeGreaterThanOrEqual(2);
  });

  it('produces a mix of results: most boats matched, wall charts with an impeller that lugs and one that hits the limiter', async () => {
    const p = await demo();
    const statuses = p.boats.map((b) =>
      solveInstallation({ engine: b.engine, ambient: b.site.ambient, family: b.jet.family, impeller: b.jet.impellers.find((i) => i.id === b.impellerId)!, driveLine: b.driveLine, waterDensityKgM3: b.water.densityKgM3 }).status,
    );
    expect(statuses.filter((s) => s === 'matched').length).toBeGreaterThanOrEqual(4);
    const wall = bookSheetRequest(p, p.books.find((b) => b.id === 'shop-wall-charts')!.sheets[0]);
    if (wall.kind !== 'wallChart') throw new Error('expected a wall chart first');
    const engine = p.engines.find((e) => e.id === wall.engineFamilyId)!.variants[0];
    const jet = p.jets.find((j) => j.id === wall.jetId)!;
    const chart = jet.impellers.map(
      (impeller) => solveInstallation({ engine, ambient: wall.conditions.site.ambient, family: jet.family, impeller, driveLine: wall.conditions.driveLine, waterDensityKgM3: wall.conditions.water.densityKgM3 }).status,
    );
    expect(chart).toContain('belowWindow');
    expect(chart).toContain('revLimited');
    expect(chart).toContain('matched');
  });

  it('gives each audience its paper: shop A3 landscape, dealer A4 and (a mix it asks for) Letter, owner the 4x6 card', async () => {
    const p = await demo();
    const papers = (id: string) => [...new Set(p.books.find((b) => b.id === id)!.sheets.map((s) => `${s.paper.size} ${s.paper.orientation} ${s.paper.bleedMm}`))].sort();
    expect(papers('shop-wall-charts')).toEqual(['A3 landscape 0']);
    expect(papers('dealer-spec-sheets')).toEqual(['A4 portrait 0', 'Letter portrait 0']);
    expect(papers('owner-console-cards')).toEqual(['Card4x6 landscape 3']);
  });
});

describe('checkData() prints every error or a one-line summary', () => {
  it('summarises the demo data in one line with exit code 0', async () => {
    expect(await checkData('data')).toEqual({
      exitCode: 0,
      text: 'OK data: 3 engine families (6 variants), 2 jet units (11 impellers), 6 boats (9 sea trials), 3 books (16 sheets), 0 warnings\n',
    });
  });

  it('prints located errors and a count with exit code 1', async () => {
    const r = await checkData('test/fixtures/data/out-of-range');
    expect(r.exitCode).toBe(1);
    const lines = r.text.trimEnd().split('\n');
    expect(lines[0]).toBe('test/fixtures/data/out-of-range/engines/copperwhistle-strider.yaml:10:24 wot_window_rpm[1] must be at most max_rpm (5200 rpm): the WOT window lies inside [idle, max], found 5400');
    expect(lines.at(-1)).toBe('4 errors in 3 files; nothing was built from test/fixtures/data/out-of-range. Fix them and run check again.');
  });

  it('says when the data folder does not exist', async () => {
    const r = await checkData('no/such/folder');
    expect(r).toEqual({
      exitCode: 1,
      text: 'no/such/folder:1:1 the folder must be the data folder (holding site.yaml, engines/, jets/, boats/, books/), found nothing there — pass --data with the right folder\n1 error in 1 file; nothing was built from no/such/folder. Fix them and run check again.\n',
    });
  });
});
