import type Database from 'better-sqlite3';

/**
 * `INSERT OR REPLACE` (and `REPLACE`) resolves a key conflict by deleting the row in the way, and SQLite
 * fires no delete trigger for that unless recursive triggers are on: an issued quote or a saved revision
 * could be swapped for a forged one. A BEFORE INSERT trigger sees the new row before any conflict is
 * resolved, so an insert that names a key already taken is refused whatever its conflict clause
 * (an upsert's DO UPDATE included).
 */
export function updateToVersion0006(db: Database.Database): void {
  db.exec(`
    CREATE TRIGGER quotes_refuse_replace BEFORE INSERT ON quotes
      WHEN EXISTS (SELECT 1 FROM quotes WHERE id = new.id OR number = new.number)
      BEGIN SELECT RAISE(ABORT, 'an issued quote cannot be replaced: issue a new quote instead'); END;
    CREATE TRIGGER job_revisions_refuse_replace BEFORE INSERT ON job_revisions
      WHEN EXISTS (SELECT 1 FROM job_revisions WHERE id = new.id OR (job_id = new.job_id AND revision = new.revision))
      BEGIN SELECT RAISE(ABORT, 'a saved job revision cannot be replaced: job revisions are history'); END;
  `);
}
