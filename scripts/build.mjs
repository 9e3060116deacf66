// Builds the desktop app into dist/: main and preload with esbuild, the renderer with vite.
//   node scripts/build.mjs            all three
//   node scripts/build.mjs main preload   only those (also: web, cli)
// The preload runs sandboxed and may require nothing but 'electron', so the build fails if any npm
// package ends up in it.
import { build } from 'esbuild';
import { existsSync, mkdirSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const at = (...parts) => path.join(root, ...parts);

/** Runtime packages main loads from node_modules (native code, or data files they read themselves). */
const mainExternals = ['electron', 'better-sqlite3', 'pg', 'pdfkit', 'svg-to-pdfkit', 'qrcode', 'fontkit'];

/**
 * A bundle's imports of better-sqlite3 go to `shim`, which sets the native binding for its runtime; only the
 * shims' shared constructor (electron/shell/sqlite-with-binding.ts) requires the real package.
 */
function sqliteThrough(shim) {
  const real = at('electron', 'shell', 'sqlite-with-binding.ts');
  return {
    name: 'sqlite-through-shim',
    setup(b) {
      b.onResolve({ filter: /^better-sqlite3$/ }, (args) =>
        (args.importer === real ? { path: 'better-sqlite3', external: true } : { path: at('electron', 'shell', shim) }));
    },
  };
}

const common = { bundle: true, format: 'cjs', logLevel: 'warning', absWorkingDir: root, legalComments: 'none' };

/** esbuild options, exported so tests can build in memory exactly what ships. */
export const mainOptions = {
  ...common,
  entryPoints: [at('electron', 'main.ts')],
  outfile: at('dist', 'electron', 'main.cjs'),
  platform: 'node',
  target: 'node22',
  external: mainExternals,
  // In the Electron main bundle, db/ gets better-sqlite3 through the shim that picks the Electron build.
  plugins: [sqliteThrough('sqlite-electron.ts')],
};

export const preloadOptions = {
  ...common,
  entryPoints: [at('electron', 'preload.ts')],
  outfile: at('dist', 'electron', 'preload.cjs'),
  platform: 'browser',
  target: 'chrome130',
  external: ['electron'],
  metafile: true,
};

/** The worker thread main starts to update a large store's schema while the windows keep painting. */
export const updateWorkerOptions = {
  ...common,
  entryPoints: [at('electron', 'shell', 'store-update-worker.ts')],
  outfile: at('dist', 'electron', 'store-update-worker.cjs'),
  platform: 'node',
  target: 'node22',
  external: mainExternals.filter((name) => name !== 'electron'),
  // A worker thread has no Electron `app`: its shim takes the binding main hands over.
  plugins: [sqliteThrough('sqlite-electron-worker.ts')],
};

export async function buildMain() {
  await build(mainOptions);
  await build(updateWorkerOptions);
}

export async function buildPreload() {
  const result = await build(preloadOptions);
  const packaged = Object.keys(result.metafile.inputs).filter((input) => input.includes('node_modules'));
  if (packaged.length > 0) throw new Error(`the sandboxed preload must not bundle npm packages: ${packaged.join(', ')}`);
}

/** The loopback web transport (npm run web): plain Node, no electron. */
export async function buildWebServer() {
  await build({
    ...common,
    entryPoints: [at('service', 'web', 'main.ts')],
    outfile: at('dist', 'web', 'web-server.cjs'),
    platform: 'node',
    target: 'node20',
    external: mainExternals,
  });
}

/** The command line as one bundle: `npm run cli` runs it (scripts/cli.mjs rebuilds it when a source is newer). */
export const cliOptions = {
  ...common,
  entryPoints: [at('service', 'cli', 'main.ts')],
  outfile: at('dist', 'cli', 'cli.cjs'),
  platform: 'node',
  target: 'node20',
  // exceljs (with its zip and stream packages, most of the bundle) loads from node_modules when a command reads
  // a spreadsheet, so the other commands do not parse it at every start.
  external: [...mainExternals.filter((name) => name !== 'electron'), 'exceljs'],
  // import() becomes a require: scripts/cli.mjs runs the bundle from V8's code cache, where import() fails.
  supported: { 'dynamic-import': false },
};

/** Written beside and renamed into place, so a command starting meanwhile never reads half a bundle. */
export async function buildCli() {
  const [output] = (await build({ ...cliOptions, write: false })).outputFiles;
  const partial = `${cliOptions.outfile}.${process.pid}.tmp`;
  mkdirSync(path.dirname(cliOptions.outfile), { recursive: true });
  writeFileSync(partial, output.contents);
  renameSync(partial, cliOptions.outfile);
}

/** The renderer engineer's renderer/vite.config.mts decides the output (dist/renderer by default). */
export async function buildRenderer({ quiet = false } = {}) {
  const config = at('renderer', 'vite.config.mts');
  if (!existsSync(at('renderer', 'index.html'))) {
    console.warn('renderer: skipped (renderer/index.html does not exist yet)');
    return false;
  }
  const { build: viteBuild } = await import('vite');
  if (existsSync(config)) {
    await viteBuild({ configFile: config, ...(quiet ? { logLevel: 'warn' } : {}) });
  } else {
    const { default: react } = await import('@vitejs/plugin-react');
    await viteBuild({ configFile: false, root: at('renderer'), base: './', plugins: [react()],
      build: { outDir: at('dist', 'renderer'), emptyOutDir: true } });
  }
  return true;
}

const steps = { main: buildMain, preload: buildPreload, renderer: buildRenderer, web: buildWebServer, cli: buildCli };

async function run(names) {
  for (const name of names) {
    const step = steps[name];
    if (!step) throw new Error(`unknown build step "${name}" (known: ${Object.keys(steps).join(', ')})`);
    const started = Date.now();
    const done = await step().catch((e) => {
      throw new Error(`${name}: ${e.message}`);
    });
    if (done !== false) console.log(`${name}: built in ${Date.now() - started} ms`);
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const names = process.argv.slice(2);
  run(names.length > 0 ? names : ['main', 'preload', 'renderer']).catch((e) => {
    console.error(`build failed: ${e.message}`);
    process.exit(1);
  });
}
