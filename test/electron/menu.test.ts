import type { MenuItemConstructorOptions } from 'electron';
import { describe, expect, it, vi } from 'vitest';
import { applicationMenu } from '../../electron/shell/menu';
import type { MenuActions } from '../../electron/shell/menu';

const actions = () => ({
  command: vi.fn<MenuActions['command']>(), backup: vi.fn(), restore: vi.fn(), importJobs: vi.fn(), exportJobs: vi.fn(),
});

function items(template: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return template.flatMap((item) => [item, ...(Array.isArray(item.submenu) ? items(item.submenu) : [])]);
}

const byLabel = (template: MenuItemConstructorOptions[], label: string) => items(template).find((i) => i.label === label);
const click = (item: MenuItemConstructorOptions | undefined, window?: unknown) =>
  (item!.click as (i: unknown, w: unknown, e: unknown) => void)({}, window, {});

describe('the application menu', () => {
  const win = applicationMenu({ platform: 'win32', isDev: false, appName: 'Coilwright' }, actions());

  it('has the usual accelerators', () => {
    const accelerators = Object.fromEntries(items(win).filter((i) => i.accelerator).map((i) => [i.label, i.accelerator]));
    expect(accelerators).toEqual({
      'New job': 'CmdOrCtrl+N', 'Open job…': 'CmdOrCtrl+O', 'Find similar…': 'CmdOrCtrl+Shift+F', Save: 'CmdOrCtrl+S',
      'Print quote…': 'CmdOrCtrl+P', 'Print traveller…': 'CmdOrCtrl+Shift+P', 'Settings…': 'CmdOrCtrl+,',
      Undo: 'CmdOrCtrl+Z', Redo: 'CmdOrCtrl+Shift+Z',
    });
  });

  it('sends renderer commands with the window the click came from', () => {
    const a = actions();
    const template = applicationMenu({ platform: 'linux', isDev: false, appName: 'Coilwright' }, a);
    const window = { id: 7 };
    const expected: [string, string][] = [['New job', 'new-job'], ['Open job…', 'open-job'], ['Find similar…', 'find-similar'],
      ['Save', 'save'], ['Print quote…', 'print-quote'], ['Print traveller…', 'print-traveller'], ['Settings…', 'settings'],
      ['Undo', 'undo'], ['Redo', 'redo']];
    for (const [label, command] of expected) {
      click(byLabel(template, label), window);
      expect(a.command).toHaveBeenLastCalledWith(command, window);
    }
  });

  it('runs backup, restore, import and export in main', () => {
    const a = actions();
    const template = applicationMenu({ platform: 'linux', isDev: false, appName: 'Coilwright' }, a);
    click(byLabel(template, 'Backup…'));
    click(byLabel(template, 'Restore…'));
    click(byLabel(template, 'Import jobs…'));
    click(byLabel(template, 'Export jobs…'));
    expect([a.backup, a.restore, a.importJobs, a.exportJobs].map((f) => f.mock.calls.length)).toEqual([1, 1, 1, 1]);
    expect(a.command).not.toHaveBeenCalled();
  });

  it('uses roles for clipboard editing and quitting; undo and redo go to the renderer, which knows what has focus', () => {
    const roles = items(win).map((i) => i.role).filter(Boolean);
    expect(roles).toEqual(expect.arrayContaining(['cut', 'copy', 'paste', 'selectAll', 'quit', 'togglefullscreen', 'zoomIn']));
    expect(roles).not.toContain('undo');
  });

  it('offers reload and developer tools only in development', () => {
    expect(items(win).some((i) => i.role === 'reload' || i.role === 'toggleDevTools')).toBe(false);
    const dev = applicationMenu({ platform: 'win32', isDev: true, appName: 'Coilwright' }, actions());
    expect(items(dev).filter((i) => i.role === 'reload' || i.role === 'toggleDevTools')).toHaveLength(2);
  });

  it('puts Settings and Quit in the app menu on macOS', () => {
    const mac = applicationMenu({ platform: 'darwin', isDev: false, appName: 'Coilwright' }, actions());
    expect(mac[0]!.label).toBe('Coilwright');
    const appMenu = items([mac[0]!]);
    expect(appMenu.some((i) => i.label === 'Settings…')).toBe(true);
    expect(appMenu.some((i) => i.role === 'quit')).toBe(true);
    expect(items([mac[1]!]).some((i) => i.role === 'quit' || i.label === 'Settings…')).toBe(false);
  });
});
