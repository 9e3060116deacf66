/**
 * The sandboxed preload: one bundled file that may require only 'electron'. It exposes one function
 * per API method, the menu-command listener, the two PDF functions, the data-action request with its
 * progress listener and cancel, and the request-sheet open dialog; never ipcRenderer itself.
 */
import { contextBridge, ipcRenderer } from 'electron';
import type { Api } from '../core/api';
import {
  DATA_ACTION_CHANNEL, DATA_CANCEL_CHANNEL, DATA_PROGRESS_CHANNEL, MENU_COMMAND_CHANNEL, PDF_PREVIEW_CHANNEL, PDF_SAVE_CHANNEL,
  REQUEST_SHEET_CHANNEL, apiChannel, apiMethodNames, dataActionNames, menuCommands,
} from '../core/api/method-names';
import type {
  CancellableDataAction, CoilwrightBridge, DataActionEvent, DataActionName, DataActionOptions, MenuCommand, PdfFile,
} from '../core/api/method-names';

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

const isDataActionName = (value: unknown): value is DataActionName =>
  typeof value === 'string' && (dataActionNames as readonly string[]).includes(value);
const isCount = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value) && value >= 0;
const outcomes = ['done', 'failed', 'cancelled', 'not-started'];

/** A fresh plain copy of main's progress message, or null for anything else: the page gets numbers and words only. */
function dataActionEvent(raw: unknown): DataActionEvent | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const e = raw as Record<string, unknown>;
  if (!isDataActionName(e.action) || (e.from !== 'menu' && e.from !== 'window')) return null;
  if (e.state === 'running' && isCount(e.done) && isCount(e.total) && typeof e.cancellable === 'boolean') {
    return { action: e.action, from: e.from, state: 'running', done: e.done, total: e.total, cancellable: e.cancellable };
  }
  if (e.state === 'ended' && typeof e.outcome === 'string' && outcomes.includes(e.outcome) && typeof e.message === 'string') {
    return { action: e.action, from: e.from, state: 'ended', outcome: e.outcome as 'done', message: e.message };
  }
  return null;
}

/** As onMenuCommand: the callback never sees the IPC event. */
function onDataProgress(callback: (event: DataActionEvent) => void): () => void {
  const listener = (_event: unknown, raw: unknown) => {
    const event = dataActionEvent(raw);
    if (event) callback(event);
  };
  ipcRenderer.on(DATA_PROGRESS_CHANNEL, listener);
  return () => { ipcRenderer.removeListener(DATA_PROGRESS_CHANNEL, listener); };
}

const bridge: CoilwrightBridge = {
  api: buildApi(),
  onMenuCommand,
  previewPdf: (file: PdfFile) => ipcRenderer.invoke(PDF_PREVIEW_CHANNEL, file),
  savePdf: (file: PdfFile) => ipcRenderer.invoke(PDF_SAVE_CHANNEL, file),
  runDataAction: (name: DataActionName, options?: DataActionOptions) => ipcRenderer.invoke(DATA_ACTION_CHANNEL, name, options),
  onDataProgress,
  cancelDataAction: (name: CancellableDataAction) => ipcRenderer.invoke(DATA_CANCEL_CHANNEL, name),
  openRequestSheet: () => ipcRenderer.invoke(REQUEST_SHEET_CHANNEL),
};

contextBridge.exposeInMainWorld('coilwright', bridge);
