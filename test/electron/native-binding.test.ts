import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { chooseSqliteBinding, electronBindingPath } from '../../electron/shell/native-binding';

const appPath = path.join(path.sep, 'src', 'coilwright');
const expected = path.join(appPath, 'native', 'electron-45', 'better_sqlite3.node');

describe('choosing the better-sqlite3 build', () => {
  it('uses the node_modules build under plain Node and in a packaged app', () => {
    expect(chooseSqliteBinding({ electronVersion: undefined, isPackaged: false, appPath, exists: () => false }))
      .toEqual({ ok: true, value: undefined });
    expect(chooseSqliteBinding({ electronVersion: '45.5.0', isPackaged: true, appPath, exists: () => false }))
      .toEqual({ ok: true, value: undefined });
  });

  it('uses the absolute native/electron-<major> path in an unpackaged Electron run', () => {
    expect(electronBindingPath(appPath, '45.5.0')).toBe(expected);
    expect(path.isAbsolute(expected)).toBe(true);
    expect(chooseSqliteBinding({ electronVersion: '45.5.0', isPackaged: false, appPath, exists: (f) => f === expected }))
      .toEqual({ ok: true, value: expected });
  });

  it('says how to make the build when it is missing', () => {
    const choice = chooseSqliteBinding({ electronVersion: '45.5.0', isPackaged: false, appPath, exists: () => false });
    expect(choice).toMatchObject({ ok: false, error: { code: 'native-binding-missing', path: expected } });
    expect(!choice.ok && choice.error.message).toContain('scripts/build-native-electron.mjs');
  });
});
