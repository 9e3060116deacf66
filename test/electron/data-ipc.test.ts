import { describe, expect, it, vi } from 'vitest';
import type { IpcMainLike } from '../../electron/ipc';
import { registerDataActionIpc } from '../../electron/shell/data-ipc';
import { createDataActions } from '../../electron/shell/data-actions';
import { ipcEvent } from './electron-mock';

const trusted = ipcEvent('app://coilwright/index.html');

function setup(confirm: boolean) {
  const handlers = new Map<string, (event: unknown, raw: unknown) => Promise<unknown>>();
  const ipcMain: IpcMainLike = { handle: (c, l) => void handlers.set(c, l as never) };
  const call = vi.fn(async () => ({ ok: true as const, value: { restoredFrom: '/b/shop.db', previousKeptAs: null, version: 3 } }));
  const dialogs = {
    saveFile: vi.fn(async () => '/b/new.db'), openFile: vi.fn(async () => '/b/shop.db'),
    confirm: vi.fn(async () => confirm), tell: vi.fn(async () => undefined),
  };
  const actions = createDataActions({ dialogs, call, notify: vi.fn(), documentsDir: '/home/shop', today: () => '2026-05-06' });
  registerDataActionIpc(ipcMain, actions);
  return {
    run: (raw: unknown, options?: unknown) => (handlers.get('data:action') as (e: unknown, r: unknown, o?: unknown) => Promise<unknown>)(trusted, raw, options),
    cancel: (raw: unknown) => handlers.get('data:cancel')!(trusted, raw),
    call, dialogs,
  };
}

describe('data actions asked for by the window', () => {
  it('refuses anything but an action name: the window cannot hand main a path', async () => {
    const s = setup(true);
    for (const raw of ['/etc/passwd', { name: 'restore', file: '/tmp/x.db' }, 'backup ', 42]) {
      expect(await s.run(raw)).toMatchObject({ ok: false, error: { code: 'unknown-data-action', path: 'name' } });
    }
    expect(s.call).not.toHaveBeenCalled();
  });

  it('passes the Data screen\'s plain choices on, and refuses a path or anything else among them', async () => {
    const s = setup(true);
    for (const options of [{ file: '/tmp/x.json' }, { status: 'scrapped' }, { renumber: 'yes' }, 'json']) {
      expect(await s.run('exportJobs', options)).toMatchObject({ ok: false, error: { code: 'invalid-data-action-options' } });
    }
    expect(s.call).not.toHaveBeenCalled();
    await s.run('exportJobs', { format: 'csv', status: 'quoted' });
    expect(s.dialogs.saveFile).toHaveBeenCalledWith(expect.objectContaining({ defaultPath: expect.stringMatching(/\.csv$/) }));
    expect(s.call).toHaveBeenCalledWith('exportJobs', { format: 'json', file: '/b/new.db', force: true, status: 'quoted' }, expect.anything());
  });

  it('cancels only what can be stopped, by name', async () => {
    const s = setup(true);
    for (const raw of ['restore', 'format-disk', { name: 'backup' }]) {
      expect(await s.cancel(raw)).toMatchObject({ ok: false, error: { code: 'not-cancellable', path: 'name' } });
    }
    expect(await s.cancel('backup')).toEqual({ ok: true, value: { cancelled: false } });
  });

  it('runs a restore only after main\'s own confirmation, with the file main\'s dialog chose', async () => {
    const refused = setup(false);
    expect(await refused.run('restore')).toEqual({ ok: true, value: { finished: 'restore', outcome: 'not-started', message: 'The store was left as it is.' } });
    expect(refused.dialogs.confirm).toHaveBeenCalled();
    expect(refused.call).not.toHaveBeenCalled();
    const s = setup(true);
    await s.run('restore');
    expect(s.call).toHaveBeenCalledWith('restore', { file: '/b/shop.db' }, expect.anything());
  });

  it('refuses a window that is not the app', async () => {
    const s = setup(true);
    const handlers = new Map<string, (event: unknown, raw: unknown) => Promise<unknown>>();
    registerDataActionIpc({ handle: (c, l) => void handlers.set(c, l as never) }, { backup: vi.fn(), restore: vi.fn(), importJobs: vi.fn(), exportJobs: vi.fn(), cancel: vi.fn() });
    expect(await handlers.get('data:action')!(ipcEvent('https://evil.example/'), 'backup')).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
    expect(await handlers.get('data:cancel')!(ipcEvent('https://evil.example/'), 'backup')).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
    void s;
  });
});
