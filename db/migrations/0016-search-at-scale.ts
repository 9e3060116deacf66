import type Database from 'better-sqlite3';

/**
 * Search at scale. Nothing changes on SQLite: its search structures (FTS5 with prefix indexes, one R*Tree per
 * kind, migrations 0002 and 0009) already answer within their targets at 100 000 jobs. The number exists so
 * both backends count the same versions: PostgreSQL's twin (db/pg/migrations/0016) replaces its shape
 * index with one per kind in four dimensions and writes the counts and text rows of new jobs per statement.
 */
export function updateToVersion0016(db: Database.Database): void {
  void db;
}
