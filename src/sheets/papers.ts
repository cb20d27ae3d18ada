/**
 * The papers each boat sheet kind is made for: on every one of them (either orientation, with or without
 * bleed) every catalogue inside the limits of docs/sheets.md lays out, continuing on a second page where
 * one is not enough. Spec and upgrade sheets are page-sized (A5 and up); console cards fit any paper.
 */
import type { PaperSize } from '../data/types.ts';

export const BOAT_SHEET_PAPERS: Readonly<Record<'specSheet' | 'upgradeSheet' | 'consoleCard', readonly PaperSize[]>> = {
  specSheet: ['A3', 'A4', 'A5', 'Letter', 'Legal', 'Tabloid'],
  upgradeSheet: ['A3', 'A4', 'A5', 'Letter', 'Legal', 'Tabloid'],
  consoleCard: ['A6', 'Card4x6', 'A5', 'A4', 'Letter', 'Legal', 'A3', 'Tabloid'],
};

/**
 * The papers a wall chart is made for (either orientation, with or without bleed): the workshop sizes.
 * On smaller paper a wall chart lays out when it can (its variants and impeller rows continuing over
 * pages), else check and build refuse it at the book's sheet entry.
 */
export const WALL_CHART_PAPERS: readonly PaperSize[] = ['A3', 'Tabloid'];
