/** A book as its PDF holds it: the contents page, then each sheet's pages, numbered; one bookmark per sheet. */
import type { Book, Paper, Project } from '../data/types.ts';
import { scenePages, type Scene } from '../scene/types.ts';
import { bookContentsScene, numberBookPages } from '../sheets/bookPages.ts';
import { withExtraCautions } from '../sheets/index.ts';

/**
 * A book's pages: a contents page on the paper of its first sheet, then every page of every sheet (a sheet
 * that continues puts all its pages in), each with the book's title and its page number at its foot; and
 * one bookmark per sheet, at its first page.
 */
export function bookPages(args: { book: Book; project: Project; scenes: readonly Scene[]; firstPaper: Paper; dateIso: string }): { pages: Scene[]; outline: (string | undefined)[] } {
  const { book } = args;
  const contents = bookContentsScene({
    title: book.title,
    audience: book.audience,
    site: withExtraCautions(args.project.site, book.extraCautions),
    entries: args.scenes.map((s) => ({ title: s.title, pages: scenePages(s).length })),
    paper: args.firstPaper,
    dateIso: args.dateIso,
    where: `book ${book.id}: contents`,
  });
  const parts = [contents, ...args.scenes];
  const pages = numberBookPages(parts.flatMap(scenePages), book.title);
  const outline = parts.flatMap((s) => scenePages(s).map((_, i) => (i === 0 ? (s === contents ? 'Contents' : s.title) : undefined)));
  return { pages, outline };
}

