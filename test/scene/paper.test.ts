import { describe, expect, it } from 'vitest';
import type { Paper, PaperSize } from '../../src/data/types.ts';
import { CROP_MARK_WIDTH_MM, bleedBox, cropMarkOffsetMm, cropMarks, defaultMarginMm, pageFrame, paperSizeMm } from '../../src/scene/paper.ts';
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
      cropMarks: false,
    });
  });

  it('with 3 mm bleed and no crop marks the media grows by 6 mm and trim and safe boxes shift by the bleed', () => {
    const frame = pageFrame({ paper: { size: 'A3', orientation: 'landscape', bleedMm: 3, cropMarks: false } });
    expect(frame.widthMm).toBe(426);
    expect(frame.heightMm).toBe(303);
    expect(frame.trimBox).toEqual({ x: 3, y: 3, width: 420, height: 297 });
    expect(bleedBox(frame)).toEqual({ x: 0, y: 0, width: 426, height: 303 });
    expect(frame.safeBox).toEqual({ x: 15, y: 15, width: 396, height: 273 });
  });

  it('with bleed draws crop marks by default, and the media grows by a slug that holds them', () => {
    // 3 mm bleed, marks 5 mm long from the bleed edge, 2 mm clear of the media edge: 10 mm each side.
    const frame = pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 3 } });
    expect(frame.cropMarks).toBe(true);
    expect([frame.widthMm, frame.heightMm]).toEqual([230, 317]);
    expect(frame.trimBox).toEqual({ x: 10, y: 10, width: 210, height: 297 });
    expect(bleedBox(frame)).toEqual({ x: 7, y: 7, width: 216, height: 303 });
    // The safe box keeps its margin inside the trim: the sheet's content does not move against the trim.
    expect(frame.safeBox).toEqual({ x: 20, y: 20, width: 190, height: 277 });
  });

  it('draws crop marks without bleed only when asked, then 3 mm off the trim', () => {
    expect(pageFrame({ paper: { size: 'A5', orientation: 'portrait', bleedMm: 0 } }).cropMarks).toBe(false);
    const frame = pageFrame({ paper: { size: 'A5', orientation: 'portrait', bleedMm: 0, cropMarks: true } });
    expect(frame.cropMarks).toBe(true);
    expect(frame.trimBox).toEqual({ x: 10, y: 10, width: 148, height: 210 });
    expect(bleedBox(frame)).toEqual(frame.trimBox);
    expect(cropMarkOffsetMm(0)).toBe(3);
    // A wider bleed pushes the marks out with it.
    expect(cropMarkOffsetMm(5)).toBe(5);
    expect(pageFrame({ paper: { size: 'A5', orientation: 'portrait', bleedMm: 5 } }).trimBox.x).toBe(12);
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
  it('draws none without bleed, and none with bleed when told not to', () => {
    expect(cropMarks(pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 0 } }))).toEqual([]);
    expect(cropMarks(pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 3, cropMarks: false } }))).toEqual([]);
  });

  for (const bleedMm of [0, 3, 5]) {
    it(`with ${bleedMm} mm bleed draws two 5 mm marks at each corner, in line with the trim edges, all outside the bleed and inside the media`, () => {
      const frame = pageFrame({ paper: { size: 'A5', orientation: 'portrait', bleedMm, cropMarks: true } });
      const marks = cropMarks(frame);
      expect(marks).toHaveLength(4);
      const trim = frame.trimBox;
      const bleed = bleedBox(frame);
      const offset = Math.max(bleedMm, 3);
      const lines = marks.flatMap((m) => {
        const points = m.segments.flatMap((s) => (s.op === 'M' || s.op === 'L' ? [s] : []));
        return [[points[0], points[1]], [points[2], points[3]]];
      });
      expect(lines).toHaveLength(8);
      const outside = (p: { x: number; y: number }) => p.x <= bleed.x || p.x >= bleed.x + bleed.width || p.y <= bleed.y || p.y >= bleed.y + bleed.height;
      for (const [a, b] of lines) {
        // A hairline 5 mm long (common practice, no source), horizontal or vertical.
        expect(Math.hypot(b.x - a.x, b.y - a.y)).toBeCloseTo(5, 9);
        const horizontal = a.y === b.y;
        expect(horizontal || a.x === b.x).toBe(true);
        // In line with a trim edge: a horizontal mark continues the top or bottom edge, a vertical one a side.
        if (horizontal) expect([trim.y, trim.y + trim.height]).toContain(a.y);
        else expect([trim.x, trim.x + trim.width]).toContain(a.x);
        // It starts at the bleed edge (never inside the bleed) and runs outward, and stays on the media.
        const along = horizontal ? [a.x, b.x] : [a.y, b.y];
        const [lo, hi] = horizontal ? [trim.x, trim.x + trim.width] : [trim.y, trim.y + trim.height];
        const gaps = along.map((v) => (v < lo ? lo - v : v - hi));
        expect(Math.min(...gaps)).toBeCloseTo(offset, 9);
        expect(Math.max(...gaps)).toBeCloseTo(offset + 5, 9);
        expect(outside(a) && outside(b)).toBe(true);
        for (const p of [a, b]) {
          expect(p.x).toBeGreaterThan(0);
          expect(p.y).toBeGreaterThan(0);
          expect(p.x).toBeLessThan(frame.widthMm);
          expect(p.y).toBeLessThan(frame.heightMm);
        }
      }
    });
  }

  it('strokes marks as black 0.25 pt hairlines', () => {
    // About 0.25 pt is the usual crop-mark weight (common practice, no source); 1 pt = 25.4/72 mm.
    expect(CROP_MARK_WIDTH_MM).toBeCloseTo(0.25 * MM_PER_PT, 12);
    const marks = cropMarks(pageFrame({ paper: { size: 'A4', orientation: 'portrait', bleedMm: 3 } }));
    for (const mark of marks) expect(mark.stroke).toEqual({ colour: '#000000', widthMm: CROP_MARK_WIDTH_MM, cap: 'butt' });
  });
});
