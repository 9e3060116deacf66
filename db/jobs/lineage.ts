import type { Job } from '../../core/api/store';
import { failure, invalid } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { checkNewJob } from './input';
import { getJob, jobRow } from './read';
import { attempt, writeNewJob } from './write';

/**
 * A new job from a past one: the next job number, the same spec and order fields (customer, part and
 * drawing, quantity, lead time, notes, the estimator's routing judgement), as a draft with no due date.
 * The new job's first revision says where it came from, and the link is kept for both jobs.
 */
export function copyJob(store: Store, sourceId: number): StoreResult<Job> {
  const source = getJob(store, sourceId);
  if (!source.ok) return source;
  const s = source.value;
  const checked = checkNewJob({
    ...(s.customer ? { customerId: s.customer.id } : {}),
    partNumber: s.partNumber, drawingNumber: s.drawingNumber, drawingRevision: s.drawingRevision,
    notes: s.notes, orderQuantity: s.orderQuantity, leadTimeDays: s.leadTimeDays, judgement: s.judgement,
    spec: s.spec,
  });
  if (!checked.ok) return invalid(checked.errors);
  return attempt(() => getJob(store, inTransaction(store, () => {
    const id = writeNewJob(store, checked.value, { reason: `copied from ${s.number}` });
    store.sql('INSERT INTO job_copies (copy_id, source_id, copied_at) VALUES (?, ?, ?)').run(id, s.id, store.now().toISOString());
    return id;
  })));
}

/** Takes a job out of the default list (or puts it back). Nothing about the job changes: no revision. */
export function archiveJob(store: Store, input: { id: number; archived: boolean }): StoreResult<Job> {
  if (!jobRow(store, input.id)) return failure('not-found', `no job with id ${input.id}`, 'id');
  store.sql('UPDATE jobs SET archived_at = ? WHERE id = ?').run(input.archived ? store.now().toISOString() : null, input.id);
  return getJob(store, input.id);
}
