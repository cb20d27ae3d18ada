/**
 * Scene → PNG through resvg, from the SVG renderer's output. Only our two TTFs are loaded (no system
 * fonts), so the raster is the same on every machine and text is set in the measured font.
 */
import { Resvg } from '@resvg/resvg-js';
import { FONT_FAMILY, FONT_FILES } from '../scene/fonts.ts';
import type { Scene } from '../scene/types.ts';
import { renderSvg } from './svg.ts';

const MM_PER_IN = 25.4;

/** Rasterises an SVG document to a PNG `widthPx` pixels wide on a white background. */
export function rasteriseSvg(svg: string, args: { widthPx: number }): Uint8Array {
  const resvg = new Resvg(svg, {
    fitTo: { mode: 'width', value: args.widthPx },
    font: { fontFiles: [FONT_FILES.regular, FONT_FILES.bold], loadSystemFonts: false, defaultFontFamily: FONT_FAMILY },
    background: '#ffffff',
  });
  return new Uint8Array(resvg.render().asPng());
}

/** A PNG of the scene at `dpi` dots per inch (width = media width in inches × dpi, rounded). */
export function renderPng(scene: Scene, opts: { dpi: number }): Uint8Array {
  if (!(opts.dpi > 0)) throw new RangeError(`PNG resolution must be a positive number of dpi, found ${opts.dpi}`);
  return rasteriseSvg(renderSvg(scene), { widthPx: Math.round((scene.widthMm / MM_PER_IN) * opts.dpi) });
}
