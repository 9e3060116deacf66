import Database from 'better-sqlite3';
import { closeSync, existsSync, openSync, readSync, statSync } from 'node:fs';
import { StoreError } from './errors';
import { APPLICATION_ID, LATEST_VERSION } from './migrations';
import { damagedMessage } from './messages';
import { openForReading } from './read-only';

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

/** How far a file is checked: none (header and schema only), quick (PRAGMA quick_check), full (integrity_check). */
export type StoreCheck = 'none' | 'quick' | 'full';

const CHECK_PRAGMA = { quick: 'quick_check', full: 'integrity_check' } as const;

function readPragmas(file: string, check: StoreCheck): { applicationId: number; version: number; integrity: string } {
  let db: Database.Database | undefined;
  try {
    db = openForReading(file);
    const applicationId = db.pragma('application_id', { simple: true }) as number;
    const version = db.pragma('user_version', { simple: true }) as number;
    db.prepare('SELECT count(*) FROM sqlite_schema').get();
    const integrity = check === 'none' ? 'ok'
      : (db.pragma(CHECK_PRAGMA[check]) as Record<string, string>[]).map((r) => Object.values(r)[0]).slice(0, 3).join('; ');
    return { applicationId, version, integrity };
  } catch (e) {
    const code = e instanceof Database.SqliteError ? e.code : '';
    if (code.startsWith('SQLITE_CORRUPT') || code === 'SQLITE_NOTADB') throw new StoreError('store-corrupt', damagedMessage(file, (e as Error).message));
    throw new StoreError('store-unopenable', `${file} cannot be read (${(e as Error).message})`);
  } finally {
    db?.close();
  }
}

/**
 * Looks at a file without writing to it: the SQLite header, then (read-only) the application id and
 * schema version, reading sqlite_schema, and the check asked for (quick_check before opening a store within the
 * size rule, see db/damage-check.ts; integrity_check for backups). Throws StoreError for anything that is not a
 * Coilwright store this version can open.
 */
export function inspectStoreFile(file: string, { check = 'none' as StoreCheck } = {}): StoreFileInfo {
  if (!existsSync(file)) return { state: 'new', version: 0 };
  const stat = statSync(file);
  if (!stat.isFile()) throw new StoreError('not-a-store', `${file} is not a file`);
  if (stat.size === 0) return { state: 'new', version: 0 };
  if (readHeader(file) !== SQLITE_HEADER) {
    throw new StoreError('not-a-store', `${file} is not a Coilwright store (not a SQLite database)`);
  }
  const { applicationId, version, integrity } = readPragmas(file, check);
  if (applicationId !== APPLICATION_ID) {
    throw new StoreError('not-a-store', `${file} is a SQLite database but not a Coilwright store`);
  }
  if (version > LATEST_VERSION) {
    throw new StoreError('store-too-new',
      `${file} has schema version ${version}; this version of Coilwright knows up to ${LATEST_VERSION}: update Coilwright to open it`);
  }
  if (integrity !== 'ok') throw new StoreError('store-corrupt', damagedMessage(file, `${CHECK_PRAGMA[check as 'quick']}: ${integrity}`));
  return { state: 'store', version };
}
