/** Turns a laid-out sheet (one page or more) into a Scene. */
import type { Box, Scene, SceneNode } from '../../scene/types.ts';
import type { SheetFrame } from './frame.ts';

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
  /** Further pages of the sheet (same paper), each with its own frame. */
  more?: readonly { frame: SheetFrame; content: readonly SceneNode[] }[];
}): Scene {
  const { page } = args.frame;
  const more = args.more ?? [];
  const total = more.length + 1;
  const one = (frame: SheetFrame, content: readonly SceneNode[], n: number): Scene => ({
    widthMm: frame.page.widthMm,
    heightMm: frame.page.heightMm,
    trimBox: frame.page.trimBox,
    safeBox: frame.page.safeBox,
    bleedMm: frame.page.bleedMm,
    title: `${args.title}, page ${n} of ${total}`,
    description: `Page ${n} of ${total}: ${args.description}`,
    subject: args.subject,
    keywords: args.keywords,
    author: frame.author,
    dateIso: args.dateIso,
    root: { type: 'group', role: args.role, children: [...frame.nodes, ...content] },
  });
  return {
    ...(more.length > 0 ? { morePages: more.map((m, i) => one(m.frame, m.content, i + 2)) } : {}),
    widthMm: page.widthMm,
    heightMm: page.heightMm,
    trimBox: page.trimBox,
    safeBox: page.safeBox,
    bleedMm: page.bleedMm,
    title: args.title,
    description: args.description,
    subject: args.subject,
    keywords: args.keywords,
    author: args.frame.author,
    dateIso: args.dateIso,
    root: { type: 'group', role: args.role, children: [...args.frame.nodes, ...args.content] },
  };
}
