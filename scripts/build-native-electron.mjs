// Makes the Electron-ABI build of better-sqlite3 for unpackaged runs (npm start), in
// native/electron-<major>/better_sqlite3.node. Run it once per Electron major, on a machine with
// internet access:   node scripts/build-native-electron.mjs
//
// node_modules keeps the Node build that vitest and the CLI load: this script works on a COPY of the
// package in a temporary folder and never writes to node_modules. It tries a published prebuild first
// (prebuild-install), then compiles against Electron's headers with node-gyp. Packaged apps do not use
// this file: the release job rebuilds in place there.
import { spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(path.join(root, 'package.json'));
const readJson = (file) => JSON.parse(readFileSync(file, 'utf8'));

const electronVersion = readJson(require.resolve('electron/package.json')).version;
const sqliteDir = path.dirname(require.resolve('better-sqlite3/package.json'));
const sqliteVersion = readJson(path.join(sqliteDir, 'package.json')).version;
const major = electronVersion.split('.')[0];
const target = path.join(root, 'native', `electron-${major}`);
const arch = process.env.npm_config_arch ?? process.arch;

function run(label, command, args, cwd) {
  console.log(`${label}: ${path.basename(command)} ${args.join(' ')}`);
  const result = spawnSync(command, args, { cwd, stdio: 'inherit' });
  return result.status === 0;
}

/** node-gyp from node_modules when present, else the copy npm itself carries. */
function nodeGyp() {
  try {
    return require.resolve('node-gyp/bin/node-gyp.js');
  } catch {
    const bundled = path.join(path.dirname(process.execPath), '..', 'lib', 'node_modules', 'npm', 'node_modules', 'node-gyp', 'bin', 'node-gyp.js');
    if (existsSync(bundled)) return bundled;
    throw new Error('node-gyp was not found (install it with npm i -g node-gyp)');
  }
}

function prebuilt(copy) {
  let bin;
  try {
    bin = require.resolve('prebuild-install/bin.js');
  } catch {
    return false;
  }
  return run('prebuild', process.execPath, [bin, '--runtime', 'electron', '--target', electronVersion, '--arch', arch, '--verbose'], copy);
}

function compiled(copy) {
  return run('compile', process.execPath, [nodeGyp(), 'rebuild', '--release', `--target=${electronVersion}`, `--arch=${arch}`,
    '--dist-url=https://electronjs.org/headers'], copy);
}

const work = mkdtempSync(path.join(os.tmpdir(), 'coilwright-sqlite-'));
try {
  const copy = path.join(work, 'better-sqlite3');
  cpSync(sqliteDir, copy, { recursive: true, filter: (src) => !src.startsWith(path.join(sqliteDir, 'build')) });
  const built = path.join(copy, 'build', 'Release', 'better_sqlite3.node');
  if (!(prebuilt(copy) && existsSync(built)) && !(compiled(copy) && existsSync(built))) {
    throw new Error('neither a prebuild nor a compile produced better_sqlite3.node (see the output above)');
  }
  mkdirSync(target, { recursive: true });
  cpSync(built, path.join(target, 'better_sqlite3.node'));
  const record = { electronVersion, sqliteVersion, arch, platform: process.platform, builtAt: new Date().toISOString() };
  writeFileSync(path.join(target, 'build.json'), `${JSON.stringify(record, null, 2)}\n`);
  console.log(`better-sqlite3 ${sqliteVersion} for Electron ${electronVersion} (${process.platform}-${arch}): ${target}`);
} catch (e) {
  console.error(`build-native-electron failed: ${e.message}`);
  process.exitCode = 1;
} finally {
  rmSync(work, { recursive: true, force: true });
}
