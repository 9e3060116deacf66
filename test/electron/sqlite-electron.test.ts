/** The better-sqlite3 stand-in of the Electron main bundle: it must pass the Electron build as nativeBinding. */
import { copyFileSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { paths } from './electron-mock';

vi.mock('electron', async () => (await import('./electron-mock')).electron);

const require = createRequire(import.meta.url);
const nodeBuild = path.join(path.dirname(require.resolve('better-sqlite3/package.json')), 'build', 'Release', 'better_sqlite3.node');
let dir: string;
let binding: string;

beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-sqlite-electron-'));
  paths.appPath = dir;
  binding = path.join(dir, 'native', 'electron-45', 'better_sqlite3.node');
  // Under Node the "Electron build" is a copy of the Node one: what matters is which file gets loaded.
  mkdirSync(path.dirname(binding), { recursive: true });
  copyFileSync(nodeBuild, binding);
  Object.defineProperty(process.versions, 'electron', { value: '45.5.0', configurable: true });
});
afterAll(() => {
  delete (process.versions as Record<string, string>).electron;
  rmSync(dir, { recursive: true, force: true });
});

describe('better-sqlite3 inside the Electron main bundle', () => {
  it('loads the addon from native/electron-<major> by absolute path', async () => {
    const { default: Database } = await import('../../electron/shell/sqlite-electron');
    expect(Object.keys(require.cache)).not.toContain(binding);
    const db = new Database(':memory:');
    expect(db.prepare('SELECT 6 * 7 AS n').get()).toEqual({ n: 42 });
    expect(db).toBeInstanceOf(Database);
    db.close();
    expect(Object.keys(require.cache)).toContain(binding);
  });

  it('says how to build it when the Electron build is missing', async () => {
    const { default: Database } = await import('../../electron/shell/sqlite-electron');
    rmSync(binding);
    expect(() => new Database(':memory:')).toThrow(/scripts\/build-native-electron\.mjs/);
  });
});
