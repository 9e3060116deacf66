import { describe, expect, it, vi } from 'vitest';
import type { IpcMainLike } from '../../electron/ipc';
import { registerRequestSheetIpc } from '../../electron/shell/request-sheet-ipc';
import { ipcEvent } from './electron-mock';

const trusted = ipcEvent('app://coilwright/index.html');

function setup(chosen: string | null, readFile = vi.fn(async () => new Uint8Array([0x61, 0x3b, 0x62]))) {
  const handlers = new Map<string, (event: unknown, raw: unknown) => Promise<unknown>>();
  const ipcMain: IpcMainLike = { handle: (c, l) => void handlers.set(c, l as never) };
  const openFile = vi.fn(async () => chosen);
  const read = vi.fn(async (input: { fileName: string; dataBase64: string }) => ({ ok: true as const, value: { name: input.fileName, rows: [] } }));
  registerRequestSheetIpc(ipcMain, { openFile, readFile, read });
  return { run: (raw?: unknown, event = trusted) => handlers.get('file:request-sheet')!(event, raw), openFile, read, readFile };
}

describe('the request-sheet open dialog in the desktop shell', () => {
  it('reads the file main\'s dialog chose and hands the window its name and bytes, never the path', async () => {
    const s = setup('/home/shop/enquiries/rfq-118.csv');
    expect(await s.run()).toEqual({ ok: true, value: { name: 'rfq-118.csv', rows: [] } });
    expect(s.readFile).toHaveBeenCalledWith('/home/shop/enquiries/rfq-118.csv');
    expect(s.read).toHaveBeenCalledWith({ fileName: 'rfq-118.csv', dataBase64: Buffer.from('a;b').toString('base64') });
  });

  it('answers null when the dialog is cancelled, and refuses any input from the window', async () => {
    expect(await setup(null).run()).toEqual({ ok: true, value: null });
    const s = setup('/x.csv');
    expect(await s.run('/etc/passwd')).toMatchObject({ ok: false, error: { code: 'no-input-taken' } });
    expect(s.openFile).not.toHaveBeenCalled();
  });

  it('says which file could not be read, and refuses a window that is not the app', async () => {
    const gone = setup('/home/shop/gone.xlsx', vi.fn(async () => { throw Object.assign(new Error('missing'), { code: 'ENOENT' }); }));
    expect(await gone.run()).toMatchObject({ ok: false, error: { code: 'unreadable-file', message: expect.stringMatching(/gone\.xlsx.*ENOENT/) } });
    expect(await setup('/x.csv').run(undefined, ipcEvent('https://evil.example/'))).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
  });
});
