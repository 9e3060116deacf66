/**
 * The sandboxed preload: one bundled file that may require only 'electron'. It exposes one function
 * per API method, the menu-command listener, the two PDF functions, the data-action request and the
 * request-sheet open dialog; never ipcRenderer itself.
 */
import { contextBridge, ipcRenderer } from 'electron';
import type { Api } from '../core/api';
import {
  DATA_ACTION_CHANNEL, MENU_COMMAND_CHANNEL, PDF_PREVIEW_CHANNEL, PDF_SAVE_CHANNEL, REQUEST_SHEET_CHANNEL, apiChannel, apiMethodNames, menuCommands,
} from '../core/api/method-names';
import type { CoilwrightBridge, DataActionName, MenuCommand, PdfFile } from '../core/api/method-names';

function buildApi(): Api {
  const api: Record<string, (input: unknown) => Promise<unknown>> = {};
  for (const name of apiMethodNames) api[name] = (input) => ipcRenderer.invoke(apiChannel(name), input);
  return api as unknown as Api;
}

const isMenuCommand = (value: unknown): value is MenuCommand =>
  typeof value === 'string' && (menuCommands as readonly string[]).includes(value);

/** The callback gets the command only, never the IPC event (which would hand the page the sender). */
function onMenuCommand(callback: (command: MenuCommand) => void): () => void {
  const listener = (_event: unknown, command: unknown) => {
    if (isMenuCommand(command)) callback(command);
  };
  ipcRenderer.on(MENU_COMMAND_CHANNEL, listener);
  return () => { ipcRenderer.removeListener(MENU_COMMAND_CHANNEL, listener); };
}

const bridge: CoilwrightBridge = {
  api: buildApi(),
  onMenuCommand,
  previewPdf: (file: PdfFile) => ipcRenderer.invoke(PDF_PREVIEW_CHANNEL, file),
  savePdf: (file: PdfFile) => ipcRenderer.invoke(PDF_SAVE_CHANNEL, file),
  runDataAction: (name: DataActionName) => ipcRenderer.invoke(DATA_ACTION_CHANNEL, name),
  openRequestSheet: () => ipcRenderer.invoke(REQUEST_SHEET_CHANNEL),
};

contextBridge.exposeInMainWorld('coilwright', bridge);
