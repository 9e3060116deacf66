import type Database from 'better-sqlite3';

/**
 * The customer's requirement a job's spec was designed from, one row per adoption: the job revision the
 * design became, and the requirement as given, so the search can be run again when stock or prices change.
 */
export function updateToVersion0008(db: Database.Database): void {
  db.exec(`
    CREATE TABLE job_requirements (
      id INTEGER PRIMARY KEY,
      job_id INTEGER NOT NULL REFERENCES jobs(id),
      job_revision INTEGER NOT NULL CHECK (job_revision >= 1),
      saved_at TEXT NOT NULL,
      requirement TEXT NOT NULL CHECK (json_valid(requirement)),
      UNIQUE (job_id, job_revision)
    ) STRICT;
    CREATE TRIGGER job_requirements_keep_update BEFORE UPDATE ON job_requirements
      BEGIN SELECT RAISE(ABORT, 'a stored requirement is history: it cannot be changed'); END;
  `);
}
