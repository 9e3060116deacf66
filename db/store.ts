import type Database from 'better-sqlite3';

/** An open job store: the connection, its file, a statement cache and the clock writes are stamped with. */
export interface Store {
  readonly db: Database.Database;
  readonly file: string;
  /** A prepared statement, cached by its SQL text. */
  sql(text: string): Database.Statement;
  now(): Date;
  close(): void;
}

export function makeStore(db: Database.Database, file: string, clock: () => Date): Store {
  const cache = new Map<string, Database.Statement>();
  return {
    db,
    file,
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
        db.pragma('optimize');
        db.close();
      }
    },
  };
}

/** Runs fn in one transaction (a savepoint when already inside one): all of it is written, or none. */
export function inTransaction<T>(store: Store, fn: () => T): T {
  return store.db.transaction(fn).immediate();
}
