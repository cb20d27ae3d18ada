/** One sheet's three files (SVG, PDF, PNG at 150 dpi), rendered once and reused from the cache. */
import type { Scene } from '../scene/types.ts';
import { sceneHash, type BuildCache, type RenderedSheet } from './renderCache.ts';
import type { SheetRenderer } from './renderPool.ts';
import { renderSheetNow } from './renderSheet.ts';

export { PNG_DPI, renderSheetNow } from './renderSheet.ts';

/** Renders through the renderer (a worker pool) or in this thread, or takes the files from the cache. */
export async function renderSheetFiles(
  scene: Scene,
  opts: { cache?: BuildCache; renderer?: SheetRenderer },
): Promise<RenderedSheet> {
  const key = opts.cache ? sceneHash(scene) : '';
  const cached = opts.cache?.rendered.get(key);
  if (cached) return cached;
  const rendered = opts.renderer ? await opts.renderer.render(scene) : await renderSheetNow(scene);
  opts.cache?.rendered.set(key, rendered);
  return rendered;
}
