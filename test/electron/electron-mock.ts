/**
 * A stand-in for the 'electron' module: enough of app, BrowserWindow, protocol, ipcMain/ipcRenderer,
 * contextBridge, session, Menu, dialog, shell and screen for the shell's code to run under plain
 * Node. Handlers are captured in Maps so tests can call them. Used with
 * vi.mock('electron', async () => (await import('./electron-mock')).electron).
 */
import path from 'node:path';
import { vi } from 'vitest';

type Listener = (...args: never[]) => unknown;

class Emitter {
  readonly listeners = new Map<string, Listener[]>();
  on(event: string, listener: Listener): this {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }
  once(event: string, listener: Listener): this {
    return this.on(event, listener);
  }
  emit(event: string, ...args: unknown[]): void {
    for (const l of this.listeners.get(event) ?? []) (l as (...a: unknown[]) => unknown)(...args);
  }
}

export class FakeWebContents extends Emitter {
  send = vi.fn();
  print = vi.fn();
  windowOpenHandler: ((details: { url: string }) => { action: string }) | undefined;
  setWindowOpenHandler(handler: (details: { url: string }) => { action: string }): void {
    this.windowOpenHandler = handler;
  }
}

let nextWindowId = 1;

export class FakeBrowserWindow extends Emitter {
  static all: FakeBrowserWindow[] = [];
  static fromId = (id: number) => FakeBrowserWindow.all.find((w) => w.id === id) ?? null;
  /** The next window's loadURL rejects with this. */
  static failNextLoad: Error | null = null;
  readonly id = nextWindowId++;
  readonly webContents = new FakeWebContents();
  destroyed = false;
  loadURL = vi.fn(async (_url: string) => {
    const failure = FakeBrowserWindow.failNextLoad;
    FakeBrowserWindow.failNextLoad = null;
    if (failure) throw failure;
  });
  setMenu = vi.fn();
  maximize = vi.fn();
  focus = vi.fn();
  restore = vi.fn();
  reload = vi.fn();
  setProgressBar = vi.fn();
  constructor(readonly options: Record<string, unknown>) {
    super();
    FakeBrowserWindow.all.push(this);
  }
  isDestroyed = () => this.destroyed;
  isMinimized = () => false;
  isMaximized = () => false;
  getNormalBounds = () => ({ x: 10, y: 20, width: 1000, height: 700 });
  close(): void {
    this.emit('close');
    this.destroyed = true;
    this.emit('closed');
  }
}

/** Paths the fake app reports; tests point them at temporary folders. */
export const paths = { userData: '/nonexistent/user-data', appPath: '/nonexistent/app', temp: '/nonexistent/temp' };

export const captured = {
  ipcMain: new Map<string, (event: unknown, ...args: unknown[]) => Promise<unknown>>(),
  protocols: new Map<string, (request: Request) => Promise<Response>>(),
  exposed: new Map<string, unknown>(),
  app: new Emitter(),
};

export const electron = {
  app: {
    requestSingleInstanceLock: vi.fn(() => true),
    whenReady: vi.fn(() => Promise.resolve()),
    getPath: vi.fn((name: string) => (name === 'userData' ? paths.userData : path.join(paths.temp, name))),
    getAppPath: vi.fn(() => paths.appPath),
    isPackaged: false,
    name: 'Coilwright',
    quit: vi.fn(),
    on: vi.fn((event: string, listener: Listener) => captured.app.on(event, listener)),
  },
  BrowserWindow: FakeBrowserWindow,
  protocol: {
    registerSchemesAsPrivileged: vi.fn(),
    handle: vi.fn((scheme: string, handler: (request: Request) => Promise<Response>) => captured.protocols.set(scheme, handler)),
  },
  ipcMain: {
    handle: vi.fn((channel: string, handler: (event: unknown, ...args: unknown[]) => Promise<unknown>) => {
      captured.ipcMain.set(channel, handler);
    }),
  },
  ipcRenderer: { invoke: vi.fn(async () => undefined), on: vi.fn(), removeListener: vi.fn() },
  contextBridge: { exposeInMainWorld: vi.fn((key: string, value: unknown) => captured.exposed.set(key, value)) },
  session: { defaultSession: { setPermissionRequestHandler: vi.fn(), setPermissionCheckHandler: vi.fn() } },
  Menu: { buildFromTemplate: vi.fn((template: unknown) => ({ template })), setApplicationMenu: vi.fn() },
  dialog: {
    showErrorBox: vi.fn(),
    showMessageBox: vi.fn(async () => ({ response: 0 })),
    showSaveDialog: vi.fn(async (): Promise<{ canceled: boolean; filePath?: string }> => ({ canceled: true })),
    showOpenDialog: vi.fn(async () => ({ canceled: true, filePaths: [] as string[] })),
  },
  shell: { openExternal: vi.fn(async () => undefined), openPath: vi.fn(async () => '') },
  screen: { getAllDisplays: vi.fn(() => [{ workArea: { x: 0, y: 0, width: 1920, height: 1080 } }]) },
};

/** A navigation-like event whose preventDefault is recorded. */
export const navigationEvent = (url: string) => ({ url, preventDefault: vi.fn() });

/** An IPC event from a frame at `url` (null: the frame is gone). */
export const ipcEvent = (url: string | null) => ({ senderFrame: url === null ? null : { url } });

/**
 * Main's boot adds process-wide handlers (uncaught exceptions, unhandled rejections). Call at the top of a test
 * file that imports main; the function it returns takes away every handler added since, for the next file.
 */
export function processHandlersRestorer(): () => void {
  const kept = { uncaughtException: process.listeners('uncaughtException'), unhandledRejection: process.listeners('unhandledRejection') };
  return () => {
    for (const l of process.listeners('uncaughtException')) if (!kept.uncaughtException.includes(l)) process.off('uncaughtException', l);
    for (const l of process.listeners('unhandledRejection')) if (!kept.unhandledRejection.includes(l)) process.off('unhandledRejection', l);
  };
}
