/**
 * Scene → PNG through resvg. renderPng hands resvg the scene with its text already drawn as glyph
 * outlines, so resvg lays out no text (laying out ~200 runs was most of its time on a sheet) and
 * needs no font. rasteriseSvg rasterises an SVG with real <text>, loading only our two TTFs (no
 * system fonts), so that raster too is the same on every machine and set in the measured font.
 */
import { Resvg } from '@resvg/resvg-js';
import { FONT_FAMILY, FONT_FILES } from '../scene/fonts.ts';
import type { Scene } from '../scene/types.ts';
import { encodePng } from './pngEncode.ts';
import { renderSvg } from './svg.ts';

const MM_PER_IN = 25.4;

type ResvgFonts = NonNullable<ConstructorParameters<typeof Resvg>[1]>['font'];

/** Rasterises on white and encodes. The page is opaque, so resvg's pixels are straight RGBA. */
function rasterise(svg: string, args: { widthPx: number; font: ResvgFonts }): Uint8Array {
  const image = new Resvg(svg, { fitTo: { mode: 'width', value: args.widthPx }, font: args.font, background: '#ffffff' }).render();
  return encodePng({ width: image.width, height: image.height, rgba: image.pixels });
}

/** Rasterises an SVG document (real <text> set in Source Sans 3) to a PNG `widthPx` pixels wide on white. */
export function rasteriseSvg(svg: string, args: { widthPx: number }): Uint8Array {
  const font = { fontFiles: [FONT_FILES.regular, FONT_FILES.bold], loadSystemFonts: false, defaultFontFamily: FONT_FAMILY };
  return rasterise(svg, { widthPx: args.widthPx, font });
}

/** A PNG of the scene at `dpi` dots per inch (width = media width in inches × dpi, rounded). */
export function renderPng(scene: Scene, opts: { dpi: number }): Uint8Array {
  if (!(opts.dpi > 0)) throw new RangeError(`PNG resolution must be a positive number of dpi, found ${opts.dpi}`);
  const widthPx = Math.round((scene.widthMm / MM_PER_IN) * opts.dpi);
  // No font at all: the outline SVG has no text left for one to set.
  return rasterise(renderSvg(scene, { text: 'outlines' }), { widthPx, font: { loadSystemFonts: false } });
}
