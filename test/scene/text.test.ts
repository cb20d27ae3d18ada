import { existsSync, readFileSync } from 'node:fs';
import { isAbsolute } from 'node:path';
import fontkitForPdf from '@pdf-lib/fontkit';
import fc from 'fast-check';
import * as fontkit from 'fontkit';
import { PDFDocument } from 'pdf-lib';
import type { PDFFont } from 'pdf-lib';
import { beforeAll, describe, expect, it } from 'vitest';
import { FONT_FAMILY, FONT_FILES, SHAPING_FEATURES } from '../../src/scene/fonts.ts';
import { MM_PER_PT, fitText, measureTextMm, textBox, textNode, unsupportedCharacters } from '../../src/scene/text.ts';
import type { FontWeight } from '../../src/scene/types.ts';

const SAMPLES = [
  'Wide-open throttle',
  'office fluff affine', // f-ligatures
  'AV To Wa Ty', // kerning pairs: advances must not change
  'Ωμέγα 5600 rpm ± 5 %',
  'Crème brûlée, façade, Ärger, naïve',
  'Двигатель 120 кВт',
  '',
];

// Printable Basic Latin, Latin-1 and Latin Extended-A (C1 controls excluded: renderers strip them).
const LATIN_CHAR = fc
  .integer({ min: 0x20, max: 0x17f })
  .filter((c) => c < 0x7f || c > 0x9f)
  .map((c) => String.fromCharCode(c));

describe('fonts', () => {
  it('FONT_FILES are absolute paths of TrueType files whose family name is FONT_FAMILY', () => {
    for (const weight of ['regular', 'bold'] as const) {
      expect(isAbsolute(FONT_FILES[weight])).toBe(true);
      expect(existsSync(FONT_FILES[weight])).toBe(true);
      const font = fontkit.create(readFileSync(FONT_FILES[weight])) as fontkit.Font;
      expect(font.familyName).toBe(FONT_FAMILY);
    }
  });
});

describe('measureTextMm()', () => {
  // pdf-lib is the reference: the PDF must set each run exactly as wide as the scene measured it.
  const pdfFonts = {} as Record<FontWeight, PDFFont>;
  beforeAll(async () => {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkitForPdf);
    for (const weight of ['regular', 'bold'] as const) {
      pdfFonts[weight] = await doc.embedFont(readFileSync(FONT_FILES[weight]), { subset: true, features: { ...SHAPING_FEATURES } });
    }
  });

  it('equals pdf-lib widthOfTextAtSize for the same embedded font, both weights', () => {
    for (const weight of ['regular', 'bold'] as const) {
      for (const text of SAMPLES) {
        const pdfWidthMm = pdfFonts[weight].widthOfTextAtSize(text, 11) * MM_PER_PT;
        expect(measureTextMm({ text, sizePt: 11, weight })).toBeCloseTo(pdfWidthMm, 9);
      }
    }
  });

  it('equals pdf-lib widthOfTextAtSize for arbitrary printable Latin text and sizes', () => {
    fc.assert(
      fc.property(fc.string({ unit: LATIN_CHAR }), fc.double({ min: 4, max: 72, noNaN: true }), (text, sizePt) => {
        const pdfWidthMm = pdfFonts.regular.widthOfTextAtSize(text, sizePt) * MM_PER_PT;
        expect(measureTextMm({ text, sizePt, weight: 'regular' })).toBeCloseTo(pdfWidthMm, 9);
      }),
      { seed: 20240501, numRuns: 200 },
    );
  });

  it('is proportional to size and bold is wider than regular', () => {
    const at10 = measureTextMm({ text: 'Cruise 40 kW', sizePt: 10, weight: 'regular' });
    expect(measureTextMm({ text: 'Cruise 40 kW', sizePt: 20, weight: 'regular' })).toBeCloseTo(2 * at10, 9);
    expect(measureTextMm({ text: 'Cruise 40 kW', sizePt: 10, weight: 'bold' })).toBeGreaterThan(at10);
  });

  it('ignores kerning: "AV" is as wide as "A" plus "V"', () => {
    const part = (text: string): number => measureTextMm({ text, sizePt: 12, weight: 'regular' });
    expect(part('AV')).toBeCloseTo(part('A') + part('V'), 9);
  });

  it('does not count control or bidirectional-control characters', () => {
    const plain = measureTextMm({ text: 'rpm', sizePt: 12, weight: 'regular' });
    expect(measureTextMm({ text: 'r\tp\u202em\n', sizePt: 12, weight: 'regular' })).toBeCloseTo(plain, 9);
  });
});

describe('unsupportedCharacters()', () => {
  it('names each character without a glyph once, in order of appearance', () => {
    expect(unsupportedCharacters('5600 rpm 中 שלום 中', 'regular')).toEqual(['中', 'ש', 'ל', 'ו', 'ם']);
  });

  it('finds nothing in Latin, Greek and Cyrillic text', () => {
    for (const text of SAMPLES) expect(unsupportedCharacters(text, 'bold')).toEqual([]);
  });
});

describe('textNode() and textBox()', () => {
  it('textNode fills in the measured width and defaults anchor and colour', () => {
    const node = textNode({ text: 'WOT', sizePt: 14, weight: 'bold', x: 10, y: 20 });
    expect(node.widthMm).toBeCloseTo(measureTextMm({ text: 'WOT', sizePt: 14, weight: 'bold' }), 12);
    expect(node).toMatchObject({ type: 'text', anchor: 'start', colour: '#000000', x: 10, y: 20 });
  });

  it('textBox height equals pdf-lib heightAtSize (ascent + descent) and follows the anchor', async () => {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkitForPdf);
    const pdfFont = await doc.embedFont(readFileSync(FONT_FILES.regular));
    const heightMm = pdfFont.heightAtSize(10) * MM_PER_PT;
    const start = textNode({ text: 'Impeller', sizePt: 10, weight: 'regular', x: 50, y: 40 });
    const startBox = textBox(start);
    expect(startBox.height).toBeCloseTo(heightMm, 9);
    expect(startBox.x).toBe(50);
    expect(startBox.y).toBeLessThan(40);
    expect(startBox.y + startBox.height).toBeGreaterThan(40);
    expect(textBox({ ...start, anchor: 'middle' }).x).toBeCloseTo(50 - start.widthMm / 2, 12);
    expect(textBox({ ...start, anchor: 'end' }).x).toBeCloseTo(50 - start.widthMm, 12);
  });

  it('textBox of a 90° run stands upright above the anchor, glyph tops to the left', () => {
    const node = textNode({ text: 'Power (kW)', sizePt: 10, weight: 'regular', x: 15, y: 100, rotateDeg: 90 });
    const flat = textBox({ ...node, rotateDeg: 0 });
    const box = textBox(node);
    expect(box.width).toBeCloseTo(flat.height, 12);
    expect(box.height).toBeCloseTo(node.widthMm, 12);
    expect(box.y + box.height).toBeCloseTo(100, 12);
    expect(box.x + box.width - 15).toBeCloseTo(flat.y + flat.height - 100, 12); // descent lies right of x
  });
});

describe('fitText()', () => {
  const label = 'Alternative impeller rating band';

  it('keeps the size when the text fits', () => {
    const fitted = fitText({ text: label, sizePt: 10, weight: 'regular', maxWidthMm: 100, minSizePt: 6 });
    expect(fitted).toMatchObject({ text: label, sizePt: 10, shortened: false });
  });

  it('shrinks to the largest tenth of a point that fits', () => {
    const full = measureTextMm({ text: label, sizePt: 12, weight: 'regular' });
    const fitted = fitText({ text: label, sizePt: 12, weight: 'regular', maxWidthMm: full * 0.8, minSizePt: 6 });
    expect(fitted.sizePt).toBe(9.6); // 12 × 0.8 = 9.6 exactly
    expect(fitted.shortened).toBe(false);
    expect(fitted.widthMm).toBeLessThanOrEqual(full * 0.8 + 1e-9);
  });

  it('shortens with an ellipsis at the minimum size when shrinking is not enough', () => {
    const fitted = fitText({ text: label, sizePt: 12, weight: 'bold', maxWidthMm: 25, minSizePt: 8 });
    expect(fitted.shortened).toBe(true);
    expect(fitted.sizePt).toBe(8);
    expect(fitted.text.endsWith('…')).toBe(true);
    expect(label.startsWith(fitted.text.slice(0, -1))).toBe(true);
    expect(fitted.widthMm).toBeLessThanOrEqual(25);
    const oneMore = `${label.slice(0, fitted.text.length)}…`;
    expect(measureTextMm({ text: oneMore, sizePt: 8, weight: 'bold' })).toBeGreaterThan(25);
  });

  it('always fits whenever more than the ellipsis remains, and keeps a prefix of the text', () => {
    const word = fc.string({ unit: fc.constantFrom(...'abcdefWMil ffi.-0123456789'), minLength: 1, maxLength: 60 });
    fc.assert(
      fc.property(word, fc.double({ min: 2, max: 80, noNaN: true }), (text, maxWidthMm) => {
        const fitted = fitText({ text, sizePt: 12, weight: 'regular', maxWidthMm, minSizePt: 7 });
        if (fitted.text !== '…') expect(fitted.widthMm).toBeLessThanOrEqual(maxWidthMm);
        expect(fitted.sizePt).toBeGreaterThanOrEqual(7);
        expect(fitted.sizePt).toBeLessThanOrEqual(12);
        if (fitted.shortened) expect(text.startsWith(fitted.text.slice(0, -1))).toBe(true);
        else expect(fitted.text).toBe(text);
      }),
      { seed: 7, numRuns: 200 },
    );
  });

  it('falls back to the ellipsis alone when not even one character fits', () => {
    const fitted = fitText({ text: 'Wide-open throttle', sizePt: 12, weight: 'bold', maxWidthMm: 1, minSizePt: 8 });
    expect(fitted).toMatchObject({ text: '…', sizePt: 8, shortened: true });
  });
});
