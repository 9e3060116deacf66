/**
 * better-sqlite3 as the store-update worker's bundle sees it (scripts/build.mjs points the worker's imports here).
 * A worker thread cannot ask Electron's `app` where the Electron-ABI build is, so the main process works it out
 * (chooseSqliteBinding) and hands it over as `workerData.nativeBinding`.
 */
import Database from 'better-sqlite3';
import { workerData } from 'node:worker_threads';

const handedOver = (): string | undefined => (workerData as { nativeBinding?: string } | null)?.nativeBinding;

function WorkerDatabase(filename?: string | Buffer, options: Database.Options = {}): Database.Database {
  const nativeBinding = options.nativeBinding ?? handedOver();
  return new Database(filename, nativeBinding === undefined ? options : { ...options, nativeBinding });
}
WorkerDatabase.prototype = Database.prototype;
WorkerDatabase.SqliteError = Database.SqliteError;

export default WorkerDatabase as unknown as typeof Database;
