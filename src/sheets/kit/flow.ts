/**
 * Flowing a sheet's parts over columns and pages: parts are laid top to bottom in the first slot (a
 * column of a page); a part that does not fit what is left of a slot either splits (a table by rows, the
 * cautions by paragraph: the part that fits stays, the rest goes on) or moves whole to the next slot. The
 * slots are the page's columns, then the next page's. A part taller than an empty slot that cannot split
 * is a LayoutError (nothing inside the documented limits is).
 */
import type { Box, SceneNode } from '../../scene/types.ts';
import type { Block } from './block.ts';
import { LayoutError } from './errors.ts';
import type { SheetFrame } from './frame.ts';
import type { Part } from './stack.ts';

/** The least share of a keep-together part that may stay behind when it splits over a break. */
const KEEP_SHARE = 0.4;

export interface Flowable {
  readonly layout: Part;
  /**
   * The most of the part that fits in maxHeightMm and the rest (to lay in the next slot), or undefined
   * when not even its first piece fits.
   */
  readonly split?: (at: { x: number; y: number; widthMm: number }, maxHeightMm: number) => { head: Block; rest: Flowable } | undefined;
  /**
   * Start this part at the top of a new slot (true: the advice column of a landscape card), or 'back':
   * anywhere but on the first page (the checks on the back of a two-sided card).
   */
  readonly breakBefore?: boolean | 'back';
  /** Move whole to the next slot rather than split, when it fits there whole (tables). */
  readonly keepTogether?: boolean;
}

/** A part that never splits. */
export const whole = (layout: Part, breakBefore: boolean | 'back' = false): Flowable => ({ layout, breakBefore });

export interface FlowedSlot {
  readonly nodes: SceneNode[];
  readonly bottomMm: number;
}

/**
 * Lays the parts into slots; slot(i) gives the i-th slot's box (page = i div columns, 1 column unless
 * given). Returns what went into each slot used, in order.
 */
export function flow(args: { slot: (index: number) => Box; gapMm: number; parts: readonly Flowable[]; where: string; maxSlots?: number; columns?: number }): FlowedSlot[] {
  const columns = args.columns ?? 1;
  const maxSlots = args.maxSlots ?? 16;
  const slots: { nodes: SceneNode[]; bottomMm: number; empty: boolean }[] = [];
  let index = 0;
  const open = (): { box: Box; slot: (typeof slots)[number] } => {
    while (slots.length <= index) {
      const box = args.slot(slots.length);
      slots.push({ nodes: [], bottomMm: box.y, empty: true });
    }
    return { box: args.slot(index), slot: slots[index] };
  };
  const next = (): void => {
    index += 1;
    if (index >= maxSlots) throw new LayoutError(args.where, `the content needs more than ${maxSlots} columns or pages; use larger paper`);
  };
  for (const original of args.parts) {
    let part: Flowable = original;
    if (part.breakBefore === 'back') {
      while (index < columns) next();
    } else if (part.breakBefore && !open().slot.empty) next();
    for (;;) {
      const { box, slot } = open();
      const y = slot.empty ? box.y : slot.bottomMm + args.gapMm;
      const at = { x: box.x, y, widthMm: box.width };
      const room = box.y + box.height - y;
      const block = part.layout(at);
      if (block.heightMm <= room + 1e-6) {
        slot.nodes.push(...block.nodes);
        slot.bottomMm = y + block.heightMm;
        slot.empty = false;
        break;
      }
      // A table that would fit whole at the top of the next slot moves there rather than leave a small
      // piece behind: it splits here only when at least KEEP_SHARE of it fits.
      const fitsNext = part.keepTogether === true && block.heightMm <= args.slot(index + 1).height + 1e-6;
      const split = part.split?.(at, room);
      const piece = split && (slot.empty || !fitsNext || split.head.heightMm >= KEEP_SHARE * block.heightMm) ? split : undefined;
      if (piece) {
        slot.nodes.push(...piece.head.nodes);
        slot.bottomMm = y + piece.head.heightMm;
        slot.empty = false;
        part = piece.rest;
        next();
        continue;
      }
      if (!slot.empty) {
        next();
        continue;
      }
      throw new LayoutError(args.where, `a part of the sheet is ${(block.heightMm - room).toFixed(1)} mm taller than a whole page; use larger paper`);
    }
  }
  return slots.map(({ nodes, bottomMm }) => ({ nodes, bottomMm }));
}

/**
 * A list of pieces (table rows, paragraphs) as a part that splits between pieces: draw(from, to, at)
 * lays pieces [from, to) out (to = count: the last part, which carries any note under it). breakBefore(i)
 * says whether a break may come before piece i (rows that belong together stay together); any when absent.
 */
export function splittable(count: number, draw: (from: number, to: number, at: { x: number; y: number; widthMm: number }) => Block, from = 0, keepTogether = false, breakBefore?: (piece: number) => boolean): Flowable {
  return {
    keepTogether,
    layout: (at) => draw(from, count, at),
    split: (at, maxHeightMm) => {
      // The most pieces that fit, at least one, and never all (then the part would fit whole).
      let best = 0;
      for (let to = from + 1; to < count; to++) {
        if (draw(from, to, at).heightMm > maxHeightMm + 1e-6) break;
        if (!breakBefore || breakBefore(to)) best = to;
      }
      if (best === 0) return undefined;
      return { head: draw(from, best, at), rest: splittable(count, draw, best, keepTogether, breakBefore) };
    },
  };
}

/**
 * Flows parts over the content box of a sheet's pages, in `columns` columns per page (gap columnGapMm);
 * frame(n) is the n-th page's frame (0-based); more than maxPages pages (default: 16 slots) is a LayoutError.
 * Returns each page used with its frame and content.
 */
export function flowPages(args: { frame: (page: number) => SheetFrame; columns?: number; columnGapMm?: number; gapMm: number; parts: readonly Flowable[]; where: string; maxPages?: number }): { frame: SheetFrame; nodes: SceneNode[]; slots: (Box & { bottomMm: number })[] }[] {
  const columns = args.columns ?? 1;
  const gap = args.columnGapMm ?? 5;
  const frames: SheetFrame[] = [];
  const frameOf = (page: number): SheetFrame => {
    while (frames.length <= page) frames.push(args.frame(frames.length));
    return frames[page];
  };
  const slot = (i: number): Box => {
    const box = frameOf(Math.floor(i / columns)).contentBox;
    const width = (box.width - gap * (columns - 1)) / columns;
    return { x: box.x + (i % columns) * (width + gap), y: box.y, width, height: box.height };
  };
  const slots = flow({ slot, gapMm: args.gapMm, parts: args.parts, where: args.where, columns, ...(args.maxPages !== undefined ? { maxSlots: args.maxPages * columns } : {}) });
  const pages = Math.ceil(slots.length / columns);
  return Array.from({ length: pages }, (_, p) => {
    const mine = slots.slice(p * columns, (p + 1) * columns);
    return { frame: frameOf(p), nodes: mine.flatMap((s) => s.nodes), slots: mine.map((s, i) => ({ ...slot(p * columns + i), bottomMm: s.bottomMm })) };
  });
}

/**
 * Chart heights (mm) a flowing sheet tries, largest first: as designed (at most 45 % of the content box),
 * halfway, and the least.
 */
export function chartHeightsMm(boxHeightMm: number, minMm: number, maxMm: number): number[] {
  const top = Math.min(maxMm, Math.max(minMm, boxHeightMm * 0.45));
  return [...new Set([top, (top + minMm) / 2, minMm])];
}

/** The first of the layouts with the fewest pages (the candidates in order of preference). */
export function fewestPages<T>(candidates: readonly (() => readonly T[])[]): readonly T[] {
  let best: readonly T[] | undefined;
  for (const make of candidates) {
    const pages = make();
    if (!best || pages.length < best.length) best = pages;
  }
  return best!;
}
