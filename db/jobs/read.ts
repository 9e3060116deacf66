import type { Job, JobLink, JobRevision, RevisionFields } from '../../core/api/store';
import { failure, success } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import type { JobRow } from './rows';
import { JOB_FROM, SUMMARY_COLUMNS, toJob } from './rows';
import { readStoredSpec } from './stored-spec';
import { workingRow } from './working';

export function jobRow(store: Store, id: number): JobRow | undefined {
  return store.sql(`SELECT ${SUMMARY_COLUMNS} FROM ${JOB_FROM} WHERE j.id = ?`).get(id) as JobRow | undefined;
}

export function getJob(store: Store, ref: number | { id: number } | { number: string }): StoreResult<Job> {
  if (typeof ref === 'object' && 'number' in ref) {
    const found = store.sql('SELECT id FROM jobs WHERE number = ?').get(ref.number) as { id: number } | undefined;
    if (!found) return failure('not-found', `no job numbered ${ref.number}`, 'number');
    ref = found.id;
  }
  const id = typeof ref === 'number' ? ref : ref.id;
  const read = jobRead(store, id);
  return read ? jobOfRead(read) : failure('not-found', `no job with id ${id}`, 'id');
}

/** A job's row and its open working session, read together (a save reads them inside its transaction). */
export interface JobRead { row: JobRow; open: ReturnType<typeof workingRow>; lineage: Job['lineage'] }

export function jobRead(store: Store, id: number): JobRead | undefined {
  const row = jobRow(store, id);
  return row ? { row, open: workingRow(store, id), lineage: lineageOf(store, id) } : undefined;
}

/** The Job of a read: the spec parsed and checked, the working session and the copy links attached. */
export function jobOfRead({ row, open, lineage }: JobRead): StoreResult<Job> {
  const job = toJob(row, lineage);
  if (!job.ok || !open) return job;
  const working = {
    baseRevision: Number(open.base_revision), openedAt: open.opened_at, savedAt: open.saved_at, saves: Number(open.saves), desk: open.desk, by: open.made_by,
  };
  return success({ ...job.value, working });
}

const LINK_SQL = {
  from: 'SELECT j.id, j.number, k.copied_at AS at FROM job_copies k JOIN jobs j ON j.id = k.source_id WHERE k.copy_id = ?',
  to: 'SELECT j.id, j.number, k.copied_at AS at FROM job_copies k JOIN jobs j ON j.id = k.copy_id WHERE k.source_id = ? ORDER BY k.copied_at, j.id',
} as const;

/** The job this one was made from and the jobs made from it. */
export function lineageOf(store: Store, id: number): Job['lineage'] {
  const from = store.sql(LINK_SQL.from).get(id) as JobLink | undefined;
  return { copiedFrom: from ?? null, copiedTo: store.sql(LINK_SQL.to).all(id) as JobLink[] };
}

interface RevisionRow { job_id: number; revision: number; saved_at: string; reason: string; fields: string; spec: string; number: string; made_by: string }

function toRevision(row: RevisionRow): JobRevision {
  const stored = readStoredSpec(row.spec, `revision ${row.revision} of job ${row.number}`);
  return {
    jobId: row.job_id, revision: row.revision, savedAt: row.saved_at, reason: row.reason, madeBy: row.made_by,
    fields: JSON.parse(row.fields) as RevisionFields,
    ...(stored.ok ? { spec: stored.spec } : { spec: null, problem: stored.problem }),
  };
}

const REVISION_SQL = 'SELECT r.*, j.number FROM job_revisions r JOIN jobs j ON j.id = r.job_id';

export function revisionRow(store: Store, jobId: number, revision: number): JobRevision | undefined {
  const row = store.sql(`${REVISION_SQL} WHERE r.job_id = ? AND r.revision = ?`).get(jobId, revision) as RevisionRow | undefined;
  return row && toRevision(row);
}

/** Every saved revision of a job, newest first. */
export function jobRevisions(store: Store, id: number): StoreResult<JobRevision[]> {
  if (!jobRow(store, id)) return failure('not-found', `no job with id ${id}`, 'id');
  const rows = store.sql(`${REVISION_SQL} WHERE r.job_id = ? ORDER BY r.revision DESC`).all(id) as RevisionRow[];
  return success(rows.map(toRevision));
}
