/** Writes files under one output folder, creating folders as needed and counting what it wrote. */
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';

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
  const target = (relPath: string) => {
    const path = join(root, relPath);
    mkdirSync(dirname(path), { recursive: true });
    written += 1;
    return path;
  };
  return {
    write: (relPath, content) => writeFileSync(target(relPath), content),
    copyDir: (srcDir, relDir, suffix) => {
      if (!existsSync(srcDir)) return [];
      const names = readdirSync(srcDir).filter((n) => n.endsWith(suffix)).sort();
      for (const name of names) copyFileSync(join(srcDir, name), target(`${relDir}/${name}`));
      return names;
    },
    copyFile: (src, relPath) => {
      if (!existsSync(src)) return false;
      copyFileSync(src, target(relPath));
      return true;
    },
    readText: (relPath) => readFileSync(join(root, relPath), 'utf8'),
    count: () => written,
  };
}
