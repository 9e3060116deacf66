import type Database from 'better-sqlite3';

/**
 * First-off records: what the setter coiled and the inspector measured on a job's first pieces. Values
 * are kept in the unit system they were entered in (the job's), as the gauge read them; the record names
 * the job revision whose spec the pieces were made to. A record is a measurement: it is never changed.
 */
export function updateToVersion0004(db: Database.Database): void {
  db.exec(`
    CREATE TABLE first_off_records (
      id INTEGER PRIMARY KEY,
      job_id INTEGER NOT NULL REFERENCES jobs(id),
      job_revision INTEGER NOT NULL CHECK (job_revision >= 1),
      units TEXT NOT NULL CHECK (units IN ('metric', 'inch')),
      coiled_free_length REAL NOT NULL CHECK (coiled_free_length > 0),
      free_length_after_set REAL NOT NULL CHECK (free_length_after_set > 0 AND free_length_after_set <= coiled_free_length),
      outer_diameter REAL NOT NULL CHECK (outer_diameter > 0),
      forces TEXT NOT NULL CHECK (json_valid(forces) AND json_type(forces) = 'array'),
      measured_on TEXT NOT NULL CHECK (measured_on GLOB '[0-9][0-9][0-9][0-9]-[0-9][0-9]-[0-9][0-9]'),
      measured_by TEXT NOT NULL CHECK (length(trim(measured_by)) > 0),
      notes TEXT NOT NULL DEFAULT '',
      recorded_at TEXT NOT NULL,
      FOREIGN KEY (job_id, job_revision) REFERENCES job_revisions (job_id, revision)
    ) STRICT;
    CREATE INDEX first_off_by_job ON first_off_records (job_id, measured_on);
    CREATE TRIGGER first_off_keep_update BEFORE UPDATE ON first_off_records
      BEGIN SELECT RAISE(ABORT, 'a first-off record is a measurement: it cannot be changed; enter a new record'); END;
  `);
}
