/**
 * Every line-ending convention is read (issue #14, class 9). YAML 1.2.2 §5.4 ("Line Break
 * Characters"): a line break is CR LF, CR or LF. A file saved with classic Mac OS endings (CR alone)
 * used to be reported as empty; it now loads like its LF twin, and every problem in it is reported at
 * the same line and column as in the LF file, in check and in the build's own checks.
 */
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { lfLineBreaks } from '../../src/data/lineBreaks.ts';
import { unprintableText } from '../../src/site/unprintable.ts';

const ENDINGS = { LF: '\n', 'CR LF': '\r\n', CR: '\r' } as const;

/** The demo data with greyling.yaml rewritten by edit and saved with the given line ending. */
function demoWith(ending: string, edit: (text: string) => string = (t) => t): string {
  const dir = join(mkdtempSync(join(tmpdir(), 'matchbook-endings-')), 'data');
  cpSync('data', dir, { recursive: true });
  const file = join(dir, 'boats', 'greyling.yaml');
  writeFileSync(file, edit(readFileSync(file, 'utf8')).replace(/\n/g, ending));
  return dir;
}

/** Located errors with the folder taken out, so runs in different folders compare. */
const located = (errors: readonly { message: string }[], dir: string) => errors.map((e) => e.message.replaceAll(dir, 'DATA'));

describe('line endings', () => {
  it('lfLineBreaks turns a lone CR into LF, one character for one, and leaves CR LF alone', () => {
    expect(lfLineBreaks('a: 1\rb: 2\r')).toBe('a: 1\nb: 2\n');
    expect(lfLineBreaks('a: 1\r\nb: 2\r\n')).toBe('a: 1\r\nb: 2\r\n');
    expect(lfLineBreaks('a: 1\r\rb: 2')).toBe('a: 1\n\nb: 2');
    expect(lfLineBreaks('a\r').length).toBe(2);
  });

  for (const [name, ending] of Object.entries(ENDINGS)) {
    it(`${name}: the demo loads with the same boat as with LF`, async () => {
      const loaded = await loadProject(demoWith(ending));
      expect(loaded.ok).toBe(true);
      if (loaded.ok) expect(loaded.project.boats.find((b) => b.id === 'greyling')?.name).toBe('Greyling (fishing boat)');
    });

    it(`${name}: a bad value on line 14 is reported at 14:10, as in the LF file`, async () => {
      const dir = demoWith(ending, (t) => t.replace('  ratio: 1.55', '  ratio: -1.55'));
      const loaded = await loadProject(dir);
      expect(loaded.ok).toBe(false);
      const messages = loaded.ok ? [] : located(loaded.errors, dir);
      expect(messages).toHaveLength(1);
      expect(messages[0]).toMatch(/^DATA\/boats\/greyling\.yaml:14:10 drive_line\.ratio /);
    });

    it(`${name}: a syntax error is shown on its own line with the caret, not the whole file`, async () => {
      const dir = demoWith(ending, (t) => t.replace('name: Greyling (fishing boat)', 'name: "Greyling (fishing boat)'));
      const loaded = await loadProject(dir);
      const e = loaded.ok ? undefined : loaded.errors[0];
      expect(e && located([e], dir)[0]).toMatch(/^DATA\/boats\/greyling\.yaml:4:7 /);
      expect(e?.detail?.[0]).toBe('4 | name: "Greyling (fishing boat)');
    });

    it(`${name}: a character the font lacks is located at its line and column (the build's check)`, async () => {
      const dir = demoWith(ending, (t) => t.replace('notes: Demo data.', 'notes: Demo data 🚤.'));
      const loaded = await loadProject(dir);
      expect(loaded.ok).toBe(true);
      if (!loaded.ok) return;
      const errors = unprintableText(loaded.project, { dataDir: dir });
      expect(located(errors, dir)[0]).toMatch(/^DATA\/boats\/greyling\.yaml:5:18 notes /);
    });
  }
});
