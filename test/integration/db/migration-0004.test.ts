import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

const RECORD = `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter,
  forces, measured_on, measured_by, recorded_at) VALUES (?, ?, 'metric', ?, ?, 24, '[{"length":40,"force":150}]', '2026-05-04', 'R. Demo', 'x')`;

/** A store at version 3 holding one job with one revision (invented test data). */
function storeAtVersion3(): Database.Database {
  const db = new Database(join(tempDir(), 'm4.db'));
  db.pragma('foreign_keys = ON');
  migrate(db, 3);
  db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
    mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 3, 21, 60, 7, 10)`);
  db.exec(`INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES (1, 1, 'x', 'created', '{}', '{}')`);
  return db;
}

describe('migration 0004 (first-off records)', () => {
  it('adds first-off records tied to a job revision, checked by the schema and never changed', () => {
    const db = storeAtVersion3();
    expect(migrate(db, 4)).toEqual({ from: 3, to: 4 });
    expect(schemaVersion(db)).toBe(4);
    db.prepare(RECORD).run(1, 1, 61.5, 60.1);
    expect(db.prepare('SELECT count(*) AS n FROM first_off_records').get()).toEqual({ n: 1 });
    expect(() => db.prepare(RECORD).run(1, 2, 61.5, 60.1)).toThrow(/FOREIGN KEY/);
    expect(() => db.prepare(RECORD).run(9, 1, 61.5, 60.1)).toThrow(/FOREIGN KEY/);
    // A set below zero (longer after pressing than as coiled) and a negative length are refused by the table itself.
    expect(() => db.prepare(RECORD).run(1, 1, 60, 61)).toThrow(/CHECK/);
    expect(() => db.prepare(RECORD).run(1, 1, -1, -2)).toThrow(/CHECK/);
    expect(() => db.exec('UPDATE first_off_records SET measured_by = \'someone else\'')).toThrow(/cannot be changed/);
    db.close();
  });

  it('finds a job\'s records through its index', () => {
    const db = storeAtVersion3();
    migrate(db, 4);
    const plan = db.prepare('EXPLAIN QUERY PLAN SELECT * FROM first_off_records WHERE job_id = ? ORDER BY measured_on').all(1) as { detail: string }[];
    expect(plan.map((p) => p.detail).join(' ')).toMatch(/USING INDEX first_off_by_job/);
    db.close();
  });
});
