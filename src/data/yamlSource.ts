/**
 * YAML text → plain value plus a locator that maps a field path back to line:column in the file.
 * Guards the parser: size cap, flow-nesting cap (a deeply nested flow collection can exhaust memory
 * inside the parser, which no try/catch can recover), alias-expansion cap, duplicate keys.
 */
import { isAlias, isMap, isScalar, isSeq, LineCounter, parseDocument, type Document, type Node, type Pair } from 'yaml';
import { deepestBlockLine, MAX_CONTENT_COLUMN } from './blockDepth.ts';
import { dataError, describeValue, fieldName, shorten } from './errors.ts';
import { caretExcerpt, diagnoseSyntax, parserWords } from './yamlSyntax.ts';
import type { DataError } from './types.ts';

export const MAX_FILE_BYTES = 5 * 1024 * 1024;
/** Deepest flow nesting ([ or {) accepted; our formats need at most 4. */
export const MAX_FLOW_DEPTH = 64;
/** Aliases (*name) resolved per file; the formats need none, so this only stops expansion bombs. */
export const MAX_ALIAS_COUNT = 100;

export type PathSegment = string | number;

export interface Located {
  readonly line: number;
  readonly column: number;
  /** The value there as written, for messages; "nothing" when the path does not exist. */
  readonly found: string;
  /** False when only an ancestor of the path exists (the position is the ancestor's). */
  readonly exists: boolean;
}

export interface YamlSource {
  readonly file: string;
  readonly value: unknown;
  /** Position of the value at path (or of its key with at: 'key'), falling back to the nearest ancestor. */
  locate(path: readonly PathSegment[], opts?: { at?: 'key' | 'value' }): Located;
  /**
   * Position of the character ch inside the text value at path: where it is typed, or where its YAML
   * escape starts (`"\u202e"`, `"\x1b"`, `"\e"`, a surrogate pair `"\ud83d\udea4"`); the value's
   * start when neither is found.
   */
  locateChar(path: readonly PathSegment[], ch: string): { line: number; column: number };
}

export type ParseResult = { ok: true; source: YamlSource } | { ok: false; errors: DataError[] };

/** Parse one file; never throws. */
export function parseYaml(args: { file: string; text: string }): ParseResult {
  const { file, text } = args;
  const whole = (expected: string, found: string, fix?: string): ParseResult => ({
    ok: false,
    errors: [dataError({ file, line: 1, column: 1 }, { field: '', expected, found, fix })],
  });
  const bytes = Buffer.byteLength(text, 'utf8');
  if (bytes > MAX_FILE_BYTES) {
    return whole(`must be at most ${MAX_FILE_BYTES / 1024 / 1024} MB`, `${(bytes / 1024 / 1024).toFixed(1)} MB`, 'definitions are small; split or trim the file');
  }
  const depth = flowDepth(text);
  if (depth.max > MAX_FLOW_DEPTH) {
    const lc = lineCounterFor(text);
    const pos = lc.linePos(depth.offset);
    return {
      ok: false,
      errors: [dataError({ file, line: pos.line, column: pos.col }, { field: '', expected: `must not nest [ ] or { } deeper than ${MAX_FLOW_DEPTH} levels`, found: `${depth.max} levels` })],
    };
  }
  const deep = deepestBlockLine(text);
  if (deep) {
    return {
      ok: false,
      errors: [dataError({ file, line: deep.line, column: deep.column }, { field: '', expected: `must not nest or indent values deeper than column ${MAX_CONTENT_COLUMN}`, found: `a value starting at column ${deep.column}`, fix: 'our formats need a few levels; remove the extra indentation or "- " markers' })],
    };
  }
  try {
    const lineCounter = new LineCounter();
    // The parser's own duplicate-key check compares every key with every key before it (quadratic in a
    // mapping's size); duplicateKeys() finds the same keys in one pass, so a file is read in linear time.
    const doc = parseDocument(text, { lineCounter, uniqueKeys: false, schema: 'core', merge: false, prettyErrors: false, strict: true });
    // Every duplicate key is its own mistake; other syntax errors cascade, so only the first is shown.
    const firstOther = [...doc.errors, ...doc.warnings][0];
    // A "duplicate" after a syntax error is usually the parser's recovery misreading the lines (a tab, a lost indent).
    const duplicates = duplicateKeys(doc.contents as Node | null, [], [])
      .filter((d) => !firstOther || d.offset < firstOther.pos[0])
      .map((d) => ({ code: 'DUPLICATE_KEY', pos: [d.offset, d.end] as [number, number], message: '', keyPath: d.path }));
    const problems: { code: string; pos: [number, number]; message: string; keyPath?: PathSegment[] }[] = [...duplicates, ...(firstOther ? [firstOther] : [])];
    if (problems.length > 0) {
      return {
        ok: false,
        errors: problems.map((e) => {
          const pos = lineCounter.linePos(e.pos[0]);
          if (!KNOWN_CODES.has(e.code)) {
            // A syntax error: find the real spot (the parser often stops a line late or at the end of
            // the file), say it in plain words, show the line with a caret, keep the parser's words last.
            const parsed = { code: e.code, message: e.message, start: e.pos[0], end: e.pos[1] };
            const d = diagnoseSyntax(text, parsed, (offset) => lineCounter.linePos(offset));
            const parserAt = d.line === pos.line && d.column === pos.col ? '' : ` (it stopped at line ${pos.line}, column ${pos.col})`;
            return dataError(
              { file, line: d.line, column: d.column },
              { field: '', expected: 'must be valid YAML', found: d.found, fix: d.fix },
              [...caretExcerpt(text, d.line, d.column), `the YAML parser said: ${parserWords(parsed)}${parserAt}`],
            );
          }
          return dataError({ file, line: pos.line, column: pos.col }, yamlProblem({ code: e.code, excerpt: text.slice(e.pos[0], e.pos[1]), keyPath: e.keyPath }));
        }),
      };
    }
    const value = doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT }) as unknown;
    const found: Finder = { doc, index: new WeakMap() };
    return {
      ok: true,
      source: {
        file,
        value,
        locate: (path, opts) => locate({ found, text, lineCounter, path, at: opts?.at ?? 'value' }),
        locateChar: (path, ch) => locateChar({ found, text, lineCounter, path, ch }),
      },
    };
  } catch (err) {
    // Alias bombs (ReferenceError) and pathological inputs end here: report, never a stack trace.
    const reason = err instanceof Error ? err.message : String(err);
    return whole('must be readable YAML', shorten(reason, 80), /alias/i.test(reason) ? 'use fewer anchors/aliases (*name); write the values out' : undefined);
  }
}

/** Parser codes that are not syntax mistakes and have their own wording below. */
const KNOWN_CODES = new Set(['DUPLICATE_KEY', 'MULTIPLE_DOCS', 'TAG_RESOLVE_FAILED']);

function yamlProblem(args: { code: string; excerpt: string; keyPath?: PathSegment[] }): { field: string; expected: string; found: string; fix?: string } {
  const { code, excerpt, keyPath } = args;
  switch (code) {
    case 'DUPLICATE_KEY': {
      const key = keyPath?.length ? String(keyPath[keyPath.length - 1]) : excerpt;
      const field = keyPath?.length ? fieldName(keyPath) : excerpt;
      return { field, expected: 'must appear only once in its mapping (duplicate key)', found: `a second "${shorten(key, 40)}"`, fix: 'remove or merge one of them' };
    }
    case 'MULTIPLE_DOCS':
      return { field: '', expected: 'must hold one YAML document', found: 'a second document after ---', fix: 'remove the --- line or split the file' };
    default: // TAG_RESOLVE_FAILED; every other code is a syntax error, worded by yamlSyntax.ts
      return { field: '', expected: 'must use plain YAML values without custom tags', found: shorten(excerpt, 40), fix: 'remove the tag' };
  }
}

/** The text of a mapping key as the loaded value names it (`1` and `"1"` are the same key there). */
function keyName(key: unknown): string {
  return isScalar(key) ? String(key.value) : String(key);
}

/**
 * Every key that repeats an earlier key of its mapping, with its path and place, in document order:
 * one pass with a set per mapping. Aliases are not followed (their target is checked where it stands).
 */
function duplicateKeys(node: Node | null, path: PathSegment[], out: { offset: number; end: number; path: PathSegment[] }[]): { offset: number; end: number; path: PathSegment[] }[] {
  if (isMap(node)) {
    const seen = new Set<string>();
    for (const pair of node.items) {
      const name = keyName(pair.key);
      const here = [...path, name];
      const range = (pair.key as Node | null)?.range;
      if (seen.has(name) && range) out.push({ offset: range[0], end: range[1], path: here });
      seen.add(name);
      duplicateKeys(pair.value as Node | null, here, out);
    }
  } else if (isSeq(node)) {
    node.items.forEach((item, i) => duplicateKeys(item as Node | null, [...path, i], out));
  }
  return out;
}

function lineCounterFor(text: string): LineCounter {
  const lc = new LineCounter();
  lc.addNewLine(0);
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) === 10) lc.addNewLine(i + 1);
  return lc;
}

/**
 * Deepest nesting of flow brackets, and where it first passes MAX_FLOW_DEPTH, skipping quoted strings and comments. Over-counts brackets inside
 * plain scalars, which only makes the guard stricter on text nobody writes.
 */
export function flowDepth(text: string): { max: number; offset: number } {
  let depth = 0;
  let max = 0;
  let offset = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '#' && (i === 0 || /\s/.test(text[i - 1]))) {
      while (i < text.length && text[i] !== '\n') i++;
    } else if (c === '"' || c === "'") {
      i = skipQuoted(text, i);
    } else if (c === '[' || c === '{') {
      depth++;
      if (depth > max) max = depth;
      // Point at the first bracket past the limit: where the reader should look.
      if (depth === MAX_FLOW_DEPTH + 1 && offset === 0) offset = i;
    } else if ((c === ']' || c === '}') && depth > 0) {
      depth--;
    }
  }
  return { max, offset };
}

function skipQuoted(text: string, start: number): number {
  const quote = text[start];
  for (let i = start + 1; i < text.length; i++) {
    if (quote === '"' && text[i] === '\\') i++;
    else if (text[i] === quote) {
      if (quote === "'" && text[i + 1] === "'") i++;
      else return i;
    }
  }
  return text.length;
}

/** The document and, per mapping, its keys indexed on first use: a lookup is then constant time, not a scan. */
interface Finder {
  readonly doc: Document;
  readonly index: WeakMap<object, Map<string, Pair>>;
}

function locate(args: { found: Finder; text: string; lineCounter: LineCounter; path: readonly PathSegment[]; at: 'key' | 'value' }): Located {
  const { found: finder, text, lineCounter, path } = args;
  let node: Node | null = (finder.doc.contents as Node | null) ?? null;
  let pair: Pair | null = null;
  let reached = 0;
  let empty = false;
  for (const seg of path) {
    const next = child(finder, node, seg);
    if (!next) break;
    [node, pair, empty] = [next.node, next.pair, next.empty];
    reached++;
  }
  const exists = reached === path.length;
  const keyNode = exists && args.at === 'key' && pair && isScalar(pair.key) ? pair.key : null;
  const target = keyNode ?? node;
  const offset = target?.range?.[0] ?? pairKeyOffset(pair) ?? 0;
  const pos = lineCounter.linePos(Math.min(offset, text.length));
  const found = !exists ? 'nothing' : path.length === 0 && !node ? 'nothing (an empty file)' : keyNode ? JSON.stringify(String(keyNode.value)) : empty ? describeValue(null) : foundText(node, text);
  return { line: pos.line, column: pos.col, found, exists };
}

function locateChar(args: { found: Finder; text: string; lineCounter: LineCounter; path: readonly PathSegment[]; ch: string }): { line: number; column: number } {
  const { found: finder, text, lineCounter, path, ch } = args;
  let node: Node | null = (finder.doc.contents as Node | null) ?? null;
  for (const seg of path) {
    const next = child(finder, node, seg);
    if (!next) break;
    node = next.node;
  }
  const start = node?.range?.[0] ?? 0;
  const end = node?.range?.[1] ?? start;
  const pos = lineCounter.linePos(Math.min(start + charOffset(text.slice(start, end), ch), text.length));
  return { line: pos.line, column: pos.col };
}

/** YAML 1.2 double-quoted escapes (§5.7): one character each, or a UTF-16 half for \u d800–dfff. */
const ESCAPE = /\\(x[0-9a-fA-F]{2}|u[0-9a-fA-F]{4}|U[0-9a-fA-F]{8}|[0abtnvfreN_LP"/\\ \t])/g;
const NAMED_ESCAPES: Readonly<Record<string, string>> = { '0': '\0', a: '\x07', b: '\b', t: '\t', '\t': '\t', n: '\n', v: '\v', f: '\f', r: '\r', e: '\x1b', N: '\x85', _: '\xa0', L: '\u2028', P: '\u2029', '"': '"', '/': '/', '\\': '\\', ' ': ' ' };

function unescapeOne(code: string): string {
  if (code.length === 1) return NAMED_ESCAPES[code] ?? code;
  const n = Number.parseInt(code.slice(1), 16);
  return n <= 0xffff ? String.fromCharCode(n) : String.fromCodePoint(n);
}

/** Offset of ch in the raw text of a scalar: typed as itself, else the escape that writes it; 0 when neither. */
function charOffset(raw: string, ch: string): number {
  const typed = raw.indexOf(ch);
  if (typed >= 0) return typed;
  const escapes = [...raw.matchAll(ESCAPE)];
  for (let i = 0; i < escapes.length; i++) {
    const one = unescapeOne(escapes[i][1]);
    // A character beyond U+FFFF may be written as two \u escapes (a surrogate pair) side by side.
    const next = escapes[i + 1];
    const pair = next && next.index === escapes[i].index! + escapes[i][0].length ? one + unescapeOne(next[1]) : '';
    if (one === ch || pair === ch) return escapes[i].index!;
  }
  return 0;
}

function pairKeyOffset(pair: Pair | null): number | undefined {
  return pair && isScalar(pair.key) ? pair.key.range?.[0] : undefined;
}

function child(finder: Finder, node: Node | null, seg: PathSegment): { node: Node | null; pair: Pair | null; empty: boolean } | null {
  const resolved = node && isAlias(node) ? ((node.resolve(finder.doc) as Node | undefined) ?? null) : node;
  if (isMap(resolved)) {
    let keys = finder.index.get(resolved);
    if (!keys) {
      // The first pair of each key, as a lookup by key found it.
      keys = new Map();
      for (const it of resolved.items) if (isScalar(it.key) && !keys.has(String(it.key.value))) keys.set(String(it.key.value), it as Pair);
      finder.index.set(resolved, keys);
    }
    const p = keys.get(String(seg));
    if (!p) return null;
    // An empty value (`key:`) has a zero-width node; point at the key instead.
    const value = p.value as Node | null;
    const empty = !value || (isScalar(value) && value.value === null && value.range?.[0] === value.range?.[1]);
    return { node: empty ? (p.key as Node) : value, pair: p as Pair, empty };
  }
  if (isSeq(resolved) && typeof seg === 'number') {
    const item = resolved.items[seg] as Node | undefined;
    return item === undefined ? null : { node: item, pair: null, empty: false };
  }
  return null;
}

function foundText(node: Node | null, text: string): string {
  if (!node) return 'nothing';
  if (isScalar(node)) {
    if (typeof node.value === 'number' && node.range) return shorten(text.slice(node.range[0], node.range[1]));
    return describeValue(node.value);
  }
  if (isSeq(node)) return describeValue(node.items);
  if (isMap(node)) return describeValue({});
  return 'nothing';
}
