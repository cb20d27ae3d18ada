/**
 * The print-run checklist: after a build into an output folder that held an earlier build, which sheets
 * to print (changed and new ones), which to take out of use (removed ones), which pages of each book to
 * reprint, and how many stay as they are. One tick box a line. A long list flows onto further pages of
 * the same paper; every page carries the built-in cautions whole at its foot, the last the full cautions block. The site layer
 * compares the builds and hands the lists in (src/site/reprint.ts); this only lays them out.
 */
import type { Paper, SiteConfig } from '../data/types.ts';
import type { Scene, SceneNode } from '../scene/types.ts';
import { measureTextMm } from '../scene/text.ts';
import { assembleScene } from './kit/assemble.ts';
import { ascentMm, label, linePitchMm, paragraph, wrapLines, type Block } from './kit/block.ts';
import { BUILT_IN_CAUTIONS, cautionsFlow } from './kit/cautions.ts';
import { LayoutError } from './kit/errors.ts';
import { flowPages, whole, type Flowable } from './kit/flow.ts';
import { sheetFrame } from './kit/frame.ts';
import { INK, INK_SOFT, STROKE, stroke, typeScale } from './kit/style.ts';

/** One line of the checklist: what to print or take out, and the words that identify it on the shelf. */
export interface ReprintItem {
  readonly title: string;
  /** Right of the title, in softer ink: the file's name, the paper, the pages. */
  readonly detail: string;
}

export interface ReprintListInput {
  readonly site: SiteConfig;
  readonly dateIso: string;
  readonly paper: Paper;
  /** The opening sentences: what was compared with what, and the counts. */
  readonly summary: string;
  /** Lists in print-run order (changed sheets, new sheets, books, removed sheets); empty ones are left out. */
  readonly sections: readonly { readonly heading: string; readonly items: readonly ReprintItem[] }[];
  /** The closing sentence: what stays as it is ('' for none). */
  readonly closing: string;
}

const GAP_MM = 4;
/** A list's lines, with no limit on their number: each page takes what fits, the rest goes on. */
const MAX_PAGES = 10_000;

type At = { x: number; y: number; widthMm: number };

/** One item set in a width: title and detail on one line when both fit, else the title's lines, then the detail's. */
interface RowLines {
  readonly title: readonly string[];
  readonly detail: readonly string[];
  /** Whether the detail shares the title's (only) line, right-aligned. */
  readonly sameLine: boolean;
  readonly lineCount: number;
}

/**
 * A heading and its tick-box lines as a part that splits between items (the heading repeated,
 * "continued"). Nothing is shortened: a title and detail that do not share one line take two or more.
 */
function listFlow(args: { heading: string; items: readonly ReprintItem[]; sizePt: number; headingPt: number; where: string; continued?: boolean; rows?: Map<number, RowLines[]> }): Flowable {
  const pitch = linePitchMm(args.sizePt) * 1.2;
  const gapMm = pitch * 0.25;
  const boxMm = Math.min(3.2, pitch * 0.7);
  const indent = boxMm + 2.5;
  const size = { sizePt: args.sizePt, where: args.where };
  // Rows are set once per width and shared with the rest of the list after a split.
  const rowsCache = args.rows ?? new Map<number, RowLines[]>();
  const rowsAt = (widthMm: number): RowLines[] => {
    const cached = rowsCache.get(widthMm);
    if (cached) return cached;
    const room = widthMm - indent;
    const rows = args.items.map((item): RowLines => {
      const titleMm = measureTextMm({ text: item.title, sizePt: args.sizePt, weight: 'bold' });
      const detailMm = measureTextMm({ text: item.detail, sizePt: args.sizePt, weight: 'regular' });
      if (titleMm + 4 + detailMm <= room) return { title: [item.title], detail: [item.detail], sameLine: true, lineCount: 1 };
      const title = wrapLines({ text: item.title, weight: 'bold', widthMm: room, ...size });
      const detail = wrapLines({ text: item.detail, weight: 'regular', widthMm: room, ...size });
      return { title, detail, sameLine: false, lineCount: title.length + detail.length };
    });
    rowsCache.set(widthMm, rows);
    return rows;
  };
  const rowMm = (r: RowLines) => r.lineCount * pitch + gapMm;
  const headingOf = (at: At) => paragraph({ x: at.x, y: at.y, widthMm: at.widthMm, text: args.continued ? `${args.heading} (continued)` : args.heading, sizePt: args.headingPt, weight: 'bold', role: 'heading', where: args.where });
  const lay = (rows: readonly RowLines[], at: At, heading: Block): SceneNode[] => {
    const nodes = [...heading.nodes];
    let top = at.y + heading.heightMm + 1;
    const line = (text: string, n: number, weight: 'bold' | 'regular', end: boolean, role: string) =>
      label({ x: end ? at.x + at.widthMm : at.x + indent, y: top + n * pitch + ascentMm(args.sizePt), text, sizePt: args.sizePt, weight, anchor: end ? 'end' : 'start', colour: weight === 'bold' ? INK : INK_SOFT, role, where: args.where });
    for (const r of rows) {
      const baseline = top + ascentMm(args.sizePt);
      nodes.push({ type: 'rect', role: 'tick-box', x: at.x + 0.3, y: baseline - boxMm + 0.3, width: boxMm, height: boxMm, stroke: stroke(INK, STROKE.rule) });
      r.title.forEach((t, i) => nodes.push(line(t, i, 'bold', false, 'reprint-title')));
      r.detail.forEach((t, i) => nodes.push(line(t, r.sameLine ? 0 : r.title.length + i, 'regular', r.sameLine, 'reprint-detail')));
      top += rowMm(r);
    }
    return nodes;
  };
  // The height is added up without laying the lines out; they are laid out only when the flow places
  // them, so a list of thousands is not set again for every page it is tried on.
  const draw = (count: number, at: At): Block => {
    const heading = headingOf(at);
    const rows = rowsAt(at.widthMm).slice(0, count);
    let nodes: SceneNode[] | undefined;
    return {
      get nodes() {
        return (nodes ??= lay(rows, at, heading));
      },
      heightMm: heading.heightMm + 1 + rows.reduce((sum, r) => sum + rowMm(r), 0) - (rows.length > 0 ? gapMm : 0),
    };
  };
  return {
    keepTogether: false,
    layout: (at) => draw(args.items.length, at),
    split: (at, maxHeightMm) => {
      const rows = rowsAt(at.widthMm);
      let height = headingOf(at).heightMm + 1 - gapMm;
      let fit = 0;
      while (fit < rows.length - 1 && height + rowMm(rows[fit]) <= maxHeightMm + 1e-6) height += rowMm(rows[fit++]);
      if (fit < 1) return undefined;
      const rest = new Map([...rowsCache].map(([w, r]) => [w, r.slice(fit)]));
      return { head: draw(fit, at), rest: listFlow({ ...args, items: args.items.slice(fit), continued: true, rows: rest }) };
    },
  };
}

/** The checklist's scene: as many pages of its paper as the lists need. */
export function reprintListScene(input: ReprintListInput): Scene {
  const where = 'print-run checklist';
  const type = typeScale(input.paper);
  const frameArgs = { paper: input.paper, site: input.site, kind: 'reprintList' as const, title: 'What to reprint', subtitle: `Sheets and books changed, new and removed since the previous build, for data revision ${input.site.dataRevision}`, dateIso: input.dateIso, type, where };
  const para = (text: string, role: string): Flowable => whole(({ x, y, widthMm }) => paragraph({ x, y, widthMm, text, sizePt: type.body, role, where }));
  const parts: Flowable[] = [
    para(input.summary, 'reprint-summary'),
    ...input.sections.filter((s) => s.items.length > 0).map((s) => listFlow({ heading: s.heading, items: s.items, sizePt: type.body, headingPt: type.heading, where })),
    ...(input.closing !== '' ? [para(input.closing, 'reprint-closing')] : []),
    cautionsFlow({ site: input.site, sizePt: type.body, headingPt: type.heading, where }),
  ];
  const single = sheetFrame(frameArgs);
  // A checklist page is handed round the print room on its own: each carries the built-in cautions whole.
  const cautionLine = `Cautions: ${BUILT_IN_CAUTIONS.join(' ')}`;
  const firstOfMany = sheetFrame({ ...frameArgs, pageNote: 'page 1', cautionLine });
  const continued = (n: number) => sheetFrame({ ...frameArgs, pageNote: `page ${n + 1}`, cautionLine });
  const pages = onePage(() => flowPages({ frame: () => single, gapMm: GAP_MM, parts, where, maxPages: 1 })) ?? flowPages({ frame: (n) => (n === 0 ? firstOfMany : continued(n)), gapMm: GAP_MM, parts, where, maxPages: MAX_PAGES });
  return assembleScene({
    frame: pages[0].frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: 'Print-run checklist',
    description: `Print-run checklist for data revision ${input.site.dataRevision}. ${input.summary}${input.closing !== '' ? ` ${input.closing}` : ''}`,
    subject: 'Print-run checklist',
    keywords: ['reprint', 'checklist', input.site.dataRevision],
    dateIso: input.dateIso,
    role: 'reprint-list',
  });
}

/** The layout when everything fits on one page, else undefined (then the list continues over pages). */
function onePage<T>(lay: () => T): T | undefined {
  try {
    return lay();
  } catch (error) {
    if (error instanceof LayoutError) return undefined;
    throw error;
  }
}
