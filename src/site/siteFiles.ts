/**
 * The heart of a build: computes every sheet, analysis and download ONCE and writes the binary and
 * data files (SVG, PNG, PDF, results JSON, schemas) into the output folder. The pages are written
 * afterwards by Eleventy from the SiteData this returns.
 */
import { join } from 'node:path';
import type { Book, Paper, Project } from '../data/types.ts';
import { bookPages } from './bookPages.ts';
import { renderPdf, type PdfOptions } from '../render/index.ts';
import { FONT_FILES } from '../scene/fonts.ts';
import { scenePages, type Scene } from '../scene/types.ts';
import type { PrintOverride } from '../standards/paper.ts';
import { PACKAGE_ROOT } from './eleventySetup.ts';
import { GUIDE_IMAGES_DIR, readGuides } from './guides.ts';
import { outputFiles, type OutputFiles } from './outputFiles.ts';
import { bytesSha256, checklistInput, checklistPaper, compareBuilds, MANIFEST_FILE, paperWords, reprintView, REPRINT_JSON, REPRINT_PDF, sheetPages, type PreviousBuild, type ReprintList, type SheetManifest } from './reprint.ts';
import { reprintListScene } from '../sheets/reprintList.ts';
import { boatCruiseCsv, boatImpellersCsv, csvPaths, familyCsv } from './resultsCsv.ts';
import { planSheets, type SheetPlan } from './planSheets.ts';
import { jsonHash, sceneHash, type BuildCache } from './renderCache.ts';
import type { SheetRenderer } from './renderPool.ts';
import { drawSheets, type FaultHook } from './drawSheets.ts';
import { siteResults } from './siteResults.ts';
import { siteView } from './siteViewBuild.ts';
import { SiteData, type SheetView } from './siteView.ts';
import { stableJson } from './stableJson.ts';

export interface SiteCounts {
  readonly sheets: number;
  readonly books: number;
  readonly boats: number;
  readonly families: number;
  /** Files written besides the pages. */
  readonly files: number;
}

export interface SiteFilesArgs {
  readonly project: Project;
  readonly dateIso: string;
  /** --bleed and --crop-marks: override the paper of every sheet (planSheets). */
  readonly print?: PrintOverride;
  /** Output folder (the staging folder of an atomic build). */
  readonly dir: string;
  readonly cache?: BuildCache;
  /** Renders sheets off the main thread; without one, sheets render here. */
  readonly renderer?: SheetRenderer;
  readonly onProgress?: (done: number, total: number) => void;
  /** Only tests set it, to inject a failure at a step. */
  readonly fault?: FaultHook;
  /** What the output folder held before this build (its sheet list), for the reprint list; none by default. */
  readonly previous?: PreviousBuild;
}

/** Every promise settled, then the first failure thrown: nothing is left running when this rejects. */
async function allSettled<T>(promises: readonly Promise<T>[]): Promise<T[]> {
  const results = await Promise.allSettled(promises);
  const failed = results.find((r): r is PromiseRejectedResult => r.status === 'rejected');
  if (failed) throw failed.reason;
  return results.map((r) => (r as PromiseFulfilledResult<T>).value);
}

/** One PDF for the whole book (see bookPages); reused while its scenes and title are unchanged. */
async function bookPdf(args: {
  book: Book;
  project: Project;
  scenes: readonly Scene[];
  firstPaper: Paper;
  dateIso: string;
  cache?: BuildCache;
  renderer?: SheetRenderer;
}): Promise<{ pdf: Uint8Array; pageCount: number; contentsPages: number }> {
  const { book } = args;
  const { pages: scenes, outline } = bookPages(args);
  const sheetPagesCount = args.scenes.reduce((n, s) => n + scenePages(s).length, 0);
  const counted = (pdf: Uint8Array) => ({ pdf, pageCount: scenes.length, contentsPages: scenes.length - sheetPagesCount });
  const key = args.cache ? jsonHash({ title: book.title, audience: book.audience, scenes: scenes.map(sceneHash) }) : '';
  const cached = args.cache?.books.get(key);
  if (cached) return counted(cached);
  const options: PdfOptions = {
    title: book.title,
    subject: `Impeller matching chart book for the ${book.audience}`,
    keywords: ['waterjet', 'impeller', 'matching', book.audience],
    ...(scenes[0]?.author !== undefined ? { author: scenes[0].author } : {}),
    dateIso: args.dateIso,
    outline,
  };
  const pdf = args.renderer ? await args.renderer.renderBook(scenes, options) : await renderPdf(scenes, options);
  args.cache?.books.set(key, pdf);
  return counted(pdf);
}

/** Each drawn sheet as the manifest records it, in plan order. */
function sheetManifest(plan: SheetPlan, drawn: { views: ReadonlyMap<string, SheetView>; pdfHashes: ReadonlyMap<string, string>; contentHashes: ReadonlyMap<string, string> }): SheetManifest['sheets'] {
  const hrefs = sheetPages(plan);
  return plan.sheets.flatMap(({ slug, request }) => {
    const view = drawn.views.get(slug);
    const sha256 = drawn.pdfHashes.get(slug);
    const contentSha256 = drawn.contentHashes.get(slug);
    if (!view || sha256 === undefined || contentSha256 === undefined) return [];
    return [{ slug, title: view.title, kind: request.kind, paper: paperWords(request.paper), pages: 1 + (view.morePages?.length ?? 0), sha256, contentSha256, href: hrefs.get(slug) ?? 'index.html' }];
  });
}

/** The print-run checklist PDF (src/sheets/reprintList.ts), drawn like any sheet and rendered in the pool. */
async function writeChecklist(args: { reprint: ReprintList; previous: PreviousBuild; project: Project; plan: SheetPlan; dateIso: string; files: OutputFiles; renderer?: SheetRenderer }): Promise<void> {
  const { project, dateIso } = args;
  const scene = reprintListScene(checklistInput({ list: args.reprint, previous: args.previous, site: project.site, dateIso, paper: checklistPaper(args.plan) }));
  const options: PdfOptions = { title: scene.title, subject: scene.subject, keywords: scene.keywords, author: project.site.shopName, dateIso };
  const pages = scenePages(scene);
  const pdf = args.renderer ? await args.renderer.renderBook(pages, options) : await renderPdf(pages, options);
  args.files.write(REPRINT_PDF, pdf);
}

/** Writes every sheet, book, results file and schema; returns the data the pages are made from. */
export async function writeSiteFiles(args: SiteFilesArgs): Promise<{ site: SiteData; counts: SiteCounts }> {
  const { project, dateIso } = args;
  const files = outputFiles(args.dir);
  const plan = planSheets(project, args.print);
  const inBooks = new Set([...plan.byBook.values()].flat());
  const drawn = await drawSheets({ project, dateIso, plan, files, keep: inBooks, cache: args.cache, renderer: args.renderer, onProgress: args.onProgress, fault: args.fault });
  const sheets = drawn.views;
  const bookScenes = drawn.scenes;

  // Books render side by side in the pool; files are written in book order.
  const books = project.books
    .map((book) => {
      const slugs = plan.byBook.get(book.id) ?? [];
      const first = plan.sheets.find((p) => p.slug === slugs[0]);
      return { book, project, scenes: slugs.map((slug) => bookScenes.get(slug) as Scene), firstPaper: first?.request.paper ?? { size: 'A4', orientation: 'portrait', bleedMm: 0 } };
    })
    .filter((b) => b.scenes.length > 0);
  const pdfs = await allSettled(
    books.map(async (b) => {
      const pdf = await bookPdf({ ...b, dateIso, cache: args.cache, renderer: args.renderer });
      args.fault?.('books', b.book.id);
      return pdf;
    }),
  );
  books.forEach((b, i) => files.write(`books/${b.book.id}.pdf`, pdfs[i].pdf));

  // The sheet list of this build, compared with the one the output folder held: the reprint list.
  const manifest: SheetManifest = {
    kind: 'sheetManifest',
    version: 1,
    dataRevision: project.site.dataRevision,
    dateIso,
    sheets: sheetManifest(plan, drawn),
    books: books.map((b, i) => ({ id: b.book.id, title: b.book.title, sha256: bytesSha256(pdfs[i].pdf), sheets: plan.byBook.get(b.book.id) ?? [], pages: pdfs[i].pageCount, contentsPages: pdfs[i].contentsPages })),
  };
  const previous = args.previous ?? { kind: 'none' };
  const reprint = compareBuilds(previous, manifest);
  files.write(MANIFEST_FILE, stableJson(manifest));
  files.write(REPRINT_JSON, stableJson(reprint));
  await writeChecklist({ reprint, previous, project, plan, dateIso, files, renderer: args.renderer });

  args.fault?.('files', 'results');
  const { boatResults, repowerResults, familyResults } = siteResults(project, plan);
  for (const [id, result] of boatResults) {
    // A boat with repower options carries its comparison in its record (docs/results.md, "repower").
    const repower = repowerResults.get(id);
    files.write(`results/boats/${id}.json`, stableJson(repower ? { ...result, repower } : result));
    files.write(csvPaths.boatImpellers(id), boatImpellersCsv(result));
    files.write(csvPaths.boatCruise(id), boatCruiseCsv(result));
  }
  for (const [id, charts] of familyResults) {
    files.write(`results/families/${id}.json`, stableJson({ kind: 'engineFamily', engineFamilyId: id, charts }));
    files.write(csvPaths.family(id), familyCsv(charts));
  }

  const schemas = files.copyDir(join(PACKAGE_ROOT, 'schema'), 'schema', '.schema.json');
  // The user guides become pages; their images are copied beside them.
  const guides = readGuides(join(PACKAGE_ROOT, 'docs'));
  if (guides.length > 0) files.copyDir(join(PACKAGE_ROOT, 'docs', 'img'), GUIDE_IMAGES_DIR, '.png');
  // The sheets' own font, so inline SVG and the pages look as the PDFs do on any machine.
  files.copyFile(FONT_FILES.regular, 'assets/fonts/SourceSans3-Regular.ttf');
  files.copyFile(FONT_FILES.bold, 'assets/fonts/SourceSans3-Bold.ttf');

  const view = { ...siteView({ project, dateIso, plan, sheets, boatResults, repowerResults, familyResults, schemas, guides }), reprint: reprintView(reprint, previous) };
  const counts = {
    sheets: plan.sheets.length,
    books: project.books.length,
    boats: project.boats.length,
    families: project.engines.length,
    files: files.count(),
  };
  return { site: new SiteData(view), counts };
}
