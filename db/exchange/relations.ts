import type { Store } from '../store';
import type { CopiedFromExport, EnquiryExport } from './document';

/** What ties a job to others in an export: the job it was made from, the enquiry it was quoted in. */
export interface JobRelations {
  copiedFrom?: CopiedFromExport;
  enquiry?: EnquiryExport;
}

interface CopyRow { copy_id: number; number: string; copied_at: string }
interface EnquiryRow { job_id: number; sheet_row: number; id: number; reference: string; source: string; received_at: string; customer: string }

const placeholders = (ids: readonly number[]) => ids.map(() => '?').join(', ');

/**
 * The links and enquiries of one export chunk's jobs, by job id: read per chunk, like the first-off records,
 * so the export holds no more of them than of the jobs. The enquiry's id in this store is its key in the file.
 */
export function relationsByJob(store: Store, jobIds: readonly number[]): Map<number, JobRelations> {
  const byJob = new Map<number, JobRelations>();
  if (jobIds.length === 0) return byJob;
  const entry = (id: number) => byJob.get(id) ?? byJob.set(id, {}).get(id)!;
  const copies = store.sql(`SELECT k.copy_id, j.number, k.copied_at FROM job_copies k JOIN jobs j ON j.id = k.source_id
                            WHERE k.copy_id IN (${placeholders(jobIds)})`).all(...jobIds) as CopyRow[];
  for (const c of copies) entry(Number(c.copy_id)).copiedFrom = { number: c.number, at: c.copied_at };
  const enquiries = store.sql(`SELECT x.job_id, x.sheet_row, e.id, e.reference, e.source, e.received_at, c.name AS customer
                               FROM enquiry_jobs x JOIN enquiries e ON e.id = x.enquiry_id JOIN customers c ON c.id = e.customer_id
                               WHERE x.job_id IN (${placeholders(jobIds)})`).all(...jobIds) as EnquiryRow[];
  for (const e of enquiries) {
    entry(Number(e.job_id)).enquiry = {
      key: Number(e.id), customer: e.customer, reference: e.reference, source: e.source, receivedAt: e.received_at, sheetRow: Number(e.sheet_row),
    };
  }
  return byJob;
}
