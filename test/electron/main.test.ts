/** The whole shell booted against the mocked electron module: what a real start wires up. */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { MenuItemConstructorOptions } from 'electron';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { methodNames } from '../../core/api';
import { apiChannel } from '../../core/api/method-names';
import { CONTENT_SECURITY_POLICY } from '../../service/host/csp';
import { FakeBrowserWindow, FakeWebContents, captured, electron, ipcEvent, navigationEvent, paths } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
let window: FakeBrowserWindow;
type ProcessEvent = 'uncaughtException' | 'unhandledRejection';
const processEvents: ProcessEvent[] = ['uncaughtException', 'unhandledRejection'];
const listenersOf = (event: ProcessEvent): ((...args: unknown[]) => void)[] =>
  process.listeners(event as 'uncaughtException') as unknown as ((...args: unknown[]) => void)[];
const before = new Map(processEvents.map((e) => [e, listenersOf(e)]));
const added = (event: ProcessEvent) => listenersOf(event).filter((l) => !before.get(event)!.includes(l));
const fontsBefore = process.env.COILWRIGHT_FONTS;

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-main-'));
  Object.assign(paths, { userData: path.join(dir, 'user'), appPath: path.join(dir, 'app'), temp: path.join(dir, 'temp') });
  mkdirSync(path.join(paths.appPath, 'dist', 'renderer'), { recursive: true });
  writeFileSync(path.join(paths.appPath, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Coilwright</title>');
  delete process.env.COILWRIGHT_FONTS;
  await import('../../electron/main');
  await vi.waitFor(() => expect(FakeBrowserWindow.all).toHaveLength(1));
  window = FakeBrowserWindow.all[0]!;
});

afterAll(() => {
  captured.app.emit('will-quit');
  for (const event of processEvents) for (const l of added(event)) process.off(event as 'uncaughtException', l);
  if (fontsBefore === undefined) delete process.env.COILWRIGHT_FONTS;
  else process.env.COILWRIGHT_FONTS = fontsBefore;
  rmSync(dir, { recursive: true, force: true });
});

const trusted = ipcEvent('app://coilwright/index.html');
const invoke = (channel: string, event: unknown, input: unknown) => captured.ipcMain.get(channel)!(event, input);

describe('starting the shell', () => {
  it('declares app:// privileged before ready and holds the single-instance lock', () => {
    expect(electron.protocol.registerSchemesAsPrivileged).toHaveBeenCalledTimes(1);
    expect(electron.app.requestSingleInstanceLock).toHaveBeenCalled();
    expect(electron.app.quit).not.toHaveBeenCalled();
  });

  it('opens the store in userData and puts the demo shop in it on the first run', async () => {
    expect(existsSync(path.join(paths.userData, 'coilwright.db'))).toBe(true);
    const page = await invoke('api:listJobs', trusted, {}) as { ok: boolean; value: { total: number } };
    expect(page.ok).toBe(true);
    expect(page.value.total).toBeGreaterThan(0);
  });

  it('creates the main window with the secure preferences and the preload, on app://coilwright', () => {
    expect(window.options.webPreferences).toEqual({
      sandbox: true, contextIsolation: true, nodeIntegration: false, nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false, webviewTag: false, webSecurity: true, allowRunningInsecureContent: false,
      experimentalFeatures: false, navigateOnDragDrop: false, spellcheck: false,
      preload: path.join(paths.appPath, 'dist', 'electron', 'preload.cjs'),
    });
    expect(window.loadURL).toHaveBeenCalledWith('app://coilwright/index.html');
  });

  it('serves the built UI through the app protocol with the CSP header', async () => {
    const res = await captured.protocols.get('app')!(new Request('app://coilwright/index.html'));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
  });

  it('registers every API method, the two PDF channels, the data actions and the request-sheet dialog, all sender-checked', async () => {
    expect([...captured.ipcMain.keys()].sort()).toEqual([...methodNames.map(apiChannel), 'pdf:preview', 'pdf:save', 'data:action', 'data:cancel', 'file:request-sheet'].sort());
    for (const channel of captured.ipcMain.keys()) {
      expect(await invoke(channel, ipcEvent('https://evil.example/'), {}), channel).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
    }
  });

  it('denies permission requests on the default session', () => {
    const handler = electron.session.defaultSession.setPermissionRequestHandler.mock.calls[0]![0] as
      (c: unknown, p: string, cb: (ok: boolean) => void) => void;
    const callback = vi.fn();
    handler({}, 'media', callback);
    expect(callback).toHaveBeenCalledWith(false);
  });

  it('hardens every web contents that is created', () => {
    const contents = new FakeWebContents();
    captured.app.emit('web-contents-created', {}, contents);
    const away = navigationEvent('https://example.com/');
    contents.emit('will-navigate', away);
    expect(away.preventDefault).toHaveBeenCalled();
    expect(contents.windowOpenHandler!({ url: 'https://example.com/' })).toEqual({ action: 'deny' });
    expect(electron.shell.openExternal).toHaveBeenCalledWith('https://example.com/');
  });

  it('sends menu commands to the main window', () => {
    const template = electron.Menu.setApplicationMenu.mock.calls[0]![0] as unknown as { template: MenuItemConstructorOptions[] };
    const file = template.template.find((m) => m.label === '&File')!;
    const newJob = (file.submenu as MenuItemConstructorOptions[]).find((i) => i.label === 'New job')!;
    (newJob.click as (i: unknown, w: unknown, e: unknown) => void)({}, window, {});
    expect(window.webContents.send).toHaveBeenCalledWith('menu-command', 'new-job');
  });

  it('points the PDF writer at the project fonts', () => {
    expect(process.env.COILWRIGHT_FONTS).toBe(path.join(paths.appPath, 'assets', 'fonts'));
  });

  it('logs an uncaught exception, shows one dialog and stays up', async () => {
    const [listener] = added('uncaughtException');
    expect(listener).toBeDefined();
    listener!(new Error('spring wound too tight'));
    await vi.waitFor(() => expect(electron.dialog.showMessageBox).toHaveBeenCalled());
    const [options] = electron.dialog.showMessageBox.mock.calls.at(-1) as unknown as [{ type: string; detail: string }];
    expect(options.type).toBe('error');
    expect(options.detail).toContain('spring wound too tight');
    expect(readFileSync(path.join(paths.userData, 'logs', 'coilwright.log'), 'utf8')).toContain('spring wound too tight');
    expect(electron.app.quit).not.toHaveBeenCalled();
  });

  it('reports a renderer crash and reloads the window once, not in a loop', async () => {
    const shown = electron.dialog.showMessageBox.mock.calls.length;
    window.webContents.emit('render-process-gone', {}, { reason: 'crashed', exitCode: 1 });
    window.webContents.emit('render-process-gone', {}, { reason: 'oom', exitCode: 1 });
    expect(window.reload).toHaveBeenCalledTimes(1);
    await vi.waitFor(() => expect(electron.dialog.showMessageBox.mock.calls.length).toBeGreaterThan(shown));
    expect(readFileSync(path.join(paths.userData, 'logs', 'coilwright.log'), 'utf8')).toContain('[renderer] Error: the window stopped (crashed)');
    window.webContents.emit('render-process-gone', {}, { reason: 'clean-exit', exitCode: 0 });
    expect(window.reload).toHaveBeenCalledTimes(1);
  });

  it('remembers the window bounds when the window closes', () => {
    window.close();
    expect(JSON.parse(readFileSync(path.join(paths.userData, 'window-state.json'), 'utf8')))
      .toEqual({ x: 10, y: 20, width: 1000, height: 700, maximized: false });
  });
});
