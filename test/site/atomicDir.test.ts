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
  swapIn,
} from '../../src/site/atomicDir.ts';

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
});
