/** Assembles the templates' view of the site from the project, the drawn sheets and the analyses. */
import { isWarning, type BandResult, type BoatResult, type RepowerResult, type WallChartResult } from '../analysis/index.ts';
import type { Boat, EngineFamily, JetUnit, PowerUnit, Project, SpeedUnit } from '../data/types.ts';
import { speedText } from '../sheets/boatTables.ts';
import { repowerNote, repowerSentence, repowerTable } from '../sheets/repowerWords.ts';
import type { Cell } from '../sheets/kit/table.ts';
import { WARN } from '../sheets/kit/style.ts';
import { cautionsFor, withExtraCautions } from '../sheets/kit/cautions.ts';
import { powerText, rpmBandText, rpmWithUnit } from '../sheets/kit/format.ts';
import { boatTables, calibratedSuffix } from './boatTables.ts';
import { ratingCell } from './cells.ts';
import { boatSummaryTable, familySummaryTable } from './indexTables.ts';
import type { SheetPlan } from './planSheets.ts';
import { csvPaths } from './resultsCsv.ts';
import type { BoatView, CellView, FamilyView, GuideView, JetView, RepowerView, SheetView, SiteView } from './siteView.ts';
import { calibrationView } from './trialTable.ts';
import { trendView } from './trendPlot.ts';
import { wallChartTables } from './wallChartTables.ts';

export interface SiteViewArgs {
  readonly project: Project;
  readonly dateIso: string;
  readonly plan: SheetPlan;
  readonly sheets: ReadonlyMap<string, SheetView>;
  readonly boatResults: ReadonlyMap<string, BoatResult>;
  /** The repower comparison of each boat that lists repower options. */
  readonly repowerResults: ReadonlyMap<string, RepowerResult>;
  readonly familyResults: ReadonlyMap<string, readonly WallChartResult[]>;
  /** File names of the JSON Schemas copied to schema/. */
  readonly schemas: readonly string[];
  /** The guides rendered from docs/ (none in tests of pages that do not need them). */
  readonly guides: readonly GuideView[];
}

/** "boats/x.yaml": where a definition lives inside the data folder, the same wherever that folder is. */
function dataPath(file: string): string {
  return file.split(/[\\/]/).slice(-2).join('/');
}

/** A drive ratio as written: up to three decimals, no trailing zeros ("1", "1.55"). */
function ratioText(ratio: number): string {
  return String(Number(ratio.toFixed(3)));
}

function pick(sheets: ReadonlyMap<string, SheetView>, slugs: readonly string[] | undefined): SheetView[] {
  return (slugs ?? []).map((slug) => sheets.get(slug)).filter((s): s is SheetView => s !== undefined);
}

function familyView(args: SiteViewArgs, family: EngineFamily): FamilyView {
  const unit = args.project.site.powerUnitFirst;
  return {
    id: family.id,
    label: family.label,
    maker: family.maker,
    href: `families/${family.id}/index.html`,
    notes: family.notes,
    facts: [
      ['Maker', family.maker],
      ['Fuel', family.fuel],
      ['Variants', family.variants.map((v) => v.label).join('; ')],
      ['Defined in', dataPath(family.source.file)],
    ],
    charts: pick(args.sheets, args.plan.byFamily.get(family.id)),
    tables: (args.familyResults.get(family.id) ?? []).flatMap((r) => wallChartTables(r, unit)),
    boats: args.project.boats
      .filter((b) => b.engineFamilyId === family.id)
      .map((b) => ({ label: b.name, href: `boats/${b.id}/index.html` })),
    resultsHref: `results/families/${family.id}.json`,
    csvLinks: [{ label: 'wall-chart pairings as CSV', href: csvPaths.family(family.id) }],
  };
}

/** "4840 rpm (4780–4900 rpm), 252 kW"; no bracket when the whole band prints as one rpm (on the limiter). */
function wotText(band: BandResult, unit: PowerUnit): string {
  const ends = rpmBandText(band.low.speedRpm, band.high.speedRpm);
  const bracket = ends === rpmWithUnit(band.nominal.speedRpm) ? '' : ` (${ends})`;
  return `${rpmWithUnit(band.nominal.speedRpm)}${bracket}, ${powerText(band.nominal.powerKw, unit)}`;
}

/** The boat's headline facts: the calibrated WOT first with the data-sheet one beside it when there are trials. */
function wotFacts(result: BoatResult, unit: PowerUnit, speedUnit: SpeedUnit): [string, CellView][] {
  const cal = result.calibrated;
  const band = cal?.wot ?? result.wot;
  const verdict: CellView = isWarning(band.nominal.status) ? { text: band.verdict, mark: 'warn' } : band.verdict;
  const topKn = (cal?.estimates ?? result.estimates).wotSpeedKn;
  const top: [string, CellView] = ['Top speed', `${speedText(topKn, speedUnit)} ${speedUnit} (estimate)`];
  if (!cal) return [['Predicted WOT', wotText(band, unit)], ['Verdict', verdict], top];
  return [
    ['Calibrated WOT', `${wotText(band, unit)}${calibratedSuffix(result)}`],
    ['Data-sheet WOT', { text: wotText(result.wot, unit), mark: 'dataSheet' }],
    ['Verdict', verdict],
    top,
  ];
}

function boatView(args: SiteViewArgs, boat: Boat): BoatView {
  const result = args.boatResults.get(boat.id) as BoatResult;
  const { powerUnitFirst: unit, speedUnit } = args.project.site;
  const calibration = calibrationView(result, { impellerPct: boat.jet.family.tolerancePct, enginePct: boat.engine.powerTolerancePct });
  const trend = trendView(result);
  return {
    id: boat.id,
    name: boat.name,
    href: `boats/${boat.id}/index.html`,
    notes: boat.notes,
    facts: [
      ['Hull', boat.hull.description],
      ['Engine', result.engineLabel],
      ['Jet unit', result.jetLabel],
      ['Fitted impeller', result.impellerLabel],
      ['Drive line', `ratio ${ratioText(boat.driveLine.ratio)}, efficiency ${(boat.driveLine.efficiency * 100).toFixed(1)} %`],
      ['Water', `${boat.water.kind}, ${boat.water.densityKgM3.toFixed(1)} kg/m³`],
      ['Site', boat.site.label],
      ...wotFacts(result, unit, speedUnit),
      ['Defined in', dataPath(boat.source.file)],
    ],
    links: [
      { label: `Engine family: ${boat.engine.label}`, href: `families/${boat.engineFamilyId}/index.html` },
      { label: `Jet unit: ${boat.jet.label}`, href: `index.html#jet-${boat.jetId}` },
      ...(args.repowerResults.has(boat.id) ? [{ label: `Repower comparison: ${args.repowerResults.get(boat.id)!.options.length} options side by side`, href: repowerHref(boat.id) }] : []),
    ],
    sheets: pick(args.sheets, args.plan.byBoat.get(boat.id)),
    tables: boatTables({ boat, result, unit, speedUnit }),
    ...(calibration ? { calibration } : {}),
    ...(trend ? { trend } : {}),
    resultsHref: `results/boats/${boat.id}.json`,
    csvLinks: [
      { label: 'impellers as CSV', href: csvPaths.boatImpellers(boat.id) },
      { label: 'cruise settings as CSV', href: csvPaths.boatCruise(boat.id) },
    ],
  };
}

const repowerHref = (boatId: string) => `boats/${boatId}/repower/index.html`;

/** A sheet's table cell on a page: the warning colour becomes the page's warning mark (bold words, a barred cell). */
function pageCell(cell: Cell): CellView {
  if (typeof cell === 'string') return cell;
  return cell.colour === WARN ? { text: cell.text, mark: 'warn' } : cell.text;
}

/** A boat's repower comparison page: the same sentence, table and note as its sheet, in the site's units. */
function repowerView(args: SiteViewArgs, boat: Boat, result: RepowerResult): RepowerView {
  const t = repowerTable({ result, boat, site: args.project.site });
  return {
    boatId: boat.id,
    boatName: boat.name,
    href: repowerHref(boat.id),
    boatHref: `boats/${boat.id}/index.html`,
    sentence: repowerSentence(result),
    table: {
      caption: `${boat.name}: ${result.options.length} repower options side by side (estimates)`,
      head: t.columns.map((c) => c.header),
      rows: t.rows.map((r) => r.map(pageCell)),
      numeric: [],
      layout: 'comparison',
    },
    note: repowerNote({ result }),
    sheets: pick(args.sheets, args.plan.byRepower.get(boat.id)),
    resultsHref: `results/boats/${boat.id}.json`,
  };
}

function jetView(jet: JetUnit, project: Project): JetView {
  const unit = project.site.powerUnitFirst;
  const f = jet.family;
  const tol = f.tolerancePct / 100;
  return {
    id: jet.id,
    label: jet.label,
    maker: jet.maker,
    table: {
      caption: `${jet.label} impellers: power absorbed at ${rpmWithUnit(f.referenceSpeedRpm)} impeller speed (exponent ${f.exponent}, tolerance ±${f.tolerancePct} %)`,
      head: ['Impeller', `Rating (${unit})`, `Low (${unit})`, `High (${unit})`],
      numeric: [1, 2, 3],
      rows: jet.impellers.map((i) => [
        i.label,
        ratingCell(i.ratingKw, unit),
        ratingCell(i.ratingKw * (1 - tol), unit),
        ratingCell(i.ratingKw * (1 + tol), unit),
      ]),
    },
  };
}

/** The whole site as the templates see it. */
export function siteView(args: SiteViewArgs): SiteView {
  const { project } = args;
  return {
    shopName: project.site.shopName,
    contactLine: project.site.contactLine,
    dataRevision: project.site.dataRevision,
    dateIso: args.dateIso,
    cautions: cautionsFor(project.site),
    families: project.engines.map((f) => familyView(args, f)),
    familySummary: familySummaryTable(project),
    jets: project.jets.map((j) => jetView(j, project)),
    boats: project.boats.map((b) => boatView(args, b)),
    repowers: project.boats.flatMap((b) => {
      const r = args.repowerResults.get(b.id);
      return r ? [repowerView(args, b, r)] : [];
    }),
    boatSummary: boatSummaryTable(project, args.boatResults),
    books: project.books.map((book) => ({
      id: book.id,
      title: book.title,
      audience: book.audience,
      href: `books/${book.id}/index.html`,
      pdfHref: `books/${book.id}.pdf`,
      sheets: pick(args.sheets, args.plan.byBook.get(book.id)),
      cautions: cautionsFor(withExtraCautions(project.site, book.extraCautions)),
    })),
    schemas: args.schemas.map((name) => ({ label: name, href: `schema/${name}` })),
    guides: args.guides,
    resultsDocHref: args.guides.find((g) => g.slug === 'results')?.href,
  };
}
