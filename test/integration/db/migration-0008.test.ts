import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

describe('migration 0008 (job requirements)', () => {
  it('adds the requirements kept with job revisions; a kept one cannot be changed', () => {
    const db = new Database(join(tempDir(), 'm8.db'));
    migrate(db, 3);
    db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3)`);
    expect(migrate(db, 8)).toEqual({ from: 3, to: 8 });
    expect(schemaVersion(db)).toBe(8);
    db.exec(`INSERT INTO job_requirements (job_id, job_revision, saved_at, requirement) VALUES (1, 1, 'x', '{"kind":"compression"}')`);
    expect(() => db.exec("UPDATE job_requirements SET requirement = '{}'")).toThrow(/cannot be changed/);
    expect(() => db.exec(`INSERT INTO job_requirements (job_id, job_revision, saved_at, requirement) VALUES (1, 1, 'y', '{}')`)).toThrow(/UNIQUE/);
    expect(() => db.exec(`INSERT INTO job_requirements (job_id, job_revision, saved_at, requirement) VALUES (9, 1, 'y', '{}')`)).toThrow(/FOREIGN KEY/);
    expect(() => db.exec(`INSERT INTO job_requirements (job_id, job_revision, saved_at, requirement) VALUES (1, 2, 'y', 'not json')`)).toThrow(/CHECK/);
    db.close();
  });
});
