import { readFileSync } from 'node:fs';
import { Resvg } from '@resvg/resvg-js';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { rasteriseSvg, renderPng } from '../../src/render/png.ts';
import { renderSvg } from '../../src/render/svg.ts';
import { FONT_FILES } from '../../src/scene/fonts.ts';
import { MM_PER_PT, textBox, textNode } from '../../src/scene/text.ts';
import { darkPixels, decodePng, pngSize } from './pngPixels.ts';
import { everyNodeKindScene, sceneOf } from './scenes.ts';

const PX_PER_MM_300 = 300 / 25.4;
const label = textNode({ text: 'AVAV To Wa WOT 5600', sizePt: 24, weight: 'regular', x: 30, y: 60 });
const TEXT_ONLY = sceneOf({ children: [label] });
/** Both ways text reaches the raster: glyph outlines (renderPng) and real <text> laid out by resvg. */
const AT_300_DPI = [
  ['glyph outlines (renderPng)', () => renderPng(TEXT_ONLY, { dpi: 300 })],
  ['real <text> (rasteriseSvg)', () => rasteriseSvg(renderSvg(TEXT_ONLY), { widthPx: 2480 })],
] as const;

/** Pixel rectangle of a mm box at 300 dpi, grown by `padPx`. */
function pxBox(box: { x: number; y: number; width: number; height: number }, padPx = 0) {
  return {
    x0: Math.floor(box.x * PX_PER_MM_300) - padPx,
    y0: Math.floor(box.y * PX_PER_MM_300) - padPx,
    x1: Math.ceil((box.x + box.width) * PX_PER_MM_300) + padPx,
    y1: Math.ceil((box.y + box.height) * PX_PER_MM_300) + padPx,
  };
}

describe('renderPng()', () => {
  it('sizes an A4 page to 1240 × 1754 px at 150 dpi and 2480 × 3508 px at 300 dpi (±1 px)', () => {
    // 210 mm / 25.4 mm/in × 150 = 1240.16 px; 297 mm → 1753.9 px (ISO 216 A4, 1 in = 25.4 mm).
    const scene = sceneOf({ children: [] });
    const at150 = pngSize(renderPng(scene, { dpi: 150 }));
    expect(Math.abs(at150.width - 1240)).toBeLessThanOrEqual(1);
    expect(Math.abs(at150.height - 1754)).toBeLessThanOrEqual(1);
    const at300 = pngSize(renderPng(scene, { dpi: 300 }));
    expect(Math.abs(at300.width - 2480)).toBeLessThanOrEqual(1);
    expect(Math.abs(at300.height - 3508)).toBeLessThanOrEqual(1);
  });

  it('renders the same bytes twice', () => {
    const first = renderPng(everyNodeKindScene(), { dpi: 100 });
    expect(Buffer.from(renderPng(everyNodeKindScene(), { dpi: 100 })).equals(Buffer.from(first))).toBe(true);
  });

  it.each(AT_300_DPI)('draws text from %s: dark pixels inside the text box and none outside it', (_, png) => {
    const pixels = decodePng(png());
    const box = pxBox(textBox(label));
    expect(darkPixels(pixels, box)).toBeGreaterThan(2000);
    const everywhere = darkPixels(pixels, { x0: 0, y0: 0, x1: pixels.width, y1: pixels.height });
    expect(everywhere).toBe(darkPixels(pixels, pxBox(textBox(label), 2)));
  });

  it('the dark-pixel check sees nothing when resvg finds no usable font (text silently dropped)', () => {
    // resvg falls back to defaultFontFamily for unknown families, so drop the font files to provoke the fault.
    const resvg = new Resvg(renderSvg(TEXT_ONLY), { fitTo: { mode: 'width', value: 2480 }, font: { loadSystemFonts: false, defaultFontFamily: 'No Such Family' }, background: '#ffffff' });
    const pixels = decodePng(new Uint8Array(resvg.render().asPng()));
    expect(darkPixels(pixels, pxBox(textBox(label)))).toBe(0);
  });

  it.each(AT_300_DPI)('sets text from %s without kerning, so its ink ends where the measured advances say (±1.5 px at 300 dpi)', (_, png) => {
    // Predicted ink: from the anchor + left bearing of the first glyph to the advance sum less the
    // last glyph's right bearing (glyph outlines read with fontkit, independently of resvg).
    const font = fontkit.create(readFileSync(FONT_FILES.regular)) as fontkit.Font;
    const glyphs = font.glyphsForString(label.text);
    const mmPerUnit = (label.sizePt * MM_PER_PT) / font.unitsPerEm;
    const last = glyphs[glyphs.length - 1];
    const inkLeftMm = label.x + glyphs[0].bbox.minX * mmPerUnit;
    const inkRightMm = label.x + label.widthMm - (last.advanceWidth - last.bbox.maxX) * mmPerUnit;
    const pixels = decodePng(png());
    const columns: number[] = [];
    for (let x = 0; x < pixels.width; x++) {
      if (darkPixels(pixels, { x0: x, y0: 0, x1: x + 1, y1: pixels.height }) > 0) columns.push(x);
    }
    expect(Math.abs(columns[0] - inkLeftMm * PX_PER_MM_300)).toBeLessThanOrEqual(1.5);
    expect(Math.abs(columns[columns.length - 1] + 1 - inkRightMm * PX_PER_MM_300)).toBeLessThanOrEqual(1.5);
  });
});
