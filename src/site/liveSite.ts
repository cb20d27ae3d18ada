/**
 * Site data for the dev server and for running Eleventy directly: recomputed from the data folder
 * before every (re)build, files written straight into the served folder (no atomic swap: the page
 * reloads after the rebuild anyway). Rendered sheets are reused through the content-hash cache.
 *
 * While the data is broken the rebuild still succeeds: every page is the last good build with the list
 * of problems at its top (or an empty site saying so, when nothing has built yet), so the browser
 * reloads to the problems on each save and to the fixed site once the files are fixed. Nothing here
 * throws on bad data, so a half-written save never stops the server.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { loadProject } from '../data/load.ts';
import type { DataError, Project } from '../data/types.ts';
import { BUILT_IN_CAUTIONS } from '../sheets/kit/cautions.ts';
import { OUTPUT_MARKER } from './atomicDir.ts';
import { formatDataErrors } from './buildSite.ts';
import { buildDateIso } from './dateIso.ts';
import { SheetDrawError } from './errors.ts';
import { sheetDrawProblem } from './sheetProblems.ts';
import { unprintableText } from './unprintable.ts';
import { createBuildCache } from './renderCache.ts';
import { readPreviousBuild } from './reprint.ts';
import { writeSiteFiles } from './siteFiles.ts';
import { SiteData, type ProblemView, type SiteView } from './siteView.ts';

export interface LiveSiteOptions {
  readonly dataDir: string;
  readonly outDir: string;
  /** Where messages go (problems in the data, rebuild summaries). */
  readonly report?: (text: string) => void;
}

/** A function Eleventy calls on every build to get fresh site data; it never rejects on bad data. */
export function liveSiteData(opts: LiveSiteOptions): () => Promise<SiteData> {
  const cache = createBuildCache();
  const report = opts.report ?? ((text: string) => process.stderr.write(text));
  let lastGood: SiteView | undefined;
  const broken = (items: readonly ProblemView[]): SiteData => {
    const count = items.length;
    const base = lastGood ?? emptySite();
    return new SiteData({
      ...base,
      problems: {
        heading: `The data has ${count} ${count === 1 ? 'problem' : 'problems'}; fix ${count === 1 ? 'it' : 'them'} and save.`,
        note: lastGood
          ? 'Below is the last site that built. This page reloads by itself when the files are fixed.'
          : 'Nothing has built yet. This page reloads by itself when the files are fixed.',
        items,
      },
    });
  };
  return async () => {
    const startMs = performance.now();
    let project: Project | undefined;
    try {
      const loaded = await loadProject(opts.dataDir);
      report(formatDataErrors(loaded.warnings, 'warning'));
      if (!loaded.ok) {
        report(formatDataErrors(loaded.errors, 'problem'));
        return broken(loaded.errors.map(problemView));
      }
      project = loaded.project;
      const unprintable = unprintableText(loaded.project, { dataDir: opts.dataDir });
      if (unprintable.length > 0) {
        report(formatDataErrors(unprintable, 'problem'));
        return broken(unprintable.map(problemView));
      }
      const dateIso = buildDateIso({ sourceDateEpoch: process.env.SOURCE_DATE_EPOCH, issueDate: loaded.project.site.issueDate });
      mkdirSync(opts.outDir, { recursive: true });
      writeFileSync(join(opts.outDir, OUTPUT_MARKER), 'Written by matchbook serve.\n');
      // Written in place: the reprint list compares with the last rebuild's sheet list, read first.
      const previous = readPreviousBuild(opts.outDir);
      const { site, counts } = await writeSiteFiles({ project: loaded.project, dateIso, dir: opts.outDir, cache, previous });
      lastGood = site.view;
      report(`rebuilt ${counts.sheets} sheets in ${((performance.now() - startMs) / 1000).toFixed(1)} s\n`);
      return site;
    } catch (error) {
      if (error instanceof SheetDrawError && project) {
        const problem = sheetDrawProblem(project, error);
        report(formatDataErrors([problem], 'problem'));
        return broken([problemView(problem)]);
      }
      // A fault in matchbook: say so on the page and in the terminal, and keep serving.
      const message = error instanceof Error ? error.message.split('\n')[0] : String(error);
      report(`matchbook: the rebuild stopped unexpectedly: ${message}\n`);
      return broken([{ where: '', message: `matchbook failed while building (a fault in matchbook, not in your data; please report it): ${message}`, detail: [] }]);
    }
  };
}

/** One located error split for the page: its place, the rest of its sentence, its detail lines. */
export function problemView(error: DataError): ProblemView {
  const where = `${error.file}:${error.line}:${error.column}`;
  const message = error.message.startsWith(`${where} `) ? error.message.slice(where.length + 1) : error.message;
  return { where, message, detail: error.detail ?? [] };
}

/** The site before anything has built: no definitions, the built-in cautions. */
function emptySite(): SiteView {
  const empty = { caption: '', head: [], rows: [], numeric: [] };
  return {
    shopName: 'matchbook',
    contactLine: '',
    dataRevision: 'none',
    dateIso: buildDateIso({ sourceDateEpoch: process.env.SOURCE_DATE_EPOCH, issueDate: new Date().toISOString().slice(0, 10) }),
    cautions: BUILT_IN_CAUTIONS,
    families: [],
    familySummary: empty,
    jets: [],
    repowers: [],
    boats: [],
    boatSummary: empty,
    books: [],
    schemas: [],
    guides: [],
  };
}
