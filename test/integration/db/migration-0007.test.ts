import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LATEST_VERSION, migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

describe('migration 0007 (estimating: settings versions, accepted prices)', () => {
  it('keeps the settings a store already has as its first version, which can be neither changed nor deleted', () => {
    const db = new Database(join(tempDir(), 'm7.db'));
    migrate(db, 3);
    db.exec(`INSERT INTO settings (key, value, updated_at) VALUES ('costing', '{"marginPercent":31}', 'x'),
      ('defaults', '{"currency":"EUR"}', 'x')`);
    expect(migrate(db, 7)).toEqual({ from: 3, to: 7 });
    expect(schemaVersion(db)).toBe(7);
    const rows = db.prepare('SELECT settings FROM settings_versions').all() as { settings: string }[];
    expect(rows).toHaveLength(1);
    expect(JSON.parse(rows[0]!.settings)).toEqual({ costing: { marginPercent: 31 }, defaults: { currency: 'EUR' } });
    expect(() => db.exec("UPDATE settings_versions SET settings = '{}'")).toThrow(/cannot be changed/);
    expect(() => db.exec('DELETE FROM settings_versions')).toThrow(/cannot be deleted/);
    db.close();
  });

  it('a store with no settings saved starts with no version; acceptance rows name a job and a version', () => {
    const db = new Database(join(tempDir(), 'm7b.db'));
    migrate(db, 7);
    expect(db.prepare('SELECT count(*) AS n FROM settings_versions').get()).toEqual({ n: 0 });
    db.pragma('foreign_keys = ON');
    expect(() => db.exec("INSERT INTO job_cost_acceptance (job_id, settings_version, accepted_at) VALUES (1, 1, 'x')")).toThrow(/FOREIGN KEY/);
    db.close();
  });

  it('is in the schema history, and a run from a new file passes through it to the latest version', () => {
    expect(LATEST_VERSION).toBeGreaterThanOrEqual(7);
    const db = new Database(join(tempDir(), 'all.db'));
    expect(migrate(db)).toEqual({ from: 0, to: LATEST_VERSION });
    expect(db.prepare("SELECT count(*) AS n FROM sqlite_schema WHERE name IN ('settings_versions', 'job_cost_acceptance')").get()).toEqual({ n: 2 });
    expect(migrate(db)).toEqual({ from: LATEST_VERSION, to: LATEST_VERSION });
    db.close();
  });
});
