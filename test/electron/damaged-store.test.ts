import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { backupStore, createJob, listJobs, openStore, tryOpenStore } from '../../db';
import { offerRestoreOfDamagedStore } from '../../electron/shell/damaged-store';
import { electron } from './electron-mock';
import { damageIndexPage } from '../support/damage';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
beforeEach(() => { dir = mkdtempSync(path.join(os.tmpdir(), 'cw-damaged-')); });
afterEach(() => rmSync(dir, { recursive: true, force: true }));

/** A store with one job and a backup of it, then one index page overwritten with junk. */
async function damagedStore(): Promise<{ file: string; backup: string; problem: string }> {
  const file = path.join(dir, 'coilwright.db');
  const store = openStore(file);
  createJob(store, { customer: { name: 'Wrenfield Pumps (demo)' }, partNumber: 'WP-7', spec: {
    kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50,
  } });
  const backup = path.join(dir, 'backup.db');
  const made = await backupStore(store, backup);
  if (!made.ok) throw new Error(made.error.message);
  damageIndexPage(store);
  const opened = tryOpenStore(file);
  if (opened.ok) throw new Error('the damaged store opened');
  return { file, backup, problem: opened.error.message };
}

describe('a damaged store at start', () => {
  it('is replaced by the backup the user chooses, and the damaged file is kept beside it', async () => {
    const { file, backup, problem } = await damagedStore();
    electron.dialog.showMessageBox.mockResolvedValue({ response: 0 });
    electron.dialog.showOpenDialog.mockResolvedValueOnce({ canceled: false, filePaths: [backup] });
    expect(await offerRestoreOfDamagedStore(file, problem)).toBe(true);
    expect(electron.dialog.showMessageBox).toHaveBeenCalledWith(expect.objectContaining({ message: 'The job store is damaged' }));
    const store = openStore(file);
    const page = listJobs(store, {});
    store.close();
    expect(page.ok && page.value.jobs.map((j) => j.partNumber)).toEqual(['WP-7']);
    expect(readdirSync(dir).some((n) => /^coilwright\.db\.damaged-.*Z$/.test(n))).toBe(true);
  });

  it('leaves the damaged store as it is when the user quits', async () => {
    const { file, problem } = await damagedStore();
    electron.dialog.showMessageBox.mockResolvedValueOnce({ response: 1 });
    expect(await offerRestoreOfDamagedStore(file, problem)).toBe(false);
    expect(tryOpenStore(file)).toMatchObject({ ok: false, error: { code: 'store-corrupt' } });
  });
});
