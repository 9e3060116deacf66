import { z } from 'zod';
import { method } from './contract';
import { unitSystemSchema } from '../spec/common';
import { requestMappingSchema } from '../request-sheet/mapping';
import type { RequestPreview, RequestSheet } from '../request-sheet';
import type { JobSummary } from './store-types';

export { requestMappingSchema };
export type { RequestMapping } from '../request-sheet/mapping';
export type { RequestPreview, RequestSheet, PreviewRow, SheetCell } from '../request-sheet';

const id = z.number().int().positive();

/** 16 MiB: far past any request sheet a customer sends (a 1 000-row XLSX is about 60 kB). */
export const MAX_REQUEST_SHEET_BYTES = 16 * 1024 * 1024;

/** The file the estimator picked, as bytes: the screen uploads it, the CLI reads it; no path crosses. */
export const readRequestSheetSchema = z.object({
  fileName: z.string().trim().min(1).max(255),
  dataBase64: z.string().max(Math.ceil(MAX_REQUEST_SHEET_BYTES / 3) * 4).regex(/^[A-Za-z0-9+/]*={0,2}$/, 'base64 data'),
}).strict();

const sheetCellSchema = z.union([z.string().max(4000), z.number().finite()]);
export const requestSheetSchema = z.object({
  name: z.string().max(300),
  rows: z.array(z.array(sheetCellSchema).max(200)).max(20_000),
}).strict();

const cellRefKey = z.string().regex(/^[A-Za-z]{1,3}\d{1,7}$/, 'a cell reference such as C7');

/** The sheet, how to read it, and the estimator's corrections: fixed cells and rows left out. */
export const previewRequestSheetSchema = z.object({
  sheet: requestSheetSchema,
  /** The customer whose saved mapping applies (none yet: the headers are guessed). */
  customer: z.string().trim().max(120).optional(),
  mapping: requestMappingSchema.optional(),
  /** Apply the customer's saved mapping under the one given; false guesses every column left from the headers. */
  useSavedMapping: z.boolean().default(true),
  units: unitSystemSchema.optional(),
  decimalMark: z.enum(['.', ',']).optional(),
  fixes: z.record(cellRefKey, z.string().max(4000)).optional(),
  skip: z.array(z.number().int().min(1)).max(20_000).optional(),
  /** Each ready row's draft job (its spec) in the answer; left out by default, as a screen needs only the cells. */
  includeJobs: z.boolean().default(false),
}).strict();
export type PreviewRequestSheetInput = z.input<typeof previewRequestSheetSchema>;

/** The import: every row not skipped must read; the accepted rows become draft jobs under one enquiry. */
export const importRequestSheetSchema = previewRequestSheetSchema.extend({
  customer: z.string().trim().min(1, 'say which customer sent the sheet').max(120),
  reference: z.string().trim().min(1, 'the customer\'s enquiry reference (or the sheet\'s name)').max(120),
  saveMapping: z.boolean().default(true),
}).strict();
export type ImportRequestSheetInput = z.input<typeof importRequestSheetSchema>;

export const listEnquiriesSchema = z.object({
  customerId: id.optional(),
  limit: z.number().int().min(1).max(500).default(50),
}).strict();

export const enquiryJobsSchema = z.object({ id }).strict();

export interface Enquiry {
  id: number;
  /** The customer's own reference for the enquiry. */
  reference: string;
  /** What it came from, e.g. the request sheet's file name. */
  source: string;
  receivedAt: string;
  customer: { id: number; name: string };
  jobCount: number;
}

export interface RequestPreviewResult extends RequestPreview {
  /** Whether the customer had a saved mapping that was applied. */
  savedMapping: boolean;
}

export interface RequestImportResult {
  enquiry: Enquiry;
  jobs: { row: number; id: number; number: string }[];
  /** Rows left out by choice, with what was wrong with them if anything. */
  skipped: { row: number; reason: string }[];
  mappingSaved: boolean;
}

export interface EnquiryJobs {
  enquiry: Enquiry;
  /** The enquiry's jobs in sheet order, each with the row it came from. */
  jobs: (JobSummary & { sheetRow: number })[];
}

/** Request sheets in, as draft jobs under one enquiry; enquiries and their jobs out, for quoting together. */
export const requestSheetMethods = {
  readRequestSheet: method<typeof readRequestSheetSchema, RequestSheet>(readRequestSheetSchema),
  previewRequestSheet: method<typeof previewRequestSheetSchema, RequestPreviewResult>(previewRequestSheetSchema),
  importRequestSheet: method<typeof importRequestSheetSchema, RequestImportResult>(importRequestSheetSchema),
  listEnquiries: method<typeof listEnquiriesSchema, Enquiry[]>(listEnquiriesSchema),
  enquiryJobs: method<typeof enquiryJobsSchema, EnquiryJobs>(enquiryJobsSchema),
};
