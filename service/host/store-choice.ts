import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { dirname } from 'node:path';
import type { ApiError } from '../../core/api';
import { writeFileReplacing } from '../../db';
import type { OpenOptions, Store } from '../../db';
import { isPostgresLocation, storeName } from '../../db';
import { openShopStoreAt } from './first-run';

/**
 * The store chosen on the Data screen, remembered in the program's own settings file on this computer (never
 * in the job store), so the next start opens it again. Only the connection string without its password is
 * written: `pg` finds the password at connect time in PGPASSWORD or the standard ~/.pgpass file.
 */
export interface StoreChoice {
  /** The connection string as saved: user, host, port, database and options; never a password. */
  location: string;
  /** A password was given when the store was opened and left out of the saved text. */
  passwordLeftOut: boolean;
}

/** Query options of a connection string that carry a secret (libpq's names, which `pg` also reads). */
const SECRET_OPTIONS = ['password', 'sslpassword'];

/** The connection string without its password (in the user part or as an option); undefined when it does not read. */
export function withoutPassword(connection: string): StoreChoice | undefined {
  if (!isPostgresLocation(connection)) return undefined;
  let url: URL;
  try {
    url = new URL(connection.trim());
  } catch {
    return undefined;
  }
  const passwordLeftOut = url.password !== '' || SECRET_OPTIONS.some((o) => url.searchParams.has(o));
  url.password = '';
  for (const o of SECRET_OPTIONS) url.searchParams.delete(o);
  return { location: url.toString(), passwordLeftOut };
}

/** What the Data screen asks of the host: remember a chosen store, forget it, say what the next start opens. */
export interface StoreChoiceKeeper {
  /** Saves the choice for the next start; the saved text never holds the password. */
  remember(connection: string): StoreChoice;
  /** The next start opens the program's own store file again. */
  forget(): void;
  remembered(): StoreChoice | null;
}

/** The settings file's keys this module owns; other keys in the file are kept as they are. */
interface AppSettings { store?: StoreChoice & { savedAt: string } }

function readAppSettings(file: string): Record<string, unknown> {
  if (!existsSync(file)) return {};
  try {
    const parsed: unknown = JSON.parse(readFileSync(file, 'utf8'));
    return parsed && typeof parsed === 'object' && !Array.isArray(parsed) ? parsed as Record<string, unknown> : {};
  } catch {
    // A settings file that does not read is treated as empty: the program starts on its own store.
    return {};
  }
}

/** The choice kept in `file` (the program's settings file: userData/app-settings.json, ~/.coilwright/app-settings.json). */
export function fileStoreChoice(file: string, clock: () => Date = () => new Date()): StoreChoiceKeeper {
  const write = (settings: Record<string, unknown>) => {
    mkdirSync(dirname(file), { recursive: true });
    writeFileReplacing(file, `${JSON.stringify(settings, null, 2)}\n`, 'connection');
  };
  return {
    remember(connection) {
      const choice = withoutPassword(connection);
      if (!choice) throw new Error('only a postgres:// connection string that reads is remembered');
      write({ ...readAppSettings(file), store: { ...choice, savedAt: clock().toISOString() } } satisfies AppSettings);
      return choice;
    },
    forget() {
      const { store: _dropped, ...rest } = readAppSettings(file);
      if (_dropped !== undefined) write(rest);
    },
    remembered() {
      const saved = (readAppSettings(file) as AppSettings).store;
      if (!saved || typeof saved.location !== 'string') return null;
      // Whatever wrote the file, a password never leaves it towards a connection or the screen.
      const clean = withoutPassword(saved.location);
      return clean ? { location: clean.location, passwordLeftOut: saved.passwordLeftOut === true } : null;
    },
  };
}

export type StartingStore =
  | { ok: true; value: { store: Store; demoJobs: number; notice?: string } }
  | { ok: false; error: ApiError };

/**
 * The store a desktop or browser start opens: the one named on the command line or in COILWRIGHT_STORE
 * (`explicit`), else the one remembered from the Data screen, else the program's own file. A remembered server
 * store that cannot be opened (down, or no password in PGPASSWORD or ~/.pgpass) does not stop the program: it
 * opens its own file and says why, so the estimator knows which store is open.
 */
export function openStartingStore(explicit: string | undefined, keeper: StoreChoiceKeeper, ownFile: string, options: OpenOptions = {}): StartingStore {
  if (explicit !== undefined) return openShopStoreAt(explicit, options);
  const remembered = keeper.remembered();
  if (!remembered) return openShopStoreAt(ownFile, options);
  const opened = openShopStoreAt(remembered.location, options);
  if (opened.ok) return opened;
  const own = openShopStoreAt(ownFile, options);
  if (!own.ok) return own;
  const why = `The shared store ${storeName(remembered.location)} chosen on the Data screen could not be opened (${opened.error.message}). `
    + `This start works in ${ownFile} instead. If the server asks for a password, put it in PGPASSWORD or ~/.pgpass (it is never saved by `
    + 'Coilwright), then open the server store again on the Data screen.';
  return { ok: true, value: { ...own.value, notice: own.value.notice ? `${why}\n${own.value.notice}` : why } };
}
