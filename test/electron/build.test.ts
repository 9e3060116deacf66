/** The bundles as scripts/build.mjs makes them, built in memory. */
import { build } from 'esbuild';
import type { BuildOptions } from 'esbuild';
import { isBuiltin } from 'node:module';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '../..');
let options: { mainOptions: BuildOptions; preloadOptions: BuildOptions; updateWorkerOptions: BuildOptions };

async function bundle(base: BuildOptions) {
  const result = await build({ ...base, write: false, metafile: true, logLevel: 'silent' });
  const required = [...result.outputFiles![0]!.text.matchAll(/require\("([^"]+)"\)/g)].map((m) => m[1]!);
  return { inputs: Object.keys(result.metafile!.inputs), required };
}

beforeAll(async () => {
  options = await import(pathToFileURL(path.join(root, 'scripts', 'build.mjs')).href);
});

describe('the main bundle', () => {
  it('hands db/ better-sqlite3 through the Electron shim, and requires the real one only there', async () => {
    const { inputs, required } = await bundle(options.mainOptions);
    expect(inputs).toContain('electron/shell/sqlite-electron.ts');
    expect(inputs).not.toContain('electron/shell/sqlite-electron-worker.ts');
    expect(inputs).toContain('db/open.ts');
    expect(required.filter((r) => r === 'better-sqlite3')).toHaveLength(1);
  });

  it('loads only electron, the native/data-file packages and Node built-ins at run time', async () => {
    const { required } = await bundle(options.mainOptions);
    const allowed = new Set(['electron', 'better-sqlite3', 'pdfkit', 'svg-to-pdfkit', 'qrcode', 'fontkit']);
    // Bundled packages (the spreadsheet reader among them) may require built-ins by their bare names.
    expect(required.filter((r) => !allowed.has(r) && !isBuiltin(r))).toEqual([]);
  });
});

describe('the store-update worker bundle', () => {
  it('hands db/ better-sqlite3 through the worker shim and requires no Electron (a worker thread has no app)', async () => {
    const { inputs, required } = await bundle(options.updateWorkerOptions);
    expect(inputs).toContain('electron/shell/sqlite-electron-worker.ts');
    expect(inputs).not.toContain('electron/shell/sqlite-electron.ts');
    expect(inputs).toContain('db/migrations/index.ts');
    expect(required.filter((r) => r === 'better-sqlite3')).toHaveLength(1);
    expect(required.filter((r) => r !== 'better-sqlite3' && !isBuiltin(r))).toEqual([]);
  });
});

describe('the preload bundle', () => {
  it('is one file that requires nothing but electron (the sandbox allows no npm package)', async () => {
    const { inputs, required } = await bundle(options.preloadOptions);
    expect(inputs.filter((i) => i.includes('node_modules'))).toEqual([]);
    expect(required).toEqual(['electron']);
    expect(inputs).not.toContain('core/api/index.ts');
  });
});
