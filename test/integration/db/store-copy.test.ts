import { spawnSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  addAttachment, copyStore, createDemoShop, createJob, findJobs, getAttachment, listJobs, openStore, similarJobs, getJob,
} from '../../../db';
import { createService, dispatch } from '../../../service/api';
import { usePgCluster } from '../../support/pg-stores';
import { job, tempDir, value } from './helpers';

const pg = usePgCluster();
const root = resolve(__dirname, '../../..');

/** A SQLite shop with the demo jobs, an issued quote and an attachment: every kind of row a copy must carry. */
async function sqliteShop(): Promise<string> {
  const file = join(tempDir(), 'shop.db');
  const store = openStore(file, { author: 'Anna (estimator)' });
  value(createDemoShop(store));
  const first = value(listJobs(store, { limit: 1 })).jobs[0]!;
  const issued = await dispatch(createService(store).handlers, 'issueQuote', { jobId: first.id, accept: 'copied shop: problems accepted' });
  expect(issued.ok).toBe(true);
  value(addAttachment(store, { jobId: first.id, name: 'drawing.pdf', mimeType: 'application/pdf', dataBase64: Buffer.from([0, 1, 2, 255]).toString('base64') }));
  store.close();
  return file;
}

describe('db copy between SQLite and PostgreSQL', () => {
  it('copies every row there and back, verified by counts and checksums, and the copy works as a store', async () => {
    const file = await sqliteShop();
    const source = openStore(file);
    const server = pg.freshStore();
    const there = value(copyStore(source, server));
    expect(there.tables.map((t) => t.table)).toEqual(expect.arrayContaining(['jobs', 'job_revisions', 'quotes', 'attachments', 'settings',
      'settings_versions', 'first_off_records', 'customers']));
    expect(there.tables.find((t) => t.table === 'quotes')!.rows).toBe(1);
    // The copy searches, lists and takes new jobs after the copied ids.
    const listed = value(listJobs(server, {}));
    expect(listed.total).toBe(value(listJobs(source, {})).total);
    const some = listed.jobs[0]!;
    expect(value(findJobs(server, { text: some.number })).map((h) => h.job.id)).toContain(some.id);
    expect(value(similarJobs(server, { spec: value(getJob(server, some.id)).spec, limit: 3 }))[0]!.job.id).toBe(some.id);
    expect(value(getAttachment(server, 1)).dataBase64).toBe(Buffer.from([0, 1, 2, 255]).toString('base64'));
    const added = value(createJob(server, job()));
    expect(added.id).toBeGreaterThan(Math.max(...listed.jobs.map((j) => j.id)));

    const back = openStore(join(tempDir(), 'back.db'));
    const again = value(copyStore(server, back));
    const before = new Map(there.tables.map((t) => [t.table, t]));
    // The job added on the server (and the job numbering setting it moved on) is the only difference on the way back.
    const moved = ['jobs', 'job_revisions', 'customers', 'settings'];
    for (const t of again.tables.filter((x) => !moved.includes(x.table))) expect(t).toEqual(before.get(t.table));
    expect(again.tables.find((t) => t.table === 'jobs')!.rows).toBe(there.tables.find((t) => t.table === 'jobs')!.rows + 1);
    source.close();
    back.close();
  });

  it('refuses a target that already holds data, and leaves it as it was', async () => {
    const file = await sqliteShop();
    const source = openStore(file);
    const server = pg.freshStore();
    value(createJob(server, job({ partNumber: 'ALREADY-HERE' })));
    const refused = copyStore(source, server);
    expect(refused).toMatchObject({ ok: false, error: { code: 'copy-target-not-empty', path: 'to' } });
    expect(value(listJobs(server, {})).jobs.map((j) => j.partNumber)).toEqual(['ALREADY-HERE']);
    source.close();
  });

  it('runs from the command line, naming the server by host and database only', async () => {
    const file = await sqliteShop();
    const url = pg.freshDatabase().replace('postgres@', 'postgres:not-a-secret-pw@');
    const r = spawnSync(process.execPath, ['scripts/cli.mjs', 'db', 'copy', '--from', file, '--to', url], { cwd: root, encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout) as { from: string; to: string; tables: { table: string; rows: number }[] };
    expect(out.to).toMatch(/^127\.0\.0\.1:\d+\/shop_/);
    expect(r.stdout + r.stderr).not.toContain('not-a-secret-pw');
    const listed = spawnSync(process.execPath, ['scripts/cli.mjs', 'jobs', 'list', '--store', url], { cwd: root, encoding: 'utf8' });
    expect(listed.status, listed.stderr).toBe(0);
    expect((JSON.parse(listed.stdout) as { total: number }).total).toBe(out.tables.find((t) => t.table === 'jobs')!.rows);
    const again = spawnSync(process.execPath, ['scripts/cli.mjs', 'db', 'copy', '--from', file, '--to', url], { cwd: root, encoding: 'utf8' });
    expect(again.status).toBe(2);
    expect(again.stderr).toMatch(/copy-target-not-empty/);
    expect(again.stderr).not.toContain('not-a-secret-pw');
  }, 180_000);
});
