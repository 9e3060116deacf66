import Database from 'better-sqlite3';
import { existsSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type { BackupResult, RestoreResult } from '../core/api/store';
import { StoreError, failure, success } from './errors';
import type { StoreResult } from './errors';
import { inspectStoreFile } from './inspect';
import type { LongRun } from './long-run';
import type { OpenOptions } from './open';
import { openStore } from './open';
import { INCOMING, restoreDamagedStore } from './recover';
import { prepareIncoming, removeStoreFiles } from './restore-copy';
import { replaceRows } from './restore-into';
import type { SqliteStore as Store } from './store';
import { writeFailure, writeRefusal } from './store';

function asFailure(e: unknown): { ok: false; error: { code: string; message: string; path: string } } {
  if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
  return failure('backup-failed', (e as Error).message, 'file');
}

/**
 * A fresh copy carries the source's WAL flag. Switching it to a rollback journal makes it one
 * self-contained file (nothing beside it to lose when it is moved or mailed) before it is checked.
 */
function makeStandalone(file: string): void {
  const db = new Database(file, { fileMustExist: true });
  try {
    db.pragma('journal_mode = DELETE');
  } finally {
    db.close();
  }
}

function sameFile(a: string, b: string): boolean {
  return resolve(a) === resolve(b);
}

/** better-sqlite3's own default: pages copied between two turns of the event loop. */
const BACKUP_PAGES_PER_STEP = 100;

/**
 * Copies the open store to `file` with SQLite's online backup (consistent even while writing), then
 * checks the copy opens as a store and passes its integrity check. An existing file is not overwritten.
 */
export async function backupStore(store: Store, file: string, long: LongRun = {}): Promise<StoreResult<BackupResult>> {
  if (sameFile(file, store.file)) return failure('same-file', 'a backup cannot be written over the store itself', 'file');
  if (existsSync(file)) return failure('file-exists', `${file} already exists: choose a new file name`, 'file');
  if (!existsSync(dirname(resolve(file)))) return failure('no-folder', `the folder of ${file} does not exist`, 'file');
  const partial = `${file}.partial`;
  try {
    await store.db.backup(partial, {
      progress({ totalPages, remainingPages }) {
        if (long.signal?.aborted) throw new StoreError('cancelled', 'the backup was cancelled: no file was written', '');
        long.onProgress?.(totalPages - remainingPages, totalPages);
        return BACKUP_PAGES_PER_STEP;
      },
    });
    makeStandalone(partial);
    const info = inspectStoreFile(partial, { check: 'full' });
    renameSync(partial, file);
    return success({ file, bytes: statSync(file).size, version: info.version });
  } catch (e) {
    for (const suffix of ['', '-wal', '-shm']) rmSync(`${partial}${suffix}`, { force: true });
    return asFailure(e);
  }
}

/** Verifies a backup: a Coilwright store, integrity_check ok, schema not newer than this program. */
export function verifyBackup(file: string): StoreResult<{ version: number }> {
  if (!existsSync(file)) return failure('not-found', `${file} does not exist`, 'file');
  try {
    const info = inspectStoreFile(file, { check: 'full' });
    if (info.state === 'new') return failure('not-a-store', `${file} is empty`, 'file');
    return success({ version: info.version });
  } catch (e) {
    return asFailure(e);
  }
}

/** Where a restore can be paused (tests stop the process there to prove a crash loses nothing). */
export type RestoreStage = 'copied' | 'kept' | 'replaced' | 'ready' | 'moved';

export interface RestoreOptions extends OpenOptions {
  pause?: (stage: RestoreStage) => Promise<void>;
}

/** What a restore gives back: the outcome, and the store open now (the same connection, restored or not). */
export interface RestoreOutcome {
  result: StoreResult<RestoreResult>;
  store: Store;
}

const stampNow = () => new Date().toISOString().replace(/[:.]/g, '-');

/**
 * Keeps the store as it is now beside it, then copies the incoming rows over the live store in one
 * write transaction. A write by another connection between the two would be in neither, so the write
 * lock is taken, and when the store changed since the copy was kept, the copy is taken again.
 */
async function keepAndReplace(store: Store, options: RestoreOptions): Promise<string> {
  for (let round = 0; round < 3; round++) {
    const kept = await backupStore(store, `${store.file}.before-restore-${stampNow()}`);
    if (!kept.ok) throw new StoreError(kept.error.code, `the store could not be kept before the restore: ${kept.error.message}`, 'file');
    const seen = store.db.pragma('data_version', { simple: true });
    await options.pause?.('kept');
    store.db.exec('BEGIN IMMEDIATE');
    try {
      if (store.db.pragma('data_version', { simple: true }) !== seen) {
        store.db.exec('ROLLBACK');
        removeStoreFiles(kept.value.file);
        continue;
      }
      replaceRows(store);
      await options.pause?.('replaced');
      store.db.exec('COMMIT');
      return kept.value.file;
    } catch (e) {
      if (store.db.inTransaction) store.db.exec('ROLLBACK');
      removeStoreFiles(kept.value.file);
      throw writeFailure(store, e);
    }
  }
  throw new StoreError('store-busy', `${store.file} is being written by another program all the time: try the restore again`, 'file');
}

/**
 * A store its damage check failed cannot take a backup's rows in place (its own pages are not to be trusted),
 * so it is closed, kept beside as FILE.damaged-*, the verified backup is put in its place, and the store is
 * opened again, as at the start of the program. A program that had it open goes on with the damaged file.
 */
async function restoreOverDamaged(store: Store, from: string, options: RestoreOptions): Promise<RestoreOutcome> {
  const verified = verifyBackup(from);
  if (!verified.ok) return { result: verified, store };
  const { file, author } = store;
  store.close();
  const restored = await restoreDamagedStore(file, from);
  const reopened = openStore(file, { ...options, author });
  if (!restored.ok) return { result: restored, store: reopened };
  const { restoredFrom, previousKeptAs, version } = restored.value;
  return { result: success({ restoredFrom, previousKeptAs, version }), store: reopened };
}

/**
 * Restores a verified backup into the live store, while other programs (a second window, the web
 * transport, the command line) may have it open: the backup is copied beside the store and brought to
 * this version's schema, the store as it was is kept as FILE.before-restore-*, and the rows are replaced
 * in one transaction, so every connection sees the restored store at its next read and goes on writing
 * into the same file. Job and quote sequences keep the higher of the two values: no number is reused.
 */
export async function restoreStore(store: Store, from: string, options: RestoreOptions = {}): Promise<RestoreOutcome> {
  if (sameFile(from, store.file)) return { result: failure('same-file', 'restore from a backup, not from the store itself', 'file'), store };
  if (store.damageCheck.state().state === 'failed') return restoreOverDamaged(store, from, options);
  const refused = writeRefusal(store);
  if (refused) return { result: { ok: false, error: refused.toApiError() }, store };
  const verified = verifyBackup(from);
  if (!verified.ok) return { result: verified, store };
  const incoming = `${store.file}${INCOMING}${process.pid}`;
  try {
    await prepareIncoming(from, incoming);
    await options.pause?.('copied');
    store.db.prepare('ATTACH DATABASE ? AS incoming').run(incoming);
    try {
      const kept = await keepAndReplace(store, options);
      return { result: success({ restoredFrom: from, previousKeptAs: kept, version: verified.value.version }), store };
    } finally {
      store.db.exec('DETACH DATABASE incoming');
    }
  } catch (e) {
    return { result: asFailure(e), store };
  } finally {
    removeStoreFiles(incoming);
  }
}
