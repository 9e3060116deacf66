import { BrowserWindow, Menu, app, dialog, shell } from 'electron';
import type { MenuItemConstructorOptions } from 'electron';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { ApiResult } from '../../core/api';
import type { MenuCommand } from '../../core/api/method-names';
import type { Log } from './logging';
import type { PdfBytes } from './pdf-file';
import type { PdfShelf } from './pdf-shelf';
import { pdfUrl } from './pdf-shelf';
import { secureWindowOptions } from './security';
import { StoreError, writeFileReplacing } from '../../db';

export interface PdfPreviews {
  /** Opens the PDF in its own window, served from app://coilwright/pdf/… out of memory. */
  preview(pdf: PdfBytes): Promise<ApiResult<{ opened: true }>>;
  /** Asks where to save, then writes; `saved` is null when the user cancelled. */
  save(pdf: PdfBytes, parent?: BrowserWindow): Promise<ApiResult<{ saved: string | null }>>;
  /** Save and print from the app menu act on a focused preview window; true when it was one. */
  menuCommand(command: MenuCommand, windowId: number | undefined): boolean;
}

const failure = (code: string, message: string): { ok: false; error: { code: string; message: string; path: string } } =>
  ({ ok: false, error: { code, message, path: '' } });

async function saveWithDialog(pdf: PdfBytes, parent?: BrowserWindow): Promise<ApiResult<{ saved: string | null }>> {
  const options = { defaultPath: path.join(app.getPath('documents'), pdf.fileName), filters: [{ name: 'PDF', extensions: ['pdf'] }] };
  const choice = parent ? await dialog.showSaveDialog(parent, options) : await dialog.showSaveDialog(options);
  if (choice.canceled || !choice.filePath) return { ok: true, value: { saved: null } };
  try {
    // Written beside and renamed over: a full disk leaves no 0-byte PDF and an older file untouched.
    writeFileReplacing(choice.filePath, Buffer.from(pdf.bytes));
  } catch (e) {
    if (e instanceof StoreError && e.code === 'disk-full') return failure('disk-full', e.message);
    return failure('write-failed', `could not write ${choice.filePath}: ${(e as Error).message}`);
  }
  return { ok: true, value: { saved: choice.filePath } };
}

/** Save from a preview window's menu: nobody awaits the result, so a failure is told here. */
function saveFromMenu(pdf: PdfBytes, window: BrowserWindow, log: Log): void {
  saveWithDialog(pdf, window)
    .then(async (result) => {
      if (!result.ok) await dialog.showMessageBox(window, { type: 'warning', message: 'The PDF was not saved', detail: result.error.message });
    })
    .catch((e: unknown) => log.error('pdf-save', e));
}

/** For when the built-in viewer is not enough: a copy in the temp folder, opened by the system's PDF reader. */
async function openInReader(pdf: PdfBytes, log: Log): Promise<void> {
  const dir = path.join(app.getPath('temp'), 'coilwright');
  await mkdir(dir, { recursive: true });
  const file = path.join(dir, pdf.fileName);
  await writeFile(file, pdf.bytes);
  const problem = await shell.openPath(file);
  if (problem) log.error('pdf-reader', new Error(problem));
}

export function createPdfPreviews(shelf: PdfShelf, log: Log): PdfPreviews {
  const shown = new Map<number, PdfBytes>();
  const print = (window: BrowserWindow) => window.webContents.print({}, (success, reason) => {
    if (!success && reason !== 'cancelled') log.error('pdf-print', new Error(reason));
  });
  const windowMenu = (window: BrowserWindow, pdf: PdfBytes): MenuItemConstructorOptions[] => [{
    label: '&File',
    submenu: [
      { label: 'Save PDF…', accelerator: 'CmdOrCtrl+S', click: () => saveFromMenu(pdf, window, log) },
      { label: 'Print…', accelerator: 'CmdOrCtrl+P', click: () => print(window) },
      { label: 'Open in PDF reader', click: () => void openInReader(pdf, log).catch((e: unknown) => log.error('pdf-reader', e)) },
      { type: 'separator' },
      { role: 'close' },
    ],
  }];
  return {
    async preview(pdf) {
      const id = shelf.put(pdf);
      const window = new BrowserWindow(secureWindowOptions({ width: 900, height: 1100, title: pdf.fileName }, { pdfViewer: true }));
      const windowId = window.id;
      shown.set(windowId, pdf);
      window.on('closed', () => { shelf.drop(id); shown.delete(windowId); });
      if (process.platform !== 'darwin') window.setMenu(Menu.buildFromTemplate(windowMenu(window, pdf)));
      try {
        await window.loadURL(pdfUrl(id, pdf.fileName));
      } catch (e) {
        log.error('pdf-preview', e);
        if (!window.isDestroyed()) window.close();
        return failure('preview-failed', `the preview could not be shown: ${(e as Error).message}`);
      }
      return { ok: true, value: { opened: true } };
    },
    save: saveWithDialog,
    menuCommand(command, windowId) {
      const pdf = windowId === undefined ? undefined : shown.get(windowId);
      const window = windowId === undefined ? null : BrowserWindow.fromId(windowId);
      if (!pdf || !window) return false;
      if (command === 'save') saveFromMenu(pdf, window, log);
      if (command === 'print-quote' || command === 'print-traveller') print(window);
      return true;
    },
  };
}
