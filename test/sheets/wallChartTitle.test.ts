/**
 * One wall chart per pairing and one set of default conditions: a chart a book draws under other
 * conditions says what differs in its title (and its file name), so two charts of one pairing never
 * pass for the same sheet.
 */
import { describe, expect, it } from 'vitest';
import { conditionsDifferences, defaultChartConditions } from '../../src/analysis/index.ts';
import { loadProject } from '../../src/data/load.ts';
import { applySite } from '../../src/data/normalise/conditions.ts';
import type { ChartConditions } from '../../src/data/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { texts } from './sceneWalk.ts';

describe('a wall chart says how its conditions differ from the default', () => {
  it("in the demo: a book's chart without conditions is the pairing's own chart; one with conditions names what differs, title and slug agreeing", async () => {
    const r = await loadProject('data');
    if (!r.ok) throw new Error('demo did not load');
    const plan = planSheets(r.project);
    const titles = plan.sheets
      .filter((s) => s.request.kind === 'wallChart')
      .map((s) => `${s.slug} | ${sheetScene(s.request, { project: r.project, dateIso: '2026-01-01' }).title}`);
    expect(titles).toEqual([
      'wall-chart-anvilmoth-hauler-gullbobbin-shoal | Anvilmoth Hauler 6.0 L six with Gullbobbin Shoal jet unit: wall chart',
      'wall-chart-copperwhistle-strider-kelpspindle-riffle | Copperwhistle Strider 5.1 L V6 with Kelpspindle Riffle jet unit: wall chart',
      'wall-chart-thimblefinch-trotter-kelpspindle-riffle | Thimblefinch Trotter 2.3 L four with Kelpspindle Riffle jet unit: wall chart',
      'wall-chart-thimblefinch-trotter-kelpspindle-riffle-salt-cruise-45-75kw | Thimblefinch Trotter 2.3 L four with Kelpspindle Riffle jet unit: wall chart (salt water, cruise lines at 45, 75 kW)',
    ]);
    // data/books/shop-wall-charts.yaml: the first two entries give no conditions and are the default charts themselves.
    expect(plan.byBook.get('shop-wall-charts')).toEqual(['wall-chart-copperwhistle-strider-kelpspindle-riffle', 'wall-chart-anvilmoth-hauler-gullbobbin-shoal', 'wall-chart-thimblefinch-trotter-kelpspindle-riffle-salt-cruise-45-75kw']);
  });

  it("completes a book chart's conditions field by field from the pairing's default chart", async () => {
    const r = await loadProject('data');
    if (!r.ok) throw new Error('demo did not load');
    const plan = planSheets(r.project);
    const request = (slug: string) => plan.sheets.find((s) => s.slug === slug)!.request;
    const pairing = request('wall-chart-thimblefinch-trotter-kelpspindle-riffle');
    const salt = request('wall-chart-thimblefinch-trotter-kelpspindle-riffle-salt-cruise-45-75kw');
    if (pairing.kind !== 'wallChart' || salt.kind !== 'wallChart') throw new Error('expected wall charts');
    // The book gives water and cruise lines only: the drive line (the corbrick boats' 1.55:1, 96 %) and the site stay the pairing's.
    expect(salt.conditions.driveLine).toEqual({ ratio: 1.55, efficiency: 0.96 });
    expect(salt.conditions.driveLine).toEqual(pairing.conditions.driveLine);
    expect(salt.conditions.site).toEqual(pairing.conditions.site);
    expect(salt.conditions.water.kind).toBe('salt');
    // 60 and 100 hp as typed (mechanical horsepower, 745.699 87 W, NIST SP 811 appendix B).
    expect(salt.conditions.cruisePowersKw.map((kw) => kw / 0.74569987)).toEqual([expect.closeTo(60, 5), expect.closeTo(100, 5)]);
  });

  it('says which asked-for cruise line the power panel leaves out (45 kW is under every WOT point of the corbrick chart)', async () => {
    const r = await loadProject('data');
    if (!r.ok) throw new Error('demo did not load');
    const planned = planSheets(r.project).sheets.find((s) => s.slug === 'wall-chart-thimblefinch-trotter-kelpspindle-riffle-salt-cruise-45-75kw')!;
    const scene = sheetScene(planned.request, { project: r.project, dateIso: '2026-01-01' });
    const words = texts(scene).map((t) => t.text).join(' ');
    expect(words).toContain('Cruise line at 45 kW left out of the power panel');
    expect(words).not.toContain('Cruise line at 75 kW');
  });

  it('lays a partial site over the pairing site: only the fields the book gives change', () => {
    const base = { label: 'Upland lake', altitudeM: 1500, ambient: { pressureKpa: 84.6, airTempC: 12, relativeHumidityPct: 60 } };
    expect(applySite({ relativeHumidityPct: 80 }, base)).toEqual({ label: 'Upland lake', altitudeM: 1500, ambient: { pressureKpa: 84.6, airTempC: 12, relativeHumidityPct: 80 } });
    expect(applySite({ airTempC: 30 }, base)).toEqual({ label: '1500 m altitude, 30 °C', altitudeM: 1500, ambient: { pressureKpa: 84.6, airTempC: 30, relativeHumidityPct: 60 } });
  });

  it('names every kind of difference in words and in a file-name word', async () => {
    const r = await loadProject('data');
    if (!r.ok) throw new Error('demo did not load');
    const base = defaultChartConditions(r.project.engines[0], 'kW');
    const other: ChartConditions = {
      driveLine: { ratio: 1.55, efficiency: 0.95 },
      water: { kind: 'salt', densityKgM3: 1025 },
      site: { label: 'Upland lake', altitudeM: 1500, ambient: { pressureKpa: 84.6, airTempC: 30, relativeHumidityPct: 60 } },
      cruisePowersKw: [],
    };
    expect(conditionsDifferences(other, base, 'hp')).toEqual([
      { slug: 'ratio-1p55', words: 'reduction 1.55:1' },
      { slug: 'eff-95', words: '95 % drive line' },
      { slug: 'salt', words: 'salt water' },
      { slug: '1500m', words: '1500 m altitude' },
      { slug: '30c', words: 'air at 30 °C' },
      { slug: 'rh-60', words: '60 % relative humidity' },
      { slug: 'no-cruise', words: 'no cruise lines' },
    ]);
    expect(conditionsDifferences(base, base)).toEqual([]);
    // Cruise powers are kept in kW and told in the reader's unit (mechanical horsepower, 550 ft·lbf/s = 745.699 9 W, NIST SP 811 appendix B).
    expect(conditionsDifferences({ ...base, cruisePowersKw: [74.57, 111.85] }, base, 'hp').at(-1)).toEqual({ slug: 'cruise-75-112kw', words: 'cruise lines at 100, 150 hp' });
  });
});
