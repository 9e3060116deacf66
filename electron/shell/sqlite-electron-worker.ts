/**
 * better-sqlite3 as the store-update worker's bundle sees it (scripts/build.mjs points the worker's imports here).
 * A worker thread cannot ask Electron's `app` where the Electron-ABI build is, so the main process works it out
 * (chooseSqliteBinding) and hands it over as `workerData.nativeBinding`.
 */
import { workerData } from 'node:worker_threads';
import { databaseWithBinding } from './sqlite-with-binding';

export default databaseWithBinding(() => (workerData as { nativeBinding?: string } | null)?.nativeBinding);
