import { spawn } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { backupStore, createJob, recordQuote, getJob, listJobs, openStore } from '../../../db';
import type { SqliteStore } from '../../../db';
import { openShopStore } from '../../../service/host/first-run';
import { job, tempDir, track, value } from './helpers';
import { damageIndexPage } from '../../support/damage';

/** The job's current revision: a quote is recorded against the revision it was priced from. */
const revisionOf = (store: Parameters<typeof getJob>[0], id: number): number => {
  const job = getJob(store, { id });
  if (!job.ok) throw new Error(job.error.message);
  return job.value.revision;
};

const root = resolve(__dirname, '../../..');
const restorer = join(__dirname, 'fixtures', 'restorer.ts');

/** Runs the restorer until it says it has paused at `stage`, then kills it with SIGKILL. */
function killAt(file: string, from: string, stage: string, mode: 'live' | 'damaged'): Promise<void> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, ['--import', 'tsx', restorer, file, from, stage, mode], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
    let said = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
      said += chunk;
      if (said.includes(`paused ${stage}`)) child.kill('SIGKILL');
    });
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => { said += chunk; });
    child.on('close', (_code, signal) => (signal === 'SIGKILL' ? done() : fail(new Error(`restorer ended without pausing: ${said}`))));
  });
}

/** A store with two jobs and a quote; its backup holds only the first job. */
async function shop(): Promise<{ dir: string; file: string; backup: string }> {
  const dir = tempDir();
  const file = join(dir, 'coilwright.db');
  const store = openStore(file);
  const first = value(createJob(store, job({ partNumber: 'IN-BACKUP' })));
  const backup = join(dir, 'backup.db');
  value(await backupStore(store, backup));
  value(createJob(store, job({ partNumber: 'AFTER-BACKUP' })));
  value(recordQuote(store, { jobId: first.id, jobRevision: revisionOf(store, first.id), validityDays: 30, prices: {}, quantityBreaks: [], document: {}, decision: null }));
  store.close();
  return { dir, file, backup };
}

function reopen(file: string): { parts: string[]; integrity: unknown; demoJobs: number } {
  const opened = openShopStore(file);
  if (!opened.ok) throw new Error(opened.error.message);
  const store = track(opened.value.store as SqliteStore);
  return {
    parts: value(listJobs(store, {})).jobs.map((j) => j.partNumber).sort(),
    integrity: store.db.pragma('integrity_check', { simple: true }),
    demoJobs: opened.value.demoJobs,
  };
}

const workingCopies = (dir: string) => readdirSync(dir).filter((n) => n.includes('restore-incoming') || n.includes('restore-ready'));

describe('a restore killed part way', () => {
  for (const stage of ['copied', 'kept', 'replaced']) {
    it(`into an open store, killed at "${stage}": the next open has the store as it was, whole, and no working copy`, async () => {
      const { dir, file, backup } = await shop();
      await killAt(file, backup, stage, 'live');
      expect(reopen(file)).toEqual({ parts: ['AFTER-BACKUP', 'IN-BACKUP'], integrity: 'ok', demoJobs: 0 });
      expect(workingCopies(dir)).toEqual([]);
    }, 60_000);
  }

  it('over a damaged store, killed after the damaged file was moved aside: the next open finishes it', async () => {
    const { dir, file, backup } = await shop();
    await damage(file);
    await killAt(file, backup, 'moved', 'damaged');
    expect(existsSync(file)).toBe(false);
    expect(reopen(file)).toEqual({ parts: ['IN-BACKUP'], integrity: 'ok', demoJobs: 0 });
    expect(workingCopies(dir)).toEqual([]);
    expect(readdirSync(dir).some((n) => n.startsWith('coilwright.db.damaged-'))).toBe(true);
  }, 60_000);

  it('over a damaged store, killed before it was moved: the store is still refused as damaged, never replaced by a new one', async () => {
    const { file, backup } = await shop();
    await damage(file);
    await killAt(file, backup, 'ready', 'damaged');
    const opened = openShopStore(file);
    expect(opened.ok).toBe(false);
    expect(!opened.ok && opened.error.code).toBe('store-corrupt');
  }, 60_000);
});

/** Overwrites one index page of the jobs table with junk. */
async function damage(file: string): Promise<void> {
  const store = openStore(file);
  damageIndexPage(store);
}
