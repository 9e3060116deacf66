import { createHash } from 'node:crypto';
import type { Attachment, AttachmentData } from '../core/api/store';
import { MAX_ATTACHMENT_BYTES, addAttachmentSchema } from '../core/api/store';
import { failure, invalid, success } from './errors';
import type { StoreResult } from './errors';
import type { Store } from './store';
import { inTransaction } from './store';
import { parseWith } from '../core/validation';

const COLUMNS = 'id, job_id AS "jobId", name, mime_type AS "mimeType", size, sha256, added_at AS "addedAt"';

/** Stores a file (the customer's drawing) with the job, with its size and SHA-256 to prove it intact. */
export function addAttachment(store: Store, raw: unknown): StoreResult<Attachment> {
  const parsed = parseWith(addAttachmentSchema, raw);
  if (!parsed.ok) return invalid(parsed.errors);
  const { jobId, name, mimeType, dataBase64 } = parsed.value;
  const data = Buffer.from(dataBase64, 'base64');
  if (data.length === 0) return failure('empty-file', 'the file is empty', 'dataBase64');
  if (data.length > MAX_ATTACHMENT_BYTES) return failure('file-too-large', `files above ${MAX_ATTACHMENT_BYTES} bytes are not kept`, 'dataBase64');
  if (store.sql('SELECT 1 FROM jobs WHERE id = ?').get(jobId) === undefined) return failure('not-found', `no job with id ${jobId}`, 'jobId');
  const sha256 = createHash('sha256').update(data).digest('hex');
  const id = inTransaction(store, () => Number(store.sql(
    'INSERT INTO attachments (job_id, name, mime_type, size, sha256, data, added_at) VALUES (?, ?, ?, ?, ?, ?, ?)',
  ).run(jobId, name, mimeType, data.length, sha256, data, store.now().toISOString()).lastInsertRowid));
  return success(store.sql(`SELECT ${COLUMNS} FROM attachments WHERE id = ?`).get(id) as Attachment);
}

export function listAttachments(store: Store, jobId: number): StoreResult<Attachment[]> {
  if (store.sql('SELECT 1 FROM jobs WHERE id = ?').get(jobId) === undefined) return failure('not-found', `no job with id ${jobId}`, 'jobId');
  return success(store.sql(`SELECT ${COLUMNS} FROM attachments WHERE job_id = ? ORDER BY id`).all(jobId) as Attachment[]);
}

export function getAttachment(store: Store, id: number): StoreResult<AttachmentData> {
  const row = store.sql(`SELECT ${COLUMNS}, data FROM attachments WHERE id = ?`).get(id) as (Attachment & { data: Buffer }) | undefined;
  if (!row) return failure('not-found', `no attachment with id ${id}`, 'id');
  const { data, ...meta } = row;
  if (createHash('sha256').update(data).digest('hex') !== meta.sha256) {
    return failure('attachment-damaged', `attachment ${meta.name} no longer matches its SHA-256`, 'id');
  }
  return success({ ...meta, dataBase64: data.toString('base64') });
}
