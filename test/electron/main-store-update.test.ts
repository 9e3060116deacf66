/**
 * The shell booted against the mocked electron module on a store that is over the notice's size (two scanned
 * drawing sheets attached to a demo job) and one schema version behind: a small window says what is happening
 * while a worker thread updates the store, and it goes once the store is open and the main window shows.
 */
import Database from 'better-sqlite3';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { LATEST_VERSION, schemaVersion, storeBytes } from '../../db';
import { openShopStore } from '../../service/host/first-run';
import { writeStoreOneVersionBehind } from '../support/large-store';
import { buildUpdateWorker } from '../support/update-worker';
import { FakeBrowserWindow, captured, paths, processHandlersRestorer } from './electron-mock';
import { updateNoticePage } from '../../electron/shell/store-update-notice';
import { NOTICE_FROM_BYTES, pendingLargeUpdate } from '../../service/host/store-update';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
const storeFile = () => path.join(paths.userData, 'coilwright.db');
const storeVariable = process.env.COILWRIGHT_STORE;
const restoreProcessHandlers = processHandlersRestorer();

beforeAll(async () => {
  delete process.env.COILWRIGHT_STORE;
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-main-update-'));
  Object.assign(paths, { userData: path.join(dir, 'user'), appPath: path.join(dir, 'app'), temp: path.join(dir, 'temp') });
  mkdirSync(path.join(paths.appPath, 'dist', 'renderer'), { recursive: true });
  writeFileSync(path.join(paths.appPath, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Coilwright</title>');
  mkdirSync(paths.userData, { recursive: true });
  writeStoreOneVersionBehind(storeFile(), 2);
  expect(storeBytes(storeFile())).toBeGreaterThan(NOTICE_FROM_BYTES);
  await buildUpdateWorker(paths.appPath);
  await import('../../electron/main');
  await vi.waitFor(() => expect(FakeBrowserWindow.all).toHaveLength(2), { timeout: 30_000, interval: 100 });
}, 60_000);

afterAll(() => {
  captured.app.emit('will-quit');
  restoreProcessHandlers();
  if (storeVariable !== undefined) process.env.COILWRIGHT_STORE = storeVariable;
  rmSync(dir, { recursive: true, force: true });
});

describe('a large store one schema version behind, opened by the desktop app', () => {
  it('shows the update notice first, with no script, and closes it once the store is open', () => {
    const [notice, main] = FakeBrowserWindow.all as [FakeBrowserWindow, FakeBrowserWindow];
    const url = notice.loadURL.mock.calls[0]![0];
    expect(url.startsWith('data:text/html;charset=utf-8,')).toBe(true);
    const page = decodeURIComponent(url.slice('data:text/html;charset=utf-8,'.length));
    expect(page).toContain('Updating the job store for this version of Coilwright');
    expect(page).toContain(`from schema version ${LATEST_VERSION - 1} to ${LATEST_VERSION}`);
    expect(page).not.toMatch(/<script/i);
    expect(page).toContain("default-src 'none'");
    expect((notice.options.webPreferences as Record<string, unknown>).sandbox).toBe(true);
    expect(notice.destroyed).toBe(true);
    expect(main.destroyed).toBe(false);
    expect(main.loadURL).toHaveBeenCalledWith('app://coilwright/index.html');
  });

  it('updates the store in a worker thread, leaves it at this version and says in the log how long it took', () => {
    const db = new Database(storeFile(), { readonly: true });
    expect(schemaVersion(db)).toBe(LATEST_VERSION);
    db.close();
    const log = readFileSync(path.join(paths.userData, 'logs', 'coilwright.log'), 'utf8');
    expect(log).toMatch(new RegExp(`updating .*coilwright\\.db \\(\\d+ bytes\\) from schema version ${LATEST_VERSION - 1} to ${LATEST_VERSION}`));
    expect(log).toContain('updated in a worker thread');
    expect(log).toMatch(/the update took \d+\.\d s/);
  });

  it('asks nothing of a store that is up to date, small, new or on a server', () => {
    expect(pendingLargeUpdate(storeFile())).toBeNull();
    expect(pendingLargeUpdate(path.join(dir, 'not-yet-made.db'))).toBeNull();
    expect(pendingLargeUpdate('postgres://estimating@localhost/shop')).toBeNull();
    const small = path.join(dir, 'small.db');
    const opened = openShopStore(small);
    if (!opened.ok) throw new Error(opened.error.message);
    opened.value.store.close();
    const db = new Database(small);
    db.pragma(`user_version = ${LATEST_VERSION - 1}`);
    db.close();
    expect(pendingLargeUpdate(small)).toBeNull();
  });

  it('writes the file name into the page as text', () => {
    const page = updateNoticePage({ file: 'C:\\shop\\<b>jobs</b>.db', from: 19, to: 21, bytes: 3.5e9 });
    expect(page).toContain('C:\\shop\\&#60;b&#62;jobs&#60;/b&#62;.db (3.5 GB)');
  });
});
