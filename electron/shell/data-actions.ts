import path from 'node:path';
import type { ApiResult } from '../../core/api';
import type { FileActionName, LongRun } from '../../service/api/files';
import type { BackupResult, ExportResult, ImportResult, RestoreResult } from '../../core/api/store-types';
import { dataActionCancelled } from '../../core/api/method-names';
import type {
  CancellableDataAction, DataActionEvent, DataActionName, DataActionOptions, DataActionOutcome, DataActionSource, MenuCommand,
} from '../../core/api/method-names';

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
  /** The window's bar: how far the running action is, then how it ended. */
  report?: (event: DataActionEvent) => void;
  /** Tells the renderer to reload what it shows. */
  notify(command: MenuCommand): void;
  documentsDir: string;
  today: () => string;
}

/** How the window (or the menu) starts an action: with the Data screen's choices, and who asked. */
export interface DataActionRequest extends DataActionOptions {
  from?: DataActionSource;
}

export type DataActionRun = (request?: DataActionRequest) => Promise<DataActionOutcome>;

const backupFilter: FileFilter = { name: 'Coilwright backup', extensions: ['db'] };
const jsonFilter: FileFilter = { name: 'Jobs (JSON)', extensions: ['json'] };
const csvFilter: FileFilter = { name: 'Jobs (CSV)', extensions: ['csv'] };
const failedTitle: Record<FileActionName, string> = {
  backup: 'Backup failed', restore: 'Restore failed', importJobs: 'Import failed', exportJobs: 'Export failed',
};
const formatOf = (file: string): 'json' | 'csv' => (path.extname(file).toLowerCase() === '.csv' ? 'csv' : 'json');
const notStarted = (message: string): DataActionOutcome => ({ outcome: 'not-started', message });
const isCancellable = (name: DataActionName): name is CancellableDataAction => name !== 'restore';
const actionWords: Record<DataActionName, string> = { backup: 'backup', restore: 'restore', importJobs: 'import', exportJobs: 'export' };

/** One data action at a time: the AbortController of the one running, so the window's Cancel can reach it. */
class RunningAction {
  private current: { name: DataActionName; controller: AbortController } | null = null;
  busy(): DataActionName | null {
    return this.current?.name ?? null;
  }
  start(name: DataActionName): AbortSignal {
    this.current = { name, controller: new AbortController() };
    return this.current.controller.signal;
  }
  end(): void {
    this.current = null;
  }
  cancel(name: DataActionName): boolean {
    if (this.current?.name !== name || this.current.controller.signal.aborted) return false;
    this.current.controller.abort();
    return true;
  }
}

/** Progress to the task-bar button and the window at most every 1 %, cleared when the action ends. */
function longRunFor(deps: DataActionDeps, name: FileActionName, from: DataActionSource, signal: AbortSignal): LongRun {
  const cancellable = isCancellable(name);
  let shown = -1;
  deps.report?.({ action: name, from, state: 'running', done: 0, total: 0, cancellable });
  return {
    signal,
    onProgress: (done, total) => {
      const percent = total > 0 ? Math.floor((100 * done) / total) : 0;
      if (percent === shown) return;
      shown = percent;
      deps.progress?.(percent / 100);
      deps.report?.({ action: name, from, state: 'running', done, total, cancellable });
    },
  };
}

interface Ending {
  outcome: DataActionOutcome;
  /** Main's own dialog for a finished or failed action; a cancel was the user's own doing and needs none. */
  dialog?: ['info' | 'warning', string, string];
}

function endingOf<T>(step: Step<T>, result: ApiResult<unknown>): Ending {
  if (result.ok) {
    const [message, detail] = step.done(result.value as T);
    return { outcome: { outcome: 'done', message: `${message}: ${detail}` }, dialog: ['info', message, detail] };
  }
  if (result.error.code === 'cancelled' && isCancellable(step.name)) {
    return { outcome: { outcome: 'cancelled', message: dataActionCancelled[step.name] } };
  }
  return { outcome: { outcome: 'failed', message: result.error.message }, dialog: ['warning', failedTitle[step.name], result.error.message] };
}

interface Step<T> {
  name: FileActionName;
  input: unknown;
  from: DataActionSource;
  done(value: T): [string, string];
}

/**
 * Backup, restore, import and export from the File menu or the Data screen: a file dialog in main, the
 * confirmation in main, then the host's file action. The window only names the action (and the Data
 * screen's choices); it hears how far it is and may cancel it.
 */
export function createDataActions(deps: DataActionDeps) {
  const { dialogs } = deps;
  const running = new RunningAction();

  async function call<T>(step: Step<T>, signal: AbortSignal): Promise<DataActionOutcome> {
    let ending: Ending;
    try {
      ending = endingOf(step, await deps.call(step.name, step.input, longRunFor(deps, step.name, step.from, signal)));
    } catch (e) {
      // The window's bar must not stay up after a fault; main's fault reporter says what went wrong.
      deps.report?.({ action: step.name, from: step.from, state: 'ended', outcome: 'failed', message: (e as Error).message });
      throw e;
    } finally {
      deps.progress?.(null);
    }
    deps.report?.({ action: step.name, from: step.from, state: 'ended', ...ending.outcome });
    if (ending.dialog) await dialogs.tell(...ending.dialog);
    return ending.outcome;
  }

  /**
   * One action at a time, from its first dialog to its end: a second one (the menu's while the Data screen's
   * runs) would race it for the store and the dialogs, so it is refused before any dialog.
   */
  async function exclusive(name: DataActionName, body: (signal: AbortSignal) => Promise<DataActionOutcome>): Promise<DataActionOutcome> {
    const busy = running.busy();
    if (busy !== null) {
      const message = `The ${actionWords[busy]} is still running: wait for it to end, or cancel it, before the ${actionWords[name]}.`;
      await dialogs.tell('warning', failedTitle[name], message);
      return notStarted(message);
    }
    try {
      return await body(running.start(name));
    } finally {
      running.end();
    }
  }

  const actions: Record<DataActionName, DataActionRun> = {
    backup: (request = {}) => exclusive('backup', async (signal) => {
      const defaultPath = path.join(deps.documentsDir, `coilwright-backup-${deps.today()}.db`);
      const file = await dialogs.saveFile({ title: 'Back up the job store', defaultPath, filters: [backupFilter] });
      if (file === null) return notStarted('No file was chosen.');
      return call<BackupResult>({ name: 'backup', input: { file }, from: request.from ?? 'menu',
        done: (v) => ['Backup saved', `${v.file} (${Math.ceil(v.bytes / 1024)} kB)`] }, signal);
    }),
    restore: (request = {}) => exclusive('restore', async (signal) => {
      const file = await dialogs.openFile({ title: 'Restore from a backup', filters: [backupFilter] });
      if (file === null) return notStarted('No file was chosen.');
      const sure = await dialogs.confirm('Replace every job and setting with the backup?',
        `${file}\n\nThe store as it is now is kept beside it, so this can be undone by restoring that file.`, 'Restore');
      if (!sure) return notStarted('The store was left as it is.');
      const outcome = await call<RestoreResult>({ name: 'restore', input: { file }, from: request.from ?? 'menu',
        done: (v) => ['Backup restored', v.previousKeptAs ? `The previous store was kept as ${v.previousKeptAs}` : `Restored from ${v.restoredFrom}`] }, signal);
      if (outcome.outcome === 'done') deps.notify('data-changed');
      return outcome;
    }),
    importJobs: (request = {}) => exclusive('importJobs', async (signal) => {
      const file = await dialogs.openFile({ title: 'Import jobs', filters: [jsonFilter, csvFilter] });
      if (file === null) return notStarted('No file was chosen.');
      const input = { file, format: formatOf(file), ...(request.renumber !== undefined ? { renumber: request.renumber } : {}) };
      const outcome = await call<ImportResult>({ name: 'importJobs', input, from: request.from ?? 'menu',
        done: (v) => [`Imported ${v.imported.length} job${v.imported.length === 1 ? '' : 's'}`,
          [file, ...(v.problems ?? []).map((p) => `${p.path}: ${p.message}`)].join('\n')] }, signal);
      if (outcome.outcome === 'done') deps.notify('data-changed');
      return outcome;
    }),
    exportJobs: (request = {}) => exclusive('exportJobs', async (signal) => {
      const csv = request.format === 'csv';
      const defaultPath = path.join(deps.documentsDir, `coilwright-jobs-${deps.today()}.${csv ? 'csv' : 'json'}`);
      const file = await dialogs.saveFile({ title: 'Export jobs', defaultPath, filters: csv ? [csvFilter, jsonFilter] : [jsonFilter, csvFilter] });
      if (file === null) return notStarted('No file was chosen.');
      // The system's save dialog has asked before replacing a file, so the export may replace it.
      const input = { format: formatOf(file), file, force: true, ...(request.status ? { status: request.status } : {}) };
      return call<ExportResult>({ name: 'exportJobs', input, from: request.from ?? 'menu',
        done: (v) => [`Exported ${v.count} job${v.count === 1 ? '' : 's'}`,
          [file, ...(v.problems ?? []).map((p) => `Exported as stored, to be put right: ${p.message}`)].join('\n')] }, signal);
    }),
  };
  return { ...actions, cancel: (name: DataActionName): boolean => running.cancel(name) };
}

export type DataActions = ReturnType<typeof createDataActions>;
