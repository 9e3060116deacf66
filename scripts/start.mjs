// npm start: the desktop app when Electron's runtime is on this machine (build, then `electron .`, as
// always). Where it is not (its download failed or is blocked), one plain line says so and the same
// app is served on 127.0.0.1 by the web transport and opened in the default browser.
//   node scripts/start.mjs [--db FILE | --store LOCATION] [--port N]   (the options apply to the browser start only;
//   COILWRIGHT_STORE names the store for both starts)
// BROWSER=none prints the address instead of opening it; BROWSER=/path/to/program opens it with that.
import { spawn, spawnSync } from 'node:child_process';
import { homedir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { electronRuntime } from './electron-runtime.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

function startDesktop() {
  const built = spawnSync(process.execPath, [path.join(root, 'scripts', 'build.mjs')], { cwd: root, stdio: 'inherit' });
  if (built.status !== 0) process.exit(built.status ?? 1);
  const cli = path.join(root, 'node_modules', 'electron', 'cli.js');
  const app = spawn(process.execPath, [cli, '.', ...process.argv.slice(2)], { cwd: root, stdio: 'inherit' });
  app.on('exit', (code) => process.exit(code ?? 1));
}

/** Where the desktop app keeps its store when run from the source tree (Electron's userData for "coilwright"). */
function desktopStoreFile() {
  const appData = process.platform === 'win32' ? process.env.APPDATA ?? path.join(homedir(), 'AppData', 'Roaming')
    : process.platform === 'darwin' ? path.join(homedir(), 'Library', 'Application Support')
      : process.env.XDG_CONFIG_HOME || path.join(homedir(), '.config');
  return path.join(appData, 'coilwright', 'coilwright.db');
}

/** The platform's own way to open an address, or BROWSER's program; null when asked not to open one. */
function opener(url) {
  const chosen = process.env.BROWSER;
  if (chosen === 'none') return null;
  if (chosen) return [chosen, [url]];
  if (process.platform === 'darwin') return ['open', [url]];
  if (process.platform === 'win32') return ['cmd', ['/c', 'start', '""', url]];
  return ['xdg-open', [url]];
}

function openBrowser(url) {
  const say = () => console.log(`No browser could be opened here: open ${url}`);
  const how = opener(url);
  if (!how) return say();
  const child = spawn(how[0], how[1], { stdio: 'ignore', detached: true });
  child.on('error', say);
  child.on('exit', (code) => { if (code !== 0) say(); });
  child.unref();
}

async function startInBrowser(reason) {
  console.log(`Electron's runtime is not available on this machine (${reason}), so Coilwright opens in your web browser instead.`);
  const { buildRenderer, buildWebServer } = await import('./build.mjs');
  await buildRenderer({ quiet: true });
  await buildWebServer();
  const args = process.argv.slice(2);
  const named = args.includes('--db') || args.includes('--store') || Boolean(process.env.COILWRIGHT_STORE?.trim());
  // Not named: the desktop app's own folder, so the browser start opens the store it would (its file, or the
  // server store last chosen on the Data screen, kept in app-settings.json there).
  const withDb = named ? args : ['--app-dir', path.dirname(desktopStoreFile()), ...args];
  const server = spawn(process.execPath, [path.join(root, 'dist', 'web', 'web-server.cjs'), ...withDb], {
    cwd: root, stdio: ['ignore', 'pipe', 'inherit'],
  });
  let opened = false;
  server.stdout.setEncoding('utf8');
  server.stdout.on('data', (text) => {
    process.stdout.write(text);
    const url = /Open (http:\/\/\S+)/.exec(text)?.[1];
    if (url && !opened) {
      opened = true;
      openBrowser(url);
    }
  });
  for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
  server.on('exit', (code, signal) => process.exit(code ?? (signal ? 0 : 1)));
}

const runtime = electronRuntime();
if (runtime.available) startDesktop();
else await startInBrowser(runtime.reason);
