/**
 * One rule for user text (issue class: text that only the build rejects): every text field refuses
 * control, zero-width and bidirectional-control characters (INVISIBLE_CHARS) at the character itself —
 * where it is typed, or where its YAML escape (`"\u202e"`) starts — and folds runs of spaces, tabs and
 * line breaks to one space, so the sheets (which cannot draw them) and the pages (where an override
 * could reverse a name in the title) always show the same text. The Unicode names of the characters
 * are from the Unicode Standard's code charts (U+202E RIGHT-TO-LEFT OVERRIDE, U+200B ZERO WIDTH SPACE…).
 */
import { readFileSync } from 'node:fs';
import { LineCounter, parseDocument } from 'yaml';
import { describe, expect, it } from 'vitest';
import { terminalSafe } from '../../src/data/errors.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { INVISIBLE_CHARS } from '../../src/data/schema/common.ts';
import { demoFiles, demoWith } from './helpers.ts';

const BOAT = 'data/boats/greyling.yaml';
const boatText = readFileSync(BOAT, 'utf8');
const nameLine = boatText.split('\n').findIndex((l) => l.startsWith('name: ')) + 1;
/** What terminalSafe escapes: none of it may reach a message raw. */
const RAW_UNSAFE = /[\u0000-\u001f\u007f-\u009f\u00ad\u061c\u180e\u200b-\u200f\u2028-\u202e\u2060-\u2069\ufeff]/;

function errorsFor(path: string, text: string) {
  const r = loadProjectFromFiles(demoWith(path, text));
  return r.ok ? [] : r.errors;
}

/** [what, YAML escape as typed in a double-quoted string, the character]. */
const INVISIBLE: [string, string, string][] = [
  ['ESC (starts terminal control sequences)', '\\e', '\u001b'],
  ['BEL', '\\a', '\u0007'],
  ['NUL', '\\0', '\u0000'],
  ['DEL', '\\x7f', '\u007f'],
  ['NEXT LINE (C1)', '\\N', '\u0085'],
  ['CONTROL SEQUENCE INTRODUCER (C1)', '\\x9b', '\u009b'],
  ['SOFT HYPHEN', '\\u00ad', '\u00ad'],
  ['ARABIC LETTER MARK', '\\u061c', '\u061c'],
  ['ZERO WIDTH SPACE', '\\u200b', '\u200b'],
  ['ZERO WIDTH JOINER', '\\u200d', '\u200d'],
  ['RIGHT-TO-LEFT MARK', '\\u200f', '\u200f'],
  ['RIGHT-TO-LEFT OVERRIDE', '\\u202e', '\u202e'],
  ['LEFT-TO-RIGHT EMBEDDING', '\\u202a', '\u202a'],
  ['RIGHT-TO-LEFT ISOLATE', '\\u2067', '\u2067'],
  ['POP DIRECTIONAL ISOLATE', '\\u2069', '\u2069'],
  ['WORD JOINER', '\\u2060', '\u2060'],
  ['LINE SEPARATOR', '\\L', '\u2028'],
  ['PARAGRAPH SEPARATOR', '\\u2029', '\u2029'],
  ['ZERO WIDTH NO-BREAK SPACE (BOM) inside text', '\\ufeff', '\ufeff'],
  ['a lone surrogate', '\\ud800', '\ud800'],
  ['the non-character U+FFFF', '\\uffff', '\uffff'],
];

describe('invisible and control characters in text are refused at the character', () => {
  it.each(INVISIBLE)('%s written as a YAML escape: located at the escape, not at 1:1', (_what, escape, ch) => {
    const line = `name: "Grey${escape}ling"`;
    const errors = errorsFor(BOAT, boatText.replace(/^name: .*$/m, line));
    expect(errors).toHaveLength(1);
    const code = `U+${ch.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}`;
    const escaped = `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`;
    // Column of the backslash: 'name: "Grey' is 11 characters.
    expect(errors[0].message).toBe(
      `${BOAT}:${nameLine}:12 name must hold only printable characters (no control, zero-width or bidirectional-control characters), found "${escaped}" (${code}) — delete it: it is invisible, or would hide or reorder text on the sheets and pages`,
    );
    expect(errors[0].message).not.toMatch(RAW_UNSAFE);
  });

  it.each(INVISIBLE.filter(([, , ch]) => /[\u00ad\u061c\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/.test(ch)))('%s typed as itself: located at its column', (_what, _escape, ch) => {
    const errors = errorsFor(BOAT, boatText.replace(/^name: .*$/m, `name: Grey${ch}ling`));
    expect(errors.map((e) => [e.line, e.column, e.field])).toEqual([[nameLine, 11, 'name']]);
  });

  it('a character beyond U+FFFF written as a surrogate pair of escapes is one character, not two lone halves', () => {
    // U+1F6A4 is a printable emoji to the data layer (the sheet font check is the site's, test/site/unprintable.test.ts).
    expect(errorsFor(BOAT, boatText.replace(/^name: .*$/m, 'name: "Grey\\ud83d\\udea4"'))).toEqual([]);
  });

  it('every text field of every file kind applies the rule (each demo text with an override in it)', () => {
    const demo = demoFiles().filter((f) => f.path.endsWith('.yaml'));
    let fields = 0;
    for (const file of demo) {
      const doc = parseDocument(file.text);
      const texts: (string | number)[][] = [];
      const walk = (v: unknown, path: (string | number)[]) => {
        if (typeof v === 'string' && isText(path)) texts.push(path);
        else if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, i]));
        else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
      };
      walk(doc.toJS(), []);
      for (const path of texts) {
        const copy = parseDocument(file.text);
        // The override replaces the first character, so no length limit is crossed.
        copy.setIn(path, `\u202e${String(copy.getIn(path)).slice(1)}`);
        const text = copy.toString({ lineWidth: 0 });
        const errors = errorsFor(file.path, text);
        const name = path.map((s, i) => (typeof s === 'number' ? `[${s}]` : i === 0 ? s : `.${s}`)).join('');
        expect(errors.map((e) => `${e.field} ${e.expected}`), `${file.path} ${name}`).toEqual([`${name} must hold only printable characters (no control, zero-width or bidirectional-control characters)`]);
        // Located at the character: an independent reading of the text gives the same line.
        const lc = new LineCounter();
        const node = parseDocument(text, { lineCounter: lc }).getIn(path, true) as { range: [number, number] };
        expect(errors[0].line, `${file.path} ${name}`).toBe(lc.linePos(text.indexOf('\u202e', node.range[0])).line);
        fields++;
      }
    }
    // Names, labels, makers, notes, descriptions, the shop's lines, cautions, titles, condition labels.
    expect(fields).toBeGreaterThan(60);
  });
});

/** Text fields (not ids, references, words from a list or dates). */
function isText(path: readonly (string | number)[]): boolean {
  const key = [...path].reverse().find((s) => typeof s === 'string');
  return !['id', 'engine', 'jet', 'impeller', 'engine_variant', 'boat', 'kind', 'date', 'fuel', 'aspiration', 'type', 'audience', 'size', 'orientation', 'unit', 'standard', 'water', 'reference_water', 'power', 'speed', 'speed_also', 'issue_date'].includes(key as string);
}

describe('spaces, tabs and line breaks in text', () => {
  it('fold to one space and are trimmed, so sheets and pages print the same words', () => {
    const text = boatText.replace(/^name: .*$/m, 'name: "Grey\\tling\\n\\n  river "').replace(/^notes: .*$/m, 'notes: >\n  Two lines\n\n  of notes.\n');
    const r = loadProjectFromFiles(demoWith(BOAT, text));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const boat = r.project.boats.find((b) => b.id === 'greyling')!;
    expect(boat.name).toBe('Grey ling river');
    expect(boat.notes).toBe('Two lines of notes.');
  });

  it('a text of only white space is empty', () => {
    const errors = errorsFor(BOAT, boatText.replace(/^name: .*$/m, 'name: " \\t\\n "'));
    expect(errors.map((e) => `${e.field} ${e.expected}`)).toEqual(['name must not be empty']);
  });
});

describe('INVISIBLE_CHARS', () => {
  it('matches no letter, digit or mark the sheets print, nor tab and line breaks (which fold to spaces)', () => {
    for (const ok of ['Å', 'ß', 'Ω', 'Ж', '½', '·', '–', '°', '€', '\u00a0', ' ', '\t', '\n', '\r', '🚤']) expect(INVISIBLE_CHARS.test(ok), ok).toBe(false);
  });

  it('is escaped by terminalSafe wherever the two overlap, so a refusal never prints the character raw', () => {
    for (const [, , ch] of INVISIBLE) expect(terminalSafe(ch)).not.toMatch(RAW_UNSAFE);
  });
});
