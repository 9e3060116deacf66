import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

describe('migration 0003 (quotes)', () => {
  it('adds the quotes table whose rows can be neither changed nor deleted', () => {
    const db = new Database(join(tempDir(), 'm3.db'));
    migrate(db, 2);
    db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '{}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', 1, 10, 40, 6, 3)`);
    expect(migrate(db, 3)).toEqual({ from: 2, to: 3 });
    expect(schemaVersion(db)).toBe(3);
    db.exec(`INSERT INTO quotes (number, job_id, job_revision, issued_at, validity_days, currency, job, spec, settings, prices, quantity_breaks, document)
      VALUES ('Q-1', 1, 1, '2026-01-01T00:00:00Z', 30, 'USD', '{}', '{}', '{}', '{}', '[]', '{}')`);
    expect(() => db.exec("UPDATE quotes SET currency = 'EUR'")).toThrow(/cannot be changed/);
    expect(() => db.exec('DELETE FROM quotes')).toThrow(/cannot be deleted/);
    expect(() => db.exec(`INSERT INTO quotes (number, job_id, job_revision, issued_at, validity_days, currency, job, spec, settings, prices,
      quantity_breaks, document) VALUES ('Q-2', 9, 1, 'x', 30, 'USD', '{}', '{}', '{}', '{}', '[]', '{}')`)).toThrow(/FOREIGN KEY/);
    db.close();
  });
});
