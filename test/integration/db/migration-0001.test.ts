import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { APPLICATION_ID, migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

function tables(db: Database.Database): string[] {
  return (db.prepare("SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name").all() as { name: string }[]).map((r) => r.name);
}

describe('migration 0001 (jobs)', () => {
  it('creates the strict job tables, marks the file and sets version 1', () => {
    const db = new Database(join(tempDir(), 'm1.db'));
    expect(migrate(db, 1)).toEqual({ from: 0, to: 1 });
    expect(schemaVersion(db)).toBe(1);
    expect(db.pragma('application_id', { simple: true })).toBe(APPLICATION_ID);
    expect(tables(db)).toEqual(['attachments', 'customers', 'job_revisions', 'jobs', 'settings']);
    const strict = db.prepare("SELECT name FROM pragma_table_list WHERE strict = 1 AND schema = 'main' ORDER BY name").all();
    expect(strict.map((r) => (r as { name: string }).name)).toEqual(['attachments', 'customers', 'job_revisions', 'jobs', 'settings']);
    db.close();
  });

  it('enforces status values, STRICT types and the customer foreign key', () => {
    const db = new Database(join(tempDir(), 'm1.db'));
    migrate(db, 1);
    const insert = db.prepare(`INSERT INTO jobs (number, customer_id, status, spec, revision, created_at, updated_at, kind, material,
      material_family, units, d, mean_diameter, free_length, active_coils, rate) VALUES (?, ?, ?, '{}', 1, 'x', 'x', 'compression',
      'm', 'f', 'metric', ?, 10, 40, 6, 3)`);
    expect(() => insert.run('J-1', null, 'shipped', 1)).toThrow(/CHECK constraint/);
    expect(() => insert.run('J-1', 999, 'draft', 1)).toThrow(/FOREIGN KEY/);
    expect(() => insert.run('J-1', null, 'draft', 'thick')).toThrow(/cannot store TEXT value in REAL column/);
    insert.run('J-1', null, 'draft', 1.5);
    expect(() => insert.run('J-1', null, 'draft', 1.5)).toThrow(/UNIQUE/);
    db.close();
  });

  it('keeps revisions as history: UPDATE and DELETE are refused', () => {
    const db = new Database(join(tempDir(), 'm1.db'));
    migrate(db, 1);
    db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3);
      INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES (1, 1, 'x', 'created', '{}', '{}')`);
    expect(() => db.exec("UPDATE job_revisions SET reason = 'edited'")).toThrow(/cannot be changed/);
    expect(() => db.exec('DELETE FROM job_revisions')).toThrow(/cannot be deleted/);
    db.close();
  });
});
