import type Database from 'better-sqlite3';

const TEXT_VALUES = `new.id, new.number, coalesce((SELECT name FROM customers WHERE id = new.customer_id), ''),
  new.part_number, new.drawing_number, new.notes || ' ' || coalesce(json_extract(new.spec, '$.notes'), ''), new.search_words`;

/**
 * The text index keeps prefixes of two to eight characters (it kept two and three). FTS5 reads a prefix it
 * keeps newest-first and stops after the matches it needs; any other prefix it gathers whole, every job
 * with a word that starts so (35 ms for "gaug" in a million jobs). Longer words are searched by their
 * first eight characters (db/search/match.ts). About 8 % more file. FTS5 cannot change the option in
 * place, so the index is rebuilt beside the old one from its own stored text, then takes its name.
 */
export function updateToVersion0018(db: Database.Database): void {
  db.exec(`
    CREATE VIRTUAL TABLE job_text_wide USING fts5(
      number, customer, part_number, drawing_number, notes, spring,
      tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3 4 5 6 7 8'
    );
    INSERT INTO job_text_wide (job_text_wide, rank) VALUES ('rank', 'bm25(6.0, 3.0, 5.0, 4.0, 1.0, 2.0)');
    INSERT INTO job_text_wide (rowid, number, customer, part_number, drawing_number, notes, spring)
      SELECT rowid, number, customer, part_number, drawing_number, notes, spring FROM job_text;
    DROP TRIGGER jobs_text_insert;
    DROP TRIGGER jobs_text_update;
    DROP TRIGGER jobs_text_delete;
    DROP TRIGGER customers_text_rename;
    DROP TABLE job_text;
    ALTER TABLE job_text_wide RENAME TO job_text;
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
  `);
}
