import type Database from 'better-sqlite3';

/**
 * The open working revision of a job: autosaves of one working session write the job's current state in
 * place and mark it here, and the session's end (a deliberate save, a drawing revision, an issue, leaving
 * the job) writes it once as a permanent revision and removes this row. Revisions stay immutable.
 */
export function updateToVersion0013(db: Database.Database): void {
  db.exec(`
    CREATE TABLE job_working_revisions (
      job_id INTEGER PRIMARY KEY REFERENCES jobs(id) ON DELETE CASCADE,
      base_revision INTEGER NOT NULL CHECK (base_revision >= 1),
      opened_at TEXT NOT NULL,
      saved_at TEXT NOT NULL,
      saves INTEGER NOT NULL DEFAULT 1 CHECK (saves >= 1)
    ) STRICT;
  `);
}
