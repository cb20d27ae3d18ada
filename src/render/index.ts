export { renderSvg, escapeXml, pathData } from './svg.ts';
export type { SvgOptions, SvgTextMode } from './svg.ts';
export { renderPdf } from './pdf.ts';
export type { PdfOptions } from './pdf.ts';
export { renderPng, rasteriseSvg } from './png.ts';
export { UnsupportedCharacterError, assertDrawable } from './errors.ts';
