import Database from 'better-sqlite3';
import { closeSync, existsSync, openSync, readSync, statSync } from 'node:fs';
import { StoreError } from './errors';
import { APPLICATION_ID, LATEST_VERSION } from './migrations';

const SQLITE_HEADER = 'SQLite format 3\u0000';

export interface StoreFileInfo {
  /** "new": no file yet, or an empty one; "store": a Coilwright store at `version`. */
  state: 'new' | 'store';
  version: number;
}

function readHeader(file: string): string {
  const fd = openSync(file, 'r');
  try {
    const buffer = Buffer.alloc(16);
    const read = readSync(fd, buffer, 0, 16, 0);
    return buffer.subarray(0, read).toString('latin1');
  } finally {
    closeSync(fd);
  }
}

function readPragmas(file: string, deep: boolean): { applicationId: number; version: number; integrity: string } {
  let db: Database.Database | undefined;
  try {
    db = new Database(file, { readonly: true, fileMustExist: true });
    const applicationId = db.pragma('application_id', { simple: true }) as number;
    const version = db.pragma('user_version', { simple: true }) as number;
    db.prepare('SELECT count(*) FROM sqlite_schema').get();
    const integrity = deep ? String(db.pragma('integrity_check', { simple: true })) : 'ok';
    return { applicationId, version, integrity };
  } catch (e) {
    throw new StoreError('store-corrupt', `${file} is damaged and cannot be read (${(e as Error).message})`);
  } finally {
    db?.close();
  }
}

/**
 * Looks at a file without writing to it: the SQLite header, then (read-only) the application id and
 * schema version, and with `deep` a full integrity check. Throws StoreError for anything that is not a
 * Coilwright store this version can open.
 */
export function inspectStoreFile(file: string, { deep = false } = {}): StoreFileInfo {
  if (!existsSync(file)) return { state: 'new', version: 0 };
  const stat = statSync(file);
  if (!stat.isFile()) throw new StoreError('not-a-store', `${file} is not a file`);
  if (stat.size === 0) return { state: 'new', version: 0 };
  if (readHeader(file) !== SQLITE_HEADER) {
    throw new StoreError('not-a-store', `${file} is not a Coilwright store (not a SQLite database)`);
  }
  const { applicationId, version, integrity } = readPragmas(file, deep);
  if (applicationId !== APPLICATION_ID) {
    throw new StoreError('not-a-store', `${file} is a SQLite database but not a Coilwright store`);
  }
  if (version > LATEST_VERSION) {
    throw new StoreError('store-too-new',
      `${file} has schema version ${version}; this version of Coilwright knows up to ${LATEST_VERSION}: update Coilwright to open it`);
  }
  if (integrity !== 'ok') throw new StoreError('store-corrupt', `${file} failed its integrity check: ${integrity}`);
  return { state: 'store', version };
}
