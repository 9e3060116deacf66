import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate } from '../../../db';
import { tempDir } from './helpers';

const JOB = `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, kind, material,
  material_family, units, d, mean_diameter, free_length, active_coils, rate)
  VALUES (?, ?, ?, ?, '{}', 1, 'x', 'x', ?, 'm', 'f', 'metric', 2, 18, 50, 8, 3)`;

describe('migration 0009 (list and shape indexes)', () => {
  it('fills the customer key, the counts and each kind\'s shape index for jobs written before it, then keeps them in step', () => {
    const db = new Database(join(tempDir(), 'm9.db'));
    migrate(db, 3);
    db.exec("INSERT INTO customers (id, name, name_key, created_at, updated_at) VALUES (1, 'Quarry Gates', 'quarry gates', 'x', 'x')");
    db.prepare(JOB).run(1, 'J-1', 1, 'draft', 'compression');
    db.prepare(JOB).run(2, 'J-2', null, 'draft', 'torsion');
    expect(migrate(db, 9)).toEqual({ from: 3, to: 9 });
    const keys = () => db.prepare('SELECT id, customer_key FROM jobs ORDER BY id').all();
    expect(keys()).toEqual([{ id: 1, customer_key: 'quarry gates' }, { id: 2, customer_key: '' }]);
    const counts = () => db.prepare('SELECT status, kind, n FROM job_counts WHERE n > 0 ORDER BY status, kind').all();
    expect(counts()).toEqual([{ status: 'draft', kind: 'compression', n: 1 }, { status: 'draft', kind: 'torsion', n: 1 }]);
    const shape = () => ['compression', 'extension', 'torsion'].map((kind) =>
      (db.prepare(`SELECT id FROM job_shape_${kind} ORDER BY id`).all() as { id: number }[]).map((r) => r.id));
    expect(shape()).toEqual([[1], [], [2]]);

    db.prepare(JOB).run(3, 'J-3', 1, 'quoted', 'extension');
    db.exec("UPDATE jobs SET status = 'quoted' WHERE id = 1");
    db.exec('UPDATE jobs SET customer_id = 1 WHERE id = 2');
    db.exec("UPDATE customers SET name = 'Ridge Gates', name_key = 'ridge gates' WHERE id = 1");
    db.exec('DELETE FROM jobs WHERE id = 3');
    expect(keys()).toEqual([{ id: 1, customer_key: 'ridge gates' }, { id: 2, customer_key: 'ridge gates' }]);
    expect(counts()).toEqual([{ status: 'draft', kind: 'torsion', n: 1 }, { status: 'quoted', kind: 'compression', n: 1 }]);
    expect(shape()).toEqual([[1], [], [2]]);
    db.exec("UPDATE jobs SET kind = 'extension' WHERE id = 1");
    expect(shape()).toEqual([[], [1], [2]]);
    db.close();
  });
});
