/**
 * The CSV results read back with an independent parser (csv-parse, the registry's companion of the
 * writer, strict RFC 4180 mode: no relaxed quotes, equal column counts) give the JSON results' values,
 * column by column; every column is documented in docs/results.md. RFC 4180 (IETF, 2005) is the source
 * for the format: a header row, CRLF record ends, fields holding commas, quotes or line breaks quoted,
 * quotes doubled.
 */
import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import type { BoatResult, WallChartResult } from '../../src/analysis/index.ts';
import type { Project } from '../../src/data/types.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { BOAT_CRUISE_COLUMNS, BOAT_IMPELLER_COLUMNS, boatCruiseCsv, boatImpellersCsv, FAMILY_PAIRING_COLUMNS, familyCsv } from '../../src/site/resultsCsv.ts';
import { siteResults, type SiteResults } from '../../src/site/siteResults.ts';
import { stableJson } from '../../src/site/stableJson.ts';
import { demoProject } from './demoSite.ts';

type Json = Record<string, unknown>;
type Rows = Record<string, string>[];

/** Parsed strictly: a byte-order mark allowed at the start, a header row naming the columns. */
function read(csv: string): { header: string[]; rows: Rows } {
  const records = parse(csv, { bom: true, relax_quotes: false, relax_column_count: false, skip_empty_lines: false }) as string[][];
  const [header, ...body] = records;
  return { header, rows: body.map((r) => Object.fromEntries(header.map((h, i) => [h, r[i]]))) };
}

/** What the JSON file holds (numbers rounded as written). */
const asJson = (value: unknown): Json => JSON.parse(stableJson(value)) as Json;

/** A cell compared with a JSON value: a number as the number, an absent value as an empty cell. */
function expectCell(cell: string | undefined, value: unknown, where: string): void {
  if (value === undefined) expect(cell, where).toBe('');
  else if (typeof value === 'number') {
    expect(cell, where).not.toBe('');
    expect(Number(cell), where).toBe(value);
  } else expect(cell, where).toBe(value);
}

const at = (obj: unknown, path: string): unknown => path.split('.').reduce<unknown>((o, k) => (o === undefined ? undefined : (o as Json)[k]), obj);

/** The band fields under a column prefix, as the JSON names them. */
const bandPaths = (prefix: string, band: string): [string, string][] => [
  [`${prefix}_rpm`, `${band}.nominal.speedRpm`],
  [`${prefix}_low_rpm`, `${band}.low.speedRpm`],
  [`${prefix}_high_rpm`, `${band}.high.speedRpm`],
  [`${prefix}_power_kw`, `${band}.nominal.powerKw`],
  [`${prefix}_status`, `${band}.nominal.status`],
  [`${prefix}_status_text`, `${band}.nominal.statusText`],
  [`${prefix}_worst_status`, `${band}.worstStatus`],
];

let project: Project;
let results: SiteResults;
beforeAll(async () => {
  project = await demoProject();
  results = siteResults(project, planSheets(project));
});

describe('results CSV', () => {
  it('is UTF-8 with a byte-order mark, a header row and CRLF record ends', () => {
    const boat = results.boatResults.get('reedshank') as BoatResult;
    for (const csv of [boatImpellersCsv(boat), boatCruiseCsv(boat), familyCsv(results.familyResults.get(boat.engineFamilyId) ?? [])]) {
      expect(csv.startsWith('\uFEFF')).toBe(true);
      expect(csv.endsWith('\r\n')).toBe(true);
      // Every line break outside a quoted field is a CRLF (the demo's labels hold none).
      expect(csv.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
      expect(Buffer.from(csv, 'utf8').toString('utf8')).toBe(csv);
    }
    expect(read(boatImpellersCsv(boat)).header).toEqual(BOAT_IMPELLER_COLUMNS.map((c) => c.name));
  });

  it("each boat's impeller table reads back as the JSON's alternatives, the fitted impeller marked", () => {
    const paths: [string, string][] = [
      ['impeller_id', 'impellerId'],
      ['impeller_label', 'label'],
      ['fitted', 'fitted'],
      ['rating_kw', 'ratingKw'],
      ...bandPaths('wot', 'band'),
      ['top_speed_kn', 'topSpeedKn'],
      ...bandPaths('calibrated_wot', 'calibratedBand'),
      ['calibrated_top_speed_kn', 'calibratedTopSpeedKn'],
    ];
    let calibratedRows = 0;
    for (const [id, result] of results.boatResults) {
      const json = asJson(result);
      const { header, rows } = read(boatImpellersCsv(result));
      expect(header).toEqual([...new Set([...header])]);
      const alternatives = json.alternatives as Json[];
      expect(rows.length, id).toBe(alternatives.length);
      expect(rows.length, id).toBeGreaterThan(1);
      rows.forEach((row, i) => {
        expect(row.boat_id).toBe(id);
        expect(row.jet_id).toBe(json.jetId);
        expectCell(row.window_low_rpm, at(json, 'limits.windowLowRpm'), `${id} window`);
        expectCell(row.window_high_rpm, at(json, 'limits.windowHighRpm'), `${id} window`);
        expectCell(row.max_rpm, at(json, 'limits.maxRpm'), `${id} max`);
        for (const [column, path] of paths) expectCell(row[column], at(alternatives[i], path), `${id} row ${i + 1} ${column}`);
        if (row.calibrated_wot_rpm !== '') calibratedRows += 1;
      });
      expect(rows.filter((r) => r.fitted === 'yes').map((r) => r.impeller_id), id).toEqual([json.impellerId]);
    }
    // The demo has a boat with sea trials, so the calibrated columns are exercised too.
    expect(calibratedRows).toBeGreaterThan(0);
  });

  it("each boat's cruise table reads back as the JSON's cruise rows, data-sheet model first, then the calibrated one", () => {
    const paths: [string, string][] = [
      ['setting', 'label'],
      ['kind', 'kind'],
      ['status', 'status'],
      ['speed_basis', 'speedBasis'],
      ['engine_rpm', 'speedRpm'],
      ['power_kw', 'powerKw'],
      ['speed_kn', 'speedKn'],
      ['fuel_l_per_h', 'fuelLPerH'],
      ['fuel_us_gal_per_h', 'fuelUsGalPerH'],
      ['hours_with_reserve_h', 'hoursWithReserve'],
      ['range_with_reserve_nm', 'rangeWithReserveNm'],
    ];
    const seen = new Set<string>();
    for (const [id, result] of results.boatResults) {
      const json = asJson(result);
      const expected = [
        ...(json.cruise as Json[]).map((row) => ({ model: 'dataSheet', row })),
        ...((at(json, 'calibrated.cruise') as Json[] | undefined) ?? []).map((row) => ({ model: 'calibrated', row })),
      ];
      const { header, rows } = read(boatCruiseCsv(result));
      expect(header).toEqual(BOAT_CRUISE_COLUMNS.map((c) => c.name));
      expect(rows.length, id).toBe(expected.length);
      rows.forEach((row, i) => {
        expect(row.boat_id).toBe(id);
        expect(row.model).toBe(expected[i].model);
        seen.add(row.model);
        for (const [column, path] of paths) expectCell(row[column], at(expected[i].row, path), `${id} row ${i + 1} ${column}`);
      });
    }
    expect([...seen].sort()).toEqual(['calibrated', 'dataSheet']);
  });

  it("each family's table has one row per variant × impeller of each wall chart, reading back as the JSON's pairings", () => {
    let total = 0;
    for (const [id, charts] of results.familyResults) {
      const json = asJson({ charts }).charts as Json[];
      const { header, rows } = read(familyCsv(charts as readonly WallChartResult[]));
      expect(header).toEqual(FAMILY_PAIRING_COLUMNS.map((c) => c.name));
      const expected = json.flatMap((chart) =>
        (chart.pairings as Json[]).map((p) => ({
          chart,
          pairing: p,
          variant: (chart.variants as Json[]).find((v) => v.variantId === p.variantId) as Json,
          impeller: (chart.impellers as Json[]).find((m) => m.impellerId === p.impellerId) as Json,
        })),
      );
      expect(rows.length, id).toBe(expected.length);
      expect(rows.length, id).toBe(json.reduce((n, c) => n + (c.variants as Json[]).length * (c.impellers as Json[]).length, 0));
      rows.forEach((row, i) => {
        const e = expected[i];
        const where = `${id} row ${i + 1}`;
        expect(row.engine_family_id).toBe(id);
        expectCell(row.jet_id, e.chart.jetId, where);
        expectCell(row.drive_ratio, at(e.chart, 'conditions.driveRatio'), where);
        expectCell(row.water_kind, at(e.chart, 'conditions.waterKind'), where);
        expectCell(row.water_density_kg_m3, at(e.chart, 'conditions.waterDensityKgM3'), where);
        expectCell(row.site, at(e.chart, 'conditions.siteLabel'), where);
        expectCell(row.air_pressure_kpa, at(e.chart, 'conditions.pressureKpa'), where);
        expectCell(row.air_temp_c, at(e.chart, 'conditions.airTempC'), where);
        expectCell(row.variant_id, e.variant.variantId, where);
        expectCell(row.variant_label, e.variant.label, where);
        expectCell(row.site_peak_power_kw, at(e.variant, 'site.peakPowerKw'), where);
        expectCell(row.window_low_rpm, at(e.variant, 'limits.windowLowRpm'), where);
        expectCell(row.window_high_rpm, at(e.variant, 'limits.windowHighRpm'), where);
        expectCell(row.max_rpm, at(e.variant, 'limits.maxRpm'), where);
        expectCell(row.impeller_id, e.impeller.impellerId, where);
        expectCell(row.impeller_label, e.impeller.label, where);
        expectCell(row.rating_kw, e.impeller.ratingKw, where);
        for (const [column, path] of bandPaths('wot', 'band')) expectCell(row[column], at(e.pairing, path), `${where} ${column}`);
        expectCell(row.verdict, at(e.pairing, 'band.verdict'), where);
      });
      total += rows.length;
    }
    expect(total).toBeGreaterThan(10);
    // The demo's site label ("Sea level, 25 °C") holds a comma and a degree sign: quoted and read back whole.
    const anyFamily = [...results.familyResults.values()].find((c) => c.length > 0) as readonly WallChartResult[];
    expect(familyCsv(anyFamily)).toContain(`"${anyFamily[0].conditions.siteLabel}"`);
  });

  it('quotes commas, quotes and line breaks (RFC 4180 §2.6–2.7) and keeps a label that starts like a formula from running', () => {
    const boat = results.boatResults.get('reedshank') as BoatResult;
    const label = 'Tow, "slow"\nthen home';
    const odd: BoatResult = { ...boat, cruise: [{ ...boat.cruise[0], label }, { ...boat.cruise[0], label: '=1+1' }] };
    const csv = boatCruiseCsv(odd);
    expect(csv).toContain('"Tow, ""slow""\nthen home"');
    const { rows } = read(csv);
    expect(rows[0].setting).toBe(label);
    // A spreadsheet would compute "=1+1"; the leading apostrophe makes it text (csv-stringify escape_formulas).
    expect(rows[1].setting).toBe("'=1+1");
  });

  it('docs/results.md names every column', () => {
    const doc = readFileSync('docs/results.md', 'utf8');
    const section = doc.slice(doc.indexOf('## CSV files'));
    expect(section.length).toBeGreaterThan(100);
    for (const c of [...BOAT_IMPELLER_COLUMNS, ...BOAT_CRUISE_COLUMNS, ...FAMILY_PAIRING_COLUMNS]) expect(section, c.name).toContain(`\`${c.name}\``);
  });
});
