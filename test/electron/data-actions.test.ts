import path from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import type { ApiResult } from '../../core/api';
import { createDataActions } from '../../electron/shell/data-actions';
import type { DataDialogs } from '../../electron/shell/data-actions';
import type { DataActionEvent } from '../../core/api/method-names';

function setup(answers: { save?: string | null; open?: string | null; confirm?: boolean }, result: ApiResult<unknown>) {
  const dialogs: DataDialogs & Record<string, ReturnType<typeof vi.fn>> = {
    saveFile: vi.fn(async () => answers.save ?? null),
    openFile: vi.fn(async () => answers.open ?? null),
    confirm: vi.fn(async () => answers.confirm ?? false),
    tell: vi.fn(async () => undefined),
  };
  const call = vi.fn(async () => result);
  const notify = vi.fn();
  const actions = createDataActions({ dialogs, call, notify, documentsDir: '/home/shop/Documents', today: () => '2026-05-06' });
  return { dialogs, call, notify, actions };
}

describe('File menu data actions', () => {
  it('shows how far an export is on the task-bar button, and clears it at the end', async () => {
    const shown: (number | null)[] = [];
    const call = vi.fn(async (_name: string, _input: unknown, long?: { onProgress?: (done: number, total: number) => void }) => {
      for (const done of [0, 250, 500, 500, 1000]) long?.onProgress?.(done, 1000);
      return { ok: true as const, value: { format: 'json', count: 1000, file: '/out/jobs.json' } };
    });
    const dialogs = { saveFile: vi.fn(async () => '/out/jobs.json'), openFile: vi.fn(async () => null), confirm: vi.fn(async () => true), tell: vi.fn(async () => undefined) };
    const actions = createDataActions({ dialogs, call, notify: vi.fn(), progress: (f) => shown.push(f), documentsDir: '/d', today: () => '2026-05-06' });
    await actions.exportJobs();
    expect(shown).toEqual([0, 0.25, 0.5, 1, null]);
  });

  it('tells the window how far the action is at most once per whole percent, then how it ended', async () => {
    const events: DataActionEvent[] = [];
    const call = vi.fn(async (_name: string, _input: unknown, long?: { onProgress?: (done: number, total: number) => void }) => {
      for (let done = 0; done <= 5000; done += 7) long?.onProgress?.(done, 5000);
      long?.onProgress?.(5000, 5000);
      return { ok: true as const, value: { imported: [{ id: 1, number: 'J-1' }] } };
    });
    const dialogs = { saveFile: vi.fn(async () => null), openFile: vi.fn(async () => '/in/jobs.json'), confirm: vi.fn(async () => true), tell: vi.fn(async () => undefined) };
    const actions = createDataActions({ dialogs, call, notify: vi.fn(), report: (e) => events.push(e), documentsDir: '/d', today: () => '2026-05-06' });
    expect(await actions.importJobs({ from: 'window', renumber: true })).toEqual({ outcome: 'done', message: 'Imported 1 job: /in/jobs.json' });
    expect(call).toHaveBeenCalledWith('importJobs', { file: '/in/jobs.json', format: 'json', renumber: true }, expect.anything());
    const running = events.filter((e) => e.state === 'running');
    // The opening word (nothing known yet), then 0 % to 100 % once each: 102 messages for 715 progress calls.
    expect(running).toHaveLength(102);
    expect(running[0]).toEqual({ action: 'importJobs', from: 'window', state: 'running', done: 0, total: 0, cancellable: true });
    expect(running.at(-1)).toEqual({ action: 'importJobs', from: 'window', state: 'running', done: 5000, total: 5000, cancellable: true });
    expect(events.at(-1)).toEqual({ action: 'importJobs', from: 'window', state: 'ended', outcome: 'done', message: 'Imported 1 job: /in/jobs.json' });
  });

  it('cancels the running action through the controller main holds for it, and says nothing was saved', async () => {
    let started!: () => void;
    const running = new Promise<void>((resolve) => { started = resolve; });
    const call = vi.fn(async (_name: string, _input: unknown, long?: { signal?: AbortSignal }) => {
      started();
      await new Promise((resolve) => long!.signal!.addEventListener('abort', resolve));
      return { ok: false as const, error: { code: 'cancelled', message: 'the backup was cancelled: no file was written', path: '' } };
    });
    const events: DataActionEvent[] = [];
    const dialogs = { saveFile: vi.fn(async () => '/b/shop.db'), openFile: vi.fn(async () => null), confirm: vi.fn(async () => true), tell: vi.fn(async () => undefined) };
    const actions = createDataActions({ dialogs, call, notify: vi.fn(), report: (e) => events.push(e), documentsDir: '/d', today: () => '2026-05-06' });
    expect(actions.cancel('backup')).toBe(false);
    const outcome = actions.backup({ from: 'window' });
    await running;
    expect(actions.cancel('exportJobs')).toBe(false);
    expect(actions.cancel('backup')).toBe(true);
    expect(await outcome).toEqual({ outcome: 'cancelled', message: 'Backup cancelled: nothing was saved.' });
    expect(events.at(-1)).toMatchObject({ state: 'ended', outcome: 'cancelled' });
    expect(dialogs.tell).not.toHaveBeenCalled();
    expect(actions.cancel('backup')).toBe(false);
  });

  it('shows a restore as running without a measure and without Cancel', async () => {
    const events: DataActionEvent[] = [];
    const call = vi.fn(async () => ({ ok: true as const, value: { restoredFrom: '/b/shop.db', previousKeptAs: null, version: 3 } }));
    const dialogs = { saveFile: vi.fn(async () => null), openFile: vi.fn(async () => '/b/shop.db'), confirm: vi.fn(async () => true), tell: vi.fn(async () => undefined) };
    const actions = createDataActions({ dialogs, call, notify: vi.fn(), report: (e) => events.push(e), documentsDir: '/d', today: () => '2026-05-06' });
    await actions.restore();
    expect(events).toEqual([
      { action: 'restore', from: 'menu', state: 'running', done: 0, total: 0, cancellable: false },
      { action: 'restore', from: 'menu', state: 'ended', outcome: 'done', message: 'Backup restored: Restored from /b/shop.db' },
    ]);
  });

  it('refuses a second action while one runs, even while the first one’s dialog is still open', async () => {
    let choose!: (file: string | null) => void;
    const dialogs = { saveFile: vi.fn(() => new Promise<string | null>((resolve) => { choose = resolve; })), openFile: vi.fn(async () => '/in/j.json'), confirm: vi.fn(async () => true), tell: vi.fn(async () => undefined) };
    const call = vi.fn(async () => ({ ok: true as const, value: { restoredFrom: '/in/j.json', previousKeptAs: null, version: 3 } }));
    const actions = createDataActions({ dialogs, call, notify: vi.fn(), documentsDir: '/d', today: () => '2026-05-06' });
    const first = actions.backup();
    await vi.waitFor(() => expect(dialogs.saveFile).toHaveBeenCalled());
    expect(await actions.restore()).toMatchObject({ outcome: 'not-started' });
    expect(dialogs.openFile).not.toHaveBeenCalled();
    choose(null);
    expect(await first).toEqual({ outcome: 'not-started', message: 'No file was chosen.' });
    // Over (here: dismissed), it no longer stands in the way.
    expect(await actions.restore()).toMatchObject({ outcome: 'done' });
  });

  it('refuses a second action while one runs, before any dialog', async () => {
    let finish!: () => void;
    const call = vi.fn(() => new Promise<{ ok: true; value: unknown }>((resolve) => { finish = () => resolve({ ok: true, value: { format: 'json', count: 0, file: '/o/j.json' } }); }));
    const dialogs = { saveFile: vi.fn(async () => '/o/j.json'), openFile: vi.fn(async () => '/in/j.json'), confirm: vi.fn(async () => true), tell: vi.fn(async () => undefined) };
    const actions = createDataActions({ dialogs, call, notify: vi.fn(), documentsDir: '/d', today: () => '2026-05-06' });
    const first = actions.exportJobs();
    await vi.waitFor(() => expect(call).toHaveBeenCalledTimes(1));
    expect(await actions.importJobs()).toMatchObject({ outcome: 'not-started', message: 'The export is still running: wait for it to end, or cancel it, before the import.' });
    expect(dialogs.openFile).not.toHaveBeenCalled();
    finish();
    expect(await first).toMatchObject({ outcome: 'done' });
  });

  it('does nothing when a dialog is cancelled', async () => {
    const s = setup({}, { ok: true, value: {} });
    await s.actions.backup();
    await s.actions.restore();
    await s.actions.importJobs();
    await s.actions.exportJobs();
    expect(s.call).not.toHaveBeenCalled();
    expect(s.notify).not.toHaveBeenCalled();
  });

  it('backs up to the chosen file and says where', async () => {
    const s = setup({ save: '/backups/shop.db' }, { ok: true, value: { file: '/backups/shop.db', bytes: 20480, version: 3 } });
    await s.actions.backup();
    expect(s.dialogs.saveFile).toHaveBeenCalledWith(expect.objectContaining({
      defaultPath: path.join('/home/shop/Documents', 'coilwright-backup-2026-05-06.db'),
    }));
    expect(s.call).toHaveBeenCalledWith('backup', { file: '/backups/shop.db' }, expect.anything());
    expect(s.dialogs.tell).toHaveBeenCalledWith('info', 'Backup saved', '/backups/shop.db (20 kB)');
  });

  it('restores only after the user confirms, then refreshes the renderer', async () => {
    const refused = setup({ open: '/backups/shop.db', confirm: false }, { ok: true, value: {} });
    await refused.actions.restore();
    expect(refused.call).not.toHaveBeenCalled();
    const value = { restoredFrom: '/backups/shop.db', previousKeptAs: '/u/coilwright.db.before-restore-x', version: 3 };
    const s = setup({ open: '/backups/shop.db', confirm: true }, { ok: true, value });
    await s.actions.restore();
    expect(s.call).toHaveBeenCalledWith('restore', { file: '/backups/shop.db' }, expect.anything());
    expect(s.notify).toHaveBeenCalledWith('data-changed');
  });

  it('imports and exports in the format the file name says', async () => {
    const imp = setup({ open: '/in/jobs.CSV' }, { ok: true, value: { imported: [{ id: 1, number: 'J-1' }] } });
    await imp.actions.importJobs();
    expect(imp.call).toHaveBeenCalledWith('importJobs', { file: '/in/jobs.CSV', format: 'csv' }, expect.anything());
    expect(imp.dialogs.tell).toHaveBeenCalledWith('info', 'Imported 1 job', '/in/jobs.CSV');
    expect(imp.notify).toHaveBeenCalledWith('data-changed');
    const exp = setup({ save: '/out/jobs.json' }, { ok: true, value: { format: 'json', count: 31, file: '/out/jobs.json' } });
    await exp.actions.exportJobs();
    // The system's save dialog asked before replacing a file, so main may replace it.
    expect(exp.call).toHaveBeenCalledWith('exportJobs', { format: 'json', file: '/out/jobs.json', force: true }, expect.anything());
    expect(exp.dialogs.tell).toHaveBeenCalledWith('info', 'Exported 31 jobs', '/out/jobs.json');
    // The Data screen's choices: CSV first in the save dialog, and only the jobs of one status.
    const csv = setup({ save: '/out/quoted.csv' }, { ok: true, value: { format: 'csv', count: 4, file: '/out/quoted.csv' } });
    await csv.actions.exportJobs({ format: 'csv', status: 'quoted', from: 'window' });
    expect(csv.dialogs.saveFile).toHaveBeenCalledWith(expect.objectContaining({ defaultPath: path.join('/home/shop/Documents', 'coilwright-jobs-2026-05-06.csv') }));
    expect(csv.call).toHaveBeenCalledWith('exportJobs', { format: 'csv', file: '/out/quoted.csv', force: true, status: 'quoted' }, expect.anything());
  });

  it('shows the service’s error and does not refresh', async () => {
    const s = setup({ open: '/in/jobs.json' }, { ok: false, error: { code: 'import-invalid', message: 'row 3: wire diameter missing', path: 'rows[2]' } });
    await s.actions.importJobs();
    expect(s.dialogs.tell).toHaveBeenCalledWith('warning', 'Import failed', 'row 3: wire diameter missing');
    expect(s.notify).not.toHaveBeenCalled();
  });
});
