import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadProjectFromFiles } from '../../src/data/load.ts';
import type { DataError } from '../../src/data/types.ts';
import { MAX_FILE_BYTES } from '../../src/data/yamlSource.ts';
import { demoWith } from './helpers.ts';

const JET = 'data/jets/kelpspindle-riffle.yaml';

function errorsFor(path: string, text: string): DataError[] {
  const result = loadProjectFromFiles(demoWith(path, text));
  if (result.ok) throw new Error('expected errors');
  return [...result.errors];
}

describe('loadProjectFromFiles() stays robust on hostile input', () => {
  it('refuses a file over the size cap without parsing it', () => {
    const [e] = errorsFor(JET, `id: kelpspindle-riffle\nnotes: "${'x'.repeat(MAX_FILE_BYTES)}"\n`);
    expect(e.message).toMatch(/^data\/jets\/kelpspindle-riffle\.yaml:1:1 the file must be at most 5 MB, found 5\.0 MB/);
  });

  it('refuses flow nesting deep enough to exhaust the parser, at the bracket', () => {
    const [e] = errorsFor(JET, `id: kelpspindle-riffle\nx: ${'['.repeat(200_000)}${']'.repeat(200_000)}\n`);
    expect(e.message).toBe('data/jets/kelpspindle-riffle.yaml:2:68 the file must not nest [ ] or { } deeper than 64 levels, found 200000 levels');
  });

  it('stops an alias expansion bomb', () => {
    const bomb = ['a: &a [x, x, x, x, x, x, x, x, x, x]', ...'bcdefgh'.split('').map((k, i) => `${k}: &${k} [${Array(10).fill(`*${'abcdefgh'[i]}`).join(', ')}]`)].join('\n');
    const [e] = errorsFor(JET, `${bomb}\n`);
    expect(e.file).toBe(JET);
    expect(e.message).toMatch(/^data\/jets\/kelpspindle-riffle\.yaml:1:1 the file must be readable YAML, found .*alias/i);
  });

  it('reports a second YAML document in one file', () => {
    const [e] = errorsFor(JET, 'id: kelpspindle-riffle\n---\nid: other\n');
    expect(e.message).toBe('data/jets/kelpspindle-riffle.yaml:2:1 the file must hold one YAML document, found a second document after --- — remove the --- line or split the file');
  });

  it('reports an empty file as a missing mapping', () => {
    const [e] = errorsFor(JET, '# nothing here\n');
    expect(e.message).toBe('data/jets/kelpspindle-riffle.yaml:1:1 the file must be a mapping (key: value lines), found nothing (an empty file)');
  });

  it('reports a list where the file should be a mapping', () => {
    const [e] = errorsFor(JET, '- 1\n- 2\n');
    expect(e.message).toBe('data/jets/kelpspindle-riffle.yaml:1:1 the file must be a mapping (key: value lines), found a list of 2 entries');
  });

  it('treats __proto__ as an unknown field, not as a prototype', () => {
    const errors = errorsFor(JET, 'id: kelpspindle-riffle\n__proto__: { polluted: true }\n');
    expect(errors.some((e) => e.message.startsWith('data/jets/kelpspindle-riffle.yaml:2:1 __proto__ is not a field here'))).toBe(true);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('rejects custom tags instead of running or guessing them', () => {
    const [e] = errorsFor(JET, 'id: !!js/function "x"\n');
    expect(e.message).toBe('data/jets/kelpspindle-riffle.yaml:1:5 the file must use plain YAML values without custom tags, found !!js/function — remove the tag');
  });

  it('reports a missing site.yaml and a missing data folder', () => {
    const noSite = loadProjectFromFiles(demoWith('data/site.yaml', '').filter((f) => f.path !== 'data/site.yaml'));
    expect(noSite.ok).toBe(false);
    if (!noSite.ok) expect(noSite.errors.map((e) => e.message)).toContain('data/site.yaml:1:1 the file must exist (shop name, contact line, data revision, issue date), found no such file — create it (matchbook start writes one in a new folder); see the data-format guide');
  });

  it('turns an unexpected failure into one located sentence instead of a stack trace', () => {
    const exploding = { path: JET, get text(): string { throw new Error('disk vanished'); } };
    const result = loadProjectFromFiles([exploding], { dataDir: 'data' });
    expect(result).toEqual({
      ok: false,
      errors: [expect.objectContaining({ message: 'data:1:1 the file could not be loaded because of an internal error, found disk vanished — please report this with the file attached' })],
      warnings: [],
    });
  });

  it('never throws and always answers with sorted, located errors, whatever the text (seeded fuzz)', () => {
    // Fragments of our format glued at random: reaches the parser, the schema and the cross-file checks.
    const fragment = fc.constantFrom('id: kelpspindle-riffle\n', 'impellers:\n', '  - id: k1\n', '    rating_kw: ', '-1', '.nan', '"2"', '[', ']', '{', '}', '&a ', '*a', ': ', '\n', '  ', '\t', '#', '---\n', 'exponent: 9\n', '\u0000', '\uFEFF', 'label: x\n', 'maker: y\n');
    fc.assert(
      fc.property(fc.array(fragment, { maxLength: 40 }), fc.string({ maxLength: 20 }), (parts, noise) => {
        const result = loadProjectFromFiles([{ path: JET, text: parts.join('') + noise }]);
        const list = result.ok ? result.warnings : result.errors;
        for (const e of list) {
          expect(e.line).toBeGreaterThanOrEqual(1);
          expect(e.column).toBeGreaterThanOrEqual(1);
          expect(e.message.startsWith(`${e.file}:${e.line}:${e.column} `)).toBe(true);
          expect(e.message).not.toMatch(/\n\s+at /);
        }
        const keys = list.map((e) => [e.file, e.line, e.column] as const);
        const sorted = [...keys].sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : a[1] - b[1] || a[2] - b[2]));
        expect(keys).toEqual(sorted);
      }),
      { seed: 20261102, numRuns: 500 },
    );
  });
});
