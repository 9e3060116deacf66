import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, migrations, schemaVersion } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { pgBoxSql } from '../../../db/search/similar';
import { usePgCluster } from '../../support/pg-stores';
import { tempDir } from './helpers';

const pg = usePgCluster();

/** The version this migration follows (the numbers before it may grow as reserved ones land). */
const BEFORE = migrations[migrations.findIndex((m) => m.version === 16) - 1]!.version;

const SPEC = JSON.stringify({ kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20,
  totalCoils: 10, ends: 'closed-ground', freeLength: 50, notes: 'keep dry' });

/** Jobs as the store writes them, numbered from `first`; one INSERT for all of them, as a copy writes a page. */
const jobs = (first: number, count: number, kind = 'compression', notes = 'gate latch') => `INSERT INTO jobs (id, number, customer_id,
  part_number, status, spec, revision, created_at, updated_at, kind, material, material_family, units, d, mean_diameter, free_length,
  active_coils, rate, notes) VALUES ${Array.from({ length: count }, (_, i) => `(${first + i}, 'J-26-${String(first + i).padStart(4, '0')}', 1,
  'QG-${first + i}', 'draft', '${SPEC}', 1, '2026-01-02T08:00:00.000Z', '2026-01-02T08:00:00.000Z', '${kind}', 'en10270-1-sh',
  'patented', 'metric', ${1 + i / 10}, 18, 50, 8, ${10 + i}, '${notes}')`).join(', ')}`;

const CUSTOMER = `INSERT INTO customers (id, name, name_key, created_at, updated_at)
  VALUES (1, 'Quarry Gates (demo)', 'quarry gates (demo)', 'x', 'x')`;

describe('migration 0016 (search at scale)', () => {
  it('SQLite: changes nothing but the version (its search structures already serve these searches)', () => {
    const db = new Database(join(tempDir(), 'm16.db'));
    migrate(db, BEFORE);
    db.exec(CUSTOMER);
    db.exec(jobs(1, 2));
    const schema = () => db.prepare('SELECT type, name, sql FROM sqlite_master ORDER BY name').all();
    const before = schema();
    expect(migrate(db, 16)).toEqual({ from: BEFORE, to: 16 });
    expect(schemaVersion(db)).toBe(16);
    expect(schema()).toEqual(before);
    db.close();
  });

  it('PostgreSQL: indexes the words and shapes of earlier jobs, and keeps counts, text and words of jobs inserted many a statement', () => {
    const c = new SyncConnection(pg.freshDatabase());
    const q = (sql: string) => c.query(sql, []).rows;
    migratePg(c, 'test', BEFORE);
    q(CUSTOMER);
    q(jobs(1, 2));
    expect(migratePg(c, 'test', 16)).toEqual({ from: BEFORE, to: 16 });
    expect(pgSchemaVersion(c)).toBe(16);
    const words = () => q('SELECT word FROM job_text_words ORDER BY word').map((r) => r.word);
    expect(words()).toEqual(expect.arrayContaining(['quarry', 'gates', 'demo', 'qg', 'gate', 'latch', 'keep', 'dry', '0001', '0002']));

    q(jobs(3, 3, 'torsion', 'hinge pawl'));
    q(`${jobs(6, 1)} ON CONFLICT DO NOTHING`);
    q(`INSERT INTO jobs SELECT * FROM jobs WHERE false`);
    const counts = () => q('SELECT kind, n FROM job_counts WHERE n > 0 ORDER BY kind');
    expect(counts()).toEqual([{ kind: 'compression', n: 3 }, { kind: 'torsion', n: 3 }]);
    expect(q('SELECT id, customer FROM job_text ORDER BY id')).toEqual([1, 2, 3, 4, 5, 6].map((id) => ({ id, customer: 'Quarry Gates (demo)' })));
    expect(words()).toEqual(expect.arrayContaining(['hinge', 'pawl', '0005']));

    q("UPDATE jobs SET notes = 'ratchet spool' WHERE id = 6");
    q("UPDATE customers SET name = 'Tarn Locks (demo)' WHERE id = 1");
    q("UPDATE jobs SET kind = 'extension' WHERE id = 1");
    q('DELETE FROM jobs WHERE id = 2');
    expect(words()).toEqual(expect.arrayContaining(['ratchet', 'spool', 'tarn', 'locks']));
    expect(counts()).toEqual([{ kind: 'compression', n: 1 }, { kind: 'extension', n: 1 }, { kind: 'torsion', n: 3 }]);
    expect(q("SELECT count(*) AS n FROM job_text WHERE document @@ to_tsquery('simple', 'tarn & ratchet')")).toEqual([{ n: 1 }]);

    // The similar-spec search reads its kind's GiST index alone (the planner is told off the other ways on this tiny table).
    q('VACUUM ANALYZE jobs');
    q('SET enable_seqscan = off');
    q('SET enable_bitmapscan = off');
    const params = [0, 2, 1, 3, 2, 3, 4, 5, 1, 50, 2, 18, 50, 8, 10, 1];
    const plan = c.query(`EXPLAIN ${pgBoxSql('torsion').replace(/\?/g, () => String(params.shift()))}`, []).rows.map((r) => r['QUERY PLAN']).join('\n');
    expect(plan).toMatch(/Index Only Scan using jobs_shape_torsion on jobs/);
    expect(q("SELECT indexname FROM pg_indexes WHERE indexname LIKE 'jobs_shape_%' OR indexname = 'jobs_by_kind_d' ORDER BY 1").map((r) => r.indexname))
      .toEqual(['jobs_shape_compression', 'jobs_shape_extension', 'jobs_shape_torsion']);
    c.close();
  });
});
