import Database from 'better-sqlite3';
import { userInfo } from 'node:os';
import { DamageCheck } from './damage-check';
import { StoreError } from './errors';

/** One SQL statement of either backend: `?` placeholders, rows as plain objects. */
export interface Statement {
  get(...params: unknown[]): unknown;
  all(...params: unknown[]): unknown[];
  run(...params: unknown[]): { changes: number; lastInsertRowid: number | bigint };
}

/**
 * An open job store, whichever database holds it: every store function (db/) works through this alone.
 * SQLite (a file, better-sqlite3) is the default; PostgreSQL (db/pg) answers the same SQL through the same
 * calls. SQL written here is portable: `?` placeholders, no rowid, quoted camelCase aliases; a statement that
 * cannot be portable branches on `dialect` (see DEVELOPERS.md, "Give a store function its PostgreSQL side").
 */
export interface Store {
  readonly dialect: 'sqlite' | 'postgres';
  /** What the title bar and messages name: the file, or host/database of a server (never a password). */
  readonly file: string;
  /** Why nothing can be saved (the file or its folder is read-only); undefined when the store is writable. */
  readonly readOnly: string | undefined;
  /** Who the revisions, quotes and records saved through this store are by (migration 0015). */
  author: string;
  /** A prepared statement, cached by its SQL text. */
  sql(text: string): Statement;
  /** Runs fn as one write transaction (a savepoint inside one); writers take turns, as with BEGIN IMMEDIATE. */
  transaction<T>(fn: () => T): T;
  now(): Date;
  /**
   * A mark that moves when another connection commits a change, so an open job list knows to read again
   * without querying the jobs: SQLite's PRAGMA data_version; on PostgreSQL, the count of change notices
   * (LISTEN coilwright_jobs, migration 0015) received so far.
   */
  changeMark(): string;
  close(): void;
}

/** A store in a SQLite file: backup, restore and the damage checks reach the connection itself. */
export interface SqliteStore extends Store {
  readonly dialect: 'sqlite';
  readonly db: Database.Database;
  /** The file's damage check: passed before opening, or running, waiting or done after it (db/damage-check.ts). */
  readonly damageCheck: DamageCheck;
  sql(text: string): Database.Statement;
}

export const isSqliteStore = (store: Store): store is SqliteStore => store.dialect === 'sqlite';

/** The signed-in name, else the operating-system account: who a save is by when nobody signed in. */
export function defaultAuthor(): string {
  const named = process.env.COILWRIGHT_USER?.trim();
  if (named) return named;
  try {
    return userInfo().username;
  } catch {
    return '';
  }
}

export function makeStore(db: Database.Database, file: string, clock: () => Date, readOnlyFile?: string, author = defaultAuthor(),
  damageCheck = DamageCheck.notChecked(file, clock, 'not asked for')): SqliteStore {
  const cache = new Map<string, Database.Statement>();
  return {
    dialect: 'sqlite',
    db,
    file,
    // A check that finds damage after opening makes the store read-only for as long as it stays open.
    get readOnly() {
      return readOnlyFile ?? damageCheck.damage();
    },
    damageCheck,
    author,
    transaction: (fn) => db.transaction(fn).immediate(),
    changeMark: () => `sqlite:${String(db.pragma('data_version', { simple: true }))}`,
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
      damageCheck.close();
      if (db.open) {
        // Best effort: on a full disk or a file made read-only meanwhile the statistics simply stay as they were.
        if (!(readOnlyFile ?? damageCheck.damage())) {
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
  if (!(e instanceof Database.SqliteError)) return e instanceof StoreError ? e : translatedFailure(store, e);
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

/**
 * Why a save is refused now, or undefined: damage found by the store's check (its own answer), a read-only
 * file or folder, or damage found by a check that waited for the first save and runs now.
 */
export function writeRefusal(store: Store): StoreError | undefined {
  const damaged = isSqliteStore(store) ? store.damageCheck.refusal() : undefined;
  if (damaged) return damaged;
  if (store.readOnly) return readOnlyError(store, store.readOnly);
  return isSqliteStore(store) ? store.damageCheck.beforeSave() : undefined;
}

/** Runs fn in one transaction (a savepoint when already inside one): all of it is written, or none. */
export function inTransaction<T>(store: Store, fn: () => T): T {
  const refused = writeRefusal(store);
  if (refused) throw refused;
  try {
    return store.transaction(fn);
  } catch (e) {
    throw writeFailure(store, e);
  }
}

/** A PostgreSQL connection lost mid-write: the server rolled the transaction back. */
function translatedFailure(store: Store, e: unknown): unknown {
  const code = (e as { sqlState?: string }).sqlState;
  if (store.dialect !== 'postgres' || code === undefined) return e;
  if (code.startsWith('08') || code === '57P01') {
    return new StoreError('store-unreachable', `the connection to ${store.file} was lost: nothing was saved, try again`);
  }
  if (code === '53100') return new StoreError('disk-full', `the server of ${store.file} has no disk space left: nothing was saved`);
  return e;
}
