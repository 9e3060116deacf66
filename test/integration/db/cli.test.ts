import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../../db/demo/jobs';
import { job, spec, tempDir } from './helpers';

const root = resolve(__dirname, '../../..');
/** A test that starts a dozen command-line processes: each takes seconds on a busy machine. */
const SEVERAL_PROCESSES = 180_000;

function cli(...args: string[]): { code: number; out: string; err: string; json: () => unknown; errors: () => { code: string; path: string; message: string }[] } {
  const r = spawnSync(process.execPath, ['scripts/cli.mjs', ...args], { cwd: root, encoding: 'utf8' });
  return {
    code: r.status ?? -1, out: r.stdout, err: r.stderr,
    json: () => JSON.parse(r.stdout),
    errors: () => (JSON.parse(r.stderr) as { errors: { code: string; path: string; message: string }[] }).errors,
  };
}

function jobFile(dir: string, name: string, over: Record<string, unknown> = {}, specOver: Record<string, unknown> = {}): string {
  const { drawingNumber, drawingRevision, ...rest } = job(over, specOver);
  const file = join(dir, name);
  writeFileSync(file, JSON.stringify({ ...rest, drawing: drawingNumber, revision: drawingRevision }));
  return file;
}

describe('command line: jobs from past jobs, archive and delete', () => {
  it('copies a job, archives it out of the list, deletes a draft and brings it back', { timeout: SEVERAL_PROCESSES }, () => {
    const dir = tempDir();
    const db = join(dir, 'shop.db');
    expect(cli('jobs', 'add', jobFile(dir, 'a.json', { partNumber: 'CP-1', orderQuantity: 300 }), '--db', db).code).toBe(0);
    const copy = cli('jobs', 'copy', 'J-26-0001', '--db', db).json() as { number: string; partNumber: string; orderQuantity: number; lineage: { copiedFrom: { number: string } } };
    expect(copy).toMatchObject({ number: 'J-26-0002', partNumber: 'CP-1', orderQuantity: 300, lineage: { copiedFrom: { number: 'J-26-0001' } } });
    expect((cli('jobs', 'archive', 'J-26-0001', '--db', db).json() as { archivedAt: string | null }).archivedAt).not.toBeNull();
    expect((cli('jobs', 'list', '--db', db).json() as { total: number }).total).toBe(1);
    expect((cli('jobs', 'list', '--archived', '--db', db).json() as { jobs: { number: string }[] }).jobs.map((j) => j.number)).toEqual(['J-26-0001']);
    const deleted = cli('jobs', 'delete', 'J-26-0002', '--db', db).json() as { jobId: number; number: string };
    expect(deleted.number).toBe('J-26-0002');
    expect(cli('jobs', 'show', 'J-26-0002', '--db', db).code).not.toBe(0);
    expect((cli('jobs', 'undelete', String(deleted.jobId), '--db', db).json() as { number: string }).number).toBe('J-26-0002');
    expect((cli('jobs', 'archive', 'J-26-0001', '--undo', '--db', db).json() as { archivedAt: string | null }).archivedAt).toBeNull();
  });

  it('exports jobs of one status with their archive state and links; the import names a link it cannot keep', { timeout: SEVERAL_PROCESSES }, () => {
    const dir = tempDir();
    const db = join(dir, 'shop.db');
    expect(cli('jobs', 'add', jobFile(dir, 'a.json', { partNumber: 'CP-1', status: 'quoted' }), '--db', db).code).toBe(0);
    expect(cli('jobs', 'copy', 'J-26-0001', '--db', db).code).toBe(0);
    expect(cli('jobs', 'archive', 'J-26-0001', '--db', db).code).toBe(0);
    const drafts = join(dir, 'drafts.json');
    expect(cli('db', 'export', '--status', 'draft', '--db', db, '--out', drafts).json()).toMatchObject({ count: 1 });
    expect(JSON.parse(readFileSync(drafts, 'utf8')).jobs).toMatchObject([{ number: 'J-26-0002', copiedFrom: { number: 'J-26-0001' } }]);
    const all = cli('db', 'export', '--status', 'quoted,draft', '--db', db).out;
    expect(JSON.parse(all).jobs).toMatchObject([{ number: 'J-26-0001', archivedAt: expect.any(String) }, { number: 'J-26-0002' }]);
    expect(cli('db', 'export', '--status', 'shipped', '--db', db).errors()[0]).toMatchObject({ code: 'invalid-status', path: 'status' });
    const imported = cli('db', 'import', drafts, '--db', join(dir, 'other.db')).json();
    expect(imported).toMatchObject({ count: 1, problems: [{ code: 'unknown-job', path: 'jobs[0].copiedFrom.number' }] });
  });
});

describe('command line: jobs', () => {
  it('adds, shows, lists, finds, compares and lists revisions', () => {
    const dir = tempDir();
    const db = join(dir, 'shop.db');
    const added = cli('jobs', 'add', jobFile(dir, 'a.json', { partNumber: 'HX-10', notes: 'harrow tine' }), '--db', db);
    expect(added.code).toBe(0);
    const stored = added.json() as { id: number; number: string; drawingNumber: string; drawingRevision: string };
    expect(stored).toMatchObject({ id: 1, number: 'J-26-0001', drawingNumber: 'FG-D-100', drawingRevision: 'A' });
    expect(cli('jobs', 'add', jobFile(dir, 'b.json', { partNumber: 'HX-11' }, { freeLength: 56 }), '--db', db).code).toBe(0);
    expect((cli('jobs', 'show', 'J-26-0002', '--db', db).json() as { partNumber: string }).partNumber).toBe('HX-11');
    expect((cli('jobs', 'show', '1', '--db', db).json() as { partNumber: string }).partNumber).toBe('HX-10');
    const list = cli('jobs', 'list', '--status', 'draft', '--db', db).json() as { total: number };
    expect(list.total).toBe(2);
    expect((cli('jobs', 'list', '--status', 'done', '--db', db).json() as { total: number }).total).toBe(0);
    const found = cli('jobs', 'find', 'harr', '--db', db).json() as { job: { partNumber: string } }[];
    expect(found.map((h) => h.job.partNumber)).toEqual(['HX-10']);
    writeFileSync(join(dir, 'ask.json'), JSON.stringify(spec({ freeLength: 55 })));
    const similar = cli('jobs', 'similar', join(dir, 'ask.json'), '--limit', '2', '--db', db).json() as { id: number; score: number; distance: number }[];
    // Asked L0 55: job 2 (L0 56) is nearer than job 1 (L0 50); the score is exp(−distance), below 1 for a different spring.
    expect(similar.map((s) => s.id)).toEqual([2, 1]);
    expect(similar[0]).toMatchObject({ id: 2, number: 'J-26-0002', differences: { wireDiameter: 'same', freeLength: '+2 %' } });
    for (const s of similar) expect(s.score).toBeCloseTo(Math.exp(-s.distance), 12);
    expect(similar[0]!.distance).toBeGreaterThan(0);
    expect(similar[0]!.distance).toBeLessThan(similar[1]!.distance);
    const revisions = cli('jobs', 'revisions', '1', '--db', db).json() as { revision: number }[];
    expect(revisions.map((r) => r.revision)).toEqual([1]);
  }, SEVERAL_PROCESSES);

  it('exits 2 with the field of bad input on stderr', () => {
    const dir = tempDir();
    const db = join(dir, 'shop.db');
    const bad = cli('jobs', 'add', jobFile(dir, 'bad.json', {}, { wireDiameter: 0 }), '--db', db);
    expect(bad.code).toBe(2);
    expect(bad.errors()[0]).toMatchObject({ path: 'spec.wireDiameter' });
    expect(cli('jobs', 'show', '9', '--db', db).errors()[0]).toMatchObject({ code: 'not-found', path: 'id' });
    expect(cli('jobs', 'list').errors()[0]).toMatchObject({ code: 'missing-option', path: '--db' });
    writeFileSync(join(dir, 'text.db'), 'hello');
    const refused = cli('jobs', 'list', '--db', join(dir, 'text.db'));
    expect(refused.code).toBe(2);
    expect(refused.errors()[0]).toMatchObject({ code: 'not-a-store', path: '--db' });
  });
});

describe('command line: db and demo', () => {
  it('creates the demo shop, backs it up, exports, imports and restores', () => {
    const dir = tempDir();
    const db = join(dir, 'demo.db');
    const demo = cli('demo', '--db', db);
    expect(demo.code).toBe(0);
    const count = demoJobs.length;
    expect(demo.json()).toMatchObject({ jobs: count });
    expect(cli('demo', '--db', db).errors()[0]).toMatchObject({ code: 'store-not-empty' });

    // The demo shop was indexed by this engine: nothing is stale until --all asks for every job.
    expect(cli('db', 'reindex', '--db', db).json()).toMatchObject({ checked: 0, reindexed: 0, problems: [] });
    expect(cli('db', 'reindex', '--all', '--db', db).json()).toMatchObject({ checked: count, reindexed: count, changed: 0 });

    const backup = cli('db', 'backup', '--db', db, '--out', join(dir, 'demo-backup.db'));
    expect(backup.code).toBe(0);
    expect(existsSync(join(dir, 'demo-backup.db'))).toBe(true);

    expect(cli('db', 'export', '--db', db, '--out', join(dir, 'jobs.json')).json()).toMatchObject({ format: 'json', count });
    const csv = cli('db', 'export', '--db', db, '--csv');
    expect(csv.code).toBe(0);
    expect(csv.out.trimEnd().split('\r\n')).toHaveLength(count + 1);

    const other = join(dir, 'other.db');
    expect((cli('db', 'import', join(dir, 'jobs.json'), '--db', other).json() as { imported: unknown[] }).imported).toHaveLength(count);
    const again = cli('db', 'import', join(dir, 'jobs.json'), '--db', other);
    expect(again.code).toBe(2);
    expect(again.errors()[0]).toMatchObject({ code: 'duplicate-number', path: 'jobs[0].number' });

    expect(cli('jobs', 'add', jobFile(dir, 'x.json'), '--db', db).code).toBe(0);
    const restored = cli('db', 'restore', '--db', db, '--from', join(dir, 'demo-backup.db'));
    expect(restored.code).toBe(0);
    expect((cli('jobs', 'list', '--db', db).json() as { total: number }).total).toBe(count);

    writeFileSync(join(dir, 'junk.db'), 'junk');
    const refused = cli('db', 'restore', '--db', db, '--from', join(dir, 'junk.db'));
    expect(refused.code).toBe(2);
    expect(refused.errors()[0]).toMatchObject({ code: 'not-a-store' });
    expect(readFileSync(join(dir, 'junk.db'), 'utf8')).toBe('junk');
  }, SEVERAL_PROCESSES);
});
