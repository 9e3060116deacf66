/**
 * `npm run web [-- --port N] [-- --db FILE | --store LOCATION] [-- --app-dir DIR] [-- --static DIR]`: the UI in
 * any browser, served on 127.0.0.1 only. Prints the address to open (it carries this run's token). LOCATION is a
 * file or a postgres:// connection string; without either option COILWRIGHT_STORE names the store, else the
 * server store last opened on the Data screen (DIR/app-settings.json), else the program's own file
 * (DIR/coilwright.db). DIR is ~/.coilwright unless given.
 */
import { homedir } from 'node:os';
import path from 'node:path';
import { isPostgresLocation } from '../../db';
import { chosenStore } from '../host/first-run';
import { fileStoreChoice } from '../host/store-choice';
import { startWebServer } from './server';

export interface WebArgs {
  port: number;
  /** The store: a SQLite file (resolved) or a PostgreSQL connection string. */
  dbFile: string;
  /** Whether --db, --store or COILWRIGHT_STORE named the store; otherwise dbFile is the program's own file. */
  named: boolean;
  /** The program's own folder: its store file and its settings file (the store chosen on the Data screen). */
  appDir: string;
  staticDir: string;
}

/** The program's settings file in its folder (the desktop app keeps the same name in its userData). */
export const APP_SETTINGS_FILE = 'app-settings.json';

const located = (location: string) => (isPostgresLocation(location) ? location : path.resolve(location));

export function parseWebArgs(argv: string[], defaults: { home: string; cwd: string; env?: NodeJS.ProcessEnv }): WebArgs | string {
  const fromEnv = chosenStore({}, defaults.env ?? {});
  let named = fromEnv !== undefined ? located(fromEnv) : undefined;
  const args = { port: 0, appDir: path.join(defaults.home, '.coilwright'), staticDir: path.join(defaults.cwd, 'dist', 'renderer') };
  for (let i = 0; i < argv.length; i += 2) {
    const [flag, value] = [argv[i], argv[i + 1]];
    if (value === undefined) return `${flag} needs a value`;
    if (flag === '--port' && /^\d{1,5}$/.test(value) && Number(value) <= 65535) args.port = Number(value);
    else if (flag === '--db') named = path.resolve(value);
    else if (flag === '--store') named = located(value);
    else if (flag === '--app-dir') args.appDir = path.resolve(value);
    else if (flag === '--static') args.staticDir = path.resolve(value);
    else return `unknown or bad option ${flag} ${value}`;
  }
  return { ...args, dbFile: named ?? path.join(args.appDir, 'coilwright.db'), named: named !== undefined };
}

async function run(): Promise<void> {
  const args = parseWebArgs(process.argv.slice(2), { home: homedir(), cwd: process.cwd(), env: process.env });
  if (typeof args === 'string') {
    console.error(`${args}\nusage: npm run web -- [--port N] [--db FILE | --store LOCATION] [--app-dir DIR] [--static DIR]`);
    process.exitCode = 2;
    return;
  }
  const choice = fileStoreChoice(path.join(args.appDir, APP_SETTINGS_FILE));
  const web = await startWebServer({ dbFile: args.dbFile, named: args.named, choice, staticDir: args.staticDir, port: args.port });
  console.log(`Coilwright is serving ${web.storeName}\nOpen ${web.url}\n(Ctrl+C stops it)`);
  const stop = () => void web.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

const invokedDirectly = process.argv[1] !== undefined && /(web[\\/]main\.[cm]?[jt]s|web-server\.cjs)$/.test(process.argv[1]);
if (invokedDirectly) {
  run().catch((e: unknown) => {
    console.error(`Coilwright could not start: ${(e as Error).message}`);
    process.exitCode = 1;
  });
}
