/**
 * The front page's summaries: every boat with its fitted combination, predicted WOT band, window and
 * status in words (lugging and over-revving marked as on the sheets), and every engine family with its
 * variants, windows and maximum speeds. One link per row, on the row's name.
 */
import { isWarning, type BandResult, type BoatResult } from '../analysis/index.ts';
import type { EngineFamily, Project } from '../data/types.ts';
import { trialDatesText } from '../sheets/boatTables.ts';
import { rpmRangeText, rpmText } from '../sheets/kit/format.ts';
import type { TableView } from './siteView.ts';

/** "4600–5000" without the unit (it is in the column head). */
const windowCell = (lowRpm: number, highRpm: number) => rpmRangeText(lowRpm, highRpm).replace(' rpm', '');

/** "4840 (4780–4900)": most likely WOT rpm and its band; one figure when the whole band sits at one rpm (the limiter). */
function bandCell(band: BandResult): string {
  const [nominal, low, high] = [band.nominal, band.low, band.high].map((p) => rpmText(p.speedRpm));
  return low === high ? nominal : `${nominal} (${low}–${high})`;
}

/** One row per boat: what a dealer checks first. */
export function boatSummaryTable(project: Project, results: ReadonlyMap<string, BoatResult>): TableView {
  return {
    caption: 'Boats: fitted combination and predicted wide-open-throttle (WOT) speed',
    head: ['Boat', 'Engine', 'Jet unit, fitted impeller', 'Predicted WOT rpm (band)', 'Window (rpm)', 'Max (rpm)', 'Status', 'Based on'],
    numeric: [3, 4, 5],
    nowrap: [7],
    words: [6],
    rows: project.boats.map((boat) => {
      const r = results.get(boat.id) as BoatResult;
      const band = r.calibrated?.wot ?? r.wot;
      const warn = isWarning(band.nominal.status);
      const dates = trialDatesText(r);
      return [
        { text: boat.name, href: `boats/${boat.id}/index.html` },
        r.engineLabel,
        `${r.jetLabel}, ${r.impellerLabel}`,
        bandCell(band),
        windowCell(r.limits.windowLowRpm, r.limits.windowHighRpm),
        rpmText(r.limits.maxRpm),
        warn ? { text: band.verdict, mark: 'warn' as const } : band.verdict,
        dates === '' ? 'Data sheet' : dates.replace(/^s/, 'S'),
      ];
    }),
    note: 'Band: from the heaviest to the lightest end of the tolerances (or, for a boat with sea trials, of the calibrated model). Status: the most likely WOT point; what the band’s ends may do follows the semicolon.',
  };
}

/**
 * A limit that may differ between a family's variants: one value when all share it, else each value with
 * the variants that have it ("4600–5000 (250 kW, 229 kW economy); 4800–5200 (271 kW race)").
 */
function byVariant(family: EngineFamily, text: (v: EngineFamily['variants'][number]) => string): string {
  const groups = new Map<string, string[]>();
  for (const v of family.variants) groups.set(text(v), [...(groups.get(text(v)) ?? []), v.variantLabel]);
  if (groups.size <= 1) return [...groups.keys()].join('');
  return [...groups].map(([value, labels]) => `${value} (${labels.join(', ')})`).join('; ');
}

/** One row per engine family. */
export function familySummaryTable(project: Project): TableView {
  return {
    caption: 'Engine families: variants and the makers’ speed limits',
    head: ['Engine family', 'Maker', 'Fuel', 'Variants', 'Window (rpm)', 'Max (rpm)', 'Boats'],
    // Window and maximum may list a value per variant: left-aligned text, not a number column.
    numeric: [6],
    rows: project.engines.map((f) => [
      { text: f.label, href: `families/${f.id}/index.html` },
      f.maker,
      f.fuel,
      f.variants.map((v) => v.variantLabel).join('; '),
      byVariant(f, (v) => windowCell(v.limits.windowLowRpm, v.limits.windowHighRpm)),
      byVariant(f, (v) => rpmText(v.limits.maxRpm)),
      String(project.boats.filter((b) => b.engineFamilyId === f.id).length),
    ]),
  };
}
