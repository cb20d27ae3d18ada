/**
 * Draws every planned sheet: the scene here, the three files through the renderer (worker pool), with
 * a bounded number of sheets in flight so a thousand-boat build never holds a thousand scenes. Files
 * are written as each sheet finishes; the order of finishing does not change any file.
 */
import type { Project, SheetRequest } from '../data/types.ts';
import type { Scene } from '../scene/types.ts';
import { sheetScene } from '../sheets/index.ts';
import { drawingSheet } from './errors.ts';
import { inlineSvg } from './inlineSvg.ts';
import type { OutputFiles } from './outputFiles.ts';
import type { SheetPlan } from './planSheets.ts';
import { sceneKey, type BuildCache } from './renderCache.ts';
import type { SheetRenderer } from './renderPool.ts';
import { bytesSha256, revisionNeutralHash } from './reprint.ts';
import { renderSheetFiles } from './sheetFiles.ts';
import type { SheetView } from './siteView.ts';

export interface DrawArgs {
  readonly project: Project;
  readonly dateIso: string;
  readonly plan: SheetPlan;
  readonly files: OutputFiles;
  /** Slugs whose scenes are kept for the book PDFs. */
  readonly keep: ReadonlySet<string>;
  readonly cache?: BuildCache;
  readonly renderer?: SheetRenderer;
  readonly onProgress?: (done: number, total: number) => void;
  /** Called at each step of each sheet; only tests set it, to inject a failure there. */
  readonly fault?: FaultHook;
}

/** A test's injected failure: throws at the named step of the build. */
export type FaultHook = (stage: 'scene' | 'render' | 'books' | 'files' | 'pages' | 'swap', name: string) => void;

/** Page-size name for CSS @page rules, from the media size in tenths of a millimetre. */
function printPageName(scene: Scene): string {
  return `p${Math.round(scene.widthMm * 10)}x${Math.round(scene.heightMm * 10)}`;
}

/** File name (without extension) of a sheet's n-th page (1-based): the first keeps the sheet's slug. */
export function pageFile(slug: string, n: number): string {
  return n === 1 ? `sheets/${slug}` : `sheets/${slug}-page-${n}`;
}

function sheetView(slug: string, request: SheetRequest, scene: Scene, files: OutputFiles): SheetView {
  const more = (scene.morePages ?? []).map((_, i) => {
    const file = pageFile(slug, i + 2);
    return { svgInline: () => inlineSvg(files.readText(`${file}.svg`), `${slug}-page-${i + 2}`), downloads: { svg: `${file}.svg`, png: `${file}.png` } };
  });
  return {
    ...(more.length > 0 ? { morePages: more } : {}),
    slug,
    kind: request.kind,
    title: scene.title,
    description: scene.description,
    svgInline: () => inlineSvg(files.readText(`sheets/${slug}.svg`), slug),
    printPage: printPageName(scene),
    widthMm: scene.widthMm,
    heightMm: scene.heightMm,
    downloads: { svg: `sheets/${slug}.svg`, png: `sheets/${slug}.png`, pdf: `sheets/${slug}.pdf` },
  };
}

/** The sheet's scene, from the cache when nothing it is drawn from has changed. */
function cachedScene(request: SheetRequest, args: DrawArgs): Scene {
  const key = args.cache ? sceneKey({ request, project: args.project, dateIso: args.dateIso }) : '';
  const cached = args.cache?.scenes.get(key);
  if (cached) return cached;
  const scene = sheetScene(request, { project: args.project, dateIso: args.dateIso });
  args.cache?.scenes.set(key, scene);
  return scene;
}

/** Draws and writes every sheet; returns each sheet's view, the scenes the books need and each PDF's SHA-256. */
export async function drawSheets(args: DrawArgs): Promise<{ views: Map<string, SheetView>; scenes: Map<string, Scene>; pdfHashes: Map<string, string>; contentHashes: Map<string, string> }> {
  const views = new Map<string, SheetView>();
  const scenes = new Map<string, Scene>();
  const pdfHashes = new Map<string, string>();
  const contentHashes = new Map<string, string>();
  const total = args.plan.sheets.length;
  const limit = 4;
  const inFlight = new Set<Promise<void>>();
  let failure: unknown;
  try {
    for (const { slug, request } of args.plan.sheets) {
      const scene = await drawingSheet(slug, () => {
        args.fault?.('scene', slug);
        return cachedScene(request, args);
      });
      if (args.keep.has(slug)) scenes.set(slug, scene);
      contentHashes.set(slug, revisionNeutralHash(scene, { dateIso: args.dateIso, dataRevision: args.project.site.dataRevision }));
      const task = drawingSheet(slug, async () => {
        const rendered = await renderSheetFiles(scene, { cache: args.cache, renderer: args.renderer });
        args.fault?.('render', slug);
        return rendered;
      }).then(
        (rendered) => {
          args.files.write(`sheets/${slug}.svg`, rendered.svg);
          args.files.write(`sheets/${slug}.pdf`, rendered.pdf);
          pdfHashes.set(slug, bytesSha256(rendered.pdf));
          args.files.write(`sheets/${slug}.png`, rendered.png);
          (rendered.morePages ?? []).forEach((page, i) => {
            args.files.write(`${pageFile(slug, i + 2)}.svg`, page.svg);
            args.files.write(`${pageFile(slug, i + 2)}.png`, page.png);
          });
          views.set(slug, sheetView(slug, request, scene, args.files));
          args.onProgress?.(views.size, total);
        },
      );
      // The first failure stops new sheets; those in flight still finish (or fail) before we return.
      const settled = task.catch((error: unknown) => {
        failure ??= error;
      });
      inFlight.add(settled);
      void settled.finally(() => inFlight.delete(settled));
      if (inFlight.size >= limit) await Promise.race(inFlight);
      if (failure !== undefined) break;
    }
  } finally {
    // Whatever stopped the loop (a scene that cannot be drawn, a failed render), no sheet is still
    // being written when this returns: the caller may then remove the folder safely.
    await Promise.all(inFlight);
  }
  if (failure !== undefined) throw failure;
  return { views, scenes, pdfHashes, contentHashes };
}
