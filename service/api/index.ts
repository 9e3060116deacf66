import type { OpenOptions, Store } from '../../db';
import type { StoreChoiceKeeper } from '../host/store-choice';
import { readSettings } from '../../db';
import type { Handlers } from './dispatch';
import { engineHandlers } from './engine';
import type { StoreContext, TypedHandlers } from './store';
import { storeHandlers } from './store';
import { shopHandlers } from './shop';
import { documentHandlers } from './documents';
import { fileActions } from './files';
import type { FileActions } from './files';
import { firstOffHandlers } from './first-off';
import { designHandlers } from './design';
import { requestSheetHandlers } from './request-sheet';

export { dispatch } from './dispatch';
export type { Handlers } from './dispatch';
export type { FileActionName, FileActions } from './files';

/** The whole API over one store: engine methods plus store methods. `store()` is the store open now. */
export interface Service {
  handlers: Handlers;
  /** Backup, restore and file exchange by path: for the command line and the shell's dialogs, never the window. */
  files: FileActions;
  store(): Store;
  close(): void;
}

/** `choice`: where the desktop app or browser host remembers the store opened on the Data screen (none for the CLI). */
export function createService(store: Store, openOptions: OpenOptions = {}, choice?: StoreChoiceKeeper): Service {
  const ctx: StoreContext = { store, openOptions, choice };
  const handlers: TypedHandlers<keyof Handlers> = { ...engineHandlers(() => readSettings(ctx.store)), ...storeHandlers(ctx), ...shopHandlers(ctx), ...documentHandlers(ctx),
    ...firstOffHandlers(ctx), ...designHandlers(ctx), ...requestSheetHandlers(ctx) };
  return {
    handlers,
    files: fileActions(ctx),
    store: () => ctx.store,
    close: () => ctx.store.close(),
  };
}
