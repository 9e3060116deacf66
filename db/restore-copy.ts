import Database from 'better-sqlite3';
import { rmSync } from 'node:fs';
import { inspectStoreFile } from './inspect';
import { migrate } from './migrations';

/** Removes a store file and what SQLite keeps beside it. */
export function removeStoreFiles(file: string): void {
  for (const suffix of ['', '-wal', '-shm', '-journal']) rmSync(`${file}${suffix}`, { force: true });
}

/**
 * Copies a verified backup to `to` with SQLite's online backup, brings its schema up to this version's
 * (so the copy and the live store have the same tables) and checks it again. One self-contained file:
 * rollback journal, nothing beside it.
 */
export async function prepareIncoming(from: string, to: string): Promise<void> {
  removeStoreFiles(to);
  const source = new Database(from, { readonly: true, fileMustExist: true });
  try {
    await source.backup(to);
  } finally {
    source.close();
  }
  const copy = new Database(to, { fileMustExist: true });
  try {
    copy.pragma('journal_mode = DELETE');
    migrate(copy);
  } finally {
    copy.close();
  }
  inspectStoreFile(to, { check: 'full' });
}
