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
export const EXCHANGE_VERSION = 1;

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
}

export interface JobsDocument {
  format: typeof EXCHANGE_FORMAT;
  version: typeof EXCHANGE_VERSION;
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
}).strict();

export const documentHeadSchema = z.object({
  format: z.literal(EXCHANGE_FORMAT),
  version: z.literal(EXCHANGE_VERSION),
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
 * ignored on import, so what the export writes imports back unchanged. To change a spec, change it in
 * the app, or edit the spec column.
 */
export const CSV_COLUMNS: readonly string[] = [
  'number', 'customer', 'customerEmail', 'customerPhone', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'notes', 'dueDate',
  'orderQuantity', 'leadTimeDays', 'createdAt', 'updatedAt', 'kind', 'units', 'material', 'materialName',
  ...specColumns.map((c) => `spec.${specColumnHeader(c)}`), rateHeader, 'spec', 'judgement',
];

export const CSV_IMPORTED = new Set<string>([
  'number', 'customer', 'customerEmail', 'customerPhone', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'notes', 'dueDate',
  'orderQuantity', 'leadTimeDays', 'createdAt', 'updatedAt', 'spec', 'judgement',
]);
