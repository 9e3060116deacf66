import { spawnSync } from 'node:child_process';
import { readdirSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { backupStore, createJob, inTransaction, listJobs, openStore, restoreDamagedStore } from '../../../db';
import { job, sha256, tempDir, track, value } from './helpers';
import { damageIndexPage } from '../../support/damage';

const root = resolve(__dirname, '../../..');
const cli = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });

/** A shop store with a backup, then one b-tree page (an index of the jobs table) overwritten with junk, as a bad sector would. */
async function damagedStore(): Promise<{ dir: string; file: string; backup: string }> {
  const dir = tempDir();
  const file = join(dir, 'shop.db');
  const store = openStore(file);
  inTransaction(store, () => {
    for (let i = 0; i < 150; i++) value(createJob(store, job({ partNumber: `DMG-${i}` }, { freeLength: 40 + i / 10 })));
  });
  const backup = join(dir, 'friday.db');
  value(await backupStore(store, backup));
  damageIndexPage(store);
  return { dir, file, backup };
}

describe('a damaged store', () => {
  it('is refused on open (quick_check) with the way to restore, and the file is left as it was', async () => {
    const { file } = await damagedStore();
    const before = sha256(file);
    const listed = cli('jobs', 'list', '--db', file);
    expect(listed.status).toBe(2);
    expect(listed.stderr).toMatch(/is damaged \(quick_check: .+\) and was not opened\. Restore your latest backup over it with db restore --db/);
    expect(listed.stdout).toBe('');
    expect(sha256(file)).toBe(before);
  });

  it('is replaced by the backup through db restore, which keeps the damaged file beside it', async () => {
    const { dir, file, backup } = await damagedStore();
    const restored = cli('db', 'restore', '--db', file, '--from', backup);
    expect(restored.status, restored.stderr).toBe(0);
    expect(JSON.parse(restored.stdout)).toMatchObject({ restoredFrom: backup, damagedKeptAs: expect.stringContaining('shop.db.damaged-') });
    expect(readdirSync(dir).filter((n) => /^shop\.db\.damaged-[^-]+-[^-]+-[^-]+-[^-]+-[^-]+Z$/.test(n) || /^shop\.db\.damaged-.*Z$/.test(n))).toHaveLength(1);
    const store = track(openStore(file));
    expect(value(listJobs(store, { limit: 500 })).total).toBe(150);
    expect(store.db.pragma('integrity_check', { simple: true })).toBe('ok');
  });

  it('stays as it was when the backup cannot be put in its place after it was moved aside: no empty store, no half restore', async () => {
    const { dir, file, backup } = await damagedStore();
    const before = sha256(file);
    // The checked copy disappears between the two moves, so putting it in place fails.
    const outcome = await restoreDamagedStore(file, backup, async (stage) => {
      if (stage === 'moved') rmSync(`${file}.restore-ready`);
    });
    expect(outcome.ok).toBe(false);
    expect(!outcome.ok && outcome.error.code).toBe('restore-failed');
    expect(sha256(file)).toBe(before);
    expect(readdirSync(dir).filter((n) => n !== 'shop.db' && n !== 'friday.db' && !n.endsWith('-wal') && !n.endsWith('-shm'))).toEqual([]);
    const listed = cli('jobs', 'list', '--db', file);
    expect(listed.stderr).toMatch(/is damaged/);
  });
});
