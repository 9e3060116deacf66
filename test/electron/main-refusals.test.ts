/** Starts that must not go ahead: the shell says why and quits instead of showing a window without a store. */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { FakeBrowserWindow, captured, electron, paths, processHandlersRestorer } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
const restoreProcessHandlers = processHandlersRestorer();

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-main-refused-'));
  Object.assign(paths, { userData: path.join(dir, 'user'), appPath: path.join(dir, 'app'), temp: path.join(dir, 'temp') });
  mkdirSync(path.join(paths.appPath, 'dist', 'renderer'), { recursive: true });
  writeFileSync(path.join(paths.appPath, 'dist', 'renderer', 'index.html'), '<!doctype html>');
  mkdirSync(paths.userData, { recursive: true });
  writeFileSync(path.join(paths.userData, 'coilwright.db'), 'a spreadsheet someone renamed');
  await import('../../electron/main');
  await vi.waitFor(() => expect(electron.app.quit).toHaveBeenCalled());
});

afterAll(() => {
  restoreProcessHandlers();
  rmSync(dir, { recursive: true, force: true });
});

describe('a store that cannot be opened', () => {
  it('is explained in a dialog and logged, and the app quits without a window or IPC', () => {
    expect(electron.dialog.showErrorBox).toHaveBeenCalledWith('The job store cannot be opened', expect.stringContaining('not a Coilwright store'));
    expect(readFileSync(path.join(paths.userData, 'logs', 'coilwright.log'), 'utf8')).toContain('The job store cannot be opened');
    expect(FakeBrowserWindow.all).toHaveLength(0);
    expect(captured.ipcMain.size).toBe(0);
    expect(readFileSync(path.join(paths.userData, 'coilwright.db'), 'utf8')).toBe('a spreadsheet someone renamed');
  });
});
