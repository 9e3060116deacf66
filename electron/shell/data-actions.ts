import path from 'node:path';
import type { ApiResult } from '../../core/api';
import type { FileActionName, LongRun } from '../../service/api/files';
import type { BackupResult, ExportResult, ImportResult, RestoreResult } from '../../core/api/store-types';
import type { MenuCommand } from '../../core/api/method-names';

export interface FileFilter {
  name: string;
  extensions: string[];
}

/** The dialogs the data actions need, with electron's window plumbing kept in main.ts. */
export interface DataDialogs {
  saveFile(options: { title: string; defaultPath: string; filters: FileFilter[] }): Promise<string | null>;
  openFile(options: { title: string; filters: FileFilter[] }): Promise<string | null>;
  confirm(message: string, detail: string, confirmLabel: string): Promise<boolean>;
  tell(kind: 'info' | 'warning', message: string, detail: string): Promise<void>;
}

export interface DataActionDeps {
  dialogs: DataDialogs;
  /** The host's file actions (not the contract): paths come only from the dialogs above. */
  call(name: FileActionName, input: unknown, long?: LongRun): Promise<ApiResult<unknown>>;
  /** How far a backup, export or import is (0–1), shown on the window's task-bar button; null clears it. */
  progress?: (fraction: number | null) => void;
  /** Tells the renderer to reload what it shows. */
  notify(command: MenuCommand): void;
  documentsDir: string;
  today: () => string;
}

const backupFilter: FileFilter = { name: 'Coilwright backup', extensions: ['db'] };
const jobFilters: FileFilter[] = [{ name: 'Jobs (JSON)', extensions: ['json'] }, { name: 'Jobs (CSV)', extensions: ['csv'] }];
const failedTitle: Record<FileActionName, string> = {
  backup: 'Backup failed', restore: 'Restore failed', importJobs: 'Import failed', exportJobs: 'Export failed',
};
const formatOf = (file: string): 'json' | 'csv' => (path.extname(file).toLowerCase() === '.csv' ? 'csv' : 'json');

/** Progress to the task-bar button at most every 1 %, cleared when the action ends. */
async function callShowingProgress(deps: DataActionDeps, name: FileActionName, input: unknown): Promise<ApiResult<unknown>> {
  const show = deps.progress;
  if (!show) return deps.call(name, input);
  let shown = -1;
  try {
    return await deps.call(name, input, {
      onProgress: (done, total) => {
        const percent = total > 0 ? Math.floor((100 * done) / total) : 0;
        if (percent !== shown) show((shown = percent) / 100);
      },
    });
  } finally {
    show(null);
  }
}

async function run<T>(deps: DataActionDeps, name: FileActionName, input: unknown, done: (value: T) => [string, string]): Promise<boolean> {
  const result = await callShowingProgress(deps, name, input);
  if (!result.ok) {
    await deps.dialogs.tell('warning', failedTitle[name], result.error.message);
    return false;
  }
  const [message, detail] = done(result.value as T);
  await deps.dialogs.tell('info', message, detail);
  return true;
}

/**
 * Backup, restore, import and export from the File menu or the Data screen: a file dialog in main, the
 * confirmation in main, then the host's file action. The window only names the action.
 */
export function createDataActions(deps: DataActionDeps) {
  const { dialogs } = deps;
  return {
    async backup(): Promise<void> {
      const defaultPath = path.join(deps.documentsDir, `coilwright-backup-${deps.today()}.db`);
      const file = await dialogs.saveFile({ title: 'Back up the job store', defaultPath, filters: [backupFilter] });
      if (file === null) return;
      await run<BackupResult>(deps, 'backup', { file }, (v) => ['Backup saved', `${v.file} (${Math.ceil(v.bytes / 1024)} kB)`]);
    },
    async restore(): Promise<void> {
      const file = await dialogs.openFile({ title: 'Restore from a backup', filters: [backupFilter] });
      if (file === null) return;
      const sure = await dialogs.confirm('Replace every job and setting with the backup?',
        `${file}\n\nThe store as it is now is kept beside it, so this can be undone by restoring that file.`, 'Restore');
      if (!sure) return;
      const done = await run<RestoreResult>(deps, 'restore', { file }, (v) => ['Backup restored',
        v.previousKeptAs ? `The previous store was kept as ${v.previousKeptAs}` : `Restored from ${v.restoredFrom}`]);
      if (done) deps.notify('data-changed');
    },
    async importJobs(): Promise<void> {
      const file = await dialogs.openFile({ title: 'Import jobs', filters: jobFilters });
      if (file === null) return;
      const done = await run<ImportResult>(deps, 'importJobs', { file, format: formatOf(file) },
        (v) => [`Imported ${v.imported.length} job${v.imported.length === 1 ? '' : 's'}`, file]);
      if (done) deps.notify('data-changed');
    },
    async exportJobs(): Promise<void> {
      const defaultPath = path.join(deps.documentsDir, `coilwright-jobs-${deps.today()}.json`);
      const file = await dialogs.saveFile({ title: 'Export jobs', defaultPath, filters: jobFilters });
      if (file === null) return;
      // The system's save dialog has asked before replacing a file, so the export may replace it.
      await run<ExportResult>(deps, 'exportJobs', { format: formatOf(file), file, force: true },
        (v) => [`Exported ${v.count} job${v.count === 1 ? '' : 's'}`,
          [file, ...(v.problems ?? []).map((p) => `Exported as stored, to be put right: ${p.message}`)].join('\n')]);
    },
  };
}
