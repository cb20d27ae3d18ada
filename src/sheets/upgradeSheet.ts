/**
 * Upgrade sheet (A4 portrait by default): what an engine power change of +5…+50 % does to WOT rpm and
 * power with the fitted impeller, and the power change needed for a given WOT rpm gain, with a chart of
 * the scaled engine curves against the fitted impeller.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { analyseBoat, engineCurveAt, isWarning, type WindowPlace } from '../analysis/index.ts';
import { boatChart, chartImpellersNote } from './chart/boatChart.ts';
import type { EngineSeries } from './chart/seriesTypes.ts';
import { assembleScene } from './kit/assemble.ts';
import { paragraph } from './kit/block.ts';
import { cautionsFlow, CONTINUING_CAUTION } from './kit/cautions.ts';
import { chartHeightsMm, fewestPages, flowPages, whole, type Flowable } from './kit/flow.ts';
import { numberText, percentText, powerText, rpmText } from './kit/format.ts';
import { sheetFrame } from './kit/frame.ts';
import { stack } from './kit/stack.ts';
import { INK, STROKE, WARN, typeScale } from './kit/style.ts';
import { findBoat, type SheetContext } from './context.ts';
import { tableFlow } from './specSheet.ts';
import { speedHeader, speedText, speedWithUnit, trialDatesText } from './boatTables.ts';
import { calibratedChartView } from './calibratedView.ts';

type BoatRequest = Extract<SheetRequest, { kind: 'upgradeSheet' }>;

/** A target rpm against the engine's window, in words: only the first is a goal. */
export const TARGET_WORDS: Readonly<Record<WindowPlace, string>> = {
  withinWindow: 'Within window',
  belowWindow: 'Below window: still lugs',
  aboveWindow: 'Above window: not a target',
  beyondMax: 'Beyond max rpm: never',
};

/** Power changes drawn on the chart (a subset of the table, so the curves stay apart). */
const CHART_STEPS_PCT: readonly number[] = [0, 25, 50];
const CHART_DASHES: readonly (readonly number[])[] = [[], [6, 1.6], [1.2, 1.2]];
/** Chart height as designed, and the least it may shrink to when the tables and notes need the room. */
const CHART_MAX_MM = 88;
const CHART_MIN_MM = 45;
/** Gap between the sheet's parts, and the least it closes to when the page is full. */
const GAP_MM = 4;
const TIGHT_GAP_MM = 2.5;

/** Builds the upgrade-sheet scene. */
export function upgradeSheetScene(request: BoatRequest, ctx: SheetContext): Scene {
  const where = `upgrade sheet ${request.boatId}`;
  const boat = findBoat(ctx, request.boatId, where);
  const site = ctx.project.site;
  const unit = site.powerUnitFirst;
  const result = analyseBoat({ boat, project: ctx.project });
  const type = typeScale(request.paper);
  const frameArgs = { paper: request.paper, site, title: boat.name, subtitle: `${boat.engine.label} · ${boat.jet.label} · impeller ${result.impellerLabel} kept`, dateIso: ctx.dateIso, type, where };
  const frame = sheetFrame({ ...frameArgs, kind: 'upgradeSheet' });
  // A sheet that continues carries the built-in cautions at the foot of every page (the full block is on one).
  const firstOfMany = sheetFrame({ ...frameArgs, kind: 'upgradeSheet', pageNote: 'page 1', cautionLine: CONTINUING_CAUTION });
  const continuedFrame = (n: number) => sheetFrame({ ...frameArgs, kind: 'upgradeSheet', pageNote: `page ${n + 1}`, cautionLine: CONTINUING_CAUTION });
  const box = frame.contentBox;
  const common = { sizePt: type.body, minSizePt: type.min, headingPt: type.heading, where };
  const speedUnit = site.speedUnit;
  const label = (id: string) => result.alternatives.find((a) => a.impellerId === id)?.label ?? id;
  // With sea trials every figure rests on the calibrated model (view: its engine, exponent and ratings).
  const cal = result.calibrated;
  const view = calibratedChartView(boat, result);
  const calibratedTo = trialDatesText(result);
  const onModel = calibratedTo ? `, calibrated to ${calibratedTo}` : '';
  const wot = cal?.wot ?? result.wot;
  const upgrade = cal?.upgrade ?? result.upgrade;
  const rpmGains = cal?.rpmGains ?? result.rpmGains;
  const speedGains = cal?.estimates.speedGains ?? result.speedGains;
  const exponent = cal?.calibration.exponent ?? boat.jet.family.exponent;
  const kText = Number.isInteger(exponent) ? String(exponent) : numberText(exponent, 2, 'exponent');
  const fitted = result.alternatives.find((a) => a.fitted === 'yes');
  const fittedTop = fitted?.calibratedTopSpeedKn ?? fitted?.topSpeedKn;
  const chartEngine = view?.boat.engine ?? boat.engine;
  const engines: EngineSeries[] = CHART_STEPS_PCT.map((pct, i) => ({
    id: `plus-${pct}`,
    label: pct === 0 ? (view ? 'As now (calibrated)' : 'As now') : `${percentText(pct)} power`,
    site: engineCurveAt(chartEngine, { ambient: boat.site.ambient, powerFactor: 1 + pct / 100 }),
    widthMm: pct === 0 ? STROKE.emphasis : STROKE.series,
    dashMm: CHART_DASHES[i],
  }));
  // The chart holds each drawn power change's curve across the window and its new WOT point (up to the
  // maximum rpm), so every curve the chart names crosses the plot.
  const chartRegion = [
    ...upgrade.filter((u) => CHART_STEPS_PCT.includes(u.changePct)).map((u) => ({ speedRpm: Math.min(u.wot.speedRpm, result.limits.maxRpm), powerKw: u.wot.powerKw })),
    ...engines.flatMap((e) => [result.limits.windowLowRpm, result.limits.windowHighRpm].map((rpm) => ({ speedRpm: rpm, powerKw: e.site.powerKwUnchecked(rpm) }))),
  ];
  const upgradeRows = [
    ['As now', rpmText(wot.nominal.speedRpm), powerText(wot.nominal.powerKw, unit), fittedTop !== undefined ? speedText(fittedTop, speedUnit, site.speedAlso) : '–', wot.nominal.statusText, '–'],
    ...upgrade.map((u) => [
      percentText(u.changePct),
      rpmText(u.wot.speedRpm),
      powerText(u.wot.powerKw, unit),
      u.speedKn !== undefined ? speedText(u.speedKn, speedUnit, site.speedAlso) : '–',
      { text: u.wot.statusText, weight: isWarning(u.wot.status) ? ('bold' as const) : ('regular' as const), colour: isWarning(u.wot.status) ? WARN : INK },
      u.best ? `${label(u.best.impellerId)}: ${rpmText(u.best.wotRpm)} rpm, ${speedWithUnit(u.best.speedKn, speedUnit, site.speedAlso)}` : 'none matched',
    ]),
  ];
  // One sentence per speed gain: the power change with the fitted impeller, and with the best re-match.
  const speedGainText = speedGains
    .map((g) => {
      const status = g.fittedStatus && g.fittedStatus !== 'matched' ? ` (${g.fittedStatusText?.toLowerCase()})` : '';
      const kept = g.fittedChangePct !== undefined ? `${percentText(g.fittedChangePct, { digits: 0 })} power with ${result.impellerLabel}${status}` : `not reachable with ${result.impellerLabel} below max rpm`;
      const rematched = g.rematchedChangePct !== undefined && g.rematchedImpellerId !== undefined ? `${percentText(g.rematchedChangePct, { digits: 0 })} with ${label(g.rematchedImpellerId)} matched` : 'no impeller of this jet matched';
      return `${percentText(g.gainPct)} top speed: ${kept}, or ${rematched}.`;
    })
    .join(' ');
  // Only a target inside the window is one to aim for; the others say so in words beside the figure.
  const gainRows = rpmGains.map((g) => {
    const aim = g.window === 'withinWindow';
    return [
      g.kind === 'windowTop' ? `+${rpmText(g.gainRpm)} rpm (window top)` : `+${g.gainRpm} rpm`,
      `${rpmText(g.targetRpm)} rpm`,
      g.status === 'ok' && g.powerChangePct !== undefined && g.window !== 'beyondMax' ? percentText(g.powerChangePct, { digits: 0 }) : '–',
      { text: TARGET_WORDS[g.window], weight: aim ? ('regular' as const) : ('bold' as const), colour: aim ? INK : WARN },
    ];
  });
  const parts = (chartMm: number, compact: boolean): Flowable[] => [
    whole(({ x, y, widthMm }) =>
      paragraph({ x, y, widthMm, text: `Same impeller, more power: WOT rpm rises only a little, as the impeller takes power as rpm to the power ${kText} (x % more power, about x/${kText} % more rpm). Aim only for WOT inside the window (${rpmText(result.limits.windowLowRpm)}–${rpmText(result.limits.windowHighRpm)} rpm); never past the maximum (${rpmText(result.limits.maxRpm)} rpm).`, sizePt: type.body, where })),
    whole(({ x, y, widthMm }) => {
      const chart = boatChart({ ...(view ?? { boat, result }), box: { x, y, width: widthMm, height: chartMm }, sizePt: type.small, powerUnitFirst: unit, engines, points: 'fitted', region: chartRegion, where });
      const notes = [chartImpellersNote(boat), chart.notes.map((n) => `(${n.number}) ${n.text}`).join('  ')].filter((t) => t !== '').join('  ');
      const note = notes ? paragraph({ x, y: y + chartMm + 1, widthMm, text: notes, sizePt: type.small, where }) : { nodes: [], heightMm: 0 };
      return { nodes: [chart.node, ...note.nodes], heightMm: chartMm + 1 + note.heightMm };
    }),
    tableFlow({
      heading: `Engine power change with impeller ${result.impellerLabel}${onModel}`,
      columns: [
        { header: 'Power change', align: 'left' },
        { header: 'WOT rpm', align: 'right' },
        { header: 'Power at WOT', align: 'right' },
        { header: speedHeader(speedUnit, 'Top', site.speedAlso), align: 'right' },
        { header: 'Status', align: 'left', wrap: true },
        { header: 'Best impeller for the new power', align: 'left', wrap: true },
      ],
      rows: upgradeRows,
      ...common,
      role: 'upgrade-table',
    }),
    tableFlow({
      heading: 'Power needed for more WOT rpm',
      columns: [{ header: 'Gain', align: 'left', wrap: true }, { header: 'Target WOT', align: 'right' }, { header: 'Power change needed', align: 'right' }, { header: 'Target against the window', align: 'left', wrap: true }],
      rows: gainRows,
      ...common,
      role: 'rpm-gain-table',
    }),
    whole(({ x, y, widthMm }) =>
      paragraph({ x, y, widthMm, text: `Speeds are estimates (Crouch’s planing formula, hull constant ${Math.round(result.estimates.hull.crouchConstant)}, ${result.estimates.hull.source}). ${compact ? 'Power needed for more top speed left out for room.' : speedGainText}`, sizePt: type.small, role: 'speed-gain-note', where })),
    cautionsFlow({ site, sizePt: type.body, headingPt: type.heading, where }),
  ];
  // The chart gives up height first (its figures are in the table too) down to CHART_MIN_MM while the gaps
  // close; then the speed-gain sentences give way to a note saying so. When even that does not fit one
  // page, the sheet keeps everything and continues on a second page of the same paper.
  const layout = (compact: boolean) => {
    const at = (chartMm: number, gapMm: number) => stack({ x: box.x, y: box.y, widthMm: box.width, gapMm, parts: parts(chartMm, compact).map((f) => f.layout) });
    const first = at(CHART_MAX_MM, GAP_MM);
    if (first.bottomMm <= box.y + box.height) return first;
    const tight = at(CHART_MAX_MM, TIGHT_GAP_MM);
    return at(Math.max(CHART_MIN_MM, CHART_MAX_MM - (tight.bottomMm - (box.y + box.height))), TIGHT_GAP_MM);
  };
  const fits = (l: { bottomMm: number }) => l.bottomMm <= box.y + box.height + 1e-6;
  const full = layout(false);
  const laid = fits(full) ? full : layout(true);
  const pages = fits(laid)
    ? [{ frame, nodes: laid.nodes }]
    : fewestPages(chartHeightsMm(box.height, CHART_MIN_MM, CHART_MAX_MM).map((chartMm) => () => flowPages({ frame: (n) => (n === 0 ? firstOfMany : continuedFrame(n)), gapMm: GAP_MM, parts: parts(chartMm, false), where })));
  return assembleScene({
    frame: pages[0].frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: `${boat.name}: engine upgrade`,
    description: `Engine upgrade sheet for ${boat.name}: WOT rpm and power for engine power changes of +5 to +50 % with impeller ${result.impellerLabel}, and the power change needed for WOT rpm gains.`,
    subject: 'Engine upgrade sheet',
    keywords: ['upgrade', boat.id],
    dateIso: ctx.dateIso,
    role: 'upgrade-sheet',
  });
}
