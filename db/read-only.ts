import Database from 'better-sqlite3';
import { existsSync, readFileSync, statSync } from 'node:fs';

const NO_SHARED_MEMORY = new Set(['SQLITE_READONLY_DIRECTORY', 'SQLITE_CANTOPEN', 'SQLITE_READONLY_CANTINIT']);

/**
 * Opens a store file for reading only. A WAL store needs its -shm file, which SQLite cannot create in a
 * folder that is read-only; when no -wal file holds pages not yet in the store, the file alone is the
 * whole store, so it is read into memory as a snapshot (its header set to rollback-journal mode, which
 * needs no -shm). Nothing is ever written to the file.
 */
export function openForReading(file: string, timeout = 5000): Database.Database {
  let db: Database.Database | undefined;
  try {
    db = new Database(file, { readonly: true, fileMustExist: true, timeout });
    db.prepare('SELECT count(*) FROM sqlite_schema').get();
    return db;
  } catch (e) {
    db?.close();
    const wal = `${file}-wal`;
    const pendingPages = existsSync(wal) && statSync(wal).size > 0;
    if (!(e instanceof Database.SqliteError) || !NO_SHARED_MEMORY.has(e.code) || pendingPages) throw e;
    const image = readFileSync(file);
    if (image.length >= 20) image[18] = image[19] = 1;
    return new Database(image, { readonly: true });
  }
}
