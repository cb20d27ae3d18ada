/**
 * The embedded font opened with fontkit, once per weight per process, its layouts remembered
 * (memoiseLayout). Font objects are immutable; the map only saves re-reading and re-parsing the file.
 */
import { readFileSync } from 'node:fs';
import * as fontkit from 'fontkit';
import { FONT_FILES } from './fonts.ts';
import { memoiseLayout } from './shapingCache.ts';
import type { FontWeight } from './types.ts';

/** The fontkit font for a weight, opened on first use. */
export const openFont = (() => {
  const cache = new Map<FontWeight, fontkit.Font>();
  return (weight: FontWeight): fontkit.Font => {
    const cached = cache.get(weight);
    if (cached) return cached;
    const opened = fontkit.create(readFileSync(FONT_FILES[weight]));
    if (!('unitsPerEm' in opened)) throw new Error(`${FONT_FILES[weight]} is a font collection, expected one TrueType font`);
    const font = memoiseLayout(opened as fontkit.Font);
    cache.set(weight, font);
    return font;
  };
})();
