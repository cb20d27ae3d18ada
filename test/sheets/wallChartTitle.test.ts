/**
 * One wall chart per pairing and one set of default conditions: a chart a book draws under other
 * conditions says what differs in its title (and its file name), so two charts of one pairing never
 * pass for the same sheet.
 */
import { describe, expect, it } from 'vitest';
import { conditionsDifferences, defaultChartConditions } from '../../src/analysis/index.ts';
import { loadProject } from '../../src/data/load.ts';
import type { ChartConditions } from '../../src/data/types.ts';
import { sheetScene } from '../../src/sheets/index.ts';
import { planSheets } from '../../src/site/planSheets.ts';

describe('a wall chart says how its conditions differ from the default', () => {
  it('in the demo: the default charts carry no note, the books\' charts name their cruise lines, title and slug agreeing', async () => {
    const r = await loadProject('data');
    if (!r.ok) throw new Error('demo did not load');
    const titles = planSheets(r.project)
      .sheets.filter((s) => s.request.kind === 'wallChart')
      .map((s) => `${s.slug} | ${sheetScene(s.request, { project: r.project, dateIso: '2026-01-01' }).title}`);
    expect(titles).toEqual([
      'wall-chart-brindlecombe-td6-vennick-260 | Brindlecombe TD6 6.0 L with Vennick 260 jet unit: wall chart',
      'wall-chart-corbrick-four-tarnwell-212 | Corbrick 2.3 four with Tarnwell 212 jet unit: wall chart',
      'wall-chart-harrowgate-v8-tarnwell-212 | Harrowgate 5.7 V8 with Tarnwell 212 jet unit: wall chart',
      'wall-chart-harrowgate-v8-tarnwell-212-cruise-80-120-160kw | Harrowgate 5.7 V8 with Tarnwell 212 jet unit: wall chart (cruise lines at 80, 120, 160 kW)',
      'wall-chart-brindlecombe-td6-vennick-260-cruise-120-180-240kw | Brindlecombe TD6 6.0 L with Vennick 260 jet unit: wall chart (cruise lines at 120, 180, 240 kW)',
      'wall-chart-corbrick-four-tarnwell-212-cruise-45-75kw | Corbrick 2.3 four with Tarnwell 212 jet unit: wall chart (cruise lines at 45, 75 kW)',
    ]);
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
