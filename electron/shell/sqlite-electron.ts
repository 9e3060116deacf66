/**
 * better-sqlite3 as the Electron main bundle sees it: scripts/build.mjs points every import of
 * 'better-sqlite3' in that bundle here. It is the real constructor, with `nativeBinding` set to the
 * Electron-ABI build in unpackaged runs, so db/ stays unaware of which runtime it is in.
 */
import { app } from 'electron';
import { existsSync } from 'node:fs';
import { chooseSqliteBinding } from './native-binding';
import { databaseWithBinding } from './sqlite-with-binding';

function binding(): string | undefined {
  const choice = chooseSqliteBinding({
    electronVersion: process.versions.electron,
    isPackaged: app.isPackaged,
    appPath: app.getAppPath(),
    exists: existsSync,
  });
  if (!choice.ok) throw new Error(choice.error.message);
  return choice.value;
}

export default databaseWithBinding(binding);
