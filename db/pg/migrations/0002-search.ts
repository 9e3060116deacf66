/**
 * PostgreSQL twin of 0002: the text index and the shape search.
 * - job_text: one row per job (number, customer, part and drawing numbers, notes), kept by triggers, with a
 *   weighted tsvector (the identifying columns above free notes, as SQLite's bm25 weights) and a GIN index.
 *   The 'simple' configuration: part numbers and names are not stemmed, as FTS5's unicode61 does not stem;
 *   everything but letters and digits is a separator first (as unicode61 reads text), so "J-26-0033" is the
 *   words j, 26, 0033 in a row and not PostgreSQL's signed integers "-26" and "-0033".
 * - job_shape: a view over jobs. Its box filter is a range on the (kind, d) B-tree index and the exact
 *   values are the columns themselves, so no copy of the numbers needs keeping (SQLite's R*Tree needs one).
 */
export const version0002 = `
  CREATE TABLE job_text (
    id bigint PRIMARY KEY,
    number text NOT NULL,
    customer text NOT NULL,
    part_number text NOT NULL,
    drawing_number text NOT NULL,
    notes text NOT NULL,
    document tsvector GENERATED ALWAYS AS (
      setweight(to_tsvector('simple', regexp_replace(number, '[^[:alnum:]]+', ' ', 'g')), 'A')
      || setweight(to_tsvector('simple', regexp_replace(part_number, '[^[:alnum:]]+', ' ', 'g')), 'A')
      || setweight(to_tsvector('simple', regexp_replace(drawing_number, '[^[:alnum:]]+', ' ', 'g')), 'B')
      || setweight(to_tsvector('simple', regexp_replace(customer, '[^[:alnum:]]+', ' ', 'g')), 'C')
      || setweight(to_tsvector('simple', regexp_replace(notes, '[^[:alnum:]]+', ' ', 'g')), 'D')) STORED
  );
  CREATE INDEX job_text_search ON job_text USING gin (document);

  CREATE FUNCTION coilwright_job_text() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP <> 'INSERT' THEN DELETE FROM job_text WHERE id = OLD.id; END IF;
    IF TG_OP <> 'DELETE' THEN
      INSERT INTO job_text (id, number, customer, part_number, drawing_number, notes)
      VALUES (NEW.id, NEW.number, coalesce((SELECT name FROM customers WHERE id = NEW.customer_id), ''),
              NEW.part_number, NEW.drawing_number, NEW.notes || ' ' || coalesce(NEW.spec::jsonb ->> 'notes', ''));
    END IF;
    RETURN NULL;
  END $$;
  CREATE TRIGGER jobs_text_insert AFTER INSERT ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_text();
  CREATE TRIGGER jobs_text_update AFTER UPDATE OF number, customer_id, part_number, drawing_number, notes, spec ON jobs
    FOR EACH ROW EXECUTE FUNCTION coilwright_job_text();
  CREATE TRIGGER jobs_text_delete AFTER DELETE ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_text();

  CREATE FUNCTION coilwright_customer_text() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    UPDATE job_text SET customer = NEW.name WHERE id IN (SELECT id FROM jobs WHERE customer_id = NEW.id);
    RETURN NULL;
  END $$;
  CREATE TRIGGER customers_text_rename AFTER UPDATE OF name ON customers FOR EACH ROW EXECUTE FUNCTION coilwright_customer_text();

  CREATE VIEW job_shape AS SELECT id, d AS d_min, d AS d_max, mean_diameter AS dm_min, mean_diameter AS dm_max,
    free_length AS l0_min, free_length AS l0_max, active_coils AS na_min, active_coils AS na_max, rate AS rate_min, rate AS rate_max,
    kind, material, material_family AS family, d, mean_diameter AS dm, free_length AS l0, active_coils AS na, rate
    FROM jobs;

  INSERT INTO job_text (id, number, customer, part_number, drawing_number, notes)
    SELECT j.id, j.number, coalesce(c.name, ''), j.part_number, j.drawing_number,
           j.notes || ' ' || coalesce(j.spec::jsonb ->> 'notes', '')
    FROM jobs j LEFT JOIN customers c ON c.id = j.customer_id;
`;
