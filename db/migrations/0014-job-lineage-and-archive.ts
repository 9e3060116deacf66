import type Database from 'better-sqlite3';
import { searchWords } from '../jobs/search-words';

const TEXT_VALUES = `new.id, new.number, coalesce((SELECT name FROM customers WHERE id = new.customer_id), ''),
  new.part_number, new.drawing_number, new.notes || ' ' || coalesce(json_extract(new.spec, '$.notes'), ''), new.search_words`;

/**
 * Jobs made from past jobs, archived jobs, deleted drafts that can come back, and a text index that knows
 * the spring:
 * - jobs.archived_at: an archived job leaves the default list (which skips it on the list indexes it
 *   already reads) and is listed on its own through jobs_archived; search still finds it. job_counts gains
 *   an archived column, so the list's totals stay sums over the kept counts.
 * - job_copies: which job a job was made from (both jobs show the link).
 * - deleted_jobs: a deleted draft as it was (row, revisions, attachments, links), so the deletion can be
 *   undone. While `removing` is set for a job its revisions may be deleted; at no other time.
 * - jobs.search_words and the job_text column `spring`: grade names and dimensions by value, so "music
 *   wire" and "1.6" find jobs. Existing jobs get their words here; saves write them from then on.
 */
export function updateToVersion0014(db: Database.Database): void {
  db.exec(`
    DROP TRIGGER jobs_text_insert;
    DROP TRIGGER jobs_text_update;
    DROP TRIGGER jobs_text_delete;
    DROP TRIGGER customers_text_rename;
    DROP TABLE job_text;
    ALTER TABLE jobs ADD COLUMN archived_at TEXT;
    ALTER TABLE jobs ADD COLUMN search_words TEXT NOT NULL DEFAULT '';
    CREATE INDEX jobs_archived ON jobs (archived_at, id) WHERE archived_at IS NOT NULL;

    CREATE TABLE job_copies (
      copy_id INTEGER PRIMARY KEY REFERENCES jobs(id),
      source_id INTEGER NOT NULL REFERENCES jobs(id),
      copied_at TEXT NOT NULL
    ) STRICT;
    CREATE INDEX job_copies_by_source ON job_copies (source_id);

    CREATE TABLE deleted_jobs (
      job_id INTEGER PRIMARY KEY,
      number TEXT NOT NULL,
      deleted_at TEXT NOT NULL,
      removing INTEGER NOT NULL DEFAULT 0 CHECK (removing IN (0, 1)),
      snapshot TEXT NOT NULL CHECK (json_valid(snapshot))
    ) STRICT;
    DROP TRIGGER job_revisions_keep_delete;
    CREATE TRIGGER job_revisions_keep_delete BEFORE DELETE ON job_revisions
      WHEN NOT EXISTS (SELECT 1 FROM deleted_jobs WHERE job_id = old.job_id AND removing = 1)
      BEGIN SELECT RAISE(ABORT, 'job revisions are history: they cannot be deleted'); END;

    DROP TRIGGER jobs_count_insert;
    DROP TRIGGER jobs_count_delete;
    DROP TRIGGER jobs_count_update;
    DROP TABLE job_counts;
    CREATE TABLE job_counts (
      status TEXT NOT NULL, kind TEXT NOT NULL, material TEXT NOT NULL, archived INTEGER NOT NULL CHECK (archived IN (0, 1)),
      n INTEGER NOT NULL CHECK (n >= 0),
      PRIMARY KEY (archived, status, kind, material)
    ) WITHOUT ROWID, STRICT;
    INSERT INTO job_counts SELECT status, kind, material, archived_at IS NOT NULL, count(*) FROM jobs
      GROUP BY status, kind, material, archived_at IS NOT NULL;
    CREATE TRIGGER jobs_count_insert AFTER INSERT ON jobs BEGIN
      INSERT INTO job_counts VALUES (new.status, new.kind, new.material, new.archived_at IS NOT NULL, 1)
        ON CONFLICT (archived, status, kind, material) DO UPDATE SET n = n + 1;
    END;
    CREATE TRIGGER jobs_count_delete AFTER DELETE ON jobs BEGIN
      UPDATE job_counts SET n = n - 1 WHERE status = old.status AND kind = old.kind AND material = old.material
        AND archived = (old.archived_at IS NOT NULL);
    END;
    CREATE TRIGGER jobs_count_update AFTER UPDATE OF status, kind, material, archived_at ON jobs BEGIN
      UPDATE job_counts SET n = n - 1 WHERE status = old.status AND kind = old.kind AND material = old.material
        AND archived = (old.archived_at IS NOT NULL);
      INSERT INTO job_counts VALUES (new.status, new.kind, new.material, new.archived_at IS NOT NULL, 1)
        ON CONFLICT (archived, status, kind, material) DO UPDATE SET n = n + 1;
    END;

  `);
  // The words first, then the text index filled in one pass: no trigger rewrites each job row by row.
  fillSearchWords(db);
  db.exec(`
    CREATE VIRTUAL TABLE job_text USING fts5(
      number, customer, part_number, drawing_number, notes, spring,
      tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3'
    );
    INSERT INTO job_text (job_text, rank) VALUES ('rank', 'bm25(6.0, 3.0, 5.0, 4.0, 1.0, 2.0)');
    CREATE TRIGGER jobs_text_insert AFTER INSERT ON jobs BEGIN
      INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes, spring) VALUES (${TEXT_VALUES});
    END;
    CREATE TRIGGER jobs_text_update AFTER UPDATE OF number, customer_id, part_number, drawing_number, notes, spec, search_words ON jobs BEGIN
      DELETE FROM job_text WHERE rowid = old.id;
      INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes, spring) VALUES (${TEXT_VALUES});
    END;
    CREATE TRIGGER jobs_text_delete AFTER DELETE ON jobs BEGIN
      DELETE FROM job_text WHERE rowid = old.id;
    END;
    CREATE TRIGGER customers_text_rename AFTER UPDATE OF name ON customers BEGIN
      UPDATE job_text SET customer = new.name WHERE rowid IN (SELECT id FROM jobs WHERE customer_id = new.id);
    END;
    INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes, spring)
      SELECT j.id, j.number, coalesce(c.name, ''), j.part_number, j.drawing_number,
             j.notes || ' ' || coalesce(json_extract(j.spec, '$.notes'), ''), j.search_words
      FROM jobs j LEFT JOIN customers c ON c.id = j.customer_id;
  `);
}

/** Words for the jobs already in the store, from their stored specs. */
function fillSearchWords(db: Database.Database): void {
  db.function('coilwright_search_words', { deterministic: true }, (spec: unknown, units: unknown, od: unknown) => {
    const system = units === 'inch' ? 'inch' : 'metric';
    let parsed: unknown = null;
    try {
      parsed = JSON.parse(String(spec));
    } catch {
      parsed = null;
    }
    return searchWords(parsed, { units: system, outerDiameter: Number(od) });
  });
  db.exec('UPDATE jobs SET search_words = coilwright_search_words(spec, units, mean_diameter + d)');
}
