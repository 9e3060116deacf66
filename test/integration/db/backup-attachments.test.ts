import { createHash } from 'node:crypto';
import { existsSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import Database from 'better-sqlite3';
import {
  LATEST_VERSION, addAttachment, backupStore, createJob, getAttachment, listAttachments, listJobs, migrate, openStore, restoreStore, verifyBackup,
} from '../../../db';
import { job, tempDir, track, value } from './helpers';

describe('backup and restore', () => {
  it('backs up while open, verifies, and restores over later changes keeping the old store beside', async () => {
    const dir = tempDir();
    const file = join(dir, 'shop.db');
    let store = track(openStore(file));
    value(createJob(store, job({ partNumber: 'BEFORE' })));
    const backup = value(await backupStore(store, join(dir, 'backup.db')));
    expect(backup.version).toBe(LATEST_VERSION);
    expect(value(verifyBackup(backup.file))).toEqual({ version: LATEST_VERSION });
    // One self-contained file: rollback journal, nothing left beside it.
    expect(readdirSync(dir).sort()).toEqual(['backup.db', 'shop.db', 'shop.db-shm', 'shop.db-wal']);
    const copy = new Database(backup.file, { readonly: true });
    expect(copy.pragma('journal_mode', { simple: true })).toBe('delete');
    copy.close();
    value(createJob(store, job({ partNumber: 'AFTER' })));
    const outcome = await restoreStore(store, backup.file);
    store = track(outcome.store);
    const restored = value(outcome.result);
    expect(value(listJobs(store, {})).jobs.map((j) => j.partNumber)).toEqual(['BEFORE']);
    expect(restored.previousKeptAs && existsSync(restored.previousKeptAs)).toBe(true);
    const kept = track(openStore(restored.previousKeptAs!));
    expect(value(listJobs(kept, {})).total).toBe(2);
  });

  it('refuses to overwrite a file with a backup', async () => {
    const dir = tempDir();
    const store = track(openStore(join(dir, 'shop.db')));
    writeFileSync(join(dir, 'taken.db'), 'x');
    expect(await backupStore(store, join(dir, 'taken.db'))).toMatchObject({ ok: false, error: { code: 'file-exists', path: 'file' } });
  });

  it('restores nothing from a file that is not a verified backup, and leaves the store as it was', async () => {
    const dir = tempDir();
    const file = join(dir, 'shop.db');
    const store = track(openStore(file));
    value(createJob(store, job()));
    writeFileSync(join(dir, 'junk.db'), 'not a database at all');
    const newer = new Database(join(dir, 'newer.db'));
    migrate(newer);
    newer.pragma(`user_version = ${LATEST_VERSION + 1}`);
    newer.close();
    for (const [name, code] of [['junk.db', 'not-a-store'], ['newer.db', 'store-too-new'], ['missing.db', 'not-found']] as const) {
      const outcome = await restoreStore(store, join(dir, name));
      expect(outcome.result).toMatchObject({ ok: false, error: { code } });
      expect(outcome.store).toBe(store);
      expect(value(listJobs(store, {})).total).toBe(1);
    }
  });
});

describe('attachments', () => {
  it('keeps the drawing file with its size and SHA-256, and returns it intact', () => {
    const store = track(openStore(join(tempDir(), 'shop.db')));
    const created = value(createJob(store, job()));
    const data = Buffer.from('%PDF-1.4 pretend drawing of a spring');
    const att = value(addAttachment(store, { jobId: created.id, name: 'FG-D-100 rev A.pdf', mimeType: 'application/pdf', dataBase64: data.toString('base64') }));
    expect(att).toMatchObject({ size: data.length, sha256: createHash('sha256').update(data).digest('hex') });
    expect(value(listAttachments(store, created.id)).map((a) => a.name)).toEqual(['FG-D-100 rev A.pdf']);
    expect(Buffer.from(value(getAttachment(store, att.id)).dataBase64, 'base64').equals(data)).toBe(true);
    expect(addAttachment(store, { jobId: 99, name: 'x.pdf', mimeType: 'application/pdf', dataBase64: 'AAAA' }))
      .toMatchObject({ ok: false, error: { path: 'jobId' } });
    expect(addAttachment(store, { jobId: created.id, name: 'x.pdf', mimeType: 'pdf', dataBase64: 'AAAA' }))
      .toMatchObject({ ok: false, error: { path: 'mimeType' } });
  });
});

