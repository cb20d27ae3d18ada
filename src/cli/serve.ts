/**
 * `matchbook serve`: Eleventy rebuilds in watch mode when a definition or template changes, and our own
 * preview server (site/devServer.ts) serves the output folder, on 127.0.0.1 unless --host says
 * otherwise, and reloads open pages after each rebuild. While the data has problems every page lists
 * them at its top (see site/liveSite.ts).
 */
import { resolve } from 'node:path';
import Eleventy from '@11ty/eleventy';
import { checkOutputFolder } from '../site/atomicDir.ts';
import { startDevServer } from '../site/devServer.ts';
import { configureEleventy, TEMPLATES_DIR, type EleventyConfigApi } from '../site/eleventySetup.ts';
import { liveSiteData } from '../site/liveSite.ts';
import type { ParsedArgs } from './args.ts';
import type { CliIo } from './io.ts';

/** Ports tried from the default one on when it is taken; a --port given is used exactly. */
const DEFAULT_PORT_TRIES = 10;

/** Serves until Ctrl+C or SIGTERM; resolves to the exit status. */
export async function runServe(args: ParsedArgs, io: CliIo): Promise<number> {
  checkOutputFolder({ outDir: args.outDir, dataDir: args.dataDir });
  const dataDir = resolve(args.dataDir);
  const outDir = resolve(args.outDir);
  // Listen first: a port problem is told at once, before a build of many seconds.
  const server = await startDevServer({ root: outDir, host: args.host, port: args.port, tries: args.portGiven ? 1 : DEFAULT_PORT_TRIES });
  const eleventy = new Eleventy(TEMPLATES_DIR, outDir, {
    runMode: 'watch',
    quietMode: true,
    configPath: false,
    config: (config: EleventyConfigApi) =>
      configureEleventy(config, {
        site: liveSiteData({ dataDir, outDir, report: io.err }),
        watch: [dataDir],
        afterBuild: () => server.reload(),
      }),
  });
  eleventy.disableLogger();
  try {
    // Broken data does not stop the server: the pages show the problems until the files are fixed.
    await eleventy.init();
    await eleventy.watch();
    const others = server.everyInterface ? ` (every network interface: other machines can reach it; on this one http://127.0.0.1:${server.port}/)` : '';
    io.out(`serving ${args.outDir} at ${server.url}${others} ; watching ${args.dataDir} and the templates. Ctrl+C stops.\n`);
    await new Promise<void>((done) => {
      process.once('SIGINT', () => done());
      process.once('SIGTERM', () => done());
    });
  } finally {
    await eleventy.stopWatch();
    await server.close();
  }
  return 0;
}
