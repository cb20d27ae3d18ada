/**
 * The frame every sheet shares, one title block on every kind:
 *
 *   SPEC SHEET · page 2                         Data revision 2026-11 · issued 2026-11-02
 *   Boat name (title)                                                     Shop name (bold)
 *   subtitle (engine · jet · impeller)                                        contact line
 *   ───────────────────────────────────────────────────────────────────────────────────────
 *   … content …
 *   ───────────────────────────────────────────────────────────────────────────────────────
 *   Estimates only: confirm by sea trial                                      [page slot]
 *
 * The kind line names the sheet kind in capitals (and the page when the sheet has more than one); the
 * data revision and issue date sit at its right, or on a line of their own under it where they do not
 * fit beside it. The shop's name and contact sit at the title's right, or on a line under the subtitle on
 * narrow paper. The footer carries the estimates line and a slot for the page number that the book
 * builder fills. Returns the box left for content.
 */
import type { Paper, SiteConfig } from '../../data/types.ts';
import type { Box, SceneNode } from '../../scene/types.ts';
import { cropMarks, pageFrame, type PageFrame } from '../../scene/paper.ts';
import { fitText, measureTextMm } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm, paragraph } from './block.ts';
import { LayoutError } from './errors.ts';
import { INK, INK_SOFT, STROKE, WARN, stroke, type TypeScale } from './style.ts';

export interface SheetFrame {
  readonly page: PageFrame;
  /** Header, footer, crop marks. */
  readonly nodes: readonly SceneNode[];
  /** Where the sheet's own content goes (mm). */
  readonly contentBox: Box;
  /** The shop's name: the sheet's author. */
  readonly author: string;
}

/** The sheet kinds' names as the kind line prints them (in capitals). */
export const SHEET_KIND_NAMES = {
  wallChart: 'Wall chart',
  specSheet: 'Spec sheet',
  upgradeSheet: 'Engine upgrade',
  repowerSheet: 'Repower comparison',
  consoleCard: 'Console card',
  bookContents: 'Contents',
  reprintList: 'Print-run checklist',
} as const;
export type SheetKindName = keyof typeof SHEET_KIND_NAMES;

/** The footer's words on every page: the figures are estimates. */
export const ESTIMATES_LINE = 'Estimates only: confirm by sea trial';

/** The kind line's text: "SPEC SHEET", "SPEC SHEET · page 2", "WALL CHART · page 1 of 3". */
export function kindLineText(kind: SheetKindName, pageNote?: string): string {
  const name = SHEET_KIND_NAMES[kind].toUpperCase();
  return pageNote ? `${name} · ${pageNote}` : name;
}

/** Width (mm) reserved at the footer's right for "Page 12 of 40"-style numbering. */
export const PAGE_SLOT_WIDTH_MM = 28;

/** Lays out the frame of a sheet on a paper. */
export function sheetFrame(args: {
  paper: Paper;
  site: SiteConfig;
  /** Which kind of sheet: the kind line names it. */
  kind: SheetKindName;
  /** The page's place in the sheet, after the kind ("page 2", "page 1 of 3"); none on a one-page sheet. */
  pageNote?: string;
  /** The sheet's subject (a boat's name, an engine family): shortened with an ellipsis and a "Full name" line when too long. */
  title: string;
  subtitle: string;
  dateIso: string;
  type: TypeScale;
  /** Safe margin inside the trim (mm); the paper's default when absent. */
  marginMm?: number;
  /** A caution line above the footer (every page of a sheet that continues over pages). */
  cautionLine?: string;
  where: string;
}): SheetFrame {
  const page = pageFrame({ paper: args.paper, ...(args.marginMm !== undefined ? { marginMm: args.marginMm } : {}) });
  const safe = page.safeBox;
  const { type, site, where } = args;
  const right = safe.x + safe.width;
  const nodes: SceneNode[] = [];
  const smallPitch = linePitchMm(type.small, 'bold');

  // 1. The kind line, with the data revision and issue date at its right where they fit.
  const kindText = kindLineText(args.kind, args.pageNote);
  const kindWidth = measureTextMm({ text: kindText, sizePt: type.small, weight: 'bold' });
  let cursor = safe.y;
  nodes.push(label({ x: safe.x, y: cursor + ascentMm(type.small, 'bold'), text: kindText, sizePt: type.small, weight: 'bold', colour: INK_SOFT, role: 'sheet-kind', where }));
  const revisionForms = [`Data revision ${site.dataRevision} · issued ${args.dateIso}`, `Rev. ${site.dataRevision} · ${args.dateIso}`];
  const besideRoom = safe.width - kindWidth - 4;
  const beside = revisionForms.find((t) => measureTextMm({ text: t, sizePt: type.small, weight: 'regular' }) <= besideRoom);
  if (beside) {
    nodes.push(label({ x: right, y: cursor + ascentMm(type.small, 'bold'), text: beside, sizePt: type.small, anchor: 'end', colour: INK_SOFT, role: 'revision-line', where }));
    cursor += smallPitch;
  } else {
    // Narrow paper: the revision on a line of its own, shortened with an ellipsis only if even its short form cannot fit.
    cursor += smallPitch;
    const own = revisionForms.find((t) => measureTextMm({ text: t, sizePt: type.small, weight: 'regular' }) <= safe.width) ?? fitText({ text: revisionForms[1], sizePt: type.small, weight: 'regular', maxWidthMm: safe.width, minSizePt: type.small }).text;
    nodes.push(label({ x: safe.x, y: cursor + ascentMm(type.small), text: own, sizePt: type.small, colour: INK_SOFT, role: 'revision-line', where }));
    cursor += linePitchMm(type.small);
  }
  cursor += 0.8;

  // 2. The title, with the shop's name and contact at its right where both fit on the line.
  const shopName = { text: site.shopName, sizePt: type.heading, weight: 'bold' as const };
  const shopWidth = Math.max(measureTextMm(shopName), measureTextMm({ text: site.contactLine, sizePt: type.small, weight: 'regular' }));
  const titleWidth = measureTextMm({ text: args.title, sizePt: type.title, weight: 'bold' });
  const sideBySide = titleWidth + shopWidth + 6 <= safe.width;
  const titleRoom = sideBySide ? safe.width - shopWidth - 6 : safe.width;
  const title = fitTitle({ title: args.title, type, roomMm: titleRoom, where });
  const titleTop = cursor;
  nodes.push(label({ x: safe.x, y: cursor + ascentMm(title.sizePt, 'bold'), text: title.text, sizePt: title.sizePt, weight: 'bold', role: 'sheet-title', where }));
  cursor += linePitchMm(title.sizePt, 'bold');
  // Lines under the title wrap rather than fail: long engine, jet and shop names take a second line.
  const lines = (text: string, sizePt: number, role: string): void => {
    const p = paragraph({ x: safe.x, y: cursor, widthMm: titleRoom, text, sizePt, colour: INK_SOFT, role, where });
    nodes.push(...p.nodes);
    cursor += p.heightMm;
  };
  if (title.shortened) lines(`Full name: ${args.title}`, type.small, 'full-name-note');
  // 3. The subtitle; on narrow paper the shop's line under it.
  lines(args.subtitle, type.body, 'sheet-subtitle');
  if (sideBySide) {
    nodes.push(label({ x: right, y: titleTop + ascentMm(type.heading, 'bold'), ...shopName, anchor: 'end', role: 'shop-name', where }));
    nodes.push(label({ x: right, y: titleTop + linePitchMm(type.heading, 'bold') + ascentMm(type.small), text: site.contactLine, sizePt: type.small, anchor: 'end', colour: INK_SOFT, role: 'shop-contact', where }));
    cursor = Math.max(cursor, titleTop + linePitchMm(type.heading, 'bold') + linePitchMm(type.small));
  } else {
    lines(`${site.shopName} · ${site.contactLine}`, type.small, 'shop-name');
  }
  const headerBottom = cursor + 1.5;
  nodes.push(rule(safe.x, right, headerBottom, 'header-rule'));

  // Footer: the estimates line and the page slot, at the bottom of the safe box.
  const footerPitch = linePitchMm(type.small);
  const footerTop = safe.y + safe.height - footerPitch;
  const footerBaseline = footerTop + ascentMm(type.small);
  const slotMm = Math.min(PAGE_SLOT_WIDTH_MM, safe.width * 0.2);
  const footerText = fitText({ text: ESTIMATES_LINE, sizePt: type.small, weight: 'regular', maxWidthMm: safe.width - slotMm - 2, minSizePt: type.small }).text;
  const footer = label({ x: safe.x, y: footerBaseline, text: footerText, sizePt: type.small, colour: INK_SOFT, role: 'estimates-line', where });
  const footerRuleY = footerTop - 1.5;
  nodes.push(rule(safe.x, right, footerRuleY, 'footer-rule'), footer, {
    type: 'rect',
    role: 'page-number-slot',
    x: right - slotMm,
    y: footerTop,
    width: slotMm,
    height: footerPitch,
  });
  nodes.push(...cropMarks(page));

  // The caution line sits on the footer rule, a warning bar at its left, the content ends above it.
  let contentBottom = footerRuleY - 4;
  if (args.cautionLine) {
    const barMm = 1.2;
    const words = paragraph({ x: safe.x + barMm + 2, y: 0, widthMm: safe.width - barMm - 2, text: args.cautionLine, sizePt: type.small, role: 'caution-line', where: args.where });
    const top = footerRuleY - 1.5 - words.heightMm;
    const placed = paragraph({ x: safe.x + barMm + 2, y: top, widthMm: safe.width - barMm - 2, text: args.cautionLine, sizePt: type.small, role: 'caution-line', where: args.where });
    nodes.push({ type: 'rect', role: 'caution-bar', x: safe.x, y: top, width: barMm, height: words.heightMm, fill: { colour: WARN } }, ...placed.nodes);
    contentBottom = top - 3;
  }

  const contentTop = headerBottom + 4;
  const contentBox = { x: safe.x, y: contentTop, width: safe.width, height: contentBottom - contentTop };
  return { page, nodes, contentBox, author: args.site.shopName };
}

/**
 * The title at its size, else shrunk to the heading size, else shortened by an ellipsis; a title of which
 * not even a letter fits is a LayoutError.
 */
function fitTitle(args: { title: string; type: TypeScale; roomMm: number; where: string }): { text: string; sizePt: number; shortened: boolean } {
  const { type } = args;
  const whole = fitText({ text: args.title, sizePt: type.title, weight: 'bold', maxWidthMm: args.roomMm, minSizePt: type.heading });
  if (!whole.shortened) return { text: whole.text, sizePt: whole.sizePt, shortened: false };
  if (whole.text === '\u2026') {
    throw new LayoutError(args.where, `the title "${args.title}" does not fit in ${args.roomMm.toFixed(0)} mm even shortened; use wider paper`);
  }
  return { text: whole.text, sizePt: whole.sizePt, shortened: true };
}

function rule(x0: number, x1: number, y: number, role: string): SceneNode {
  return { type: 'path', role, segments: [{ op: 'M', x: x0, y }, { op: 'L', x: x1, y }], stroke: stroke(INK, STROKE.rule) };
}
