import { z } from 'zod';
import { jobStatusSchema } from '../../core/api/store-schemas';
import { DATA_ACTION_CHANNEL, DATA_CANCEL_CHANNEL, cancellableDataActions, dataActionNames } from '../../core/api/method-names';
import type { ApiResult } from '../../core/api';
import type { CancellableDataAction, DataActionName, DataActionOptions, DataActionOutcome } from '../../core/api/method-names';
import { handleGuarded } from '../ipc';
import type { GuardOptions, IpcMainLike } from '../ipc';
import type { DataActionRequest } from './data-actions';

export interface DataActionRunner extends Record<DataActionName, (request?: DataActionRequest) => Promise<DataActionOutcome>> {
  cancel(name: DataActionName): boolean;
}

const isName = <T extends string>(names: readonly T[], raw: unknown): raw is T => typeof raw === 'string' && (names as readonly string[]).includes(raw);

/** The Data screen's choices: plain values only, and nothing else (a `file` key is refused with the rest). */
const optionsSchema = z.object({
  format: z.enum(['json', 'csv']).optional(),
  status: jobStatusSchema.optional(),
  renumber: z.boolean().optional(),
}).strict();

const refused = (code: string, message: string, path: string): ApiResult<never> => ({ ok: false, error: { code, message, path } });

/**
 * The Data screen's buttons: the window names an action (with the screen's choices) and main runs it with
 * its own dialogs and confirmation, exactly as from the File menu. Anything but a known name is refused, and
 * options that are not the screen's plain choices (a path, anything unknown) are refused too.
 * Cancel names the running action; main aborts the controller it holds for it.
 */
export function registerDataActionIpc(ipcMain: IpcMainLike, actions: DataActionRunner, options: GuardOptions = {}): void {
  handleGuarded(ipcMain, DATA_ACTION_CHANNEL, async (raw, extra) => {
    if (!isName(dataActionNames, raw)) {
      return refused('unknown-data-action', `the data action must be one of ${dataActionNames.join(', ')}`, 'name');
    }
    const chosen = optionsSchema.safeParse(extra ?? {});
    if (!chosen.success) {
      const wrong = chosen.error.issues[0]!;
      return refused('invalid-data-action-options', `the ${raw} choices take format, status and renumber only: ${wrong.message}`, ['options', ...wrong.path.map(String)].join('.'));
    }
    const outcome = await actions[raw]({ ...(chosen.data as DataActionOptions), from: 'window' });
    return { ok: true, value: { finished: raw, ...outcome } };
  }, options);
  handleGuarded(ipcMain, DATA_CANCEL_CHANNEL, async (raw) => {
    if (!isName<CancellableDataAction>(cancellableDataActions, raw)) {
      return refused('not-cancellable', `only ${cancellableDataActions.join(', ')} can be cancelled (a restore runs to its end)`, 'name');
    }
    return { ok: true, value: { cancelled: actions.cancel(raw) } };
  }, options);
}
