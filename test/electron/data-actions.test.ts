import path from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import type { ApiResult } from '../../core/api';
import { createDataActions } from '../../electron/shell/data-actions';
import type { DataDialogs } from '../../electron/shell/data-actions';

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
    expect(s.call).toHaveBeenCalledWith('backup', { file: '/backups/shop.db' });
    expect(s.dialogs.tell).toHaveBeenCalledWith('info', 'Backup saved', '/backups/shop.db (20 kB)');
  });

  it('restores only after the user confirms, then refreshes the renderer', async () => {
    const refused = setup({ open: '/backups/shop.db', confirm: false }, { ok: true, value: {} });
    await refused.actions.restore();
    expect(refused.call).not.toHaveBeenCalled();
    const value = { restoredFrom: '/backups/shop.db', previousKeptAs: '/u/coilwright.db.before-restore-x', version: 3 };
    const s = setup({ open: '/backups/shop.db', confirm: true }, { ok: true, value });
    await s.actions.restore();
    expect(s.call).toHaveBeenCalledWith('restore', { file: '/backups/shop.db' });
    expect(s.notify).toHaveBeenCalledWith('data-changed');
  });

  it('imports and exports in the format the file name says', async () => {
    const imp = setup({ open: '/in/jobs.CSV' }, { ok: true, value: { imported: [{ id: 1, number: 'J-1' }] } });
    await imp.actions.importJobs();
    expect(imp.call).toHaveBeenCalledWith('importJobs', { file: '/in/jobs.CSV', format: 'csv' });
    expect(imp.dialogs.tell).toHaveBeenCalledWith('info', 'Imported 1 job', '/in/jobs.CSV');
    expect(imp.notify).toHaveBeenCalledWith('data-changed');
    const exp = setup({ save: '/out/jobs.json' }, { ok: true, value: { format: 'json', count: 31, file: '/out/jobs.json' } });
    await exp.actions.exportJobs();
    // The system's save dialog asked before replacing a file, so main may replace it.
    expect(exp.call).toHaveBeenCalledWith('exportJobs', { format: 'json', file: '/out/jobs.json', force: true });
    expect(exp.dialogs.tell).toHaveBeenCalledWith('info', 'Exported 31 jobs', '/out/jobs.json');
  });

  it('shows the service’s error and does not refresh', async () => {
    const s = setup({ open: '/in/jobs.json' }, { ok: false, error: { code: 'import-invalid', message: 'row 3: wire diameter missing', path: 'rows[2]' } });
    await s.actions.importJobs();
    expect(s.dialogs.tell).toHaveBeenCalledWith('warning', 'Import failed', 'row 3: wire diameter missing');
    expect(s.notify).not.toHaveBeenCalled();
  });
});
