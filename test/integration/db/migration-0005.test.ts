import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ENGINE_VERSION } from '../../../core/engine-version';
import { createJob, migrate, openStore, reindexJobs, schemaVersion, similarJobs, staleJobCount } from '../../../db';
import { job, spec, tempDir, track, value } from './helpers';

const engineOf = (db: Database.Database, id: number) =>
  (db.prepare('SELECT shape_engine FROM jobs WHERE id = ?').get(id) as { shape_engine: number | null }).shape_engine;

describe('migration 0005 (the engine version of the search numbers)', () => {
  it('adds shape_engine: rows from before are "not known", rows written after carry this engine', () => {
    const file = join(tempDir(), 'm5.db');
    const db = new Database(file);
    migrate(db, 4);
    db.exec(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d,
      mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-1', 'draft', '${JSON.stringify(spec())}', 1, 'x', 'x',
      'compression', 'en10270-1-sh', 'f', 'metric', 2, 18, 50, 8, 99)`);
    expect(migrate(db, 5)).toEqual({ from: 4, to: 5 });
    expect(schemaVersion(db)).toBe(5);
    expect(engineOf(db, 1)).toBeNull();
    expect(() => db.exec('UPDATE jobs SET shape_engine = 0 WHERE id = 1')).toThrow(/CHECK/);
    db.close();
    const store = track(openStore(file));
    const created = value(createJob(store, job({}, { freeLength: 60 })));
    expect(engineOf(store.db, created.id)).toBe(ENGINE_VERSION);
    expect(staleJobCount(store)).toBe(1);
  });

  it('db reindex recomputes the stale rows from their specs, the R*Tree with them, and names a spec that no longer reads', () => {
    const file = join(tempDir(), 'm5.db');
    const store = track(openStore(file));
    const a = value(createJob(store, job({ partNumber: 'A' })));
    const b = value(createJob(store, job({ partNumber: 'B' })));
    const c = value(createJob(store, job({ partNumber: 'C' })));
    // As a store indexed by an earlier engine would hold them: a wrong rate, then no version at all.
    store.db.prepare('UPDATE jobs SET rate = 99, shape_engine = NULL WHERE id = ?').run(a.id);
    store.db.prepare('UPDATE jobs SET shape_engine = NULL, spec = ? WHERE id = ?').run(JSON.stringify(spec({ material: 'gone' })), b.id);
    expect(staleJobCount(store)).toBe(2);
    const exact = () => value(similarJobs(store, { spec: spec(), limit: 3 })).filter((s) => s.distance === 0).map((s) => s.id).sort();
    expect(exact()).toEqual([b.id, c.id]);
    const result = value(reindexJobs(store, {}));
    expect(result).toMatchObject({ engineVersion: ENGINE_VERSION, checked: 2, reindexed: 1, changed: 1 });
    expect(result.problems).toEqual([expect.objectContaining({ code: 'stored-spec-invalid', path: 'spec.material' })]);
    expect(result.problems[0]!.message).toContain(b.number);
    const rates = store.db.prepare('SELECT id, rate FROM job_shape_compression ORDER BY id').all() as { id: number; rate: number }[];
    expect(rates.find((r) => r.id === a.id)!.rate).toBeCloseTo(c.shape.rate, 9);
    expect(engineOf(store.db, a.id)).toBe(ENGINE_VERSION);
    expect(engineOf(store.db, b.id)).toBeNull();
    // B keeps the numbers it had (its spec does not read); A is the same spring as C again.
    expect(exact()).toEqual([a.id, b.id, c.id]);
    expect(value(reindexJobs(store, { all: true }))).toMatchObject({ checked: 3, reindexed: 2, changed: 0 });
  });
});
