/** The loader's own guards: strict UTF-8 with the place of the first bad byte, and the block-nesting cap. */
import { describe, expect, it } from 'vitest';
import { deepestBlockLine, MAX_CONTENT_COLUMN } from '../../src/data/blockDepth.ts';
import { decodeUtf8 } from '../../src/data/utf8.ts';

const bytes = (...parts: (string | number[])[]): Uint8Array =>
  Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'utf8') : Buffer.from(p))));

describe('decodeUtf8()', () => {
  it('decodes valid UTF-8 (Greek, accents, emoji) and keeps a byte-order mark for the YAML parser', () => {
    expect(decodeUtf8(bytes('a: Ωμέγα ü 🚤\n'))).toEqual({ ok: true, text: 'a: Ωμέγα ü 🚤\n' });
    expect(decodeUtf8(bytes([0xef, 0xbb, 0xbf], 'a: 1'))).toEqual({ ok: true, text: '\ufeffa: 1' });
  });

  it('places a Latin-1 é (0xE9) at its line and column counted in characters', () => {
    expect(decodeUtf8(bytes('id: x\nnotes: ünder caf', [0xe9], ' ok\n'))).toEqual({ ok: false, line: 2, column: 17, byte: 0xe9 });
  });

  it('places a stray continuation byte and a lone 0xFF', () => {
    expect(decodeUtf8(bytes('ab', [0x80]))).toEqual({ ok: false, line: 1, column: 3, byte: 0x80 });
    expect(decodeUtf8(bytes('€', [0xff], 'x'))).toEqual({ ok: false, line: 1, column: 2, byte: 0xff });
  });

  it('places a character cut short (E2 82 then text) at its lead byte, and one cut by the end of the file', () => {
    expect(decodeUtf8(bytes('x\n€', [0xe2, 0x82], 'y'))).toEqual({ ok: false, line: 2, column: 2, byte: 0xe2 });
    expect(decodeUtf8(bytes('xy', [0xf0, 0x9f]))).toEqual({ ok: false, line: 1, column: 3, byte: 0xf0 });
  });

  it('refuses an overlong encoding of "/" (C0 AF), a classic path-traversal trick', () => {
    expect(decodeUtf8(bytes('..', [0xc0, 0xaf]))).toMatchObject({ ok: false, line: 1, column: 3 });
  });
});

describe('deepestBlockLine()', () => {
  it('passes the demo layout and text that merely contains dashes after its content starts', () => {
    expect(deepestBlockLine('impellers:\n  - id: wisp\n    label: Wisp\nnotes: a - b - c - d\n')).toBeUndefined();
  });

  it(`finds the first line whose content starts past column ${MAX_CONTENT_COLUMN}, through "- " markers and indentation`, () => {
    const dashes = `x:\n${'- '.repeat(150)}1\n`;
    expect(deepestBlockLine(dashes)).toEqual({ line: 2, column: 301, offset: 303 });
    const indent = `a:\n${' '.repeat(MAX_CONTENT_COLUMN)}b: 1\n`;
    expect(deepestBlockLine(indent)).toBeUndefined();
    expect(deepestBlockLine(`a:\n${' '.repeat(MAX_CONTENT_COLUMN + 1)}b: 1\n`)).toMatchObject({ line: 2, column: MAX_CONTENT_COLUMN + 2 });
  });
});
