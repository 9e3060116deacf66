import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { backupStore, createJob, listJobs, openStore, tryOpenStore } from '../../db';
import type { DamageCheckInfo } from '../../core/api/store-types';
import { offerRestoreOfDamagedStore, offerRestoreWhenDamageFound } from '../../electron/shell/damaged-store';
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

describe('a large store whose damage check fails after it opened', () => {
  let large: ReturnType<typeof openStore> | undefined;
  afterEach(() => large?.close());

  /** The store opened as a large one (the size rule lowered to one byte): the check runs in the background. */
  async function openedLarge(damaged: boolean): Promise<() => Promise<DamageCheckInfo | null>> {
    const file = path.join(dir, 'coilwright.db');
    const store = openStore(file);
    createJob(store, { customer: { name: 'Wrenfield Pumps (demo)' }, partNumber: 'WP-8', spec: {
      kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50,
    } });
    if (damaged) damageIndexPage(store);
    else store.close();
    const opened = openStore(file, { check: 'by-size', checkBeforeOpenMaxBytes: 1 });
    large = opened;
    return async () => opened.damageCheck.state();
  }

  beforeEach(() => {
    electron.dialog.showMessageBox.mockReset();
  });

  it('says so once the check answers and runs the restore the user asks for', async () => {
    const damageCheck = await openedLarge(true);
    electron.dialog.showMessageBox.mockResolvedValueOnce({ response: 0 });
    const restore = vi.fn(async () => undefined);
    await offerRestoreWhenDamageFound(damageCheck, restore, 10);
    expect(electron.dialog.showMessageBox).toHaveBeenCalledTimes(1);
    expect(electron.dialog.showMessageBox).toHaveBeenCalledWith(expect.objectContaining({
      message: 'The job store is damaged', detail: expect.stringMatching(/found damage \(quick_check: .+\)[\s\S]*kept beside it/),
    }));
    expect(restore).toHaveBeenCalledTimes(1);
  });

  it('keeps it open read-only when the user declines', async () => {
    const damageCheck = await openedLarge(true);
    electron.dialog.showMessageBox.mockResolvedValueOnce({ response: 1 });
    const restore = vi.fn(async () => undefined);
    await offerRestoreWhenDamageFound(damageCheck, restore, 10);
    expect(restore).not.toHaveBeenCalled();
  });

  it('asks nothing of a store the check passes', async () => {
    const damageCheck = await openedLarge(false);
    const restore = vi.fn(async () => undefined);
    await offerRestoreWhenDamageFound(damageCheck, restore, 10);
    expect(electron.dialog.showMessageBox).not.toHaveBeenCalled();
    expect(restore).not.toHaveBeenCalled();
  });
});
