/**
 * Site data for the dev server and for running Eleventy directly: recomputed from the data folder
 * before every (re)build, files written straight into the served folder (no atomic swap: the page
 * reloads after the rebuild anyway). Rendered sheets are reused through the content-hash cache.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { loadProject } from '../data/load.ts';
import { OUTPUT_MARKER } from './atomicDir.ts';
import { formatDataErrors } from './buildSite.ts';
import { buildDateIso } from './dateIso.ts';
import { SheetDrawError } from './errors.ts';
import { unprintableText } from './unprintable.ts';
import { createBuildCache } from './renderCache.ts';
import { writeSiteFiles } from './siteFiles.ts';
import type { SiteData } from './siteView.ts';

export class InvalidDataError extends Error {}

export interface LiveSiteOptions {
  readonly dataDir: string;
  readonly outDir: string;
  /** Where messages go (problems in the data, rebuild summaries). */
  readonly report?: (text: string) => void;
}

/** A function Eleventy calls on every build to get fresh site data. */
export function liveSiteData(opts: LiveSiteOptions): () => Promise<SiteData> {
  const cache = createBuildCache();
  const report = opts.report ?? ((text: string) => process.stderr.write(text));
  return async () => {
    const startMs = performance.now();
    const loaded = await loadProject(opts.dataDir);
    report(formatDataErrors(loaded.warnings, 'warning'));
    if (!loaded.ok) {
      report(formatDataErrors(loaded.errors, 'problem'));
      throw new InvalidDataError('the data has problems; fix them and save again');
    }
    const unprintable = unprintableText(loaded.project, { dataDir: opts.dataDir });
    if (unprintable.length > 0) {
      report(formatDataErrors(unprintable, 'problem'));
      throw new InvalidDataError('the data has text the sheets cannot print; fix it and save again');
    }
    const dateIso = buildDateIso({ sourceDateEpoch: process.env.SOURCE_DATE_EPOCH, issueDate: loaded.project.site.issueDate });
    mkdirSync(opts.outDir, { recursive: true });
    writeFileSync(join(opts.outDir, OUTPUT_MARKER), 'Written by matchbook serve.\n');
    const written = await writeSiteFiles({ project: loaded.project, dateIso, dir: opts.outDir, cache }).catch((error: unknown) => {
      if (!(error instanceof SheetDrawError)) throw error;
      report(`${error.message}\n`);
      throw new InvalidDataError('a sheet cannot be drawn; fix the data and save again');
    });
    const { site, counts } = written;
    report(`rebuilt ${counts.sheets} sheets in ${((performance.now() - startMs) / 1000).toFixed(1)} s\n`);
    return site;
  };
}
