/** One sheet's three files (SVG, PDF, PNG at 150 dpi), rendered once and reused from the cache. */
import { rasteriseSvg, renderPdf, renderSvg } from '../render/index.ts';
import type { Scene } from '../scene/types.ts';
import { sceneHash, type BuildCache, type RenderedSheet } from './renderCache.ts';

/** Resolution of the PNG downloads, dots per inch. */
export const PNG_DPI = 150;
const MM_PER_IN = 25.4;

/** Renders the scene to SVG, PDF and PNG, or takes them from the cache when the scene is unchanged. */
export async function renderSheetFiles(scene: Scene, opts: { cache?: BuildCache }): Promise<RenderedSheet> {
  const key = opts.cache ? sceneHash(scene) : '';
  const cached = opts.cache?.rendered.get(key);
  if (cached) return cached;
  const svg = renderSvg(scene);
  const pdf = await renderPdf([scene], {
    title: scene.title,
    subject: scene.subject,
    keywords: scene.keywords,
    dateIso: scene.dateIso,
  });
  // Rasterise the SVG we already have rather than rendering the scene twice.
  const png = rasteriseSvg(svg, { widthPx: Math.round((scene.widthMm / MM_PER_IN) * PNG_DPI) });
  const rendered = { svg, pdf, png };
  opts.cache?.rendered.set(key, rendered);
  return rendered;
}
