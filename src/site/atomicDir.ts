/**
 * Atomic output: a build writes into a staging folder beside the output folder and only a fully
 * successful build is swapped in (rename old away, rename staging in, delete old). A failing build
 * leaves the previous output untouched, and files of removed boats never linger because every build
 * starts from an empty folder. Renames within one parent folder stay on one file system, so each
 * step is atomic.
 */
import { existsSync, mkdirSync, mkdtempSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { homedir } from 'node:os';

/** A file in every output folder we write, so we never delete a folder we did not make. */
export const OUTPUT_MARKER = '.matchbook-output';

export class OutputFolderError extends Error {}

/** Refuses output folders whose replacement would destroy something that is not ours. */
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

/** Creates an empty staging folder beside outDir (".out-build-XXXXXX" for "out"). */
export function createStaging(outDir: string): string {
  const out = resolve(outDir);
  mkdirSync(dirname(out), { recursive: true });
  const staging = mkdtempSync(join(dirname(out), `.${basename(out)}-build-`));
  writeFileSync(join(staging, OUTPUT_MARKER), 'Written by matchbook; the whole folder is replaced on each build.\n');
  return staging;
}

/** Swaps a finished staging folder in as outDir; the previous output is removed only after the swap. */
export function swapIn(args: { staging: string; outDir: string }): void {
  const out = resolve(args.outDir);
  if (!existsSync(out)) {
    renameSync(args.staging, out);
    return;
  }
  const old = mkdtempSync(join(dirname(out), `.${basename(out)}-old-`));
  rmSync(old, { recursive: true });
  renameSync(out, old);
  try {
    renameSync(args.staging, out);
  } catch (error) {
    renameSync(old, out);
    throw error;
  }
  rmSync(old, { recursive: true, force: true });
}

/** Deletes a staging folder after a failed build. */
export function discardStaging(staging: string): void {
  rmSync(staging, { recursive: true, force: true });
}
