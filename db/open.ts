import Database from 'better-sqlite3';
import { accessSync, constants, existsSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type { CheckProgress, DeferredCheck } from './damage-check';
import { CHECK_BEFORE_OPEN_MAX_BYTES, DamageCheck, storeBytes } from './damage-check';
import { StoreError } from './errors';
import { inspectStoreFile } from './inspect';
import { LATEST_VERSION, migrate, schemaVersion } from './migrations';
import { openForReading } from './read-only';
import { finishInterruptedRestore } from './recover';
import type { SqliteStore } from './store';
import { makeStore } from './store';

export interface OpenOptions {
  /** Milliseconds to wait for another connection's lock before giving up. */
  busyTimeout?: number;
  /** The clock writes are stamped with (tests pin it). */
  clock?: () => Date;
  /**
   * The damage check, PRAGMA quick_check, which reads every page (see CHECK_BEFORE_OPEN_MAX_BYTES):
   * 'quick' before opening (the default); 'by-size' before opening up to the size rule and after it above
   * (`deferredCheck` says where); 'none' (the bench's baseline and second connections to a checked store).
   */
  check?: 'quick' | 'none' | 'by-size';
  /** Where a store over the size rule is checked when `check` is 'by-size' (the default: 'background'). */
  deferredCheck?: DeferredCheck;
  /** The size rule's limit in bytes (CHECK_BEFORE_OPEN_MAX_BYTES unless a test lowers it). */
  checkBeforeOpenMaxBytes?: number;
  /** Told when a check deferred to the first save starts and ends. */
  onCheck?: CheckProgress;
  /** Who saves through this store (the signed-in name); by default COILWRIGHT_USER or the computer's account. */
  author?: string;
}

/** Connection settings that do not persist in the file, so they are set on every open. */
function configure(db: Database.Database, readOnly: boolean): void {
  if (!readOnly) {
    db.pragma('journal_mode = WAL');
    // Right after a switch to WAL the connection reports FULL; NORMAL is safe in WAL and much faster.
    db.pragma('synchronous = NORMAL');
  }
  db.pragma('foreign_keys = ON');
  // 32 MB of page cache (the default is 2 MB) keeps the search indexes of a large shop in memory.
  db.pragma('cache_size = -32768');
}

const writable = (path: string) => {
  try {
    accessSync(path, constants.W_OK);
    return true;
  } catch {
    return false;
  }
};

/** Why the store cannot be written (SQLite also writes its -wal and -shm files in the folder), or undefined. */
function readOnlyReason(file: string): string | undefined {
  const folder = dirname(resolve(file));
  if (existsSync(file) && !writable(file)) return 'the file is read-only';
  if (!writable(folder)) return `its folder ${folder} is read-only`;
  return undefined;
}

function connect(file: string, readOnly: boolean, options: OpenOptions): Database.Database {
  try {
    return readOnly ? openForReading(file, options.busyTimeout) : new Database(file, { timeout: options.busyTimeout ?? 5000 });
  } catch (e) {
    throw new StoreError('store-unopenable', `${file} cannot be opened (${(e as Error).message})`);
  }
}

/** Whether quick_check runs before opening, or after it (and where), by the option and the size rule. */
function checkPlan(file: string, options: OpenOptions): { before: 'quick' | 'none'; after?: DeferredCheck } {
  const check = options.check ?? 'quick';
  if (check !== 'by-size') return { before: check };
  if (storeBytes(file) <= (options.checkBeforeOpenMaxBytes ?? CHECK_BEFORE_OPEN_MAX_BYTES)) return { before: 'quick' };
  return { before: 'none', after: options.deferredCheck ?? 'background' };
}

function damageCheckOf(file: string, plan: ReturnType<typeof checkPlan>, options: OpenOptions, clock: () => Date): DamageCheck {
  if (plan.after === 'background') return DamageCheck.inBackground(file, clock);
  if (plan.after === 'first-save') return DamageCheck.beforeFirstSave(file, clock, options.onCheck);
  return plan.before === 'quick' ? DamageCheck.passedAtOpen(file, clock) : DamageCheck.notChecked(file, clock, 'not asked for');
}

/**
 * Opens (or creates) a job store. A restore interrupted half way is finished or rolled back first. The
 * file is then inspected read-only: anything that is not a Coilwright store, fails PRAGMA quick_check, or
 * comes from a newer version is refused with a StoreError and left exactly as it was. With check 'by-size'
 * a store over the size rule gets only the cheap checks here and its quick_check after opening: when that
 * finds damage, the store turns read-only and every save answers how to restore it. A store that cannot
 * be written (read-only file or folder) opens read-only: reads work, saves say why they cannot. Pending
 * migrations apply in one transaction.
 */
export function openStore(file: string, options: OpenOptions = {}): SqliteStore {
  finishInterruptedRestore(file);
  const plan = checkPlan(file, options);
  const info = inspectStoreFile(file, { check: plan.before });
  const readOnly = readOnlyReason(file);
  if (readOnly && info.state === 'new') throw new StoreError('store-unopenable', `${file} cannot be created: ${readOnly}`);
  const db = connect(file, readOnly !== undefined, options);
  try {
    configure(db, readOnly !== undefined);
    if (readOnly && schemaVersion(db) < LATEST_VERSION) {
      throw new StoreError('store-read-only', `${file} was made by an earlier version of Coilwright and needs updating, but ${readOnly}: `
        + 'make it writable once so it can be updated, or open a copy of it');
    }
    if (!readOnly) migrate(db);
  } catch (e) {
    db.close();
    if (e instanceof StoreError) throw e;
    throw new StoreError('store-unopenable', `${file} cannot be opened (${(e as Error).message})`);
  }
  // Started once migrations are done, so the check reads the store as it will be worked on.
  const clock = options.clock ?? (() => new Date());
  return makeStore(db, file, clock, readOnly, options.author, damageCheckOf(file, plan, options, clock));
}

/** openStore as a value: `{ ok: false, error }` instead of an exception. */
export function tryOpenStore(file: string, options: OpenOptions = {}):
  { ok: true; value: SqliteStore } | { ok: false; error: { code: string; message: string; path: string } } {
  try {
    return { ok: true, value: openStore(file, options) };
  } catch (e) {
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    throw e;
  }
}
