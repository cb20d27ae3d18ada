/**
 * Test helper: decodes the 8-bit RGBA, non-interlaced PNGs resvg writes (PNG spec, W3C 2003,
 * §9 filters) so tests can look at pixels without another dependency.
 */
import { inflateSync } from 'node:zlib';

export interface Pixels {
  readonly width: number;
  readonly height: number;
  /** RGBA, row-major. */
  readonly data: Uint8Array;
}

function paeth(a: number, b: number, c: number): number {
  const p = a + b - c;
  const pa = Math.abs(p - a);
  const pb = Math.abs(p - b);
  const pc = Math.abs(p - c);
  return pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
}

/** Width and height from the IHDR chunk. */
export function pngSize(png: Uint8Array): { width: number; height: number } {
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  return { width: view.getUint32(16), height: view.getUint32(20) };
}

/** Decodes an 8-bit RGBA (colour type 6) or RGB (type 2) PNG to RGBA pixels. */
export function decodePng(png: Uint8Array): Pixels {
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  const { width, height } = pngSize(png);
  const colourType = png[25];
  if (png[24] !== 8 || (colourType !== 6 && colourType !== 2) || png[28] !== 0) throw new Error('unsupported PNG');
  const channels = colourType === 6 ? 4 : 3;
  const idat: Uint8Array[] = [];
  for (let at = 8; at < png.length; ) {
    const length = view.getUint32(at);
    const type = String.fromCharCode(...png.subarray(at + 4, at + 8));
    if (type === 'IDAT') idat.push(png.subarray(at + 8, at + 8 + length));
    at += 12 + length;
  }
  const raw = inflateSync(Buffer.concat(idat));
  const stride = width * channels;
  const rows = new Uint8Array(height * stride);
  for (let y = 0; y < height; y++) {
    const filter = raw[y * (stride + 1)];
    for (let x = 0; x < stride; x++) {
      const value = raw[y * (stride + 1) + 1 + x];
      const a = x >= channels ? rows[y * stride + x - channels] : 0;
      const b = y > 0 ? rows[(y - 1) * stride + x] : 0;
      const c = x >= channels && y > 0 ? rows[(y - 1) * stride + x - channels] : 0;
      const predictor = [0, a, b, (a + b) >> 1, paeth(a, b, c)][filter];
      rows[y * stride + x] = (value + predictor) & 0xff;
    }
  }
  if (channels === 4) return { width, height, data: rows };
  const data = new Uint8Array(width * height * 4);
  for (let i = 0; i < width * height; i++) data.set([rows[i * 3], rows[i * 3 + 1], rows[i * 3 + 2], 255], i * 4);
  return { width, height, data };
}

/** Counts pixels darker than `threshold` (0–255 on the red channel) inside a pixel rectangle. */
export function darkPixels(pixels: Pixels, box: { x0: number; y0: number; x1: number; y1: number }, threshold = 128): number {
  let count = 0;
  for (let y = Math.max(0, box.y0); y < Math.min(pixels.height, box.y1); y++) {
    for (let x = Math.max(0, box.x0); x < Math.min(pixels.width, box.x1); x++) {
      if (pixels.data[(y * pixels.width + x) * 4] < threshold) count++;
    }
  }
  return count;
}

/** Counts pixels of two same-sized images whose R, G or B differ by more than `toleranceLevels` (0–255). */
export function differingPixels(a: Pixels, b: Pixels, opts: { toleranceLevels: number }): number {
  if (a.width !== b.width || a.height !== b.height) throw new Error(`sizes differ: ${a.width}×${a.height} and ${b.width}×${b.height}`);
  let count = 0;
  for (let i = 0; i < a.data.length; i += 4) {
    const delta = Math.max(Math.abs(a.data[i] - b.data[i]), Math.abs(a.data[i + 1] - b.data[i + 1]), Math.abs(a.data[i + 2] - b.data[i + 2]));
    if (delta > opts.toleranceLevels) count++;
  }
  return count;
}
