/**
 * The shell booted against the mocked electron module: a data action started from the window sends its
 * progress to the window, and the window's Cancel stops it leaving nothing behind (no file, no job).
 */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import type { DataActionEvent } from '../../core/api/method-names';
import { FakeBrowserWindow, captured, electron, ipcEvent, paths, processHandlersRestorer } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
let out: string;
let window: FakeBrowserWindow;
const restoreProcessHandlers = processHandlersRestorer();
const trusted = ipcEvent('app://coilwright/index.html');
const invoke = (channel: string, ...args: unknown[]) => captured.ipcMain.get(channel)!(trusted, ...args);

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-data-progress-'));
  out = path.join(dir, 'out');
  mkdirSync(out);
  Object.assign(paths, { userData: path.join(dir, 'user'), appPath: path.join(dir, 'app'), temp: path.join(dir, 'temp') });
  mkdirSync(path.join(paths.appPath, 'dist', 'renderer'), { recursive: true });
  writeFileSync(path.join(paths.appPath, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Coilwright</title>');
  await import('../../electron/main');
  await vi.waitFor(() => expect(FakeBrowserWindow.all).toHaveLength(1));
  window = FakeBrowserWindow.all[0]!;
});

afterAll(() => {
  captured.app.emit('will-quit');
  restoreProcessHandlers();
  rmSync(dir, { recursive: true, force: true });
});

beforeEach(() => {
  window.webContents.send.mockReset();
  electron.dialog.showMessageBox.mockClear();
});

/** What main sent the window on the progress channel, in order. */
const progressSent = (): DataActionEvent[] =>
  window.webContents.send.mock.calls.filter(([channel]) => channel === 'data:progress').map(([, event]) => event as DataActionEvent);

/** Presses the window's Cancel as soon as main first says how far the action is. */
function cancelOnFirst(action: string, when: (event: DataActionEvent) => boolean) {
  const answers: Promise<unknown>[] = [];
  window.webContents.send.mockImplementation((channel: string, event: DataActionEvent) => {
    if (channel === 'data:progress' && answers.length === 0 && when(event)) answers.push(invoke('data:cancel', action));
  });
  return answers;
}

const jobCount = async () => ((await invoke('api:listJobs', {})) as { value: { total: number } }).value.total;

describe('a data action started from the window', () => {
  it('sends its progress to the window, at most once per whole percent, then its end', async () => {
    const file = path.join(out, 'all.json');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: file });
    const result = await invoke('data:action', 'exportJobs', { status: undefined });
    expect(result).toMatchObject({ ok: true, value: { finished: 'exportJobs', outcome: 'done' } });
    const events = progressSent();
    const running = events.filter((e) => e.state === 'running');
    expect(running[0]).toEqual({ action: 'exportJobs', from: 'window', state: 'running', done: 0, total: 0, cancellable: true });
    const total = (running.at(-1) as { total: number }).total;
    expect(total).toBeGreaterThan(0);
    expect(running.at(-1)).toMatchObject({ done: total, total });
    const percents = running.slice(1).map((e) => (e.state === 'running' ? Math.floor((100 * e.done) / e.total) : -1));
    expect(new Set(percents).size).toBe(percents.length);
    expect(events.at(-1)).toMatchObject({ action: 'exportJobs', state: 'ended', outcome: 'done' });
    expect(JSON.parse(readFileSync(file, 'utf8'))).toBeTruthy();
    expect(window.setProgressBar).toHaveBeenLastCalledWith(-1);
  });

  it('stops an export on Cancel and leaves no file, not even a partial one', async () => {
    const file = path.join(out, 'cancelled.csv');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: file });
    const answers = cancelOnFirst('exportJobs', (e) => e.state === 'running' && e.total > 0);
    const result = await invoke('data:action', 'exportJobs', { format: 'csv' });
    expect(await answers[0]).toEqual({ ok: true, value: { cancelled: true } });
    expect(result).toEqual({ ok: true, value: { finished: 'exportJobs', outcome: 'cancelled', message: 'Export cancelled: nothing was saved.' } });
    expect(progressSent().at(-1)).toEqual({ action: 'exportJobs', from: 'window', state: 'ended', outcome: 'cancelled', message: 'Export cancelled: nothing was saved.' });
    expect(existsSync(file)).toBe(false);
    expect(readdirSync(out)).toEqual(['all.json']);
    // The user stopped it: no dialog on top of the window's own message.
    expect(electron.dialog.showMessageBox).not.toHaveBeenCalled();
  });

  it('stops an import on Cancel and leaves the store as it was', async () => {
    const before = await jobCount();
    electron.dialog.showOpenDialog.mockResolvedValueOnce({ canceled: false, filePaths: [path.join(out, 'all.json')] });
    const answers = cancelOnFirst('importJobs', (e) => e.state === 'running');
    const result = await invoke('data:action', 'importJobs', { renumber: true });
    expect(await answers[0]).toEqual({ ok: true, value: { cancelled: true } });
    expect(result).toMatchObject({ ok: true, value: { outcome: 'cancelled', message: 'Import cancelled: nothing was imported.' } });
    expect(await jobCount()).toBe(before);
    // The same file imports in full when nobody cancels: the cancel, not the file, stopped it.
    window.webContents.send.mockReset();
    electron.dialog.showOpenDialog.mockResolvedValueOnce({ canceled: false, filePaths: [path.join(out, 'all.json')] });
    expect(await invoke('data:action', 'importJobs', { renumber: true })).toMatchObject({ ok: true, value: { outcome: 'done' } });
    expect(await jobCount()).toBe(2 * before);
    expect(window.webContents.send).toHaveBeenCalledWith('menu-command', 'data-changed');
  });

  it('stops a backup on Cancel and leaves no file beside the chosen name', async () => {
    const file = path.join(out, 'shop-backup.db');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: file });
    const answers = cancelOnFirst('backup', (e) => e.state === 'running');
    const result = await invoke('data:action', 'backup');
    expect(await answers[0]).toEqual({ ok: true, value: { cancelled: true } });
    expect(result).toMatchObject({ ok: true, value: { outcome: 'cancelled', message: 'Backup cancelled: nothing was saved.' } });
    expect(readdirSync(out).filter((f) => f.startsWith('shop-backup'))).toEqual([]);
  });

  it('says Cancel has nothing to stop once the action is over, and refuses to cancel a restore', async () => {
    expect(await invoke('data:cancel', 'exportJobs')).toEqual({ ok: true, value: { cancelled: false } });
    expect(await invoke('data:cancel', 'restore')).toMatchObject({ ok: false, error: { code: 'not-cancellable', path: 'name' } });
  });

  it('shows a File-menu export in the window too, marked as the menu\'s', async () => {
    const file = path.join(out, 'menu.json');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: file });
    const template = electron.Menu.setApplicationMenu.mock.calls[0]![0] as unknown as { template: { label?: string; submenu?: { label?: string; click?: () => void }[] }[] };
    const exportItem = template.template.find((m) => m.label === '&File')!.submenu!.find((i) => i.label === 'Export jobs…')!;
    exportItem.click!();
    await vi.waitFor(() => expect(progressSent().at(-1)).toMatchObject({ action: 'exportJobs', from: 'menu', state: 'ended', outcome: 'done' }));
    expect(progressSent().every((e) => e.from === 'menu')).toBe(true);
    expect(existsSync(file)).toBe(true);
  });
});
