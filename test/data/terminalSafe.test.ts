/**
 * Issue class: user text reaching the terminal raw. A key holding an ESC sequence was printed as is by
 * `check` (values were escaped, keys were not). Every located message now escapes controls, bidi and
 * zero-width characters the same way, whether they sit in a key, a value or a file name.
 */
import { describe, expect, it } from 'vitest';
import { dataError, terminalSafe } from '../../src/data/errors.ts';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import { demoWith } from './helpers.ts';

const JET = 'data/jets/kelpspindle-riffle.yaml';
const UNSAFE = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2066-\u2069]/;

function messagesFor(path: string, text: string): string[] {
  const result = loadProjectFromFiles(demoWith(path, text));
  if (result.ok) throw new Error('expected errors');
  return result.errors.map((e) => e.message);
}

describe('terminalSafe()', () => {
  it('writes ESC, CR, DEL, C1, bidi overrides and zero-width characters as \\u escapes and keeps other text', () => {
    expect(terminalSafe('a\u001b[2Jb\rc\u007fd\u009be\u202ef\u200bg ëΩЖ')).toBe('a\\u001b[2Jb\\u000dc\\u007fd\\u009be\\u202ef\\u200bg ëΩЖ');
  });
});

describe('located messages escape user text the same way everywhere', () => {
  it('escapes a key holding an ESC sequence (unknown field)', () => {
    const messages = messagesFor(JET, 'id: kelpspindle-riffle\n"\\e[2J\\e[1;1HOK": 1\n');
    const m = messages.find((x) => x.includes('is not a field here'));
    expect(m).toContain('\\u001b[2J\\u001b[1;1HOK');
    expect(messages.every((x) => !UNSAFE.test(x))).toBe(true);
  });

  it('escapes a value holding control and bidi characters', () => {
    const messages = messagesFor(JET, 'id: "kelpspindle-riffle\\u202e\\e[31m"\n');
    expect(messages.some((x) => x.includes('\\u202e\\u001b[31m'))).toBe(true);
    expect(messages.every((x) => !UNSAFE.test(x))).toBe(true);
  });

  it('escapes a file name holding an ESC sequence', () => {
    const e = dataError({ file: 'data/jets/x\u001b[2J.yaml', line: 1, column: 1 }, { field: '', expected: 'must be readable', found: 'EACCES' });
    expect(e.message).toBe('data/jets/x\\u001b[2J.yaml:1:1 the file must be readable, found EACCES');
  });

  it('escapes a duplicated key holding a control character', () => {
    const messages = messagesFor(JET, 'id: kelpspindle-riffle\n"k\\x07": 1\n"k\\x07": 2\n');
    expect(messages.some((x) => x.includes('k\\u0007'))).toBe(true);
    expect(messages.every((x) => !UNSAFE.test(x))).toBe(true);
  });
});
