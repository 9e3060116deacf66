import { build } from 'esbuild';
import { existsSync, symlinkSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const root = path.resolve(__dirname, '../..');

/**
 * Builds the store-update worker exactly as scripts/build.mjs ships it into `appDir`/dist/electron, with the
 * project's node_modules linked beside it as in an unpackaged app (the worker loads better-sqlite3 from there).
 */
export async function buildUpdateWorker(appDir: string): Promise<string> {
  const { updateWorkerOptions } = await import(pathToFileURL(path.join(root, 'scripts', 'build.mjs')).href) as
    { updateWorkerOptions: Parameters<typeof build>[0] };
  const outfile = path.join(appDir, 'dist', 'electron', 'store-update-worker.cjs');
  await build({ ...updateWorkerOptions, outfile, logLevel: 'silent' });
  const modules = path.join(appDir, 'node_modules');
  if (!existsSync(modules)) symlinkSync(path.join(root, 'node_modules'), modules, 'dir');
  return outfile;
}
