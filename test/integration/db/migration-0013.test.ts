import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  createJob, getJob, jobRevisions, keepWorkingRevision, migrate, openStore, restoreRevision, schemaVersion, updateJob,
} from '../../../db';
import { job, spec, tempDir, track, value } from './helpers';

/** The free length of a stored compression spec. */
const freeLength = (s: unknown) => (s as { freeLength?: number } | null)?.freeLength;

const revisionCount = (db: Database.Database) => (db.prepare('SELECT count(*) AS n FROM job_revisions').get() as { n: number }).n;

describe('migration 0013 (working revisions)', () => {
  it('adds the working-session table and leaves the history as it was', () => {
    const file = join(tempDir(), 'm13.db');
    const db = new Database(file);
    migrate(db, 9);
    db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 2, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3)`);
    db.exec(`INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES
      (1, 1, '2026-01-01T00:00:00Z', 'created', '{}', '{}'), (1, 2, '2026-01-02T00:00:00Z', 'saved', '{}', '{}')`);
    const before = db.prepare('SELECT * FROM job_revisions ORDER BY revision').all();
    expect(migrate(db, 13)).toEqual({ from: 9, to: 13 });
    expect(schemaVersion(db)).toBeGreaterThanOrEqual(13);
    expect(db.prepare('SELECT * FROM job_revisions ORDER BY revision').all()).toEqual(before);
    db.exec(`INSERT INTO job_working_revisions (job_id, base_revision, opened_at, saved_at) VALUES (1, 2, 'a', 'a')`);
    expect(() => db.exec(`INSERT INTO job_working_revisions (job_id, base_revision, opened_at, saved_at) VALUES (1, 2, 'b', 'b')`)).toThrow(/UNIQUE|PRIMARY/);
    expect(() => db.exec(`INSERT INTO job_working_revisions (job_id, base_revision, opened_at, saved_at) VALUES (9, 1, 'b', 'b')`)).toThrow(/FOREIGN KEY/);
    // Revisions stay immutable after the migration.
    expect(() => db.exec("UPDATE job_revisions SET reason = 'x'")).toThrow();
    db.close();
  });

  it('coalesces autosaves of one session into one revision when the session closes', () => {
    const store = track(openStore(join(tempDir(), 'shop.db')));
    const created = value(createJob(store, job()));
    for (const freeLength of [51, 52, 53]) {
      value(updateJob(store, { id: created.id, expectedRevision: 1, spec: spec({ freeLength }), working: true }));
    }
    expect(revisionCount(store.db)).toBe(1);
    const open = value(getJob(store, created.id));
    expect(open.revision).toBe(1);
    expect(freeLength(open.spec)).toBe(53);
    expect(open.working?.saves).toBe(3);

    const kept = value(keepWorkingRevision(store, { id: created.id, reason: 'left the job' }));
    expect(kept.revision).toBe(2);
    expect(kept.working).toBeUndefined();
    const history = value(jobRevisions(store, created.id));
    expect(history.map((r) => [r.revision, r.reason, freeLength(r.spec)])).toEqual([[2, 'left the job', 53], [1, 'created', 50]]);
    // Closing again writes nothing.
    expect(value(keepWorkingRevision(store, { id: created.id })).revision).toBe(2);
  });

  it('keeps what a session typed before a restore and folds it into a deliberate save', () => {
    const store = track(openStore(join(tempDir(), 'shop.db')));
    const created = value(createJob(store, job()));
    value(updateJob(store, { id: created.id, spec: spec({ freeLength: 60 }), working: true }));
    const restored = value(restoreRevision(store, { id: created.id, revision: 1 }));
    expect(restored.revision).toBe(3);
    expect(value(jobRevisions(store, created.id)).map((r) => [r.reason, freeLength(r.spec)]))
      .toEqual([['restored revision 1', 50], ['saved', 60], ['created', 50]]);
    value(updateJob(store, { id: created.id, spec: spec({ freeLength: 61 }), working: true }));
    const saved = value(updateJob(store, { id: created.id, spec: spec({ freeLength: 62 }) }));
    expect(saved.revision).toBe(4);
    expect(saved.working).toBeUndefined();
    expect(revisionCount(store.db)).toBe(4);
  });
});
