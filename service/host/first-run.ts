import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { ApiError } from '../../core/api';
import { STORE_VARIABLE, StoreError, createDemoShop, getSettings, isPostgresLocation, openPgStore, readOnlyNotice, saveSettings, storeName, tryOpenStore } from '../../db';
import { isTimeZone } from '../../core/calendar';
import type { OpenOptions, SqliteStore, Store } from '../../db';

export interface ShopStore {
  store: SqliteStore;
  /** Jobs put in by the demo shop on this open; 0 when the store already had a life of its own. */
  demoJobs: number;
  /** Something the user should read on start (the store is open read-only), or undefined. */
  notice?: string;
}

/** Nothing has been done in it yet: no job and no saved setting (so the demo cannot overwrite a shop's settings). */
function isPristine(store: Store): boolean {
  const count = (table: 'jobs' | 'settings') => (store.sql(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
  return count('jobs') === 0 && count('settings') === 0;
}

function openQuietly(file: string, options: OpenOptions): { ok: true; value: SqliteStore } | { ok: false; error: ApiError } {
  try {
    return tryOpenStore(file, options);
  } catch (e) {
    return { ok: false, error: { code: 'store-unopenable', message: `${file} cannot be opened: ${(e as Error).message}`, path: file } };
  }
}

/**
 * Opens the shop's store, creating its folder and the file when needed. A new or untouched store gets
 * the demo shop, so the first start shows worked examples instead of an empty list. Shared by the
 * desktop app and the web transport; it must not import electron.
 */
export function openShopStore(file: string, options: OpenOptions = {}):
  { ok: true; value: ShopStore } | { ok: false; error: ApiError } {
  try {
    mkdirSync(path.dirname(file), { recursive: true });
  } catch (e) {
    return { ok: false, error: { code: 'store-folder', message: `cannot create ${path.dirname(file)}: ${(e as Error).message}`, path: file } };
  }
  // A large store opens at once and is checked for damage in the background (db/damage-check.ts).
  const opened = openQuietly(file, { check: 'by-size', deferredCheck: 'background', ...options });
  if (!opened.ok) return opened;
  const store = opened.value;
  // A read-only store is shown as it is: the demo shop cannot be written into it.
  if (store.readOnly) return { ok: true, value: { store, demoJobs: 0, notice: readOnlyNotice(store.file, store.readOnly) } };
  return withDemo(store);
}

/** A new shop keeps its days in the time zone of the computer it starts on (Shop settings change it). */
function datedHere(store: Store): { ok: true } | { ok: false; error: ApiError } {
  const here = Intl.DateTimeFormat().resolvedOptions().timeZone;
  const settings = getSettings(store);
  if (!settings.ok) return settings;
  if (!isTimeZone(here) || settings.value.defaults.timeZone === here) return { ok: true };
  const saved = saveSettings(store, { defaults: { ...settings.value.defaults, timeZone: here } });
  return saved.ok ? { ok: true } : saved;
}

/** A pristine store of any backend gets the demo shop, as a new file does. */
function withDemo<S extends Store>(store: S): { ok: true; value: { store: S; demoJobs: number } } | { ok: false; error: ApiError } {
  if (!isPristine(store)) return { ok: true, value: { store, demoJobs: 0 } };
  const demo = createDemoShop(store);
  const dated = demo.ok ? datedHere(store) : demo;
  if (!dated.ok) {
    store.close();
    return dated;
  }
  return { ok: true, value: { store, demoJobs: demo.ok ? demo.value.jobs : 0 } };
}

/**
 * The shop's store at a location: a PostgreSQL connection string (`postgres://…`) or a SQLite file. Errors
 * name the store by host and database, never by the connection string (it may carry a password).
 */
export function openShopStoreAt(location: string, options: OpenOptions = {}):
  { ok: true; value: { store: Store; demoJobs: number; notice?: string } } | { ok: false; error: ApiError } {
  if (!isPostgresLocation(location)) return openShopStore(location, options);
  try {
    return withDemo(openPgStore(location, { ...(options.clock ? { clock: options.clock } : {}), ...(options.author ? { author: options.author } : {}) }));
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: { ...e.toApiError(), path: '--store' } };
    return { ok: false, error: { code: 'store-unopenable', message: `${storeName(location)} cannot be opened: ${(e as Error).message}`, path: '--store' } };
  }
}

/**
 * Which store a program opens: --store (a connection string or a file), else --db (a file), else the
 * COILWRIGHT_STORE environment variable, else the program's default (undefined here).
 */
export function chosenStore(options: { store?: string | undefined; db?: string | undefined }, env: NodeJS.ProcessEnv = process.env): string | undefined {
  return options.store ?? options.db ?? (env[STORE_VARIABLE]?.trim() || undefined);
}
