import type Database from 'better-sqlite3';

/**
 * Issued quotes: immutable snapshots. The job, spec, shop settings, prices, quantity breaks and the inputs
 * of the printed document are copied in at issue, so a later change to any of them leaves the quote as
 * the customer received it. The triggers refuse UPDATE and DELETE; a correction is a new quote.
 */
export function updateToVersion0003(db: Database.Database): void {
  db.exec(`
    CREATE TABLE quotes (
      id INTEGER PRIMARY KEY,
      number TEXT NOT NULL UNIQUE,
      job_id INTEGER NOT NULL REFERENCES jobs(id),
      job_revision INTEGER NOT NULL,
      issued_at TEXT NOT NULL,
      validity_days INTEGER NOT NULL CHECK (validity_days > 0),
      currency TEXT NOT NULL,
      job TEXT NOT NULL CHECK (json_valid(job)),
      spec TEXT NOT NULL CHECK (json_valid(spec)),
      settings TEXT NOT NULL CHECK (json_valid(settings)),
      prices TEXT NOT NULL CHECK (json_valid(prices)),
      quantity_breaks TEXT NOT NULL CHECK (json_valid(quantity_breaks)),
      document TEXT NOT NULL CHECK (json_valid(document))
    ) STRICT;
    CREATE INDEX quotes_by_job ON quotes (job_id, issued_at);
    CREATE INDEX quotes_by_issued ON quotes (issued_at);
    CREATE TRIGGER quotes_refuse_update BEFORE UPDATE ON quotes
      BEGIN SELECT RAISE(ABORT, 'an issued quote cannot be changed: issue a new quote instead'); END;
    CREATE TRIGGER quotes_refuse_delete BEFORE DELETE ON quotes
      BEGIN SELECT RAISE(ABORT, 'an issued quote cannot be deleted'); END;
  `);
}
