import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  OUTPUT_MARKER,
  OutputFolderError,
  checkOutputFolder,
  createStaging,
  discardStaging,
  removeStaleWork,
  swapIn,
} from '../../src/site/atomicDir.ts';
import { spawnSync } from 'node:child_process';

function sandbox(): string {
  return mkdtempSync(join(tmpdir(), 'matchbook-atomic-'));
}

describe('atomic output folder', () => {
  it('swapIn() replaces the whole previous output, so files of removed boats do not linger', () => {
    const root = sandbox();
    const out = join(root, 'out');
    const first = createStaging(out);
    writeFileSync(join(first, 'old-boat.html'), 'old');
    swapIn({ staging: first, outDir: out });
    const second = createStaging(out);
    writeFileSync(join(second, 'new-boat.html'), 'new');
    swapIn({ staging: second, outDir: out });
    expect(readdirSync(out).sort()).toEqual([OUTPUT_MARKER, 'new-boat.html']);
    // nothing left beside it: no staging or old folders
    expect(readdirSync(root)).toEqual(['out']);
  });

  it('discardStaging() after a failure leaves the previous output untouched', () => {
    const root = sandbox();
    const out = join(root, 'out');
    const first = createStaging(out);
    writeFileSync(join(first, 'index.html'), 'good');
    swapIn({ staging: first, outDir: out });
    const failed = createStaging(out);
    writeFileSync(join(failed, 'index.html'), 'half');
    discardStaging(failed);
    expect(readFileSync(join(out, 'index.html'), 'utf8')).toBe('good');
    expect(readdirSync(root)).toEqual(['out']);
  });

  it('checkOutputFolder() refuses a folder with files matchbook did not write', () => {
    const root = sandbox();
    const out = join(root, 'mine');
    mkdirSync(out);
    writeFileSync(join(out, 'thesis.docx'), 'precious');
    expect(() => checkOutputFolder({ outDir: out, dataDir: join(root, 'data') })).toThrow(OutputFolderError);
    expect(() => checkOutputFolder({ outDir: out, dataDir: join(root, 'data') })).toThrow(/did not write/);
    expect(existsSync(join(out, 'thesis.docx'))).toBe(true);
  });

  it('checkOutputFolder() refuses the data folder, its parent and the working folder', () => {
    const root = sandbox();
    expect(() => checkOutputFolder({ outDir: join(root, 'data'), dataDir: join(root, 'data') })).toThrow(OutputFolderError);
    expect(() => checkOutputFolder({ outDir: root, dataDir: join(root, 'data') })).toThrow(OutputFolderError);
    expect(() => checkOutputFolder({ outDir: '.', dataDir: join(root, 'data') })).toThrow(OutputFolderError);
    expect(() => checkOutputFolder({ outDir: join(root, 'fresh'), dataDir: join(root, 'data') })).not.toThrow();
  });

  it('createStaging() names its folder with the process id and marks it as matchbook\'s', () => {
    const root = sandbox();
    const staging = createStaging(join(root, 'out'));
    expect(staging).toMatch(new RegExp(`/\\.out-build-${process.pid}-[0-9a-f]{8}$`));
    expect(readdirSync(staging)).toEqual([OUTPUT_MARKER]);
    discardStaging(staging);
    expect(readdirSync(root)).toEqual([]);
  });

  it('removeStaleWork() removes only marked work folders of processes that are gone, and restores a half-swapped output', () => {
    const root = sandbox();
    // A process id that has just ended (a finished child), and one that is running (this test's parent).
    const dead = spawnSync(process.execPath, ['-e', '']).pid;
    const alive = process.ppid;
    const folder = (name: string, marked: boolean, file = 'index.html') => {
      mkdirSync(join(root, name));
      writeFileSync(join(root, name, file), name);
      if (marked) writeFileSync(join(root, name, OUTPUT_MARKER), 'marker');
    };
    folder(`.out-build-${dead}-0000000a`, true); // killed build: removed
    folder(`.out-build-${dead}-0000000b`, false); // not marked: not ours, kept
    folder(`.out-build-${alive}-0000000c`, true); // a build still running: kept
    folder(`.other-build-${dead}-0000000d`, true); // beside another output folder: kept
    folder(`.out-old-${dead}-0000000e`, true); // killed between the two renames: becomes out again
    folder('notes', false);
    expect(removeStaleWork(join(root, 'out'))).toEqual([`.out-build-${dead}-0000000a`, `.out-old-${dead}-0000000e`]);
    expect(readdirSync(root).sort()).toEqual([`.other-build-${dead}-0000000d`, `.out-build-${alive}-0000000c`, `.out-build-${dead}-0000000b`, 'notes', 'out'].sort());
    expect(readFileSync(join(root, 'out', 'index.html'), 'utf8')).toBe(`.out-old-${dead}-0000000e`);
    // With out in place, a stale old copy is only removed.
    folder(`.out-old-${dead}-0000000f`, true);
    expect(removeStaleWork(join(root, 'out'))).toEqual([`.out-old-${dead}-0000000f`]);
    expect(readFileSync(join(root, 'out', 'index.html'), 'utf8')).toBe(`.out-old-${dead}-0000000e`);
  });
});
