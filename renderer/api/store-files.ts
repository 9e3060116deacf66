import type { ApiResult, RestoreResult } from '../../core/api';
import type { ShellBridge } from './bridge';
import { isApiResult, transportFailure } from './result';

/** What the Data screen hears back: done (with what to say), cancelled in a dialog, or failed. */
export type StoreFileOutcome = ApiResult<{ message: string }>;

/**
 * Backup and restore without a path ever leaving or entering the page. In the app, main runs its own
 * file dialogs and confirmation; in a browser the backup is a download and a restore an upload of the
 * file the user picked.
 */
export interface StoreFiles {
  /** The desktop shell asks where (and reports) itself; a browser downloads the backup. */
  backup(): Promise<StoreFileOutcome>;
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

function browserFiles(download: (blob: Blob, name: string) => void): StoreFiles {
  return {
    shellDialogs: false,
    async backup() {
      try {
        const response = await fetch('/files/backup', { credentials: 'same-origin' });
        if (!response.ok) return resultOf(response);
        const name = /filename="([^"]+)"/.exec(response.headers.get('content-disposition') ?? '')?.[1] ?? 'coilwright-backup.db';
        download(await response.blob(), name);
        return { ok: true, value: { message: `Backup downloaded as ${name}.` } };
      } catch (e) {
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

function shellFiles(bridge: ShellBridge): StoreFiles {
  const run = async (name: 'backup' | 'restore'): Promise<StoreFileOutcome> => {
    const r = await bridge.runDataAction(name);
    return r.ok ? { ok: true, value: { message: 'Finished: the outcome was shown in the dialog.' } } : r;
  };
  return { shellDialogs: true, backup: () => run('backup'), restore: () => run('restore') };
}

export function createStoreFiles(bridge: ShellBridge | undefined, download: (blob: Blob, name: string) => void): StoreFiles {
  return bridge ? shellFiles(bridge) : browserFiles(download);
}
