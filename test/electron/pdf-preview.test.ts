import fs, { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createLog } from '../../electron/shell/logging';
import { createPdfPreviews } from '../../electron/shell/pdf-preview';
import { createPdfShelf, pdfIdOf } from '../../electron/shell/pdf-shelf';
import { FakeBrowserWindow, electron, paths } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

let dir: string;
const pdf = { bytes: Buffer.from('%PDF-1.7 quote'), fileName: 'Q-26-0001.pdf' };

beforeEach(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-preview-'));
  paths.temp = dir;
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

function setup() {
  const shelf = createPdfShelf();
  const previews = createPdfPreviews(shelf, createLog(path.join(dir, 'logs')));
  return { shelf, previews };
}

describe('PDF preview windows', () => {
  it('open a secure window on the app:// PDF URL, served from memory until the window closes', async () => {
    const { shelf, previews } = setup();
    expect(await previews.preview(pdf)).toEqual({ ok: true, value: { opened: true } });
    const window = FakeBrowserWindow.all.at(-1)!;
    expect(window.options.webPreferences).toMatchObject({ sandbox: true, contextIsolation: true, nodeIntegration: false, plugins: true });
    expect(window.options.webPreferences).not.toHaveProperty('preload');
    const url = window.loadURL.mock.calls[0]![0];
    expect(url).toMatch(/^app:\/\/coilwright\/pdf\/[0-9a-f-]{36}\/Q-26-0001\.pdf$/);
    const id = pdfIdOf(new URL(url).pathname)!;
    expect(shelf.get(id)).toBe(pdf);
    window.close();
    expect(shelf.get(id)).toBeUndefined();
  });

  it('answers a failed load with a value, closes the window and forgets the PDF', async () => {
    const { shelf, previews } = setup();
    FakeBrowserWindow.failNextLoad = new Error('ERR_FAILED');
    const result = await previews.preview(pdf);
    expect(result).toMatchObject({ ok: false, error: { code: 'preview-failed' } });
    const window = FakeBrowserWindow.all.at(-1)!;
    expect(window.isDestroyed()).toBe(true);
    const id = pdfIdOf(new URL(window.loadURL.mock.calls[0]![0]).pathname)!;
    expect(shelf.get(id)).toBeUndefined();
    expect(readFileSync(path.join(dir, 'logs', 'coilwright.log'), 'utf8')).toContain('[pdf-preview] Error: ERR_FAILED');
  });

  it('saves where the user chooses and reports a cancel as saved: null', async () => {
    const { previews } = setup();
    const target = path.join(dir, 'out.pdf');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: target });
    expect(await previews.save(pdf)).toEqual({ ok: true, value: { saved: target } });
    expect(readFileSync(target, 'utf8')).toBe('%PDF-1.7 quote');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: true });
    expect(await previews.save(pdf)).toEqual({ ok: true, value: { saved: null } });
  });

  it('reports a write failure as a value', async () => {
    const { previews } = setup();
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: path.join(dir, 'missing', 'dir', 'x.pdf') });
    expect(await previews.save(pdf)).toMatchObject({ ok: false, error: { code: 'write-failed' } });
  });

  it('says the disk is full and leaves no 0-byte PDF when the disk fills up part way', async () => {
    const { previews } = setup();
    const target = path.join(dir, 'Q-26-0001.pdf');
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: target });
    const big = { ...pdf, bytes: Buffer.alloc(50_000, 0x25) };
    const real = fs.writeSync.bind(fs) as (fd: number, data: Buffer, offset: number, length: number) => number;
    let calls = 0;
    // The first write lands 1 000 bytes, the next fails as a full disk does (files only, not the test's output).
    const spy = vi.spyOn(fs, 'writeSync').mockImplementation(((fd: number, data: Buffer, offset = 0, length = data.length - offset) => {
      if (fd <= 2) return real(fd, data, offset, length);
      if ((calls += 1) > 1) throw Object.assign(new Error('ENOSPC: no space left on device'), { code: 'ENOSPC' });
      return real(fd, data, offset, Math.min(1000, length));
    }) as unknown as typeof fs.writeSync);
    let result;
    try {
      result = await previews.save(big);
    } finally {
      spy.mockRestore();
    }
    expect(result).toMatchObject({ ok: false, error: { code: 'disk-full', message: expect.stringMatching(/^the disk is full/) } });
    expect(existsSync(target)).toBe(false);
    expect(readdirSync(dir).filter((n) => n.endsWith('.partial'))).toEqual([]);
  });

  it('tells the user when a save from the menu fails', async () => {
    const { previews } = setup();
    await previews.preview(pdf);
    const window = FakeBrowserWindow.all.at(-1)!;
    electron.dialog.showSaveDialog.mockResolvedValueOnce({ canceled: false, filePath: path.join(dir, 'no', 'such', 'x.pdf') });
    previews.menuCommand('save', window.id);
    await vi.waitFor(() => expect(electron.dialog.showMessageBox).toHaveBeenCalledWith(window,
      expect.objectContaining({ type: 'warning', message: 'The PDF was not saved' })));
  });

  it('takes Save and Print from the app menu when a preview window has focus', async () => {
    const { previews } = setup();
    await previews.preview(pdf);
    const window = FakeBrowserWindow.all.at(-1)!;
    expect(previews.menuCommand('print-quote', window.id)).toBe(true);
    expect(window.webContents.print).toHaveBeenCalledTimes(1);
    expect(previews.menuCommand('save', window.id)).toBe(true);
    expect(electron.dialog.showSaveDialog).toHaveBeenLastCalledWith(window, expect.objectContaining({ filters: [{ name: 'PDF', extensions: ['pdf'] }] }));
    await vi.waitFor(() => expect(electron.dialog.showSaveDialog).toHaveBeenCalled());
    expect(previews.menuCommand('save', undefined)).toBe(false);
    expect(previews.menuCommand('save', 9999)).toBe(false);
  });
});
