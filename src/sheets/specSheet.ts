/**
 * Boat spec sheet (A4 portrait by default), for a buyer: the answer first (top speed, full-throttle rpm and
 * whether the impeller suits the engine, cruising speed and fuel), a match chart cropped to the operating
 * region, cruising, the other impellers in plain words, what is fitted, sea trials, the cautions, and a
 * short technical note with the working at the end.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { analyseBoat, isWarning } from '../analysis/index.ts';
import { boatChart, chartImpellersNote } from './chart/boatChart.ts';
import { cruiseRows, fittedRows, trialDatesText, wotHeadline } from './boatTables.ts';
import { buyerAnswer, otherImpellerRows, technicalNote } from './buyerWords.ts';
import { calibratedChartView } from './calibratedView.ts';
import { MAX_TRIAL_ROWS, trialRows } from './trialTables.ts';
import { assembleScene } from './kit/assemble.ts';
import { paragraph, type Block } from './kit/block.ts';
import { cautionsFlow, CONTINUING_CAUTION } from './kit/cautions.ts';
import { chartHeightsMm, fewestPages, flowPages, splittable, whole, type Flowable } from './kit/flow.ts';
import { sheetFrame } from './kit/frame.ts';
import { stack, type Part } from './kit/stack.ts';
import { INK, WARN, typeScale } from './kit/style.ts';
import { table, type Cell, type Column } from './kit/table.ts';
import { findBoat, type SheetContext } from './context.ts';

type BoatRequest = Extract<SheetRequest, { kind: 'specSheet' | 'consoleCard' | 'upgradeSheet' }>;

/** Match-chart height: as designed, and the least it may shrink to for sea trials and notes. */
const CHART_MAX_MM = 82;
const CHART_MIN_MM = 45;
/** Gap between the sheet's parts, and the least it closes to when the page is full. */
const GAP_MM = 4;
const TIGHT_GAP_MM = 2.5;
/** What the chart's marks mean, under it. */
const CHART_KEY = 'Marks: where full throttle settles with each impeller; bars: the range it may fall in.';

/** A heading followed by a table, as one part. */
export function tablePart(args: TableFlowArgs): Part {
  return tableFlow(args).layout;
}

interface TableFlowArgs {
  heading: string;
  columns: Column[];
  rows: Cell[][];
  header?: boolean;
  sizePt: number;
  minSizePt: number;
  headingPt: number;
  role: string;
  where: string;
  /** Whether the table may break before row i (over columns or pages); between any rows when absent. */
  breakBefore?: (row: number) => boolean;
}

/** A heading and a table that splits between rows over columns and pages (the heading says "continued", widths stay). */
export function tableFlow(args: TableFlowArgs): Flowable {
  return splittable(args.rows.length, (from, to, { x, y, widthMm }) => {
    const heading = from > 0 ? `${args.heading} (continued)` : args.heading;
    const h = paragraph({ x, y, widthMm, text: heading, sizePt: args.headingPt, weight: 'bold', role: 'heading', where: args.where });
    const t = table({ x, y: y + h.heightMm + 0.5, maxWidthMm: widthMm, columns: args.columns, rows: args.rows.slice(from, to), measureRows: args.rows, firstRowIndex: from, noNote: to < args.rows.length, sizePt: args.sizePt, minSizePt: args.minSizePt, fullWidth: true, header: args.header, role: args.role, where: `${args.where}: ${args.heading}` });
    return { nodes: [...h.nodes, ...t.nodes], heightMm: h.heightMm + 0.5 + t.heightMm };
  }, 0, true, args.breakBefore);
}

/** Builds the spec-sheet scene. */
export function specSheetScene(request: BoatRequest, ctx: SheetContext): Scene {
  const where = `spec sheet ${request.boatId}`;
  const boat = findBoat(ctx, request.boatId, where);
  const site = ctx.project.site;
  const unit = site.powerUnitFirst;
  const result = analyseBoat({ boat, project: ctx.project });
  const type = typeScale(request.paper);
  const frameArgs = { paper: request.paper, site, title: boat.name, subtitle: `${boat.engine.label} · ${boat.jet.label} · impeller ${result.impellerLabel}`, dateIso: ctx.dateIso, type, where };
  const frame = sheetFrame({ ...frameArgs, kind: 'specSheet' });
  // A sheet that continues carries the built-in cautions at the foot of every page (the full block is on one).
  const firstOfMany = sheetFrame({ ...frameArgs, kind: 'specSheet', pageNote: 'page 1', cautionLine: CONTINUING_CAUTION });
  const continuedFrame = (n: number) => sheetFrame({ ...frameArgs, kind: 'specSheet', pageNote: `page ${n + 1}`, cautionLine: CONTINUING_CAUTION });
  const box = frame.contentBox;
  const shownWot = result.calibrated?.wot ?? result.wot;
  const warn = isWarning(shownWot.nominal.status);
  const view = calibratedChartView(boat, result);
  const calibratedTo = trialDatesText(result);
  const tolerances = { impellerPct: boat.jet.family.tolerancePct, enginePct: boat.engine.powerTolerancePct };
  const common = { sizePt: type.body, minSizePt: type.min, headingPt: type.heading, where };
  const fitted = fittedRows(boat, result, unit);
  const speedUnit = site.speedUnit;
  const answer = buyerAnswer(result, speedUnit, site);
  const cruise = cruiseRows(boat, result, unit, speedUnit, site);
  const cruiseHeading = !calibratedTo ? 'Cruising' : `Cruising, calibrated to ${calibratedTo}${cruise.sameRpmAsDataSheet ? ' (rpm as on the data sheet)' : ''}`;
  const others = otherImpellerRows(result, speedUnit, site.speedAlso);
  const trialCount = result.calibrated?.calibration.trials.length ?? 0;
  const parts = (chartMm: number, trials: ReturnType<typeof trialRows>, compact: boolean): Flowable[] => [
    whole(({ x, y, widthMm }) => {
      const head = paragraph({ x, y, widthMm, text: answer.headline, sizePt: type.heading, weight: 'bold', role: 'buyer-headline', where });
      let cursor = y + head.heightMm + 0.5;
      const nodes = [...head.nodes];
      const lines: [string, 'bold' | 'regular', typeof INK][] = [[answer.match, warn ? 'bold' : 'regular', warn ? WARN : INK], [answer.cruise, 'regular', INK]];
      for (const [text, weight, colour] of lines) {
        if (text === '') continue;
        const line = paragraph({ x, y: cursor, widthMm, text, sizePt: type.body, weight, colour, role: 'buyer-answer', where });
        nodes.push(...line.nodes);
        cursor += line.heightMm;
      }
      return { nodes, heightMm: cursor - y };
    }),
    whole(({ x, y, widthMm }) => {
      const chart = boatChart({ ...(view ?? { boat, result }), box: { x, y, width: widthMm, height: chartMm }, sizePt: type.small, powerUnitFirst: unit, where });
      const notes = [CHART_KEY, chartImpellersNote(boat), chart.notes.map((n) => `(${n.number}) ${n.text}`).join('  ')].filter((t) => t !== '').join('  ');
      const note = paragraph({ x, y: y + chartMm + 1, widthMm, text: notes, sizePt: type.small, where });
      return { nodes: [chart.node, ...note.nodes], heightMm: chartMm + 1 + note.heightMm };
    }),
    tableFlow({ heading: cruiseHeading, columns: cruise.columns, rows: cruise.rows, ...common, role: 'cruise-table' }),
    tableFlow({ heading: calibratedTo ? `Other impellers for this jet, calibrated to ${calibratedTo}` : 'Other impellers for this jet', ...others, ...common, role: 'alternatives-table' }),
    tableFlow({ heading: 'What is fitted', ...fitted, header: false, ...common, role: 'fitted-table' }),
    ...(trials.rows.length > 0
      ? [
          tableFlow({ heading: 'Sea trials', columns: trials.columns, rows: trials.rows, ...common, role: 'trials-table' }),
        ]
      : []),
    cautionsFlow({ site, sizePt: type.body, headingPt: type.heading, where }),
    whole(({ x, y, widthMm }) => {
      const hidden = trials.hidden > 0 ? (trials.rows.length > 0 ? ` ${trials.hidden} older trial(s) not listed.` : ` The ${trials.hidden} sea trial(s) are not listed, for room.`) : '';
      const refused = result.trialsNotUsed ? ` ${result.trialsNotUsed}` : '';
      return paragraph({ x, y, widthMm, text: `${technicalNote(result, tolerances, { compact })}${refused}${trialCount > 0 ? hidden : ''}`, sizePt: type.small, role: 'technical-note', where });
    }),
  ];
  // The chart gives up height when the tables, sea trials and notes need it (its figures are in the tables
  // too), down to CHART_MIN_MM, while the gaps between parts close from GAP_MM to TIGHT_GAP_MM; then older
  // sea trials leave the table (down to the latest one); then the band and estimate explanations shrink to
  // one line saying so; then the trial table goes (the note counts it). When even that does not fit one
  // page, the sheet keeps everything at its full size and continues on a second page of the same paper
  // (tables split between rows, the cautions between paragraphs).
  const onePage = (p: Flowable[], gapMm: number) => stack({ x: box.x, y: box.y, widthMm: box.width, gapMm, parts: p.map((f) => f.layout) });
  const layout = (shownTrials: number, compact: boolean) => {
    const trials = trialRows(result, boat.jet.family.tolerancePct, { maxRows: shownTrials });
    const at = (chartMm: number, gapMm: number) => onePage(parts(chartMm, trials, compact), gapMm);
    const first = at(CHART_MAX_MM, GAP_MM);
    const over = first.bottomMm - (box.y + box.height);
    if (over <= 0) return first;
    const tight = at(CHART_MAX_MM, TIGHT_GAP_MM);
    const overTight = tight.bottomMm - (box.y + box.height);
    return at(Math.max(CHART_MIN_MM, CHART_MAX_MM - overTight), TIGHT_GAP_MM);
  };
  const most = Math.min(trialCount, MAX_TRIAL_ROWS);
  const steps: { shown: number; compact: boolean }[] = [
    ...Array.from({ length: Math.max(1, most) }, (_, i) => ({ shown: most - i, compact: false })),
    { shown: Math.min(most, 1), compact: true },
    { shown: 0, compact: true },
  ];
  const fits = (l: { bottomMm: number }) => l.bottomMm <= box.y + box.height + 1e-6;
  let laid = layout(steps[0].shown, steps[0].compact);
  for (const step of steps.slice(1)) {
    if (fits(laid)) break;
    laid = layout(step.shown, step.compact);
  }
  const pages = fits(laid)
    ? [{ frame, nodes: laid.nodes }]
    : fewestPages(chartHeightsMm(box.height, CHART_MIN_MM, CHART_MAX_MM).map((chartMm) => () => flowPages({ frame: (n) => (n === 0 ? firstOfMany : continuedFrame(n)), gapMm: GAP_MM, parts: parts(chartMm, trialRows(result, boat.jet.family.tolerancePct, { maxRows: most }), false), where })));
  return assembleScene({
    frame: pages[0].frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: `${boat.name}: spec sheet`,
    description: `Spec sheet for ${boat.name}: ${buyerAnswer(result, site.speedUnit, site).headline}; ${wotHeadline(result, unit)}; cruising, every impeller of ${boat.jet.label}, and cautions.`,
    subject: 'Boat spec sheet',
    keywords: ['spec sheet', boat.id, boat.engineFamilyId, boat.jetId],
    dateIso: ctx.dateIso,
    role: 'spec-sheet',
  });
}
