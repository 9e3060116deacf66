import type Database from 'better-sqlite3';

/**
 * The job change notice goes out once per statement on PostgreSQL (db/pg/migrations/0021). SQLite has no
 * notice: another connection sees a change through PRAGMA data_version. The number exists so both backends
 * count the same versions.
 */
export function updateToVersion0021(db: Database.Database): void {
  void db;
}
