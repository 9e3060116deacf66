import type Database from 'better-sqlite3';

/** The kinds with a shape index of their own; a new kind adds its table in its own migration. */
export const SHAPE_KINDS = ['compression', 'extension', 'torsion'] as const;

/** The R*Tree of one kind's jobs: the name is built from the fixed list above, never from input. */
export const shapeTable = (kind: (typeof SHAPE_KINDS)[number]): string => `job_shape_${kind}`;

/** Every sort the job list offers, plain and under each single filter, each served by one index. */
const LIST_INDEXES = `
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
`;

const SHAPE_VALUES = `new.id, new.d, new.d, new.mean_diameter, new.mean_diameter, new.free_length, new.free_length,
  new.active_coils, new.active_coils, new.rate, new.rate, new.material, new.material_family, new.d, new.mean_diameter,
  new.free_length, new.active_coils, new.rate`;

/** One R*Tree per kind, kept by triggers that put each job in its own kind's tree. */
function shapeTables(): string {
  const tables = SHAPE_KINDS.map((kind) => `
    CREATE VIRTUAL TABLE ${shapeTable(kind)} USING rtree(
      id, d_min, d_max, dm_min, dm_max, l0_min, l0_max, na_min, na_max, rate_min, rate_max,
      +material TEXT, +family TEXT, +d REAL, +dm REAL, +l0 REAL, +na REAL, +rate REAL
    );
    INSERT INTO ${shapeTable(kind)} SELECT id, d, d, mean_diameter, mean_diameter, free_length, free_length,
      active_coils, active_coils, rate, rate, material, material_family, d, mean_diameter, free_length, active_coils, rate
      FROM jobs WHERE kind = '${kind}';`).join('\n');
  const put = SHAPE_KINDS.map((kind) => `INSERT INTO ${shapeTable(kind)} SELECT ${SHAPE_VALUES} WHERE new.kind = '${kind}';`).join('\n      ');
  const remove = SHAPE_KINDS.map((kind) => `DELETE FROM ${shapeTable(kind)} WHERE id = old.id;`).join('\n      ');
  return `${tables}
    CREATE TRIGGER jobs_shape_insert AFTER INSERT ON jobs BEGIN
      ${put}
    END;
    CREATE TRIGGER jobs_shape_update AFTER UPDATE OF d, mean_diameter, free_length, active_coils, rate, kind, material, material_family ON jobs BEGIN
      ${remove}
      ${put}
    END;
    CREATE TRIGGER jobs_shape_delete AFTER DELETE ON jobs BEGIN
      ${remove}
    END;`;
}

/**
 * A job list that stays instant at a million jobs, and a shape index partitioned by kind:
 * - jobs.customer_key carries the customer's sort key (kept by triggers), so "sort by customer" reads an
 *   index in order instead of sorting every job through a join;
 * - one index per sort under each filter the list offers, each ending in a unique key for keyset paging;
 * - job_counts holds how many jobs there are per status, kind and material (kept by triggers), so the
 *   list's total is a sum over a few hundred rows, not a count over every job;
 * - job_shape is split into one R*Tree per kind, so a search for a rare kind reads only that kind's jobs.
 *   (A kind dimension inside one tree was tried: SQLite's R*Tree takes five dimensions at most, so the rate
 *   had to leave the box, and searches for the common kind became several times slower.)
 */
export function updateToVersion0009(db: Database.Database): void {
  db.exec(`
    ALTER TABLE jobs ADD COLUMN customer_key TEXT NOT NULL DEFAULT '';
    UPDATE jobs SET customer_key = coalesce((SELECT name_key FROM customers c WHERE c.id = jobs.customer_id), '');
    CREATE TRIGGER jobs_customer_key_insert AFTER INSERT ON jobs WHEN new.customer_id IS NOT NULL BEGIN
      UPDATE jobs SET customer_key = (SELECT name_key FROM customers WHERE id = new.customer_id) WHERE id = new.id;
    END;
    CREATE TRIGGER jobs_customer_key_update AFTER UPDATE OF customer_id ON jobs BEGIN
      UPDATE jobs SET customer_key = coalesce((SELECT name_key FROM customers WHERE id = new.customer_id), '')
      WHERE id = new.id;
    END;
    CREATE TRIGGER customers_key_rename AFTER UPDATE OF name_key ON customers BEGIN
      UPDATE jobs SET customer_key = new.name_key WHERE customer_id = new.id;
    END;

    DROP INDEX jobs_by_status;
    DROP INDEX jobs_by_customer;
    DROP INDEX jobs_by_updated;
    DROP INDEX jobs_by_material;
    ${LIST_INDEXES}

    CREATE TABLE job_counts (
      status TEXT NOT NULL, kind TEXT NOT NULL, material TEXT NOT NULL, n INTEGER NOT NULL CHECK (n >= 0),
      PRIMARY KEY (status, kind, material)
    ) WITHOUT ROWID, STRICT;
    INSERT INTO job_counts SELECT status, kind, material, count(*) FROM jobs GROUP BY status, kind, material;
    CREATE TRIGGER jobs_count_insert AFTER INSERT ON jobs BEGIN
      INSERT INTO job_counts VALUES (new.status, new.kind, new.material, 1)
        ON CONFLICT (status, kind, material) DO UPDATE SET n = n + 1;
    END;
    CREATE TRIGGER jobs_count_delete AFTER DELETE ON jobs BEGIN
      UPDATE job_counts SET n = n - 1 WHERE status = old.status AND kind = old.kind AND material = old.material;
    END;
    CREATE TRIGGER jobs_count_update AFTER UPDATE OF status, kind, material ON jobs BEGIN
      UPDATE job_counts SET n = n - 1 WHERE status = old.status AND kind = old.kind AND material = old.material;
      INSERT INTO job_counts VALUES (new.status, new.kind, new.material, 1)
        ON CONFLICT (status, kind, material) DO UPDATE SET n = n + 1;
    END;

    DROP TRIGGER jobs_shape_insert;
    DROP TRIGGER jobs_shape_update;
    DROP TRIGGER jobs_shape_delete;
    DROP TABLE job_shape;
    ${shapeTables()}
  `);
}
