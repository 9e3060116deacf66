import type Database from 'better-sqlite3';

/**
 * Enquiries: a customer's request for several springs at once (a request sheet), kept with the customer's
 * own reference; `enquiry_jobs` ties each draft job to the enquiry and the sheet row it came from, so the
 * jobs can be quoted together. `request_mappings` keeps, per customer, which column of their sheets is
 * which field, to be proposed again next time.
 */
export function updateToVersion0012(db: Database.Database): void {
  db.exec(`
    CREATE TABLE enquiries (
      id INTEGER PRIMARY KEY,
      customer_id INTEGER NOT NULL REFERENCES customers(id),
      reference TEXT NOT NULL CHECK (length(trim(reference)) > 0),
      source TEXT NOT NULL DEFAULT '',
      received_at TEXT NOT NULL
    ) STRICT;
    CREATE INDEX enquiries_by_customer ON enquiries (customer_id, received_at);
    CREATE TABLE enquiry_jobs (
      enquiry_id INTEGER NOT NULL REFERENCES enquiries(id),
      job_id INTEGER NOT NULL UNIQUE REFERENCES jobs(id),
      sheet_row INTEGER NOT NULL CHECK (sheet_row >= 1),
      PRIMARY KEY (enquiry_id, job_id)
    ) STRICT, WITHOUT ROWID;
    CREATE TABLE request_mappings (
      customer_id INTEGER PRIMARY KEY REFERENCES customers(id),
      mapping TEXT NOT NULL CHECK (json_valid(mapping)),
      saved_at TEXT NOT NULL
    ) STRICT;
  `);
}
