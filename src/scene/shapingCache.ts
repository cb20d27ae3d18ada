/**
 * Shaping a run of text (OpenType layout) is the slowest step of building and printing a sheet:
 * about 0.25 ms a call, and a sheet measures and draws the same labels many times over (label
 * placement tries, table sizing, the PDF's width and encoding passes). Layout depends only on the
 * font, the features and the text, so its result can be remembered.
 *
 * `memoiseLayout(font)` returns a view of a font whose `layout(text, features)` answers from a
 * bounded cache; every other property is the font's own. A cache is the one piece of module-level
 * state this project keeps: it changes no result, only how soon it comes.
 */

/** The part of a fontkit font (either fontkit or @pdf-lib/fontkit) that the cache needs. */
interface LayoutFont<Run> {
  layout(text: string, features?: unknown): Run;
}

/** Entries kept per font before the cache starts over (a build of 1,000 boats stays well inside). */
const MAX_ENTRIES = 200_000;

/** A font whose layout() is remembered per (features, text); the returned runs are shared, never mutate them. */
export function memoiseLayout<Run, F extends LayoutFont<Run>>(font: F): F {
  const runs = new Map<string, Run>();
  const layout = (text: string, features?: unknown): Run => {
    const key = `${features === undefined ? '' : JSON.stringify(features)}\u0000${text}`;
    const hit = runs.get(key);
    if (hit !== undefined) return hit;
    if (runs.size >= MAX_ENTRIES) runs.clear();
    const run = font.layout(text, features === undefined ? undefined : structuredClone(features));
    runs.set(key, run);
    return run;
  };
  return new Proxy(font, {
    get(target, property, receiver) {
      if (property === 'layout') return layout;
      const value = Reflect.get(target, property, receiver);
      return typeof value === 'function' ? value.bind(target) : value;
    },
  });
}
