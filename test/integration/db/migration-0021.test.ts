import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, migrations, schemaVersion } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { usePgCluster } from '../../support/pg-stores';
import { tempDir } from './helpers';

const pg = usePgCluster();

const BEFORE = migrations[migrations.findIndex((m) => m.version === 21) - 1]!.version;

/** Three demo jobs written by one statement, as an import or a copy writes many. */
const THREE_JOBS = `INSERT INTO jobs (number, status, spec, revision, created_at, updated_at, kind, material, material_family, units,
  d, mean_diameter, free_length, active_coils, rate)
  SELECT 'J-DEMO-' || n, 'draft', '{}', 1, 'x', 'x', 'compression', 'en10270-1-sh', 'patented', 'metric', 2, 18, 50, 8, 10
  FROM generate_series(1, 3) AS n`;

/** The notices a listening desk has received once the other desk's writes are committed. */
async function noticesAfter(listener: SyncConnection, write: () => void): Promise<{ channel: string; payload: string }[]> {
  listener.takeNotifications();
  write();
  // A notice travels over the listener's own connection: poll until the count stops growing.
  let seen: { channel: string; payload: string }[] = [];
  for (let i = 0, quiet = 0; i < 100 && quiet < 5; i++) {
    await new Promise((r) => setTimeout(r, 20));
    listener.query('SELECT 1', []);
    const more = listener.takeNotifications();
    seen = [...seen, ...more];
    quiet = more.length === 0 && seen.length > 0 ? quiet + 1 : 0;
  }
  return seen;
}

describe('migration 0021 (job change notice per statement)', () => {
  it('SQLite: only the version moves', () => {
    const db = new Database(join(tempDir(), 'm21.db'));
    migrate(db, BEFORE);
    const schema = () => db.prepare('SELECT type, name, sql FROM sqlite_master ORDER BY name').all();
    const before = schema();
    expect(migrate(db, 21)).toEqual({ from: BEFORE, to: 21 });
    expect(schemaVersion(db)).toBe(21);
    expect(schema()).toEqual(before);
    db.close();
  });

  it('PostgreSQL: one notice per statement instead of one per job, and every kind of write still sends one', async () => {
    const url = pg.freshDatabase();
    const writer = new SyncConnection(url);
    const listener = new SyncConnection(url);
    listener.query('LISTEN coilwright_jobs', []);
    migratePg(writer, 'test', BEFORE);
    const perRow = await noticesAfter(listener, () => writer.query(THREE_JOBS, []));
    expect(perRow.map((n) => n.payload).sort()).toEqual(['1', '2', '3']);

    expect(migratePg(writer, 'test', 21)).toEqual({ from: BEFORE, to: 21 });
    expect(pgSchemaVersion(writer)).toBe(21);
    expect(await noticesAfter(listener, () => writer.query(THREE_JOBS.replaceAll("'J-DEMO-'", "'J-DEMO-B-'"), []))).toEqual([{ channel: 'coilwright_jobs', payload: '' }]);
    expect(await noticesAfter(listener, () => writer.query("UPDATE jobs SET status = 'quoted'", []))).toHaveLength(1);
    expect(await noticesAfter(listener, () => writer.query("DELETE FROM jobs WHERE number LIKE 'J-DEMO-B-%'", []))).toHaveLength(1);
    writer.close();
    listener.close();
  });
});
