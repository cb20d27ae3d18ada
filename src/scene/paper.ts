/** The page frame (media, trim, safe area, bleed) and crop marks, all in mm; sizes from src/standards/paper.ts. */
import { PORTRAIT_MM, paperSizeMm, type Paper, type PaperSize } from '../standards/paper.ts';
import type { Box, PathNode } from './types.ts';

export { paperSizeMm };

export interface PageFrame {
  /** Media size: trim plus bleed on every side (mm). */
  readonly widthMm: number;
  readonly heightMm: number;
  readonly trimBox: Box;
  readonly safeBox: Box;
  readonly bleedMm: number;
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
  return {
    widthMm: trim.widthMm + 2 * bleedMm,
    heightMm: trim.heightMm + 2 * bleedMm,
    trimBox: { x: bleedMm, y: bleedMm, width: trim.widthMm, height: trim.heightMm },
    safeBox: {
      x: bleedMm + marginMm,
      y: bleedMm + marginMm,
      width: trim.widthMm - 2 * marginMm,
      height: trim.heightMm - 2 * marginMm,
    },
    bleedMm,
  };
}

/** Crop-mark stroke: 0.25 mm ≈ 0.71 pt, above the 0.5 pt floor so it survives printing. */
export const CROP_MARK_WIDTH_MM = 0.25;
// Marks stop short of the trim corner so a slightly off cut does not leave them on the sheet.
const CROP_MARK_GAP_MM = 1;

/** Crop marks (mm) in the bleed zone at the four trim corners; none when there is no bleed. */
export function cropMarks(frame: PageFrame): PathNode[] {
  const { bleedMm, trimBox } = frame;
  if (bleedMm <= CROP_MARK_GAP_MM) return [];
  const markMm = bleedMm - CROP_MARK_GAP_MM;
  const left = trimBox.x;
  const right = trimBox.x + trimBox.width;
  const top = trimBox.y;
  const bottom = trimBox.y + trimBox.height;
  const marks: PathNode[] = [];
  for (const [cornerX, outX] of [[left, -1], [right, 1]] as const) {
    for (const [cornerY, outY] of [[top, -1], [bottom, 1]] as const) {
      // One mark continues the horizontal trim edge outward, one the vertical edge.
      const hStartX = cornerX + outX * CROP_MARK_GAP_MM;
      const vStartY = cornerY + outY * CROP_MARK_GAP_MM;
      marks.push({
        type: 'path',
        role: 'crop-mark',
        segments: [
          { op: 'M', x: hStartX, y: cornerY },
          { op: 'L', x: hStartX + outX * markMm, y: cornerY },
          { op: 'M', x: cornerX, y: vStartY },
          { op: 'L', x: cornerX, y: vStartY + outY * markMm },
        ],
        stroke: { colour: '#000000', widthMm: CROP_MARK_WIDTH_MM, cap: 'butt' },
      });
    }
  }
  return marks;
}
