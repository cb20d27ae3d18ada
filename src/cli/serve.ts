/**
 * `matchbook serve`: Eleventy's dev server; editing a YAML file or a template rebuilds and reloads.
 * While the data has problems every page lists them at its top (see site/liveSite.ts).
 */
import { resolve } from 'node:path';
import Eleventy from '@11ty/eleventy';
import { checkOutputFolder } from '../site/atomicDir.ts';
import { configureEleventy, TEMPLATES_DIR, type EleventyConfigApi } from '../site/eleventySetup.ts';
import { liveSiteData } from '../site/liveSite.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';

/** Serves until Ctrl+C; resolves to the exit status. */
export async function runServe(args: ParsedArgs, io: CliIo): Promise<number> {
  checkOutputFolder({ outDir: args.outDir, dataDir: args.dataDir });
  const dataDir = resolve(args.dataDir);
  const outDir = resolve(args.outDir);
  const eleventy = new Eleventy(TEMPLATES_DIR, outDir, {
    runMode: 'serve',
    quietMode: true,
    configPath: false,
    config: (config: EleventyConfigApi) =>
      configureEleventy(config, { site: liveSiteData({ dataDir, outDir, report: io.err }), watch: [dataDir] }),
  });
  eleventy.disableLogger();
  // Broken data does not stop the server: the pages show the problems until the files are fixed.
  await eleventy.init();
  await eleventy.watch();
  await eleventy.serve(args.port);
  io.out(`serving ${args.outDir} at http://localhost:${args.port}/ ; watching ${args.dataDir} and the templates. Ctrl+C stops.\n`);
  await new Promise<void>((done) => process.once('SIGINT', () => done()));
  await eleventy.stopWatch();
  return 0;
}
