import { z } from 'zod';
import { customerRefSchema, jobInputSchema } from '../../core/api/store';
import type { JobDetails } from '../../core/api/store';
import { kindEntryOf } from '../../core/kinds/registry';
import type { SpringKind } from '../../core/spec';
import { springKinds } from '../../core/spec';
import type { Quantity } from '../../core/units';
import { unitSymbol } from '../../core/units';
import { symbols } from '../../core/vocabulary';
import type { FirstOffExport } from './first-off';
import { importedFirstOffSchema } from './first-off';

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

/** A shape column's unit in internal units, as its header names it. */
const internal = (quantity: Quantity): string => unitSymbol(quantity, 'metric');

/** What a shape column holds for kinds that differ from the rest, from each kind's registry entry: "torsion: body". */
function kindExceptions(describe: (kind: SpringKind) => string | null): string {
  return springKinds.flatMap((k) => {
    const text = describe(k);
    return text === null ? [] : [`; ${k}: ${text}`];
  }).join('');
}

/** The rate's quantity most kinds share; kinds with another name theirs in the header. */
const rateQuantity = (k: SpringKind): Quantity => kindEntryOf(k).shape.rateQuantity;
const commonRate: Quantity = 'rate';

/**
 * Column order of the CSV job list. Shape columns are in internal units, their headers derived from the
 * quantities each kind declares for its compared length and rate (the length is the free length, or the
 * body length of a torsion spring), and are ignored on import, where the spec column is the source.
 */
export const CSV_COLUMNS = [
  'number', 'customer', 'customerEmail', 'customerPhone', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'notes', 'dueDate',
  'orderQuantity', 'leadTimeDays', 'createdAt', 'updatedAt', 'kind', 'material', 'units',
  `d_${internal('length')}`, `D_${internal('length')}`, `OD_${internal('length')}`,
  `length_${internal('length')} (${symbols.freeLength}${kindExceptions((k) => kindEntryOf(k).shape.lengthNote)})`,
  'activeCoils',
  `rate (${internal(commonRate)}${kindExceptions((k) => (rateQuantity(k) === commonRate ? null : internal(rateQuantity(k))))})`,
  'spec', 'judgement',
] as const;

export const CSV_IMPORTED = new Set<string>([
  'number', 'customer', 'customerEmail', 'customerPhone', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'notes', 'dueDate',
  'orderQuantity', 'leadTimeDays', 'createdAt', 'updatedAt', 'spec', 'judgement',
]);
