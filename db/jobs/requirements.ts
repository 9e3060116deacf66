import type { Job, JobInput } from '../../core/api/store';
import type { Requirement } from '../../core/requirement';
import { failure, success } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { getJob } from './read';
import { createJob, updateJob } from './write';

export const DESIGNED_REASON = 'designed from the customer\'s requirement';

export interface AdoptDesignInput {
  requirement: Requirement;
  spec: unknown;
  /** Save the design as a new revision of this job; otherwise a new job is made. */
  jobId?: number | undefined;
  job?: Omit<JobInput, 'spec'> | undefined;
}

export interface StoredRequirement {
  jobId: number;
  jobRevision: number;
  savedAt: string;
  requirement: Requirement;
}

/**
 * Makes the chosen design the job's spec (a new job, or a new revision of one) and keeps the requirement
 * beside that revision, in one transaction: both are written, or neither.
 */
export function adoptDesign(store: Store, input: AdoptDesignInput): StoreResult<Job> {
  return inTransaction(store, () => {
    const saved = input.jobId === undefined
      ? createJob(store, { ...(input.job ?? {}), spec: input.spec }, { reason: DESIGNED_REASON })
      : updateJob(store, { id: input.jobId, spec: input.spec }, DESIGNED_REASON);
    if (!saved.ok) return saved;
    store.sql('INSERT INTO job_requirements (job_id, job_revision, saved_at, requirement) VALUES (?, ?, ?, ?)')
      .run(saved.value.id, saved.value.revision, store.now().toISOString(), JSON.stringify(input.requirement));
    return saved;
  });
}

interface RequirementRow { job_id: number; job_revision: number; saved_at: string; requirement: string }

/** The newest requirement kept with a job, to search again with today's stock and prices. */
export function jobRequirement(store: Store, jobId: number): StoreResult<StoredRequirement> {
  if (!getJob(store, jobId).ok) return failure('not-found', `no job with id ${jobId}`, 'jobId');
  const row = store.sql('SELECT * FROM job_requirements WHERE job_id = ? ORDER BY job_revision DESC LIMIT 1').get(jobId) as RequirementRow | undefined;
  if (!row) return failure('no-requirement', 'this job was not designed from a requirement', 'jobId');
  return success({ jobId: row.job_id, jobRevision: row.job_revision, savedAt: row.saved_at, requirement: JSON.parse(row.requirement) as Requirement });
}
