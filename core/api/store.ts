import { z } from 'zod';
import { method } from './contract';
import type { Settings } from '../settings/schema';
import * as s from './store-schemas';
import type * as t from './store-types';

export * from './store-schemas';
export * from './job-dates';
export type * from './store-types';

const none = z.object({}).strict();

/**
 * Job store methods: jobs and their history, search, settings, quotes, attachments, exchange. No method
 * takes a file path: backups, restores and file exchange belong to the host (service/api/files.ts).
 */
export const storeMethods = {
  createJob: method<typeof s.jobInputSchema, t.Job>(s.jobInputSchema),
  updateJob: method<typeof s.jobPatchSchema, t.Job>(s.jobPatchSchema),
  getJob: method<typeof s.jobRefSchema, t.Job>(s.jobRefSchema),
  listJobs: method<typeof s.listJobsSchema, t.JobPage>(s.listJobsSchema),
  findJobs: method<typeof s.findJobsSchema, t.TextHit[]>(s.findJobsSchema),
  similarJobs: method<typeof s.similarJobsSchema, t.SimilarJob[]>(s.similarJobsSchema),
  jobRevisions: method<typeof s.jobIdSchema, t.JobRevision[]>(s.jobIdSchema),
  restoreRevision: method<typeof s.restoreRevisionSchema, t.Job>(s.restoreRevisionSchema),
  keepWorkingRevision: method<typeof s.keepWorkingRevisionSchema, t.Job>(s.keepWorkingRevisionSchema),
  setJobStatus: method<typeof s.setJobStatusSchema, t.Job>(s.setJobStatusSchema),
  copyJob: method<typeof s.jobIdSchema, t.Job>(s.jobIdSchema),
  archiveJob: method<typeof s.archiveJobSchema, t.Job>(s.archiveJobSchema),
  deleteJob: method<typeof s.jobIdSchema, t.DeletedJob>(s.jobIdSchema),
  undoDeleteJob: method<typeof s.jobIdSchema, t.Job>(s.jobIdSchema),
  listCustomers: method<typeof none, t.Customer[]>(none),
  saveCustomer: method<typeof s.customerInputSchema, t.Customer>(s.customerInputSchema),
  getSettings: method<typeof none, Settings>(none),
  saveSettings: method<typeof s.saveSettingsSchema, Settings>(s.saveSettingsSchema),
  issueQuote: method<typeof s.issueQuoteSchema, t.Quote>(s.issueQuoteSchema),
  listQuotes: method<typeof s.listQuotesSchema, t.QuoteSummary[]>(s.listQuotesSchema),
  getQuote: method<typeof s.getQuoteSchema, t.Quote>(s.getQuoteSchema),
  addAttachment: method<typeof s.addAttachmentSchema, t.Attachment>(s.addAttachmentSchema),
  listAttachments: method<typeof s.jobAttachmentsSchema, t.Attachment[]>(s.jobAttachmentsSchema),
  getAttachment: method<typeof s.jobIdSchema, t.AttachmentData>(s.jobIdSchema),
  exportJobs: method<typeof s.exportJobsSchema, t.ExportResult>(s.exportJobsSchema),
  importJobs: method<typeof s.importJobsSchema, t.ImportResult>(s.importJobsSchema),
  reindexJobs: method<typeof s.reindexJobsSchema, t.ReindexResult>(s.reindexJobsSchema),
  storeInfo: method<typeof none, t.StoreInfo>(none),
  signIn: method<typeof s.signInSchema, t.StoreInfo>(s.signInSchema),
  openServerStore: method<typeof s.openServerStoreSchema, t.StoreInfo>(s.openServerStoreSchema),
  forgetServerStore: method<typeof s.forgetServerStoreSchema, t.StoreInfo>(s.forgetServerStoreSchema),
};
