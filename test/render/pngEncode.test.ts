import { Resvg } from '@resvg/resvg-js';
import { crc32 } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { encodePng } from '../../src/render/pngEncode.ts';
import { renderSvg } from '../../src/render/svg.ts';
import { decodePng, differingPixels } from './pngPixels.ts';
import { everyNodeKindScene } from './scenes.ts';

/** resvg's raster of the every-node-kind scene, 400 px wide: its pixels and resvg's own PNG of them. */
function resvgImage() {
  const image = new Resvg(renderSvg(everyNodeKindScene(), { text: 'outlines' }), { fitTo: { mode: 'width', value: 400 }, background: '#ffffff' }).render();
  return { width: image.width, height: image.height, rgba: new Uint8Array(image.pixels), png: new Uint8Array(image.asPng()) };
}

/** Chunks of a PNG as [type, data, stored CRC]. */
function chunks(png: Uint8Array): Array<{ type: string; data: Uint8Array; crc: number }> {
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  const found = [];
  for (let at = 8; at < png.length; ) {
    const length = view.getUint32(at);
    found.push({ type: String.fromCharCode(...png.subarray(at + 4, at + 8)), data: png.subarray(at + 8, at + 8 + length), crc: view.getUint32(at + 8 + length) });
    at += 12 + length;
  }
  return found;
}

describe('encodePng()', () => {
  it('loses nothing: decodes to the same pixels as resvg’s own PNG of the same raster', () => {
    const image = resvgImage();
    const ours = decodePng(encodePng(image));
    expect([ours.width, ours.height]).toEqual([image.width, image.height]);
    expect(differingPixels(ours, decodePng(image.png), { toleranceLevels: 0 })).toBe(0);
    expect(Buffer.from(ours.data).equals(Buffer.from(image.rgba))).toBe(true);
  });

  it('writes the signature, then IHDR, one IDAT and IEND, each with a CRC-32 that zlib agrees with', () => {
    const image = resvgImage();
    const png = encodePng(image);
    // PNG spec (W3C 2003) §5.2: the signature is 137 80 78 71 13 10 26 10.
    expect([...png.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    const found = chunks(png);
    expect(found.map((c) => c.type)).toEqual(['IHDR', 'IDAT', 'IEND']);
    for (const c of found) expect(c.crc, c.type).toBe(crc32(Buffer.concat([Buffer.from(c.type, 'latin1'), c.data])));
    // §11.2.2 IHDR: width, height, bit depth 8, colour type 6 (RGBA), compression 0, filter 0, interlace 0.
    const ihdr = new DataView(found[0].data.buffer, found[0].data.byteOffset, 13);
    expect([ihdr.getUint32(0), ihdr.getUint32(4), ...found[0].data.subarray(8)]).toEqual([image.width, image.height, 8, 6, 0, 0, 0]);
    // Every PNG ends 00 00 00 00 "IEND" AE 42 60 82: the CRC-32 of "IEND" (PNG spec §5.6).
    expect([...png.subarray(png.length - 12)]).toEqual([0, 0, 0, 0, 0x49, 0x45, 0x4e, 0x44, 0xae, 0x42, 0x60, 0x82]);
  });

  it('is read back by another decoder: resvg draws our PNG as an image pixel for pixel', () => {
    const image = resvgImage();
    const dataUrl = `data:image/png;base64,${Buffer.from(encodePng(image)).toString('base64')}`;
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${image.width}" height="${image.height}"><image href="${dataUrl}" width="${image.width}" height="${image.height}"/></svg>`;
    const redrawn = new Resvg(svg, { background: '#ff00ff' }).render();
    const pixels = { width: redrawn.width, height: redrawn.height, data: new Uint8Array(redrawn.pixels) };
    expect(differingPixels(pixels, decodePng(image.png), { toleranceLevels: 0 })).toBe(0);
  });

  it('refuses pixels that do not fill width × height × 4 bytes, naming both', () => {
    expect(() => encodePng({ width: 3, height: 2, rgba: new Uint8Array(23) })).toThrow(/3 × 2 × 4 bytes, found 23/);
  });
});
