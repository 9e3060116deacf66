import type Database from 'better-sqlite3';

/**
 * A quotation holds one or several jobs of one customer as its lines. `quote_lines` keeps, for every line,
 * the job as it stood, its spec, its prices and its quantity breaks; the quotation's number, date, validity,
 * shop settings, document and decision stay on `quotes`, which keeps its first line in its own columns as
 * it always has. Every quote already issued gets its one line here, so a job's quote history is one read of
 * `quote_lines_by_job`. Lines are as immutable as the quote: no update, delete or replace, and
 * `quotes.line_count`, written with the quote, closes it to lines added later.
 */
export function updateToVersion0010(db: Database.Database): void {
  db.exec(`
    ALTER TABLE quotes ADD COLUMN line_count INTEGER NOT NULL DEFAULT 1 CHECK (line_count >= 1);

    CREATE TABLE quote_lines (
      quote_id INTEGER NOT NULL REFERENCES quotes(id),
      line INTEGER NOT NULL CHECK (line >= 1),
      job_id INTEGER NOT NULL REFERENCES jobs(id),
      job_revision INTEGER NOT NULL,
      job TEXT NOT NULL CHECK (json_valid(job)),
      spec TEXT NOT NULL CHECK (json_valid(spec)),
      prices TEXT NOT NULL CHECK (json_valid(prices)),
      quantity_breaks TEXT NOT NULL CHECK (json_valid(quantity_breaks)),
      PRIMARY KEY (quote_id, line),
      UNIQUE (quote_id, job_id)
    ) STRICT, WITHOUT ROWID;
    CREATE INDEX quote_lines_by_job ON quote_lines (job_id, quote_id);

    INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks)
      SELECT id, 1, job_id, job_revision, job, spec, prices, quantity_breaks FROM quotes;

    CREATE TRIGGER quote_lines_refuse_update BEFORE UPDATE ON quote_lines
      BEGIN SELECT RAISE(ABORT, 'a line of an issued quote cannot be changed: issue a new quote instead'); END;
    CREATE TRIGGER quote_lines_refuse_delete BEFORE DELETE ON quote_lines
      BEGIN SELECT RAISE(ABORT, 'a line of an issued quote cannot be deleted'); END;
    CREATE TRIGGER quote_lines_refuse_replace BEFORE INSERT ON quote_lines
      WHEN EXISTS (SELECT 1 FROM quote_lines WHERE quote_id = new.quote_id AND (line = new.line OR job_id = new.job_id))
      BEGIN SELECT RAISE(ABORT, 'a line of an issued quote cannot be replaced: issue a new quote instead'); END;
    CREATE TRIGGER quote_lines_within_quote BEFORE INSERT ON quote_lines
      WHEN new.line > coalesce((SELECT line_count FROM quotes WHERE id = new.quote_id), 0)
      BEGIN SELECT RAISE(ABORT, 'an issued quote has the lines it was issued with: issue a new quote to add one'); END;
  `);
}
