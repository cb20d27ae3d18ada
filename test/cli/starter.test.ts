// The starter folder `matchbook start` writes: example files that load with zero problems, that name an
// existing JSON Schema of their kind, and a writer that never overwrites anything.
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { Ajv } from 'ajv';
import { parse } from 'yaml';
import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { jsonSchemaFor, type SchemaKind } from '../../src/data/jsonSchemas.ts';
import { StarterFolderError, starterFiles, writeStarter } from '../../src/cli/starter.ts';
import { matchbook, REPO } from './runCli.ts';

const STACK = /^\s+at .+\(?.+:\d+:\d+\)?$/m;
const KIND_OF_DIR: Record<string, SchemaKind> = { engines: 'engine', jets: 'jet', boats: 'boat', books: 'book' };
const kindOf = (path: string): SchemaKind => (path === 'site.yaml' ? 'site' : KIND_OF_DIR[path.split('/')[0]]);

const freshDir = (): string => join(mkdtempSync(join(tmpdir(), 'matchbook-start-')), 'shop-data');

/** Every file under dir as relative path → text. */
function snapshot(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string, prefix: string): void => {
    for (const e of readdirSync(d, { withFileTypes: true })) {
      if (e.isDirectory()) walk(join(d, e.name), `${prefix}${e.name}/`);
      else out[`${prefix}${e.name}`] = readFileSync(join(d, e.name), 'utf8');
    }
  };
  walk(dir, '');
  return out;
}

describe('writeStarter()', () => {
  it('writes site.yaml, one engine, one jet, one boat and one book that load with zero errors and zero warnings', async () => {
    const dir = freshDir();
    const written = writeStarter({ dataDir: dir, issueDateIso: '2026-12-03' });
    expect(written.map((p) => p.slice(dir.length + 1))).toEqual([
      'site.yaml',
      'engines/example-six.yaml',
      'jets/example-jet.yaml',
      'boats/example-runabout.yaml',
      'books/example-book.yaml',
    ]);
    const loaded = await loadProject(dir);
    expect(loaded.ok ? [] : loaded.errors.map((e) => e.message)).toEqual([]);
    expect(loaded.warnings.map((w) => w.message)).toEqual([]);
    if (!loaded.ok) return;
    const p = loaded.project;
    expect([p.engines.length, p.jets.length, p.boats.length, p.books.length]).toEqual([1, 1, 1, 1]);
    expect(p.jets[0].impellers.map((i) => i.id)).toEqual(['sample-a', 'sample-b', 'sample-c', 'sample-d']);
    expect(p.boats[0].name).toBe('Example Runabout');
    expect(p.site.issueDate).toBe('2026-12-03');
  });

  it('marks every file as example data and points its modeline at an existing schema of its kind', () => {
    const dir = freshDir();
    for (const file of starterFiles({ dataDir: dir, issueDateIso: '2026-12-03' })) {
      const [modeline, marker] = file.text.split('\n');
      const match = /^# yaml-language-server: \$schema=(\S+)$/.exec(modeline);
      expect(match, file.path).not.toBeNull();
      // Relative to the written file, the path lands on this package's schema of the file's kind.
      const target = resolve(dirname(join(dir, file.path)), match![1]);
      expect(target).toBe(resolve(REPO, 'schema', `${kindOf(file.path)}.schema.json`));
      expect(existsSync(target)).toBe(true);
      expect(marker).toMatch(/^# EXAMPLE DATA, written by `matchbook start`/);
    }
  });

  it('writes files an independent JSON Schema validator (ajv) accepts', () => {
    const ajv = new Ajv({ allErrors: true, strict: true, strictRequired: false });
    for (const file of starterFiles({ dataDir: freshDir(), issueDateIso: '2026-12-03' })) {
      const validate = ajv.compile(jsonSchemaFor(kindOf(file.path)));
      expect(validate(parse(file.text)), `${file.path}: ${JSON.stringify(validate.errors)}`).toBe(true);
    }
  });

  it('writes into an existing empty folder', () => {
    const dir = freshDir();
    mkdirSync(dir);
    expect(writeStarter({ dataDir: dir, issueDateIso: '2026-12-03' })).toHaveLength(5);
  });

  it('refuses a folder that holds anything, naming what is there, and changes nothing', () => {
    const dir = freshDir();
    mkdirSync(join(dir, 'engines'), { recursive: true });
    writeFileSync(join(dir, 'site.yaml'), 'shop_name: Mine\n');
    const before = snapshot(dir);
    expect(() => writeStarter({ dataDir: dir, issueDateIso: '2026-12-03' })).toThrow(StarterFolderError);
    expect(() => writeStarter({ dataDir: dir, issueDateIso: '2026-12-03' })).toThrow(
      `${dir} already holds 2 entries (engines/, site.yaml); start writes its example data only into a new or empty folder, so nothing was written.`,
    );
    expect(snapshot(dir)).toEqual(before);
    expect(readdirSync(join(dir, 'engines'))).toEqual([]);
  });

  it('refuses a path that is a file', () => {
    const dir = freshDir();
    mkdirSync(dirname(dir), { recursive: true });
    writeFileSync(dir, 'not a folder\n');
    expect(() => writeStarter({ dataDir: dir, issueDateIso: '2026-12-03' })).toThrow(`${dir} is a file, not a folder;`);
    expect(readFileSync(dir, 'utf8')).toBe('not a folder\n');
  });
});

describe('matchbook start', () => {
  it('writes the folder, prints the next steps, and a second run exits 2 without touching a file', () => {
    const dir = freshDir();
    const first = matchbook(['start', '--data', dir], { SOURCE_DATE_EPOCH: '1767225600' });
    expect(first.status).toBe(0);
    expect(first.stdout).toContain(`${dir}/boats/example-runabout.yaml`);
    expect(first.stdout).toContain(`npx matchbook build --data ${dir}`);
    // 1767225600 s after the epoch is 2026-01-01 00:00 UTC.
    expect(readFileSync(join(dir, 'site.yaml'), 'utf8')).toMatch(/^issue_date: 2026-01-01/m);
    const before = snapshot(dir);
    const second = matchbook(['start', '--data', dir]);
    expect(second.status).toBe(2);
    expect(second.stderr).toContain(`matchbook: ${dir} already holds 5 entries (boats/, books/, engines/, jets/, site.yaml)`);
    expect(second.stderr).toContain('matchbook start --data NEW-FOLDER');
    expect(second.stderr).not.toMatch(STACK);
    expect(snapshot(dir)).toEqual(before);
  });

  it('refuses the clone\'s own demo folder', () => {
    const r = matchbook(['start']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^matchbook: data already holds \d+ entries/);
  });
});
