import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createJob, migrate, migrations, openStore, schemaVersion, similarJobs } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { usePgCluster } from '../../support/pg-stores';
import { job, spec, tempDir, value } from './helpers';

const pg = usePgCluster();

const BEFORE = migrations[migrations.findIndex((m) => m.version === 22) - 1]!.version;

const indexesOfJobs = (db: Database.Database) =>
  (db.prepare("SELECT name FROM sqlite_master WHERE type = 'index' AND tbl_name = 'jobs' ORDER BY name").all() as { name: string }[]).map((r) => r.name);

describe('migration 0022 (drop the wire size index)', () => {
  it('SQLite: the index goes, every other index of jobs stays, and the similar-jobs search still answers', () => {
    const file = join(tempDir(), 'm22.db');
    const db = new Database(file);
    migrate(db, BEFORE);
    const before = indexesOfJobs(db);
    expect(before).toContain('jobs_by_kind_d');
    expect(migrate(db, 22)).toEqual({ from: BEFORE, to: 22 });
    expect(schemaVersion(db)).toBe(22);
    expect(indexesOfJobs(db)).toEqual(before.filter((name) => name !== 'jobs_by_kind_d'));
    db.close();
    const store = openStore(file);
    const made = value(createJob(store, job({ partNumber: 'WS-22 (demo)' })));
    const found = value(similarJobs(store, { spec: spec() }));
    expect(found.map((s) => s.id)).toEqual([made.id]);
    store.close();
  });

  it('PostgreSQL: the version is counted; the index had gone already', () => {
    const url = pg.freshDatabase();
    const c = new SyncConnection(url);
    migratePg(c, 'test', BEFORE);
    const named = () => c.query("SELECT count(*)::int AS n FROM pg_indexes WHERE indexname = 'jobs_by_kind_d'", []).rows[0]!.n;
    expect(named()).toBe(0);
    expect(migratePg(c, 'test', 22)).toEqual({ from: BEFORE, to: 22 });
    expect(pgSchemaVersion(c)).toBe(22);
    expect(named()).toBe(0);
    c.close();
  });
});
