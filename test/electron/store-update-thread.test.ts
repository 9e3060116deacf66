/**
 * The schema update of a large store runs in a worker thread built as it ships, so the desktop app's main
 * process keeps its windows answering; when the worker cannot do it, it says why and changes nothing.
 */
import Database from 'better-sqlite3';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LATEST_VERSION } from '../../db';
import { updateInWorkerThread } from '../../electron/shell/store-update-thread';
import { schemaVersionOfFile, writeStoreOneVersionBehind } from '../support/large-store';
import { buildUpdateWorker } from '../support/update-worker';

let dir: string;
let workerFile: string;

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'cw-update-thread-'));
  workerFile = await buildUpdateWorker(dir);
}, 60_000);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the store update in a worker thread', () => {
  it('brings a store one version behind to this version, and lets go of the file', async () => {
    const file = path.join(dir, 'behind.db');
    writeStoreOneVersionBehind(file, 0);
    expect(schemaVersionOfFile(file)).toBe(LATEST_VERSION - 1);
    await expect(updateInWorkerThread({ workerFile, file, nativeBinding: undefined })).resolves.toEqual({ ok: true });
    expect(schemaVersionOfFile(file)).toBe(LATEST_VERSION);
    // No connection left open by the worker: the file can be taken in exclusive mode at once.
    const db = new Database(file);
    db.pragma('locking_mode = EXCLUSIVE');
    expect(() => db.exec('BEGIN EXCLUSIVE; COMMIT')).not.toThrow();
    db.close();
  });

  it('refuses a file that is not a store with the store\'s own reason, and leaves it as it was', async () => {
    const file = path.join(dir, 'letter.db');
    writeFileSync(file, 'Dear supplier, please quote 500 springs.\n'.repeat(200));
    const before = readFileSync(file);
    const outcome = await updateInWorkerThread({ workerFile, file, nativeBinding: undefined });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.code).toBe('not-a-store');
    expect(outcome.message).toContain(file);
    expect(readFileSync(file).equals(before)).toBe(true);
  });

  it('uses the native library main hands over, and says so when it is not there', async () => {
    const file = path.join(dir, 'behind-2.db');
    writeStoreOneVersionBehind(file, 0);
    const missing = path.join(dir, 'native', 'electron-99', 'better_sqlite3.node');
    const outcome = await updateInWorkerThread({ workerFile, file, nativeBinding: missing });
    expect(outcome).toMatchObject({ ok: false });
    expect(JSON.stringify(outcome)).toContain('electron-99');
    expect(schemaVersionOfFile(file)).toBe(LATEST_VERSION - 1);
  });

  it('says the worker is not built, without starting anything', async () => {
    const outcome = await updateInWorkerThread({ workerFile: path.join(dir, 'nowhere.cjs'), file: path.join(dir, 'behind.db'), nativeBinding: undefined });
    expect(outcome).toMatchObject({ ok: false, code: 'update-worker-missing' });
  });
});
