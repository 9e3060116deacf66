import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createJob, findJobs, importJobs, importJobsFromFile, reindexJobs, similarJobs } from '../../../db';
import type { SqliteStore as Store } from '../../../db';
import { demoJob, document } from './demo-jobs';
import { job, spec, tempDir, tempStore, value } from './helpers';

// A large import sets the search upkeep aside and does it once before its commit (db/exchange/deferred-upkeep.ts).
// These tests hold what it leaves to what the store's own triggers and `db reindex` would have written.

const SEARCH_TABLES = ['job_text', 'job_shape_compression', 'job_shape_extension', 'job_shape_torsion'];

// The import's own connection runs PRAGMA optimize as it closes: its statistics tables are not the schema.
const schema = (store: Store) => store.db.prepare("SELECT type, name, tbl_name, sql FROM sqlite_master WHERE name NOT LIKE 'sqlite_stat%' ORDER BY name").all();
const rowsOf = (store: Store, table: string) => store.db.prepare(`SELECT rowid, * FROM ${table} ORDER BY rowid`).all();

/** Every row the search structures hold now, beside what the store's own triggers write for the same jobs. */
function searchRowsAndTriggers(store: Store) {
  const now = SEARCH_TABLES.map((t) => rowsOf(store, t));
  store.db.exec('SAVEPOINT again');
  // Touching every job makes the update triggers delete and write each job's rows again, job by job.
  store.db.exec('UPDATE jobs SET notes = notes, kind = kind');
  const byTriggers = SEARCH_TABLES.map((t) => rowsOf(store, t));
  store.db.exec('ROLLBACK TO again; RELEASE again');
  return { now, byTriggers };
}

const shapeColumns = (store: Store) => store.db.prepare(`SELECT id, kind, material, material_family, units, d, mean_diameter, free_length,
  active_coils, rate, shape_engine, search_words, customer_key FROM jobs ORDER BY id`).all();

describe('a large import leaves the search structures as job-by-job saves would', () => {
  it('fills the text index and shape trees, rebuilds the list indexes, and gives back the schema as it was', async () => {
    const store = tempStore();
    value(createJob(store, job({ partNumber: 'KEPT-1', notes: 'already on file (demo)' })));
    const before = schema(store);
    const file = join(tempDir(), 'jobs.json');
    writeFileSync(file, JSON.stringify(document(2300)));
    expect(value(await importJobsFromFile(store, { file })).imported).toHaveLength(2300);

    expect(schema(store)).toEqual(before);
    expect(store.db.pragma('integrity_check', { simple: true })).toBe('ok');
    // FTS5's own check: the index holds exactly the terms of the rows it was given.
    store.db.exec("INSERT INTO job_text (job_text) VALUES ('integrity-check')");
    const { now, byTriggers } = searchRowsAndTriggers(store);
    expect(now[0]).toHaveLength(2301);
    expect(now[1]!.length + now[2]!.length + now[3]!.length).toBe(2301);
    expect(now[2]).toHaveLength(230);
    expect(now).toEqual(byTriggers);
    // The list's totals and its sort by customer read the same as after saves one at a time.
    expect(store.db.prepare('SELECT status, kind, material, archived, n FROM job_counts WHERE n > 0 ORDER BY 1, 2, 3, 4').all())
      .toEqual(store.db.prepare(`SELECT status, kind, material, archived_at IS NOT NULL AS archived, count(*) AS n FROM jobs
                                 GROUP BY 1, 2, 3, 4 ORDER BY 1, 2, 3, 4`).all());
    expect(store.db.prepare(`SELECT count(*) AS n FROM jobs j JOIN customers c ON c.id = j.customer_id WHERE j.customer_key <> c.name_key`).get()).toEqual({ n: 0 });

    const hits = value(findJobs(store, { text: 'DEMO-1999' }));
    expect(hits.map((h) => h.job.partNumber)).toContain('DEMO-1999');
    expect(value(findJobs(store, { text: 'Orchard torsion' })).length).toBeGreaterThan(0);
    const similar = value(similarJobs(store, { spec: (demoJob(2207).spec as Record<string, unknown>), limit: 5 }));
    expect(similar.length).toBeGreaterThan(0);
    expect(similar.every((h) => h.job.shape.kind === 'torsion')).toBe(true);
  }, 60_000);

  it('stores the search numbers and words `db reindex` computes', () => {
    const store = tempStore();
    value(importJobs(store, { text: JSON.stringify(document(1100)) }));
    const stored = shapeColumns(store);
    const reindexed = value(reindexJobs(store, { all: true }));
    expect(reindexed).toMatchObject({ checked: 1100, reindexed: 1100, changed: 0, problems: [] });
    expect(shapeColumns(store)).toEqual(stored);
  }, 60_000);

  it('into a store holding more jobs than it brings, gives the same rows as into an empty one', () => {
    const empty = tempStore();
    const full = tempStore();
    value(importJobs(full, { text: JSON.stringify(document(1300)) }));
    value(importJobs(empty, { text: JSON.stringify(document(1100)) }));
    value(importJobs(full, { text: JSON.stringify(document(1100)), renumber: true }));
    const counts = (store: Store) => SEARCH_TABLES.map((t) => (store.db.prepare(`SELECT count(*) AS n FROM ${t}`).get() as { n: number }).n);
    // The first 1 300 jobs: 130 of each of extension and torsion (every tenth job from 3 and from 7), the rest compression.
    expect(counts(full)).toEqual(counts(empty).map((n, i) => n + [1300, 1040, 130, 130][i]!));
    const { now, byTriggers } = searchRowsAndTriggers(full);
    expect(now).toEqual(byTriggers);
    expect(full.db.pragma('integrity_check', { simple: true })).toBe('ok');
  }, 60_000);
});

describe('a large import refused or set apart leaves the store as it was', () => {
  it('a bad record after the upkeep was set aside: nothing written, schema and search as before (file and text)', async () => {
    const store = tempStore();
    value(createJob(store, job({ partNumber: 'KEPT-2' })));
    const before = { schema: schema(store), search: SEARCH_TABLES.map((t) => rowsOf(store, t)), jobs: shapeColumns(store) };
    const file = join(tempDir(), 'jobs.json');
    writeFileSync(file, JSON.stringify(document(2600, 2500)));
    const refused = await importJobsFromFile(store, { file });
    expect(refused).toMatchObject({ ok: false, error: { path: 'jobs[2500].spec.totalCoils' } });
    const fromText = importJobs(store, { text: JSON.stringify(document(2600, 2500)) });
    expect(fromText).toMatchObject({ ok: false, error: { path: 'jobs[2500].spec.totalCoils' } });
    expect({ schema: schema(store), search: SEARCH_TABLES.map((t) => rowsOf(store, t)), jobs: shapeColumns(store) }).toEqual(before);
    // The connection that ran the refused import saves as before, through the triggers it got back.
    const saved = value(createJob(store, job({ partNumber: 'AFTER-1' }, spec({ freeLength: 44 }))));
    expect(value(findJobs(store, { text: 'AFTER-1' })).map((h) => h.job.id)).toEqual([saved.id]);
  }, 60_000);

  it('a text-index trigger of a form it does not know stays in place and still indexes every job', () => {
    const store = tempStore();
    const trigger = (store.db.prepare("SELECT sql FROM sqlite_master WHERE name = 'jobs_text_insert'").get() as { sql: string }).sql;
    // The same rows, written by two statements: a form the upkeep does not take apart.
    store.db.exec(`DROP TRIGGER jobs_text_insert;
      CREATE TRIGGER jobs_text_insert AFTER INSERT ON jobs BEGIN
        INSERT INTO job_text (rowid, number, customer, part_number, drawing_number, notes, spring)
          SELECT new.id, new.number, coalesce(c.name, ''), new.part_number, new.drawing_number,
                 new.notes || ' ' || coalesce(json_extract(new.spec, '$.notes'), ''), new.search_words
          FROM (SELECT 1) LEFT JOIN customers c ON c.id = new.customer_id;
      END;`);
    const altered = schema(store);
    value(importJobs(store, { text: JSON.stringify(document(1100)) }));
    expect(schema(store)).toEqual(altered);
    expect(trigger).not.toEqual((store.db.prepare("SELECT sql FROM sqlite_master WHERE name = 'jobs_text_insert'").get() as { sql: string }).sql);
    const { now, byTriggers } = searchRowsAndTriggers(store);
    expect(now[0]).toHaveLength(1100);
    expect(now).toEqual(byTriggers);
  }, 60_000);
});
