import type { CheckProgress, LongRun } from '../../db';

/** How often the progress line is redrawn at most. */
const REDRAW_MS = 100;

export interface TerminalProgress extends LongRun {
  /** Clears the progress line and stops listening for Ctrl-C. */
  done(): void;
}

const percent = (done: number, total: number) => (total > 0 ? Math.floor((100 * done) / total) : 0);

/**
 * A long run's progress on standard error, redrawn in place, only when standard error is a terminal (a
 * script reading it, or a log file, sees nothing). Ctrl-C cancels the run, which then leaves nothing
 * behind, instead of killing the program mid-write.
 */
export function terminalProgress(label: string, describe: (done: number, total: number) => string = (d, t) => `${d} of ${t}`): TerminalProgress {
  const controller = new AbortController();
  const onInterrupt = () => controller.abort();
  process.once('SIGINT', onInterrupt);
  const tty = process.stderr.isTTY === true;
  let last = 0;
  let shown = false;
  return {
    signal: controller.signal,
    onProgress(done, total) {
      const now = Date.now();
      if (!tty || (now - last < REDRAW_MS && done < total)) return;
      last = now;
      shown = true;
      const share = total > 0 ? `${percent(done, total)}% (${describe(done, total)})` : describe(done, total);
      process.stderr.write(`\r\x1b[K${label} ${share}${controller.signal.aborted ? ', cancelling…' : ''}`);
    },
    done() {
      process.off('SIGINT', onInterrupt);
      if (shown) process.stderr.write('\r\x1b[K');
    },
  };
}

const megabytes = (bytes: number) => `${(bytes / 1e6).toFixed(1)} MB`;
export const bytesRead = (done: number, total: number) => `${megabytes(done)} of ${megabytes(total)}`;

/** Runs `fn` with a terminal progress, always clearing it after. */
export async function withProgress<T>(label: string, fn: (progress: LongRun) => Promise<T>, describe?: (done: number, total: number) => string): Promise<T> {
  const progress = terminalProgress(label, describe);
  try {
    return await fn(progress);
  } finally {
    progress.done();
  }
}

/**
 * A damage check (it cannot report how far it is): one line on standard error while it runs, only when
 * standard error is a terminal, removed when it ends.
 */
export const checkNotice = (label: string): CheckProgress => (event, bytes) => {
  if (process.stderr.isTTY !== true) return;
  process.stderr.write(event === 'start' ? `${label} (${megabytes(bytes)})…` : '\r\x1b[K');
};
