/**
 * The desktop shell: one instance, one store in userData, the UI from app://coilwright/, every window
 * sandboxed, every IPC call sender-checked and parsed, unexpected failures logged and shown once.
 */
import { BrowserWindow, Menu, app, dialog, ipcMain, protocol, session, shell } from 'electron';
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { DATA_PROGRESS_CHANNEL, MENU_COMMAND_CHANNEL } from '../core/api/method-names';
import type { MenuCommand } from '../core/api/method-names';
import { registerIpc } from './ipc';
import { createService, dispatch } from '../service/api';
import type { Service } from '../service/api';
import type { StoreInfo } from '../core/api';
import { createDataActions } from './shell/data-actions';
import { registerDataActionIpc } from './shell/data-ipc';
import { registerRequestSheetIpc } from './shell/request-sheet-ipc';
import { offerRestoreOfDamagedStore, offerRestoreWhenDamageFound } from './shell/damaged-store';
import { electronDialogs } from './shell/dialogs';
import { createFaultReporter } from './shell/faults';
import type { FaultReporter } from './shell/faults';
import { chosenStore } from '../service/host/first-run';
import { fileStoreChoice, openStartingStore } from '../service/host/store-choice';
import { createLog } from './shell/logging';
import type { Log } from './shell/logging';
import { applicationMenu } from './shell/menu';
import { chooseSqliteBinding } from './shell/native-binding';
import { APP_SCHEME } from './shell/origin';
import { registerPdfIpc } from './shell/pdf-ipc';
import { createPdfPreviews } from './shell/pdf-preview';
import type { PdfPreviews } from './shell/pdf-preview';
import { createPdfShelf } from './shell/pdf-shelf';
import { appProtocolHandler, registerAppScheme } from './shell/protocol';
import { denyPermissions, hardenWebContents } from './shell/security';
import { showUpdateNotice } from './shell/store-update-notice';
import { pendingLargeUpdate } from '../service/host/store-update';
import type { UpdateOutcome } from '../service/host/store-update';
import { updateInWorkerThread } from './shell/store-update-thread';
import { createMainWindow } from './shell/window';

// Privileged schemes must be declared before the app is ready.
registerAppScheme(protocol);

// The bundles sit in dist/ under the app path, beside the built renderer (inside app.asar when packaged).
const rendererDir = () => path.join(app.getAppPath(), 'dist', 'renderer');
const preloadFile = () => path.join(app.getAppPath(), 'dist', 'electron', 'preload.cjs');
let mainWindow: BrowserWindow | undefined;
let started = false;

const userFile = (...parts: string[]) => path.join(app.getPath('userData'), ...parts);
const liveMainWindow = () => (mainWindow && !mainWindow.isDestroyed() ? mainWindow : undefined);

/** A problem that leaves nothing to work with (no store, no UI): say what to do, then quit. */
function stop(log: Log, title: string, message: string): void {
  log.error('startup', new Error(`${title}: ${message}`));
  dialog.showErrorBox(title, message);
  app.quit();
}

const sqliteBinding = () => chooseSqliteBinding({
  electronVersion: process.versions.electron, isPackaged: app.isPackaged, appPath: app.getAppPath(), exists: existsSync,
});

/** A store's schema update in a worker thread, so the windows keep painting; openService finishes it if this cannot. */
async function updateBesideTheWindows(file: string): Promise<UpdateOutcome> {
  const binding = sqliteBinding();
  if (!binding.ok) return { ok: false, ...binding.error };
  return updateInWorkerThread({ workerFile: path.join(app.getAppPath(), 'dist', 'electron', 'store-update-worker.cjs'), file, nativeBinding: binding.value });
}

/** The store, or the reason there is none; the Electron build of better-sqlite3 is checked first. */
function openService(log: Log): Service | { code: string; message: string } {
  const binding = sqliteBinding();
  if (!binding.ok) return binding.error;
  // COILWRIGHT_STORE (a file or a postgres:// connection string) names another store than the user's own file;
  // without it, the server store last opened on the Data screen (app-settings.json, never its password).
  const choice = fileStoreChoice(userFile('app-settings.json'));
  const opened = openStartingStore(chosenStore({}), choice, userFile('coilwright.db'));
  if (!opened.ok) return opened.error;
  if (opened.value.demoJobs > 0) log.info('first-run', `demo shop created with ${opened.value.demoJobs} jobs`);
  const { notice, store } = opened.value;
  if (notice) {
    log.info('store', notice);
    const message = store.readOnly ? 'The job store is open read-only' : 'The job store chosen last time is not open';
    void dialog.showMessageBox({ type: 'info', title: 'Coilwright', message, detail: notice });
  }
  return createService(store, {}, choice);
}

function showMainWindow(log: Log, faults: FaultReporter): void {
  const existing = liveMainWindow();
  if (existing) {
    if (existing.isMinimized()) existing.restore();
    existing.focus();
    return;
  }
  mainWindow = createMainWindow({
    preload: preloadFile(), stateFile: userFile('window-state.json'), log, onCrash: (e) => faults.report('renderer', e),
  });
}

function sendCommand(previews: PdfPreviews, command: MenuCommand, windowId: number | undefined): void {
  if (previews.menuCommand(command, windowId)) return;
  liveMainWindow()?.webContents.send(MENU_COMMAND_CHANNEL, command);
}

function installMenu(service: Service, previews: PdfPreviews, faults: FaultReporter): ReturnType<typeof createDataActions> {
  const data = createDataActions({
    dialogs: electronDialogs(liveMainWindow),
    call: (name, input, long) => service.files.run(name, input as never, long),
    progress: (fraction) => liveMainWindow()?.setProgressBar(fraction ?? -1),
    report: (event) => liveMainWindow()?.webContents.send(DATA_PROGRESS_CHANNEL, event),
    notify: (command) => liveMainWindow()?.webContents.send(MENU_COMMAND_CHANNEL, command),
    documentsDir: app.getPath('documents'),
    today: () => new Date().toISOString().slice(0, 10),
  });
  const guard = (name: string, action: () => Promise<unknown>) => () => void action().catch((e: unknown) => faults.report(name, e));
  const template = applicationMenu({ platform: process.platform, isDev: !app.isPackaged, appName: app.name }, {
    command: (command, window) => sendCommand(previews, command, window?.id),
    backup: guard('backup', () => data.backup()),
    restore: guard('restore', () => data.restore()),
    importJobs: guard('import', () => data.importJobs()),
    exportJobs: guard('export', () => data.exportJobs()),
  });
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
  registerDataActionIpc(ipcMain, data, { onUnexpected: (context, e) => faults.report(context, e) });
  registerRequestSheetIpc(ipcMain, {
    openFile: electronDialogs(liveMainWindow).openFile,
    readFile: (file) => readFile(file),
    read: (input) => dispatch(service.handlers, 'readRequestSheet', input),
  }, { onUnexpected: (context, e) => faults.report(context, e) });
  return data;
}

/** A large store's background damage check, followed to its answer; damage found offers File > Restore at once. */
function watchDamageCheck(service: Service, restore: () => Promise<unknown>, faults: FaultReporter): void {
  const damageCheck = async () => {
    const info = await dispatch(service.handlers, 'storeInfo', {});
    return info.ok ? (info.value as StoreInfo).damageCheck : null;
  };
  void offerRestoreWhenDamageFound(damageCheck, restore).catch((e: unknown) => faults.report('damage-check', e));
}

/** The PDF writer's fonts: shipped as resources when packaged, assets/fonts of the project otherwise. */
function locateFonts(): void {
  process.env.COILWRIGHT_FONTS ??= app.isPackaged
    ? path.join(process.resourcesPath, 'fonts')
    : path.join(app.getAppPath(), 'assets', 'fonts');
}

/** The store the desktop app opens first: COILWRIGHT_STORE, else the store chosen last time, else the user's own file. */
function startingLocation(): string {
  return chosenStore({}) ?? fileStoreChoice(userFile('app-settings.json')).remembered()?.location ?? userFile('coilwright.db');
}

/** Opens the service, telling the user first when a large store must be brought up to this version's schema. */
async function openServiceTelling(log: Log): Promise<Service | { code: string; message: string }> {
  const pending = pendingLargeUpdate(startingLocation());
  if (!pending) return openService(log);
  log.info('store', `updating ${pending.file} (${pending.bytes} bytes) from schema version ${pending.from} to ${pending.to}`);
  const notice = await showUpdateNotice(pending);
  const started = Date.now();
  try {
    const beside = await updateBesideTheWindows(pending.file);
    if (beside.ok) log.info('store', 'updated in a worker thread');
    else log.info('store', `the update could not run in a worker thread (${beside.code}: ${beside.message}); it runs as the store opens`);
    return openService(log);
  } finally {
    notice.close();
    log.info('store', `the update took ${((Date.now() - started) / 1000).toFixed(1)} s`);
  }
}

/** Opens the store; a damaged one may be replaced by a backup the user chooses, then opened again. */
async function openOrRestore(log: Log): Promise<Service | { code: string; message: string }> {
  const service = await openServiceTelling(log);
  if ('handlers' in service || service.code !== 'store-corrupt') return service;
  return (await offerRestoreOfDamagedStore(userFile('coilwright.db'), service.message)) ? openService(log) : service;
}

async function start(log: Log, faults: FaultReporter): Promise<void> {
  locateFonts();
  if (!existsSync(path.join(rendererDir(), 'index.html'))) {
    stop(log, 'Coilwright is not built', `No user interface in ${rendererDir()}. Run "npm run build" first.`);
    return;
  }
  const service = await openOrRestore(log);
  if (!('handlers' in service)) {
    stop(log, 'The job store cannot be opened', service.message);
    return;
  }
  app.on('will-quit', () => service.close());
  denyPermissions(session.defaultSession);
  const shelf = createPdfShelf();
  const previews = createPdfPreviews(shelf, log);
  protocol.handle(APP_SCHEME, appProtocolHandler({ root: rendererDir(), pdfs: shelf }));
  const onUnexpected = (context: string, e: unknown) => faults.report(context, e);
  registerIpc(ipcMain, service.handlers, { onUnexpected });
  registerPdfIpc(ipcMain, previews, liveMainWindow, { onUnexpected });
  const data = installMenu(service, previews, faults);
  started = true;
  showMainWindow(log, faults);
  watchDamageCheck(service, () => data.restore(), faults);
  app.on('activate', () => showMainWindow(log, faults));
}

function boot(): void {
  if (!app.requestSingleInstanceLock()) {
    app.quit();
    return;
  }
  const log = createLog(userFile('logs'));
  const faults = createFaultReporter(log, (detail) =>
    dialog.showMessageBox({ type: 'error', title: 'Coilwright', message: 'Something went wrong', detail, buttons: ['OK'] }));
  process.on('uncaughtException', (e) => faults.report('main', e));
  process.on('unhandledRejection', (e) => faults.report('main', e));
  app.on('web-contents-created', (_event, contents) => hardenWebContents(contents, {
    openExternal: (url) => shell.openExternal(url),
    onError: (e) => log.error('open-external', e),
  }));
  app.on('second-instance', () => {
    if (started) showMainWindow(log, faults);
  });
  app.on('window-all-closed', () => {
    if (process.platform !== 'darwin') app.quit();
  });
  app.whenReady().then(() => start(log, faults)).catch((e: unknown) => stop(log, 'Coilwright could not start', String(e)));
}

boot();
