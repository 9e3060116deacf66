import type { BrowserWindow } from 'electron';
import { PDF_PREVIEW_CHANNEL, PDF_SAVE_CHANNEL } from '../../core/api/method-names';
import { handleGuarded } from '../ipc';
import type { GuardOptions, IpcMainLike } from '../ipc';
import { parsePdfFile } from './pdf-file';
import type { PdfPreviews } from './pdf-preview';

/** previewPdf and savePdf from the preload: sender-checked, the bytes validated in main, results as values. */
export function registerPdfIpc(
  ipcMain: IpcMainLike, previews: Pick<PdfPreviews, 'preview' | 'save'>, parent: () => BrowserWindow | undefined,
  options: GuardOptions = {},
): void {
  handleGuarded(ipcMain, PDF_PREVIEW_CHANNEL, async (raw) => {
    const pdf = parsePdfFile(raw);
    return pdf.ok ? previews.preview(pdf.value) : pdf;
  }, options);
  handleGuarded(ipcMain, PDF_SAVE_CHANNEL, async (raw) => {
    const pdf = parsePdfFile(raw);
    return pdf.ok ? previews.save(pdf.value, parent()) : pdf;
  }, options);
}
