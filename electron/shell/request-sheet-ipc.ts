import path from 'node:path';
import type { ApiResult } from '../../core/api';
import { REQUEST_SHEET_CHANNEL } from '../../core/api/method-names';
import { handleGuarded } from '../ipc';
import type { GuardOptions, IpcMainLike } from '../ipc';
import type { DataDialogs } from './data-actions';

export interface RequestSheetDeps {
  openFile: DataDialogs['openFile'];
  readFile(file: string): Promise<Uint8Array>;
  /** The contract's readRequestSheet: the bytes go in, the cells come out; the path stays in main. */
  read(input: { fileName: string; dataBase64: string }): Promise<ApiResult<unknown>>;
}

const sheetFilters = [{ name: 'Request sheet (CSV, XLSX)', extensions: ['csv', 'xlsx'] }, { name: 'All files', extensions: ['*'] }];

/**
 * The request-sheet screen's "Choose…": main shows its open dialog, reads the file and hands the window its
 * cells. The window sends nothing (anything it sends is refused), so it can never name a file.
 */
export function registerRequestSheetIpc(ipcMain: IpcMainLike, deps: RequestSheetDeps, options: GuardOptions = {}): void {
  handleGuarded(ipcMain, REQUEST_SHEET_CHANNEL, async (raw) => {
    if (raw !== undefined && raw !== null) {
      return { ok: false, error: { code: 'no-input-taken', message: 'the request-sheet dialog takes no input: main asks for the file', path: '' } };
    }
    const file = await deps.openFile({ title: 'Import a request sheet', filters: sheetFilters });
    if (file === null) return { ok: true, value: null };
    let bytes: Uint8Array;
    try {
      bytes = await deps.readFile(file);
    } catch (e) {
      return { ok: false, error: { code: 'unreadable-file', message: `${path.basename(file)} cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`, path: 'file' } };
    }
    return deps.read({ fileName: path.basename(file), dataBase64: Buffer.from(bytes).toString('base64') });
  }, options);
}
