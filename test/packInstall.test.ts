/**
 * The newcomer's path, end to end, as a user takes it: `npm pack` in the clone, `npm install` of the
 * package file into an empty shop folder, `npx matchbook start`, `npx matchbook build`. One install per
 * run of the suite (beforeAll); npm prefers its local cache and asks only the npm registry for what the
 * cache lacks.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GUIDES, guideHref } from '../src/site/guides.ts';
import { pdfPages } from './reliability/outputTree.ts';

const REPO = fileURLToPath(new URL('../', import.meta.url));
const STACK = /^\s+at .+\(?.+:\d+:\d+\)?$/m;

interface Run {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/**
 * The environment of a user's shell: `npm test` adds npm_* variables for this repository (its folder as
 * local_prefix, its allowScripts, a log level), which must not reach the shop folder's npm. Kept: where
 * npm's cache and config files are, and the registry, so CI's npm settings still apply.
 */
const KEPT_NPM = new Set(['npm_config_cache', 'npm_config_userconfig', 'npm_config_globalconfig', 'npm_config_cafile', 'npm_config_registry']);
const userEnv = (): NodeJS.ProcessEnv => ({
  ...Object.fromEntries(Object.entries(process.env).filter(([k]) => (!/^npm_/i.test(k) || KEPT_NPM.has(k.toLowerCase())) && k !== 'INIT_CWD')),
  NO_COLOR: '1',
  TZ: 'UTC',
});

function run(command: string, args: readonly string[], cwd: string): Promise<Run> {
  return new Promise((done, fail) => {
    const child = spawn(command, args, { cwd, env: userEnv() });
    const [out, err]: [Buffer[], Buffer[]] = [[], []];
    child.stdout.on('data', (b: Buffer) => out.push(b));
    child.stderr.on('data', (b: Buffer) => err.push(b));
    child.on('error', fail);
    child.on('close', (status) => done({ status, stdout: Buffer.concat(out).toString('utf8'), stderr: Buffer.concat(err).toString('utf8') }));
  });
}

/** Every file under dir as relative path → bytes (as text), node_modules and out left aside. */
function files(dir: string, prefix = ''): Record<string, string> {
  const found: Record<string, string> = {};
  for (const e of readdirSync(join(dir, prefix), { withFileTypes: true })) {
    const rel = `${prefix}${e.name}`;
    if (rel === 'node_modules' || rel === 'out') continue;
    if (e.isDirectory()) Object.assign(found, files(dir, `${rel}/`));
    else found[rel] = readFileSync(join(dir, rel), 'latin1');
  }
  return found;
}

const work = mkdtempSync(join(tmpdir(), 'matchbook-pack-'));
const shop = join(work, 'my-shop');
let packed: string[] = [];
let install: Run;
let start: Run;
let build: Run;

beforeAll(async () => {
  const pack = await run('npm', ['pack', '--json', '--pack-destination', work], REPO);
  if (pack.status !== 0) throw new Error(`npm pack failed:\n${pack.stderr}`);
  const [info] = JSON.parse(pack.stdout) as { filename: string; files: { path: string }[] }[];
  packed = info.files.map((f) => f.path).sort();
  // An empty folder, as `npm init -y` leaves it, so npm installs here and not in a folder above.
  mkdirSync(shop);
  writeFileSync(join(shop, 'package.json'), `${JSON.stringify({ name: 'my-shop', private: true }, null, 2)}\n`);
  install = await run('npm', ['install', '--prefer-offline', '--no-audit', '--no-fund', join(work, info.filename)], shop);
  if (install.status !== 0) throw new Error(`npm install of the packed file failed:\n${install.stderr}`);
  start = await run('npx', ['--no', 'matchbook', 'start'], shop);
  build = await run('npx', ['--no', 'matchbook', 'build'], shop);
}, 600_000);
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('the packed package', () => {
  it('holds what matchbook needs at run time and none of the tests, demo data or output', () => {
    for (const path of ['bin/matchbook.js', 'src/cli/main.ts', 'src/site/renderWorkerBoot.js', 'templates/index.11ty.ts', 'templates/assets/site.css', 'schema/boat.schema.json', 'starter/site.yaml', 'package.json', 'README.md']) {
      expect(packed, path).toContain(path);
    }
    expect(packed.filter((p) => /^(test|data|out|bench|scripts|test-results|node_modules)\//.test(p))).toEqual([]);
  });

  it('installs into an empty folder with its run-time dependencies only', () => {
    expect(install.status).toBe(0);
    expect(existsSync(join(shop, 'node_modules/matchbook/bin/matchbook.js'))).toBe(true);
    expect(existsSync(join(shop, 'node_modules/source-sans/package.json'))).toBe(true);
    // devDependencies of the clone stay out of a user's install.
    expect(existsSync(join(shop, 'node_modules/vitest'))).toBe(false);
    expect(existsSync(join(shop, 'node_modules/typescript'))).toBe(false);
  });
});

describe('npx matchbook start, then npx matchbook build, in the shop folder', () => {
  it('start writes data/ whose modelines point at the installed schemas', () => {
    expect(start.status, start.stderr).toBe(0);
    expect(start.stdout).toContain('data/boats/example-runabout.yaml');
    expect(start.stdout).toContain('npx matchbook build ');
    const boat = readFileSync(join(shop, 'data/boats/example-runabout.yaml'), 'utf8');
    const schema = /^# yaml-language-server: \$schema=(\S+)$/m.exec(boat)![1];
    expect(schema).toBe('../../node_modules/matchbook/schema/boat.schema.json');
    expect(existsSync(resolve(join(shop, 'data/boats'), schema))).toBe(true);
  });

  it('build succeeds at once and writes the pages and the chart book with the example boat in it', () => {
    expect(build.status, build.stderr).toBe(0);
    expect(build.stderr).not.toMatch(STACK);
    expect(build.stdout).toMatch(/^built out: \d+ pages, \d+ sheets/m);
    const pages = Number(/built out: (\d+) pages/.exec(build.stdout)![1]);
    expect(pages).toBeGreaterThan(3);
    // The pages come from templates inside node_modules/matchbook (Eleventy skips node_modules by default).
    expect(readFileSync(join(shop, 'out/index.html'), 'utf8')).toContain('Example Runabout');
    expect(existsSync(join(shop, 'out/boats/example-runabout/index.html'))).toBe(true);
    // The guides are read from node_modules/matchbook/docs, so the package must carry them.
    for (const guide of GUIDES) expect(existsSync(join(shop, 'out', guideHref(guide.slug))), guide.file).toBe(true);
    const book = pdfPages(join(shop, 'out/books/example-book.pdf'));
    // The contents page, then the wall chart, spec sheet and console card, as books/example-book.yaml lists
    // them (a two-sided card adds its back).
    expect(book[0]).toContain('CONTENTS');
    expect(book.length).toBeGreaterThanOrEqual(4);
    expect(book.length).toBeLessThanOrEqual(5);
    expect(book.join('\n')).toContain('Example Runabout');
    expect(book.join('\n')).toContain('Your Shop Name (example data)');
  });

  it('a second start refuses with exit status 2 and changes no file', async () => {
    const before = files(shop);
    const again = await run('npx', ['--no', 'matchbook', 'start'], shop);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('matchbook: data already holds 5 entries (boats/, books/, engines/, jets/, site.yaml)');
    expect(again.stderr).not.toMatch(STACK);
    expect(files(shop)).toEqual(before);
  });
});
