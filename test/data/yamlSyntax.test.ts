/**
 * YAML syntax errors are reported where the mistake is, in plain words, with the line and a caret
 * under the spot; the parser's own words come last. The rules each case breaks are from the YAML 1.2.2
 * specification (yaml.org/spec/1.2.2): tabs are not indentation (§6.1), a plain scalar must not contain
 * ": " (§7.3.3), a quoted scalar ends at its closing quote (§7.3.1–7.3.2), a flow sequence ends with ]
 * (§7.4.1), block mapping keys of one mapping share their indentation (§8.2.2) and an implicit key is
 * followed by ":" and a space (§7.4/§8.2.2). Which spot a person should look at is our own reading.
 */
import { describe, expect, it } from 'vitest';
import { printedError } from '../../src/data/errors.ts';
import type { DataError } from '../../src/data/types.ts';
import { parseYaml } from '../../src/data/yamlSource.ts';
import { caretExcerpt } from '../../src/data/yamlSyntax.ts';

function syntaxError(text: string): DataError {
  const r = parseYaml({ file: 'shop/jets/j.yaml', text });
  if (r.ok) throw new Error('parsed without error');
  expect(r.errors).toHaveLength(1);
  return r.errors[0];
}

/** The column the caret points at in the printed excerpt, 1-based in the source line. */
function caretColumn(e: DataError): number {
  const [source, caret] = e.detail!;
  const gutter = source.indexOf(' | ') + 3;
  return caret.indexOf('^') - gutter + 1;
}

const ENGINE = ['id: vale-4', 'label: Vale 4', 'rated_rpm: 5000', 'max_rpm: 5200', ''];

describe('a YAML syntax error is reported at the real mistake', () => {
  it.each([
    // [what, lines, line, column, found, where the parser itself stopped]
    ['a key indented under a key that has a value (§8.2.2)', ['id: vale-4', 'rated_rpm: 5000', '  max_rpm: 5200', 'fuel: petrol', ''], 3, 3, '"max_rpm" indented 2 spaces deeper than "rated_rpm" on line 2, which already has a value', 'line 2, column 12'],
    ['a double quote that never closes (§7.3.1)', ['id: vale-4', 'label: "Vale 4', 'rated_rpm: 5000', 'max_rpm: 5200', ''], 2, 8, 'a " that opens the value of label but is never closed', 'line 5, column 1'],
    ['a flow sequence without its ] (§7.4.1)', ['points:', '  - [1000, 62]', '  - [1500, 101', '  - [2000, 142]', ''], 3, 5, 'a [ that is never closed', 'line 4, column 3'],
    ['": " inside an unquoted value (§7.3.3)', ['id: vale-4', 'label: Vale: 4 cylinder', ''], 2, 12, 'a second ": " inside the value of label', 'line 2, column 8'],
    ['a key without its colon (§8.2.2)', ['id: vale-4', 'label Vale 4', 'max_rpm: 5200', ''], 2, 1, '"label Vale 4" with no colon after its key', undefined],
    ['no space after the colon (§7.4)', ['id:vale-4', 'max_rpm: 5200', ''], 1, 4, '"id:vale-4" with no space after the colon', 'line 1, column 1'],
    ['a tab in the indentation (§6.1)', ['curve:', '\tunit: kw', ''], 2, 1, 'a tab in the indentation', undefined],
  ])('%s', (_what, lines, line, column, found, parserStop) => {
    const e = syntaxError(lines.join('\n'));
    expect([e.line, e.column]).toEqual([line, column]);
    expect(e.found).toBe(found);
    expect(e.message.startsWith(`shop/jets/j.yaml:${line}:${column} the file must be valid YAML, found ${found} — `)).toBe(true);
    // The offending line, a caret under the spot, and the parser's words as the last line.
    expect(e.detail).toHaveLength(3);
    expect(e.detail![0]).toBe(`${line} | ${lines[line - 1].replace(/\t/g, '→')}`);
    expect(caretColumn(e)).toBe(column);
    expect(e.detail![2]).toMatch(/^the YAML parser said: \S/);
    if (parserStop) expect(e.detail![2]).toContain(`(it stopped at ${parserStop})`);
    else expect(e.detail![2]).not.toContain('it stopped');
  });

  it('gives a fix a person can apply, with the corrected line where it can write it', () => {
    expect(syntaxError(['id: vale-4', 'label Vale 4', 'max_rpm: 5200', ''].join('\n')).fix).toBe('write it as key: value, for example label: Vale 4');
    expect(syntaxError(['id:vale-4', 'max_rpm: 5200', ''].join('\n')).fix).toBe('put a space after the colon: id: vale-4');
    expect(syntaxError(['label: Vale: 4 cylinder', ''].join('\n')).fix).toBe('put the whole value in quotes: label: "Vale: 4 cylinder"');
    expect(syntaxError(['points: [1, 2}', ''].join('\n')).found).toBe('a } where ] should close the [ opened at line 1, column 9');
  });

  it('does not mistake block-scalar text or an apostrophe for the mistake', () => {
    const e = syntaxError(['notes: |', '  owner\'s note: [not a list', 'label: "Vale', ''].join('\n'));
    expect([e.line, e.column, e.found]).toEqual([3, 8, 'a " that opens the value of label but is never closed']);
    const apostrophe = syntaxError([...ENGINE.slice(0, -1), "notes: the owner's boat: needs quotes", ''].join('\n'));
    expect([apostrophe.line, apostrophe.column, apostrophe.found]).toEqual([5, 24, 'a second ": " inside the value of notes']);
  });

  it('prints the sentence, then the excerpt indented under it', () => {
    const e = syntaxError(['id: vale-4', 'label: "Vale 4', ''].join('\n'));
    expect(printedError(e).split('\n')).toEqual([
      e.message,
      '    2 | label: "Vale 4',
      '      |        ^',
      '    the YAML parser said: Missing closing "quote (it stopped at line 3, column 1)',
    ]);
  });
});

describe('caretExcerpt()', () => {
  it('keeps the caret under the spot on a long line by showing a window around it', () => {
    const long = `label: ${'x'.repeat(300)}!`;
    const [source, caret] = caretExcerpt(long, 1, 308);
    expect(source.length).toBeLessThan(120);
    expect(source[caret.indexOf('^')]).toBe('!');
  });
});
