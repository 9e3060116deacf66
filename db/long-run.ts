import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { StoreError } from './errors';
import { fileWriteFailure, writeAll } from './files';

/** What a long export or import reports as it goes, and how it is told to stop. */
export interface LongRun {
  /** Called after each chunk: work done so far and the whole (jobs for an export, bytes for an import). */
  onProgress?: (done: number, total: number) => void;
  /** Aborted: the run stops at the next chunk and leaves nothing behind (no file, no imported job). */
  signal?: AbortSignal | undefined;
}

export const cancelled = (what: 'export' | 'import'): StoreError => new StoreError('cancelled',
  what === 'export' ? 'the export was cancelled: no file was written' : 'the import was cancelled: nothing was imported', '');

/** Lets timers, I/O and a cancel request run between two chunks. */
export const yieldToEvents = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));

export interface TextSink {
  write(text: string): Promise<void>;
}

/**
 * A file written a piece at a time into a hidden temporary file beside it, flushed and renamed over the
 * file only by finish(): an existing file is never left half-written, and abandon() removes the pieces.
 * Written through the fs module object, as writeFileReplacing is, so a test can fill the disk part way.
 */
export function fileSink(file: string): TextSink & { finish(): Promise<void>; abandon(): Promise<void> } {
  const temporary = join(dirname(file), `.${basename(file)}.${randomBytes(6).toString('hex')}.partial`);
  let fd: number | undefined;
  const guard = (step: () => void) => {
    try {
      step();
    } catch (e) {
      throw fileWriteFailure(file, e);
    }
  };
  return {
    async write(text) {
      guard(() => {
        fd ??= fs.openSync(temporary, 'wx');
        writeAll(fd, Buffer.from(text, 'utf8'));
      });
    },
    async finish() {
      guard(() => {
        fd ??= fs.openSync(temporary, 'wx');
        fs.fsyncSync(fd);
        fs.closeSync(fd);
        fd = undefined;
        fs.renameSync(temporary, file);
      });
    },
    async abandon() {
      if (fd !== undefined) fs.closeSync(fd);
      fd = undefined;
      fs.rmSync(temporary, { force: true });
    },
  };
}
