// Eleventy's own entry point, for running Eleventy directly:
//   node --import tsx node_modules/@11ty/eleventy/cmd.cjs --config=eleventy.config.ts
// A thin shell: the site data comes from src/site, computed from the data folder on every build.
import { liveSiteData } from './src/site/liveSite.ts';
import { configureEleventy, type EleventyConfigApi } from './src/site/eleventySetup.ts';

export default function (config: EleventyConfigApi) {
  const dataDir = process.env.MATCHBOOK_DATA ?? 'data';
  configureEleventy(config, { site: liveSiteData({ dataDir, outDir: 'out' }), watch: [dataDir] });
  return { dir: { input: 'templates', output: 'out' } };
}
