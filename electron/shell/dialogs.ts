import { dialog } from 'electron';
import type { BrowserWindow, MessageBoxOptions } from 'electron';
import type { DataDialogs } from './data-actions';

/** Electron's dialogs, modal to the main window when there is one. */
export function electronDialogs(parent: () => BrowserWindow | undefined): DataDialogs {
  const box = (options: MessageBoxOptions) => {
    const window = parent();
    return window ? dialog.showMessageBox(window, options) : dialog.showMessageBox(options);
  };
  return {
    async saveFile(options) {
      const window = parent();
      const choice = window ? await dialog.showSaveDialog(window, options) : await dialog.showSaveDialog(options);
      return choice.canceled || !choice.filePath ? null : choice.filePath;
    },
    async openFile(options) {
      const window = parent();
      const opts = { ...options, properties: ['openFile' as const] };
      const choice = window ? await dialog.showOpenDialog(window, opts) : await dialog.showOpenDialog(opts);
      return choice.canceled ? null : (choice.filePaths[0] ?? null);
    },
    async confirm(message, detail, confirmLabel) {
      const answer = await box({ type: 'question', message, detail, buttons: [confirmLabel, 'Cancel'], defaultId: 1, cancelId: 1 });
      return answer.response === 0;
    },
    async tell(kind, message, detail) {
      await box({ type: kind, message, detail, buttons: ['OK'] });
    },
  };
}
