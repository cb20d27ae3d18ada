/**
 * A repower comparison in a buyer's words, shared by the sheet and the site's comparison page: one
 * sentence naming the options whose full throttle lands inside their engine's recommended range, and
 * the side-by-side table (a row per figure, a column per option). Wording of our own.
 */
import type { RepowerOptionResult, RepowerResult } from '../analysis/index.ts';
import { isWarning } from '../analysis/index.ts';
import type { Boat, SiteConfig } from '../data/types.ts';
import { kgToLb } from '../units.ts';
import { cruiseAsked, distanceUnit, distanceText, fuelText, reservePctText, speedHeader, speedText } from './boatTables.ts';
import { LANDS } from './buyerWords.ts';
import { numberText, powerText, rpmText } from './kit/format.ts';
import { INK, WARN } from './kit/style.ts';
import type { Cell, Column } from './kit/table.ts';

/** The heading of the fitted option's column carries this. */
export const FITTED_NOW = '(fitted now)';

/** A label as the sentence names it: quoted when its own commas or "and" would blur the list. */
function named(label: string): string {
  return /,| and /.test(label) ? `“${label}”` : label;
}

/** "A", "A and B", "A, B and C". */
function listText(labels: readonly string[]): string {
  const n = labels.map(named);
  return n.length <= 1 ? (n[0] ?? '') : `${n.slice(0, -1).join(', ')} and ${n[n.length - 1]}`;
}

/**
 * The one plain sentence: which options keep full throttle inside their engine's recommended range
 * (RepowerResult.matchedLabels), and which do not.
 */
export function repowerSentence(r: RepowerResult): string {
  const all = r.options.map((o) => o.label);
  const yes = r.matchedLabels;
  const no = all.filter((l) => !yes.includes(l));
  if (yes.length === 0) return `None of the ${all.length} options keeps full throttle inside its engine’s recommended range: ask for another impeller before choosing one.`;
  if (no.length === 0) return `All ${all.length} options keep full throttle inside their engine’s recommended range.`;
  const keep = yes.length === 1 ? `${listText(yes)} keeps full throttle inside its engine’s recommended range` : `${listText(yes)} keep full throttle inside their engine’s recommended range`;
  return `${keep}; ${listText(no)} ${no.length === 1 ? 'does' : 'do'} not.`;
}

/** A weight change: "+15 kg", "−40 kg", with pounds in brackets for a sheet in mph ("+15 kg (33 lb)"). */
function weightText(kg: number | undefined, site: Pick<SiteConfig, 'speedUnit'>): string {
  if (kg === undefined || Math.abs(kg) < 0.5) return 'none';
  const sign = (v: number) => (v > 0 ? '+' : '−');
  const kgText = `${sign(kg)}${numberText(Math.abs(kg), 0, 'weight change')} kg`;
  return site.speedUnit === 'mph' ? `${kgText} (${sign(kg)}${numberText(Math.abs(kgToLb(kg)), 0, 'weight change')} lb)` : kgText;
}

const warnCell = (text: string, warn: boolean): Cell => (warn ? { text, weight: 'bold', colour: WARN } : { text, colour: INK });

/** What a cruise row says where it has no figure. */
function cruiseMissing(row: RepowerOptionResult['cruise'][number]): string {
  if (row.status === 'aboveWot') return 'more than full throttle: not reachable';
  if (row.status === 'belowPlaning' || row.speedBasis === 'belowPlaning') return 'below planing: no estimate';
  return '–';
}

/**
 * The comparison as a table: a first column naming each figure, then one column per option in the file's
 * order. keepWithPrevious: the rows that must not start a page (a cruise setting's fuel row stays with its rpm row).
 */
export function repowerTable(args: { result: RepowerResult; boat: Boat; site: Pick<SiteConfig, 'powerUnitFirst' | 'speedUnit' | 'speedAlso' | 'fuelUnit'> }): { columns: Column[]; rows: Cell[][]; keepWithPrevious: readonly number[] } {
  const { result, boat, site } = args;
  const opts = result.options;
  const each = (f: (o: RepowerOptionResult) => Cell): Cell[] => opts.map(f);
  const unit = site.powerUnitFirst;
  const weights = opts.some((o) => o.weightChangeKg !== undefined);
  const tank = opts.some((o) => o.cruise.some((c) => c.rangeWithReserveNm !== undefined));
  const rows: Cell[][] = [
    [{ text: 'Engine', weight: 'bold' }, ...each((o) => o.engineLabel)],
    [{ text: 'Jet unit and impeller', weight: 'bold' }, ...each((o) => `${o.jetLabel}, impeller ${o.impellerLabel}`)],
    ...(weights ? [[{ text: 'Weight it adds', weight: 'bold' as const }, ...each((o) => weightText(o.weightChangeKg, site))]] : []),
    [{ text: 'Full throttle, most likely (rpm)', weight: 'bold' }, ...each((o) => ({ text: rpmText(o.wot.nominal.speedRpm), weight: 'bold' }))],
    ['May settle between (rpm)', ...each((o) => `${rpmText(Math.min(o.wot.low.speedRpm, o.wot.high.speedRpm))}–${rpmText(Math.max(o.wot.low.speedRpm, o.wot.high.speedRpm))}`)],
    ['Engine’s range (rpm)', ...each((o) => `${rpmText(o.limits.windowLowRpm)}–${rpmText(o.limits.windowHighRpm)} (max ${rpmText(o.limits.maxRpm)})`)],
    [{ text: 'Full throttle against that range', weight: 'bold' }, ...each((o) => warnCell(LANDS[o.wot.nominal.status], isWarning(o.wot.nominal.status)))],
    [`Power at full throttle (${unit})`, ...each((o) => powerText(o.wot.nominal.powerKw, unit).replace(` ${unit}`, ''))],
    [{ text: speedHeader(site.speedUnit, 'Top speed', site.speedAlso), weight: 'bold' }, ...each((o) => ({ text: speedText(o.topSpeedKn, site.speedUnit, site.speedAlso), weight: 'bold' }))],
    [`Fuel at full throttle (${site.fuelUnit}, est.)`, ...each((o) => fuelText(o.wotFuelLPerH, site.fuelUnit))],
    ...boat.cruise.flatMap((setting, i): Cell[][] => {
      const asked = cruiseAsked(opts[0].cruise[i], boat, unit, site.speedUnit);
      const row = (o: RepowerOptionResult) => o.cruise[i];
      const reached = (o: RepowerOptionResult) => row(o).status !== 'aboveWot';
      // Fuel, and with a tank the time and range keeping the reserve, in one cell: "64 L/h · 2.1 h · 67 nm".
      const use = (o: RepowerOptionResult): string => {
        const r = row(o);
        if (r.fuelLPerH === undefined || !reached(o)) return '–';
        const fuel = `${fuelText(r.fuelLPerH, site.fuelUnit)} ${site.fuelUnit}`;
        return r.hoursWithReserve !== undefined && r.rangeWithReserveNm !== undefined ? `${fuel} · ${numberText(r.hoursWithReserve, 1, 'running time')} h · ${distanceText(r.rangeWithReserveNm, site.speedUnit)} ${distanceUnit(site.speedUnit)}` : fuel;
      };
      return [
        [{ text: `${setting.label} (${asked}): engine rpm`, weight: 'bold' }, ...each((o) => (row(o).speedRpm !== undefined && reached(o) ? rpmText(row(o).speedRpm!) : warnCell(cruiseMissing(row(o)), !reached(o))))],
        [`${setting.label}: fuel${tank ? ' · time · range' : ''} (est.)`, ...each(use)],
      ];
    }),
  ];
  // Each cruise setting is its last two rows' pair, from the end of the table.
  const keepWithPrevious = boat.cruise.map((_, i) => rows.length - 2 * (boat.cruise.length - i) + 1);
  const columns: Column[] = [
    { header: '', align: 'left', wrap: true },
    ...opts.map((o): Column => ({ header: o.fitted === 'yes' ? `${o.label} ${FITTED_NOW}` : o.label, align: 'left', wrap: true })),
  ];
  return { columns, rows, keepWithPrevious };
}

/** The small print under the table: what the columns share, what the figures stand on. */
export function repowerNote(args: { result: RepowerResult }): string {
  const { result } = args;
  const hull = result.hull;
  const constant = `hull constant ${Math.round(hull.crouchConstant)}`;
  const from = hull.source === 'trial' ? `${constant}, measured on the sea trials of ${hull.trialDates.join(', ')}` : hull.source === 'stated' ? `${constant} from the boat file` : `${constant}, a typical value for this kind of hull`;
  const reserve = result.options.some((o) => o.cruise.some((c) => c.rangeWithReserveNm !== undefined)) ? ` Time and range keep ${reservePctText(result.fuelReservePct)} of the tank in reserve.` : '';
  return `How to read it: each column is this hull with one option fitted, in the same water and air, so the columns compare alike. Full throttle should settle inside the recommended range of that option’s engine; “may settle” covers the impeller’s and the engine’s stated tolerances. Every figure is an estimate from the makers’ data; the sea trials of the boat as fitted are not applied to the options (its spec sheet has them). Speeds: Crouch’s planing formula with ${from}, on the loaded weight plus what each option adds. Fuel: from each engine’s fuel use per unit of power.${reserve}`;
}
