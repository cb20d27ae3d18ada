/**
 * Writes files under one output folder, creating folders as needed and counting what it wrote.
 * Folders are made one level at a time below the root, never the root itself: a write that comes
 * late, after a failed build removed its staging folder, fails instead of bringing the folder back.
 * Copies are written afresh (not copied with their source's mode), so every file honours the umask.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';

export interface OutputFiles {
  /** Writes text or bytes to a path relative to the output folder. */
  write(relPath: string, content: string | Uint8Array): void;
  /** Copies every file of srcDir whose name ends with `suffix` into relDir; returns their names, sorted. */
  copyDir(srcDir: string, relDir: string, suffix: string): string[];
  /** Copies one file when it exists; returns whether it did. */
  copyFile(src: string, relPath: string): boolean;
  /** Reads back a text file written earlier. */
  readText(relPath: string): string;
  /** Files written so far. */
  count(): number;
}

/** A writer rooted at `root`. */
export function outputFiles(root: string): OutputFiles {
  let written = 0;
  const base = resolve(root);
  const made = new Set<string>([base]);
  const folder = (dir: string): void => {
    if (made.has(dir) || dirname(dir) === dir) return;
    folder(dirname(dir));
    try {
      mkdirSync(dir);
    } catch (error) {
      if ((error as { code?: string }).code !== 'EEXIST') throw error;
    }
    made.add(dir);
  };
  const target = (relPath: string) => {
    const path = join(base, relPath);
    folder(dirname(path));
    written += 1;
    return path;
  };
  const copy = (src: string, relPath: string) => writeFileSync(target(relPath), readFileSync(src));
  return {
    write: (relPath, content) => writeFileSync(target(relPath), content),
    copyDir: (srcDir, relDir, suffix) => {
      if (!existsSync(srcDir)) return [];
      const names = readdirSync(srcDir).filter((n) => n.endsWith(suffix)).sort();
      for (const name of names) copy(join(srcDir, name), `${relDir}/${name}`);
      return names;
    },
    copyFile: (src, relPath) => {
      if (!existsSync(src)) return false;
      copy(src, relPath);
      return true;
    },
    readText: (relPath) => readFileSync(join(root, relPath), 'utf8'),
    count: () => written,
  };
}
