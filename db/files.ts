import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { StoreError } from './errors';

const FULL = new Set(['ENOSPC', 'EDQUOT']);

/** Through the fs module object, so a test can make the disk fill up part way (ENOSPC from writeSync). */
export function writeAll(fd: number, data: Buffer): void {
  for (let at = 0; at < data.length;) at += fs.writeSync(fd, data, at, data.length - at);
}

/**
 * Writes `data` to `file` so that the file is either complete or not touched: the bytes go to a hidden
 * temporary file beside it, are flushed to the disk, and only then renamed over `file`. A full disk or
 * any other failure removes the temporary file and leaves an existing `file` as it was (never 0 bytes).
 * Throws StoreError "disk-full" or "unwritable-file" with `path` set to the caller's field name.
 */
export function writeFileReplacing(file: string, data: string | Buffer, path = 'file'): void {
  const temporary = join(dirname(file), `.${basename(file)}.${randomBytes(6).toString('hex')}.partial`);
  let fd: number | undefined;
  try {
    fd = fs.openSync(temporary, 'wx');
    writeAll(fd, typeof data === 'string' ? Buffer.from(data, 'utf8') : data);
    fs.fsyncSync(fd);
    fs.closeSync(fd);
    fd = undefined;
    fs.renameSync(temporary, file);
  } catch (e) {
    if (fd !== undefined) fs.closeSync(fd);
    fs.rmSync(temporary, { force: true });
    throw fileWriteFailure(file, e, path);
  }
}

/** A failed file write as the answer: the disk is full, or the file cannot be written, naming the field. */
export function fileWriteFailure(file: string, e: unknown, path = 'file'): StoreError {
  const code = (e as NodeJS.ErrnoException).code ?? (e as Error).message;
  if (FULL.has(code)) return new StoreError('disk-full', `the disk is full: ${file} was not written (nothing was changed)`, path);
  return new StoreError('unwritable-file', `${file}: cannot be written (${code})`, path);
}
