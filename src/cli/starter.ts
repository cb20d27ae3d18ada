/**
 * The starter data folder `matchbook start` writes: the example files in the package's starter/
 * folder, each pointed at the JSON Schema of the installed matchbook and dated the day it is written.
 * Never overwrites: the target must be new or empty.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The package's example files and schemas, wherever matchbook is installed. */
export const STARTER_DIR = fileURLToPath(new URL('../../starter/', import.meta.url));
export const SCHEMA_DIR = fileURLToPath(new URL('../../schema/', import.meta.url));

/** One file of the starter folder: its path inside the data folder (always with `/`) and its text. */
export interface StarterFile {
  readonly path: string;
  readonly text: string;
}

/** The target folder exists and is not empty (or is a file): nothing was written. */
export class StarterFolderError extends Error {}

const MODELINE = /^# yaml-language-server: \$schema=\S+$/m;
const ISSUE_DATE = /^issue_date: \d{4}-\d{2}-\d{2}/m;
const KIND_OF_DIR: Readonly<Record<string, string>> = { engines: 'engine', jets: 'jet', boats: 'boat', books: 'book' };

/** Files under dir, relative with `/`: site.yaml first, then the folders in the data's own order. */
function walk(dir: string, prefix = ''): string[] {
  const rank = (name: string): number => ['site.yaml', 'engines', 'jets', 'boats', 'books'].indexOf(name) >>> 0;
  return readdirSync(dir, { withFileTypes: true })
    .sort((a, b) => rank(a.name) - rank(b.name) || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))
    .flatMap((e) => (e.isDirectory() ? walk(join(dir, e.name), `${prefix}${e.name}/`) : [`${prefix}${e.name}`]));
}

/** The schema kind a data file belongs to, from its place in the folder ("site", "engine", …). */
function kindOf(path: string): string {
  return path === 'site.yaml' ? 'site' : (KIND_OF_DIR[path.split('/')[0]] ?? 'site');
}

/**
 * The starter files as they will be written into dataDir: the modeline is the relative path from each
 * file to this matchbook's schema (node_modules/matchbook/schema/… when installed in the folder), and
 * site.yaml's issue_date is issueDateIso (YYYY-MM-DD).
 */
export function starterFiles(args: { dataDir: string; issueDateIso: string }): StarterFile[] {
  const root = resolve(args.dataDir);
  return walk(STARTER_DIR).map((path) => {
    const schema = join(SCHEMA_DIR, `${kindOf(path)}.schema.json`);
    const rel = relative(dirname(join(root, path)), schema).replace(/\\/g, '/');
    const text = readFileSync(join(STARTER_DIR, path), 'utf8')
      .replace(MODELINE, `# yaml-language-server: $schema=${rel}`)
      .replace(ISSUE_DATE, `issue_date: ${args.issueDateIso}`);
    return { path, text };
  });
}

/** What is already at dataDir, or undefined when there is nothing (or an empty folder). */
function occupant(dataDir: string): string | undefined {
  if (!existsSync(dataDir)) return undefined;
  if (!statSync(dataDir).isDirectory()) return 'is a file, not a folder';
  const entries = readdirSync(dataDir, { withFileTypes: true })
    .map((e) => `${e.name}${e.isDirectory() ? '/' : ''}`)
    .sort();
  if (entries.length === 0) return undefined;
  const shown = entries.slice(0, 5).join(', ');
  return `already holds ${entries.length} ${entries.length === 1 ? 'entry' : 'entries'} (${shown}${entries.length > 5 ? ', …' : ''})`;
}

function refusal(dataDir: string, what: string): StarterFolderError {
  return new StarterFolderError(
    `${dataDir} ${what}; start writes its example data only into a new or empty folder, so nothing was written.\n` +
      `Name a new folder (matchbook start --data NEW-FOLDER, then build with --data NEW-FOLDER), ` +
      `or check the data that is there (matchbook check --data ${dataDir}).`,
  );
}

/**
 * Writes the starter folder into dataDir (a new or empty folder) and returns the paths written, as
 * dataDir/… . Throws StarterFolderError, writing nothing, when dataDir holds anything.
 */
export function writeStarter(args: { dataDir: string; issueDateIso: string }): string[] {
  const what = occupant(args.dataDir);
  if (what !== undefined) throw refusal(args.dataDir, what);
  const written: string[] = [];
  for (const file of starterFiles(args)) {
    const target = join(args.dataDir, file.path);
    try {
      mkdirSync(dirname(target), { recursive: true });
      // 'wx': fail rather than replace a file that appeared since the check above.
      writeFileSync(target, file.text, { flag: 'wx' });
    } catch (error) {
      const code = (error as { code?: string }).code ?? 'an error';
      const done = written.length === 0 ? 'nothing was written' : `only ${written.join(', ')} ${written.length === 1 ? 'was' : 'were'} written`;
      throw new StarterFolderError(
        code === 'EEXIST'
          ? `${target} appeared while start was writing and was left as it was; ${done}. Remove what start wrote and run it again, or name a new folder with --data`
          : `cannot write ${target} (${code}); ${done}. Check that you may write there, or name another folder with --data`,
      );
    }
    written.push(target.replace(/\\/g, '/'));
  }
  return written;
}
