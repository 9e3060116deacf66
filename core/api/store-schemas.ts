import { z } from 'zod';
import { jobJudgementSchema, noJudgement } from '../quoting/judgement';
import { specBounds } from '../spec/bounds';
import { quoteTermsInputSchema } from '../documents/quote-terms';
import { isBackwardsRange, jobDateFields } from './job-dates';

/** Input shapes of the job store. Specs stay `unknown` here: the store validates them with parseSpec. */
export const jobStatuses = ['draft', 'quoted', 'ordered', 'in-production', 'done', 'lost'] as const;
export const jobStatusSchema = z.enum(jobStatuses);
export type JobStatus = z.infer<typeof jobStatusSchema>;

const id = z.number().int().positive();
export const isoDateSchema = z.string().regex(/^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, 'a date as YYYY-MM-DD');

export const customerRefSchema = z.object({
  name: z.string().trim().min(1, 'a customer needs a name').max(120),
  email: z.string().max(120).optional(),
  phone: z.string().max(40).optional(),
}).strict();

/** A customer as the customer screen adds (no id) or edits (with id) one. */
export const customerInputSchema = z.object({
  id: id.optional(),
  name: z.string().trim().min(1, 'a customer needs a name').max(120),
  contact: z.string().trim().max(120).default(''),
  email: z.string().trim().max(120).refine((e) => e === '' || /^[^\s@]+@[^\s@]+$/.test(e), 'an e-mail address such as buyer@example.com').default(''),
  phone: z.string().trim().max(40).default(''),
  addressLines: z.array(z.string().trim().max(120)).max(6, 'at most 6 address lines').default([]),
  paymentTerms: z.string().trim().max(200).default(''),
}).strict();
export type CustomerInput = z.input<typeof customerInputSchema>;

const fields = {
  customer: customerRefSchema.nullable(),
  customerId: id,
  partNumber: z.string().trim().max(64),
  drawingNumber: z.string().trim().max(64),
  drawingRevision: z.string().trim().max(16),
  status: jobStatusSchema,
  notes: z.string().max(4000),
  dueDate: isoDateSchema.nullable(),
  orderQuantity: z.number().int().positive().max(specBounds.orderQuantity.max, `at most ${specBounds.orderQuantity.max}: ${specBounds.orderQuantity.reason}`).nullable(),
  leadTimeDays: z.number().int().min(0).max(3650).nullable(),
  judgement: jobJudgementSchema,
};

/** A new job. Give the customer by name (found or added) or by id, or leave it out. */
export const jobInputSchema = z.object({
  customer: fields.customer.optional(),
  customerId: fields.customerId.optional(),
  partNumber: fields.partNumber.default(''),
  drawingNumber: fields.drawingNumber.default(''),
  drawingRevision: fields.drawingRevision.default(''),
  status: fields.status.default('draft'),
  notes: fields.notes.default(''),
  dueDate: fields.dueDate.default(null),
  orderQuantity: fields.orderQuantity.default(null),
  leadTimeDays: fields.leadTimeDays.default(null),
  judgement: fields.judgement.default(noJudgement()),
  spec: z.unknown(),
}).strict();
export type JobInput = z.input<typeof jobInputSchema>;
export type JobFields = z.output<typeof jobInputSchema>;

export const jobChangeSchema = z.enum(['drawing-revision', 'correction']);
export type JobChange = z.infer<typeof jobChangeSchema>;

/** One open job editor: letters, digits, '-' and '_'. */
const deskSchema = z.string().regex(/^[A-Za-z0-9_-]{1,64}$/, 'a desk is 1 to 64 letters, digits, "-" or "_"');

/** A save: only the fields given change; `expectedRevision` refuses the save if someone saved since. */
export const jobPatchSchema = z.object({
  id,
  expectedRevision: z.number().int().positive().optional(),
  customer: fields.customer.optional(),
  customerId: fields.customerId.optional(),
  partNumber: fields.partNumber.optional(),
  drawingNumber: fields.drawingNumber.optional(),
  drawingRevision: fields.drawingRevision.optional(),
  status: fields.status.optional(),
  notes: fields.notes.optional(),
  dueDate: fields.dueDate.optional(),
  orderQuantity: fields.orderQuantity.optional(),
  leadTimeDays: fields.leadTimeDays.optional(),
  judgement: fields.judgement.optional(),
  spec: z.unknown().optional(),
  /** Needed to edit a quoted, ordered or in-production job: a new drawing revision (give it) or a correction. */
  change: jobChangeSchema.optional(),
  /**
   * An autosave of a working session: the job's state is replaced in place and no permanent revision is written
   * until the session closes (keepWorkingRevision, a deliberate save, a drawing revision, a restore or an issue).
   */
  working: z.boolean().optional(),
  /**
   * The job editor (desk) the save comes from: one id per open editor, made up by the editor. A job's working
   * session belongs to the desk that opened it; an autosave or a save from another desk is refused
   * (`edited-elsewhere`) while it is open, so no desk types over another's working copy.
   */
  desk: deskSchema.optional(),
}).strict();
export type JobPatch = z.input<typeof jobPatchSchema>;

const statusFilterSchema = z.union([jobStatusSchema, z.array(jobStatusSchema).min(1)], {
  error: `status must be one of ${jobStatuses.join(', ')}, or a list of them`,
});

export const jobSortSchema = z.enum(['number', 'updated', 'customer']);

export const listJobsSchema = z.object({
  status: statusFilterSchema.optional(),
  customerId: id.optional(),
  kind: z.string().min(1).optional(),
  material: z.string().min(1).optional(),
  /** true lists the archived jobs instead (newest archived first unless sorted otherwise); search finds both. */
  archived: z.boolean().default(false),
  dates: z.object({
    field: z.enum(jobDateFields).default('updated'),
    from: isoDateSchema.optional(),
    to: isoDateSchema.optional(),
  }).strict().refine((d) => !isBackwardsRange(d), { message: 'the from date is after the to date', path: ['from'] }).optional(),
  sort: jobSortSchema.default('updated'),
  direction: z.enum(['asc', 'desc']).optional(),
  limit: z.number().int().min(1).max(500).default(50),
  /** Rows to skip: for small jumps; a long list pages with `after`, which costs the same on every page. */
  offset: z.number().int().min(0).max(100_000).default(0),
  /** The `next` of the previous page: the list continues after that row (keyset paging). */
  after: z.string().min(1).max(400).optional(),
}).strict().refine((q) => q.after === undefined || q.offset === 0,
  { message: 'give either after (the next page) or offset, not both', path: ['after'] });
export type ListJobsInput = z.input<typeof listJobsSchema>;
export type ListJobsQuery = z.output<typeof listJobsSchema>;

export const findJobsSchema = z.object({
  text: z.string().max(200),
  limit: z.number().int().min(1).max(200).default(25),
}).strict();

export const similarJobsSchema = z.object({
  spec: z.unknown(),
  limit: z.number().int().min(1).max(100).default(10),
  excludeJobId: id.optional(),
  /** The quantity asked about: each hit's last quoted price is read at the break nearest it. */
  quantity: z.number().int().positive().optional(),
}).strict();

export const jobIdSchema = z.object({ id }).strict();
export const archiveJobSchema = z.object({ id, archived: z.boolean() }).strict();
/** A job by its id or by the shop's job number. */
export const jobRefSchema = z.union([z.object({ id }).strict(), z.object({ number: z.string().trim().min(1) }).strict()]);
/** Ends a job's working session as one permanent revision; `reason` says what closed it. */
export const keepWorkingRevisionSchema = z.object({
  id,
  reason: z.enum(['saved', 'left the job', 'issued']).optional(),
  /** Close only this desk's session (leaving the job leaves another desk's working copy open); without it, whichever is open. */
  desk: deskSchema.optional(),
}).strict();

export const restoreRevisionSchema = z.object({ id, revision: z.number().int().positive() }).strict();
export const setJobStatusSchema = z.object({ id, status: jobStatusSchema, expectedRevision: z.number().int().positive().optional() }).strict();

/** The most lines one quotation holds: a long enquiry, still one readable document. */
export const MAX_QUOTE_LINES = 50;

/**
 * Issue a quotation for stored jobs: one (`jobId`) or several of one customer (`jobIds`, one line each, in
 * that order). The service prices every line and builds the document; nothing priced comes from the caller.
 * `accept` is the estimator's reason for issuing despite open errors or an incomplete price on any line.
 */
export const issueQuoteSchema = z.object({
  jobId: id.optional(),
  jobIds: z.array(id).min(1, 'name at least one job').max(MAX_QUOTE_LINES, `a quotation holds at most ${MAX_QUOTE_LINES} lines`).optional(),
  validityDays: z.number().int().min(1).max(365).optional(),
  accept: z.string().trim().min(3, 'say in a few words why the problems are accepted').max(500).optional(),
  /** The customer's enquiry reference and this quote's terms; what is left out comes from the customer or the shop. */
  terms: quoteTermsInputSchema.optional(),
}).strict().superRefine((q, ctx) => {
  if ((q.jobId === undefined) === (q.jobIds === undefined)) {
    ctx.addIssue({ code: 'custom', path: ['jobIds'], message: 'name the job (jobId) or the jobs of the quotation (jobIds), not both' });
  }
  const seen = new Set<number>();
  (q.jobIds ?? []).forEach((jobId, i) => {
    if (seen.has(jobId)) ctx.addIssue({ code: 'custom', path: ['jobIds', i], message: `job ${jobId} is named twice: a job is one line` });
    seen.add(jobId);
  });
});
export type IssueQuoteInput = z.input<typeof issueQuoteSchema>;

export const listQuotesSchema = z.object({
  jobId: id.optional(),
  limit: z.number().int().min(1).max(500).default(50),
  offset: z.number().int().min(0).default(0),
}).strict();

export const getQuoteSchema = z.union([z.object({ id }).strict(), z.object({ number: z.string().min(1) }).strict()]);

/** 64 MiB of drawing is far past any real one; the cap keeps a wrong file from bloating the store. */
export const MAX_ATTACHMENT_BYTES = 64 * 1024 * 1024;
export const addAttachmentSchema = z.object({
  jobId: id,
  name: z.string().trim().min(1).max(255),
  mimeType: z.string().regex(/^[\w.+-]+\/[\w.+-]+$/, 'a MIME type such as application/pdf'),
  dataBase64: z.string().max(Math.ceil(MAX_ATTACHMENT_BYTES / 3) * 4).regex(/^[A-Za-z0-9+/]*={0,2}$/, 'base64 data'),
}).strict();

export const jobAttachmentsSchema = z.object({ jobId: id }).strict();

/** Export as the screen asks for it: the text comes back, and the user's browser or the shell saves it. */
export const exportJobsSchema = z.object({
  format: z.enum(['json', 'csv']).default('json'),
  status: statusFilterSchema.optional(),
}).strict();

/**
 * Export to a file, for the command line and the desktop shell's own save dialog only: never part of the
 * contract, so the screen cannot name a file. An existing file is replaced only with `force`.
 */
export const exportFileSchema = exportJobsSchema.extend({
  file: z.string().min(1).optional(),
  force: z.boolean().default(false),
}).strict();

/** Import as the screen sends it: the text of a file the user picked. */
export const importJobsSchema = z.object({
  text: z.string(),
  format: z.enum(['json', 'csv']).optional(),
  /** Give imported jobs new numbers from this store's sequence instead of keeping theirs. */
  renumber: z.boolean().default(false),
}).strict();

/** Import from a file (command line and the shell's open dialog only) or from text. */
export const importFileSchema = z.object({
  file: z.string().min(1).optional(),
  text: z.string().optional(),
  format: z.enum(['json', 'csv']).optional(),
  renumber: z.boolean().default(false),
}).strict().refine((i) => (i.file === undefined) !== (i.text === undefined), {
  message: 'give either file or text', path: ['file'],
});

/** Backup and restore name files, so only the command line and the desktop shell (through its dialogs) reach them. */
export const backupSchema = z.object({ file: z.string().min(1) }).strict();
export const restoreSchema = z.object({ file: z.string().min(1) }).strict();
export const saveSettingsSchema = z.object({ settings: z.record(z.string(), z.unknown()) }).strict();

/** Re-index the search numbers of jobs computed by another engine version; `all` recomputes every job. */
export const reindexJobsSchema = z.object({ all: z.boolean().default(false) }).strict();

/** The name an estimator signs in with: what revisions, quotes and records saved from this window say they are by. */
export const signInSchema = z.object({ name: z.string().trim().min(1, 'type the name you sign your work with').max(80) }).strict();

/**
 * A PostgreSQL job store to work in, by connection string. Only postgres:// strings: files are opened by the
 * host (command line, desktop dialogs), never named through the contract. The string is used to connect and
 * then forgotten; it is never written to the store, a log or an export.
 */
/** The next start opens the program's own store file again (the server store stays open until then). */
export const forgetServerStoreSchema = z.object({}).strict();

export const openServerStoreSchema = z.object({
  connection: z.string().trim().max(2000).regex(/^postgres(ql)?:\/\//i, 'a connection string starts with postgres:// (for example postgres://user@host:5432/shop)'),
}).strict();
