/**
 * What the templates see: plain, already-formatted views of the project, computed once per build
 * by src/site and handed to Eleventy as the global data "site". Hrefs are relative to the site root
 * ("sheets/x.svg"); pages prefix them with the way back to the root so the site also works when
 * opened from disk.
 */
import { escapeHtml } from './html.ts';

/**
 * One table cell or fact value: plain text, or text with a link (relative to the site root) or a mark.
 * 'warn' is a status the engine must be protected from (lugs, over-revs, no operating point, cruise
 * beyond WOT): printed in bold words in a barred, tinted cell, so it never rests on colour alone.
 * 'dataSheet' is a data-sheet figure printed beside a sea-trial-calibrated one, in softer ink.
 */
export type CellView = string | { readonly text: string; readonly href?: string; readonly mark?: 'warn' | 'dataSheet' };

/** A table of already-formatted cells; numbers right-aligned by column. */
export interface TableView {
  readonly caption: string;
  readonly head: readonly string[];
  readonly rows: readonly (readonly CellView[])[];
  /** Columns (by index) that hold numbers. */
  readonly numeric: readonly number[];
  /** Columns (by index) whose cells must not wrap (dates: "2026-03-\n14" misreads). */
  readonly nowrap?: readonly number[];
  /** Columns (by index) of statuses in words, given room to be read at a glance. */
  readonly words?: readonly number[];
  /** Optional plain sentence under the table. */
  readonly note?: string;
  /** 'comparison': options side by side, one column each, the row headers given room (site.css). */
  readonly layout?: 'comparison';
}

export interface Downloads {
  readonly svg: string;
  readonly png: string;
  readonly pdf: string;
}

/** One sheet: inline SVG for the page, text alternative, downloads. */
export interface SheetView {
  readonly slug: string;
  readonly kind: string;
  readonly title: string;
  /** Text alternative of the whole chart (Scene.description). */
  readonly description: string;
  /**
   * The sheet's SVG, ready to inline (no XML prolog, ids made unique per sheet). Read from the written
   * file when a page asks, so a thousand-boat build does not hold every SVG in memory.
   */
  readonly svgInline: () => string;
  /** CSS page name for printing at paper size, e.g. "A4-landscape". */
  readonly printPage: string;
  readonly widthMm: number;
  readonly heightMm: number;
  readonly downloads: Downloads;
  /** The sheet's further pages (a sheet that continues on a second page of the same paper). */
  readonly morePages?: readonly { readonly svgInline: () => string; readonly downloads: Omit<Downloads, 'pdf'> }[];
}

export interface LinkView {
  readonly label: string;
  readonly href: string;
}

export interface FamilyView {
  readonly id: string;
  readonly label: string;
  readonly maker: string;
  readonly href: string;
  readonly notes?: string;
  readonly facts: readonly (readonly [string, string])[];
  readonly charts: readonly SheetView[];
  readonly tables: readonly TableView[];
  readonly boats: readonly LinkView[];
  readonly resultsHref: string;
  /** The results as CSV tables for a spreadsheet (src/site/resultsCsv.ts). */
  readonly csvLinks: readonly LinkView[];
}

import type { TrendView } from './trendPlot.ts';

/** A boat's sea trials and what they calibrated (only for boats with usable trials). */
export interface CalibrationView {
  readonly heading: string;
  /** Absent when the trials were refused (then the paragraphs say why). */
  readonly trials?: TableView;
  /** What was fitted, what the calibrated bands cover: one sentence or a few each. */
  readonly paragraphs: readonly string[];
}

export interface BoatView {
  readonly id: string;
  readonly name: string;
  readonly href: string;
  readonly notes?: string;
  readonly facts: readonly (readonly [string, CellView])[];
  readonly links: readonly LinkView[];
  readonly sheets: readonly SheetView[];
  readonly tables: readonly TableView[];
  /** Present only when the boat has usable sea trials. */
  readonly calibration?: CalibrationView;
  /** Present when an impeller has enough trials for a trend (trendPlot.ts). */
  readonly trend?: TrendView;
  readonly resultsHref: string;
  /** The results as CSV tables for a spreadsheet (src/site/resultsCsv.ts). */
  readonly csvLinks: readonly LinkView[];
}

/** A boat's repower comparison page: the sentence, the options side by side, the sheet. */
export interface RepowerView {
  readonly boatId: string;
  readonly boatName: string;
  /** boats/<id>/repower/index.html */
  readonly href: string;
  readonly boatHref: string;
  /** The one sentence naming the options that keep full throttle inside their engine's range. */
  readonly sentence: string;
  readonly table: TableView;
  /** How to read it and what the figures stand on. */
  readonly note: string;
  readonly sheets: readonly SheetView[];
  readonly resultsHref: string;
}

export interface BookView {
  readonly id: string;
  readonly title: string;
  readonly audience: string;
  readonly href: string;
  readonly pdfHref: string;
  readonly sheets: readonly SheetView[];
  /** The cautions its sheets print: the built-in ones, the site's, then the book's own. */
  readonly cautions: readonly string[];
}

export interface JetView {
  readonly id: string;
  readonly label: string;
  readonly maker: string;
  readonly table: TableView;
}

/** A guide of docs/ rendered as a page of the site. */
export interface GuideView {
  readonly slug: string;
  /** The Markdown's first heading. */
  readonly title: string;
  readonly navLabel: string;
  /** The page, relative to the site root (guides/<slug>/index.html). */
  readonly href: string;
  /** The rendered Markdown: built from the package's own docs, never from a data folder. */
  readonly bodyHtml: string;
  /** Whether the page lists the JSON Schemas after the text. */
  readonly withSchemas: boolean;
}

/** The front page's account of what this build changed against the previous build of the folder (src/site/reprint.ts). */
export interface ReprintView {
  readonly heading: string;
  /** What was compared, then the counts. */
  readonly summary: string;
  /** Sheets changed in content, named with a link to their page (at most a few dozen), and how many more there are. */
  readonly changed: { readonly links: readonly LinkView[]; readonly more: number };
  /** Changed sheets not named: the only change is the issue date and data revision they print. */
  readonly revisionAndDateOnly: number;
  readonly added: { readonly links: readonly LinkView[]; readonly more: number };
  readonly checklistHref: string;
  readonly jsonHref: string;
}

export interface SiteView {
  readonly shopName: string;
  readonly contactLine: string;
  readonly dataRevision: string;
  readonly dateIso: string;
  readonly cautions: readonly string[];
  readonly families: readonly FamilyView[];
  /** The index's engine-family summary: variants, window and maximum rpm, a link per family. */
  readonly familySummary: TableView;
  readonly jets: readonly JetView[];
  readonly boats: readonly BoatView[];
  /** One comparison page per boat that lists repower options. */
  readonly repowers: readonly RepowerView[];
  /** The index's boat summary a dealer reads at a glance: combination, predicted WOT, window, status, a link per boat. */
  readonly boatSummary: TableView;
  readonly books: readonly BookView[];
  readonly schemas: readonly LinkView[];
  /** The user guides rendered from docs/, in navigation order. */
  readonly guides: readonly GuideView[];
  /** What changed since the previous build of the output folder; absent where nothing was compared (tests of pages). */
  readonly reprint?: ReprintView;
  /** The guide page describing the results JSON files, if the site carries it. */
  readonly resultsDocHref?: string;
  /**
   * Only while `serve` runs on broken data: what is wrong, shown at the top of every page over the last
   * good build (or over an empty site when nothing has built yet). A one-shot build never has problems.
   */
  readonly problems?: ProblemsView;
}

/** The problems of the data as the dev server shows them on every page. */
export interface ProblemsView {
  /** "The data has 2 problems." */
  readonly heading: string;
  /** What the page below is: the last good build, or nothing yet. */
  readonly note: string;
  readonly items: readonly ProblemView[];
}

export interface ProblemView {
  /** file:line:col, as the user would type it. */
  readonly where: string;
  /** The rest of the sentence. */
  readonly message: string;
  /** Lines shown under it in monospace: the source line, a caret, the parser's words. */
  readonly detail: readonly string[];
}

/**
 * The global data object. A class instance on purpose: Eleventy deep-copies plain objects into every
 * page's data, which for a thousand boats would copy the whole site a thousand times.
 */
export class SiteData {
  /**
   * Failures of page templates, caught so that Eleventy finishes every page before the build gives up
   * (a rejection would leave other pages still being written into a staging folder being removed).
   */
  readonly failures: unknown[] = [];
  /** Called with each page's name before it renders; only tests set it, to inject a failure. */
  beforePage?: (name: string) => void;
  constructor(readonly view: SiteView) {}
  /** Renders one page, catching its failure (kept in failures; the page then says it failed). */
  page(name: string, render: () => string): string {
    try {
      this.beforePage?.(name);
      return render();
    } catch (error) {
      this.failures.push(error);
      const message = error instanceof Error ? error.message : String(error);
      return `<!doctype html><title>Page failed</title><p>matchbook could not write this page (${escapeHtml(message)}); this is a fault in matchbook.</p>\n`;
    }
  }
  get families(): readonly FamilyView[] {
    return this.view.families;
  }
  get boats(): readonly BoatView[] {
    return this.view.boats;
  }
  get repowers(): readonly RepowerView[] {
    return this.view.repowers;
  }
  get books(): readonly BookView[] {
    return this.view.books;
  }
  get guides(): readonly GuideView[] {
    return this.view.guides;
  }
}
