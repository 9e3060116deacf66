import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { getJob, jobRevisions, migrate, migrations, openPgStore, openStore, schemaVersion, updateJob } from '../../../db';
import type { Store } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { usePgCluster } from '../../support/pg-stores';
import { spec, tempDir, value } from './helpers';

const pg = usePgCluster();

/** The version this migration follows (the numbers before it may grow as reserved ones land). */
const BEFORE = migrations[migrations.findIndex((m) => m.version === 17) - 1]!.version;

const SPEC = JSON.stringify(spec());

/** A job in an open working session, as the version before this one wrote it (no desk, no name). */
const ROWS = [
  `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
    mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-26-0001', 'draft', '${SPEC}', 1, '2026-01-02T08:00:00.000Z',
    '2026-01-02T09:00:00.000Z', 'compression', 'en10270-1-sh', 'patented', 'metric', 2, 18, 50, 8, 10)`,
  `INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec, made_by) VALUES (1, 1, '2026-01-02T08:00:00.000Z', 'created',
    '{"customerId":null,"customerName":null,"partNumber":"","drawingNumber":"","drawingRevision":"","status":"draft","notes":"","dueDate":null,"orderQuantity":null,"leadTimeDays":null}', '${SPEC}', 'Cora')`,
  `INSERT INTO job_working_revisions (job_id, base_revision, opened_at, saved_at, saves)
    VALUES (1, 1, '2026-01-02T08:30:00.000Z', '2026-01-02T09:00:00.000Z', 4)`,
];

const columns = ['job_id', 'base_revision', 'opened_at', 'saved_at', 'saves', 'desk', 'made_by'].join(', ');
const CARRIED = { job_id: 1, base_revision: 1, opened_at: '2026-01-02T08:30:00.000Z', saved_at: '2026-01-02T09:00:00.000Z', saves: 4, desk: '', made_by: '' };

/** After the migration: the carried session is nobody's desk in particular, so a desk naming none goes on in it. */
function checkStore(store: Store): void {
  const open = value(getJob(store, 1));
  expect(open.working).toMatchObject({ desk: '', by: '', saves: 4 });
  value(updateJob(store, { id: 1, expectedRevision: 1, spec: spec({ freeLength: 51 }), working: true }));
  // A named desk is another desk: refused, naming nobody it cannot name.
  const other = updateJob(store, { id: 1, expectedRevision: 1, spec: spec({ freeLength: 52 }), working: true, desk: 'desk-b' });
  expect(other.ok ? undefined : other.error).toMatchObject({ code: 'edited-elsewhere', message: expect.stringMatching(/by someone \(name not recorded\)/) });
  // Closing the carried session keeps it under the closer's name (the typist was not recorded).
  value(updateJob(store, { id: 1, expectedRevision: 1, notes: 'kept' }));
  expect(value(jobRevisions(store, 1)).map((r) => [r.revision, r.madeBy, r.fields.notes])).toEqual([[2, 'Dana', 'kept'], [1, 'Cora', '']]);
}

describe('migration 0017 (working copy desk)', () => {
  it('SQLite: an open session is carried with desk and name "" (not recorded); new sessions record both', () => {
    const file = join(tempDir(), 'm17.db');
    const db = new Database(file);
    migrate(db, BEFORE);
    for (const sql of ROWS) db.exec(sql);
    expect(migrate(db, 17)).toEqual({ from: BEFORE, to: 17 });
    expect(schemaVersion(db)).toBe(17);
    expect(db.prepare(`SELECT ${columns} FROM job_working_revisions`).all()).toEqual([CARRIED]);
    expect(() => db.exec('UPDATE job_working_revisions SET desk = NULL')).toThrow(/NOT NULL/);
    db.close();
    const store = openStore(file, { author: 'Dana' });
    checkStore(store);
    store.close();
  });

  it('PostgreSQL: the same', () => {
    const url = pg.freshDatabase();
    const c = new SyncConnection(url);
    migratePg(c, 'test', BEFORE);
    for (const sql of ROWS) c.query(sql, []);
    c.query("SELECT setval(pg_get_serial_sequence('jobs', 'id'), 1)", []);
    expect(migratePg(c, 'test', 17)).toEqual({ from: BEFORE, to: 17 });
    expect(pgSchemaVersion(c)).toBe(17);
    const rows = c.query(`SELECT ${columns} FROM job_working_revisions`, []).rows
      .map((r) => ({ ...r, job_id: Number(r.job_id), base_revision: Number(r.base_revision), saves: Number(r.saves) }));
    expect(rows).toEqual([CARRIED]);
    expect(() => c.query('UPDATE job_working_revisions SET desk = NULL', [])).toThrow(/null value/);
    c.close();
    const store = openPgStore(url, { author: 'Dana' });
    checkStore(store);
    store.close();
  });
});
