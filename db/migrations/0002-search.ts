import type Database from 'better-sqlite3';

/**
 * Search structures kept by triggers, so no write path can forget them:
 * - job_text (FTS5): job number, customer name, part number, drawing number, notes (job and spec notes).
 *   Ranked by bm25 with the identifying columns weighted above free notes.
 * - job_shape (R*Tree): the point (d, D, L0, active coils, rate) of every job, the numeric pre-filter of
 *   "similar jobs". R*Tree coordinates are 32-bit floats rounded outwards, so the exact values ride along
 *   as auxiliary columns and the scoring reads them without touching the jobs table.
 */
export function updateToVersion0002(db: Database.Database): void {
  db.exec(`
    CREATE VIRTUAL TABLE job_text USING fts5(
      number, customer, part_number, drawing_number, notes,
      tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3'
    );
    INSERT INTO job_text (job_text, rank) VALUES ('rank', 'bm25(6.0, 3.0, 5.0, 4.0, 1.0)');

    CREATE TRIGGER jobs_text_insert AFTER INSERT ON jobs BEGIN
      INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes)
      VALUES (new.id, new.number, coalesce((SELECT name FROM customers WHERE id = new.customer_id), ''),
              new.part_number, new.drawing_number,
              new.notes || ' ' || coalesce(json_extract(new.spec, '$.notes'), ''));
    END;
    CREATE TRIGGER jobs_text_update AFTER UPDATE OF number, customer_id, part_number, drawing_number, notes, spec ON jobs BEGIN
      DELETE FROM job_text WHERE rowid = old.id;
      INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes)
      VALUES (new.id, new.number, coalesce((SELECT name FROM customers WHERE id = new.customer_id), ''),
              new.part_number, new.drawing_number,
              new.notes || ' ' || coalesce(json_extract(new.spec, '$.notes'), ''));
    END;
    CREATE TRIGGER jobs_text_delete AFTER DELETE ON jobs BEGIN
      DELETE FROM job_text WHERE rowid = old.id;
    END;
    CREATE TRIGGER customers_text_rename AFTER UPDATE OF name ON customers BEGIN
      UPDATE job_text SET customer = new.name WHERE rowid IN (SELECT id FROM jobs WHERE customer_id = new.id);
    END;

    CREATE VIRTUAL TABLE job_shape USING rtree(
      id, d_min, d_max, dm_min, dm_max, l0_min, l0_max, na_min, na_max, rate_min, rate_max,
      +kind TEXT, +material TEXT, +family TEXT, +d REAL, +dm REAL, +l0 REAL, +na REAL, +rate REAL
    );
    CREATE TRIGGER jobs_shape_insert AFTER INSERT ON jobs BEGIN
      INSERT INTO job_shape VALUES (new.id, new.d, new.d, new.mean_diameter, new.mean_diameter, new.free_length, new.free_length,
        new.active_coils, new.active_coils, new.rate, new.rate, new.kind, new.material, new.material_family,
        new.d, new.mean_diameter, new.free_length, new.active_coils, new.rate);
    END;
    CREATE TRIGGER jobs_shape_update AFTER UPDATE OF d, mean_diameter, free_length, active_coils, rate, kind, material, material_family ON jobs BEGIN
      DELETE FROM job_shape WHERE id = old.id;
      INSERT INTO job_shape VALUES (new.id, new.d, new.d, new.mean_diameter, new.mean_diameter, new.free_length, new.free_length,
        new.active_coils, new.active_coils, new.rate, new.rate, new.kind, new.material, new.material_family,
        new.d, new.mean_diameter, new.free_length, new.active_coils, new.rate);
    END;
    CREATE TRIGGER jobs_shape_delete AFTER DELETE ON jobs BEGIN
      DELETE FROM job_shape WHERE id = old.id;
    END;

    INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes)
      SELECT j.id, j.number, coalesce(c.name, ''), j.part_number, j.drawing_number,
             j.notes || ' ' || coalesce(json_extract(j.spec, '$.notes'), '')
      FROM jobs j LEFT JOIN customers c ON c.id = j.customer_id;
    INSERT INTO job_shape SELECT id, d, d, mean_diameter, mean_diameter, free_length, free_length, active_coils, active_coils,
      rate, rate, kind, material, material_family, d, mean_diameter, free_length, active_coils, rate FROM jobs;
  `);
}
