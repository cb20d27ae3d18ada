/**
 * Atomic output: a build writes into a staging folder beside the output folder and only a fully
 * successful build is swapped in (rename old away, rename staging in, delete old). A failing build
 * leaves the previous output untouched, and files of removed boats never linger because every build
 * starts from an empty folder. Renames within one parent folder stay on one file system, so each
 * step is atomic.
 *
 * Work folders beside the output are named `.<out>-build-<pid>-<8 hex>` (staging) and
 * `.<out>-old-<pid>-<8 hex>` (the previous output during the swap) and hold the marker file. A build
 * that was killed (SIGKILL, power cut) leaves its work folder behind; the next build removes every
 * marked work folder whose process is gone, and puts a previous output back if the kill fell between
 * the two renames of the swap. Folders of builds still running, and unmarked folders, are never touched.
 *
 * Folders are made with mkdir (not mkdtemp, which always makes 0700), so the output honours the umask
 * as other generators do: umask 022 gives 755 folders and 644 files.
 */
import { randomBytes } from 'node:crypto';
import { accessSync, constants, existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { homedir } from 'node:os';
import { basename, dirname, isAbsolute, join, relative, resolve } from 'node:path';

/** A file in every output folder we write, so we never delete a folder we did not make. */
export const OUTPUT_MARKER = '.matchbook-output';
const MARKER_TEXT = 'Written by matchbook; the whole folder is replaced on each build.\n';

export class OutputFolderError extends Error {}

/** File-system failures that are about the place, not about matchbook: said as a usage error. */
const PLACE_CODES: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  EROFS: 'the file system is read-only',
  ENOSPC: 'the disk is full',
  EDQUOT: 'the disk quota is used up',
  ENOTDIR: 'a part of the path is a file, not a folder',
  EEXIST: 'a file is in the way',
  ENAMETOOLONG: 'the path is too long',
  EISDIR: 'a folder is in the way',
};

/** A path the way the user would type it: relative to the working folder when below it. */
function shown(path: string): string {
  const rel = relative(process.cwd(), path);
  return rel === '' ? '.' : rel.startsWith('..') || isAbsolute(rel) ? path : rel;
}

/**
 * Turns an error of the file system while writing the output into a usage error naming the folder and
 * the fix; anything else is returned unchanged (a fault of ours).
 */
export function placeError(error: unknown, outDir: string): unknown {
  const { code, path } = (error ?? {}) as { code?: unknown; path?: unknown };
  if (typeof code !== 'string' || !Object.hasOwn(PLACE_CODES, code)) return error;
  // Only failures at the output's place: a path beside or below the output folder.
  const parent = dirname(resolve(outDir));
  if (typeof path === 'string' && resolve(path) !== parent && !resolve(path).startsWith(`${parent}/`)) return error;
  const folder = shown(parent);
  return new OutputFolderError(
    `cannot write the output folder ${outDir} in ${folder} (${code}: ${PLACE_CODES[code]}); ` +
      `choose an --out in a folder you may write to, or free or fix ${folder}`,
  );
}

/** Refuses output folders whose replacement would destroy something that is not ours, or that cannot be made. */
export function checkOutputFolder(args: { outDir: string; dataDir: string }): void {
  const out = resolve(args.outDir);
  const data = resolve(args.dataDir);
  const forbidden = [resolve('/'), resolve(process.cwd()), resolve(homedir())];
  if (forbidden.includes(out) || data === out || data.startsWith(`${out}/`)) {
    throw new OutputFolderError(
      `the output folder ${args.outDir} would replace the project, home or data folder; ` +
        'choose a folder of its own, for example --out out',
    );
  }
  // The nearest folder that exists on the way to out: it must be a folder, and one we may write in.
  let existing = dirname(out);
  while (!existsSync(existing) && dirname(existing) !== existing) existing = dirname(existing);
  if (!statSync(existing).isDirectory()) {
    throw new OutputFolderError(
      `the output folder ${args.outDir} cannot be made: ${shown(existing)} is a file, not a folder; ` +
        'choose an --out whose parent is a folder, for example --out out',
    );
  }
  try {
    accessSync(existing, constants.W_OK | constants.X_OK);
  } catch {
    throw new OutputFolderError(
      `the output folder ${args.outDir} cannot be written: the folder ${shown(existing)} is read-only for you; ` +
        'choose an --out in a folder you may write to, or change the permissions of that folder',
    );
  }
  if (!existsSync(out)) return;
  if (!statSync(out).isDirectory()) {
    throw new OutputFolderError(`the output path ${args.outDir} is a file, expected a folder; choose another --out`);
  }
  const entries = readdirSync(out);
  if (entries.length > 0 && !entries.includes(OUTPUT_MARKER)) {
    throw new OutputFolderError(
      `the output folder ${args.outDir} holds files matchbook did not write (no ${OUTPUT_MARKER}); ` +
        'it would be replaced as a whole, so empty it or choose another --out',
    );
  }
}

/** Work folders of this process still on disk (removed by discardAllWork on Ctrl+C or SIGTERM). */
const live = new Set<string>();

const WORK_NAME = /^\.(.+)-(build|old)-(\d+)-[0-9a-f]{8}$/;

/** True while a process with that id runs (one we may not signal counts as running). */
function running(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as { code?: string }).code === 'EPERM';
  }
}

/** A new, empty, uniquely named folder beside out: `.<out>-<kind>-<pid>-<8 hex>` (the name only, for old). */
function workPath(out: string, kind: 'build' | 'old'): string {
  return join(dirname(out), `.${basename(out)}-${kind}-${process.pid}-${randomBytes(4).toString('hex')}`);
}

/**
 * Removes the marked work folders beside outDir left by builds that were killed, and puts back a
 * previous output that a kill left renamed away. Returns the names it removed or restored.
 */
export function removeStaleWork(outDir: string): string[] {
  const out = resolve(outDir);
  const parent = dirname(out);
  let names: string[];
  try {
    names = readdirSync(parent);
  } catch {
    return [];
  }
  const done: string[] = [];
  for (const name of names.sort()) {
    const m = WORK_NAME.exec(name);
    if (!m || m[1] !== basename(out) || running(Number(m[3]))) continue;
    const path = join(parent, name);
    if (!existsSync(join(path, OUTPUT_MARKER))) continue;
    if (m[2] === 'old' && !existsSync(out)) renameSync(path, out);
    else rmSync(path, { recursive: true, force: true });
    done.push(name);
  }
  return done;
}

/** Creates an empty staging folder beside outDir (".out-build-<pid>-<hex>" for "out"), marked as ours. */
export function createStaging(outDir: string): string {
  const out = resolve(outDir);
  try {
    removeStaleWork(out);
    mkdirSync(dirname(out), { recursive: true });
    for (;;) {
      const staging = workPath(out, 'build');
      try {
        mkdirSync(staging);
      } catch (error) {
        if ((error as { code?: string }).code === 'EEXIST') continue;
        throw error;
      }
      live.add(staging);
      writeFileSync(join(staging, OUTPUT_MARKER), MARKER_TEXT);
      return staging;
    }
  } catch (error) {
    throw placeError(error, outDir);
  }
}

/**
 * Swaps a finished staging folder in as outDir; the previous output is removed only after the swap.
 * Another build swapping into the same folder at the same moment makes a rename fail (the folder came
 * back, or went); the swap is then tried again, so concurrent builds end with one whole build in place.
 */
export function swapIn(args: { staging: string; outDir: string }): void {
  const out = resolve(args.outDir);
  const raced = (error: unknown) => ['ENOTEMPTY', 'EEXIST', 'ENOENT'].includes((error as { code?: string }).code ?? '');
  try {
    for (let attempt = 1; ; attempt += 1) {
      let old: string | undefined;
      if (existsSync(out)) {
        old = workPath(out, 'old');
        try {
          renameSync(out, old);
        } catch (error) {
          if (raced(error) && attempt < 20) continue;
          throw error;
        }
        live.add(old);
      }
      try {
        renameSync(args.staging, out);
        live.delete(args.staging);
      } catch (error) {
        // Put the previous output back, unless another build's output took its place meanwhile.
        if (old !== undefined) {
          if (!existsSync(out)) renameSync(old, out);
          else rmSync(old, { recursive: true, force: true });
          live.delete(old);
        }
        if (raced(error) && attempt < 20) continue;
        throw error;
      }
      if (old !== undefined) {
        rmSync(old, { recursive: true, force: true });
        live.delete(old);
      }
      return;
    }
  } catch (error) {
    throw placeError(error, args.outDir);
  }
}

/** Deletes a staging folder after a failed build. */
export function discardStaging(staging: string): void {
  rmSync(staging, { recursive: true, force: true });
  live.delete(staging);
}

/**
 * Deletes every work folder this process still has (Ctrl+C or SIGTERM in the middle of a build).
 * An old output renamed away mid-swap is put back first. Synchronous, for a signal handler.
 */
export function discardAllWork(): void {
  for (const path of [...live]) {
    const m = WORK_NAME.exec(basename(path));
    const out = m ? join(dirname(path), m[1]) : '';
    if (m?.[2] === 'old' && !existsSync(out)) renameSync(path, out);
    else rmSync(path, { recursive: true, force: true });
    live.delete(path);
  }
}
