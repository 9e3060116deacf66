import { z } from 'zod';
import { customerRefSchema, jobInputSchema } from '../../core/api/store';
import type { JobDetails } from '../../core/api/store';
import { kindEntryOf } from '../../core/kinds/registry';
import type { SpringKind } from '../../core/spec';
import { springKinds } from '../../core/spec';
import type { Quantity } from '../../core/units';
import { unitSymbol } from '../../core/units';
import type { FirstOffExport } from './first-off';
import { importedFirstOffSchema } from './first-off';
import { specColumnHeader, specColumns } from '../../core/spec/columns';

export const EXCHANGE_FORMAT = 'coilwright-jobs';
/**
 * 2 added a job's archive state, the job it was made from and the enquiry it was quoted in. A version 1
 * document is a version 2 document without them, so both import; a newer one is refused by name.
 */
export const EXCHANGE_VERSION = 2;
export const READ_VERSIONS = [1, 2] as const;

/** The job a job was made from ("new job from this one"), by its number in the file, and when. */
export interface CopiedFromExport {
  number: string;
  at: string;
}

/**
 * The enquiry a job was quoted in. `key` tells the file's enquiries apart (jobs with the same key were
 * asked for together); the rest describe the enquiry, the same on each of its jobs.
 */
export interface EnquiryExport {
  key: number;
  customer: string;
  reference: string;
  source: string;
  receivedAt: string;
  sheetRow: number;
}

/** One job in an export file: its current state, the customer by name, the spec as saved. */
export interface JobRecord extends JobDetails {
  number: string;
  customer: { name: string; email: string; phone: string } | null;
  createdAt: string;
  updatedAt: string;
  /** The checked spec; as stored when it no longer reads, so an export never drops a job (the export names it). */
  spec: unknown;
  /** The job's first-off records, when it has any. */
  firstOff?: FirstOffExport[];
  /** When the job was archived (taken out of the default list); absent while it is listed. */
  archivedAt?: string;
  copiedFrom?: CopiedFromExport;
  enquiry?: EnquiryExport;
}

export interface JobsDocument {
  format: typeof EXCHANGE_FORMAT;
  version: (typeof READ_VERSIONS)[number];
  exportedAt: string;
  jobs: JobRecord[];
}

/** A record as import accepts it: the job input, customers by name only (ids are per store). */
export const importRecordSchema = jobInputSchema.omit({ customerId: true }).extend({
  customer: customerRefSchema.nullable().optional(),
  number: z.string().trim().min(1).max(40).optional(),
  createdAt: z.iso.datetime().optional(),
  updatedAt: z.iso.datetime().optional(),
  firstOff: importedFirstOffSchema,
  archivedAt: z.iso.datetime().nullable().optional(),
  copiedFrom: z.object({
    number: z.string().trim().min(1).max(40),
    at: z.iso.datetime(),
  }).strict().optional(),
  enquiry: z.object({
    key: z.number().int().positive(),
    customer: z.string().trim().min(1, 'an enquiry needs its customer').max(120),
    reference: z.string().trim().min(1, 'the customer\'s enquiry reference').max(120),
    source: z.string().max(400).default(''),
    receivedAt: z.iso.datetime(),
    sheetRow: z.number().int().min(1),
  }).strict().optional(),
}).strict();

/** The versions this importer reads; a newer file is refused by name, so nothing it carries is lost unread. */
const versionSchema = z.number().superRefine((v, ctx) => {
  if ((READ_VERSIONS as readonly number[]).includes(v)) return;
  const newer = v > EXCHANGE_VERSION ? ': a newer Coilwright wrote it, import it there or update this one' : '';
  ctx.addIssue({ code: 'custom', params: { code: 'unknown-version' }, message: `version ${v} is not one this Coilwright reads (${READ_VERSIONS.join(' and ')})${newer}` });
});

export const documentHeadSchema = z.object({
  format: z.literal(EXCHANGE_FORMAT),
  version: versionSchema,
  exportedAt: z.string().optional(),
  jobs: z.array(z.unknown()),
}).strict();

/** The rate's quantity most kinds share; kinds with another name theirs in the header. */
const rateQuantity = (k: SpringKind): Quantity => kindEntryOf(k).shape.rateQuantity;
const bothSystems = (q: Quantity): string => `${unitSymbol(q, 'metric')} | ${unitSymbol(q, 'inch')}`;
const rateHeader = `rate (${bothSystems('rate')}${springKinds.filter((k) => rateQuantity(k) !== 'rate').map((k) => `; ${k}: ${bothSystems(rateQuantity(k))}`).join('')})`;

/**
 * Columns of the CSV job list, written for people: every job in its own unit system (the units column
 * says which; each header names the unit in both), numbers at the trade's precision, the grade's name
 * beside its id, and one column per spec field (spec-columns.ts). The last columns, spec (the spec as
 * JSON) and judgement, are what an import reads: the per-field columns are rounded for reading and are
 * ignored on import, so what the export writes imports back unchanged. archivedAt (blank while the job is
 * listed) tells a reader which jobs are live, since the list holds archived jobs too. To change a spec,
 * change it in the app, or edit the spec column. Links and enquiries tie rows to rows: the JSON carries them.
 */
export const CSV_COLUMNS: readonly string[] = [
  'number', 'customer', 'customerEmail', 'customerPhone', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'notes', 'dueDate',
  'orderQuantity', 'leadTimeDays', 'createdAt', 'updatedAt', 'archivedAt', 'kind', 'units', 'material', 'materialName',
  ...specColumns.map((c) => `spec.${specColumnHeader(c)}`), rateHeader, 'spec', 'judgement',
];

export const CSV_IMPORTED = new Set<string>([
  'number', 'customer', 'customerEmail', 'customerPhone', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'notes', 'dueDate',
  'orderQuantity', 'leadTimeDays', 'createdAt', 'updatedAt', 'archivedAt', 'spec', 'judgement',
]);
