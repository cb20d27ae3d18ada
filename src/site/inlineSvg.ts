/**
 * Our SVG renderer writes stand-alone documents. Inline in a page, several sheets share one id space,
 * so each sheet's ids (clip paths) get the sheet's slug as prefix, and the XML prolog is dropped.
 */

/** The SVG document made safe to inline next to others: no prolog, ids prefixed with `prefix`. */
export function inlineSvg(svg: string, prefix: string): string {
  return svg
    .replace(/^<\?xml[^>]*\?>\s*/, '')
    .replace(/\bid="([^"]+)"/g, (_, id: string) => `id="${prefix}-${id}"`)
    .replace(/url\(#([^)]+)\)/g, (_, id: string) => `url(#${prefix}-${id})`)
    .trimEnd();
}
