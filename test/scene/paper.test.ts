import { describe, expect, it } from 'vitest';
import type { Paper, PaperSize } from '../../src/data/types.ts';
import { CROP_MARK_WIDTH_MM, cropMarks, defaultMarginMm, pageFrame, paperSizeMm } from '../../src/scene/paper.ts';
import { MM_PER_PT } from '../../src/scene/text.ts';

describe('paperSizeMm()', () => {
  it('gives the ISO 216 A-series trim sizes in portrait', () => {
    // ISO 216:2007, Table 1 (A series): A3 297 × 420, A4 210 × 297, A5 148 × 210, A6 105 × 148 mm.
    expect(paperSizeMm('A3', 'portrait')).toEqual({ widthMm: 297, heightMm: 420 });
    expect(paperSizeMm('A4', 'portrait')).toEqual({ widthMm: 210, heightMm: 297 });
    expect(paperSizeMm('A5', 'portrait')).toEqual({ widthMm: 148, heightMm: 210 });
    expect(paperSizeMm('A6', 'portrait')).toEqual({ widthMm: 105, heightMm: 148 });
  });

  it('keeps the ISO 216 side ratio of √2 within the standard\'s rounding to whole mm', () => {
    // ISO 216 defines A0 as 1 m² with sides in ratio 1:√2 and rounds each size down to the mm.
    for (const size of ['A3', 'A4', 'A5', 'A6'] as const) {
      const { widthMm, heightMm } = paperSizeMm(size, 'portrait');
      expect(Math.abs(heightMm / widthMm - Math.SQRT2)).toBeLessThan(0.01);
    }
  });

  it('gives the ANSI sizes in inches converted at 25.4 mm/in', () => {
    // ANSI/ASME Y14.1: size A (Letter) 8.5 × 11 in, size B (Tabloid) 11 × 17 in; 1 in = 25.4 mm exactly.
    expect(paperSizeMm('Letter', 'portrait')).toEqual({ widthMm: 215.9, heightMm: 279.4 });
    expect(paperSizeMm('Tabloid', 'portrait')).toEqual({ widthMm: 279.4, heightMm: 431.8 });
    // US Legal 8.5 × 14 in and the 4 × 6 in card: common practice, no source.
    expect(paperSizeMm('Legal', 'portrait')).toEqual({ widthMm: 215.9, heightMm: 355.6 });
    const card = paperSizeMm('Card4x6', 'portrait');
    expect(card.widthMm).toBeCloseTo(101.6, 9);
    expect(card.heightMm).toBeCloseTo(152.4, 9);
  });

  it('swaps width and height in landscape', () => {
    expect(paperSizeMm('A4', 'landscape')).toEqual({ widthMm: 297, heightMm: 210 });
    expect(paperSizeMm('Letter', 'landscape')).toEqual({ widthMm: 279.4, heightMm: 215.9 });
  });
});

describe('pageFrame()', () => {
  it('without bleed the media is the trim and the safe box sits 10 mm inside an A4 sheet', () => {
    const frame = pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } });
    expect(frame).toEqual({
      widthMm: 210,
      heightMm: 297,
      trimBox: { x: 0, y: 0, width: 210, height: 297 },
      safeBox: { x: 10, y: 10, width: 190, height: 277 },
      bleedMm: 0,
    });
  });

  it('with 3 mm bleed the media grows by 6 mm and trim and safe boxes shift by the bleed', () => {
    const frame = pageFrame({ paper: { size: 'A3', orientation: 'landscape', bleedMm: 3 } });
    expect(frame.widthMm).toBe(426);
    expect(frame.heightMm).toBe(303);
    expect(frame.trimBox).toEqual({ x: 3, y: 3, width: 420, height: 297 });
    expect(frame.safeBox).toEqual({ x: 15, y: 15, width: 396, height: 273 });
  });

  it('uses 12 mm margins on sheets larger than A4 and 10 mm on A4 and smaller', () => {
    const margins = (['A3', 'Tabloid', 'Legal', 'A4', 'Letter', 'A5', 'A6', 'Card4x6'] as PaperSize[]).map(defaultMarginMm);
    expect(margins).toEqual([12, 12, 12, 10, 10, 10, 10, 10]);
  });

  it('accepts a custom margin and refuses one that leaves no room', () => {
    const paper: Paper = { size: 'A6', orientation: 'portrait', bleedMm: 0 };
    expect(pageFrame({ paper, marginMm: 5 }).safeBox).toEqual({ x: 5, y: 5, width: 95, height: 138 });
    expect(() => pageFrame({ paper, marginMm: 60 })).toThrow(/margin 60 mm/);
  });
});

describe('cropMarks()', () => {
  it('draws none without bleed', () => {
    expect(cropMarks(pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } }))).toEqual([]);
  });

  it('draws two marks at each of the four corners, all in the bleed zone outside the trim', () => {
    const frame = pageFrame({ paper: { size: 'A5', orientation: 'portrait', bleedMm: 3 } });
    const marks = cropMarks(frame);
    expect(marks).toHaveLength(4);
    const { x, y, width, height } = frame.trimBox;
    const points = marks.flatMap((m) => m.segments.flatMap((s) => (s.op === 'M' || s.op === 'L' ? [s] : [])));
    expect(points).toHaveLength(16);
    for (const p of points) {
      const insideTrim = p.x > x && p.x < x + width && p.y > y && p.y < y + height;
      expect(insideTrim).toBe(false);
      expect(p.x).toBeGreaterThanOrEqual(0);
      expect(p.y).toBeGreaterThanOrEqual(0);
      expect(p.x).toBeLessThanOrEqual(frame.widthMm);
      expect(p.y).toBeLessThanOrEqual(frame.heightMm);
      // Each mark point sits in a corner zone: outside the trim on one axis, on the trim line on the other.
      const onVerticalTrimLine = p.x === x || p.x === x + width;
      const onHorizontalTrimLine = p.y === y || p.y === y + height;
      expect(onVerticalTrimLine || onHorizontalTrimLine).toBe(true);
    }
  });

  it('strokes marks no thinner than 0.5 pt so they survive printing', () => {
    const marks = cropMarks(pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 3 } }));
    expect(CROP_MARK_WIDTH_MM).toBeGreaterThanOrEqual(0.5 * MM_PER_PT);
    for (const mark of marks) expect(mark.stroke?.widthMm).toBe(CROP_MARK_WIDTH_MM);
  });
});
