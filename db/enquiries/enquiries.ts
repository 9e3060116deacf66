import type { Enquiry, EnquiryJobs } from '../../core/api/request-sheet';
import type { JobInput } from '../../core/api/store';
import type { RequestMapping } from '../../core/request-sheet';
import { StoreError, failure, success } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import { inTransaction } from '../store';
import { findOrAddCustomer } from '../jobs/customers';
import { checkNewJob } from '../jobs/input';
import { JOB_FROM, SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { JobRow } from '../jobs/rows';
import { attempt, writeNewJob } from '../jobs/write';
import { keepRequestMapping } from './mappings';

export interface NewEnquiry {
  customer: string;
  reference: string;
  source: string;
  /** The accepted rows: the sheet row each came from and its draft job. */
  rows: { row: number; ref: string; job: JobInput }[];
  /** Kept for the customer when given. */
  mapping?: RequestMapping | undefined;
}

interface EnquiryRow { id: number; reference: string; source: string; received_at: string; customer_id: number; customer_name: string; job_count: number }

const ENQUIRY_SQL = `SELECT e.id, e.reference, e.source, e.received_at, e.customer_id, c.name AS customer_name,
  (SELECT count(*) FROM enquiry_jobs x WHERE x.enquiry_id = e.id) AS job_count
  FROM enquiries e JOIN customers c ON c.id = e.customer_id`;

const toEnquiry = (r: EnquiryRow): Enquiry => ({
  id: r.id, reference: r.reference, source: r.source, receivedAt: r.received_at,
  customer: { id: r.customer_id, name: r.customer_name }, jobCount: r.job_count,
});

function enquiryRow(store: Store, id: number): EnquiryRow | undefined {
  return store.sql(`${ENQUIRY_SQL} WHERE e.id = ?`).get(id) as EnquiryRow | undefined;
}

/** Writes the enquiry and every accepted row's job in one transaction: all of them, or none. */
function writeEnquiry(store: Store, input: NewEnquiry): { id: number; jobs: { row: number; id: number; number: string }[] } {
  const customerId = findOrAddCustomer(store, { name: input.customer });
  const now = store.now().toISOString();
  const enquiryId = Number(store.sql('INSERT INTO enquiries (customer_id, reference, source, received_at) VALUES (?, ?, ?, ?)')
    .run(customerId, input.reference.trim(), input.source, now).lastInsertRowid);
  const link = store.sql('INSERT INTO enquiry_jobs (enquiry_id, job_id, sheet_row) VALUES (?, ?, ?)');
  const jobs = input.rows.map(({ row, ref, job }) => {
    const checked = checkNewJob({ ...job, customerId, status: 'draft' });
    if (!checked.ok) {
      const first = checked.errors[0]!;
      throw new StoreError(first.code, `row ${row}: ${first.message}`, ref);
    }
    const id = writeNewJob(store, checked.value, { reason: `request sheet ${input.reference.trim()}, row ${row}` });
    link.run(enquiryId, id, row);
    const { number } = store.sql('SELECT number FROM jobs WHERE id = ?').get(id) as { number: string };
    return { row, id, number };
  });
  if (input.mapping) keepRequestMapping(store, customerId, input.mapping);
  return { id: enquiryId, jobs };
}

export function createEnquiry(store: Store, input: NewEnquiry): StoreResult<{ enquiry: Enquiry; jobs: { row: number; id: number; number: string }[] }> {
  if (input.rows.length === 0) return failure('nothing-to-import', 'no row is ready to import: fix or skip the marked cells first', 'rows');
  return attempt(() => {
    const written = inTransaction(store, () => writeEnquiry(store, input));
    return success({ enquiry: toEnquiry(enquiryRow(store, written.id)!), jobs: written.jobs });
  });
}

/** A customer's enquiries newest first, through enquiries_by_customer. */
export const CUSTOMER_ENQUIRIES_SQL = `${ENQUIRY_SQL} WHERE e.customer_id = ? ORDER BY e.received_at DESC, e.id DESC LIMIT ?`;
/** An enquiry's jobs in sheet order, through enquiry_jobs' key. */
export const ENQUIRY_JOBS_SQL = `SELECT ${SUMMARY_COLUMNS}, x.sheet_row FROM ${JOB_FROM} JOIN enquiry_jobs x ON x.job_id = j.id
  WHERE x.enquiry_id = ? ORDER BY x.sheet_row`;

/** Enquiries newest first, of one customer or of all. */
export function listEnquiries(store: Store, input: { customerId?: number | undefined; limit: number }): StoreResult<Enquiry[]> {
  const rows = input.customerId === undefined
    ? store.sql(`${ENQUIRY_SQL} ORDER BY e.received_at DESC, e.id DESC LIMIT ?`).all(input.limit)
    : store.sql(CUSTOMER_ENQUIRIES_SQL).all(input.customerId, input.limit);
  return success((rows as EnquiryRow[]).map(toEnquiry));
}

/** An enquiry and its jobs in the order of the customer's sheet: what a quotation of them together starts from. */
export function enquiryJobs(store: Store, id: number): StoreResult<EnquiryJobs> {
  const row = enquiryRow(store, id);
  if (!row) return failure('not-found', `no enquiry with id ${id}`, 'id');
  const jobs = store.sql(ENQUIRY_JOBS_SQL).all(id) as (JobRow & { sheet_row: number })[];
  return success({ enquiry: toEnquiry(row), jobs: jobs.map((j) => ({ ...toSummary(j), sheetRow: j.sheet_row })) });
}
