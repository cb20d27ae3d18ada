/**
 * Console card (A6 or 4×6 in), for owners: the expected WOT rpm range in large high-contrast figures,
 * cruise rpm for the usual settings, what to check when WOT rpm is outside the range, and the cautions.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { analyseBoat, type BandResult, type LimitsResult } from '../analysis/index.ts';
import type { MatchStatus } from '../analysis/index.ts';
import { assembleScene, assertFits } from './kit/assemble.ts';
import { ascentMm, label, linePitchMm, paragraph, type Block } from './kit/block.ts';
import { cautionsBlock } from './kit/cautions.ts';
import { rpmBandText, rpmText } from './kit/format.ts';
import { sheetFrame } from './kit/frame.ts';
import { stack, type Part } from './kit/stack.ts';
import { INK, WARN, typeScale } from './kit/style.ts';
import { table } from './kit/table.ts';
import { findBoat, type SheetContext } from './context.ts';
import { speedText, trialDatesText } from './boatTables.ts';
import { exactRpmText } from './trialTables.ts';
import { LayoutError } from './kit/errors.ts';

type BoatRequest = Extract<SheetRequest, { kind: 'consoleCard' }>;

/** Cards are trimmed cleanly and held in the hand: 5 mm keeps text clear of the cut (common practice, no source). */
const CARD_MARGIN_MM = 5;

/** What to look at, in order of how often it is the cause (common practice, no source). */
export const OFF_RANGE_CHECKS: readonly string[] = [
  'Intake grate fouled or blocked.',
  'More load aboard than usual.',
  'Impeller damaged or worn.',
  'Engine fault: have it checked.',
];

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
  return '';
}

/** Builds the console-card scene. */
export function consoleCardScene(request: BoatRequest, ctx: SheetContext): Scene {
  const where = `console card ${request.boatId}`;
  const boat = findBoat(ctx, request.boatId, where);
  const site = ctx.project.site;
  const result = analyseBoat({ boat, project: ctx.project });
  const type = typeScale(request.paper);
  const frame = sheetFrame({ paper: request.paper, site, title: boat.name, subtitle: `Console card · impeller ${result.impellerLabel}`, dateIso: ctx.dateIso, type, marginMm: CARD_MARGIN_MM, where });
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
  // cruise table at body size, and runs the checks on as one paragraph (2); then it drops cruise rows from
  // the end, with a note saying how many are left for the spec sheet.
  const build = (level: 0 | 1 | 2, shownCruise = cruiseRows.length) => {
    const hiddenCruise = cruiseRows.length - shownCruise;
    const figures: Part[] = [
      ({ x, y, widthMm }): Block => {
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
      },
      ...(shownCruise > 0
        ? [({ x, y, widthMm }: { x: number; y: number; widthMm: number }): Block => table({ x, y, maxWidthMm: widthMm, columns: [{ header: 'Cruise', align: 'left', shorten: true }, { header: 'Engine', align: 'right' }, { header: 'Speed (est.)', align: 'right' }], rows: cruiseRows.slice(0, shownCruise), sizePt: level === 2 ? type.body : type.body + 1, minSizePt: type.min, fullWidth: true, role: 'cruise-table', where })]
        : []),
      ...(hiddenCruise > 0
        ? [({ x, y, widthMm }: { x: number; y: number; widthMm: number }): Block => paragraph({ x, y, widthMm, text: `${hiddenCruise} more cruise setting${hiddenCruise > 1 ? 's' : ''} on the spec sheet.`, sizePt: type.small, role: 'cruise-hidden-note', where })]
        : []),
    ];
    const advice: Part[] = [
      ({ x, y, widthMm }): Block => {
        const head = paragraph({ x, y, widthMm, text: 'WOT rpm outside the range? Check:', sizePt: type.body, weight: 'bold', role: 'heading', where });
        let cursor = y + head.heightMm;
        const nodes = [...head.nodes];
        if (level === 2) {
          // A full card runs the checks on as one paragraph.
          const p = paragraph({ x, y: cursor, widthMm, text: OFF_RANGE_CHECKS.join(' · '), sizePt: type.small, role: 'check-item', where });
          return { nodes: [...nodes, ...p.nodes], heightMm: cursor + p.heightMm - y };
        }
        for (const item of OFF_RANGE_CHECKS) {
          const p = paragraph({ x: x + 3, y: cursor, widthMm: widthMm - 3, text: item, sizePt: type.small, role: 'check-item', where });
          nodes.push(label({ x, y: cursor + ascentMm(type.small), text: '•', sizePt: type.small, role: 'bullet', where }), ...p.nodes);
          cursor += p.heightMm;
        }
        return { nodes, heightMm: cursor - y };
      },
      ({ x, y, widthMm }) => cautionsBlock({ site, x, y, widthMm, sizePt: type.small, headingPt: type.body, where }),
    ];
    // Landscape cards read as two columns (figures | advice); portrait cards as one.
    const gapMm = level === 0 ? 2.5 : level === 1 ? 1.5 : 1;
    return box.width > box.height
      ? [
          stack({ x: box.x, y: box.y, widthMm: (box.width - 5) / 2, gapMm, parts: figures }),
          stack({ x: box.x + (box.width + 5) / 2, y: box.y, widthMm: (box.width - 5) / 2, gapMm, parts: advice }),
        ]
      : [stack({ x: box.x, y: box.y, widthMm: box.width, gapMm, parts: [...figures, ...advice] })];
  };
  const fits = (cols: ReturnType<typeof build>) => cols.every((c) => c.bottomMm <= box.y + box.height + 1e-6);
  // Last, the cruise table keeps its first rows only (a note counts the rest) rather than fail.
  const tries = [() => build(0), () => build(1), ...Array.from({ length: cruiseRows.length + 1 }, (_, i) => () => build(2, cruiseRows.length - i))];
  let columns = tries[0]();
  for (const t of tries.slice(1)) {
    if (fits(columns)) break;
    columns = t();
  }
  for (const c of columns) assertFits(box, c.bottomMm, where);
  const laid = { nodes: columns.flatMap((c) => c.nodes) };
  return assembleScene({
    frame,
    content: laid.nodes,
    title: `${boat.name}: console card`,
    description: `Console card for ${boat.name}: expected WOT ${rangeText}, most likely ${rpmText(b.nominal.speedRpm)} rpm; cruise rpm; checks when WOT rpm is outside the range; cautions.`,
    subject: 'Console card',
    keywords: ['console card', boat.id],
    dateIso: ctx.dateIso,
    role: 'console-card',
  });
}
