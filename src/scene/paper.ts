/** The page frame (media, trim, safe area, bleed, the slug for crop marks) and crop marks, all in mm; sizes from src/standards/paper.ts. */
import { PORTRAIT_MM, paperSizeMm, withCropMarks, type Paper, type PaperSize } from '../standards/paper.ts';
import type { Box, PathNode } from './types.ts';

export { paperSizeMm };

export interface PageFrame {
  /** Media size: trim plus bleed, or trim plus the slug that holds the crop marks (mm). */
  readonly widthMm: number;
  readonly heightMm: number;
  readonly trimBox: Box;
  readonly safeBox: Box;
  readonly bleedMm: number;
  /** Whether the page carries crop marks (then the media reaches past the bleed to hold them). */
  readonly cropMarks: boolean;
}

// Sheets longer than A4 (A3, Tabloid, Legal) are handled and pinned up at larger distances and get
// a wider margin (common practice, no source).
const LARGE_SHEET_LONG_SIDE_MM = 300;

/** Default safe margin inside the trim in mm: 10 on A4 and smaller, 12 on larger sheets. */
export function defaultMarginMm(size: PaperSize): number {
  return PORTRAIT_MM[size][1] > LARGE_SHEET_LONG_SIDE_MM ? 12 : 10;
}

/** Media, trim and safe boxes (mm) for a paper; the safe margin is measured inward from the trim. */
export function pageFrame(args: { paper: Paper; marginMm?: number }): PageFrame {
  const { paper } = args;
  const bleedMm = paper.bleedMm;
  const marginMm = args.marginMm ?? defaultMarginMm(paper.size);
  const trim = paperSizeMm(paper.size, paper.orientation);
  if (!(bleedMm >= 0) || !(marginMm >= 0) || 2 * marginMm >= Math.min(trim.widthMm, trim.heightMm)) {
    throw new RangeError(
      `page frame for ${paper.size} ${paper.orientation}: bleed ${bleedMm} mm and margin ${marginMm} mm must be ` +
        `non-negative and leave room on a ${trim.widthMm} × ${trim.heightMm} mm sheet; use a smaller margin`,
    );
  }
  const cropMarks = withCropMarks(paper);
  // The media reaches past the trim by the bleed, or, with crop marks, by the slug that holds them.
  const outsideMm = cropMarks ? cropMarkOffsetMm(bleedMm) + CROP_MARK_LENGTH_MM + CROP_MARK_CLEARANCE_MM : bleedMm;
  return {
    widthMm: trim.widthMm + 2 * outsideMm,
    heightMm: trim.heightMm + 2 * outsideMm,
    trimBox: { x: outsideMm, y: outsideMm, width: trim.widthMm, height: trim.heightMm },
    safeBox: {
      x: outsideMm + marginMm,
      y: outsideMm + marginMm,
      width: trim.widthMm - 2 * marginMm,
      height: trim.heightMm - 2 * marginMm,
    },
    bleedMm,
    cropMarks,
  };
}

/** The bleed box (mm): the trim grown by the bleed on every side; the trim itself without bleed. */
export function bleedBox(frame: { readonly trimBox: Box; readonly bleedMm: number }): Box {
  const { trimBox: t, bleedMm: b } = frame;
  return { x: t.x - b, y: t.y - b, width: t.width + 2 * b, height: t.height + 2 * b };
}

// Crop marks as print shops commonly ask for them (common practice, no source): hairlines about 0.25 pt
// wide, about 5 mm long, in line with the trim edges, starting at the bleed edge so none of a mark
// ever lies in the bleed (where it would print on artwork that runs to the edge). A sheet without bleed
// still keeps its marks 3 mm off the trim corner, the usual bleed, so a slightly off cut never leaves a
// mark on the finished sheet. Black, which the PDF writes in the black ink alone (DeviceGray).
/** Crop-mark stroke: a 0.25 pt hairline (mm). Marks are cut off, so the 0.5 pt floor of the sheet's own lines does not apply. */
export const CROP_MARK_WIDTH_MM = 0.25 * (25.4 / 72);
/** Length of each crop mark (mm). */
export const CROP_MARK_LENGTH_MM = 5;
const MIN_CROP_MARK_OFFSET_MM = 3;
// White space between a mark's outer end and the media edge, so a printer that clips the edge keeps the mark.
const CROP_MARK_CLEARANCE_MM = 2;

/** How far outside the trim each crop mark starts (mm): at the bleed edge, and at least 3 mm out. */
export function cropMarkOffsetMm(bleedMm: number): number {
  return Math.max(bleedMm, MIN_CROP_MARK_OFFSET_MM);
}

/** Crop marks (mm) at the four trim corners, outside the bleed; none when the page has no marks. */
export function cropMarks(frame: PageFrame): PathNode[] {
  if (!frame.cropMarks) return [];
  const { trimBox } = frame;
  const offsetMm = cropMarkOffsetMm(frame.bleedMm);
  const left = trimBox.x;
  const right = trimBox.x + trimBox.width;
  const top = trimBox.y;
  const bottom = trimBox.y + trimBox.height;
  const marks: PathNode[] = [];
  for (const [cornerX, outX] of [[left, -1], [right, 1]] as const) {
    for (const [cornerY, outY] of [[top, -1], [bottom, 1]] as const) {
      // One mark continues the horizontal trim edge outward, one the vertical edge.
      const hStartX = cornerX + outX * offsetMm;
      const vStartY = cornerY + outY * offsetMm;
      marks.push({
        type: 'path',
        role: 'crop-mark',
        segments: [
          { op: 'M', x: hStartX, y: cornerY },
          { op: 'L', x: hStartX + outX * CROP_MARK_LENGTH_MM, y: cornerY },
          { op: 'M', x: cornerX, y: vStartY },
          { op: 'L', x: cornerX, y: vStartY + outY * CROP_MARK_LENGTH_MM },
        ],
        stroke: { colour: '#000000', widthMm: CROP_MARK_WIDTH_MM, cap: 'butt' },
      });
    }
  }
  return marks;
}
