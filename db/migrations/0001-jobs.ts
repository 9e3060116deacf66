import type Database from 'better-sqlite3';

/**
 * Customers, jobs with their revisions, settings and attachments. Numeric shape columns are in internal
 * units (mm, N/mm) whatever the spec's unit system, so searches compare like with like.
 */
export function updateToVersion0001(db: Database.Database): void {
  db.exec(`
    CREATE TABLE customers (
      id INTEGER PRIMARY KEY,
      name TEXT NOT NULL CHECK (length(trim(name)) > 0),
      name_key TEXT NOT NULL UNIQUE,
      email TEXT NOT NULL DEFAULT '',
      phone TEXT NOT NULL DEFAULT '',
      notes TEXT NOT NULL DEFAULT '',
      created_at TEXT NOT NULL,
      updated_at TEXT NOT NULL
    ) STRICT;

    CREATE TABLE jobs (
      id INTEGER PRIMARY KEY,
      number TEXT NOT NULL UNIQUE,
      customer_id INTEGER REFERENCES customers(id),
      part_number TEXT NOT NULL DEFAULT '',
      drawing_number TEXT NOT NULL DEFAULT '',
      drawing_revision TEXT NOT NULL DEFAULT '',
      status TEXT NOT NULL CHECK (status IN ('draft', 'quoted', 'ordered', 'in-production', 'done', 'lost')),
      spec TEXT NOT NULL CHECK (json_valid(spec)),
      notes TEXT NOT NULL DEFAULT '',
      due_date TEXT,
      order_quantity INTEGER CHECK (order_quantity > 0),
      lead_time_days INTEGER CHECK (lead_time_days >= 0),
      revision INTEGER NOT NULL CHECK (revision >= 1),
      created_at TEXT NOT NULL,
      updated_at TEXT NOT NULL,
      kind TEXT NOT NULL,
      material TEXT NOT NULL,
      material_family TEXT NOT NULL,
      units TEXT NOT NULL CHECK (units IN ('metric', 'inch')),
      d REAL NOT NULL CHECK (d > 0),
      mean_diameter REAL NOT NULL CHECK (mean_diameter > 0),
      free_length REAL NOT NULL CHECK (free_length > 0),
      active_coils REAL NOT NULL CHECK (active_coils > 0),
      rate REAL NOT NULL CHECK (rate > 0)
    ) STRICT;
    CREATE INDEX jobs_by_status ON jobs (status, updated_at);
    CREATE INDEX jobs_by_customer ON jobs (customer_id, updated_at);
    CREATE INDEX jobs_by_updated ON jobs (updated_at);
    CREATE INDEX jobs_by_kind_d ON jobs (kind, d);
    CREATE INDEX jobs_by_material ON jobs (material, updated_at);

    CREATE TABLE job_revisions (
      id INTEGER PRIMARY KEY,
      job_id INTEGER NOT NULL REFERENCES jobs(id),
      revision INTEGER NOT NULL CHECK (revision >= 1),
      saved_at TEXT NOT NULL,
      reason TEXT NOT NULL,
      fields TEXT NOT NULL CHECK (json_valid(fields)),
      spec TEXT NOT NULL CHECK (json_valid(spec)),
      UNIQUE (job_id, revision)
    ) STRICT;
    CREATE TRIGGER job_revisions_keep_update BEFORE UPDATE ON job_revisions
      BEGIN SELECT RAISE(ABORT, 'job revisions are history: they cannot be changed'); END;
    CREATE TRIGGER job_revisions_keep_delete BEFORE DELETE ON job_revisions
      BEGIN SELECT RAISE(ABORT, 'job revisions are history: they cannot be deleted'); END;

    CREATE TABLE settings (
      key TEXT PRIMARY KEY,
      value TEXT NOT NULL CHECK (json_valid(value)),
      updated_at TEXT NOT NULL
    ) STRICT, WITHOUT ROWID;

    CREATE TABLE attachments (
      id INTEGER PRIMARY KEY,
      job_id INTEGER NOT NULL REFERENCES jobs(id),
      name TEXT NOT NULL CHECK (length(name) > 0),
      mime_type TEXT NOT NULL,
      size INTEGER NOT NULL,
      sha256 TEXT NOT NULL CHECK (length(sha256) = 64),
      data BLOB NOT NULL,
      added_at TEXT NOT NULL,
      CHECK (size = length(data))
    ) STRICT;
    CREATE INDEX attachments_by_job ON attachments (job_id);
  `);
}
