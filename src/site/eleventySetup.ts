/**
 * Eleventy as the page engine. One function configures it for both the one-shot build (the site
 * data already computed) and the dev server (the site data recomputed from the data folder before
 * every rebuild). Templates are `.11ty.ts` JavaScript templates in templates/.
 */
import { fileURLToPath } from 'node:url';
import type { SiteData } from './siteView.ts';

/** The package's own folders, wherever the command is run from. */
export const PACKAGE_ROOT = fileURLToPath(new URL('../../', import.meta.url));
export const TEMPLATES_DIR = fileURLToPath(new URL('../../templates/', import.meta.url));

/** The slice of Eleventy's configuration API we use (Eleventy ships no TypeScript types). */
export interface EleventyConfigApi {
  addExtension(ext: string[], opts: { key: string }): void;
  addTemplateFormats(formats: string): void;
  setTemplateFormats(formats: string[]): void;
  addPassthroughCopy(map: Record<string, string>): void;
  addGlobalData(name: string, data: unknown): void;
  addWatchTarget(path: string): void;
  setQuietMode(quiet: boolean): void;
  setServerOptions(opts: Record<string, unknown>): void;
  setUseGitIgnore(use: boolean): void;
  on(event: string, listener: () => void): void;
  /** Glob patterns Eleventy skips when it looks for templates. */
  readonly ignores: Set<string>;
}

export interface EleventySetupOptions {
  /** The site data, or a function giving fresh site data on each (re)build. */
  readonly site: SiteData | (() => Promise<SiteData>);
  /** Extra folders to watch in serve mode (the data folder). */
  readonly watch?: readonly string[];
  /** Called after every (re)build in watch mode (the preview then reloads open pages). */
  readonly afterBuild?: () => void;
}

/** Registers our template format, assets and the site data with Eleventy. */
export function configureEleventy(config: EleventyConfigApi, opts: EleventySetupOptions): void {
  // .11ty.ts files are JavaScript templates; tsx (registered by the CLI) compiles them on import.
  config.addExtension(['11ty.ts'], { key: '11ty.js' });
  config.setTemplateFormats(['11ty.ts']);
  // Installed from npm, the templates live under node_modules/matchbook/, which Eleventy skips by
  // default (and a shop folder's .gitignore usually lists node_modules/ too). The templates folder
  // holds only our own files, so neither rule is needed to find them.
  config.ignores.delete('**/node_modules/**');
  config.setUseGitIgnore(false);
  config.addPassthroughCopy({ [`${TEMPLATES_DIR}assets`]: 'assets' });
  config.addGlobalData('site', opts.site);
  for (const path of opts.watch ?? []) config.addWatchTarget(path);
  config.setQuietMode(true);
  const after = opts.afterBuild;
  if (after) config.on('eleventy.after', () => after());
}
