/**
 * Console card (A6 or 4×6 in), for owners at the helm: the expected WOT rpm range at display size, the
 * most likely WOT rpm, the rpm never to pass and each cruise rpm in figures of at least CARD_FIGURE_PT,
 * a warning in bold black beside a warning bar (black on white keeps its contrast in sun, in grey and in
 * any colour vision), what to check when WOT rpm is off the range, and the cautions.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene, SceneNode } from '../scene/types.ts';
import { measureTextMm } from '../scene/text.ts';
import { analyseBoat, type BandResult, type LimitsResult } from '../analysis/index.ts';
import type { MatchStatus, WearFlag } from '../analysis/index.ts';
import { assembleScene } from './kit/assemble.ts';
import { ascentMm, label, linePitchMm, paragraph, type Block } from './kit/block.ts';
import { CARD_CAUTION_LINE, cautionsFlow } from './kit/cautions.ts';
import { flowPages, splittable, whole, type Flowable } from './kit/flow.ts';
import { numberText, rpmBandText, rpmText } from './kit/format.ts';
import { sheetFrame, type SheetFrame } from './kit/frame.ts';
import { INK, INK_SOFT, STROKE, WARN, stroke, typeScale } from './kit/style.ts';
import { findBoat, type SheetContext } from './context.ts';
import { distanceText, distanceUnit, reserveText, speedWithUnit, trialDatesText } from './boatTables.ts';
import { exactRpmText } from './trialTables.ts';
import { LayoutError } from './kit/errors.ts';

type BoatRequest = Extract<SheetRequest, { kind: 'consoleCard' }>;

/** Cards are trimmed cleanly and held in the hand: 5 mm keeps text clear of the cut (common practice, no source). */
const CARD_MARGIN_MM = 5;

/**
 * The least size (pt) of the figures an owner reads at the helm: the most likely WOT rpm, the rpm never
 * to pass and each cruise rpm. 18 pt is about 6.3 mm of cap height, legible at arm's length in a moving
 * boat (common practice, no source).
 */
export const CARD_FIGURE_PT = 18;

/** Width (mm) of the warning bar beside a warning on the card. */
const WARNING_BAR_MM = 1.2;

/**
 * What to look at when WOT rpm is off the card's range, split by direction, each in order of how often
 * it is the cause (common practice, no source). Higher rpm at full throttle: the impeller absorbs less
 * (worn or damaged, air drawn in). Lower rpm: the engine delivers less, or the impeller or boat asks more.
 */
export const OFF_RANGE_CHECKS: Readonly<Record<'higher' | 'lower', { readonly lead: string; readonly heading: string; readonly items: readonly string[] }>> = {
  higher: {
    lead: 'Higher rpm?',
    heading: 'Higher rpm? Check:',
    items: ['Intake grate: weed or a bag.', 'Impeller or wear ring worn.', 'Lighter impeller than listed.'],
  },
  lower: {
    lead: 'Lower rpm?',
    heading: 'Lower rpm? Check:',
    items: ['Weed wound on the impeller.', 'More load, or a fouled hull.', 'Engine short of power.'],
  },
};

/** What the owner must know when the fit harms the engine: the most likely status first, else what the band's ends may do; '' for a good fit. */
export function cardWarning(band: BandResult, limits: LimitsResult): string {
  const window = `${rpmText(limits.windowLowRpm)}–${rpmText(limits.windowHighRpm)} rpm`;
  const firm: Readonly<Partial<Record<MatchStatus, string>>> = {
    revLimited: `Warning: over-revs, runs into the ${rpmText(limits.maxRpm)} rpm limiter. Have a heavier impeller fitted.`,
    belowWindow: `Warning: lugs below the WOT window (${window}). Have a lighter impeller fitted.`,
    noCrossing: 'Warning: no WOT point on the engine data. Have the match checked.',
  };
  if (firm[band.nominal.status]) return firm[band.nominal.status]!;
  const ends = [band.low.status, band.high.status];
  if (ends.includes('revLimited')) return `Caution: may over-rev at the top of the range (limiter ${rpmText(limits.maxRpm)} rpm).`;
  if (ends.includes('belowWindow')) return `Caution: may lug at the low end (window ${window}).`;
  // Above the window but short of the limiter: usable, yet not what the engine maker recommends.
  if (band.nominal.status === 'aboveWindow') return `Caution: runs above the WOT window (${window}). A heavier impeller suits the engine better.`;
  if (ends.includes('aboveWindow')) return `Caution: may run above the WOT window (${window}) at the top of the range.`;
  return '';
}

/** The wear flag as the card says it (short: the boat page and the results say more); '' when not raised. */
export function wearText(flag: WearFlag | undefined): string {
  if (!flag) return '';
  const pct = `${numberText(Math.abs(flag.driftPct), 0, 'wear drift')} %`;
  return flag.direction === 'absorbsLess'
    ? `Wear check: rpm up since first trials (absorbs ${pct} less). Inspect impeller, intake, wear ring; check engine.`
    : `Wear check: rpm down since first trials (${pct} more load). Check engine and weight; inspect impeller, intake.`;
}

/** Builds the console-card scene. */
export function consoleCardScene(request: BoatRequest, ctx: SheetContext): Scene {
  const where = `console card ${request.boatId}`;
  const boat = findBoat(ctx, request.boatId, where);
  const site = ctx.project.site;
  const result = analyseBoat({ boat, project: ctx.project });
  const type = typeScale(request.paper);
  const frameArgs = { paper: request.paper, site, kind: 'consoleCard' as const, title: boat.name, subtitle: `Impeller ${result.impellerLabel} fitted`, dateIso: ctx.dateIso, type, marginMm: CARD_MARGIN_MM, where };
  const frame = sheetFrame(frameArgs);
  const box = frame.contentBox;
  const b = result.calibrated?.wot ?? result.wot;
  const measured = result.lastTrial ?? result.calibrated?.fittedMeasured;
  const wear = wearText(result.trend?.flag);
  const calibratedTo = trialDatesText(result);
  const rangeText = rpmBandText(b.low.speedRpm, b.high.speedRpm);
  const warning = cardWarning(b, result.limits);
  const speedUnit = site.speedUnit;
  // Every cruise setting the engine can reach keeps its row; below planing speed the row says no speed is estimated.
  const cruise = (result.calibrated?.cruise ?? result.cruise)
    .filter((c) => c.status !== 'aboveWot')
    .map((c) => ({
      label: c.label,
      rpm: c.speedRpm !== undefined && c.status === 'ok' ? `${rpmText(c.speedRpm)} rpm` : '–',
      speed:
        c.status === 'belowPlaning'
          ? 'below planing: no estimate'
          : c.speedBasis === 'belowPlaning' || c.speedKn === undefined
            ? 'below planing: speed not estimated'
            : c.hoursWithReserve !== undefined && c.rangeWithReserveNm !== undefined
              ? `~${speedWithUnit(c.speedKn, speedUnit, site.speedAlso)} · ${numberText(c.hoursWithReserve, 1, 'running time')} h · ${distanceText(c.rangeWithReserveNm, speedUnit)} ${distanceUnit(speedUnit)}`
              : `~${speedWithUnit(c.speedKn, speedUnit, site.speedAlso)} (est.)`,
    }));
  const withRange = (result.calibrated?.cruise ?? result.cruise).some((c) => c.rangeWithReserveNm !== undefined && c.status !== 'aboveWot');
  const columns = box.width > box.height ? 2 : 1;

  /** The range at display size, then "most likely" and "never above" as small words over large figures. */
  const wotBlock = (level: 0 | 1 | 2): Flowable =>
    whole(({ x, y, widthMm }): Block => {
      const nodes: SceneNode[] = [label({ x, y: y + ascentMm(type.heading, 'bold'), text: 'Expected WOT rpm', sizePt: type.heading, weight: 'bold', role: 'heading', where })];
      let cursor = y + linePitchMm(type.heading, 'bold');
      // The big figure shrinks only as far as it must to fit the card; below the figure size is an error.
      let sizePt = level === 2 ? Math.round(type.display * 0.9) : type.display;
      const big = () => label({ x, y: cursor + ascentMm(sizePt, 'bold'), text: rangeText, sizePt, weight: 'bold', colour: INK, role: 'wot-range', where });
      let range = big();
      if (range.widthMm > widthMm) {
        sizePt = Math.floor(((sizePt * widthMm) / range.widthMm) * 10) / 10;
        if (sizePt < CARD_FIGURE_PT) throw new LayoutError(where, `the WOT range "${rangeText}" does not fit the card; use a larger card`);
        range = big();
      }
      nodes.push(range);
      cursor += linePitchMm(sizePt, 'bold') + (level === 0 ? 0.8 : 0.3);
      const cells = [
        { word: 'most likely', figure: `${rpmText(b.nominal.speedRpm)} rpm`, role: 'wot-likely' },
        { word: 'never above', figure: `${rpmText(result.limits.maxRpm)} rpm`, role: 'wot-never-above' },
      ];
      const wordPitch = linePitchMm(type.small);
      const figurePitch = linePitchMm(CARD_FIGURE_PT, 'bold');
      const cellWidth = Math.max(...cells.map((c) => measureFigure(c.figure)));
      const sideBySide = 2 * cellWidth + 6 <= widthMm;
      cells.forEach((c, i) => {
        const cx = sideBySide ? x + i * (widthMm / 2) : x;
        const cy = sideBySide ? cursor : cursor + i * (wordPitch + figurePitch);
        nodes.push(
          label({ x: cx, y: cy + ascentMm(type.small), text: c.word, sizePt: type.small, colour: INK_SOFT, role: `${c.role}-word`, where }),
          label({ x: cx, y: cy + wordPitch + ascentMm(CARD_FIGURE_PT, 'bold'), text: c.figure, sizePt: CARD_FIGURE_PT, weight: 'bold', role: c.role, where }),
        );
      });
      cursor += (sideBySide ? 1 : 2) * (wordPitch + figurePitch);
      return { nodes, heightMm: cursor - y };
    });

  /** The measured rpm, the warning beside its bar and where the range comes from; absent when there is none of them. */
  const notesBlock = (level: 0 | 1 | 2): Flowable | undefined => {
    const calibration = calibratedTo && !(level > 0 && measured) ? `Range calibrated to ${calibratedTo}.` : '';
    if (!measured && !warning && !calibration && !wear) return undefined;
    return whole(({ x, y, widthMm }): Block => {
      const nodes: SceneNode[] = [];
      let cursor = y;
      if (measured) {
        const p = paragraph({ x, y: cursor, widthMm, text: `Measured ${exactRpmText(measured.wotRpm)} rpm on ${measured.date}.`, sizePt: type.body + 1, weight: 'bold', role: 'wot-measured', where });
        nodes.push(...p.nodes);
        cursor += p.heightMm + 0.5;
      }
      for (const text of [wear, warning]) {
        if (!text) continue;
        const w = warningBlock({ x, y: cursor, widthMm, text, sizePt: type.body + 1, where });
        nodes.push(...w.nodes);
        cursor += w.heightMm + 0.5;
      }
      if (calibration) {
        const p = paragraph({ x, y: cursor, widthMm, text: calibration, sizePt: type.small, colour: INK_SOFT, role: 'wot-calibration', where });
        nodes.push(...p.nodes);
        cursor += p.heightMm;
      }
      return { nodes, heightMm: Math.max(0, cursor - y - 0.5) };
    });
  };

  /** Cruise rows: the setting and its estimated speed at the left, the rpm in large figures at the right; split between rows. */
  const cruiseFlow = (ownColumn = false): Flowable | undefined => {
    if (cruise.length === 0) return undefined;
    const rowsFrom = (from: number, to: number, { x, y, widthMm }: { x: number; y: number; widthMm: number }): Block => {
      const nodes: SceneNode[] = [];
      let cursor = y;
      if (from === 0) {
        nodes.push(label({ x, y: cursor + ascentMm(type.heading, 'bold'), text: 'Cruise rpm', sizePt: type.heading, weight: 'bold', role: 'heading', where }));
        cursor += linePitchMm(type.heading, 'bold');
        if (withRange) {
          const note = paragraph({ x, y: cursor, widthMm, text: `Speed, time and range are estimates; time and range keep ${reserveText(result)} of the tank in reserve.`, sizePt: type.small, colour: INK_SOFT, role: 'cruise-reserve', where });
          nodes.push(...note.nodes);
          cursor += note.heightMm;
        }
      }
      const rpmWidth = Math.max(...cruise.map((c) => measureFigure(c.rpm)));
      const textWidth = widthMm - rpmWidth - 3;
      for (const [i, row] of cruise.slice(from, to).entries()) {
        if (i > 0 || from > 0) nodes.push({ type: 'path', role: 'cruise-rule', segments: [{ op: 'M', x, y: cursor }, { op: 'L', x: x + widthMm, y: cursor }], stroke: stroke(INK_SOFT, STROKE.hairline) });
        const top = cursor + 0.6;
        const name = paragraph({ x, y: top, widthMm: textWidth, text: row.label, sizePt: type.body, weight: 'bold', role: 'cruise-label', where });
        const speed = paragraph({ x, y: top + name.heightMm, widthMm: textWidth, text: row.speed, sizePt: type.small, colour: INK_SOFT, role: 'cruise-speed', where });
        const figureHeight = linePitchMm(CARD_FIGURE_PT, 'bold');
        const rowHeight = Math.max(name.heightMm + speed.heightMm, figureHeight);
        const rpmTop = top + (rowHeight - figureHeight) / 2;
        nodes.push(...name.nodes, ...speed.nodes, label({ x: x + widthMm, y: rpmTop + ascentMm(CARD_FIGURE_PT, 'bold'), text: row.rpm, sizePt: CARD_FIGURE_PT, weight: 'bold', anchor: 'end', role: 'cruise-rpm', where }));
        cursor = top + rowHeight + 0.6;
      }
      return { nodes, heightMm: cursor - y };
    };
    return { ...splittable(cruise.length, rowsFrom, 0, true), breakBefore: ownColumn };
  };

  /** WOT rpm above the range and below it have different causes: two short lists, each under its own heading. */
  const checksBlock = (compact: boolean, breakBefore: boolean | 'back'): Flowable =>
    whole(({ x, y, widthMm }): Block => {
      let cursor = y;
      const nodes: SceneNode[] = [];
      if (compact) {
        // A full card: one heading, and each list run on as one paragraph led by its direction.
        const head = paragraph({ x, y: cursor, widthMm, text: 'WOT rpm off the range? Check:', sizePt: type.body, weight: 'bold', role: 'heading', where });
        nodes.push(...head.nodes);
        cursor += head.heightMm;
        for (const { lead, items } of [OFF_RANGE_CHECKS.higher, OFF_RANGE_CHECKS.lower]) {
          const p = paragraph({ x, y: cursor, widthMm, text: `${lead} ${items.join(' · ')}`, sizePt: type.small, role: 'check-item', where });
          nodes.push(...p.nodes);
          cursor += p.heightMm;
        }
        return { nodes, heightMm: cursor - y };
      }
      for (const { heading, items } of [OFF_RANGE_CHECKS.higher, OFF_RANGE_CHECKS.lower]) {
        const head = paragraph({ x, y: cursor, widthMm, text: heading, sizePt: type.body, weight: 'bold', role: 'heading', where });
        nodes.push(...head.nodes);
        cursor += head.heightMm;
        for (const item of items) {
          const p = paragraph({ x: x + 3, y: cursor, widthMm: widthMm - 3, text: item, sizePt: type.small, role: 'check-item', where });
          nodes.push(label({ x, y: cursor + ascentMm(type.small), text: '•', sizePt: type.small, role: 'bullet', where }), ...p.nodes);
          cursor += p.heightMm;
        }
      }
      return { nodes, heightMm: cursor - y };
    }, breakBefore);

  const figures = (level: 0 | 1 | 2, cruiseOwnColumn = false): Flowable[] => [wotBlock(level), notesBlock(level), cruiseFlow(cruiseOwnColumn)].filter((f): f is Flowable => f !== undefined);
  const gapOf = (level: 0 | 1 | 2) => (level === 0 ? 2.5 : level === 1 ? 1.5 : 1);
  // Frames are laid once: every layout tried reuses them.
  const memo = (make: (n: number) => SheetFrame) => {
    const made = new Map<number, SheetFrame>();
    return (n: number): SheetFrame => made.get(n) ?? (made.set(n, make(n)), made.get(n)!);
  };
  const back = memo((n) => sheetFrame({ ...frameArgs, pageNote: `page ${n + 1}` }));
  const tryFlow = (make: () => ReturnType<typeof flowPages>) => {
    try {
      return make();
    } catch (e) {
      if (e instanceof LayoutError) return undefined;
      throw e;
    }
  };
  // One side: the figures, then the checks (in a column of their own on a landscape card, unless they may
  // start under the figures) and the cautions; the layout is kept only when it stays on the front.
  const oneSide = (level: 0 | 1 | 2, ownColumn = true) =>
    tryFlow(() =>
      flowPages({
        frame: (n) => (n === 0 ? frame : back(n)),
        columns,
        columnGapMm: 5,
        gapMm: gapOf(level),
        parts: [...figures(level), checksBlock(level === 2, columns === 2 && ownColumn), cautionsFlow({ site, sizePt: type.small, headingPt: type.body, where })],
        where,
      }),
    );
  // Two sides: the front holds the figures with the built-in cautions in one line at its foot; the back
  // the checks and every caution, the shop's too, in fine print.
  const front = sheetFrame({ ...frameArgs, pageNote: 'page 1', cautionLine: CARD_CAUTION_LINE });
  const twoSided = (level: 0 | 1 | 2, cruiseOwnColumn: boolean) =>
    tryFlow(() =>
      flowPages({
        frame: (n) => (n === 0 ? front : back(n)),
        columns,
        columnGapMm: 5,
        gapMm: gapOf(level),
        parts: [...figures(level, cruiseOwnColumn), checksBlock(level === 2, 'back'), cautionsFlow({ site, sizePt: type.fine, headingPt: type.body, where })],
        where,
      }),
    );
  // The most compact one-sided layout first: when even it needs the back, no other one-sided layout is tried.
  const oneSided = [() => oneSide(0), () => oneSide(1), () => oneSide(2), ...(columns === 2 ? [() => oneSide(2, false)] : [])];
  const onOneSide = (laid: ReturnType<typeof oneSide>) => (laid && laid.length === 1 ? laid : undefined);
  const mostCompact = onOneSide(oneSided[oneSided.length - 1]());
  let pages: ReturnType<typeof flowPages> | undefined;
  if (mostCompact) {
    for (const attempt of oneSided.slice(0, -1)) {
      pages = onOneSide(attempt());
      if (pages) break;
    }
    pages ??= mostCompact;
  }
  // Two sides: the first layout whose front holds every figure (the range, its notes and every cruise row),
  // closing gaps and setting the range smaller as it must; else the one with the fewest pages. A landscape
  // front reads best as the range and its notes at the left, the cruise rpm at the right; when the notes
  // take the right column too, the cruise rows follow them.
  if (!pages) {
    const tried: NonNullable<ReturnType<typeof twoSided>>[] = [];
    const rowsOnFront = (p: (typeof tried)[number]) => p[0].nodes.filter((n) => n.role === 'cruise-rpm').length;
    search: for (const level of [0, 1, 2] as const) {
      for (const own of columns === 2 ? [true, false] : [false]) {
        const laid = twoSided(level, own);
        if (!laid) continue;
        if (rowsOnFront(laid) === cruise.length) {
          pages = laid;
          break search;
        }
        tried.push(laid);
      }
    }
    pages ??= tried.find((p) => p.length === Math.min(...tried.map((c) => c.length)));
  }
  if (!pages) throw new LayoutError(where, `the console card's figures do not fit a ${request.paper.size} card even on two sides; use a larger card`);
  return assembleScene({
    frame: pages[0].frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: `${boat.name}: console card`,
    description: `Console card for ${boat.name}: expected WOT ${rangeText}, most likely ${rpmText(b.nominal.speedRpm)} rpm, never above ${rpmText(result.limits.maxRpm)} rpm; cruise rpm; checks when WOT rpm is outside the range; cautions.`,
    subject: 'Console card',
    keywords: ['console card', boat.id],
    dateIso: ctx.dateIso,
    role: 'console-card',
  });
}

/** Width (mm) of a figure at the card's figure size. */
function measureFigure(text: string): number {
  return measureTextMm({ text, sizePt: CARD_FIGURE_PT, weight: 'bold' });
}

/**
 * A warning as the card prints it: bold black words beside a bar in the warning colour. Black on white
 * keeps 21:1 contrast in any light, grey copy or colour vision; the bar and the weight mark it a warning.
 */
export function warningBlock(args: { x: number; y: number; widthMm: number; text: string; sizePt: number; where: string }): Block {
  const p = paragraph({ x: args.x + WARNING_BAR_MM + 2, y: args.y, widthMm: args.widthMm - WARNING_BAR_MM - 2, text: args.text, sizePt: args.sizePt, weight: 'bold', colour: INK, role: 'wot-warning', where: args.where });
  return { nodes: [{ type: 'rect', role: 'warning-bar', x: args.x, y: args.y, width: WARNING_BAR_MM, height: p.heightMm, fill: { colour: WARN } }, ...p.nodes], heightMm: p.heightMm };
}
