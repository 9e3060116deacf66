import Database from 'better-sqlite3';
import { StoreError } from './errors';
import { inspectStoreFile } from './inspect';
import { migrate } from './migrations';
import type { Store } from './store';
import { makeStore } from './store';

export interface OpenOptions {
  /** Milliseconds to wait for another connection's lock before giving up. */
  busyTimeout?: number;
  /** The clock writes are stamped with (tests pin it). */
  clock?: () => Date;
}

/** Connection settings that do not persist in the file, so they are set on every open. */
function configure(db: Database.Database): void {
  db.pragma('journal_mode = WAL');
  // Right after a switch to WAL the connection reports FULL; NORMAL is safe in WAL and much faster.
  db.pragma('synchronous = NORMAL');
  db.pragma('foreign_keys = ON');
  // 32 MB of page cache (the default is 2 MB) keeps the search indexes of a large shop in memory.
  db.pragma('cache_size = -32768');
}

/**
 * Opens (or creates) a job store. The file is inspected read-only first: anything that is not a
 * Coilwright store, is damaged, or comes from a newer version is refused with a StoreError and left
 * exactly as it was. Pending migrations then apply in one transaction.
 */
export function openStore(file: string, options: OpenOptions = {}): Store {
  inspectStoreFile(file);
  let db: Database.Database;
  try {
    db = new Database(file, { timeout: options.busyTimeout ?? 5000 });
  } catch (e) {
    throw new StoreError('store-unopenable', `${file} cannot be opened (${(e as Error).message})`);
  }
  try {
    configure(db);
    migrate(db);
  } catch (e) {
    db.close();
    if (e instanceof StoreError) throw e;
    throw new StoreError('store-unopenable', `${file} cannot be opened (${(e as Error).message})`);
  }
  return makeStore(db, file, options.clock ?? (() => new Date()));
}

/** openStore as a value: `{ ok: false, error }` instead of an exception. */
export function tryOpenStore(file: string, options: OpenOptions = {}):
  { ok: true; value: Store } | { ok: false; error: { code: string; message: string; path: string } } {
  try {
    return { ok: true, value: openStore(file, options) };
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}
