/**
 * The frame every sheet shares: title block (sheet title and subtitle at the left, shop name and contact
 * at the right), a footer with issue date and data revision, and a slot for the page number that the
 * book builder fills. Returns the box left for content.
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

/** Width (mm) reserved at the footer's right for "Page 12 of 40"-style numbering. */
export const PAGE_SLOT_WIDTH_MM = 28;

/** Lays out the frame of a sheet on a paper. */
export function sheetFrame(args: {
  paper: Paper;
  site: SiteConfig;
  /** The title's name part (a boat's name): shortened with an ellipsis and a "Full name" line when too long. */
  title: string;
  /** Kept whole after the name (": spec sheet"). */
  titleSuffix?: string;
  subtitle: string;
  dateIso: string;
  type: TypeScale;
  /** Safe margin inside the trim (mm); the paper's default when absent. */
  marginMm?: number;
  /** False on a sheet's further pages: the shop's name and contact are on its first page. */
  shop?: boolean;
  /** A caution line above the footer (every page of a sheet that continues over pages). */
  cautionLine?: string;
  where: string;
}): SheetFrame {
  const page = pageFrame({ paper: args.paper, ...(args.marginMm !== undefined ? { marginMm: args.marginMm } : {}) });
  const safe = page.safeBox;
  const { type } = args;
  const right = safe.x + safe.width;
  const nodes: SceneNode[] = [];

  // Shop block at the top right (name over contact); on narrow sheets it goes under the title instead.
  const shopName = { text: args.site.shopName, sizePt: type.heading, weight: 'bold' as const };
  const withShop = args.shop ?? true;
  const shopWidth = withShop ? Math.max(measureTextMm(shopName), measureTextMm({ text: args.site.contactLine, sizePt: type.small, weight: 'regular' })) : -6;
  const suffix = args.titleSuffix ?? '';
  const fullTitle = `${args.title}${suffix}`;
  const titleWidth = measureTextMm({ text: fullTitle, sizePt: type.title, weight: 'bold' });
  const sideBySide = titleWidth + shopWidth + 6 <= safe.width;
  const titleRoom = sideBySide ? safe.width - shopWidth - 6 : safe.width;
  const title = fitTitle({ title: args.title, suffix, type, roomMm: titleRoom, where: args.where });
  nodes.push(label({ x: safe.x, y: safe.y + ascentMm(title.sizePt, 'bold'), text: title.text, sizePt: title.sizePt, weight: 'bold', role: 'sheet-title', where: args.where }));
  let cursor = safe.y + linePitchMm(title.sizePt, 'bold');
  // Lines under the title wrap rather than fail: long engine, jet and shop names take a second line.
  const lines = (text: string, sizePt: number, role: string): void => {
    const p = paragraph({ x: safe.x, y: cursor, widthMm: titleRoom, text, sizePt, colour: INK_SOFT, role, where: args.where });
    nodes.push(...p.nodes);
    cursor += p.heightMm;
  };
  if (title.shortened) lines(`Full name: ${args.title}`, type.small, 'full-name-note');
  lines(args.subtitle, type.body, 'sheet-subtitle');
  if (!withShop) {
    // A further page: title and subtitle only.
  } else if (sideBySide) {
    nodes.push(label({ x: right, y: safe.y + ascentMm(type.heading, 'bold'), ...shopName, anchor: 'end', role: 'shop-name', where: args.where }));
    nodes.push(label({ x: right, y: safe.y + linePitchMm(type.heading, 'bold') + ascentMm(type.small), text: args.site.contactLine, sizePt: type.small, anchor: 'end', colour: INK_SOFT, role: 'shop-contact', where: args.where }));
    cursor = Math.max(cursor, safe.y + linePitchMm(type.heading, 'bold') + linePitchMm(type.small));
  } else {
    lines(`${args.site.shopName} · ${args.site.contactLine}`, type.small, 'shop-name');
  }
  const headerBottom = cursor + 1.5;
  nodes.push(rule(safe.x, right, headerBottom, 'header-rule'));

  // Footer: one line at the bottom of the safe box.
  const footerPitch = linePitchMm(type.small);
  const footerTop = safe.y + safe.height - footerPitch;
  const footerBaseline = footerTop + ascentMm(type.small);
  const slotMm = Math.min(PAGE_SLOT_WIDTH_MM, safe.width * 0.2);
  // The long form where it fits; the cautions block carries the sea-trial advice anyway. On a narrow card
  // the short form, and a data revision too long even for that is shortened with an ellipsis.
  const roomMm = safe.width - slotMm - 2;
  const forms = [
    `Issued ${args.dateIso} · Data revision ${args.site.dataRevision} · Estimates only: confirm by sea trial`,
    `Issued ${args.dateIso} · Data revision ${args.site.dataRevision}`,
    `${args.dateIso} · Rev. ${args.site.dataRevision}`,
  ];
  const footerText = forms.find((t) => measureTextMm({ text: t, sizePt: type.small, weight: 'regular' }) <= roomMm) ?? fitText({ text: forms[2], sizePt: type.small, weight: 'regular', maxWidthMm: roomMm, minSizePt: type.small }).text;
  const footer = label({ x: safe.x, y: footerBaseline, text: footerText, sizePt: type.small, colour: INK_SOFT, role: 'revision-line', where: args.where });
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
 * The title at its size, else shrunk to the heading size, else with the name part shortened by an
 * ellipsis (the suffix kept whole); a title whose suffix alone cannot fit is a LayoutError.
 */
function fitTitle(args: { title: string; suffix: string; type: TypeScale; roomMm: number; where: string }): { text: string; sizePt: number; shortened: boolean } {
  const { type, suffix } = args;
  const whole = fitText({ text: `${args.title}${suffix}`, sizePt: type.title, weight: 'bold', maxWidthMm: args.roomMm, minSizePt: type.heading });
  if (!whole.shortened) return { text: whole.text, sizePt: whole.sizePt, shortened: false };
  const suffixMm = measureTextMm({ text: suffix, sizePt: type.heading, weight: 'bold' });
  const name = fitText({ text: args.title, sizePt: type.heading, weight: 'bold', maxWidthMm: args.roomMm - suffixMm, minSizePt: type.heading });
  if (name.text === '\u2026') {
    throw new LayoutError(args.where, `the title "${args.title}${suffix}" does not fit in ${args.roomMm.toFixed(0)} mm even shortened; use wider paper`);
  }
  return { text: `${name.text}${suffix}`, sizePt: type.heading, shortened: true };
}

function rule(x0: number, x1: number, y: number, role: string): SceneNode {
  return { type: 'path', role, segments: [{ op: 'M', x: x0, y }, { op: 'L', x: x1, y }], stroke: stroke(INK, STROKE.rule) };
}
