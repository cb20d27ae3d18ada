/**
 * The output folder and the command line (issue #14, class 7), through the real command: an --out
 * that cannot be made or written is a usage error (exit 2) naming the folder and the fix, never a
 * fault; a fresh build honours the umask (umask 022 gives 755 folders and 644 files, as POSIX mkdir
 * and open with modes 0777 and 0666 do: IEEE Std 1003.1-2017, mkdir() and open(), "the file
 * permission bits ... modified by the process' file mode creation mask"); the folder and file names
 * that are object-prototype words load, check and build.
 */
import { chmodSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import { writeSmallData } from '../reliability/smallData.ts';
import { REPO, matchbook } from './runCli.ts';

let root: string;
let data: string;

beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'matchbook-outdir-'));
  chmodSync(root, 0o755);
  data = writeSmallData(join(root, 'data'));
});

/** Modes of every folder and file under dir, counted ("755" → 12). */
function modes(dir: string): { dirs: Record<string, number>; files: Record<string, number> } {
  const dirs: Record<string, number> = {};
  const files: Record<string, number> = {};
  const walk = (path: string): void => {
    const info = statSync(path);
    const mode = (info.mode & 0o777).toString(8);
    if (info.isDirectory()) {
      dirs[mode] = (dirs[mode] ?? 0) + 1;
      for (const name of readdirSync(path)) walk(join(path, name));
    } else files[mode] = (files[mode] ?? 0) + 1;
  };
  walk(dir);
  return { dirs, files };
}

/** The command run from a shell with the given umask. */
function buildWithUmask(umask: string, out: string) {
  return spawnSync('sh', ['-c', `umask ${umask} && exec "${process.execPath}" "${REPO}bin/matchbook.js" build --data "${data}" --out "${out}"`], {
    cwd: REPO,
    env: { ...process.env, NO_COLOR: '1', SOURCE_DATE_EPOCH: '1767225600' },
    encoding: 'utf8',
  });
}

describe('--out that cannot be made or written', () => {
  it('below a regular file: exit 2, names the file and the fix, writes nothing', () => {
    const file = join(root, 'notes.txt');
    writeFileSync(file, 'a file, not a folder');
    const r = matchbook(['build', '--data', data, '--out', join(file, 'out')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`cannot be made: ${file} is a file, not a folder`);
    expect(r.stderr).toContain('choose an --out whose parent is a folder');
    expect(r.stderr).not.toMatch(/fault in matchbook|\n\s+at /);
  });

  it('in a read-only folder: exit 2 for build and serve, names the folder and the fix', () => {
    const locked = join(root, 'locked');
    mkdirSync(locked);
    chmodSync(locked, 0o555);
    // root may write anywhere; the check then runs as the unprivileged user "nobody" (uid 65534).
    const asUser = process.getuid?.() === 0 ? ['setpriv', '--reuid=65534', '--regid=65534', '--clear-groups'] : [];
    for (const command of ['build', 'serve']) {
      const argv = [...asUser, process.execPath, `${REPO}bin/matchbook.js`, command, '--data', data, '--out', join(locked, 'out')];
      const r = spawnSync(argv[0], argv.slice(1), { cwd: REPO, env: { ...process.env, NO_COLOR: '1' }, encoding: 'utf8', timeout: 120_000 });
      expect(r.status, r.stderr).toBe(2);
      expect(r.stderr).toContain(`the folder ${locked} is read-only for you`);
      expect(r.stderr).toContain('choose an --out in a folder you may write to');
    }
    expect(readdirSync(locked)).toEqual([]);
  });
});

describe('the output folder honours the umask', () => {
  it('umask 022: every folder 755, every file 644 (the top folder too, not mkdtemp\'s 700)', () => {
    const out = join(root, 'out-022');
    const r = buildWithUmask('022', out);
    expect(r.status, r.stderr).toBe(0);
    const m = modes(out);
    expect(Object.keys(m.dirs)).toEqual(['755']);
    expect(Object.keys(m.files)).toEqual(['644']);
    expect(m.files['644']).toBeGreaterThan(40);
  });

  it('umask 027: 750 and 640, so it is the umask and not a fixed mode', () => {
    const out = join(root, 'out-027');
    const r = buildWithUmask('027', out);
    expect(r.status, r.stderr).toBe(0);
    const m = modes(out);
    expect(Object.keys(m.dirs)).toEqual(['750']);
    expect(Object.keys(m.files)).toEqual(['640']);
  });
});

describe('names that are object-prototype words', () => {
  const WORDS = ['__proto__', 'constructor', 'toString', 'hasOwnProperty'];

  it('a data folder named after each word loads like any other', async () => {
    for (const word of WORDS) {
      const dir = writeSmallData(join(root, 'proto', word));
      const loaded = await loadProject(dir);
      expect(loaded.ok, `${word}: ${loaded.ok ? '' : loaded.errors.map((e) => e.message).join('\n')}`).toBe(true);
      if (loaded.ok) expect(loaded.project.boats.map((b) => b.id)).toEqual(['greyling', 'heavy-boat', 'light-boat']);
    }
  });

  it('a definition file named after each word is a located error, never an internal one', async () => {
    const dir = writeSmallData(join(root, 'proto-files'));
    for (const word of WORDS) writeFileSync(join(dir, 'boats', `${word}.yaml`), 'id: greyling\n');
    const loaded = await loadProject(dir);
    expect(loaded.ok).toBe(false);
    const messages = loaded.ok ? [] : loaded.errors.map((e) => e.message);
    for (const word of WORDS) {
      expect(messages.some((m) => m.startsWith(`${dir}/boats/${word}.yaml:1:5 id must match the file name (${word}.yaml)`))).toBe(true);
    }
    expect(messages.join('\n')).not.toContain('internal error');
    // A file name that is no id is fixed by renaming the file, not by copying its name into id.
    expect(messages.find((m) => m.includes('/__proto__.yaml:1:5'))).toContain('rename the file to greyling.yaml (file names are lower-case ids)');
  });

  it('a boat, engine, jet and book whose id is "constructor" build, into an --out named "constructor"', () => {
    const dir = writeSmallData(join(root, 'constructor'));
    const copy = (from: string, to: string, edit: (text: string) => string) => writeFileSync(join(dir, to), edit(readFileSync(join(dir, from), 'utf8')));
    copy('engines/thimblefinch-trotter.yaml', 'engines/constructor.yaml', (t) => t.replace(/^id: .*$/m, 'id: constructor'));
    copy('jets/kelpspindle-riffle.yaml', 'jets/constructor.yaml', (t) => t.replace(/^id: .*$/m, 'id: constructor'));
    copy('boats/light-boat.yaml', 'boats/constructor.yaml', (t) =>
      t.replace(/^id: .*$/m, 'id: constructor').replace(/^engine: .*$/m, 'engine: constructor').replace(/^jet: .*$/m, 'jet: constructor'));
    copy('books/cards.yaml', 'books/constructor.yaml', (t) => t.replace(/^id: .*$/m, 'id: constructor').replace(/boat: greyling/, 'boat: constructor'));
    const out = join(root, 'built', 'constructor');
    const r = matchbook(['build', '--data', dir, '--out', out], { SOURCE_DATE_EPOCH: '1767225600' });
    expect(r.status, r.stderr).toBe(0);
    expect(readdirSync(join(out, 'boats'))).toContain('constructor');
    expect(readdirSync(join(out, 'books'))).toContain('constructor.pdf');
    expect(readdirSync(join(out, 'results', 'families'))).toContain('constructor.json');
  }, 120_000);
});
