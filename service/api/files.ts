import type { z } from 'zod';
import { inputError } from '../../core/api';
import type { ApiResult } from '../../core/api';
import { backupSchema, exportFileSchema, importFileSchema, restoreSchema } from '../../core/api/store';
import type { BackupResult, ExportResult, ImportResult, RestoreResult } from '../../core/api/store';
import { zodErrors } from '../../core/validation';
import { backupStore, exportJobsToFile, importJobsFromFile, isSqliteStore, restoreStore } from '../../db';
import type { LongRun } from '../../db';
import type { StoreContext } from './store';

/**
 * What names files on this computer: backup, restore, export to and import from a file. These are not
 * contract methods, so neither the window (IPC) nor the web transport can reach them; the command line
 * passes its explicit paths, and the desktop shell passes the paths its own file dialogs returned.
 */
const schemas = { backup: backupSchema, restore: restoreSchema, exportJobs: exportFileSchema, importJobs: importFileSchema };
interface Outputs { backup: BackupResult; restore: RestoreResult; exportJobs: ExportResult; importJobs: ImportResult }

export type FileActionName = keyof typeof schemas;
export type FileActionInput<K extends FileActionName> = z.input<(typeof schemas)[K]>;

export interface FileActions {
  /** `long` reports progress and carries a cancel (backup, export and import; a restore runs to its end). */
  run<K extends FileActionName>(name: K, input: FileActionInput<K>, long?: LongRun): Promise<ApiResult<Outputs[K]>>;
}

export type { LongRun };

/** A server's store is copied with the server's own tools, which keep it consistent while others work in it. */
function serverCopyRefused(name: string, what: string): { ok: false; error: { code: string; message: string; path: string } } {
  return { ok: false, error: { code: 'server-store', path: 'file',
    message: `${name} is a PostgreSQL store: it is ${what} with pg_dump and pg_restore (see the README), or copied to a file with "db copy"` } };
}

export function fileActions(ctx: StoreContext): FileActions {
  const handlers: { [K in FileActionName]: (input: z.output<(typeof schemas)[K]>, long: LongRun) => Promise<ApiResult<Outputs[K]>> | ApiResult<Outputs[K]> } = {
    backup: (input, long) => (isSqliteStore(ctx.store) ? backupStore(ctx.store, input.file, long) : serverCopyRefused(ctx.store.file, 'backed up')),
    restore: async (input) => {
      if (!isSqliteStore(ctx.store)) return serverCopyRefused(ctx.store.file, 'restored');
      const outcome = await restoreStore(ctx.store, input.file, ctx.openOptions);
      ctx.store = outcome.store;
      return outcome.result;
    },
    exportJobs: (input, long) => exportJobsToFile(ctx.store, input, long),
    importJobs: (input, long) => importJobsFromFile(ctx.store, input, long),
  };
  return {
    async run(name, input, long = {}) {
      const parsed = schemas[name].safeParse(input);
      if (!parsed.success) return { ok: false, error: inputError(zodErrors(parsed.error)) };
      return (handlers[name] as (i: unknown, l: LongRun) => Promise<ApiResult<never>> | ApiResult<never>)(parsed.data, long);
    },
  };
}
