/**
 * Console card (A6 or 4×6 in), for owners: the expected WOT rpm range in large high-contrast figures,
 * cruise rpm for the usual settings, what to check when WOT rpm is outside the range, and the cautions.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene, SceneNode } from '../scene/types.ts';
import { analyseBoat, type BandResult, type LimitsResult } from '../analysis/index.ts';
import type { MatchStatus } from '../analysis/index.ts';
import { assembleScene } from './kit/assemble.ts';
import { ascentMm, label, linePitchMm, paragraph, type Block } from './kit/block.ts';
import { cautionsFlow } from './kit/cautions.ts';
import { flowPages, splittable, whole, type Flowable } from './kit/flow.ts';
import { rpmBandText, rpmText } from './kit/format.ts';
import { sheetFrame } from './kit/frame.ts';
import { stack } from './kit/stack.ts';
import { INK, WARN, typeScale } from './kit/style.ts';
import { table, type Column } from './kit/table.ts';
import { findBoat, type SheetContext } from './context.ts';
import { speedText, trialDatesText } from './boatTables.ts';
import { exactRpmText } from './trialTables.ts';
import { LayoutError } from './kit/errors.ts';

type BoatRequest = Extract<SheetRequest, { kind: 'consoleCard' }>;

/** Cards are trimmed cleanly and held in the hand: 5 mm keeps text clear of the cut (common practice, no source). */
const CARD_MARGIN_MM = 5;

const CRUISE_COLUMNS: readonly Column[] = [{ header: 'Cruise', align: 'left', shorten: true, wrap: true }, { header: 'Engine', align: 'right' }, { header: 'Speed (est.)', align: 'right' }];

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

/** Builds the console-card scene. */
export function consoleCardScene(request: BoatRequest, ctx: SheetContext): Scene {
  const where = `console card ${request.boatId}`;
  const boat = findBoat(ctx, request.boatId, where);
  const site = ctx.project.site;
  const result = analyseBoat({ boat, project: ctx.project });
  const type = typeScale(request.paper);
  const frameArgs = { paper: request.paper, site, title: boat.name, dateIso: ctx.dateIso, type, marginMm: CARD_MARGIN_MM, where };
  const frame = sheetFrame({ ...frameArgs, subtitle: `Console card · impeller ${result.impellerLabel}` });
  const backFrame = (n: number) => sheetFrame({ ...frameArgs, shop: false, subtitle: `Console card, page ${n + 1} · impeller ${result.impellerLabel}` });
  const box = frame.contentBox;
  const b = result.calibrated?.wot ?? result.wot;
  const measured = result.calibrated?.fittedMeasured;
  const calibratedTo = trialDatesText(result);
  const rangeText = rpmBandText(b.low.speedRpm, b.high.speedRpm);
  const warning = cardWarning(b, result.limits);
  const speedUnit = site.speedUnit;
  const cruiseRows = (result.calibrated?.cruise ?? result.cruise)
    .filter((c) => c.speedRpm !== undefined && c.status === 'ok')
    .map((c) => [c.label, { text: `${rpmText(c.speedRpm as number)} rpm`, weight: 'bold' as const }, c.speedKn !== undefined ? `~${speedText(c.speedKn, speedUnit)} ${speedUnit}` : '–']);
  // A card first tries its full layout (level 0); a full card then closes its gaps and leaves out the line
  // naming the trials when it shows the measured rpm (1); then it sets the big range a tenth smaller and the
  // cruise table at body size, and runs the checks on as one paragraph (2); then it continues on the back.
  const parts = (level: 0 | 1 | 2, cautionPt: number = type.small, adviceOwnColumn = true): { figures: Flowable[]; advice: Flowable[] } => {
    const figures: Flowable[] = [
      whole(({ x, y, widthMm }): Block => {
        const head = label({ x, y: y + ascentMm(type.heading, 'bold'), text: 'Expected WOT rpm', sizePt: type.heading, weight: 'bold', role: 'heading', where });
        // The big figure shrinks only as far as it must to fit the card; below the heading size is an error.
        let sizePt = level === 2 ? Math.round(type.display * 0.9) : type.display;
        const big = () => label({ x, y: y + linePitchMm(type.heading, 'bold') + ascentMm(sizePt, 'bold'), text: rangeText, sizePt, weight: 'bold', colour: INK, role: 'wot-range', where });
        let node = big();
        if (node.widthMm > widthMm) {
          sizePt = Math.floor(((sizePt * widthMm) / node.widthMm) * 10) / 10;
          if (sizePt < type.heading) throw new LayoutError(where, `the WOT range "${rangeText}" does not fit the card; use a larger card`);
          node = big();
        }
        const subY = y + linePitchMm(type.heading, 'bold') + linePitchMm(sizePt, 'bold');
        // With sea trials: the tachometer reading of the fitted impeller first (what the owner compares with), then where the range comes from.
        const lines = [
          ...(measured ? [{ text: `Measured ${exactRpmText(measured.wotRpm)} rpm on ${measured.date}.`, sizePt: type.body + 1, role: 'wot-measured' }] : []),
          { text: `Most likely ${rpmText(b.nominal.speedRpm)} rpm. Never above ${rpmText(result.limits.maxRpm)} rpm.`, sizePt: type.body, role: 'wot-note' },
          ...(warning ? [{ text: warning, sizePt: type.body, role: 'wot-warning' }] : []),
        ...(calibratedTo && !(level > 0 && measured) ? [{ text: `Range calibrated to ${calibratedTo}.`, sizePt: type.small, role: 'wot-calibration' }] : []),
        ];
        let cursor = subY;
        const subNodes = lines.flatMap((l) => {
          const p = paragraph({ x, y: cursor, widthMm, text: l.text, sizePt: l.sizePt, weight: l.role === 'wot-calibration' ? 'regular' : 'bold', colour: l.role === 'wot-warning' ? WARN : INK, role: l.role, where });
          cursor += p.heightMm;
          return p.nodes;
        });
        return { nodes: [head, node, ...subNodes], heightMm: cursor - y };
      }),
      ...(cruiseRows.length > 0
        ? [
            splittable(
              cruiseRows.length,
              (from, to, { x, y, widthMm }) => table({ x, y, maxWidthMm: widthMm, columns: CRUISE_COLUMNS, rows: cruiseRows.slice(from, to), measureRows: cruiseRows, firstRowIndex: from, noNote: to < cruiseRows.length, sizePt: level === 2 ? type.body : type.body + 1, minSizePt: type.min, fullWidth: true, role: 'cruise-table', where }),
              0,
              true,
            ),
          ]
        : []),
    ];
    const advice: Flowable[] = [
      whole(({ x, y, widthMm }): Block => {
        // WOT rpm above the range and below it have different causes: two short lists, each under its own heading.
        let cursor = y;
        const nodes: SceneNode[] = [];
        if (level === 2) {
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
      }, adviceOwnColumn),
      cautionsFlow({ site, sizePt: cautionPt, headingPt: type.body, where }),
    ];
    return { figures, advice };
  };
  const columns = box.width > box.height ? 2 : 1;
  const build = (level: 0 | 1 | 2) => {
    const { figures, advice } = parts(level);
    // Landscape cards read as two columns (figures | advice); portrait cards as one.
    const gapMm = level === 0 ? 2.5 : level === 1 ? 1.5 : 1;
    return columns === 2
      ? [
          stack({ x: box.x, y: box.y, widthMm: (box.width - 5) / 2, gapMm, parts: figures.map((f) => f.layout) }),
          stack({ x: box.x + (box.width + 5) / 2, y: box.y, widthMm: (box.width - 5) / 2, gapMm, parts: advice.map((f) => f.layout) }),
        ]
      : [stack({ x: box.x, y: box.y, widthMm: box.width, gapMm, parts: [...figures, ...advice].map((f) => f.layout) })];
  };
  const fits = (cols: ReturnType<typeof build>) => cols.every((c) => c.bottomMm <= box.y + box.height + 1e-6);
  // A full card closes its gaps and sets its figures tighter (levels 1 and 2); when even that does not fit,
  // it keeps everything at full size and continues on the back (a second page of the same paper): the
  // cruise table moves there whole or splits between rows, the cautions split between paragraphs.
  let laid = build(0);
  for (const level of [1, 2] as const) {
    if (fits(laid)) break;
    laid = build(level);
  }
  // Still too full for a landscape card: the checks and cautions may start under the figures where the
  // left column has room, flowing on into the right column, as long as the whole card stays on its front.
  const frontOnly = (): SceneNode[] | undefined => {
    if (fits(laid) || columns !== 2) return undefined;
    const { figures, advice } = parts(2, type.small, false);
    const flowed = flowPages({ frame: (n) => (n === 0 ? frame : backFrame(n)), columns, columnGapMm: 5, gapMm: 1, parts: [...figures, ...advice], where });
    return flowed.length === 1 ? flowed[0].nodes : undefined;
  };
  const flowedFront = frontOnly();
  // On the back the cautions are fine print (7 pt on A6 and 4 × 6 in); the front says where they are.
  const pages = fits(laid)
    ? [{ frame, nodes: laid.flatMap((c) => c.nodes) }]
    : flowedFront
      ? [{ frame, nodes: flowedFront }]
      : (() => {
        // The compact checks (level 2) leave the front the most room for the cautions.
        const { figures, advice } = parts(2, type.fine);
        const flowed = flowPages({ frame: (n) => (n === 0 ? frame : backFrame(n)), columns, columnGapMm: 5, gapMm: 1.5, parts: [...figures, ...advice], where });
        const front = flowed[0];
        const hasCautions = front.nodes.some(function has(n): boolean {
          return n.role === 'cautions' || (n.type === 'group' && n.children.some(has));
        });
        const last = front.slots[front.slots.length - 1];
        const pitch = linePitchMm(type.small, 'bold');
        const text = `Cautions: see ${flowed.length === 2 ? 'page 2' : flowed.length === 3 ? 'pages 2 and 3' : `pages 2 to ${flowed.length}`}.`;
        if (!hasCautions && last.y + last.height - last.bottomMm >= pitch + 1) {
          front.nodes.push(label({ x: last.x, y: last.y + last.height - pitch + ascentMm(type.small, 'bold'), text, sizePt: type.small, weight: 'bold', colour: WARN, role: 'cautions-pointer', where }));
        }
        return flowed;
      })();
  return assembleScene({
    frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: `${boat.name}: console card`,
    description: `Console card for ${boat.name}: expected WOT ${rangeText}, most likely ${rpmText(b.nominal.speedRpm)} rpm; cruise rpm; checks when WOT rpm is outside the range; cautions.`,
    subject: 'Console card',
    keywords: ['console card', boat.id],
    dateIso: ctx.dateIso,
    role: 'console-card',
  });
}
