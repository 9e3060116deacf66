import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createJob, findJobs, migrate, migrations, openPgStore, openStore, schemaVersion } from '../../../db';
import type { Store } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { usePgCluster } from '../../support/pg-stores';
import { job, spec, tempDir, value } from './helpers';

const pg = usePgCluster();

/** The version this migration follows (the numbers before it may grow as reserved ones land). */
const BEFORE = migrations[migrations.findIndex((m) => m.version === 18) - 1]!.version;

const SPEC = JSON.stringify(spec());

/** A job as the version before this one wrote it, with a customer and a long word in its notes. */
const ROWS = [
  `INSERT INTO customers (id, name, name_key, created_at, updated_at) VALUES (1, 'Quillon Regulators (demo)', 'quillon regulators (demo)', '2026-01-02T08:00:00.000Z', '2026-01-02T08:00:00.000Z')`,
  `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
    mean_diameter, free_length, active_coils, rate, notes) VALUES (1, 'J-26-0001', 1, 'draft', '${SPEC}', 1, '2026-01-02T08:00:00.000Z',
    '2026-01-02T09:00:00.000Z', 'compression', 'en10270-1-sh', 'patented', 'metric', 2, 18, 50, 8, 10, 'governor counterweight')`,
];

const numbersFound = (store: Store, text: string) => value(findJobs(store, { text })).map((h) => h.job.number);

/** After the migration: the carried job is found by long words and their kept prefixes; new saves are indexed. */
function checkStore(store: Store): void {
  expect(numbersFound(store, 'counterweight')).toEqual(['J-26-0001']);
  expect(numbersFound(store, 'counterw')).toEqual(['J-26-0001']);
  expect(numbersFound(store, 'regulators')).toEqual(['J-26-0001']);
  expect(numbersFound(store, 'govern')).toEqual(['J-26-0001']);
  value(createJob(store, job({ customer: { name: 'Quillon Regulators (demo)' }, notes: 'counterbalance' })));
  expect(numbersFound(store, 'counterb')).toHaveLength(1);
  expect(numbersFound(store, 'quillon')).toHaveLength(2);
}

describe('migration 0018 (text prefixes)', () => {
  it('SQLite: the text index is rebuilt with prefixes of two to eight characters and keeps every job', () => {
    const file = join(tempDir(), 'm18.db');
    const db = new Database(file);
    migrate(db, BEFORE);
    for (const sql of ROWS) db.exec(sql);
    expect(migrate(db, 18)).toEqual({ from: BEFORE, to: 18 });
    expect(schemaVersion(db)).toBe(18);
    const table = db.prepare("SELECT sql FROM sqlite_schema WHERE name = 'job_text'").get() as { sql: string };
    expect(table.sql).toMatch(/prefix = '2 3 4 5 6 7 8'/);
    expect(db.prepare("SELECT count(*) AS n FROM sqlite_schema WHERE name LIKE 'job_text_wide%'").get()).toEqual({ n: 0 });
    expect(db.prepare(`SELECT rowid FROM job_text WHERE job_text MATCH '"counterw"*'`).all()).toEqual([{ rowid: 1 }]);
    db.close();
    const store = openStore(file);
    checkStore(store);
    store.close();
  });

  it('PostgreSQL: the number is taken and the jobs are found as on SQLite', () => {
    const url = pg.freshDatabase();
    const c = new SyncConnection(url);
    migratePg(c, 'test', BEFORE);
    for (const sql of ROWS) c.query(sql, []);
    c.query("SELECT setval(pg_get_serial_sequence('jobs', 'id'), 1)", []);
    c.query("SELECT setval(pg_get_serial_sequence('customers', 'id'), 1)", []);
    expect(migratePg(c, 'test', 18)).toEqual({ from: BEFORE, to: 18 });
    expect(pgSchemaVersion(c)).toBe(18);
    c.close();
    const store = openPgStore(url);
    checkStore(store);
    store.close();
  });
});
