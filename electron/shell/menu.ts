import type { BaseWindow, MenuItemConstructorOptions } from 'electron';
import type { MenuCommand } from '../../core/api/method-names';

/** What the menu does: renderer commands go through `command`; data file actions run in main. */
export interface MenuActions {
  command(command: MenuCommand, window: BaseWindow | undefined): void;
  backup(): void;
  restore(): void;
  importJobs(): void;
  exportJobs(): void;
}

export interface MenuContext {
  platform: NodeJS.Platform;
  /** Reload and developer tools only appear in unpackaged runs. */
  isDev: boolean;
  appName: string;
}

type Item = MenuItemConstructorOptions;
const separator: Item = { type: 'separator' };

function commandItem(actions: MenuActions, label: string, command: MenuCommand, accelerator?: string): Item {
  return { label, ...(accelerator ? { accelerator } : {}), click: (_item, window) => actions.command(command, window) };
}

function fileMenu(ctx: MenuContext, actions: MenuActions): Item {
  const isMac = ctx.platform === 'darwin';
  return {
    label: '&File',
    submenu: [
      commandItem(actions, 'New job', 'new-job', 'CmdOrCtrl+N'),
      commandItem(actions, 'Open job…', 'open-job', 'CmdOrCtrl+O'),
      commandItem(actions, 'Find similar…', 'find-similar', 'CmdOrCtrl+Shift+F'),
      separator,
      commandItem(actions, 'Save', 'save', 'CmdOrCtrl+S'),
      separator,
      commandItem(actions, 'Print quote…', 'print-quote', 'CmdOrCtrl+P'),
      commandItem(actions, 'Print traveller…', 'print-traveller', 'CmdOrCtrl+Shift+P'),
      separator,
      { label: 'Backup…', click: () => actions.backup() },
      { label: 'Restore…', click: () => actions.restore() },
      separator,
      { label: 'Import jobs…', click: () => actions.importJobs() },
      { label: 'Export jobs…', click: () => actions.exportJobs() },
      ...(isMac ? [] : [separator, commandItem(actions, 'Settings…', 'settings', 'CmdOrCtrl+,'), separator, { role: 'quit' } as Item]),
    ],
  };
}

/**
 * Undo and redo go to the renderer, which undoes the text being typed in a field and otherwise steps the
 * job back a revision: a role item would swallow the key and only ever undo text.
 */
function editMenu(actions: MenuActions): Item {
  return {
    label: '&Edit',
    submenu: [
      commandItem(actions, 'Undo', 'undo', 'CmdOrCtrl+Z'), commandItem(actions, 'Redo', 'redo', 'CmdOrCtrl+Shift+Z'), separator,
      { role: 'cut' }, { role: 'copy' }, { role: 'paste' }, separator, { role: 'selectAll' },
    ],
  };
}

function viewMenu(ctx: MenuContext): Item {
  const dev: Item[] = ctx.isDev ? [{ role: 'reload' }, { role: 'forceReload' }, { role: 'toggleDevTools' }, separator] : [];
  return {
    label: '&View',
    submenu: [...dev, { role: 'resetZoom' }, { role: 'zoomIn' }, { role: 'zoomOut' }, separator, { role: 'togglefullscreen' }],
  };
}

function macAppMenu(ctx: MenuContext, actions: MenuActions): Item {
  return {
    label: ctx.appName,
    submenu: [
      { role: 'about' }, separator, commandItem(actions, 'Settings…', 'settings', 'CmdOrCtrl+,'), separator,
      { role: 'services' }, separator, { role: 'hide' }, { role: 'hideOthers' }, { role: 'unhide' }, separator, { role: 'quit' },
    ],
  };
}

/** The application menu with the usual accelerators; on macOS Settings and Quit sit in the app menu. */
export function applicationMenu(ctx: MenuContext, actions: MenuActions): Item[] {
  const main = [fileMenu(ctx, actions), editMenu(actions), viewMenu(ctx)];
  return ctx.platform === 'darwin' ? [macAppMenu(ctx, actions), ...main, { role: 'windowMenu' }] : main;
}
