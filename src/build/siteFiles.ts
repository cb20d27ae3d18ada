/**
 * The heart of a build: computes every sheet, analysis and download ONCE and writes the binary and
 * data files (SVG, PNG, PDF, results JSON, schemas) into the output folder. The pages are written
 * afterwards by Eleventy from the SiteData this returns.
 */
import { join } from 'node:path';
import { analyseBoat, analyseWallChart } from '../analysis/index.ts';
import type { Project, SheetRequest } from '../data/types.ts';
import { renderPdf } from '../render/index.ts';
import type { Scene } from '../scene/types.ts';
import { sheetScene } from '../sheets/index.ts';
import { PACKAGE_ROOT } from './eleventySetup.ts';
import { inlineSvg } from './inlineSvg.ts';
import { outputFiles } from './outputFiles.ts';
import { planSheets } from './planSheets.ts';
import type { BuildCache } from './renderCache.ts';
import { renderSheetFiles } from './sheetFiles.ts';
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
  /** Output folder (the staging folder of an atomic build). */
  readonly dir: string;
  readonly cache?: BuildCache;
  readonly onProgress?: (done: number, total: number) => void;
}

/** Page-size name for CSS @page rules, from the media size in tenths of a millimetre. */
function printPageName(scene: Scene): string {
  return `p${Math.round(scene.widthMm * 10)}x${Math.round(scene.heightMm * 10)}`;
}

function sheetView(slug: string, request: SheetRequest, scene: Scene, svg: string): SheetView {
  return {
    slug,
    kind: request.kind,
    title: scene.title,
    description: scene.description,
    svgInline: inlineSvg(svg, slug),
    printPage: printPageName(scene),
    widthMm: scene.widthMm,
    heightMm: scene.heightMm,
    downloads: { svg: `sheets/${slug}.svg`, png: `sheets/${slug}.png`, pdf: `sheets/${slug}.pdf` },
  };
}

/** Writes every sheet, book, results file and schema; returns the data the pages are made from. */
export async function writeSiteFiles(args: SiteFilesArgs): Promise<{ site: SiteData; counts: SiteCounts }> {
  const { project, dateIso } = args;
  const files = outputFiles(args.dir);
  const plan = planSheets(project);
  const inBooks = new Set([...plan.byBook.values()].flat());
  const bookScenes = new Map<string, Scene>();
  const sheets = new Map<string, SheetView>();
  for (const [index, { slug, request }] of plan.sheets.entries()) {
    const scene = sheetScene(request, { project, dateIso });
    const rendered = await renderSheetFiles(scene, { cache: args.cache });
    files.write(`sheets/${slug}.svg`, rendered.svg);
    files.write(`sheets/${slug}.pdf`, rendered.pdf);
    files.write(`sheets/${slug}.png`, rendered.png);
    sheets.set(slug, sheetView(slug, request, scene, rendered.svg));
    if (inBooks.has(slug)) bookScenes.set(slug, scene);
    args.onProgress?.(index + 1, plan.sheets.length);
  }

  for (const book of project.books) {
    const scenes = (plan.byBook.get(book.id) ?? []).map((slug) => bookScenes.get(slug) as Scene);
    if (scenes.length === 0) continue;
    const pdf = await renderPdf(scenes, {
      title: book.title,
      subject: `Impeller matching chart book for the ${book.audience}`,
      keywords: ['waterjet', 'impeller', 'matching', book.audience],
      dateIso,
      outline: scenes.map((s) => s.title),
    });
    files.write(`books/${book.id}.pdf`, pdf);
  }

  const boatResults = new Map(project.boats.map((boat) => [boat.id, analyseBoat({ boat, project })]));
  for (const [id, result] of boatResults) files.write(`results/boats/${id}.json`, stableJson(result));
  const wallCharts = plan.sheets.map((p) => p.request).filter((r) => r.kind === 'wallChart');
  const familyResults = new Map(
    project.engines.map((family) => [
      family.id,
      wallCharts
        .filter((r) => r.engineFamilyId === family.id)
        .map((r) => analyseWallChart({ family, jet: project.jets.find((j) => j.id === r.jetId)!, conditions: r.conditions })),
    ]),
  );
  for (const [id, charts] of familyResults) {
    files.write(`results/families/${id}.json`, stableJson({ kind: 'engineFamily', engineFamilyId: id, charts }));
  }

  const schemas = files.copyDir(join(PACKAGE_ROOT, 'schema'), 'schema', '.schema.json');
  files.copyFile(join(PACKAGE_ROOT, 'docs', 'results.md'), 'docs/results.md');

  const view = siteView({ project, dateIso, plan, sheets, boatResults, familyResults, schemas });
  const counts = {
    sheets: plan.sheets.length,
    books: project.books.length,
    boats: project.boats.length,
    families: project.engines.length,
    files: files.count(),
  };
  return { site: new SiteData(view), counts };
}
