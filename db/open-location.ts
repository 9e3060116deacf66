import type { OpenOptions } from './open';
import { openStore } from './open';
import { isPostgresLocation, openPgStore } from './pg';
import type { Store } from './store';

/**
 * Opens the store a location names: a `postgres://` (or `postgresql://`) connection string opens that
 * database; anything else is a SQLite file, the default.
 */
export function openStoreAt(location: string, options: OpenOptions & { author?: string } = {}): Store {
  if (isPostgresLocation(location)) {
    return openPgStore(location, { ...(options.clock ? { clock: options.clock } : {}), ...(options.author ? { author: options.author } : {}) });
  }
  return openStore(location, options);
}

/** The environment variable that names the store when no --store or --db is given. */
export const STORE_VARIABLE = 'COILWRIGHT_STORE';
