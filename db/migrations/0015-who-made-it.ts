import type Database from 'better-sqlite3';

/**
 * Who made each revision, issued quote and first-off record: the name the estimator signed in with, else the
 * database user (PostgreSQL) or the computer's account (SQLite). Rows from before this version read ''
 * ("not recorded"). A first-off record already names who measured; made_by is who entered it.
 */
export function updateToVersion0015(db: Database.Database): void {
  db.exec(`
    ALTER TABLE job_revisions ADD COLUMN made_by TEXT NOT NULL DEFAULT '';
    ALTER TABLE quotes ADD COLUMN made_by TEXT NOT NULL DEFAULT '';
    ALTER TABLE first_off_records ADD COLUMN made_by TEXT NOT NULL DEFAULT '';
  `);
}
