/**
 * The one font every renderer uses: Source Sans 3 from the `source-sans` package (SIL OFL 1.1).
 * Paths are resolved from the installed package, not the working directory, so builds started
 * from any folder find the same files.
 */
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { FontWeight } from './types.ts';

const require = createRequire(import.meta.url);
const PACKAGE_DIR = dirname(require.resolve('source-sans/package.json'));

/** CSS / SVG family name of the embedded font. */
export const FONT_FAMILY = 'Source Sans 3';

/** Absolute path of the TrueType file for each weight. */
export const FONT_FILES: Readonly<Record<FontWeight, string>> = Object.freeze({
  regular: join(PACKAGE_DIR, 'TTF', 'SourceSans3-Regular.ttf'),
  bold: join(PACKAGE_DIR, 'TTF', 'SourceSans3-Bold.ttf'),
});

/**
 * OpenType features used when shaping for measurement and for the PDF: the font's defaults
 * (ligatures included, as every SVG viewer and resvg apply them and resvg cannot turn them off)
 * with kerning off, because pdf-lib draws plain advances and the SVG asks for `font-kerning: none`.
 */
export const SHAPING_FEATURES: Readonly<Record<string, boolean>> = Object.freeze({ kern: false });
