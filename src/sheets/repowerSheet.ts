/**
 * Repower comparison sheet (A4 portrait by default), for a buyer choosing between the engines, tunes,
 * jets and impellers a dealer offers for one hull: the answer first (one sentence naming the options
 * whose full throttle lands inside their engine's recommended range), then the options side by side (a
 * column each: full-throttle rpm against that range, top speed, fuel, each cruise setting's rpm, fuel,
 * time and range, the weight an option adds), how to read it, and the cautions. A long table continues on
 * a further page of the same paper, never refused.
 */
import type { SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { analyseRepower } from '../analysis/index.ts';
import { assembleScene } from './kit/assemble.ts';
import { paragraph } from './kit/block.ts';
import { cautionsFlow, CONTINUING_CAUTION } from './kit/cautions.ts';
import { flowPages, whole, type Flowable } from './kit/flow.ts';
import { sheetFrame } from './kit/frame.ts';
import { LayoutError } from './kit/errors.ts';
import { stack } from './kit/stack.ts';
import { typeScale } from './kit/style.ts';
import { findBoat, type SheetContext } from './context.ts';
import { repowerNote, repowerSentence, repowerTable } from './repowerWords.ts';
import { tableFlow } from './specSheet.ts';

type RepowerRequest = Extract<SheetRequest, { kind: 'repowerSheet' }>;

/** Gap between the sheet's parts (mm). */
const GAP_MM = 4;

/** Builds the repower-comparison scene. */
export function repowerSheetScene(request: RepowerRequest, ctx: SheetContext): Scene {
  const where = `repower comparison ${request.boatId}`;
  const boat = findBoat(ctx, request.boatId, where);
  const result = analyseRepower({ boat, project: ctx.project });
  if (!result) throw new LayoutError(where, `boat "${boat.id}" lists no repower_options; add 2 to 6 of them to ${boat.source.file}, or take this sheet out of the book`);
  const site = ctx.project.site;
  const type = typeScale(request.paper);
  const frameArgs = { paper: request.paper, site, title: boat.name, subtitle: `${boat.hull.description} · ${result.options.length} repower options side by side`, dateIso: ctx.dateIso, type, where };
  const frame = sheetFrame({ ...frameArgs, kind: 'repowerSheet' });
  const firstOfMany = sheetFrame({ ...frameArgs, kind: 'repowerSheet', pageNote: 'page 1', cautionLine: CONTINUING_CAUTION });
  const continuedFrame = (n: number) => sheetFrame({ ...frameArgs, kind: 'repowerSheet', pageNote: `page ${n + 1}`, cautionLine: CONTINUING_CAUTION });
  const box = frame.contentBox;
  const sentence = repowerSentence(result);
  const comparison = repowerTable({ result, boat, site });
  const parts: Flowable[] = [
    whole(({ x, y, widthMm }) => paragraph({ x, y, widthMm, text: sentence, sizePt: type.heading, weight: 'bold', role: 'repower-answer', where })),
    tableFlow({ heading: 'The options side by side', columns: comparison.columns, rows: comparison.rows, sizePt: type.body, minSizePt: type.min, headingPt: type.heading, role: 'repower-table', where, breakBefore: (row) => !comparison.keepWithPrevious.includes(row) }),
    whole(({ x, y, widthMm }) => paragraph({ x, y, widthMm, text: repowerNote({ result }), sizePt: type.small, role: 'repower-note', where })),
    cautionsFlow({ site, sizePt: type.body, headingPt: type.heading, where }),
  ];
  const laid = stack({ x: box.x, y: box.y, widthMm: box.width, gapMm: GAP_MM, parts: parts.map((p) => p.layout) });
  const pages = laid.bottomMm <= box.y + box.height + 1e-6 ? [{ frame, nodes: laid.nodes }] : flowPages({ frame: (n) => (n === 0 ? firstOfMany : continuedFrame(n)), gapMm: GAP_MM, parts, where });
  return assembleScene({
    frame: pages[0].frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: `${boat.name}: repower comparison`,
    description: `Repower comparison for ${boat.name}: ${result.options.map((o) => o.label).join(', ')} side by side. ${sentence}`,
    subject: 'Repower comparison sheet',
    keywords: ['repower', boat.id, ...new Set(result.options.map((o) => o.engineFamilyId))],
    dateIso: ctx.dateIso,
    role: 'repower-sheet',
  });
}
