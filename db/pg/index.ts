/** The job store in a PostgreSQL database: the same store functions (db/) over a synchronous connection. */
export { openPgStore, migratePg, pgSchemaVersion, isPostgresLocation, storeName } from './open';
export type { PgStore, PgOpenOptions } from './open';
export { PgError, SyncConnection } from './connection';
export { pgMigrations } from './migrations';
