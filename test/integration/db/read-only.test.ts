import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { backupStore, createJob, openStore } from '../../../db';
import { job, sha256, tempDir, value } from './helpers';

const root = resolve(__dirname, '../../..');
/** File permissions do not bind root: as root the command line runs as "nobody", as anyone else it runs as itself. */
const asUser = process.getuid?.() === 0 ? { uid: 65534, gid: 65534 } : {};
const cli = (...args: string[]) => spawnSync(process.execPath, ['--import', 'tsx', 'service/cli/main.ts', ...args],
  { cwd: root, encoding: 'utf8', ...asUser, env: { ...process.env, HOME: '/tmp' } });

describe('a store on a read-only file or folder', () => {
  it('opens read-only with a notice: list, search and print work, saves say why they cannot', async () => {
    const dir = tempDir();
    const shelf = join(dir, 'shelf');
    mkdirSync(shelf);
    const file = join(shelf, 'shop.db');
    const store = openStore(file);
    for (const part of ['RO-1', 'RO-2', 'RO-3']) value(createJob(store, job({ partNumber: part, orderQuantity: 200 })));
    value(await backupStore(store, join(dir, 'backup.db')));
    store.close();
    const out = join(dir, 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'job.json'), JSON.stringify(job({ partNumber: 'RO-NEW' })));
    chmodSync(dir, 0o755);
    chmodSync(out, 0o777);
    chmodSync(file, 0o444);
    chmodSync(shelf, 0o555);
    try {
      await checkReadOnly(dir, file);
    } finally {
      chmodSync(shelf, 0o755);
    }
  }, 180_000);
});

/** What a user of the read-only store can and cannot do, through the command line and the app's opening. */
async function checkReadOnly(dir: string, file: string): Promise<void> {
  const out = join(dir, 'out');
  const before = sha256(file);

  const listed = cli('jobs', 'list', '--db', file);
  expect(listed.status, listed.stderr).toBe(0);
  expect(JSON.parse(listed.stdout).jobs.map((j: { partNumber: string }) => j.partNumber).sort()).toEqual(['RO-1', 'RO-2', 'RO-3']);
  expect(listed.stderr).toMatch(/is open read-only \((the file|its folder .*) is read-only\): lists, searches and prints work; saves are refused/);
  expect(JSON.parse(cli('jobs', 'find', 'RO-2', '--db', file).stdout).map((h: { job: { partNumber: string } }) => h.job.partNumber)).toContain('RO-2');
  const printed = cli('print', 'traveller', '--job', '1', '--db', file, '--out', join(out, 'traveller.pdf'));
  expect(printed.status, printed.stderr).toBe(0);
  expect(existsSync(join(out, 'traveller.pdf'))).toBe(true);

  for (const attempt of [
    cli('jobs', 'add', join(out, 'job.json'), '--db', file),
    cli('jobs', 'status', '1', 'ordered', '--db', file),
    cli('db', 'restore', '--db', file, '--from', join(dir, 'backup.db')),
  ]) {
    expect(attempt.status).toBe(2);
    expect(attempt.stderr).toMatch(/"code": "store-read-only"/);
    expect(attempt.stderr).toMatch(/is read-only \(.*\): nothing was saved\. Lists, searches and prints still work/);
  }
  // The app and the web transport: the same store, no demo shop written into it, and the notice to show.
  const shop = spawnSync(process.execPath, ['--import', 'tsx', 'test/integration/db/fixtures/open-shop.ts', file],
    { cwd: root, encoding: 'utf8', ...asUser, env: { ...process.env, HOME: '/tmp' } });
  expect(JSON.parse(shop.stdout)).toEqual({ demoJobs: 0, notice: expect.stringMatching(/is open read-only .*saves are refused/) });
  expect(sha256(file)).toBe(before);
}
