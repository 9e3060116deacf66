import { DATA_ACTION_CHANNEL, dataActionNames } from '../../core/api/method-names';
import type { DataActionName } from '../../core/api/method-names';
import { handleGuarded } from '../ipc';
import type { GuardOptions, IpcMainLike } from '../ipc';

export type DataActionRunner = Record<DataActionName, () => Promise<void>>;

const isDataAction = (raw: unknown): raw is DataActionName =>
  typeof raw === 'string' && (dataActionNames as readonly string[]).includes(raw);

/**
 * The Data screen's buttons: the window names an action and main runs it with its own dialogs and
 * confirmation, exactly as from the File menu. Anything but a known name (a path, an object) is refused.
 */
export function registerDataActionIpc(ipcMain: IpcMainLike, actions: DataActionRunner, options: GuardOptions = {}): void {
  handleGuarded(ipcMain, DATA_ACTION_CHANNEL, async (raw) => {
    if (!isDataAction(raw)) {
      return { ok: false, error: { code: 'unknown-data-action', message: `the data action must be one of ${dataActionNames.join(', ')}`, path: 'name' } };
    }
    await actions[raw]();
    return { ok: true, value: { finished: raw } };
  }, options);
}
