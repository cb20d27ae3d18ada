/**
 * The reprint list: what a print run must redo after this build. Each build keeps a small manifest in
 * its output (`sheets.json`: per sheet its slug, title, paper, pages and the SHA-256 of its PDF; per book
 * its sheets and the SHA-256 of its PDF). The next build into the same folder reads it before its own
 * output is swapped in, compares, and writes `reprint.json` (sheets and books added, changed, removed,
 * unchanged), a print-run checklist PDF (`reprint.pdf`, src/sheets/reprintList.ts) and the front page's
 * "what changed" paragraph. A sheet is unchanged exactly when its PDF is byte-identical, so an unchanged
 * sheet's files are the same files (builds are reproducible). A folder without a readable manifest lists
 * every sheet as added.
 */
import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Paper, SiteConfig } from '../data/types.ts';
import { scenePages, type Scene, type SceneNode } from '../scene/types.ts';
import type { LinkView, ReprintView } from './siteView.ts';
import type { ReprintItem, ReprintListInput } from '../sheets/reprintList.ts';
import { OUTPUT_MARKER } from './atomicDir.ts';
import type { SheetPlan } from './planSheets.ts';
import { jsonHash } from './renderCache.ts';

export const MANIFEST_FILE = 'sheets.json';
export const REPRINT_JSON = 'reprint.json';
export const REPRINT_PDF = 'reprint.pdf';

export interface ManifestSheet {
  readonly slug: string;
  readonly title: string;
  readonly kind: string;
  /** "A4 portrait", "4x6 landscape with bleed". */
  readonly paper: string;
  readonly pages: number;
  /** SHA-256 of the sheet's PDF. */
  readonly sha256: string;
  /** SHA-256 of the sheet's scene with the printed issue date and data revision left out (revisionNeutralHash). */
  readonly contentSha256: string;
  /** The page showing it, relative to the site root, with the sheet's fragment. */
  readonly href: string;
}

export interface ManifestBook {
  readonly id: string;
  readonly title: string;
  readonly sha256: string;
  /** Its sheets' slugs in book order. */
  readonly sheets: readonly string[];
  /** Pages of its PDF, and how many of them come before the first sheet (the contents). */
  readonly pages: number;
  readonly contentsPages: number;
}

export interface SheetManifest {
  readonly kind: 'sheetManifest';
  readonly version: 1;
  readonly dataRevision: string;
  readonly dateIso: string;
  readonly sheets: readonly ManifestSheet[];
  readonly books: readonly ManifestBook[];
}

/** What the previous build of the output folder left: its manifest, nothing, or a file that could not be read. */
export type PreviousBuild = { readonly kind: 'manifest'; readonly manifest: SheetManifest } | { readonly kind: 'none' } | { readonly kind: 'unreadable'; readonly reason: string };

export type Change = 'added' | 'changed' | 'removed' | 'unchanged';
const CHANGES: readonly Change[] = ['added', 'changed', 'removed', 'unchanged'];

export interface ReprintSheet {
  readonly slug: string;
  readonly title: string;
  readonly kind: string;
  readonly paper: string;
  readonly pages: number;
  /** Absent for a removed sheet (it has no page any more). */
  readonly href?: string;
  /** Changed sheets: 'content', or 'revisionAndDate' when only the issue date and data revision it prints differ. */
  readonly change?: 'content' | 'revisionAndDate';
}

export interface ReprintBook {
  readonly id: string;
  readonly title: string;
  /** Changed and added books: the PDF to print from. */
  readonly pdfHref?: string;
  /** Changed books: the sheets that are new or changed in it, in book order, and their pages in the book PDF. */
  readonly reprintSheets?: readonly string[];
  readonly reprintPages?: readonly number[];
  /** Changed and added books: the book PDF's page count. */
  readonly pages?: number;
}

type Grouped<T> = { readonly counts: Readonly<Record<Change, number>> } & Readonly<Record<Change, readonly T[]>>;

/** The sheets' groups, with the changed sheets whose only change is the printed date and revision counted apart. */
type GroupedSheets = Grouped<ReprintSheet> & { readonly counts: Readonly<Record<Change | 'revisionAndDateOnly', number>> };

/** reprint.json (documented in docs/results.md, "Reprint list"). */
export interface ReprintList {
  readonly kind: 'reprintList';
  readonly dataRevision: string;
  readonly dateIso: string;
  /** What this build was compared with. */
  readonly basis: 'previousBuild' | 'noPreviousBuild' | 'previousListUnreadable';
  /** The previous build's revision and date (basis 'previousBuild' only). */
  readonly previous?: { readonly dataRevision: string; readonly dateIso: string };
  readonly sheets: GroupedSheets;
  readonly books: Grouped<ReprintBook>;
  readonly checklistHref: string;
}

/**
 * SHA-256 of what a sheet shows apart from its issue date and data revision: the scene (every page) with,
 * in each text that prints the date, the date and the revision replaced by placeholders (and that text's
 * measured width dropped), and the PDF date left out. A sheet whose PDF differs but whose hash is equal
 * differs only in the date and revision it prints. Texts that print the revision without the date are
 * kept as they are, so such a sheet counts as changed in content: the list errs towards reprinting.
 */
export function revisionNeutralHash(scene: Scene, args: { dateIso: string; dataRevision: string }): string {
  const neutral = (node: SceneNode): SceneNode => {
    if (node.type === 'group') return { ...node, children: node.children.map(neutral) };
    if (node.type !== 'text' || !node.text.includes(args.dateIso)) return node;
    return { ...node, text: node.text.split(args.dateIso).join('\u0000date\u0000').split(args.dataRevision).join('\u0000revision\u0000'), widthMm: 0 };
  };
  const page = (p: Scene) => ({ ...p, dateIso: '', root: neutral(p.root), morePages: undefined });
  return jsonHash(scenePages(scene).map(page));
}

/** SHA-256 (hex) of a file's bytes. */
export function bytesSha256(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** "A4 portrait", "4x6 landscape with bleed". */
export function paperWords(p: Paper): string {
  return `${p.size === 'Card4x6' ? '4x6' : p.size} ${p.orientation}${p.bleedMm > 0 ? ' with bleed' : ''}`;
}

/** The page each sheet is shown on first: its boat's page, its family's, else its first book's. */
export function sheetPages(plan: SheetPlan): Map<string, string> {
  const hrefs = new Map<string, string>();
  const add = (folder: string, bySlug: ReadonlyMap<string, readonly string[]>) => {
    for (const [id, slugs] of bySlug) for (const slug of slugs) if (!hrefs.has(slug)) hrefs.set(slug, `${folder}/${id}/index.html#sheet-${slug}`);
  };
  add('boats', plan.byBoat);
  add('boats', new Map([...plan.byRepower].map(([id, slugs]) => [`${id}/repower`, slugs])));
  add('families', plan.byFamily);
  add('books', plan.byBook);
  return hrefs;
}

const isText = (v: unknown): v is string => typeof v === 'string';
const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Reads the manifest of the build in outDir; a missing folder or file is 'none', a broken one 'unreadable'. */
export function readPreviousBuild(outDir: string): PreviousBuild {
  const path = join(outDir, MANIFEST_FILE);
  // Only a folder matchbook wrote holds a build to compare with.
  if (!existsSync(join(outDir, OUTPUT_MARKER)) || !existsSync(path)) return { kind: 'none' };
  let value: unknown;
  try {
    value = JSON.parse(readFileSync(path, 'utf8'));
  } catch (error) {
    return { kind: 'unreadable', reason: `${MANIFEST_FILE} is not JSON (${error instanceof Error ? error.message : String(error)})` };
  }
  const sheetOk = (s: unknown) => isRecord(s) && isText(s.slug) && isText(s.title) && isText(s.sha256) && isText(s.contentSha256) && isText(s.kind) && isText(s.paper) && typeof s.pages === 'number';
  const bookOk = (b: unknown) => isRecord(b) && isText(b.id) && isText(b.title) && isText(b.sha256) && Array.isArray(b.sheets) && b.sheets.every(isText) && typeof b.pages === 'number' && typeof b.contentsPages === 'number';
  if (!isRecord(value) || value.kind !== 'sheetManifest' || value.version !== 1 || !isText(value.dataRevision) || !isText(value.dateIso) || !Array.isArray(value.sheets) || !value.sheets.every(sheetOk) || !Array.isArray(value.books) || !value.books.every(bookOk)) {
    return { kind: 'unreadable', reason: `${MANIFEST_FILE} is not a sheet list this version of matchbook writes` };
  }
  return { kind: 'manifest', manifest: value as unknown as SheetManifest };
}

function grouped<T>(entries: readonly { change: Change; item: T }[]): Grouped<T> {
  const lists = Object.fromEntries(CHANGES.map((c) => [c, entries.filter((e) => e.change === c).map((e) => e.item)])) as Record<Change, T[]>;
  return { counts: Object.fromEntries(CHANGES.map((c) => [c, lists[c].length])) as Record<Change, number>, ...lists };
}

const sheetEntry = (s: ManifestSheet, removed = false): ReprintSheet => ({ slug: s.slug, title: s.title, kind: s.kind, paper: s.paper, pages: s.pages, ...(removed ? {} : { href: s.href }) });

/** Compares this build's manifest with the previous one. */
export function compareBuilds(previous: PreviousBuild, current: SheetManifest): ReprintList {
  const before = previous.kind === 'manifest' ? previous.manifest : undefined;
  const oldSheets = new Map((before?.sheets ?? []).map((s) => [s.slug, s]));
  const newSlugs = new Set(current.sheets.map((s) => s.slug));
  const sheetChange = (s: ManifestSheet): Change => {
    const old = oldSheets.get(s.slug);
    return !old ? 'added' : old.sha256 === s.sha256 ? 'unchanged' : 'changed';
  };
  const entry = (s: ManifestSheet) => {
    const change = sheetChange(s);
    const why = change === 'changed' ? { change: oldSheets.get(s.slug)?.contentSha256 === s.contentSha256 ? ('revisionAndDate' as const) : ('content' as const) } : {};
    return { change, item: { ...sheetEntry(s), ...why } };
  };
  const byChange = grouped([
    ...current.sheets.map(entry),
    ...(before?.sheets ?? []).filter((s) => !newSlugs.has(s.slug)).map((s) => ({ change: 'removed' as const, item: sheetEntry(s, true) })),
  ]);
  const sheets: GroupedSheets = { ...byChange, counts: { ...byChange.counts, revisionAndDateOnly: byChange.changed.filter((s) => s.change === 'revisionAndDate').length } };
  const changeOf = new Map(current.sheets.map((s) => [s.slug, sheetChange(s)]));
  const pagesOf = new Map(current.sheets.map((s) => [s.slug, s.pages]));
  const oldBooks = new Map((before?.books ?? []).map((b) => [b.id, b]));
  const newBooks = new Set(current.books.map((b) => b.id));
  const oldPagesOf = new Map((before?.sheets ?? []).map((s) => [s.slug, s.pages]));
  const bookEntry = (b: ManifestBook): { change: Change; item: ReprintBook } => {
    const old = oldBooks.get(b.id);
    const pages = b.pages;
    if (!old) return { change: 'added', item: { id: b.id, title: b.title, pdfHref: `books/${b.id}.pdf`, pages } };
    if (old.sha256 === b.sha256) return { change: 'unchanged', item: { id: b.id, title: b.title } };
    // The sheets to print again: changed or new anywhere, or new to this book.
    const reprintSheets = b.sheets.filter((slug) => changeOf.get(slug) !== 'unchanged' || !old.sheets.includes(slug));
    // When the book's sheets or their page counts changed, every page number after the contents moves: the whole book.
    const sameLayout = old.sheets.length === b.sheets.length && old.sheets.every((slug, i) => slug === b.sheets[i] && oldPagesOf.get(slug) === pagesOf.get(slug)) && old.contentsPages === b.contentsPages;
    if (!sameLayout) return { change: 'changed', item: { id: b.id, title: b.title, pdfHref: `books/${b.id}.pdf`, pages, reprintSheets, reprintPages: Array.from({ length: pages }, (_, i) => i + 1) } };
    const reprintPages: number[] = [];
    let page = b.contentsPages + 1;
    for (const slug of b.sheets) {
      const n = pagesOf.get(slug) ?? 1;
      if (reprintSheets.includes(slug)) for (let i = 0; i < n; i++) reprintPages.push(page + i);
      page += n;
    }
    return { change: 'changed', item: { id: b.id, title: b.title, pdfHref: `books/${b.id}.pdf`, pages, reprintSheets, reprintPages } };
  };
  const books = grouped([
    ...current.books.map(bookEntry),
    ...(before?.books ?? []).filter((b) => !newBooks.has(b.id)).map((b) => ({ change: 'removed' as const, item: { id: b.id, title: b.title } })),
  ]);
  const basis = previous.kind === 'manifest' ? 'previousBuild' : previous.kind === 'none' ? 'noPreviousBuild' : 'previousListUnreadable';
  return {
    kind: 'reprintList',
    dataRevision: current.dataRevision,
    dateIso: current.dateIso,
    basis,
    ...(before ? { previous: { dataRevision: before.dataRevision, dateIso: before.dateIso } } : {}),
    sheets,
    books,
    checklistHref: REPRINT_PDF,
  };
}

/** "3, 7–8, 10": page numbers as ranges. */
export function pageRanges(pages: readonly number[]): string {
  const out: string[] = [];
  for (let i = 0; i < pages.length; i++) {
    let j = i;
    while (j + 1 < pages.length && pages[j + 1] === pages[j] + 1) j += 1;
    out.push(j > i ? `${pages[i]}\u2013${pages[j]}` : String(pages[i]));
    i = j;
  }
  return out.join(', ');
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** One sentence of counts: "2 sheets changed, 1 new, none removed, 25 unchanged." */
export function countsSentence(list: ReprintList): string {
  const c = list.sheets.counts;
  if (list.basis !== 'previousBuild') return `${plural(c.added, 'sheet')} in all.`;
  const n = (k: number) => (k === 0 ? 'none' : String(k));
  const only = c.revisionAndDateOnly > 0 ? ` (${c.revisionAndDateOnly === c.changed ? 'all' : c.revisionAndDateOnly} only in the issue date and data revision ${c.revisionAndDateOnly === 1 ? 'it prints' : 'they print'})` : '';
  return `${plural(c.changed, 'sheet')} changed${only}, ${n(c.added)} new, ${n(c.removed)} removed, ${n(c.unchanged)} unchanged.`;
}

/** What was compared with what, in words (the checklist's and the front page's opening). */
export function basisSentence(list: ReprintList, previous: PreviousBuild): string {
  if (list.previous) {
    const same = list.previous.dataRevision === list.dataRevision;
    return `Compared with the previous build of this output folder (data revision ${list.previous.dataRevision}, issued ${list.previous.dateIso})${same ? ', which had the same data revision' : ''}.`;
  }
  if (previous.kind === 'unreadable') return `The previous build's sheet list could not be read (${previous.reason}), so every sheet is listed as new.`;
  return 'This output folder held no earlier build, so every sheet is listed as new.';
}

/** When sheets changed under an unchanged data revision, old and new prints read alike: say so. */
function sameRevisionHint(list: ReprintList): string {
  const changed = list.sheets.counts.changed + list.sheets.counts.added;
  return list.previous && list.previous.dataRevision === list.dataRevision && changed > 0
    ? ' The new prints carry the same data revision as the old ones; raise data_revision in site.yaml before printing if they must be told apart.'
    : '';
}

/** The checklist's paper: A4 portrait, or US letter portrait when most of the project's sheets are on US paper. */
export function checklistPaper(plan: SheetPlan): Paper {
  const us = new Set(['Letter', 'Legal', 'Tabloid', 'Card4x6']);
  const onUs = plan.sheets.filter((s) => us.has(s.request.paper.size)).length;
  return { size: onUs * 2 > plan.sheets.length ? 'Letter' : 'A4', orientation: 'portrait', bleedMm: 0 };
}

/** What the checklist lays out: the lists in print-run order, each line a title and where to find it. */
export function checklistInput(args: { list: ReprintList; previous: PreviousBuild; site: SiteConfig; dateIso: string; paper: Paper }): ReprintListInput {
  const { list } = args;
  const sheetLine = (s: ReprintSheet): ReprintItem => ({ title: s.title, detail: `${s.slug}.pdf · ${s.paper}${s.pages > 1 ? ` · ${s.pages} pages` : ''}` });
  const bookLine = (b: ReprintBook, change: Change): ReprintItem => ({
    title: b.title,
    detail:
      change === 'added' || !b.reprintPages || b.reprintPages.length === 0 || b.reprintPages.length === b.pages
        ? `books/${b.id}.pdf · whole book, ${plural(b.pages ?? 0, 'page')}`
        : `books/${b.id}.pdf · ${b.reprintPages.length === 1 ? 'page' : 'pages'} ${pageRanges(b.reprintPages)} of ${b.pages}`,
  });
  const s = list.sheets;
  const b = list.books;
  const content = s.changed.filter((x) => x.change !== 'revisionAndDate');
  const reissued = s.changed.filter((x) => x.change === 'revisionAndDate');
  return {
    site: args.site,
    dateIso: args.dateIso,
    paper: args.paper,
    summary: `${basisSentence(list, args.previous)} ${countsSentence(list)} Print what is listed below, tick it off, and put each new print in place of the old one, so that no outdated sheet stays in use.${reissued.length > 0 ? ' Sheets changed only in their printed date and revision need a reprint only where every sheet in use must show the current revision.' : ''}${sameRevisionHint(list)}`,
    sections: [
      { heading: `Changed sheets to print (${content.length})`, items: content.map(sheetLine) },
      { heading: `New sheets to print (${s.counts.added})`, items: s.added.map(sheetLine) },
      { heading: `Books to reprint (${b.counts.changed + b.counts.added})`, items: [...b.changed.map((x) => bookLine(x, 'changed')), ...b.added.map((x) => bookLine(x, 'added'))] },
      { heading: `Changed only in the printed issue date and data revision (${reissued.length})`, items: reissued.map(sheetLine) },
      { heading: `Removed sheets to take out of use (${s.counts.removed})`, items: s.removed.map((x) => ({ title: x.title, detail: `${x.slug} · ${x.paper}` })) },
      { heading: `Removed books to take out of use (${b.counts.removed})`, items: b.removed.map((x) => ({ title: x.title, detail: `books/${x.id}` })) },
    ],
    closing:
      list.basis !== 'previousBuild'
        ? ''
        : s.counts.changed + s.counts.added + s.counts.removed === 0 && b.counts.changed + b.counts.added + b.counts.removed === 0
          ? `Nothing to reprint: every sheet and book is the same as before, byte for byte.`
          : s.counts.unchanged + b.counts.unchanged === 0
            ? 'No sheet or book is unchanged.'
            : `${plural(s.counts.unchanged, 'sheet')} and ${plural(b.counts.unchanged, 'book')} did not change: their files are the same as before, byte for byte, and need no reprint.`,
  };
}

/** How many changed or new sheets the front page names; the rest are counted, and the checklist has them all. */
const NAMED_ON_FRONT_PAGE = 40;

/** The front page's "what changed" paragraph: counts, the changed (and new) sheets by name, the downloads. */
export function reprintView(list: ReprintList, previous: PreviousBuild): ReprintView {
  // A title two sheets share (a card on two papers) is told apart by its paper.
  const all = [...list.sheets.changed, ...list.sheets.added];
  const shared = new Set(all.map((s) => s.title).filter((t, i, ts) => ts.indexOf(t) !== i));
  const link = (s: ReprintSheet): LinkView => ({ label: shared.has(s.title) ? `${s.title} (${s.paper})` : s.title, href: s.href ?? '' });
  const named = (sheets: readonly ReprintSheet[]) => ({ links: sheets.slice(0, NAMED_ON_FRONT_PAGE).map(link), more: Math.max(0, sheets.length - NAMED_ON_FRONT_PAGE) });
  const compared = list.basis === 'previousBuild';
  return {
    heading: `What changed in data revision ${list.dataRevision}`,
    summary: `${basisSentence(list, previous)} ${countsSentence(list)}`,
    changed: named(list.sheets.changed.filter((x) => x.change !== 'revisionAndDate')),
    revisionAndDateOnly: list.sheets.counts.revisionAndDateOnly,
    added: compared ? named(list.sheets.added) : { links: [], more: 0 },
    checklistHref: REPRINT_PDF,
    jsonHref: REPRINT_JSON,
  };
}
