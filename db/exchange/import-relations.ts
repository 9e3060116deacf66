import type { FieldError } from '../../core/result';
import { fieldError } from '../../core/result';
import { customerKey } from '../jobs/customers';
import type { NewJobWriter } from '../jobs/write';
import type { Store } from '../store';
import type { CopiedFromExport, EnquiryExport } from './document';

/** What an imported record says about other jobs, as checked. */
export interface RecordRelations {
  copiedFrom?: CopiedFromExport | undefined;
  enquiry?: EnquiryExport | undefined;
}

interface PendingLink { copyId: number; from: CopiedFromExport; path: string }

interface FileEnquiry { path: string; enquiry: EnquiryExport; id?: number }

/** Problems kept for the answer; past it one more entry counts the rest. */
const KEPT_PROBLEMS = 1000;

const ENQUIRY_FIELDS = ['customer', 'reference', 'source', 'receivedAt'] as const;
const sameField = (field: (typeof ENQUIRY_FIELDS)[number], a: EnquiryExport, b: EnquiryExport) =>
  (field === 'customer' ? customerKey(a.customer) === customerKey(b.customer) : a[field].trim() === b[field].trim());

/**
 * The links and enquiries of an import, following the jobs by the numbers the import gives them:
 * - copiedFrom names a job by its number in the file. Kept numbers are this store's numbers, so the job
 *   made from is looked for in the store (where the file's earlier jobs already are, and at the end the
 *   later ones). With new numbers (renumber) the file's numbers name only the file's jobs (the first job
 *   of a number it uses twice). A link whose job is not found is not kept, and is named in `problems`
 *   with its field path: the jobs themselves are whole and are imported.
 * - jobs with the same enquiry key were asked for together: the first makes the enquiry (its customer
 *   found or added by name, as the jobs' customers are), the rest join it. With kept numbers an enquiry
 *   already in the store (same customer, reference and time received) is joined instead, so a file
 *   exported a status at a time comes back as one enquiry. A key whose details disagree between jobs is
 *   a bad record, like any other.
 */
export class ImportRelations {
  private readonly fileIds = new Map<string, number>();
  private readonly pending: PendingLink[] = [];
  private readonly enquiries = new Map<number, FileEnquiry>();
  private problemCount = 0;
  readonly problems: FieldError[] = [];

  constructor(private readonly store: Store, private readonly writer: NewJobWriter, private readonly renumber: boolean) {}

  /** A record's enquiry that contradicts an earlier record of the same key; checked before anything is written. */
  enquiryError(enquiry: EnquiryExport | undefined, at: string): FieldError | undefined {
    if (!enquiry) return undefined;
    const earlier = this.enquiries.get(enquiry.key);
    if (!earlier) {
      this.enquiries.set(enquiry.key, { path: at, enquiry });
      return undefined;
    }
    const field = ENQUIRY_FIELDS.find((f) => !sameField(f, earlier.enquiry, enquiry));
    if (field === undefined) return undefined;
    return fieldError('enquiry-mismatch', `${at}.enquiry.${field}`,
      `enquiry ${enquiry.key} has ${field} "${earlier.enquiry[field]}" in ${earlier.path}: one enquiry's jobs must agree`);
  }

  /** Ties a job just written to the jobs and enquiry its record names. */
  wrote(jobId: number, fileNumber: string | undefined, relations: RecordRelations, at: string): void {
    if (this.renumber && fileNumber !== undefined && !this.fileIds.has(fileNumber)) this.fileIds.set(fileNumber, jobId);
    if (relations.enquiry) this.joinEnquiry(jobId, relations.enquiry);
    if (!relations.copiedFrom) return;
    const link = { copyId: jobId, from: relations.copiedFrom, path: `${at}.copiedFrom.number` };
    if (!this.link(link, false)) this.pending.push(link);
  }

  /** The links to jobs later in the file, once every job is written; before the commit. */
  finish(): void {
    for (const link of this.pending.splice(0)) this.link(link, true);
    if (this.problemCount > KEPT_PROBLEMS) {
      this.problems.push(fieldError('more-links-not-kept', 'jobs', `${this.problemCount - KEPT_PROBLEMS} more link(s) were not kept`));
    }
  }

  private sourceId(number: string): number | undefined {
    if (this.renumber) return this.fileIds.get(number);
    const row = this.store.sql('SELECT id FROM jobs WHERE number = ?').get(number) as { id: number } | undefined;
    return row && Number(row.id);
  }

  /** Writes the link when its job is known; at the end, an unknown one becomes a problem. */
  private link({ copyId, from, path }: PendingLink, last: boolean): boolean {
    const sourceId = this.sourceId(from.number);
    if (sourceId === copyId) {
      this.problem(fieldError('copied-from-itself', path, `job ${from.number} cannot be made from itself: the link was not kept`));
      return true;
    }
    if (sourceId !== undefined) {
      this.store.sql('INSERT INTO job_copies (copy_id, source_id, copied_at) VALUES (?, ?, ?)').run(copyId, sourceId, from.at);
      return true;
    }
    if (!last) return false;
    const where = this.renumber ? 'is not in this file (with new numbers, the file\'s numbers name only its own jobs)'
      : 'is neither in this file nor in this store (import it first to keep the link)';
    this.problem(fieldError('unknown-job', path, `job ${from.number}, which this job was made from, ${where}: the link was not kept`));
    return true;
  }

  private problem(problem: FieldError): void {
    if (++this.problemCount <= KEPT_PROBLEMS) this.problems.push(problem);
  }

  private joinEnquiry(jobId: number, enquiry: EnquiryExport): void {
    const entry = this.enquiries.get(enquiry.key)!;
    entry.id ??= this.storeEnquiry(entry.enquiry);
    this.store.sql('INSERT INTO enquiry_jobs (enquiry_id, job_id, sheet_row) VALUES (?, ?, ?)').run(entry.id, jobId, enquiry.sheetRow);
  }

  /** The store's enquiry for the file's: the one already there (kept numbers only), or a new one. */
  private storeEnquiry(e: EnquiryExport): number {
    const customer = this.writer.customerNamed({ name: e.customer });
    if (!this.renumber) {
      const found = this.store.sql('SELECT id FROM enquiries WHERE customer_id = ? AND reference = ? AND received_at = ? ORDER BY id LIMIT 1')
        .get(customer.id, e.reference.trim(), e.receivedAt) as { id: number } | undefined;
      if (found) return Number(found.id);
    }
    return Number(this.store.sql('INSERT INTO enquiries (customer_id, reference, source, received_at) VALUES (?, ?, ?, ?)')
      .run(customer.id, e.reference.trim(), e.source, e.receivedAt).lastInsertRowid);
  }
}
