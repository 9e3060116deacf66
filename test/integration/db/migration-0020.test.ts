import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { JobShape } from '../../../core/api/store';
import { migrate, migrations, openPgStore, openStore, schemaVersion } from '../../../db';
import { SyncConnection, migratePg, pgSchemaVersion } from '../../../db/pg';
import { INDEX_WEIGHTS, MIX } from '../../../db/migrations/0020-mixed-shape-coordinates';
import { indexStretch, mixedCoordinates, nearestJobs, nearestJobsByScan } from '../../../db/search/similar';
import { WEIGHTS, distance } from '../../../db/search/similarity';
import { lcg } from '../../../bench/suites/store-data';
import { usePgCluster } from '../../support/pg-stores';
import { tempDir } from './helpers';

const pg = usePgCluster();

const BEFORE = migrations[migrations.findIndex((m) => m.version === 20) - 1]!.version;

const JOB = `INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material,
  material_family, units, d, mean_diameter, free_length, active_coils, rate)
  VALUES (?, ?, 'draft', '{}', 1, 'x', 'x', ?, ?, 'patented', 'metric', ?, ?, ?, ?, ?)`;

/** Demo springs of the three kinds as the version before wrote them: [kind, material, d, D, L0, na, rate]. */
const SPRINGS: [string, string, number, number, number, number, number][] = [
  ['compression', 'en10270-1-sh', 2, 18, 50, 8, 10.2],
  ['compression', 'en10270-1-dh', 2.2, 17, 48, 7.5, 14.9],
  ['compression', 'en10270-1-sh', 0.5, 4, 12, 10, 1.9],
  ['extension', 'en10270-1-sh', 1.2, 9, 40, 20, 2.4],
  ['torsion', 'en10270-1-dh', 1.6, 12, 8, 5.25, 410],
];

const shapeOf = ([kind, material, d, D, L0, na, rate]: (typeof SPRINGS)[number]): JobShape =>
  ({ kind, material, materialFamily: 'patented', wireDiameter: d, meanDiameter: D, freeLength: L0, activeCoils: na, rate }) as JobShape;

type TreeRow = Record<string, number | string>;
const treeRows = (db: Database.Database, kind: string) => db.prepare(`SELECT * FROM job_shape_${kind} ORDER BY id`).all() as TreeRow[];

/** Each stored coordinate is the job's own mixed coordinate, held within the R*Tree's 32-bit box around it. */
function expectMixed(row: TreeRow, shape: JobShape): void {
  mixedCoordinates(shape).forEach((m, j) => {
    const [lo, hi] = [row[`m${j + 1}_min`] as number, row[`m${j + 1}_max`] as number];
    expect(lo).toBeLessThanOrEqual(m);
    expect(hi).toBeGreaterThanOrEqual(m);
    expect(hi - lo).toBeLessThan(Math.max(1, Math.abs(m)) * 1e-6);
  });
  expect([row.d, row.dm, row.l0, row.na, row.rate]).toEqual([shape.wireDiameter, shape.meanDiameter, shape.freeLength, shape.activeCoils, shape.rate]);
}

describe('migration 0020 (mixed shape coordinates)', () => {
  it('SQLite: each kind\'s tree holds the mixed coordinates of the jobs written before it, and its triggers keep them', () => {
    const file = join(tempDir(), 'm20.db');
    const db = new Database(file);
    migrate(db, BEFORE);
    SPRINGS.forEach((s, i) => db.prepare(JOB).run(i + 1, `J-${i + 1}`, s[0], s[1], ...s.slice(2)));
    expect(migrate(db, 20)).toEqual({ from: BEFORE, to: 20 });
    expect(schemaVersion(db)).toBe(20);
    const compression = treeRows(db, 'compression');
    expect(compression.map((r) => r.id)).toEqual([1, 2, 3]);
    compression.forEach((r, i) => expectMixed(r, shapeOf(SPRINGS[i]!)));
    expectMixed(treeRows(db, 'extension')[0]!, shapeOf(SPRINGS[3]!));
    expectMixed(treeRows(db, 'torsion')[0]!, shapeOf(SPRINGS[4]!));

    db.prepare('UPDATE jobs SET d = 2.5, rate = 24.9 WHERE id = 1').run();
    expectMixed(treeRows(db, 'compression')[0]!, shapeOf(['compression', 'en10270-1-sh', 2.5, 18, 50, 8, 24.9]));
    db.prepare("UPDATE jobs SET kind = 'extension' WHERE id = 3").run();
    db.prepare('DELETE FROM jobs WHERE id = 5').run();
    expect(['compression', 'extension', 'torsion'].map((k) => treeRows(db, k).map((r) => r.id))).toEqual([[1, 2], [3, 4], []]);
    db.close();

    const store = openStore(file);
    const asked = shapeOf(SPRINGS[1]!);
    expect(nearestJobs(store, asked, 2)).toEqual(nearestJobsByScan(store, asked, 2));
    expect(nearestJobs(store, asked, 2).map((s) => s.id)).toEqual([2, 1]);
    store.close();
  });

  it('the box of a radius holds every job within it, whatever the search weights, and is no wider than it must be', () => {
    const random = lcg(2020);
    const keys = Object.keys(WEIGHTS) as (keyof typeof WEIGHTS)[];
    const point = (): JobShape => ({ wireDiameter: 0.2 + 10 * random(), meanDiameter: 2 + 80 * random(), freeLength: 5 + 300 * random(),
      activeCoils: 2 + 30 * random(), rate: 0.01 + 500 * random(), material: 'm', materialFamily: 'f' }) as JobShape;
    for (let i = 0; i < 2000; i++) {
      const weights = i % 2 === 0 ? { ...WEIGHTS } : Object.fromEntries(keys.map((k) => [k, 0.5 + 3 * random()])) as Record<keyof typeof WEIGHTS, number>;
      const [a, p] = [point(), point()];
      const geometric = keys.reduce((s, k) => s + weights[k] * Math.abs(Math.log(p[k] / a[k])), 0);
      if (i % 2 === 0) expect(geometric).toBeCloseTo(distance(a, p), 12);
      const [ma, mp] = [mixedCoordinates(a), mixedCoordinates(p)];
      ma.forEach((m, j) => expect(Math.abs(mp[j]! - m)).toBeLessThanOrEqual(geometric * indexStretch(weights) * (1 + 1e-12)));
    }
    // With the index's own weights the box is that of the radius itself: a job on an axis at distance r sits on its edge.
    expect(indexStretch({ ...WEIGHTS })).toBe(1);
    expect(Object.values(WEIGHTS)).toEqual([...INDEX_WEIGHTS]);
  });

  it('mixes with a sign matrix of the largest determinant of its order', () => {
    // 48 is the largest determinant of a 5 × 5 matrix of ±1 (the Hadamard maximal determinant problem;
    // OEIS A003433: 1, 2, 4, 16, 48, 160, …; from memory). Gaussian elimination, computed here.
    const m = MIX.map((row) => row.map(Number));
    let det = 1;
    for (let i = 0; i < 5; i++) {
      const p = m.findIndex((row, r) => r >= i && row[i] !== 0);
      if (p !== i) { [m[i], m[p]] = [m[p]!, m[i]!]; det = -det; }
      det *= m[i]![i]!;
      for (let r = i + 1; r < 5; r++) {
        const f = m[r]![i]! / m[i]![i]!;
        for (let c = i; c < 5; c++) m[r]![c]! -= f * m[i]![c]!;
      }
    }
    expect(Math.abs(det)).toBeCloseTo(48, 9);
    for (const row of MIX) for (const sign of row) expect(Math.abs(sign)).toBe(1);
  });

  it('PostgreSQL: the version is counted, its shape search unchanged', () => {
    const url = pg.freshDatabase();
    const c = new SyncConnection(url);
    migratePg(c, 'test', BEFORE);
    expect(migratePg(c, 'test', 20)).toEqual({ from: BEFORE, to: 20 });
    expect(pgSchemaVersion(c)).toBe(20);
    SPRINGS.forEach((s, i) => c.query(`INSERT INTO jobs (id, number, status, spec, revision, created_at, updated_at, kind, material,
      material_family, units, d, mean_diameter, free_length, active_coils, rate)
      VALUES (${i + 1}, 'J-${i + 1}', 'draft', '{}', 1, 'x', 'x', '${s[0]}', '${s[1]}', 'patented', 'metric', ${s.slice(2).join(', ')})`, []));
    c.close();
    const store = openPgStore(url);
    const asked = shapeOf(SPRINGS[1]!);
    expect(nearestJobs(store, asked, 2)).toEqual(nearestJobsByScan(store, asked, 2));
    expect(nearestJobs(store, asked, 2).map((s) => s.id)).toEqual([2, 1]);
    store.close();
  });
});
