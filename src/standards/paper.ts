/**
 * Paper sizes, mm. ISO 216 gives the A series; ANSI/ASME Y14.1 gives Letter (A) and Tabloid (B);
 * Legal is the US 8.5 × 14 in sheet and Card4x6 the 4 × 6 in card; 1 in = 25.4 mm exactly.
 * A shared foundation: the data layer validates paper choices, the scene layer lays pages out on them.
 */

export type PaperSize = 'A3' | 'A4' | 'A5' | 'A6' | 'Letter' | 'Legal' | 'Tabloid' | 'Card4x6';
export type Orientation = 'portrait' | 'landscape';

export interface Paper {
  readonly size: PaperSize;
  readonly orientation: Orientation;
  /** Bleed beyond the trim on every side (mm), 0 for none. */
  readonly bleedMm: number;
  /** Crop marks outside the bleed; when absent, drawn exactly when the sheet has bleed (withCropMarks). */
  readonly cropMarks?: boolean;
}

/** Whether a paper gets crop marks: as it says, else when it has bleed (a sheet without bleed is cut at its edge). */
export function withCropMarks(paper: Paper): boolean {
  return paper.cropMarks ?? paper.bleedMm > 0;
}

const MM_PER_IN = 25.4;

/** Inches → mm, rounded to the µm so 8.5 in is exactly 215.9 mm in floating point too. */
const inchesMm = (inches: number): number => Math.round(inches * MM_PER_IN * 1000) / 1000;

/** Portrait width × height in mm. */
export const PORTRAIT_MM: Readonly<Record<PaperSize, readonly [number, number]>> = Object.freeze({
  A3: [297, 420],
  A4: [210, 297],
  A5: [148, 210],
  A6: [105, 148],
  Letter: [inchesMm(8.5), inchesMm(11)],
  Legal: [inchesMm(8.5), inchesMm(14)],
  Tabloid: [inchesMm(11), inchesMm(17)],
  Card4x6: [inchesMm(4), inchesMm(6)],
});

/** Trim size of a sheet in mm for a paper size and orientation. */
export function paperSizeMm(size: PaperSize, orientation: Orientation): { widthMm: number; heightMm: number } {
  const [shortMm, longMm] = PORTRAIT_MM[size];
  return orientation === 'portrait' ? { widthMm: shortMm, heightMm: longMm } : { widthMm: longMm, heightMm: shortMm };
}

/**
 * Print settings that override every sheet's paper for one run (`matchbook build --bleed 3
 * --crop-marks`); what is not given keeps the paper's own.
 */
export interface PrintOverride {
  readonly bleedMm?: number;
  readonly cropMarks?: boolean;
}

/**
 * The paper a sheet is printed on: the override applied, in one form for equal drawings (cropMarks
 * only when it differs from the default for its bleed), so equal sheets are one file.
 */
export function printedPaper(paper: Paper, override: PrintOverride = {}): Paper {
  const bleedMm = override.bleedMm ?? paper.bleedMm;
  const cropMarks = override.cropMarks ?? paper.cropMarks ?? bleedMm > 0;
  return { size: paper.size, orientation: paper.orientation, bleedMm, ...(cropMarks !== bleedMm > 0 ? { cropMarks } : {}) };
}
