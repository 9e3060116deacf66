// Whether Electron's runtime (its binary) is on this machine, found the way the `electron` package finds
// it (path.txt names the executable inside dist/, ELECTRON_OVERRIDE_DIST_PATH replaces dist/), but
// without requiring the package: its index.js starts a download when the binary is missing.
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

/**
 * @param {{ packageDir?: string | null, env?: NodeJS.ProcessEnv }} [where]
 * @returns {{ available: true, executable: string } | { available: false, reason: string }}
 */
export function electronRuntime(where = {}) {
  const env = where.env ?? process.env;
  const dir = where.packageDir === undefined ? electronPackageDir() : where.packageDir;
  if (dir === null) return { available: false, reason: 'the electron package is not installed' };
  const pathFile = path.join(dir, 'path.txt');
  const name = existsSync(pathFile) ? readFileSync(pathFile, 'utf8').trim() : '';
  const override = env.ELECTRON_OVERRIDE_DIST_PATH;
  if (override) {
    const executable = path.join(override, name || 'electron');
    return existsSync(executable) ? { available: true, executable } : { available: false, reason: `no Electron binary at ${executable}` };
  }
  if (name === '') return { available: false, reason: 'its binary was never downloaded' };
  const executable = path.join(dir, 'dist', name);
  return existsSync(executable) ? { available: true, executable } : { available: false, reason: `no Electron binary at ${executable}` };
}

function electronPackageDir() {
  try {
    return path.dirname(createRequire(import.meta.url).resolve('electron/package.json'));
  } catch {
    return null;
  }
}
