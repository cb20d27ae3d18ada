/**
 * What makes a book read like a book: a contents page that lists each sheet with the page it starts on,
 * and on every page of the book a running title and "page n of N" in the footer's page slot. The sheets
 * themselves are the same scenes the site shows; only the book's copy of each page gets its number.
 */
import type { Audience, Paper, SiteConfig } from '../data/types.ts';
import type { Scene, SceneNode, TextNode } from '../scene/types.ts';
import { fitText, measureTextMm } from '../scene/text.ts';
import { assembleScene } from './kit/assemble.ts';
import { label, paragraph } from './kit/block.ts';
import { CONTINUING_CAUTION, cautionsFlow } from './kit/cautions.ts';
import { flowPages, splittable } from './kit/flow.ts';
import { sheetFrame } from './kit/frame.ts';
import { typeScale } from './kit/style.ts';
import { table, type Column } from './kit/table.ts';

/** One sheet of a book as the contents lists it. */
export interface BookEntry {
  readonly title: string;
  /** How many pages the sheet takes. */
  readonly pages: number;
}

const AUDIENCE_WORDS: Readonly<Record<Audience, string>> = { shop: 'the workshop', dealer: 'buyers', owner: 'owners' };

const CONTENTS_COLUMNS: readonly Column[] = [
  { header: 'Sheet', align: 'left', shorten: true, wrap: true },
  { header: 'Page', align: 'right' },
];

/**
 * The contents page(s) of a book on the paper of its first sheet: the title block, a table of the
 * sheets with their pages (numbered from the first page after the contents), and the cautions.
 */
export function bookContentsScene(args: { title: string; audience: Audience; site: SiteConfig; entries: readonly BookEntry[]; paper: Paper; dateIso: string; where: string }): Scene {
  const { site, paper, where } = args;
  const type = typeScale(paper);
  // On a card (A6, 4 × 6 in) the contents keep the cards' 5 mm margin and set the cautions as fine print.
  const card = type.fine < type.small;
  const sheetCount = args.entries.length;
  // The contents' own page count fixes where the sheets start: lay out once to count, then number.
  const lay = (contentsPages: number) => {
    let next = contentsPages + 1;
    const rows = args.entries.map((e) => {
      const first = next;
      next += e.pages;
      return [e.title, e.pages === 1 ? `${first}` : `${first}–${first + e.pages - 1}`];
    });
    const totalPages = next - 1;
    const frameArgs = { paper, site, kind: 'bookContents' as const, title: args.title, subtitle: `${sheetCount} ${sheetCount === 1 ? 'sheet' : 'sheets'} on ${totalPages} pages, for ${AUDIENCE_WORDS[args.audience]}`, dateIso: args.dateIso, type, ...(card ? { marginMm: 5 } : {}), where };
    const laid = flowPages({
      // Contents over several pages carry the built-in cautions in one line at the foot of each (the block is on the last).
      frame: (n) => sheetFrame({ ...frameArgs, ...(contentsPages > 1 ? { pageNote: `page ${n + 1}`, cautionLine: CONTINUING_CAUTION } : {}) }),
      gapMm: 4,
      parts: [
        splittable(rows.length, (from, to, { x, y, widthMm }) => table({ x, y, maxWidthMm: widthMm, columns: CONTENTS_COLUMNS, rows: rows.slice(from, to), measureRows: rows, firstRowIndex: from, noNote: to < rows.length, sizePt: type.body, minSizePt: type.min, fullWidth: true, role: 'contents-table', where }), 0, true),
        { layout: ({ x, y, widthMm }) => paragraph({ x, y, widthMm, text: 'Page numbers are those at the foot of each page of this book.', sizePt: type.small, role: 'contents-note', where }) },
        cautionsFlow({ site, sizePt: card ? type.fine : type.small, headingPt: type.body, where }),
      ],
      where,
    });
    return laid;
  };
  let pages = lay(1);
  // More pages: lay out again numbered from after them, each with the caution line (which may take one more page).
  for (let guess = pages.length; pages.length > 1 && guess <= 16; guess++) {
    pages = lay(guess);
    if (pages.length === guess) break;
  }
  return assembleScene({
    frame: pages[0].frame,
    content: pages[0].nodes,
    more: pages.slice(1).map((p) => ({ frame: p.frame, content: p.nodes })),
    title: `${args.title}: contents`,
    description: `Contents of the book ${args.title}: ${args.entries.map((e) => e.title).join('; ')}.`,
    subject: 'Book contents',
    keywords: ['contents', args.title],
    dateIso: args.dateIso,
    role: 'book-contents',
  });
}

/**
 * The book's copy of each page with its running title and number in the footer's page slot
 * ("Shop wall charts · page 3 of 12", the title shortened with an ellipsis, or left out, where the slot's
 * line has no room for it; the page number is never shortened). A page without a slot is kept as it is.
 */
export function numberBookPages(pages: readonly Scene[], runningTitle: string): Scene[] {
  const total = pages.length;
  return pages.map((page, i) => {
    const children = page.root.children;
    const slot = children.find((n) => n.type === 'rect' && n.role === 'page-number-slot');
    const footer = children.find((n): n is TextNode => n.type === 'text' && n.role === 'estimates-line');
    if (!slot || slot.type !== 'rect' || !footer) return page;
    const number = `page ${i + 1} of ${total}`;
    const right = slot.x + slot.width;
    const room = right - (footer.x + footer.widthMm) - 4;
    const style = { sizePt: footer.sizePt, weight: 'regular' as const };
    const numberMm = measureTextMm({ text: number, ...style });
    const separator = ' · ';
    const titleRoom = room - numberMm - measureTextMm({ text: separator, ...style });
    const title = titleRoom >= 12 ? fitText({ text: runningTitle, ...style, maxWidthMm: titleRoom, minSizePt: footer.sizePt }).text : '';
    const text = title && title !== '\u2026' ? `${title}${separator}${number}` : number;
    const node: SceneNode = label({ x: right, y: footer.y, text, sizePt: footer.sizePt, anchor: 'end', colour: footer.colour, role: 'book-page-number', where: `book ${runningTitle}` });
    return { ...page, root: { ...page.root, children: [...children, node] } };
  });
}
