import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { archiveJob, createJob, listJobs, migrate, migrations, openPgStore, openStore, schemaVersion } from '../../../db';
import type { Store } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { usePgCluster } from '../../support/pg-stores';
import { job, spec, tempDir, value } from './helpers';

const pg = usePgCluster();

/** The version this migration follows (the numbers before it may grow as reserved ones land). */
const BEFORE = migrations[migrations.findIndex((m) => m.version === 19) - 1]!.version;

const SPEC = JSON.stringify(spec());

/** Two jobs as the version before this one wrote them: one from 2016 with a due date, one from this year. */
const ROWS = [
  `INSERT INTO customers (id, name, name_key, created_at, updated_at) VALUES (1, 'Quillon Regulators (demo)', 'quillon regulators (demo)', '2016-03-02T08:00:00.000Z', '2016-03-02T08:00:00.000Z')`,
  `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, due_date, kind, material, material_family, units, d,
    mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-16-0001', 1, 'done', '${SPEC}', 1, '2016-03-02T08:00:00.000Z',
    '2016-03-09T09:00:00.000Z', '2016-04-01', 'compression', 'en10270-1-sh', 'patented', 'metric', 2, 18, 50, 8, 10)`,
  `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
    mean_diameter, free_length, active_coils, rate) VALUES (2, 'J-26-0001', 1, 'draft', '${SPEC}', 1, '2026-01-02T08:00:00.000Z',
    '2026-01-02T09:00:00.000Z', 'compression', 'en10270-1-sh', 'patented', 'metric', 2, 18, 50, 8, 10)`,
];

const numbers = (store: Store, dates: Record<string, string>, archived = false) =>
  value(listJobs(store, { dates: dates as never, archived, sort: 'number' })).jobs.map((j) => j.number);

/** After the migration: the carried jobs list by each date; a new job and an archived one too. */
function checkStore(store: Store): void {
  expect(numbers(store, { field: 'created', from: '2016-03-01', to: '2016-03-31' })).toEqual(['J-16-0001']);
  expect(numbers(store, { field: 'due', from: '2016-04-01', to: '2016-04-01' })).toEqual(['J-16-0001']);
  expect(numbers(store, { field: 'updated', from: '2026-01-01' })).toEqual(['J-26-0001']);
  const added = value(createJob(store, job({ customer: { name: 'Quillon Regulators (demo)' }, dueDate: '2026-05-01' })));
  expect(numbers(store, { field: 'due', from: '2026-01-01' })).toEqual([added.number]);
  value(archiveJob(store, { id: 1, archived: true }));
  expect(numbers(store, { field: 'created', to: '2020-12-31' })).toEqual([]);
  expect(numbers(store, { field: 'created', to: '2020-12-31' }, true)).toEqual(['J-16-0001']);
}

const COLUMNS = ['archived_at', 'status', 'kind', 'material', 'number', 'customer_key', 'id'];

describe('migration 0019 (dated list indexes)', () => {
  it('SQLite: each date gets an index holding every filter and sort column, and the jobs come through', () => {
    const file = join(tempDir(), 'm19.db');
    const db = new Database(file);
    migrate(db, BEFORE);
    for (const sql of ROWS) db.exec(sql);
    expect(migrate(db, 19)).toEqual({ from: BEFORE, to: 19 });
    expect(schemaVersion(db)).toBe(19);
    const columnsOf = (index: string) => (db.prepare(`PRAGMA index_info(${index})`).all() as { name: string }[]).map((c) => c.name);
    expect(columnsOf('jobs_dated_created')).toEqual(['created_at', ...COLUMNS.slice(0, 4), 'updated_at', ...COLUMNS.slice(4)]);
    expect(columnsOf('jobs_dated_due')).toEqual(['due_date', ...COLUMNS.slice(0, 4), 'updated_at', ...COLUMNS.slice(4)]);
    expect(columnsOf('jobs_dated_updated')).toEqual(['updated_at', ...COLUMNS]);
    db.close();
    const store = openStore(file);
    checkStore(store);
    store.close();
  });

  it('PostgreSQL: the same indexes, read alone for a date range', () => {
    const url = pg.freshDatabase();
    const c = new SyncConnection(url);
    migratePg(c, 'test', BEFORE);
    for (const sql of ROWS) c.query(sql, []);
    c.query("SELECT setval(pg_get_serial_sequence('jobs', 'id'), 2)", []);
    c.query("SELECT setval(pg_get_serial_sequence('customers', 'id'), 1)", []);
    expect(migratePg(c, 'test', 19)).toEqual({ from: BEFORE, to: 19 });
    expect(pgSchemaVersion(c)).toBe(19);
    const defs = c.query("SELECT indexname, indexdef FROM pg_indexes WHERE indexname LIKE 'jobs_dated_%' ORDER BY indexname", []).rows as { indexname: string; indexdef: string }[];
    expect(defs.map((d) => d.indexname)).toEqual(['jobs_dated_created', 'jobs_dated_due', 'jobs_dated_updated']);
    for (const d of defs) expect(d.indexdef).toMatch(/INCLUDE \(archived_at, status, kind, material, (updated_at, )?number, customer_key, id\)/);
    c.query('VACUUM ANALYZE jobs', []);
    c.query('SET enable_seqscan = off', []);
    c.query('SET enable_bitmapscan = off', []);
    const plan = (c.query(`EXPLAIN SELECT count(*) FROM jobs j WHERE j.created_at >= '2016-03-01' AND j.created_at < '2016-03-31T99'
      AND j.status IN ('done', 'lost') AND j.kind = 'compression' AND j.archived_at IS NULL`, []).rows as Record<string, string>[]).map((r) => r['QUERY PLAN']).join('\n');
    expect(plan).toMatch(/Index Only Scan using jobs_dated_created/);
    c.close();
    const store = openPgStore(url);
    checkStore(store);
    store.close();
  });
});
