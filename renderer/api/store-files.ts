import type { ApiResult, ImportResult, RestoreResult } from '../../core/api';
import { dataActionCancelled } from '../../core/api/method-names';
import type { CancellableDataAction, DataActionEvent, DataActionName, DataActionOptions } from '../../core/api/method-names';
import type { ShellBridge } from './bridge';
import { isApiResult, transportFailure } from './result';

/** What the Data screen hears back: done (with what to say), cancelled in a dialog, or failed. */
export type StoreFileOutcome = ApiResult<{ message: string }>;

/** How far a long file action is (done of total; total 0 while unknown), and its cancel. */
export interface LongAction {
  onProgress?: (done: number, total: number) => void;
  signal?: AbortSignal;
}

const cancelledOutcome = (action: CancellableDataAction): StoreFileOutcome => ({ ok: false, error: { code: 'cancelled', message: dataActionCancelled[action], path: '' } });

/** The desktop shell's data actions as they run in main: their progress and end, and the way to stop one. */
export interface ShellDataActivity {
  /** Every progress and end message of main's data actions, the File menu's included. Returns the remover. */
  onEvent(listener: (event: DataActionEvent) => void): () => void;
  cancel(name: CancellableDataAction): void;
}

/**
 * Backup and restore without a path ever leaving or entering the page. In the app, main runs its own
 * file dialogs and confirmation; in a browser the backup is a download and a restore an upload of the
 * file the user picked.
 */
export interface StoreFiles {
  /** The desktop shell asks where (and reports) itself; a browser downloads the backup, reporting how far. */
  backup(long?: LongAction): Promise<StoreFileOutcome>;
  /**
   * A browser downloads the export as the service writes it, a chunk of jobs at a time, reporting jobs
   * received of the whole; the app's shell asks where with its own save dialog and writes the file, reporting
   * jobs written. Both stop on the signal and leave nothing behind.
   */
  exportJobs(input: { format: 'json' | 'csv'; status?: DataActionOptions['status'] | undefined }, long?: LongAction): Promise<StoreFileOutcome>;
  /**
   * A browser uploads the picked file and the service imports it streamed, all or nothing, reporting bytes
   * imported of the file's size; undefined in the app, where importChosen runs instead.
   */
  importJobs?: (file: File, options: { renumber: boolean }, long?: LongAction) => Promise<ApiResult<ImportResult>>;
  /** The app's shell asks for the file with its own open dialog and imports it, all or nothing; undefined in a browser. */
  importChosen?: (options: { renumber: boolean }, long?: LongAction) => Promise<StoreFileOutcome>;
  /** What main is doing with files (the app only): how the File menu's actions show in the window. */
  shell?: ShellDataActivity;
  /** `file` is the backup picked in the page (browser only); the app's shell asks with its own dialog. */
  restore(file: File | null): Promise<StoreFileOutcome>;
  /** Whether the shell shows the dialogs (so the page shows no file picker or confirmation of its own). */
  shellDialogs: boolean;
}

async function resultOf<T>(response: Response): Promise<ApiResult<T>> {
  try {
    const body: unknown = await response.json();
    return isApiResult(body) ? (body as ApiResult<T>) : transportFailure(`The service answered ${response.status} with something that is not a result.`);
  } catch {
    return transportFailure(`The service answered ${response.status} ${response.statusText} without a result.`);
  }
}

/** The body of a download, piece by piece, each piece counted by `measure` toward the progress. */
async function received(response: Response, measure: (piece: Uint8Array) => number, total: number, long: LongAction): Promise<Blob> {
  const pieces: Uint8Array<ArrayBuffer>[] = [];
  const reader = response.body!.getReader();
  let done = 0;
  for (;;) {
    const { value, done: finished } = await reader.read();
    if (finished) break;
    pieces.push(value as Uint8Array<ArrayBuffer>);
    done += measure(value);
    long.onProgress?.(Math.min(done, total), total);
  }
  return new Blob(pieces, { type: response.headers.get('content-type') ?? 'application/octet-stream' });
}

/** Line breaks in a piece: the export writes one job a line (JSON) or one line a job (CSV). */
function lineBreaks(piece: Uint8Array): number {
  let n = 0;
  for (let i = 0; i < piece.length; i++) if (piece[i] === 10) n++;
  return n;
}

const fileNameOf = (response: Response, fallback: string) => /filename="([^"]+)"/.exec(response.headers.get('content-disposition') ?? '')?.[1] ?? fallback;

/** The JSON lines of an import's answer: progress as they come, then the result. */
async function importAnswer(response: Response, long: LongAction): Promise<ApiResult<ImportResult>> {
  const reader = response.body!.pipeThrough(new TextDecoderStream()).getReader();
  let pending = '';
  let result: ApiResult<ImportResult> | undefined;
  for (;;) {
    const { value, done } = await reader.read();
    if (done) break;
    pending += value;
    const lines = pending.split('\n');
    pending = lines.pop()!;
    for (const line of lines) {
      const message = JSON.parse(line) as { progress?: [number, number] } | ApiResult<ImportResult>;
      if ('progress' in message && message.progress) long.onProgress?.(message.progress[0], message.progress[1]);
      else if (isApiResult(message)) result = message as ApiResult<ImportResult>;
    }
  }
  return result ?? transportFailure('The service ended the import without a result.');
}

function browserFiles(download: (blob: Blob, name: string) => void): StoreFiles {
  return {
    shellDialogs: false,
    async importJobs(file, options, long = {}) {
      try {
        long.onProgress?.(0, 0);
        const format = file.name.toLowerCase().endsWith('.csv') ? 'csv' : 'json';
        const response = await fetch(`/files/import?format=${format}${options.renumber ? '&renumber=1' : ''}`, {
          method: 'POST', body: file, credentials: 'same-origin', signal: long.signal ?? null,
          headers: { 'content-type': 'application/octet-stream', 'x-file-name': encodeURIComponent(file.name) },
        });
        if (!response.ok) return resultOf(response);
        return await importAnswer(response, long);
      } catch (e) {
        if (long.signal?.aborted) return { ok: false, error: { code: 'cancelled', message: dataActionCancelled.importJobs, path: '' } };
        return transportFailure(`No answer from the Coilwright service (${(e as Error).message}).`);
      }
    },
    async backup(long = {}) {
      try {
        long.onProgress?.(0, 0);
        const response = await fetch('/files/backup', { credentials: 'same-origin', signal: long.signal ?? null });
        if (!response.ok) return resultOf(response);
        const name = fileNameOf(response, 'coilwright-backup.db');
        download(await received(response, (piece) => piece.length, Number(response.headers.get('content-length') ?? 0), long), name);
        return { ok: true, value: { message: `Backup downloaded as ${name}.` } };
      } catch (e) {
        if (long.signal?.aborted) return cancelledOutcome('backup');
        return transportFailure(`No answer from the Coilwright service (${(e as Error).message}).`);
      }
    },
    async exportJobs(input, long = {}) {
      try {
        long.onProgress?.(0, 0);
        const query = new URLSearchParams({ format: input.format, ...(input.status ? { status: input.status } : {}) });
        const response = await fetch(`/files/export?${query.toString()}`, { credentials: 'same-origin', signal: long.signal ?? null });
        if (!response.ok) return resultOf(response);
        const total = Number(response.headers.get('x-job-count') ?? 0);
        const name = fileNameOf(response, `coilwright-jobs.${input.format}`);
        download(await received(response, lineBreaks, total, long), name);
        return { ok: true, value: { message: `${total} job${total === 1 ? '' : 's'} exported, downloaded as ${name}.` } };
      } catch (e) {
        if (long.signal?.aborted) return cancelledOutcome('exportJobs');
        return transportFailure(`No answer from the Coilwright service (${(e as Error).message}).`);
      }
    },
    async restore(file) {
      if (!file) return { ok: false, error: { code: 'no-file', message: 'choose the backup file to restore', path: 'file' } };
      try {
        const response = await fetch('/files/restore', {
          method: 'POST', body: file, credentials: 'same-origin',
          headers: { 'content-type': 'application/octet-stream', 'x-file-name': encodeURIComponent(file.name) },
        });
        const r = await resultOf<RestoreResult>(response);
        return r.ok ? { ok: true, value: { message: `Restored from ${file.name}.${r.value.previousKeptAs ? ' The previous store is kept beside the store file.' : ''}` } } : r;
      } catch (e) {
        return transportFailure(`No answer from the Coilwright service (${(e as Error).message}).`);
      }
    },
  };
}

/**
 * One data action run by main: its progress (for this window's own start, not the File menu's) goes to the
 * caller, the caller's Cancel goes to main, and main's outcome becomes the Data screen's.
 */
async function inShell(bridge: ShellBridge, name: DataActionName, options: DataActionOptions, long: LongAction = {}): Promise<StoreFileOutcome> {
  const stop = bridge.onDataProgress((event) => {
    if (event.action === name && event.from === 'window' && event.state === 'running') long.onProgress?.(event.done, event.total);
  });
  const cancel = () => {
    if (name !== 'restore') void bridge.cancelDataAction(name);
  };
  long.signal?.addEventListener('abort', cancel, { once: true });
  try {
    const r = await bridge.runDataAction(name, options);
    if (!r.ok) return r;
    const { outcome, message } = r.value;
    if (outcome === 'cancelled' || outcome === 'failed') return { ok: false, error: { code: outcome, message, path: '' } };
    return { ok: true, value: { message } };
  } catch (e) {
    return transportFailure(`The desktop shell did not run the ${name}: ${(e as Error).message}`);
  } finally {
    stop();
    long.signal?.removeEventListener('abort', cancel);
  }
}

function shellFiles(bridge: ShellBridge): StoreFiles {
  return {
    shellDialogs: true,
    backup: (long) => inShell(bridge, 'backup', {}, long),
    restore: () => inShell(bridge, 'restore', {}),
    exportJobs: (input, long) => inShell(bridge, 'exportJobs', { format: input.format, ...(input.status ? { status: input.status } : {}) }, long),
    importChosen: (options, long) => inShell(bridge, 'importJobs', options, long),
    shell: {
      onEvent: (listener) => bridge.onDataProgress(listener),
      cancel: (name) => void bridge.cancelDataAction(name),
    },
  };
}

export function createStoreFiles(bridge: ShellBridge | undefined, download: (blob: Blob, name: string) => void): StoreFiles {
  return bridge ? shellFiles(bridge) : browserFiles(download);
}
