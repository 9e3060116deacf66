import Database from 'better-sqlite3';
import { existsSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import type { BackupResult, RestoreResult } from '../core/api/store';
import { StoreError, failure, success } from './errors';
import type { StoreResult } from './errors';
import { inspectStoreFile } from './inspect';
import type { OpenOptions } from './open';
import { openStore } from './open';
import type { Store } from './store';

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

/**
 * Copies the open store to `file` with SQLite's online backup (consistent even while writing), then
 * checks the copy opens as a store and passes its integrity check. An existing file is not overwritten.
 */
export async function backupStore(store: Store, file: string): Promise<StoreResult<BackupResult>> {
  if (sameFile(file, store.file)) return failure('same-file', 'a backup cannot be written over the store itself', 'file');
  if (existsSync(file)) return failure('file-exists', `${file} already exists: choose a new file name`, 'file');
  if (!existsSync(dirname(resolve(file)))) return failure('no-folder', `the folder of ${file} does not exist`, 'file');
  const partial = `${file}.partial`;
  try {
    await store.db.backup(partial);
    makeStandalone(partial);
    const info = inspectStoreFile(partial, { deep: true });
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
    const info = inspectStoreFile(file, { deep: true });
    if (info.state === 'new') return failure('not-a-store', `${file} is empty`, 'file');
    return success({ version: info.version });
  } catch (e) {
    return asFailure(e);
  }
}

function moveStoreAside(file: string, stamp: string): string | null {
  if (!existsSync(file)) return null;
  const kept = `${file}.before-restore-${stamp}`;
  renameSync(file, kept);
  for (const suffix of ['-wal', '-shm']) rmSync(`${file}${suffix}`, { force: true });
  return kept;
}

/** What a restore gives back: the outcome, and the store now open (the restored one, or the old one on failure). */
export interface RestoreOutcome {
  result: StoreResult<RestoreResult>;
  store: Store;
}

async function copyIn(from: string, incoming: string): Promise<void> {
  rmSync(incoming, { force: true });
  const source = new Database(from, { readonly: true, fileMustExist: true });
  try {
    await source.backup(incoming);
  } finally {
    source.close();
  }
  makeStandalone(incoming);
  inspectStoreFile(incoming, { deep: true });
}

/**
 * Replaces the store at `store.file` with a verified backup. The backup is verified, copied beside the
 * store and verified again before the store is closed; the old store is kept as FILE.before-restore-*.
 * The restored store is reopened (and migrated, when the backup is from an older version).
 */
export async function restoreStore(store: Store, from: string, options: OpenOptions = {}): Promise<RestoreOutcome> {
  if (sameFile(from, store.file)) return { result: failure('same-file', 'restore from a backup, not from the store itself', 'file'), store };
  const verified = verifyBackup(from);
  if (!verified.ok) return { result: verified, store };
  const file = store.file;
  const incoming = `${file}.restoring`;
  try {
    await copyIn(from, incoming);
  } catch (e) {
    for (const suffix of ['', '-wal', '-shm']) rmSync(`${incoming}${suffix}`, { force: true });
    return { result: asFailure(e), store };
  }
  store.db.pragma('wal_checkpoint(TRUNCATE)');
  store.close();
  const kept = moveStoreAside(file, new Date().toISOString().replace(/[:.]/g, '-'));
  renameSync(incoming, file);
  try {
    const reopened = openStore(file, options);
    return { result: success({ restoredFrom: from, previousKeptAs: kept, version: verified.value.version }), store: reopened };
  } catch (e) {
    if (kept) renameSync(kept, file);
    return { result: asFailure(e), store: openStore(file, options) };
  }
}
