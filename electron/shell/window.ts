import { BrowserWindow, screen } from 'electron';
import type { Log } from './logging';
import { APP_START_URL } from './origin';
import { secureWindowOptions } from './security';
import { readWindowState, windowStateOf, writeWindowState } from './window-state';

export interface MainWindowOptions {
  preload: string;
  /** userData/window-state.json */
  stateFile: string;
  log: Log;
  /** A renderer crash: reported like any unexpected failure. */
  onCrash: (error: Error) => void;
}

/** Reload after a renderer crash, but not in a loop when the page dies again straight away. */
const RELOAD_GAP_MS = 15_000;

function recoverFromCrashes(window: BrowserWindow, onCrash: (error: Error) => void): void {
  let lastReload = 0;
  window.webContents.on('render-process-gone', (_event, details) => {
    if (details.reason === 'clean-exit') return;
    onCrash(new Error(`the window stopped (${details.reason}); saved jobs are kept`));
    if (window.isDestroyed() || Date.now() - lastReload < RELOAD_GAP_MS) return;
    lastReload = Date.now();
    window.reload();
  });
}

/** The main window where it was last time, with the preload, showing app://coilwright/index.html. */
export function createMainWindow(options: MainWindowOptions): BrowserWindow {
  const state = readWindowState(options.stateFile, screen.getAllDisplays().map((d) => d.workArea));
  const { maximized, ...bounds } = state;
  const window = new BrowserWindow(secureWindowOptions(
    { ...bounds, minWidth: 800, minHeight: 560, title: 'Coilwright', backgroundColor: '#f5f5f2' },
    { preload: options.preload },
  ));
  if (maximized) window.maximize();
  recoverFromCrashes(window, options.onCrash);
  window.on('close', () => {
    try {
      writeWindowState(options.stateFile, windowStateOf(window));
    } catch (e) {
      options.log.error('window-state', e);
    }
  });
  window.loadURL(APP_START_URL).catch((e: unknown) => options.log.error('load', e));
  return window;
}
