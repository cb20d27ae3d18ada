/**
 * Style tokens shared by every sheet: ink, series colours, dash patterns, marker shapes, type sizes
 * and stroke widths. Series are told apart three ways (colour, dash, marker) plus a direct label, so a
 * greyscale photocopy still reads. Tokens are named for what they encode.
 *
 * Reserved: the warning colour (WARN) and the warning mark (a box filled with WARN holding white bold
 * words, see kit/warningMarks.ts) mean "lugs or over-revs" and nothing else; no series takes that colour
 * or a hue near it. Limit lines (maximum rpm) are solid ink with a hatch on the forbidden side, a
 * pattern no series uses. The WOT window is the only band filled in WINDOW_FILL, with solid edges.
 *
 * Series colours: six, alternating dark and light in grey (neighbours differ by at least 12 in CIE L*)
 * and apart under a deuteranopia simulation; every one darker in grey than the grid. The separations are
 * computed in test/sheets/colourVision.test.ts. Several are taken from the Okabe–Ito set (M. Okabe and
 * K. Ito, "Color Universal Design (CUD): How to make figures and presentations that are friendly to
 * colorblind people", J*Fly, 2002/2008); its orange, vermillion and yellow are left out (the first two
 * sit next to the warning colour, yellow vanishes in a photocopy).
 */
import type { Colour, Stroke } from '../../scene/types.ts';
import type { Paper, PaperSize } from '../../data/types.ts';
import { MM_PER_PT } from '../../scene/text.ts';

/** Text and rules: near-black so photocopies keep full contrast. */
export const INK: Colour = '#000000';
/** Secondary text (axis titles, notes): still dark enough to photocopy (about 75 % black). */
export const INK_SOFT: Colour = '#333333';
/** Grid lines: lighter in grey than every series colour, so no curve reads weaker than the grid. */
export const GRID: Colour = '#c6c6c6';
/**
 * Warnings (lugs, over-revs, cautions) only: a deep red-orange with 5.5:1 contrast against white, so bold
 * warning words keep 4.5:1 as text and white words on it keep 4.5:1 in the reversed warning box.
 */
export const WARN: Colour = '#B8420A';
/** Words set on the warning colour. */
export const ON_WARN: Colour = '#ffffff';
export const PAPER_WHITE: Colour = '#ffffff';
/** Recommended WOT window band fill (drawn at WINDOW_OPACITY) and its solid edges. */
export const WINDOW_FILL: Colour = '#009E73';
export const WINDOW_OPACITY = 0.4;
export const WINDOW_EDGE: Colour = '#00664A';

/** Series colours in the order series take them (see the header for how they were chosen). */
export const SERIES_COLOURS: readonly Colour[] = [
  '#0072B2', // blue
  '#CC79A7', // reddish purple
  '#000000', // black
  '#4AA3DA', // sky blue (darkened so it stays darker than the grid in grey)
  '#5E3C99', // violet
  '#8C8C8C', // neutral grey
];

/** Dash patterns (mm) in series order; the first is solid. Chosen to differ at a glance in grey. */
export const SERIES_DASHES: readonly (readonly number[])[] = [
  [],
  [4, 1.5],
  [1, 1.2],
  [5, 1.2, 1, 1.2],
  [2.2, 1.2],
  [6, 1.5, 1, 1.2, 1, 1.5],
];

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond' | 'triangleDown' | 'cross' | 'hexagon';
/** Series markers; the square is left out, as a filled square is the warning mark at a point. */
export const SERIES_MARKERS: readonly MarkerShape[] = [
  'circle',
  'triangle',
  'diamond',
  'triangleDown',
  'cross',
  'hexagon',
];

/** Everything that identifies one series on paper. */
export interface SeriesStyle {
  readonly colour: Colour;
  readonly dashMm: readonly number[];
  readonly marker: MarkerShape;
}

/**
 * Style of the i-th series (0-based). Colour, dash and marker cycle with period 6, dash shifted one step
 * and marker two steps each lap, so two series never share colour, dash and marker together.
 */
export function seriesStyle(index: number): SeriesStyle {
  const lap = Math.floor(index / SERIES_COLOURS.length);
  return {
    colour: SERIES_COLOURS[index % SERIES_COLOURS.length],
    dashMm: SERIES_DASHES[(index + lap) % SERIES_DASHES.length],
    marker: SERIES_MARKERS[(index + 2 * lap) % SERIES_MARKERS.length],
  };
}

/** Stroke widths (mm). The thinnest is 0.7 pt, above the 0.5 pt print minimum. */
export const STROKE = {
  hairline: 0.25,
  grid: 0.25,
  rule: 0.35,
  axis: 0.4,
  series: 0.6,
  engine: 0.9,
  emphasis: 1.2,
} as const;

/** The minimum stroke the print rules allow: 0.5 pt. */
export const MIN_STROKE_MM = 0.5 * MM_PER_PT;

/** Type sizes (pt) of one sheet; `min` is the smallest size the sheet may use anywhere. */
export interface TypeScale {
  readonly min: number;
  /** Fine print (the cautions on the back of a card): 7 pt on A6 and 4 × 6 in, else the minimum. */
  readonly fine: number;
  readonly small: number;
  readonly body: number;
  readonly heading: number;
  readonly title: number;
  /** Big numbers on console cards. */
  readonly display: number;
}

const LARGE_PAPER: ReadonlySet<PaperSize> = new Set<PaperSize>(['A3', 'Tabloid']);

const CARD_PAPER: ReadonlySet<PaperSize> = new Set<PaperSize>(['A6', 'Card4x6']);
/** Fine print on a card held in the hand (A6, 4 × 6 in): 7 pt (the project's floor; common practice, no source). */
export const FINE_PRINT_CARD_PT = 7;
/** Roles that are fine print: the only text that may use TypeScale.fine. */
export const FINE_PRINT_ROLES: ReadonlySet<string> = new Set(['caution']);

/** Smallest type allowed on the paper: 10 pt on A3/Tabloid (read across a workshop), 8 pt on A4 and smaller. */
export function minTypePt(paper: Paper): number {
  return LARGE_PAPER.has(paper.size) ? 10 : 8;
}

/** Type scale for a paper size. */
export function typeScale(paper: Paper): TypeScale {
  if (LARGE_PAPER.has(paper.size)) {
    return { min: 10, fine: 10, small: 10, body: 11, heading: 14, title: 22, display: 36 };
  }
  return { min: 8, fine: CARD_PAPER.has(paper.size) ? FINE_PRINT_CARD_PT : 8, small: 8, body: 9, heading: 11, title: 16, display: 28 };
}

/** A stroke from the tokens. */
export function stroke(colour: Colour, widthMm: number, dashMm?: readonly number[]): Stroke {
  return dashMm && dashMm.length > 0 ? { colour, widthMm, dashMm, cap: 'butt' } : { colour, widthMm, cap: 'butt' };
}
