import Database from 'better-sqlite3';
import { createHash, randomBytes } from 'node:crypto';
import { LATEST_VERSION, addAttachment, migrate, schemaVersion } from '../../db';
import type { Store } from '../../db';

/** Size of one scanned drawing sheet: two take a store over the 64 MB size rules of the damage check and the update notice. */
const SHEET_BYTES = 34 * 1024 * 1024;

/** Makes a store large the way a shop's grows fastest: scanned drawing sheets attached to one of its jobs. */
export function attachScannedDrawings(store: Store, jobId: number, sheets = 2): void {
  for (let i = 1; i <= sheets; i++) {
    const added = addAttachment(store, { jobId, name: `drawing-sheet-${i}.tif`, mimeType: 'image/tiff', dataBase64: randomBytes(SHEET_BYTES).toString('base64') });
    if (!added.ok) throw new Error(added.error.message);
  }
}

/** A demo compression spring, as the store keeps a job's spec. */
const DEMO_SPEC = { kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 20, totalCoils: 10, ends: 'closed-ground', freeLength: 50 };

/**
 * A store file as the version before this one left it: the schema up to the migration before the last, one
 * demo job (part QX-7) with its first revision, and `sheets` scanned drawing sheets attached to it. Written
 * with SQL of that version, so the last migration has its whole work still to do when the store opens.
 */
export function writeStoreOneVersionBehind(file: string, sheets: number): void {
  const db = new Database(file);
  try {
    migrate(db, LATEST_VERSION - 1);
    const at = '2026-03-02T08:00:00.000Z';
    db.transaction(() => {
      db.prepare(`INSERT INTO jobs (id, number, part_number, status, spec, revision, created_at, updated_at, kind, material, material_family, units,
        d, mean_diameter, free_length, active_coils, rate) VALUES (1, 'J-26-0001', 'QX-7 (demo)', 'draft', ?, 1, ?, ?, 'compression', 'en10270-1-sh',
        'patented', 'metric', 2, 18, 50, 8, 10.1)`).run(JSON.stringify(DEMO_SPEC), at, at);
      db.prepare(`INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) VALUES (1, 1, ?, 'created', '{}', ?)`)
        .run(at, JSON.stringify(DEMO_SPEC));
      for (let i = 1; i <= sheets; i++) {
        const data = randomBytes(SHEET_BYTES);
        db.prepare(`INSERT INTO attachments (job_id, name, mime_type, size, sha256, data, added_at) VALUES (1, ?, 'image/tiff', ?, ?, ?, ?)`)
          .run(`drawing-sheet-${i}.tif`, data.length, createHash('sha256').update(data).digest('hex'), data, at);
      }
    })();
  } finally {
    db.close();
  }
}

/** The schema version a store file is at, read without changing it. */
export function schemaVersionOfFile(file: string): number {
  const db = new Database(file, { readonly: true });
  try {
    return schemaVersion(db);
  } finally {
    db.close();
  }
}
