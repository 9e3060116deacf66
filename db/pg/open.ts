import { StoreError } from '../errors';
import { APPLICATION_ID, LATEST_VERSION } from '../migrations';
import type { Statement, Store } from '../store';
import { defaultAuthor } from '../store';
import { PgError, SyncConnection } from './connection';
import { pgMigrations } from './migrations';
import { pgStatement } from './statements';

/** A job store in a PostgreSQL database. */
export interface PgStore extends Store {
  readonly dialect: 'postgres';
  readonly connection: SyncConnection;
}

export interface PgOpenOptions {
  clock?: () => Date;
  /** Who saves through this store; the signed-in name, else COILWRIGHT_USER, else the database user. */
  author?: string;
}

export const isPostgresLocation = (location: string): boolean => /^postgres(ql)?:\/\//i.test(location);

/** host:port/database of a connection string: what the title bar shows. The user and password never appear. */
export function storeName(url: string): string {
  try {
    const u = new URL(url);
    const database = decodeURIComponent(u.pathname.replace(/^\//, '')) || '(default database)';
    return `${u.hostname || 'localhost'}${u.port ? `:${u.port}` : ''}/${database}`;
  } catch {
    return 'a PostgreSQL server (the connection string does not read)';
  }
}

/** Writers take turns on this lock (per database), as SQLite writers do on BEGIN IMMEDIATE. */
const WRITE_LOCK = APPLICATION_ID;

/** The table that marks a database as a Coilwright store and holds its schema version (SQLite: PRAGMAs). */
const MARK_TABLE = 'coilwright_store';

function tableNames(connection: SyncConnection): string[] {
  return connection.query(`SELECT table_name FROM information_schema.tables WHERE table_schema = current_schema()`, [])
    .rows.map((r) => String(r.table_name));
}

export function pgSchemaVersion(connection: SyncConnection): number {
  if (!tableNames(connection).includes(MARK_TABLE)) return 0;
  return Number(connection.query(`SELECT schema_version FROM ${MARK_TABLE}`, []).rows[0]?.schema_version ?? 0);
}

/**
 * Brings the database to `target` in one transaction under the write lock. A database that holds other
 * tables but no mark is not a store; one from a newer version is refused before anything is written.
 */
export function migratePg(connection: SyncConnection, name: string, target = LATEST_VERSION): { from: number; to: number } {
  connection.query('BEGIN', []);
  try {
    connection.query('SELECT pg_advisory_xact_lock($1)', [WRITE_LOCK]);
    const tables = tableNames(connection);
    if (!tables.includes(MARK_TABLE) && tables.length > 0) {
      throw new StoreError('not-a-store', `${name} holds tables but is not a Coilwright store: open an empty database instead`);
    }
    const from = pgSchemaVersion(connection);
    if (from > LATEST_VERSION) {
      throw new StoreError('store-too-new',
        `this store has schema version ${from}; this version of Coilwright knows up to ${LATEST_VERSION}: update Coilwright to open it`);
    }
    if (from === 0) {
      connection.query(`CREATE TABLE ${MARK_TABLE} (application_id bigint NOT NULL, schema_version bigint NOT NULL)`, []);
      connection.query(`INSERT INTO ${MARK_TABLE} VALUES ($1, 0)`, [APPLICATION_ID]);
    }
    for (const m of pgMigrations) {
      if (m.version <= from || m.version > target) continue;
      if (m.sql.trim() !== '') connection.query(m.sql, []);
      m.after?.(connection);
    }
    const to = Math.max(from, target);
    connection.query(`UPDATE ${MARK_TABLE} SET schema_version = $1`, [to]);
    connection.query('COMMIT', []);
    return { from, to };
  } catch (e) {
    connection.query('ROLLBACK', []);
    throw e;
  }
}

function transactions(connection: SyncConnection): <T>(fn: () => T) => T {
  let depth = 0;
  return (fn) => {
    const savepoint = `cw_${depth}`;
    connection.query(depth === 0 ? 'BEGIN' : `SAVEPOINT ${savepoint}`, []);
    if (depth === 0) connection.query('SELECT pg_advisory_xact_lock($1)', [WRITE_LOCK]);
    depth += 1;
    try {
      const out = fn();
      depth -= 1;
      connection.query(depth === 0 ? 'COMMIT' : `RELEASE SAVEPOINT ${savepoint}`, []);
      return out;
    } catch (e) {
      depth -= 1;
      try {
        connection.query(depth === 0 ? 'ROLLBACK' : `ROLLBACK TO SAVEPOINT ${savepoint}`, []);
      } catch {
        /* a lost connection has rolled back already */
      }
      throw e;
    }
  };
}

function connect(url: string, name: string): SyncConnection {
  try {
    return new SyncConnection(url);
  } catch (e) {
    throw new StoreError('store-unopenable', `${name} cannot be opened (${(e as Error).message})`);
  }
}

/** Opens (and creates or updates the schema of) a job store in a PostgreSQL database. */
export function openPgStore(url: string, options: PgOpenOptions = {}): PgStore {
  const name = storeName(url);
  const connection = connect(url, name);
  try {
    migratePg(connection, name);
    connection.query('LISTEN coilwright_jobs', []);
  } catch (e) {
    connection.close();
    if (e instanceof StoreError) throw e;
    throw new StoreError('store-unopenable', `${name} cannot be opened (${(e as Error).message})`);
  }
  const idTables = new Set(connection.query(`SELECT table_name FROM information_schema.columns
    WHERE table_schema = current_schema() AND column_name = 'id'`, []).rows.map((r) => String(r.table_name)));
  const author = options.author ?? (process.env.COILWRIGHT_USER?.trim()
    || String(connection.query('SELECT current_user AS u', []).rows[0]?.u ?? defaultAuthor()));
  const cache = new Map<string, Statement>();
  let notices = 0;
  return {
    dialect: 'postgres',
    connection,
    file: name,
    readOnly: undefined,
    author,
    sql(text) {
      let statement = cache.get(text);
      if (!statement) {
        statement = pgStatement(connection, text, idTables);
        cache.set(text, statement);
      }
      return statement;
    },
    transaction: transactions(connection),
    now: options.clock ?? (() => new Date()),
    changeMark: () => {
      notices += connection.takeNotifications().length;
      return `postgres:${notices}`;
    },
    close: () => connection.close(),
  };
}

export { PgError };
