/**
 * Text the sheet font cannot print (emoji, right-to-left scripts Source Sans 3 does not cover), found
 * before any sheet is drawn and reported where it was typed: file:line:column of the character in its
 * definition file, the field, the character and its code point. Without this a build stops at the
 * first sheet that draws the text, naming the sheet rather than the line to fix.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { dataError } from '../data/errors.ts';
import type { DataError, Project } from '../data/types.ts';
import { unsupportedCharacters } from '../scene/text.ts';

/** Keys that hold ids or other definitions (a boat's engine and jet objects), not text of this file. */
const SKIP_KEYS = new Set(['id', 'source', 'engine', 'jet', 'familyId', 'variantId', 'engineFamilyId', 'engineVariantId', 'jetId', 'impellerId', 'boatId', 'kind', 'date']);

/** Every string under value with its field path ("cruise[1].label"). */
function strings(value: unknown, path: string): { path: string; text: string }[] {
  if (typeof value === 'string') return [{ path, text: value }];
  if (Array.isArray(value)) return value.flatMap((v, i) => strings(v, `${path}[${i}]`));
  if (typeof value !== 'object' || value === null) return [];
  return Object.entries(value).flatMap(([k, v]) => (SKIP_KEYS.has(k) ? [] : strings(v, path === '' ? k : `${path}.${k}`)));
}

/** U+1F6A4 for "🚤". */
export function codePointName(ch: string): string {
  return `U+${(ch.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}`;
}

/** 1-based line and column (in characters) of the first occurrence of ch in text; 1:1 when it is written escaped. */
function place(text: string, ch: string): { line: number; column: number } {
  const at = text.indexOf(ch);
  if (at < 0) return { line: 1, column: 1 };
  const before = text.slice(0, at);
  const lineStart = before.lastIndexOf('\n') + 1;
  return { line: before.split('\n').length, column: [...before.slice(lineStart)].length + 1 };
}

/** Located errors for every character of the project's text the sheet font lacks, once per file and character. */
export function unprintableText(project: Project, opts: { dataDir: string }): DataError[] {
  const sources = [
    { file: join(opts.dataDir, 'site.yaml').replace(/\\/g, '/'), value: project.site as unknown },
    ...[...project.engines, ...project.jets, ...project.boats, ...project.books].map((d) => ({ file: d.source.file, value: d as unknown })),
  ];
  return sources.flatMap(({ file, value }) => {
    const seen = new Set<string>();
    const found = strings(value, '').flatMap(({ path, text }) =>
      [...new Set([...unsupportedCharacters(text, 'regular'), ...unsupportedCharacters(text, 'bold')])]
        .filter((ch) => !seen.has(ch) && seen.add(ch))
        .map((ch) => ({ path, ch })),
    );
    if (found.length === 0) return [];
    const fileText = readFileSync(file, 'utf8');
    return found.map(({ path, ch }) =>
      dataError(
        { file, ...place(fileText, ch) },
        {
          field: path,
          expected: 'must use characters the sheet font (Source Sans 3: Latin, Greek, Cyrillic) can print',
          found: `"${ch}" (${codePointName(ch)})`,
          fix: 'replace it or spell it out; emoji and right-to-left scripts cannot be printed on the sheets',
        },
      ),
    );
  });
}
