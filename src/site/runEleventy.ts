/** Runs Eleventy once, programmatically, writing the pages into an output folder. */
import Eleventy from '@11ty/eleventy';
import { configureEleventy, TEMPLATES_DIR, type EleventyConfigApi } from './eleventySetup.ts';
import type { SiteData } from './siteView.ts';

/** Writes every page for the given site data into outDir; resolves to the number of pages written. */
export async function writePages(args: { site: SiteData; outDir: string }): Promise<number> {
  const eleventy = new Eleventy(TEMPLATES_DIR, args.outDir, {
    quietMode: true,
    // No project config file: everything is set here, so running from any folder behaves the same.
    configPath: false,
    config: (config: EleventyConfigApi) => configureEleventy(config, { site: args.site }),
  });
  // Our CLI words every message itself; Eleventy's logger would print stack traces on failure.
  eleventy.disableLogger();
  const [, templates] = (await eleventy.write()) as [unknown, readonly unknown[]];
  // Page failures are caught per page (SiteData.page), so every page has settled by now.
  if (args.site.failures.length > 0) throw args.site.failures[0];
  return templates.length;
}
