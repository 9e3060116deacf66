import type { DeletedJob, Job } from '../../core/api/store';
import { failure, success } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { getJob, jobRow } from './read';

/** How long a deleted draft can be brought back. */
export const UNDO_DAYS = 30;

type Row = Record<string, unknown>;

/** The job's own rows in the tables that refer to it; `where` picks them by the job's id. */
const OWN_ROWS = [
  { table: 'job_revisions', where: 'job_id = ?' },
  { table: 'attachments', where: 'job_id = ?' },
  { table: 'job_requirements', where: 'job_id = ?' },
  { table: 'job_cost_acceptance', where: 'job_id = ?' },
  { table: 'job_copies', where: 'copy_id = ? OR source_id = ?' },
  { table: 'job_working_revisions', where: 'job_id = ?' },
  { table: 'enquiry_jobs', where: 'job_id = ?' },
] as const;
type OwnTable = (typeof OWN_ROWS)[number]['table'];

interface Snapshot {
  job: Row;
  rows: Record<OwnTable, Row[]>;
}

/** Blobs (attachments) as base64 so the snapshot is JSON. */
const encode = (row: Row): Row => Object.fromEntries(Object.entries(row).map(([k, v]) => [k, Buffer.isBuffer(v) ? { base64: v.toString('base64') } : v]));
const decode = (row: Row): Row => Object.fromEntries(Object.entries(row).map(([k, v]) => [k,
  typeof v === 'object' && v !== null && 'base64' in v ? Buffer.from(String((v as { base64: string }).base64), 'base64') : v]));

const params = (where: string, id: number): number[] => where.split('?').slice(1).map(() => id);

function insertRow(store: Store, table: string, row: Row): void {
  const columns = Object.keys(row);
  store.sql(`INSERT INTO ${table} (${columns.join(', ')}) VALUES (${columns.map(() => '?').join(', ')})`).run(...Object.values(row));
}

/** A copy link comes back only while the job at its other end is still there. */
const linksExisting = (store: Store, link: Row): boolean =>
  [link.copy_id, link.source_id].every((jobId) => store.sql('SELECT 1 FROM jobs WHERE id = ?').get(jobId) !== undefined);

/** Why a job may not be deleted (it has gone to a customer or the floor), or null. */
function refusal(store: Store, id: number, status: string, number: string): string | null {
  if (status !== 'draft') return `job ${number} is ${status}, not a draft: archive it instead`;
  if (store.sql('SELECT 1 FROM quotes WHERE job_id = ?').get(id)) return `job ${number} has been quoted: archive it instead`;
  if (store.sql('SELECT 1 FROM first_off_records WHERE job_id = ?').get(id)) return `job ${number} has first-off records: archive it instead`;
  return null;
}

/**
 * Deletes a draft that was never quoted. Its rows are kept aside (deleted_jobs) for UNDO_DAYS, so
 * undoDeleteJob brings it back as it was, history included.
 */
export function deleteJob(store: Store, id: number): StoreResult<DeletedJob> {
  const row = jobRow(store, id);
  if (!row) return failure('not-found', `no job with id ${id}`, 'id');
  const refused = refusal(store, id, row.status, row.number);
  if (refused) return failure('job-not-deletable', refused, 'status');
  const deletedAt = store.now().toISOString();
  inTransaction(store, () => {
    const job = store.sql('SELECT * FROM jobs WHERE id = ?').get(id) as Row;
    const rows = Object.fromEntries(OWN_ROWS.map(({ table, where }) =>
      [table, (store.sql(`SELECT * FROM ${table} WHERE ${where}`).all(...params(where, id)) as Row[]).map(encode)])) as Snapshot['rows'];
    const cutoff = new Date(store.now().getTime() - UNDO_DAYS * 86_400_000).toISOString();
    store.sql('DELETE FROM deleted_jobs WHERE job_id = ? OR deleted_at < ?').run(id, cutoff);
    store.sql('INSERT INTO deleted_jobs (job_id, number, deleted_at, removing, snapshot) VALUES (?, ?, ?, 1, ?)')
      .run(id, row.number, deletedAt, JSON.stringify({ job, rows } satisfies Snapshot));
    for (const { table, where } of OWN_ROWS) store.sql(`DELETE FROM ${table} WHERE ${where}`).run(...params(where, id));
    store.sql('DELETE FROM jobs WHERE id = ?').run(id);
    store.sql('UPDATE deleted_jobs SET removing = 0 WHERE job_id = ?').run(id);
  });
  return success({ jobId: id, number: row.number, deletedAt });
}

/** Brings a deleted draft back with its number, history and attachments. */
export function undoDeleteJob(store: Store, id: number): StoreResult<Job> {
  const kept = store.sql('SELECT number, snapshot FROM deleted_jobs WHERE job_id = ?').get(id) as { number: string; snapshot: string } | undefined;
  if (!kept) return failure('not-found', `no deleted job with id ${id} to bring back (deletions are kept ${UNDO_DAYS} days)`, 'id');
  if (store.sql('SELECT 1 FROM jobs WHERE number = ?').get(kept.number)) {
    return failure('duplicate-number', `job number ${kept.number} is in use again: the deleted job cannot come back under it`, 'id');
  }
  const snapshot = JSON.parse(kept.snapshot) as Snapshot;
  const restoredId = inTransaction(store, () => {
    const idFree = !store.sql('SELECT 1 FROM jobs WHERE id = ?').get(id);
    const { id: _old, ...rest } = snapshot.job;
    const newId = idFree ? id : Number(store.sql(`INSERT INTO jobs (${Object.keys(rest).join(', ')}) VALUES (${Object.keys(rest).map(() => '?').join(', ')})`)
      .run(...Object.values(rest)).lastInsertRowid);
    if (idFree) insertRow(store, 'jobs', snapshot.job);
    const remap = (v: unknown): unknown => (v === id ? newId : v);
    for (const { table } of OWN_ROWS) {
      for (const r of snapshot.rows[table] ?? []) {
        const { id: _rowId, ...fields } = decode(r);
        const moved = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, k.endsWith('job_id') || k.endsWith('_id') ? remap(v) : v]));
        if (table === 'job_copies' && !linksExisting(store, moved)) continue;
        // An enquiry link keeps its enquiry's id (only the job's may move), and comes back only while the enquiry is there.
        if (table === 'enquiry_jobs') {
          moved.enquiry_id = fields.enquiry_id;
          if (!store.sql('SELECT 1 FROM enquiries WHERE id = ?').get(fields.enquiry_id)) continue;
        }
        insertRow(store, table, moved);
      }
    }
    store.sql('DELETE FROM deleted_jobs WHERE job_id = ?').run(id);
    return newId;
  });
  return getJob(store, restoredId);
}
