import { searchWords } from '../../jobs/search-words';
import type { SyncConnection } from '../connection';

/**
 * PostgreSQL twin of 0014: archived jobs, copy links, deleted drafts kept for undo (revisions may be deleted
 * only while their job is being removed), job counts by archived state, and the spring's words in the text
 * index (a `spring` column, weighted with the customer).
 */
export const version0014 = `
  ALTER TABLE jobs ADD COLUMN archived_at text;
  ALTER TABLE jobs ADD COLUMN search_words text NOT NULL DEFAULT '';
  CREATE INDEX jobs_archived ON jobs (archived_at, id) WHERE archived_at IS NOT NULL;

  CREATE TABLE job_copies (
    copy_id bigint PRIMARY KEY REFERENCES jobs(id),
    source_id bigint NOT NULL REFERENCES jobs(id),
    copied_at text NOT NULL
  );
  CREATE INDEX job_copies_by_source ON job_copies (source_id);

  CREATE TABLE deleted_jobs (
    job_id bigint PRIMARY KEY,
    number text NOT NULL,
    deleted_at text NOT NULL,
    removing bigint NOT NULL DEFAULT 0 CHECK (removing IN (0, 1)),
    snapshot text NOT NULL CHECK (coilwright_json_valid(snapshot))
  );
  CREATE FUNCTION coilwright_keep_revisions() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF NOT EXISTS (SELECT 1 FROM deleted_jobs WHERE job_id = OLD.job_id AND removing = 1) THEN
      RAISE EXCEPTION 'job revisions are history: they cannot be deleted' USING ERRCODE = 'restrict_violation';
    END IF;
    RETURN OLD;
  END $$;
  DROP TRIGGER job_revisions_keep_delete ON job_revisions;
  CREATE TRIGGER job_revisions_keep_delete BEFORE DELETE ON job_revisions FOR EACH ROW EXECUTE FUNCTION coilwright_keep_revisions();

  DROP TRIGGER jobs_count_insert ON jobs;
  DROP TRIGGER jobs_count_delete ON jobs;
  DROP TRIGGER jobs_count_update ON jobs;
  DROP TABLE job_counts;
  CREATE TABLE job_counts (
    status text NOT NULL, kind text NOT NULL, material text NOT NULL, archived bigint NOT NULL CHECK (archived IN (0, 1)),
    n bigint NOT NULL CHECK (n >= 0),
    PRIMARY KEY (archived, status, kind, material)
  );
  INSERT INTO job_counts SELECT status, kind, material, (archived_at IS NOT NULL)::int, count(*) FROM jobs
    GROUP BY status, kind, material, archived_at IS NOT NULL;
  CREATE OR REPLACE FUNCTION coilwright_job_counts() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP <> 'INSERT' THEN
      UPDATE job_counts SET n = n - 1 WHERE status = OLD.status AND kind = OLD.kind AND material = OLD.material
        AND archived = (OLD.archived_at IS NOT NULL)::int;
    END IF;
    IF TG_OP <> 'DELETE' THEN
      INSERT INTO job_counts VALUES (NEW.status, NEW.kind, NEW.material, (NEW.archived_at IS NOT NULL)::int, 1)
        ON CONFLICT (archived, status, kind, material) DO UPDATE SET n = job_counts.n + 1;
    END IF;
    RETURN NULL;
  END $$;
  CREATE TRIGGER jobs_count_insert AFTER INSERT ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_counts();
  CREATE TRIGGER jobs_count_delete AFTER DELETE ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_counts();
  CREATE TRIGGER jobs_count_update AFTER UPDATE OF status, kind, material, archived_at ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_counts();

  DROP TRIGGER jobs_text_insert ON jobs;
  DROP TRIGGER jobs_text_update ON jobs;
  DROP TRIGGER jobs_text_delete ON jobs;
  DROP TABLE job_text;
  CREATE TABLE job_text (
    id bigint PRIMARY KEY,
    number text NOT NULL,
    customer text NOT NULL,
    part_number text NOT NULL,
    drawing_number text NOT NULL,
    notes text NOT NULL,
    spring text NOT NULL,
    document tsvector GENERATED ALWAYS AS (
      setweight(to_tsvector('simple', regexp_replace(number, '[^[:alnum:]]+', ' ', 'g')), 'A')
      || setweight(to_tsvector('simple', regexp_replace(part_number, '[^[:alnum:]]+', ' ', 'g')), 'A')
      || setweight(to_tsvector('simple', regexp_replace(drawing_number, '[^[:alnum:]]+', ' ', 'g')), 'B')
      || setweight(to_tsvector('simple', regexp_replace(customer, '[^[:alnum:]]+', ' ', 'g')), 'C')
      || setweight(to_tsvector('simple', regexp_replace(spring, '[^[:alnum:]]+', ' ', 'g')), 'C')
      || setweight(to_tsvector('simple', regexp_replace(notes, '[^[:alnum:]]+', ' ', 'g')), 'D')) STORED
  );
  CREATE INDEX job_text_search ON job_text USING gin (document);
  CREATE OR REPLACE FUNCTION coilwright_job_text() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP <> 'INSERT' THEN DELETE FROM job_text WHERE id = OLD.id; END IF;
    IF TG_OP <> 'DELETE' THEN
      INSERT INTO job_text (id, number, customer, part_number, drawing_number, notes, spring)
      VALUES (NEW.id, NEW.number, coalesce((SELECT name FROM customers WHERE id = NEW.customer_id), ''),
              NEW.part_number, NEW.drawing_number, NEW.notes || ' ' || coalesce(NEW.spec::jsonb ->> 'notes', ''), NEW.search_words);
    END IF;
    RETURN NULL;
  END $$;
  CREATE TRIGGER jobs_text_insert AFTER INSERT ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_text();
  CREATE TRIGGER jobs_text_update AFTER UPDATE OF number, customer_id, part_number, drawing_number, notes, spec, search_words ON jobs
    FOR EACH ROW EXECUTE FUNCTION coilwright_job_text();
  CREATE TRIGGER jobs_text_delete AFTER DELETE ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_text();
`;

/** The words of the jobs already in the store, from their stored specs (the same function SQLite's step calls). */
export function fillSearchWords0014(c: SyncConnection): void {
  const rows = c.query('SELECT id, spec, units, mean_diameter + d AS od FROM jobs', []).rows;
  for (const r of rows) {
    let parsed: unknown = null;
    try {
      parsed = JSON.parse(String(r.spec));
    } catch {
      parsed = null;
    }
    const words = searchWords(parsed, { units: r.units === 'inch' ? 'inch' : 'metric', outerDiameter: Number(r.od) });
    c.query('UPDATE jobs SET search_words = $1 WHERE id = $2', [words, r.id]);
  }
}
