import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { jobRevisions, migrate, migrations, openPgStore, openStore, schemaVersion, updateJob } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { usePgCluster } from '../../support/pg-stores';
import { tempDir, value } from './helpers';

const pg = usePgCluster();

/** The version this migration follows (the numbers before it may grow as reserved ones land). */
const BEFORE = migrations[migrations.findIndex((m) => m.version === 15) - 1]!.version;

const SPEC = JSON.stringify({ kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20,
  totalCoils: 10, ends: 'closed-ground', freeLength: 50 });

/** A job with its first revision, an issued quote and a first-off record, as the version before this one wrote them. */
const ROWS = [
  `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
    mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-26-0001', 'draft', '${SPEC}', 1, '2026-01-02T08:00:00.000Z',
    '2026-01-02T08:00:00.000Z', 'compression', 'en10270-1-sh', 'patented', 'metric', 2, 18, 50, 8, 10)`,
  `INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES (1, 1, '2026-01-02T08:00:00.000Z', 'created',
    '{"customerId":null,"customerName":null,"partNumber":"","drawingNumber":"","drawingRevision":"","status":"draft","notes":"","dueDate":null,"orderQuantity":null,"leadTimeDays":null}', '${SPEC}')`,
  `INSERT INTO quotes (number, job_id, job_revision, issued_at, validity_days, currency, job, spec, settings, prices, quantity_breaks, document)
    VALUES ('Q-26-0001', 1, 1, '2026-01-03T08:00:00.000Z', 30, 'EUR', '{}', '${SPEC}', '{}', '[]', '[]', '{}')`,
  `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter, forces,
    measured_on, measured_by, recorded_at) VALUES (1, 1, 'metric', 51, 50, 22, '[]', '2026-01-04', 'Cora', '2026-01-04T08:00:00.000Z')`,
];

const madeBy = (rows: unknown[]) => rows.map((r) => (r as { made_by: string }).made_by);

describe('migration 0015 (who made it)', () => {
  it('SQLite: earlier rows read "" (not recorded); saves record the signed-in name', () => {
    const file = join(tempDir(), 'm15.db');
    const db = new Database(file);
    migrate(db, BEFORE);
    for (const sql of ROWS) db.exec(sql);
    expect(migrate(db, 15)).toEqual({ from: BEFORE, to: 15 });
    expect(schemaVersion(db)).toBe(15);
    for (const table of ['job_revisions', 'quotes', 'first_off_records']) {
      expect(madeBy(db.prepare(`SELECT made_by FROM ${table}`).all()), table).toEqual(['']);
    }
    expect(() => db.exec("UPDATE quotes SET made_by = 'forged'")).toThrow(/cannot be changed/);
    db.close();
    const store = openStore(file, { author: 'Dana (estimator)' });
    value(updateJob(store, { id: 1, notes: 'after the update' }));
    expect(value(jobRevisions(store, 1)).map((r) => [r.revision, r.madeBy])).toEqual([[2, 'Dana (estimator)'], [1, '']]);
    store.close();
  });

  it('PostgreSQL: the same', () => {
    const url = pg.freshDatabase();
    const c = new SyncConnection(url);
    migratePg(c, 'test', BEFORE);
    for (const sql of ROWS) c.query(sql, []);
    // Rows given their ids by hand: the identity moves past them, as the store's own writes would have.
    c.query("SELECT setval(pg_get_serial_sequence('jobs', 'id'), 1)", []);
    expect(migratePg(c, 'test', 15)).toEqual({ from: BEFORE, to: 15 });
    expect(pgSchemaVersion(c)).toBe(15);
    for (const table of ['job_revisions', 'quotes', 'first_off_records']) {
      expect(madeBy(c.query(`SELECT made_by FROM ${table}`, []).rows), table).toEqual(['']);
    }
    expect(() => c.query("UPDATE quotes SET made_by = 'forged'", [])).toThrow(/cannot be changed/);
    c.close();
    const store = openPgStore(url, { author: 'Dana (estimator)' });
    value(updateJob(store, { id: 1, notes: 'after the update' }));
    expect(value(jobRevisions(store, 1)).map((r) => [r.revision, r.madeBy])).toEqual([[2, 'Dana (estimator)'], [1, '']]);
    store.close();
  });
});
