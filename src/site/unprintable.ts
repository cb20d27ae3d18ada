/**
 * Text the sheet font cannot print (emoji, right-to-left scripts Source Sans 3 does not cover), found
 * before any sheet is drawn and reported where it was typed: file:line:column of the character in its
 * definition file (of its YAML escape when written as one, e.g. "\U0001F6A4"), the field as the file
 * names it, the character and its code point. Without this a build stops at the first sheet that draws
 * the text, naming the sheet rather than the line to fix. The same rule runs in `check`, `build` and
 * `serve`; invisible and control characters are refused earlier, by the data layer (INVISIBLE_CHARS).
 */
import { readFileSync } from 'node:fs';
import { lfLineBreaks } from '../data/lineBreaks.ts';
import { join } from 'node:path';
import { dataError, fieldName } from '../data/errors.ts';
import { codePointName } from '../data/schema/common.ts';
import type { DataError, Project } from '../data/types.ts';
import { parseYaml, type PathSegment } from '../data/yamlSource.ts';
import { unsupportedCharacters } from '../scene/text.ts';

export { codePointName } from '../data/schema/common.ts';

/** Keys that hold ids or other definitions (a boat's engine and jet objects), not text of this file. */
const SKIP_KEYS = new Set(['id', 'source', 'engine', 'jet', 'familyId', 'variantId', 'engineFamilyId', 'engineVariantId', 'jetId', 'impellerId', 'boatId', 'kind', 'date']);

/** Every string under value (the project's view of a file: ids and other files' objects left out). */
function projectStrings(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  if (Array.isArray(value)) return value.flatMap(projectStrings);
  if (typeof value !== 'object' || value === null) return [];
  return Object.entries(value).flatMap(([k, v]) => (SKIP_KEYS.has(k) ? [] : projectStrings(v)));
}

/** Every string of a parsed file with its path as the file spells it. */
function fileStrings(value: unknown, path: PathSegment[]): { path: PathSegment[]; text: string }[] {
  if (typeof value === 'string') return [{ path, text: value }];
  if (Array.isArray(value)) return value.flatMap((v, i) => fileStrings(v, [...path, i]));
  if (typeof value !== 'object' || value === null) return [];
  return Object.entries(value).flatMap(([k, v]) => fileStrings(v, [...path, k]));
}

/** Characters of text neither weight of the font can draw. */
function missing(text: string): string[] {
  return [...new Set([...unsupportedCharacters(text, 'regular'), ...unsupportedCharacters(text, 'bold')])];
}

/** Located errors for every character of the project's text the sheet font lacks, once per file and character. */
export function unprintableText(project: Project, opts: { dataDir: string; readText?: (file: string) => string }): DataError[] {
  const read = opts.readText ?? ((file: string) => lfLineBreaks(readFileSync(file, 'utf8')));
  const sources = [
    { file: join(opts.dataDir, 'site.yaml').replace(/\\/g, '/'), value: project.site as unknown },
    ...[...project.engines, ...project.jets, ...project.boats, ...project.books].map((d) => ({ file: d.source.file, value: d as unknown })),
  ];
  return sources.flatMap(({ file, value }) => {
    // The cheap pass over the loaded text first; the file is read and parsed again only when it holds one.
    if (!projectStrings(value).some((t) => missing(t).length > 0)) return [];
    const parsed = parseYaml({ file, text: read(file) });
    if (!parsed.ok) return [];
    const source = parsed.source;
    const seen = new Set<string>();
    return fileStrings(source.value, []).flatMap(({ path, text }) =>
      missing(text)
        .filter((ch) => !seen.has(ch) && seen.add(ch))
        .map((ch) =>
          dataError(
            { file, ...source.locateChar(path, ch) },
            {
              field: fieldName(path),
              expected: 'must use characters the sheet font (Source Sans 3: Latin, Greek, Cyrillic) can print',
              found: `"${ch}" (${codePointName(ch)})`,
              fix: 'replace it or spell it out; emoji and right-to-left scripts cannot be printed on the sheets',
            },
          ),
        ),
    );
  });
}
