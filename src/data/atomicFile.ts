/**
 * Writing one file of the data folder so that a reader never sees half of it: the new text goes to a
 * temporary file in the same folder (a rename is atomic only within one file system), is flushed to the
 * disk, then renamed over the old file, and the folder is flushed so the rename lasts a power cut. Any
 * failure before the rename removes the temporary file and leaves the old file untouched.
 */
import { randomBytes } from 'node:crypto';
import { close, fsync, open, rename, unlink, write } from 'node:fs';
import { promisify } from 'node:util';
import { posix } from 'node:path';

/** The file-system calls used, injectable so a test can make one of them fail. */
export interface AtomicFs {
  open(path: string, flags: string, mode?: number): Promise<number>;
  /** Writes from the start of data; resolves to the bytes written (maybe fewer than asked). */
  write(fd: number, data: Uint8Array): Promise<number>;
  fsync(fd: number): Promise<void>;
  close(fd: number): Promise<void>;
  rename(from: string, to: string): Promise<void>;
  unlink(path: string): Promise<void>;
}

export const NODE_FS: AtomicFs = {
  open: promisify(open) as AtomicFs['open'],
  write: (fd, data) => new Promise((done, fail) => write(fd, data, (err, n) => (err ? fail(err) : done(n)))),
  fsync: promisify(fsync),
  close: promisify(close),
  rename: promisify(rename),
  unlink: promisify(unlink),
};

/** Replace path by bytes atomically (see above); mode for a new file, 0o644 unless given. */
export async function writeFileAtomic(path: string, bytes: Uint8Array, opts: { fs?: AtomicFs; mode?: number } = {}): Promise<void> {
  const fs = opts.fs ?? NODE_FS;
  const dir = posix.dirname(path.replace(/\\/g, '/'));
  const temp = posix.join(dir, `.${posix.basename(path)}.${process.pid}-${randomBytes(4).toString('hex')}.tmp`);
  let fd: number | undefined;
  try {
    fd = await fs.open(temp, 'wx', opts.mode ?? 0o644);
    for (let at = 0; at < bytes.length; ) {
      const n = await fs.write(fd, bytes.subarray(at));
      if (!(n > 0)) throw new Error(`could not write ${path}: the disk took no bytes`);
      at += n;
    }
    await fs.fsync(fd);
    await fs.close(fd);
    fd = undefined;
    await fs.rename(temp, path);
  } catch (error) {
    if (fd !== undefined) await fs.close(fd).catch(() => undefined);
    await fs.unlink(temp).catch(() => undefined);
    throw error;
  }
  // The rename is done; flushing the folder makes it survive a power cut (not every system allows it).
  try {
    const dfd = await fs.open(dir, 'r');
    await fs.fsync(dfd).catch(() => undefined);
    await fs.close(dfd);
  } catch {
    // A folder that cannot be opened for reading still has the new file.
  }
}
