import Database from 'better-sqlite3';
import { StoreError } from './errors';

/** An open job store: the connection, its file, a statement cache and the clock writes are stamped with. */
export interface Store {
  readonly db: Database.Database;
  readonly file: string;
  /** Why nothing can be saved (the file or its folder is read-only); undefined when the store is writable. */
  readonly readOnly: string | undefined;
  /** A prepared statement, cached by its SQL text. */
  sql(text: string): Database.Statement;
  now(): Date;
  close(): void;
}

export function makeStore(db: Database.Database, file: string, clock: () => Date, readOnly?: string): Store {
  const cache = new Map<string, Database.Statement>();
  return {
    db,
    file,
    readOnly,
    sql(text) {
      let statement = cache.get(text);
      if (!statement) {
        statement = db.prepare(text);
        cache.set(text, statement);
      }
      return statement;
    },
    now: clock,
    close() {
      cache.clear();
      if (db.open) {
        // Best effort: on a full disk or a file made read-only meanwhile the statistics simply stay as they were.
        if (!readOnly) {
          try {
            db.pragma('optimize');
          } catch {
            /* closing must not fail */
          }
        }
        db.close();
      }
    },
  };
}

export function readOnlyError(store: Store, reason: string): StoreError {
  return new StoreError('store-read-only',
    `${store.file} is read-only (${reason}): nothing was saved. Lists, searches and prints still work; `
    + 'to save, make the file and its folder writable, or open a copy of the store');
}

/**
 * SQLite's write failures as answers a user can act on. The transaction has rolled back when they reach
 * here, so each says that nothing was saved.
 */
export function writeFailure(store: Store, e: unknown): unknown {
  if (!(e instanceof Database.SqliteError)) return e;
  if (e.code === 'SQLITE_FULL') {
    return new StoreError('disk-full', `the disk is full: nothing was saved. Free some space on the disk that holds ${store.file}, then save again`);
  }
  if (e.code.startsWith('SQLITE_READONLY')) return readOnlyError(store, e.message);
  if (e.code.startsWith('SQLITE_BUSY')) {
    return new StoreError('store-busy', `another program kept ${store.file} locked for writing too long: nothing was saved, try again`);
  }
  if (e.code.startsWith('SQLITE_IOERR')) {
    return new StoreError('store-write-failed', `${store.file} could not be written (${e.code}): nothing was saved`);
  }
  return e;
}

/** Runs fn in one transaction (a savepoint when already inside one): all of it is written, or none. */
export function inTransaction<T>(store: Store, fn: () => T): T {
  if (store.readOnly) throw readOnlyError(store, store.readOnly);
  try {
    return store.db.transaction(fn).immediate();
  } catch (e) {
    throw writeFailure(store, e);
  }
}
