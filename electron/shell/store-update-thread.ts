import { existsSync } from 'node:fs';
import { Worker } from 'node:worker_threads';
import type { UpdateOutcome } from '../../service/host/store-update';

export interface ThreadUpdate {
  /** The built worker (dist/electron/store-update-worker.cjs). */
  workerFile: string;
  /** The store file to update. */
  file: string;
  /** The Electron-ABI build of better-sqlite3, or undefined for the default lookup. */
  nativeBinding: string | undefined;
}

/**
 * Runs a store's schema update in a worker thread, so the main process keeps painting and answering its windows
 * (the update notice among them) while a large store updates. Resolves with the worker's outcome, or with why
 * the worker could not do it; the caller then opens the store as usual, which updates it there if still needed.
 */
export function updateInWorkerThread(job: ThreadUpdate): Promise<UpdateOutcome> {
  if (!existsSync(job.workerFile)) {
    return Promise.resolve({ ok: false, code: 'update-worker-missing', message: `${job.workerFile} is not built (npm run build)` });
  }
  return new Promise((resolve) => {
    let outcome: UpdateOutcome | undefined;
    let worker: Worker;
    try {
      worker = new Worker(job.workerFile, { workerData: { file: job.file, nativeBinding: job.nativeBinding } });
    } catch (e) {
      resolve({ ok: false, code: 'update-worker-failed', message: (e as Error).message });
      return;
    }
    worker.on('message', (message: UpdateOutcome) => { outcome = message; });
    worker.on('error', (e) => { outcome ??= { ok: false, code: 'update-worker-failed', message: e.message }; });
    // Settled on exit, once the worker's connection to the store is closed.
    worker.on('exit', (code) => resolve(outcome ?? { ok: false, code: 'update-worker-failed', message: `the worker stopped with code ${code}` }));
  });
}
