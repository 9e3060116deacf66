import type Database from 'better-sqlite3';

/**
 * Which desk holds a job's open working copy and who is typing there: the desk (one job editor of one program)
 * that autosaved first owns the session until it closes, and another desk's autosave is refused naming the
 * owner instead of writing over the working copy. Sessions open before this version read '' (not recorded).
 */
export function updateToVersion0017(db: Database.Database): void {
  db.exec(`
    ALTER TABLE job_working_revisions ADD COLUMN desk TEXT NOT NULL DEFAULT '';
    ALTER TABLE job_working_revisions ADD COLUMN made_by TEXT NOT NULL DEFAULT '';
  `);
}
