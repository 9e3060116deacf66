import { SHAPE_KINDS, shapeTable } from '../../migrations/0009-list-and-shape-indexes';

/**
 * One view per kind over jobs, named as SQLite's per-kind R*Trees, so the similar-spec search (db/search/similar.ts)
 * reads the same SQL on both backends. The box filter is a range on the B-tree index (kind, d), which carries
 * the other shape numbers (INCLUDE) so the search reads the index alone; the exact score is computed on the
 * candidates as on SQLite. A B-tree range on the wire size was chosen over the cube extension (a contrib module
 * that needs a superuser to install) and a GiST index: within one kind the wire size narrows the candidates to
 * a small slice, the other four ranges filter inside the index, and the ranking stays exactly SQLite's.
 */
const shapeViews = (): string => SHAPE_KINDS.map((kind) => `
  CREATE VIEW ${shapeTable(kind)} AS SELECT id, d AS d_min, d AS d_max, mean_diameter AS dm_min, mean_diameter AS dm_max,
    free_length AS l0_min, free_length AS l0_max, active_coils AS na_min, active_coils AS na_max, rate AS rate_min, rate AS rate_max,
    material, material_family AS family, d, mean_diameter AS dm, free_length AS l0, active_coils AS na, rate
    FROM jobs WHERE kind = '${kind}';`).join('\n');

/** PostgreSQL twin of 0009: the list's sort keys and indexes, the per-status/kind/material counts, shape per kind. */
export const version0009 = `
  ALTER TABLE jobs ADD COLUMN customer_key text COLLATE "C" NOT NULL DEFAULT '';
  UPDATE jobs SET customer_key = coalesce((SELECT name_key FROM customers c WHERE c.id = jobs.customer_id), '');
  CREATE FUNCTION coilwright_customer_key() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    NEW.customer_key := coalesce((SELECT name_key FROM customers WHERE id = NEW.customer_id), '');
    RETURN NEW;
  END $$;
  CREATE TRIGGER jobs_customer_key_insert BEFORE INSERT ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_customer_key();
  CREATE TRIGGER jobs_customer_key_update BEFORE UPDATE OF customer_id ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_customer_key();
  CREATE FUNCTION coilwright_customer_rename() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    UPDATE jobs SET customer_key = NEW.name_key WHERE customer_id = NEW.id;
    RETURN NULL;
  END $$;
  CREATE TRIGGER customers_key_rename AFTER UPDATE OF name_key ON customers FOR EACH ROW EXECUTE FUNCTION coilwright_customer_rename();

  DROP INDEX jobs_by_status;
  DROP INDEX jobs_by_customer;
  DROP INDEX jobs_by_updated;
  DROP INDEX jobs_by_material;
  CREATE INDEX jobs_by_updated ON jobs (updated_at, id);
  CREATE INDEX jobs_by_customer_name ON jobs (customer_key, number);
  CREATE INDEX jobs_by_status ON jobs (status, updated_at, id);
  CREATE INDEX jobs_by_status_number ON jobs (status, number);
  CREATE INDEX jobs_by_status_customer ON jobs (status, customer_key, number);
  CREATE INDEX jobs_by_customer ON jobs (customer_id, updated_at, id);
  CREATE INDEX jobs_by_customer_number ON jobs (customer_id, number);
  CREATE INDEX jobs_by_kind ON jobs (kind, updated_at, id);
  CREATE INDEX jobs_by_kind_number ON jobs (kind, number);
  CREATE INDEX jobs_by_kind_customer ON jobs (kind, customer_key, number);
  CREATE INDEX jobs_by_material ON jobs (material, updated_at, id);
  CREATE INDEX jobs_by_material_number ON jobs (material, number);
  CREATE INDEX jobs_by_material_customer ON jobs (material, customer_key, number);

  CREATE TABLE job_counts (
    status text NOT NULL, kind text NOT NULL, material text NOT NULL, n bigint NOT NULL CHECK (n >= 0),
    PRIMARY KEY (status, kind, material)
  );
  INSERT INTO job_counts SELECT status, kind, material, count(*) FROM jobs GROUP BY status, kind, material;
  CREATE FUNCTION coilwright_job_counts() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP <> 'INSERT' THEN
      UPDATE job_counts SET n = n - 1 WHERE status = OLD.status AND kind = OLD.kind AND material = OLD.material;
    END IF;
    IF TG_OP <> 'DELETE' THEN
      INSERT INTO job_counts VALUES (NEW.status, NEW.kind, NEW.material, 1)
        ON CONFLICT (status, kind, material) DO UPDATE SET n = job_counts.n + 1;
    END IF;
    RETURN NULL;
  END $$;
  CREATE TRIGGER jobs_count_insert AFTER INSERT ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_counts();
  CREATE TRIGGER jobs_count_delete AFTER DELETE ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_counts();
  CREATE TRIGGER jobs_count_update AFTER UPDATE OF status, kind, material ON jobs FOR EACH ROW EXECUTE FUNCTION coilwright_job_counts();

  DROP VIEW job_shape;
  DROP INDEX jobs_by_kind_d;
  CREATE INDEX jobs_by_kind_d ON jobs (kind, d) INCLUDE (mean_diameter, free_length, active_coils, rate, material, material_family, id);
  ${shapeViews()}
`;
