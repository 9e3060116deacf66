import { SHAPE_KINDS } from '../../migrations/0009-list-and-shape-indexes';

/**
 * The shape of a job in log space, as the similar-spec search measures it (db/search/similarity.ts): two
 * points, (ln d, ln rate) and (ln D, ln L0). The weights stay out of the index (the search scales its box by
 * them), so changing a weight needs no new index. d, D, L0 and the rate are positive by the jobs table's checks.
 */
export const SHAPE_POINTS = ['point(ln(d), ln(rate))', 'point(ln(mean_diameter), ln(free_length))'] as const;

/** The per-kind shape index's name; built from the fixed kind list, never from input. */
export const shapeIndex = (kind: (typeof SHAPE_KINDS)[number]): string => `jobs_shape_${kind}`;

/**
 * One GiST index per kind over the two points, carrying every number the score reads (INCLUDE), so a
 * search is an index-only scan of the jobs of its kind near the asked spring in four dimensions at once;
 * the B-tree on (kind, d) narrowed by the wire size alone and read thousands of jobs per search at 100 000.
 */
const shapeIndexes = (): string => SHAPE_KINDS.map((kind) => `
  CREATE INDEX ${shapeIndex(kind)} ON jobs USING gist (${SHAPE_POINTS.join(', ')})
    INCLUDE (id, d, mean_diameter, free_length, active_coils, rate, material, material_family) WHERE kind = '${kind}';`).join('');

/**
 * PostgreSQL side of 0016 (search at scale; SQLite's side changes nothing, see db/migrations/0016):
 * - the per-kind shape indexes above, replacing the (kind, d) B-tree;
 * - job counts and text rows of new jobs written once per statement from its inserted rows (a transition
 *   table) instead of once per row: a copy inserts a hundred jobs a statement in one transaction, and a
 *   per-row count update stacked one row version per job on the same few job_counts rows, each update
 *   walking the versions before it. Updates and deletes keep their per-row triggers;
 * - job_text_words: every word the text index holds, so the text search can write a typed prefix as the
 *   few whole words it stands for ("valv" as valve | valves). GIN answers whole words from their own sorted
 *   lists, quickly even when both words of a search are common, but gathers every word under a prefix
 *   into one bitmap first: ten times slower at 100 000 jobs. Words are only added (on every text row
 *   written); a word no job uses any longer matches nothing, which costs nothing.
 */
export const version0016 = `
  DROP INDEX jobs_by_kind_d;
  ${shapeIndexes()}

  CREATE FUNCTION coilwright_job_counts_added() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    INSERT INTO job_counts (status, kind, material, archived, n)
      SELECT status, kind, material, (archived_at IS NOT NULL)::int, count(*) FROM added_jobs
      GROUP BY status, kind, material, archived_at IS NOT NULL
      ON CONFLICT (archived, status, kind, material) DO UPDATE SET n = job_counts.n + excluded.n;
    RETURN NULL;
  END $$;
  DROP TRIGGER jobs_count_insert ON jobs;
  CREATE TRIGGER jobs_count_insert AFTER INSERT ON jobs REFERENCING NEW TABLE AS added_jobs
    FOR EACH STATEMENT EXECUTE FUNCTION coilwright_job_counts_added();

  CREATE FUNCTION coilwright_job_text_added() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    INSERT INTO job_text (id, number, customer, part_number, drawing_number, notes, spring)
      SELECT a.id, a.number, coalesce(c.name, ''), a.part_number, a.drawing_number,
             a.notes || ' ' || coalesce(a.spec::jsonb ->> 'notes', ''), a.search_words
      FROM added_jobs a LEFT JOIN customers c ON c.id = a.customer_id;
    RETURN NULL;
  END $$;
  DROP TRIGGER jobs_text_insert ON jobs;
  CREATE TRIGGER jobs_text_insert AFTER INSERT ON jobs REFERENCING NEW TABLE AS added_jobs
    FOR EACH STATEMENT EXECUTE FUNCTION coilwright_job_text_added();

  CREATE TABLE job_text_words (word text COLLATE "C" PRIMARY KEY);
  INSERT INTO job_text_words SELECT DISTINCT w.lexeme FROM job_text t CROSS JOIN LATERAL unnest(t.document) w;
  CREATE FUNCTION coilwright_job_text_words() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    INSERT INTO job_text_words SELECT DISTINCT w.lexeme FROM written_text t CROSS JOIN LATERAL unnest(t.document) w
      ON CONFLICT (word) DO NOTHING;
    RETURN NULL;
  END $$;
  CREATE TRIGGER job_text_words_insert AFTER INSERT ON job_text REFERENCING NEW TABLE AS written_text
    FOR EACH STATEMENT EXECUTE FUNCTION coilwright_job_text_words();
  CREATE TRIGGER job_text_words_update AFTER UPDATE ON job_text REFERENCING NEW TABLE AS written_text
    FOR EACH STATEMENT EXECUTE FUNCTION coilwright_job_text_words();
`;
