/** One sheet's three files (SVG, PDF, PNG at 150 dpi), rendered in the calling thread. */
import { renderPdf, renderPng, renderSvg } from '../render/index.ts';
import { scenePages, type Scene } from '../scene/types.ts';
import type { RenderedSheet } from './renderCache.ts';

/** Resolution of the PNG downloads, dots per inch. */
export const PNG_DPI = 150;

/** Renders the scene to SVG, PDF and PNG in this thread: the PDF gets every page, SVG and PNG one file per page. */
export async function renderSheetNow(scene: Scene): Promise<RenderedSheet> {
  const svg = renderSvg(scene);
  const pdf = await renderPdf(scenePages(scene), {
    title: scene.title,
    subject: scene.subject,
    keywords: scene.keywords,
    ...(scene.author !== undefined ? { author: scene.author } : {}),
    dateIso: scene.dateIso,
  });
  // The PNG is drawn from glyph outlines (no text for resvg to lay out): about twice as fast as the text SVG.
  const png = renderPng(scene, { dpi: PNG_DPI });
  const more = (scene.morePages ?? []).map((page) => ({ svg: renderSvg(page), png: renderPng(page, { dpi: PNG_DPI }) }));
  return { svg, pdf, png, ...(more.length > 0 ? { morePages: more } : {}) };
}
