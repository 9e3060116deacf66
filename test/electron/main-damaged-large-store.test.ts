/**
 * The shell booted against the mocked electron module on a store over the damage check's size rule (64 MB,
 * made large by two drawings attached to a demo job) with one index page overwritten: the store opens at once,
 * the check fails in the background, main says so and restores the backup the user picks, and saves go on.
 */
import { mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { MessageBoxOptions } from 'electron';
import { MENU_COMMAND_CHANNEL } from '../../core/api/method-names';
import { CHECK_BEFORE_OPEN_MAX_BYTES, backupStore, storeBytes } from '../../db';
import { openShopStore } from '../../service/host/first-run';
import { attachScannedDrawings } from '../support/large-store';
import { damageIndexPage } from '../support/damage';
import { FakeBrowserWindow, captured, electron, ipcEvent, paths, processHandlersRestorer } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
let backup: string;
const storeFile = () => path.join(paths.userData, 'coilwright.db');
const storeVariable = process.env.COILWRIGHT_STORE;
const restoreProcessHandlers = processHandlersRestorer();
const trusted = ipcEvent('app://coilwright/index.html');
const call = async (method: string, input: unknown) =>
  await captured.ipcMain.get(`api:${method}`)!(trusted, input) as { ok: boolean; value: Record<string, unknown>; error?: { code: string } };

/** The demo shop, made larger than the size rule by two scanned drawings, backed up, then damaged. */
async function largeDamagedStore(): Promise<void> {
  mkdirSync(paths.userData, { recursive: true });
  const opened = openShopStore(storeFile());
  if (!opened.ok) throw new Error(opened.error.message);
  const store = opened.value.store;
  const jobId = (store.db.prepare('SELECT id FROM jobs ORDER BY id LIMIT 1').get() as { id: number }).id;
  attachScannedDrawings(store, jobId);
  const made = await backupStore(store, backup);
  if (!made.ok) throw new Error(made.error.message);
  damageIndexPage(store);
  expect(storeBytes(storeFile())).toBeGreaterThan(CHECK_BEFORE_OPEN_MAX_BYTES);
}

beforeAll(async () => {
  delete process.env.COILWRIGHT_STORE;
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-main-damaged-'));
  backup = path.join(dir, 'backup-monday.db');
  Object.assign(paths, { userData: path.join(dir, 'user'), appPath: path.join(dir, 'app'), temp: path.join(dir, 'temp') });
  mkdirSync(path.join(paths.appPath, 'dist', 'renderer'), { recursive: true });
  writeFileSync(path.join(paths.appPath, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Coilwright</title>');
  await largeDamagedStore();
  // The user answers the first box (the damage found) with "Restore a backup…", picks the backup and confirms.
  electron.dialog.showMessageBox.mockImplementation(async () => ({ response: 0 }));
  electron.dialog.showOpenDialog.mockImplementation(async () => ({ canceled: false, filePaths: [backup] }));
  await import('../../electron/main');
  await vi.waitFor(() => expect(FakeBrowserWindow.all).toHaveLength(1));
}, 60_000);

afterAll(() => {
  captured.app.emit('will-quit');
  restoreProcessHandlers();
  if (storeVariable !== undefined) process.env.COILWRIGHT_STORE = storeVariable;
  rmSync(dir, { recursive: true, force: true });
});

/** The message boxes main showed, by their headline, in order. */
const boxes = () => electron.dialog.showMessageBox.mock.calls.map((args: unknown[]) => (args.at(-1) as MessageBoxOptions).message);

describe('a large store found damaged after the desktop app opened it', () => {
  it('says the store is damaged, restores the chosen backup in its place and keeps the damaged file beside it', async () => {
    await vi.waitFor(() => expect(boxes()).toContain('Backup restored'), { timeout: 30_000, interval: 200 });
    expect(boxes().slice(0, 2)).toEqual(['The job store is damaged', 'Replace every job and setting with the backup?']);
    expect(readdirSync(paths.userData).some((name) => /^coilwright\.db\.damaged-.*Z$/.test(name))).toBe(true);
    const sent = FakeBrowserWindow.all[0]!.webContents.send.mock.calls.map(([channel, payload]) => [channel, payload]);
    expect(sent).toContainEqual([MENU_COMMAND_CHANNEL, 'data-changed']);
  });

  it('works on the restored store: its check passes and a save goes through', async () => {
    await vi.waitFor(async () => expect((await call('storeInfo', {})).value.damageCheck).toMatchObject({ state: 'passed' }), { timeout: 30_000, interval: 200 });
    expect((await call('storeInfo', {})).value.readOnly).toBeNull();
    const first = (await call('listJobs', {})).value as { jobs: { id: number }[] };
    const job = await call('getJob', { id: first.jobs[0]!.id });
    expect(job.ok).toBe(true);
    const saved = await call('createJob', { customer: { name: 'Harrow Gate Hydraulics (demo)' }, partNumber: 'HG-41', spec: {
      kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 1.6, outerDiameter: 14, totalCoils: 9, ends: 'closed-ground', freeLength: 38,
    } });
    expect(saved.ok).toBe(true);
  });
});
