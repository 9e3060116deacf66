import { spawn } from 'node:child_process';
import { existsSync, renameSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { backupStore, createJob, findJobs, getSettings, recordQuote, getJob, listJobs, openStore, restoreStore, similarJobs } from '../../../db';
import { openShopStore } from '../../../service/host/first-run';
import { startWebServer } from '../../../service/web/server';
import { job, tempDir, track, value } from './helpers';

/** The job's current revision: a quote is recorded against the revision it was priced from. */
const revisionOf = (store: Parameters<typeof getJob>[0], id: number): number => {
  const job = getJob(store, { id });
  if (!job.ok) throw new Error(job.error.message);
  return job.value.revision;
};

const root = resolve(__dirname, '../../..');

/** The command line as a shop would run it, in its own process. */
function cli(args: string[]): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((done) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (c: string) => { stdout += c; });
    child.stderr.setEncoding('utf8').on('data', (c: string) => { stderr += c; });
    child.on('close', (code) => done({ code, stdout, stderr }));
  });
}

const numbersIn = (file: string) => {
  const store = openStore(file);
  try {
    return (store.db.prepare('SELECT number, part_number AS part FROM jobs ORDER BY id').all() as { number: string; part: string }[]);
  } finally {
    store.close();
  }
};

describe('a restore while another program has the store open', () => {
  it('a save through the web server after a restore from the command line is in the store, with a number of its own', async () => {
    const dir = tempDir();
    const file = join(dir, 'shop.db');
    const seed = openStore(file);
    value(createJob(seed, job({ partNumber: 'IN-BACKUP' })));
    value(await backupStore(seed, join(dir, 'monday.db')));
    seed.close();
    const web = await startWebServer({ dbFile: file, staticDir: dir, onUnexpected: () => {} });
    const call = async (method: string, body: unknown) => (await fetch(`http://127.0.0.1:${web.port}/api/${method}`, {
      method: 'POST', headers: { 'content-type': 'application/json', 'x-coilwright-token': web.token }, body: JSON.stringify(body),
    })).json() as Promise<{ ok: boolean; value: { number: string }; error?: unknown }>;
    let afterRestore: { ok: boolean; value: { number: string } };
    try {
      const before = await call('createJob', job({ partNumber: 'AFTER-BACKUP' }));
      expect(before.ok).toBe(true);
      const restored = await cli(['db', 'restore', '--db', file, '--from', join(dir, 'monday.db')]);
      expect(restored.code, restored.stderr).toBe(0);
      afterRestore = await call('createJob', job({ partNumber: 'SAVED-AFTER-RESTORE' }));
      expect(afterRestore.ok).toBe(true);
      const listed = await call('listJobs', {}) as unknown as { value: { jobs: { partNumber: string }[] } };
      expect(listed.value.jobs.map((j) => j.partNumber).sort()).toEqual(['IN-BACKUP', 'SAVED-AFTER-RESTORE']);
      // The number handed out before the restore stays handed out.
      expect(afterRestore.value.number).not.toBe(before.value.number);
    } finally {
      await web.close();
    }
    const stored = numbersIn(file);
    expect(stored.map((r) => r.part).sort()).toEqual(['IN-BACKUP', 'SAVED-AFTER-RESTORE']);
    expect(new Set(stored.map((r) => r.number)).size).toBe(stored.length);
  }, 60_000);

  it('a restore from an older backup hands out no job or quote number twice', async () => {
    const dir = tempDir();
    const store = track(openStore(join(dir, 'shop.db')));
    const first = value(createJob(store, job({ partNumber: 'FIRST' })));
    value(await backupStore(store, join(dir, 'old.db')));
    const given = [value(createJob(store, job({ partNumber: 'SECOND' }))).number];
    const quotes = [1, 2].map(() => value(recordQuote(store, { jobId: first.id, jobRevision: revisionOf(store, first.id), validityDays: 30, prices: {}, quantityBreaks: [], document: {}, decision: null })).number);
    const outcome = await restoreStore(store, join(dir, 'old.db'));
    expect(outcome.result.ok).toBe(true);
    const now = track(outcome.store);
    expect(value(listJobs(now, {})).jobs.map((j) => j.partNumber)).toEqual(['FIRST']);
    // The search indexes came with the rows: the restored job is found, the undone one is not.
    expect(value(findJobs(now, { text: 'FIRST' })).map((h) => h.job.partNumber)).toEqual(['FIRST']);
    expect(value(findJobs(now, { text: 'SECOND' }))).toEqual([]);
    expect(value(similarJobs(now, { spec: job().spec })).map((s) => s.job.partNumber)).toEqual(['FIRST']);
    const next = value(createJob(now, job({ partNumber: 'THIRD' }))).number;
    const nextQuote = value(recordQuote(now, { jobId: first.id, jobRevision: revisionOf(now, first.id), validityDays: 30, prices: {}, quantityBreaks: [], document: {}, decision: null })).number;
    expect(given).not.toContain(next);
    expect(quotes).not.toContain(nextQuote);
    expect(value(getSettings(now)).numbering.quotes.next).toBeGreaterThan(2);
  });
});

describe('a store whose restore stopped between moving the old store aside and putting the copy in place', () => {
  it('opens the store it had (kept as .before-restore-*) instead of a new demo store', () => {
    const dir = tempDir();
    const file = join(dir, 'coilwright.db');
    const store = openStore(file);
    value(createJob(store, job({ partNumber: 'SHOP-OWN-JOB' })));
    store.close();
    renameSync(file, `${file}.before-restore-2026-03-02T08-00-00-000Z`);
    // A newer copy that was never finished is not a candidate.
    writeFileSync(`${file}.before-restore-2026-03-03T08-00-00-000Z.partial`, 'SQLite format 3\u0000 half a copy');
    const opened = openShopStore(file);
    if (!opened.ok) throw new Error(opened.error.message);
    track(opened.value.store);
    expect(opened.value.demoJobs).toBe(0);
    expect(value(listJobs(opened.value.store, {})).jobs.map((j) => j.partNumber)).toEqual(['SHOP-OWN-JOB']);
  });

  it('refuses to create a store where only a damaged store is kept, and says how to restore', () => {
    const dir = tempDir();
    const file = join(dir, 'coilwright.db');
    const store = openStore(file);
    store.close();
    renameSync(file, `${file}.damaged-2026-03-02T08-00-00-000Z`);
    const opened = openShopStore(file);
    expect(opened.ok).toBe(false);
    expect(!opened.ok && opened.error.message).toMatch(/no store at .*damaged.*db restore --db/);
    expect(existsSync(file)).toBe(false);
  });
});
