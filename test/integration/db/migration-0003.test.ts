import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LATEST_VERSION, migrate, migrations, schemaVersion } from '../../../db';
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

  it('a migration run brings a new file straight to the latest version in one go, and a second run does nothing', () => {
    expect(LATEST_VERSION).toBe(migrations[migrations.length - 1]!.version);
    expect(LATEST_VERSION).toBeGreaterThanOrEqual(3);
    const db = new Database(join(tempDir(), 'all.db'));
    expect(migrate(db)).toEqual({ from: 0, to: LATEST_VERSION });
    expect(db.prepare("SELECT count(*) AS n FROM sqlite_schema WHERE name = 'quotes'").get()).toEqual({ n: 1 });
    expect(migrate(db)).toEqual({ from: LATEST_VERSION, to: LATEST_VERSION });
    db.close();
  });
});
