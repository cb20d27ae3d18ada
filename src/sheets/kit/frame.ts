/**
 * The frame every sheet shares: title block (sheet title and subtitle at the left, shop name and contact
 * at the right), a footer with issue date and data revision, and a slot for the page number that the
 * book builder fills. Returns the box left for content.
 */
import type { Paper, SiteConfig } from '../../data/types.ts';
import type { Box, SceneNode } from '../../scene/types.ts';
import { cropMarks, pageFrame, type PageFrame } from '../../scene/paper.ts';
import { fitText } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm } from './block.ts';
import { LayoutError } from './errors.ts';
import { INK, INK_SOFT, STROKE, stroke, type TypeScale } from './style.ts';

export interface SheetFrame {
  readonly page: PageFrame;
  /** Header, footer, crop marks. */
  readonly nodes: readonly SceneNode[];
  /** Where the sheet's own content goes (mm). */
  readonly contentBox: Box;
}

/** Width (mm) reserved at the footer's right for "Page 12 of 40"-style numbering. */
export const PAGE_SLOT_WIDTH_MM = 28;

/** Lays out the frame of a sheet on a paper. */
export function sheetFrame(args: {
  paper: Paper;
  site: SiteConfig;
  title: string;
  subtitle: string;
  dateIso: string;
  type: TypeScale;
  where: string;
}): SheetFrame {
  const page = pageFrame({ paper: args.paper });
  const safe = page.safeBox;
  const { type } = args;
  const right = safe.x + safe.width;
  const nodes: SceneNode[] = [];

  // Shop block at the top right: name (bold) over contact line.
  const shop = label({ x: right, y: safe.y + ascentMm(type.heading, 'bold'), text: args.site.shopName, sizePt: type.heading, weight: 'bold', anchor: 'end', role: 'shop-name', where: args.where });
  const contact = label({ x: right, y: safe.y + linePitchMm(type.heading, 'bold') + ascentMm(type.small), text: args.site.contactLine, sizePt: type.small, anchor: 'end', colour: INK_SOFT, role: 'shop-contact', where: args.where });
  const shopWidth = Math.max(shop.widthMm, contact.widthMm);

  // Title takes what the shop block leaves; it may shrink to the heading size but is never shortened.
  const titleRoom = safe.width - shopWidth - 6;
  const fitted = fitText({ text: args.title, sizePt: type.title, weight: 'bold', maxWidthMm: titleRoom, minSizePt: type.heading });
  if (fitted.shortened) {
    throw new LayoutError(args.where, `the title "${args.title}" does not fit in ${titleRoom.toFixed(0)} mm beside the shop name; shorten the name or use wider paper`);
  }
  const title = label({ x: safe.x, y: safe.y + ascentMm(fitted.sizePt, 'bold'), text: args.title, sizePt: fitted.sizePt, weight: 'bold', role: 'sheet-title', where: args.where });
  const subtitleTop = safe.y + linePitchMm(fitted.sizePt, 'bold');
  const subFit = fitText({ text: args.subtitle, sizePt: type.body, weight: 'regular', maxWidthMm: titleRoom, minSizePt: type.min });
  if (subFit.shortened) {
    throw new LayoutError(args.where, `the subtitle "${args.subtitle}" does not fit in ${titleRoom.toFixed(0)} mm; shorten it`);
  }
  const subtitle = label({ x: safe.x, y: subtitleTop + ascentMm(subFit.sizePt), text: args.subtitle, sizePt: subFit.sizePt, colour: INK_SOFT, role: 'sheet-subtitle', where: args.where });
  const headerBottom = Math.max(subtitleTop + linePitchMm(subFit.sizePt), safe.y + linePitchMm(type.heading, 'bold') + linePitchMm(type.small)) + 1.5;
  nodes.push(title, subtitle, shop, contact, rule(safe.x, right, headerBottom, 'header-rule'));

  // Footer: one line at the bottom of the safe box.
  const footerPitch = linePitchMm(type.small);
  const footerTop = safe.y + safe.height - footerPitch;
  const footerBaseline = footerTop + ascentMm(type.small);
  const footerText = `Issued ${args.dateIso} · Data revision ${args.site.dataRevision} · Estimates only: confirm by sea trial`;
  const footer = label({ x: safe.x, y: footerBaseline, text: footerText, sizePt: type.small, colour: INK_SOFT, role: 'revision-line', where: args.where });
  if (footer.widthMm > safe.width - PAGE_SLOT_WIDTH_MM - 2) {
    throw new LayoutError(args.where, `the footer line is ${footer.widthMm.toFixed(0)} mm, wider than the ${(safe.width - PAGE_SLOT_WIDTH_MM).toFixed(0)} mm it has; shorten the data revision`);
  }
  const footerRuleY = footerTop - 1.5;
  nodes.push(rule(safe.x, right, footerRuleY, 'footer-rule'), footer, {
    type: 'rect',
    role: 'page-number-slot',
    x: right - PAGE_SLOT_WIDTH_MM,
    y: footerTop,
    width: PAGE_SLOT_WIDTH_MM,
    height: footerPitch,
  });
  nodes.push(...cropMarks(page));

  const contentTop = headerBottom + 4;
  const contentBox = { x: safe.x, y: contentTop, width: safe.width, height: footerRuleY - 4 - contentTop };
  return { page, nodes, contentBox };
}

function rule(x0: number, x1: number, y: number, role: string): SceneNode {
  return { type: 'path', role, segments: [{ op: 'M', x: x0, y }, { op: 'L', x: x1, y }], stroke: stroke(INK, STROKE.rule) };
}
