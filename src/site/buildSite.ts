/**
 * One complete build: load and validate the data, compute and write everything into a staging folder,
 * let Eleventy write the pages there, then swap the staging folder in as the output. Any failure leaves
 * the previous output exactly as it was.
 */
import { loadProject } from '../data/load.ts';
import { printedError } from '../data/errors.ts';
import type { DataError } from '../data/types.ts';
import type { PrintOverride } from '../standards/paper.ts';
import { existsSync } from 'node:fs';
import { checkOutputFolder, createStaging, discardStaging, OutputFolderError, placeError, swapIn } from './atomicDir.ts';
import { buildDateIso } from './dateIso.ts';
import type { FaultHook } from './drawSheets.ts';
import { SheetDrawError } from './errors.ts';
import { sheetDrawProblem } from './sheetProblems.ts';
import type { BuildCache } from './renderCache.ts';
import { createRenderPool, type SheetRenderer } from './renderPool.ts';
import { readPreviousBuild } from './reprint.ts';
import { writePages } from './runEleventy.ts';
import { writeSiteFiles, type SiteCounts } from './siteFiles.ts';
import { unprintableText } from './unprintable.ts';

export interface BuildOptions {
  readonly dataDir: string;
  readonly outDir: string;
  /** The SOURCE_DATE_EPOCH environment value, if any. */
  readonly sourceDateEpoch?: string;
  /** --bleed and --crop-marks: override the paper of every sheet and book. */
  readonly print?: PrintOverride;
  readonly onProgress?: (done: number, total: number) => void;
  /** Reuse rendered sheets across builds in one process (dev server, benchmarks). */
  readonly cache?: BuildCache;
  /** A long-lived render pool to use (and leave running); by default one is started and closed. */
  readonly renderer?: SheetRenderer;
  /** Only tests set it: throws at a named step (a sheet's scene or render, a book, the files, a page, the swap). */
  readonly fault?: FaultHook;
}

export type BuildOutcome =
  | { readonly ok: true; readonly counts: SiteCounts & { readonly pages: number }; readonly warningsText: string }
  | { readonly ok: false; readonly errorsText: string; readonly warningsText: string };

/** Every data problem on its own line, then a count. */
export function formatDataErrors(errors: readonly DataError[], what: 'problem' | 'warning'): string {
  if (errors.length === 0) return '';
  const lines = [...new Set(errors.map(printedError))];
  return `${lines.join('\n')}\n${lines.length} ${what}${lines.length === 1 ? '' : 's'} in the data.\n`;
}

/** Builds the site from dataDir into outDir atomically. */
export async function buildSite(opts: BuildOptions): Promise<BuildOutcome> {
  checkOutputFolder({ outDir: opts.outDir, dataDir: opts.dataDir });
  const loaded = await loadProject(opts.dataDir);
  const warningsText = formatDataErrors(loaded.warnings, 'warning');
  if (!loaded.ok) return { ok: false, errorsText: formatDataErrors(loaded.errors, 'problem'), warningsText };
  const unprintable = unprintableText(loaded.project, { dataDir: opts.dataDir });
  if (unprintable.length > 0) return { ok: false, errorsText: formatDataErrors(unprintable, 'problem'), warningsText };
  const dateIso = buildDateIso({ sourceDateEpoch: opts.sourceDateEpoch, issueDate: loaded.project.site.issueDate });
  // The sheet list of the build now in the output folder, read before the new build is swapped in.
  const previous = readPreviousBuild(opts.outDir);
  const staging = createStaging(opts.outDir);
  const renderer = opts.renderer ?? createRenderPool();
  try {
    const { site, counts } = await writeSiteFiles({
      project: loaded.project,
      dateIso,
      dir: staging,
      print: opts.print,
      cache: opts.cache,
      renderer,
      onProgress: opts.onProgress,
      fault: opts.fault,
      previous,
    });
    if (opts.fault) site.beforePage = (name) => opts.fault?.('pages', name);
    const pages = await writePages({ site, outDir: staging });
    opts.fault?.('swap', opts.outDir);
    swapIn({ staging, outDir: opts.outDir });
    return { ok: true, counts: { ...counts, pages }, warningsText };
  } catch (error) {
    // Every step awaits its own work before it rejects (sheets in flight, books, pages), so nothing
    // writes into the staging folder once it is gone; the pool is closed before it is removed.
    if (!opts.renderer) await renderer.close();
    discardStaging(staging);
    // A write still on its way when a fault of ours stopped the build cannot bring the folder back
    // (outputFiles never makes its root); one turn of the event loop later it is checked again.
    await new Promise((done) => setImmediate(done));
    if (existsSync(staging)) discardStaging(staging);
    // `check` lays out the same sheets, so this is rare; it is still said at the definition's line.
    if (error instanceof SheetDrawError) return { ok: false, errorsText: formatDataErrors([sheetDrawProblem(loaded.project, error, { print: opts.print })], 'problem'), warningsText };
    if (error instanceof OutputFolderError) throw error;
    throw placeError(error, opts.outDir);
  } finally {
    if (!opts.renderer) await renderer.close();
  }
}
