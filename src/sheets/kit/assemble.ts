/** Turns a laid-out sheet into a Scene, and checks that stacked content stays inside its box. */
import type { Box, Scene, SceneNode } from '../../scene/types.ts';
import { LayoutError } from './errors.ts';
import type { SheetFrame } from './frame.ts';

/** Throws when content stacked down to `bottomMm` overflows the box. */
export function assertFits(box: Box, bottomMm: number, where: string): void {
  const over = bottomMm - (box.y + box.height);
  if (over > 1e-6) throw new LayoutError(where, `the content is ${over.toFixed(1)} mm too tall for the sheet; use larger paper or fewer rows`);
}

/** The finished scene: frame nodes, then the sheet's content. */
export function assembleScene(args: {
  frame: SheetFrame;
  content: readonly SceneNode[];
  title: string;
  description: string;
  subject: string;
  keywords: readonly string[];
  dateIso: string;
  role: string;
}): Scene {
  const { page } = args.frame;
  return {
    widthMm: page.widthMm,
    heightMm: page.heightMm,
    trimBox: page.trimBox,
    safeBox: page.safeBox,
    bleedMm: page.bleedMm,
    title: args.title,
    description: args.description,
    subject: args.subject,
    keywords: args.keywords,
    dateIso: args.dateIso,
    root: { type: 'group', role: args.role, children: [...args.frame.nodes, ...args.content] },
  };
}
