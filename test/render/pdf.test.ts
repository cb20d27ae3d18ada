import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PDFArray, PDFDict, PDFDocument, PDFHexString, PDFName, PDFRef } from 'pdf-lib';
import { beforeAll, describe, expect, it } from 'vitest';
import { UnsupportedCharacterError } from '../../src/render/errors.ts';
import { renderPdf } from '../../src/render/pdf.ts';
import { renderPng } from '../../src/render/png.ts';
import { bleedBox, cropMarks, pageFrame } from '../../src/scene/paper.ts';
import { textBox, textNode } from '../../src/scene/text.ts';
import type { Scene } from '../../src/scene/types.ts';
import { decodePng, differingPixels } from './pngPixels.ts';
import type { Pixels } from './pngPixels.ts';
import { everyNodeKindScene, sceneOf, textRunsScene } from './scenes.ts';

const OPTIONS = { title: 'Demo chart book', subject: 'Invented demo data', keywords: ['waterjet', 'impeller'], dateIso: '2024-05-01' };
// 1 pt = 1/72 in, 1 in = 25.4 mm: A4 210 × 297 mm = 595.276 × 841.890 pt (ISO 216 sizes).
const A4_PT = [(210 / 25.4) * 72, (297 / 25.4) * 72];
const dir = mkdtempSync(join(tmpdir(), 'matchbook-pdf-'));

/** Writes bytes to a temporary file and runs a poppler tool on it (pdftotext, pdffonts, pdftoppm). */
function poppler(tool: string, bytes: Uint8Array, args: readonly string[]): string {
  const file = join(dir, `${tool}.pdf`);
  writeFileSync(file, bytes);
  const output = tool === 'pdftotext' ? ['-'] : tool === 'pdftoppm' ? [join(dir, 'page')] : [];
  return execFileSync(`/usr/bin/${tool}`, [...args, file, ...output], { encoding: 'utf8' });
}

const TEXT_SCENE: Scene = textRunsScene();

describe('renderPdf()', () => {
  let book: Uint8Array;
  let doc: PDFDocument;
  beforeAll(async () => {
    book = await renderPdf([TEXT_SCENE, everyNodeKindScene(), TEXT_SCENE], { ...OPTIONS, author: 'Demo shop', outline: ['One', 'Two', 'Three'] });
    doc = await PDFDocument.load(book, { updateMetadata: false });
  });

  it('writes one page per scene sized in points from the scene mm', () => {
    expect(doc.getPageCount()).toBe(3);
    const { width, height } = doc.getPage(0).getSize();
    expect(width).toBeCloseTo(A4_PT[0], 2);
    expect(height).toBeCloseTo(A4_PT[1], 2);
    // Every-node-kind has 3 mm bleed and so crop marks: media 230 × 317 mm (trim + 3 mm bleed + a 7 mm
    // slug for the 5 mm marks), TrimBox 10 mm in from each edge, BleedBox 3 mm outside the trim.
    const bled = doc.getPage(1);
    expect(bled.getMediaBox().width).toBeCloseTo((230 / 25.4) * 72, 2);
    expect(bled.getMediaBox().height).toBeCloseTo((317 / 25.4) * 72, 2);
    const trim = bled.getTrimBox();
    expect(trim.x).toBeCloseTo((10 / 25.4) * 72, 2);
    expect(trim.y).toBeCloseTo((10 / 25.4) * 72, 2);
    expect(trim.width).toBeCloseTo(A4_PT[0], 2);
    expect(trim.height).toBeCloseTo(A4_PT[1], 2);
    const bleed = bled.getBleedBox();
    expect(bleed.x).toBeCloseTo((7 / 25.4) * 72, 2);
    expect(bleed.y).toBeCloseTo((7 / 25.4) * 72, 2);
    expect(bleed.width).toBeCloseTo((216 / 25.4) * 72, 2);
    expect(bleed.height).toBeCloseTo((303 / 25.4) * 72, 2);
    // A page without bleed still states its trim (= media) and bleed box, as print-shop preflight expects
    // (PDF/X asks for TrimBox on every page; ISO 15930-1, from memory).
    const plain = doc.getPage(0);
    for (const box of [plain.getTrimBox(), plain.getBleedBox()]) {
      expect(box.x).toBe(0);
      expect(box.y).toBe(0);
      expect(box.width).toBeCloseTo(A4_PT[0], 2);
      expect(box.height).toBeCloseTo(A4_PT[1], 2);
    }
  });

  it('with bleed and no crop marks makes the media the bleed box, the trim 3 mm inside it', async () => {
    const paper = { size: 'A4', orientation: 'portrait', bleedMm: 3, cropMarks: false } as const;
    const page = (await PDFDocument.load(await renderPdf([sceneOf({ paper, children: [] })], OPTIONS))).getPage(0);
    const mm = (valuePt: number) => (valuePt * 25.4) / 72;
    const box = (b: { x: number; y: number; width: number; height: number }) => [b.x, b.y, b.width, b.height].map((v) => Math.round(mm(v) * 1000) / 1000);
    expect(box(page.getMediaBox())).toEqual([0, 0, 216, 303]);
    expect(box(page.getBleedBox())).toEqual([0, 0, 216, 303]);
    expect(box(page.getTrimBox())).toEqual([3, 3, 210, 297]);
  });

  it('names each font subset by the characters it holds: another text, another tag; the same text, the same tag', async () => {
    // ISO 32000-1 §9.6.4: a subset font's name is six capital letters, '+', the font name.
    const tags = (text: string) => [...text.matchAll(/\b([A-Z]{6})\+SourceSans3-(Regular|Bold)/g)].map((m) => `${m[1]}+${m[2]}`).sort();
    const a = tags(poppler('pdffonts', await renderPdf([TEXT_SCENE], OPTIONS), []));
    const b = tags(poppler('pdffonts', await renderPdf([everyNodeKindScene()], OPTIONS), []));
    const again = tags(poppler('pdffonts', await renderPdf([TEXT_SCENE], { ...OPTIONS, title: 'Another title' }), []));
    expect(a.length).toBeGreaterThan(0);
    expect(again).toEqual(a);
    const regular = (t: string[]) => t.find((x) => x.endsWith('Regular'));
    expect(regular(b)).toBeDefined();
    expect(regular(b)).not.toBe(regular(a));
  });

  it('is a tagged PDF: a Document element with one Figure per page in page order, its alternative text the sheet title and description', () => {
    // ISO 32000-1 §14.7 and §14.8; poppler's pdfinfo reads the structure tree back.
    expect(poppler('pdfinfo', book, [])).toMatch(/Tagged:\s+yes/);
    expect(poppler('pdfinfo', book, ['-struct'])).toBe('Document\n  Figure\n  Figure\n  Figure\n');
    const root = doc.catalog.lookup(PDFName.of('StructTreeRoot'), PDFDict);
    const document = root.lookup(PDFName.of('K'), PDFDict);
    const figures = document.lookup(PDFName.of('K'), PDFArray);
    expect(figures.size()).toBe(3);
    for (let i = 0; i < 3; i++) {
      const figure = figures.lookup(i, PDFDict);
      expect(figure.get(PDFName.of('Pg'))).toBe(doc.getPage(i).ref);
      expect(figure.lookup(PDFName.of('Alt'))?.toString()).toContain([TEXT_SCENE, everyNodeKindScene(), TEXT_SCENE][i].title.slice(0, 10));
    }
    expect(doc.catalog.lookup(PDFName.of('Lang'))?.toString()).toBe('(en-GB)');
  });

  it('writes black and greys in DeviceGray, so black text prints in the black ink alone', async () => {
    const one = await PDFDocument.load(await renderPdf([TEXT_SCENE], OPTIONS), { updateMetadata: false });
    const contents = one.getPage(0).node.Contents();
    const stream = contents instanceof PDFArray ? contents.lookup(0) : contents;
    const { decodePDFRawStream } = await import('pdf-lib');
    const ops = Buffer.from(decodePDFRawStream(stream as never).decode()).toString('latin1');
    // Text in INK (#000000): "0 g" before its BT, and no "0 0 0 rg" anywhere.
    expect(ops).toMatch(/\b0 g\s+BT/);
    expect(ops).not.toMatch(/\b0 0 0 rg\b/);
  });

  it('records title, subject, keywords, author, creator and both dates from the options', () => {
    expect(doc.getTitle()).toBe('Demo chart book');
    expect(doc.getSubject()).toBe('Invented demo data');
    expect(doc.getKeywords()).toBe('waterjet impeller');
    expect(doc.getAuthor()).toBe('Demo shop');
    expect(doc.getCreator()).toBe('matchbook');
    expect(doc.getCreationDate()?.toISOString()).toBe('2024-05-01T00:00:00.000Z');
    expect(doc.getModificationDate()?.toISOString()).toBe('2024-05-01T00:00:00.000Z');
  });

  it('embeds both weights as subset TrueType fonts', () => {
    const fonts = poppler('pdffonts', book, []);
    expect(fonts).toMatch(/[A-Z]{6}\+SourceSans3-Regular\s+CID TrueType\s+Identity-H\s+yes yes yes/);
    expect(fonts).toMatch(/[A-Z]{6}\+SourceSans3-Bold\s+CID TrueType\s+Identity-H\s+yes yes yes/);
  });

  it('holds real text that pdftotext extracts, ligatures and Greek included', () => {
    const text = poppler('pdftotext', book, ['-f', '1', '-l', '1']);
    expect(text).toContain('Predicted WOT 5450–5700 rpm');
    expect(text).toContain('office fluff · Ωμέγα · Crème brûlée');
    expect(text).toContain('Engine speed (rpm)');
  });

  it('builds an outline with one bookmark per page, in order, each opening its page', () => {
    const outlines = doc.catalog.lookup(PDFName.of('Outlines'), PDFDict);
    expect(outlines.get(PDFName.of('Count'))?.toString()).toBe('3');
    const titles: string[] = [];
    let ref = outlines.get(PDFName.of('First'));
    for (let page = 0; ref instanceof PDFRef; page++) {
      const item = doc.context.lookup(ref, PDFDict);
      titles.push(item.lookup(PDFName.of('Title'), PDFHexString).decodeText());
      expect(item.lookup(PDFName.of('Dest'), PDFArray).get(0)).toBe(doc.getPage(page).ref);
      ref = item.get(PDFName.of('Next'));
    }
    expect(titles).toEqual(['One', 'Two', 'Three']);
  });

  it('produces byte-identical files from two calls', async () => {
    const again = await renderPdf([TEXT_SCENE, everyNodeKindScene(), TEXT_SCENE], { ...OPTIONS, author: 'Demo shop', outline: ['One', 'Two', 'Three'] });
    expect(Buffer.from(again).equals(Buffer.from(book))).toBe(true);
  });

  it('keeps a typical one-page sheet small because fonts are subset', async () => {
    const page = await renderPdf([everyNodeKindScene()], OPTIONS);
    expect(poppler('pdfinfo', page, [])).toMatch(/Pages:\s+1\n/);
    // The two full TTFs together are several hundred kB; subsets of the few glyphs used are a few kB.
    expect(page.length).toBeLessThan(40_000);
  });

  it('refuses a character the font lacks with a typed error naming it and the text', async () => {
    const scene = sceneOf({ children: [textNode({ text: 'Rating 中', sizePt: 10, weight: 'regular', x: 10, y: 10 })] });
    await expect(renderPdf([scene], OPTIONS)).rejects.toThrow(UnsupportedCharacterError);
    await expect(renderPdf([scene], OPTIONS)).rejects.toThrow(/"中" \(U\+4E2D\) in the text "Rating 中"/);
  });

  it('rejects an outline whose length differs from the page count', async () => {
    await expect(renderPdf([TEXT_SCENE], { ...OPTIONS, outline: ['One', 'Two'] })).rejects.toThrow(/2 entries for 1 pages/);
  });
});

/** Pixel bounds of dark ink inside a box, or undefined when there is none. */
function inkBounds(pixels: Pixels, box: { x0: number; y0: number; x1: number; y1: number }) {
  let bounds: { x0: number; x1: number; y0: number; y1: number } | undefined;
  for (let y = box.y0; y < box.y1; y++) {
    for (let x = box.x0; x < box.x1; x++) {
      if (pixels.data[(y * pixels.width + x) * 4] >= 128) continue;
      bounds = bounds
        ? { x0: Math.min(bounds.x0, x), x1: Math.max(bounds.x1, x), y0: Math.min(bounds.y0, y), y1: Math.max(bounds.y1, y) }
        : { x0: x, x1: x, y0: y, y1: y };
    }
  }
  return bounds;
}

/** Rasterises page 1 of a PDF with poppler at exactly the PNG renderer's pixel size for the scene. */
async function popplerAndResvg(scene: Scene): Promise<{ fromPdf: Pixels; fromSvg: Pixels }> {
  const fromSvg = decodePng(renderPng(scene, { dpi: 150 }));
  // pdftoppm rounds the page size up where resvg rounds to nearest: ask for resvg's exact size.
  const size = ['-scale-to-x', String(fromSvg.width), '-scale-to-y', String(fromSvg.height)];
  poppler('pdftoppm', await renderPdf([scene], OPTIONS), [...size, '-png', '-singlefile']);
  return { fromPdf: decodePng(readFileSync(join(dir, 'page.png'))), fromSvg };
}

describe('renderPdf() as drawn by a PDF viewer', () => {
  it('draws crop marks where a print shop looks for them: in line with the trim, from the bleed edge outward, none inside the bleed', async () => {
    // An A6 card with 3 mm bleed and a grey band that fills the bleed box (artwork running off the edge).
    const paper = { size: 'A6', orientation: 'portrait', bleedMm: 3 } as const;
    const frame = pageFrame({ paper });
    const bleed = bleedBox(frame);
    const band = { type: 'rect' as const, ...bleed, fill: { colour: '#808080' } };
    const bytes = await renderPdf([sceneOf({ paper, children: [band, ...cropMarks(frame)] })], OPTIONS);
    // The top-left 14 mm of the page at 600 dpi, as poppler draws it.
    const pxPerMm = 600 / 25.4;
    const side = Math.round(14 * pxPerMm);
    poppler('pdftoppm', bytes, ['-r', '600', '-x', '0', '-y', '0', '-W', String(side), '-H', String(side), '-png', '-singlefile']);
    const corner = decodePng(readFileSync(join(dir, 'page.png')));
    const level = (xMm: number, yMm: number) => corner.data[(Math.round(yMm * pxPerMm) * corner.width + Math.round(xMm * pxPerMm)) * 4];
    const { x: trimX, y: trimY } = frame.trimBox;
    expect([trimX, trimY, bleed.x, bleed.y]).toEqual([10, 10, 7, 7]);
    // The marks: black along the trim lines between 3 and 8 mm outside the trim (5 mm long).
    for (const out of [3.5, 5.5, 7.5]) {
      expect(level(trimX - out, trimY), `horizontal mark ${out} mm out`).toBeLessThan(64);
      expect(level(trimX, trimY - out), `vertical mark ${out} mm out`).toBeLessThan(64);
    }
    // Inside the bleed, on the same lines: the band's grey, no mark (128 ± anti-aliasing).
    for (const out of [0.5, 1.5, 2.5]) {
      expect(Math.abs(level(trimX - out, trimY) - 128), `bleed ${out} mm out`).toBeLessThan(8);
      expect(Math.abs(level(trimX, trimY - out) - 128), `bleed ${out} mm out`).toBeLessThan(8);
    }
    // Past the marks' ends and off the trim lines: paper white.
    expect(level(trimX - 9, trimY)).toBe(255);
    expect(level(trimX - 5, trimY - 5)).toBe(255);
  });

  it('draws the same picture as the SVG renderer: paths, y flip, clip, dashes, circle (poppler vs resvg)', async () => {
    // Text is left out: poppler and resvg anti-alias glyphs differently (text has its own test below).
    const scene = everyNodeKindScene();
    const shapes = { ...scene, root: { ...scene.root, children: scene.root.children.filter((n) => n.type !== 'text') } };
    const { fromPdf, fromSvg } = await popplerAndResvg(shapes);
    const differing = differingPixels(fromPdf, fromSvg, { toleranceLevels: 96 });
    // Anti-aliasing differs along edges only; a flipped or unclipped shape differs by thousands of pixels.
    expect(differing).toBeLessThan(1200); // measured 442 when right; a missing clip or dashes gives about 3500
  });

  it('puts each run where the PNG renderer puts it (poppler vs resvg, within 2 px at 150 dpi)', async () => {
    const { fromPdf, fromSvg } = await popplerAndResvg(TEXT_SCENE);
    expect([fromPdf.width, fromPdf.height]).toEqual([fromSvg.width, fromSvg.height]);
    const pxPerMm = 150 / 25.4;
    for (const node of TEXT_SCENE.root.children) {
      if (node.type !== 'text') continue;
      const b = textBox(node);
      const box = { x0: Math.floor(b.x * pxPerMm), y0: Math.floor(b.y * pxPerMm), x1: Math.ceil((b.x + b.width) * pxPerMm), y1: Math.ceil((b.y + b.height) * pxPerMm) };
      const pdfInk = inkBounds(fromPdf, box);
      const svgInk = inkBounds(fromSvg, box);
      expect(pdfInk, node.text).toBeDefined();
      for (const side of ['x0', 'x1', 'y0', 'y1'] as const) expect(Math.abs(pdfInk![side] - svgInk![side]), `${node.text} ${side}`).toBeLessThanOrEqual(2);
    }
  });
});
