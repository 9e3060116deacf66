/**
 * The store-update worker's entry (dist/electron/store-update-worker.cjs): updates the store file named in
 * `workerData.file` and posts how it went. It imports nothing from Electron: a worker thread has no `app`.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { updateStoreFile } from '../../service/host/store-update';

const { file } = workerData as { file: string };
parentPort?.postMessage(updateStoreFile(file));
