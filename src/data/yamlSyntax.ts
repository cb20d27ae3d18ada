/**
 * Plain-words diagnosis of a YAML syntax error. The parser reports where it gave up, which is often a
 * line after the mistake (a key that is indented too far is reported at the value above it) or the end
 * of the file (a quote that never closes). This module scans the text for the common mistakes a person
 * makes by hand — a tab in the indentation, a quote or bracket never closed, a key without its colon,
 * no space after a colon, ": " inside an unquoted value, a line indented deeper than the key above it —
 * and names the real spot, in words, with the fix. Anything it does not recognise keeps the parser's
 * position and a plain translation of the parser's words.
 */
import { shorten } from './errors.ts';

/** Quoted text in a message: one line, at most 40 characters. */
const clip = (text: string): string => shorten(text, 40);

export interface ParserError {
  readonly code: string;
  /** The parser's own words, without its position tail. */
  readonly message: string;
  /** Offsets of the parser's error range in the text. */
  readonly start: number;
  readonly end: number;
}

export interface SyntaxDiagnosis {
  readonly line: number;
  readonly column: number;
  readonly found: string;
  readonly fix: string;
}

interface ScannedLine {
  /** 1-based line number. */
  readonly number: number;
  readonly text: string;
  /** Spaces before the content. */
  readonly indent: number;
  /** The line with quoted text blanked (quotes kept) and any comment cut; '' for blank or comment lines. */
  readonly masked: string;
  /** Column (0-based) where the key or value starts after any "- " markers. */
  readonly keyAt: number;
  /** True inside a block scalar (| or >) or a flow collection continued from an earlier line. */
  readonly inside: boolean;
}

interface Scan {
  readonly lines: readonly ScannedLine[];
  readonly quote?: { readonly line: number; readonly column: number; readonly char: string; readonly key?: string };
  readonly flow?: { readonly line: number; readonly column: number; readonly found: string; readonly fix: string };
}

const KEY_LINE = /^(\s*(?:-\s+)*)([^\s\-?:#,[\]{}"'][^:#]*?|"[^"]*"|'[^']*'):(?=\s|$)/;
const PLAIN_WORD_KEY = /^(\s*(?:-\s+)*)([A-Za-z_][A-Za-z0-9_-]*):([^\s:])/;

/** The real spot and plain words for the parser's first syntax error. */
export function diagnoseSyntax(text: string, error: ParserError, linePos: (offset: number) => { line: number; col: number }): SyntaxDiagnosis {
  const start = linePos(error.start);
  const at = { line: start.line, column: start.col };
  const endLine = linePos(Math.max(error.start, error.end - 1)).line;
  const scan = scanText(text);
  const candidates: SyntaxDiagnosis[] = [];
  if (scan.quote && scan.quote.line <= Math.max(at.line, endLine)) {
    const q = scan.quote;
    const what = q.key ? `the value of ${q.key}` : 'a value';
    candidates.push({
      line: q.line,
      column: q.column,
      found: `a ${q.char} that opens ${what} but is never closed`,
      fix: `add the closing ${q.char} at the end of the value on line ${q.line}, or remove the opening one`,
    });
  }
  if (scan.flow && scan.flow.line <= Math.max(at.line, endLine) + 1) candidates.push(scan.flow);
  const from = Math.max(1, at.line - 2);
  const to = Math.min(scan.lines.length, Math.max(at.line, endLine) + 1);
  for (let n = from; n <= to; n++) {
    const found = lineProblem(scan.lines, n - 1);
    if (found) {
      candidates.push(found);
      break;
    }
  }
  candidates.sort((a, b) => a.line - b.line || a.column - b.column);
  return candidates[0] ?? fallback(scan.lines, error, at);
}

/** The plain-words reading of the parser's own message, for the second line of the report. */
export function parserWords(error: ParserError): string {
  return error.message.split(/ at line \d+/)[0].replace(/\s+/g, ' ').trim();
}

function lineProblem(lines: readonly ScannedLine[], i: number): SyntaxDiagnosis | undefined {
  const line = lines[i];
  if (line.inside || line.masked === '') return undefined;
  const tab = /^[ ]*\t/.exec(line.text);
  if (tab) {
    return { line: line.number, column: tab[0].length, found: 'a tab in the indentation', fix: 'indent with spaces only; YAML does not allow tabs there' };
  }
  const noSpace = PLAIN_WORD_KEY.exec(line.masked);
  if (noSpace && !/^\s*-?\s*[A-Za-z]+:\/\//.test(line.masked)) {
    const key = noSpace[2];
    const column = noSpace[1].length + key.length + 2;
    const rest = line.masked.slice(column - 1).trimEnd();
    return {
      line: line.number,
      column,
      found: `"${key}:${clip(rest)}" with no space after the colon`,
      fix: `put a space after the colon: ${key}: ${clip(rest)}`,
    };
  }
  const keyLine = KEY_LINE.exec(line.masked);
  if (keyLine) {
    const valueAt = keyLine[0].length + 1;
    const value = line.masked.slice(valueAt).trim();
    const startsPlain = value !== '' && !/^["'[{|>&*!]/.test(value);
    const inner = startsPlain ? /:(\s|$)/.exec(line.masked.slice(valueAt)) : null;
    if (inner) {
      const key = keyLine[2];
      const raw = line.text.slice(valueAt).trim().replace(/\s+#.*$/, '');
      return {
        line: line.number,
        column: valueAt + inner.index + 1,
        found: `a second ": " inside the value of ${key}`,
        fix: `put the whole value in quotes: ${key}: "${clip(raw.replace(/"/g, '\\"'))}"`,
      };
    }
    const next = nextContent(lines, i);
    const nextIsItem = next !== undefined && /^\s*-(\s|$)/.test(next.masked);
    if (next && !nextIsItem && value !== '' && !/^[|>]/.test(value) && !next.inside && next.keyAt > line.keyAt && KEY_LINE.test(next.masked)) {
      const key = keyLine[2];
      const nextKey = KEY_LINE.exec(next.masked)?.[2] ?? next.masked.trim();
      const deeper = next.keyAt - line.keyAt;
      return {
        line: next.number,
        column: next.keyAt + 1,
        found: `"${clip(nextKey)}" indented ${deeper} ${deeper === 1 ? 'space' : 'spaces'} deeper than "${clip(key)}" on line ${line.number}, which already has a value`,
        fix: `start ${clip(nextKey)} in column ${line.keyAt + 1}, like ${clip(key)}; only a key with nothing after its colon can hold indented keys`,
      };
    }
    return undefined;
  }
  // No "key:" on this line: a missing colon when the line sits among keys of a mapping.
  if (/^\s*-(\s|$)/.test(line.masked)) return undefined;
  // A sibling key at the same column, above (the nearest line no deeper than this one) or just below.
  let before: ScannedLine | undefined;
  for (let j = i - 1; j >= 0 && !before; j--) if (lines[j].masked !== '' && !lines[j].inside && lines[j].keyAt <= line.keyAt) before = lines[j];
  const after = nextContent(lines, i);
  const sibling = (l: ScannedLine | undefined): boolean => l !== undefined && l.keyAt === line.keyAt && KEY_LINE.test(l.masked);
  if (sibling(before) || sibling(after)) {
    const words = line.masked.trim();
    const [first, ...rest] = words.split(/\s+/);
    const example = rest.length > 0 ? `${first}: ${rest.join(' ')}` : `${first}: value`;
    return {
      line: line.number,
      column: line.keyAt + 1,
      found: `"${clip(words)}" with no colon after its key`,
      fix: `write it as key: value, for example ${clip(example)}`,
    };
  }
  return undefined;
}

/** When no common mistake is recognised: the parser's spot, its meaning in plain words. */
function fallback(lines: readonly ScannedLine[], error: ParserError, at: { line: number; column: number }): SyntaxDiagnosis {
  const words = parserWords(error);
  const here = lines[at.line - 1];
  switch (error.code) {
    case 'TAB_AS_INDENT':
      return { ...at, found: 'a tab in the indentation', fix: 'indent with spaces only; YAML does not allow tabs there' };
    case 'BAD_INDENT': {
      const item = /sequence/i.test(words);
      const kind = item ? 'list item' : 'key';
      // Where this line's key or dash starts, and the nearest line above of the same kind.
      const columnOf = (l: ScannedLine): number => (item ? l.indent : l.keyAt) + 1;
      const isKind = (l: ScannedLine): boolean => (item ? /^\s*-(\s|$)/.test(l.masked) : KEY_LINE.test(l.masked));
      let before: ScannedLine | undefined;
      for (let j = at.line - 2; j >= 0 && here; j--) {
        const l = lines[j];
        if (l.masked !== '' && !l.inside && isKind(l) && columnOf(l) !== columnOf(here)) {
          before = l;
          break;
        }
      }
      const column = here && here.masked !== '' ? columnOf(here) : at.column;
      const around = before ? ` where the ${kind} on line ${before.number} starts at column ${columnOf(before)}` : '';
      return { line: at.line, column, found: `a ${kind} starting at column ${column}${around}`, fix: `line it up with the ${kind}s at its level, using the same number of spaces` };
    }
    case 'MISSING_CHAR':
      return { ...at, found: `a missing closing quote or bracket (${words})`, fix: 'close every " and [ on the line where it opens' };
    case 'BAD_SCALAR_START':
      return { ...at, found: 'a value that cannot start with this character', fix: 'put the value in quotes' };
    case 'BLOCK_AS_IMPLICIT_KEY':
    case 'MULTILINE_IMPLICIT_KEY':
      return { ...at, found: 'a key that runs over more than one line', fix: 'give every key its colon and a space (key: value), and quote values that hold ": "' };
    default:
      return { ...at, found: `a syntax error (${words})`, fix: 'check indentation, colons and closing brackets or quotes near here' };
  }
}

/** One pass over the text: lines with quoted text masked, the first unclosed quote and the first bracket fault. */
function scanText(text: string): Scan {
  const raw = text.split('\n').map((l) => (l.endsWith('\r') ? l.slice(0, -1) : l));
  const lines: ScannedLine[] = [];
  let quote: Scan['quote'];
  let flow: Scan['flow'];
  /** Open flow brackets: the character, where it opened, the indentation of its line. */
  const open: { char: string; line: number; column: number; indent: number }[] = [];
  let blockIndent = -1;
  for (const [index, text0] of raw.entries()) {
    const number = index + 1;
    const indent = /^ */.exec(text0)![0].length;
    const blank = text0.trim() === '' || text0.trim().startsWith('#');
    if (blockIndent >= 0 && (blank || indent > blockIndent)) {
      lines.push({ number, text: text0, indent, masked: '', keyAt: indent, inside: true });
      continue;
    }
    blockIndent = -1;
    if (blank) {
      lines.push({ number, text: text0, indent, masked: '', keyAt: indent, inside: open.length > 0 });
      continue;
    }
    if (open.length > 0 && indent <= open[0].indent) {
      // A line no deeper than the one that opened the bracket: the bracket was never closed.
      const o = open[open.length - 1];
      flow ??= { line: o.line, column: o.column, found: `a ${o.char} that is never closed`, fix: `add the closing ${closer(o.char)} at the end of the list on line ${o.line}` };
      open.length = 0;
    }
    const continued = open.length > 0;
    let masked = '';
    let scalarStart = true;
    let i = 0;
    let lineKey: string | undefined;
    while (i < text0.length) {
      const c = text0[i];
      if (c === '#' && (i === 0 || /\s/.test(text0[i - 1]))) break;
      if ((c === '"' || c === "'") && scalarStart) {
        const close = closingQuote(text0, i);
        if (close < 0) {
          if (!quote) quote = { line: number, column: i + 1, char: c, key: lineKey };
          masked += c + 'x'.repeat(text0.length - i - 1);
          i = text0.length;
          break;
        }
        masked += c + 'x'.repeat(close - i - 1) + c;
        i = close + 1;
        scalarStart = false;
        continue;
      }
      if (c === '[' || c === '{') {
        if (scalarStart || open.length > 0) open.push({ char: c, line: number, column: i + 1, indent: continued ? open[0].indent : indent });
      } else if ((c === ']' || c === '}') && open.length > 0) {
        const o = open.pop()!;
        if (closer(o.char) !== c && !flow) {
          flow = { line: number, column: i + 1, found: `a ${c} where ${closer(o.char)} should close the ${o.char} opened at line ${o.line}, column ${o.column}`, fix: `write ${closer(o.char)} instead of ${c}` };
        }
      } else if ((c === ']' || c === '}') && scalarStart && !flow) {
        flow = { line: number, column: i + 1, found: `a ${c} with no ${c === ']' ? '[' : '{'} before it`, fix: `remove the ${c}, or open the list with ${c === ']' ? '[' : '{'}` };
      }
      masked += c;
      if (c === ':' && (i + 1 === text0.length || /\s/.test(text0[i + 1]))) {
        if (lineKey === undefined) lineKey = masked.slice(0, -1).replace(/^\s*(?:-\s+)*/, '').trim();
        scalarStart = true;
      } else if (c === '-' && /^\s*(?:-\s+)*-$/.test(masked) && (i + 1 === text0.length || /\s/.test(text0[i + 1]))) {
        scalarStart = true;
      } else if (open.length > 0 && (c === '[' || c === '{' || c === ',')) {
        scalarStart = true;
      } else if (!/\s/.test(c)) {
        scalarStart = false;
      }
      i++;
    }
    masked = masked.trimEnd();
    const keyAt = /^\s*(?:-\s+)*/.exec(masked)![0].length;
    lines.push({ number, text: text0, indent, masked, keyAt, inside: continued });
    if (/(^|\s)[|>][+-]?[1-9]?[+-]?$/.test(masked) && open.length === 0) blockIndent = indent;
    if (quote) break;
  }
  if (open.length > 0 && !flow && !quote) {
    const o = open[open.length - 1];
    flow = { line: o.line, column: o.column, found: `a ${o.char} that is never closed`, fix: `add the closing ${closer(o.char)} at the end of the list on line ${o.line}` };
  }
  return { lines, ...(quote ? { quote } : {}), ...(flow ? { flow } : {}) };
}

/** Index of the quote closing the quoted scalar opened at start on the same line, or -1. */
function closingQuote(line: string, start: number): number {
  const q = line[start];
  for (let i = start + 1; i < line.length; i++) {
    if (q === '"' && line[i] === '\\') {
      i++;
    } else if (line[i] === q) {
      if (q === "'" && line[i + 1] === "'") i++;
      else return i;
    }
  }
  return -1;
}

function closer(open: string): string {
  return open === '[' ? ']' : '}';
}

function nextContent(lines: readonly ScannedLine[], i: number): ScannedLine | undefined {
  for (let j = i + 1; j < lines.length; j++) if (lines[j].masked !== '' || lines[j].inside) return lines[j].masked === '' ? undefined : lines[j];
  return undefined;
}

function previousContent(lines: readonly ScannedLine[], i: number): ScannedLine | undefined {
  for (let j = i - 1; j >= 0; j--) if (lines[j].masked !== '' && !lines[j].inside) return lines[j];
  return undefined;
}

/**
 * The offending line and a caret under the spot, as two lines for a report:
 * "  19 |     - [2000, 142" and "     |       ^". Tabs show as → so the caret stays in place; a long
 * line is cut to a window around the spot.
 */
export function caretExcerpt(text: string, line: number, column: number): string[] {
  const all = text.split('\n');
  const source = (all[line - 1] ?? '').replace(/\r$/, '').replace(/\t/g, '→');
  const width = 100;
  let from = 0;
  if (source.length > width && column > width - 20) from = Math.min(column - (width - 20), source.length - width);
  const shown = (from > 0 ? '…' : '') + source.slice(from, from + width) + (source.length > from + width ? '…' : '');
  const caretAt = Math.max(0, column - 1 - from + (from > 0 ? 1 : 0));
  const gutter = String(line);
  return [`${gutter} | ${shown}`, `${' '.repeat(gutter.length)} | ${' '.repeat(Math.min(caretAt, shown.length))}^`];
}
