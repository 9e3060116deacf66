import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate, schemaVersion } from '../../../db';
import { tempDir } from './helpers';

const JOB = `INSERT INTO jobs (id, number, customer_id, part_number, notes, status, spec, revision, created_at, updated_at, kind, material,
  material_family, units, d, mean_diameter, free_length, active_coils, rate)
  VALUES (?, ?, 1, ?, ?, 'draft', '{"notes":"from the spec"}', 1, 'x', 'x', 'compression', 'm', 'f', 'metric', ?, 10, 40, 6, 3)`;

describe('migration 0002 (search)', () => {
  it('indexes jobs written before it, then keeps text and shape in step by triggers', () => {
    const db = new Database(join(tempDir(), 'm2.db'));
    migrate(db, 1);
    db.exec("INSERT INTO customers (id, name, name_key, created_at, updated_at) VALUES (1, 'Ashdown Valves', 'ashdown valves', 'x', 'x')");
    db.prepare(JOB).run(1, 'J-1', 'AV-7', 'old job', 1.5);
    expect(migrate(db, 2)).toEqual({ from: 1, to: 2 });
    expect(schemaVersion(db)).toBe(2);
    const text = (q: string) => db.prepare('SELECT rowid FROM job_text WHERE job_text MATCH ? ORDER BY rowid').all(q).map((r) => (r as { rowid: number }).rowid);
    expect(text('ashdown')).toEqual([1]);
    expect(text('spec')).toEqual([1]);
    db.prepare(JOB).run(2, 'J-2', 'AV-8', 'new job', 3);
    expect(text('"av"*')).toEqual([1, 2]);
    db.exec("UPDATE customers SET name = 'Birchwood Valves' WHERE id = 1");
    expect(text('birchwood')).toEqual([1, 2]);
    expect(text('ashdown')).toEqual([]);
    db.exec('UPDATE jobs SET d = 2.5 WHERE id = 2');
    const shape = db.prepare('SELECT id, d_min, d, material FROM job_shape ORDER BY id').all() as { id: number; d_min: number; d: number }[];
    expect(shape.map((r) => [r.id, Math.round(r.d_min * 100) / 100, r.d])).toEqual([[1, 1.5, 1.5], [2, 2.5, 2.5]]);
    db.exec('DELETE FROM jobs WHERE id = 2');
    expect(text('av*')).toEqual([1]);
    expect(db.prepare('SELECT count(*) AS n FROM job_shape').get()).toEqual({ n: 1 });
    db.close();
  });
});
