import Database from 'better-sqlite3';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { migrate } from '../../../db';
import { tempDir } from './helpers';

const JOB = `INSERT INTO jobs (id, number, customer_id, status, spec, revision, created_at, updated_at, kind, material,
  material_family, units, d, mean_diameter, free_length, active_coils, rate)
  VALUES (?, ?, NULL, ?, ?, 1, 'x', 'x', 'compression', 'astm-a228', 'cold-drawn-carbon', ?, ?, ?, 50, 8, 3)`;

const inchSpec = JSON.stringify({ kind: 'compression', units: 'inch', material: 'astm-a228', wireDiameter: 0.063, outerDiameter: 0.5, freeLength: 1.5 });
const metricSpec = JSON.stringify({ kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.6, meanDiameter: 12 });

describe('migration 0014 (job lineage, archive, spring words)', () => {
  it('gives jobs written before it their spring words, counts them as listed, and keeps revisions undeletable', () => {
    const db = new Database(join(tempDir(), 'm14.db'));
    migrate(db, 9);
    db.prepare(JOB).run(1, 'J-1', 'draft', inchSpec, 'inch', 1.6002, 11.1);
    db.prepare(JOB).run(2, 'J-2', 'quoted', metricSpec, 'metric', 1.6, 12);
    db.exec(`INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES (1, 1, 'x', 'created', '{}', '{}')`);
    expect(migrate(db, 14)).toEqual({ from: 9, to: 14 });

    const words = db.prepare('SELECT search_words FROM jobs ORDER BY id').pluck().all() as string[];
    expect(words[0]).toContain('Music wire');
    expect(words[0]).toContain('d 0.063');
    expect(words[1]).toContain('d 1.6');
    expect(words[1]).toContain('OD 13.6'); // 12 + 1.6: the outside diameter from the row, in the job's units
    const found = (q: string) => db.prepare('SELECT rowid FROM job_text WHERE job_text MATCH ? ORDER BY rowid').pluck().all(q);
    expect(found('"music" "wire"')).toEqual([1]);
    expect(found('"1.6"')).toEqual([2]);

    const counts = () => db.prepare('SELECT archived, status, n FROM job_counts WHERE n > 0 ORDER BY archived, status').all();
    expect(counts()).toEqual([{ archived: 0, status: 'draft', n: 1 }, { archived: 0, status: 'quoted', n: 1 }]);
    db.exec("UPDATE jobs SET archived_at = '2026-03-01T00:00:00Z' WHERE id = 2");
    expect(counts()).toEqual([{ archived: 0, status: 'draft', n: 1 }, { archived: 1, status: 'quoted', n: 1 }]);

    expect(() => db.exec('DELETE FROM job_revisions WHERE job_id = 1')).toThrow(/history/);
    db.exec("INSERT INTO deleted_jobs (job_id, number, deleted_at, removing, snapshot) VALUES (1, 'J-1', 'x', 0, '{}')");
    expect(() => db.exec('DELETE FROM job_revisions WHERE job_id = 1')).toThrow(/history/);
    db.exec('UPDATE deleted_jobs SET removing = 1 WHERE job_id = 1');
    db.exec('DELETE FROM job_revisions WHERE job_id = 1');
    expect(db.prepare('SELECT count(*) FROM job_revisions').pluck().get()).toBe(0);
    db.close();
  });
});
