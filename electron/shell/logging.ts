import { appendFileSync, mkdirSync, renameSync, statSync } from 'node:fs';
import path from 'node:path';

/** Past this size the log is moved to coilwright.1.log (replacing the older one) and started afresh. */
const ROTATE_BYTES = 1_000_000;

export interface Log {
  readonly file: string;
  info(context: string, message: string): void;
  error(context: string, error: unknown): void;
}

export function describeError(error: unknown): string {
  if (error instanceof Error) return error.stack ?? `${error.name}: ${error.message}`;
  try {
    return JSON.stringify(error);
  } catch {
    return String(error);
  }
}

function rotateIfLarge(file: string): void {
  try {
    if (statSync(file).size > ROTATE_BYTES) renameSync(file, file.replace(/\.log$/, '.1.log'));
  } catch {
    // No log yet: nothing to rotate.
  }
}

/**
 * A plain-text log in `dir` (userData/logs in the app). Writes are synchronous so the line is on disk
 * even if the process dies right after; a log that cannot be written never takes the app down.
 */
export function createLog(dir: string, clock: () => Date = () => new Date()): Log {
  const file = path.join(dir, 'coilwright.log');
  const write = (level: string, context: string, text: string) => {
    try {
      mkdirSync(dir, { recursive: true });
      rotateIfLarge(file);
      appendFileSync(file, `${clock().toISOString()} ${level} [${context}] ${text}\n`);
    } catch {
      // Nowhere left to report to; the dialog still shows the error.
    }
  };
  return {
    file,
    info: (context, message) => write('INFO', context, message),
    error: (context, error) => write('ERROR', context, describeError(error)),
  };
}
