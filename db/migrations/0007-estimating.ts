import type Database from 'better-sqlite3';

/**
 * What an estimate rests on. `settings_versions` keeps every saved state of the shop settings (history: never
 * changed or deleted), so a saved job's price can be worked again with the settings it was last accepted
 * under and compared with today's. `job_cost_acceptance` records the version an estimator accepted for a job;
 * without a row, the version in force when the job was last saved is the one accepted. An issued quote keeps
 * the estimator's decision on open problems (the reason and each problem accepted) in `decision`. A job keeps
 * the estimator's routing and price overrides in `judgement` (revisions keep it in their fields).
 */
export function updateToVersion0007(db: Database.Database): void {
  db.exec(`
    CREATE TABLE settings_versions (
      id INTEGER PRIMARY KEY,
      saved_at TEXT NOT NULL,
      settings TEXT NOT NULL CHECK (json_valid(settings))
    ) STRICT;
    CREATE INDEX settings_versions_by_time ON settings_versions (saved_at);
    CREATE TRIGGER settings_versions_keep_update BEFORE UPDATE ON settings_versions
      BEGIN SELECT RAISE(ABORT, 'settings versions are history: they cannot be changed'); END;
    CREATE TRIGGER settings_versions_keep_delete BEFORE DELETE ON settings_versions
      BEGIN SELECT RAISE(ABORT, 'settings versions are history: they cannot be deleted'); END;

    INSERT INTO settings_versions (saved_at, settings)
      SELECT strftime('%Y-%m-%dT%H:%M:%fZ', 'now'), json_group_object(key, json(value)) FROM settings HAVING count(*) > 0;

    CREATE TABLE job_cost_acceptance (
      job_id INTEGER PRIMARY KEY REFERENCES jobs(id),
      settings_version INTEGER NOT NULL REFERENCES settings_versions(id),
      accepted_at TEXT NOT NULL
    ) STRICT;

    ALTER TABLE quotes ADD COLUMN decision TEXT CHECK (decision IS NULL OR json_valid(decision));

    ALTER TABLE jobs ADD COLUMN judgement TEXT NOT NULL DEFAULT '{}' CHECK (json_valid(judgement));
  `);
}
