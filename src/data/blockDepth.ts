/**
 * Guard against deep block nesting (indentation, "- - - …"). The YAML parser composes nested block
 * collections recursively; a few thousand levels — a 10 kB file — overflow its stack, and past that
 * V8 can abort the whole process (seen: "RegExpCompiler Allocation failed") where no try/catch helps.
 * Every block level needs at least one more column of indentation or a "- " / "? " / ": " indicator
 * before its content, so the column where a line's content starts bounds the nesting depth.
 */

/** Content may start at most this many characters into a line; our formats need about 12. */
export const MAX_CONTENT_COLUMN = 200;

/** The first line whose content starts past MAX_CONTENT_COLUMN (1-based line, column of the content), if any. */
export function deepestBlockLine(text: string): { line: number; column: number; offset: number } | undefined {
  let line = 1;
  for (let start = 0; start < text.length; ) {
    const newline = text.indexOf('\n', start);
    const end = newline === -1 ? text.length : newline;
    let i = start;
    // Skip indentation and block indicators followed by a space: each may open one more level.
    for (;;) {
      while (i < end && text[i] === ' ') i++;
      const c = text[i];
      if ((c === '-' || c === '?' || c === ':') && (text[i + 1] === ' ' || text[i + 1] === '\t')) i += 2;
      else break;
    }
    if (i - start > MAX_CONTENT_COLUMN && i < end) return { line, column: i - start + 1, offset: i };
    start = end + 1;
    line++;
  }
  return undefined;
}
