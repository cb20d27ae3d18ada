/**
 * The results as CSV for a spreadsheet, beside the JSON (docs/results.md, "CSV files"): per boat one
 * table of its jet's impellers and one of its cruise settings, per engine family one table of every
 * variant × impeller pairing on its wall charts. Written by csv-stringify: UTF-8 with a byte-order mark
 * (so a spreadsheet reads the degree sign and dashes right), a header row, RFC 4180 quoting, CRLF line
 * ends. Column names carry their unit (`wot_rpm`, `power_kw`, `speed_kn`). Numbers are rounded as in the
 * JSON (stableNumber), so a cell reads back as the JSON's value; an absent value is an empty cell.
 */
import { stringify } from 'csv-stringify/sync';
import type { BandResult, BoatResult, CruiseRow, WallChartResult } from '../analysis/index.ts';
import { stableNumber } from './stableJson.ts';

type Cell = string | number | undefined;

/** One column: its header (lower-case words joined by "_", the unit last) and how a row fills it. */
export interface CsvColumn<Row> {
  readonly name: string;
  readonly value: (row: Row) => Cell;
}

function csvText<Row>(columns: readonly CsvColumn<Row>[], rows: readonly Row[]): string {
  const records = rows.map((row) =>
    columns.map((c) => {
      const v = c.value(row);
      return typeof v === 'number' ? stableNumber(v) : v;
    }),
  );
  return stringify(records as (string | number | null | undefined)[][], {
    header: true,
    columns: columns.map((c) => c.name),
    bom: true,
    record_delimiter: 'windows',
    // RFC 4180: a field holding a line break is quoted, whichever line break it is.
    quoted_match: /[\r\n]/,
    // A text cell starting with = + - @ is not run as a formula by a spreadsheet: it gets a leading apostrophe.
    escape_formulas: true,
  });
}

/** The band's columns under a prefix ("wot", "calibrated_wot"). */
function bandColumns<Row>(prefix: string, band: (row: Row) => BandResult | undefined): CsvColumn<Row>[] {
  return [
    { name: `${prefix}_rpm`, value: (r) => band(r)?.nominal.speedRpm },
    { name: `${prefix}_low_rpm`, value: (r) => band(r)?.low.speedRpm },
    { name: `${prefix}_high_rpm`, value: (r) => band(r)?.high.speedRpm },
    { name: `${prefix}_power_kw`, value: (r) => band(r)?.nominal.powerKw },
    { name: `${prefix}_status`, value: (r) => band(r)?.nominal.status },
    { name: `${prefix}_status_text`, value: (r) => band(r)?.nominal.statusText },
    { name: `${prefix}_worst_status`, value: (r) => band(r)?.worstStatus },
  ];
}

type ImpellerRow = { readonly boat: BoatResult; readonly alt: BoatResult['alternatives'][number] };

export const BOAT_IMPELLER_COLUMNS: readonly CsvColumn<ImpellerRow>[] = [
  { name: 'boat_id', value: (r) => r.boat.boatId },
  { name: 'jet_id', value: (r) => r.boat.jetId },
  { name: 'impeller_id', value: (r) => r.alt.impellerId },
  { name: 'impeller_label', value: (r) => r.alt.label },
  { name: 'fitted', value: (r) => r.alt.fitted },
  { name: 'rating_kw', value: (r) => r.alt.ratingKw },
  { name: 'window_low_rpm', value: (r) => r.boat.limits.windowLowRpm },
  { name: 'window_high_rpm', value: (r) => r.boat.limits.windowHighRpm },
  { name: 'max_rpm', value: (r) => r.boat.limits.maxRpm },
  ...bandColumns<ImpellerRow>('wot', (r) => r.alt.band),
  { name: 'top_speed_kn', value: (r) => r.alt.topSpeedKn },
  ...bandColumns<ImpellerRow>('calibrated_wot', (r) => r.alt.calibratedBand),
  { name: 'calibrated_top_speed_kn', value: (r) => r.alt.calibratedTopSpeedKn },
];

type CruiseCsvRow = { readonly boat: BoatResult; readonly model: 'dataSheet' | 'calibrated'; readonly row: CruiseRow };

export const BOAT_CRUISE_COLUMNS: readonly CsvColumn<CruiseCsvRow>[] = [
  { name: 'boat_id', value: (r) => r.boat.boatId },
  { name: 'model', value: (r) => r.model },
  { name: 'setting', value: (r) => r.row.label },
  { name: 'kind', value: (r) => r.row.kind },
  { name: 'status', value: (r) => r.row.status },
  { name: 'speed_basis', value: (r) => r.row.speedBasis },
  { name: 'engine_rpm', value: (r) => r.row.speedRpm },
  { name: 'power_kw', value: (r) => r.row.powerKw },
  { name: 'speed_kn', value: (r) => r.row.speedKn },
  { name: 'fuel_l_per_h', value: (r) => r.row.fuelLPerH },
  { name: 'fuel_us_gal_per_h', value: (r) => r.row.fuelUsGalPerH },
  { name: 'hours_with_reserve_h', value: (r) => r.row.hoursWithReserve },
  { name: 'range_with_reserve_nm', value: (r) => r.row.rangeWithReserveNm },
];

type PairingRow = {
  readonly chart: WallChartResult;
  readonly variant: WallChartResult['variants'][number];
  readonly impeller: WallChartResult['impellers'][number];
  readonly band: BandResult;
};

export const FAMILY_PAIRING_COLUMNS: readonly CsvColumn<PairingRow>[] = [
  { name: 'engine_family_id', value: (r) => r.chart.engineFamilyId },
  { name: 'jet_id', value: (r) => r.chart.jetId },
  { name: 'drive_ratio', value: (r) => r.chart.conditions.driveRatio },
  { name: 'water_kind', value: (r) => r.chart.conditions.waterKind },
  { name: 'water_density_kg_m3', value: (r) => r.chart.conditions.waterDensityKgM3 },
  { name: 'site', value: (r) => r.chart.conditions.siteLabel },
  { name: 'air_pressure_kpa', value: (r) => r.chart.conditions.pressureKpa },
  { name: 'air_temp_c', value: (r) => r.chart.conditions.airTempC },
  { name: 'variant_id', value: (r) => r.variant.variantId },
  { name: 'variant_label', value: (r) => r.variant.label },
  { name: 'site_peak_power_kw', value: (r) => r.variant.site.peakPowerKw },
  { name: 'window_low_rpm', value: (r) => r.variant.limits.windowLowRpm },
  { name: 'window_high_rpm', value: (r) => r.variant.limits.windowHighRpm },
  { name: 'max_rpm', value: (r) => r.variant.limits.maxRpm },
  { name: 'impeller_id', value: (r) => r.impeller.impellerId },
  { name: 'impeller_label', value: (r) => r.impeller.label },
  { name: 'rating_kw', value: (r) => r.impeller.ratingKw },
  ...bandColumns<PairingRow>('wot', (r) => r.band),
  { name: 'verdict', value: (r) => r.band.verdict },
];

/** The boat's jet's impellers, one row each, the fitted one marked. */
export function boatImpellersCsv(boat: BoatResult): string {
  return csvText(BOAT_IMPELLER_COLUMNS, boat.alternatives.map((alt) => ({ boat, alt })));
}

/** The boat's cruise settings on the data-sheet model, then (with usable sea trials) on the calibrated one. */
export function boatCruiseCsv(boat: BoatResult): string {
  const rows: CruiseCsvRow[] = [
    ...boat.cruise.map((row) => ({ boat, model: 'dataSheet' as const, row })),
    ...(boat.calibrated?.cruise ?? []).map((row) => ({ boat, model: 'calibrated' as const, row })),
  ];
  return csvText(BOAT_CRUISE_COLUMNS, rows);
}

/** Every variant × impeller pairing of every wall chart on the family's page, chart by chart. */
export function familyCsv(charts: readonly WallChartResult[]): string {
  const rows = charts.flatMap((chart) =>
    chart.pairings.flatMap((p) => {
      const variant = chart.variants.find((v) => v.variantId === p.variantId);
      const impeller = chart.impellers.find((i) => i.impellerId === p.impellerId);
      return variant && impeller ? [{ chart, variant, impeller, band: p.band }] : [];
    }),
  );
  return csvText(FAMILY_PAIRING_COLUMNS, rows);
}

/** Where a boat's and a family's CSV files go, relative to the site root. */
export const csvPaths = {
  boatImpellers: (boatId: string) => `results/boats/${boatId}.impellers.csv`,
  boatCruise: (boatId: string) => `results/boats/${boatId}.cruise.csv`,
  family: (familyId: string) => `results/families/${familyId}.csv`,
};
