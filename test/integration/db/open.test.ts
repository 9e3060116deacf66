import Database from 'better-sqlite3';
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { APPLICATION_ID, LATEST_VERSION, StoreError, migrate, openStore, schemaVersion, tryOpenStore } from '../../../db';
import { sha256, tempDir, track } from './helpers';

function refusal(file: string): StoreError {
  try {
    openStore(file);
  } catch (e) {
    if (e instanceof StoreError) return e;
    throw e;
  }
  throw new Error('the store opened');
}

describe('openStore', () => {
  it('creates a new store in WAL mode with synchronous NORMAL and foreign keys on, on every open', () => {
    const file = join(tempDir(), 'new.db');
    for (let i = 0; i < 2; i++) {
      const store = openStore(file);
      expect(store.db.pragma('journal_mode', { simple: true })).toBe('wal');
      expect(store.db.pragma('synchronous', { simple: true })).toBe(1);
      expect(store.db.pragma('foreign_keys', { simple: true })).toBe(1);
      expect(store.db.pragma('busy_timeout', { simple: true })).toBe(5000);
      expect(schemaVersion(store.db)).toBe(LATEST_VERSION);
      store.close();
    }
  });

  it('refuses a newer-version store and leaves it byte for byte as it was', () => {
    const file = join(tempDir(), 'future.db');
    const db = new Database(file);
    migrate(db);
    db.pragma(`user_version = ${LATEST_VERSION + 1}`);
    db.close();
    const before = sha256(file);
    const error = refusal(file);
    expect(error.code).toBe('store-too-new');
    expect(error.message).toMatch(/update Coilwright/);
    expect(sha256(file)).toBe(before);
    expect(existsSync(`${file}-wal`)).toBe(false);
  });

  it('refuses a file that is not a database, unchanged', () => {
    const file = join(tempDir(), 'notes.db');
    writeFileSync(file, 'Shop notes: order more 2 mm wire.\n'.repeat(200));
    const before = sha256(file);
    const result = tryOpenStore(file);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.error.code).toBe('not-a-store');
    expect(sha256(file)).toBe(before);
  });

  it('refuses another program\'s SQLite database, unchanged', () => {
    const file = join(tempDir(), 'other.db');
    const db = new Database(file);
    db.exec("CREATE TABLE recipes (name TEXT); INSERT INTO recipes VALUES ('bread')");
    db.close();
    const before = sha256(file);
    expect(refusal(file).code).toBe('not-a-store');
    expect(sha256(file)).toBe(before);
  });

  it('refuses a damaged store, unchanged', () => {
    const file = join(tempDir(), 'damaged.db');
    const db = new Database(file);
    db.pragma(`application_id = ${APPLICATION_ID}`);
    db.exec('CREATE TABLE t (x)');
    db.close();
    const bytes = Buffer.alloc(8192, 0x5a);
    Buffer.from('SQLite format 3\u0000', 'latin1').copy(bytes);
    writeFileSync(file, bytes);
    const before = sha256(file);
    expect(refusal(file).code).toBe('store-corrupt');
    expect(sha256(file)).toBe(before);
  });

  it('applies pending migrations in one transaction: a failing one leaves the file at its old version', () => {
    const file = join(tempDir(), 'half.db');
    const db = new Database(file);
    migrate(db, 1);
    db.exec('CREATE TABLE job_text (x)');
    expect(() => migrate(db)).toThrow(/job_text already exists/);
    expect(schemaVersion(db)).toBe(1);
    expect(db.prepare("SELECT count(*) AS n FROM sqlite_schema WHERE name IN ('job_shape', 'quotes')").get()).toEqual({ n: 0 });
    db.close();
  });

  it('opens an older store and brings it up to date', () => {
    const file = join(tempDir(), 'old.db');
    const db = new Database(file);
    migrate(db, 1);
    db.close();
    const store = track(openStore(file));
    expect(schemaVersion(store.db)).toBe(LATEST_VERSION);
  });
});
