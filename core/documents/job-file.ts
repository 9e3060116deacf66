/**
 * What a document needs to know about a job, read from a file: a bare spec, or a job file as `jobs add`
 * takes it ({customer:{name}, partNumber, drawing, revision, orderQuantity?, dueDate?, spec:{…}}).
 */
import type { JobJudgement } from '../quoting/judgement';
import { z } from 'zod';
import type { FieldError, Result } from '../result';
import { fail, fieldError, ok } from '../result';
import { customerRefSchema, isoDateSchema, jobInputSchema, jobStatusSchema } from '../api/store-schemas';
import { zodErrors } from '../validation';
import { parseSpec } from '../spec';
import type { Spec } from '../spec';

export interface PrintJob {
  /** The shop's job number; null for a job that is not in the store. */
  number: string | null;
  customerName: string | null;
  customerLines: string[];
  /** Payment terms agreed with the customer, when they differ from the shop's. */
  customerPaymentTerms?: string;
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  purchaseOrder?: string;
  orderQuantity: number | null;
  dueDate: string | null;
  leadTimeDays: number | null;
  spec: Spec;
  /** The estimator's routing and price overrides for a stored job; none for a file. */
  judgement?: JobJudgement;
}

/**
 * The job file every command reads (`jobs add`, `sheet`, `price`, `print`): the fields of a new job, the
 * drawing and its revision also under their short names, and the customer's purchase order for documents.
 * Unknown fields are errors, so a misspelt `orderQty` is never read as no order quantity.
 */
export const jobFileSchema = z.object({
  customer: customerRefSchema.nullable().optional(),
  customerId: z.number().int().positive().optional(),
  partNumber: z.string().trim().max(64).default(''),
  status: jobStatusSchema.optional(),
  notes: z.string().max(4000).optional(),
  drawing: z.string().trim().max(64).optional(),
  drawingNumber: z.string().trim().max(64).optional(),
  revision: z.string().trim().max(16).optional(),
  drawingRevision: z.string().trim().max(16).optional(),
  purchaseOrder: z.string().trim().max(64).optional(),
  orderQuantity: jobInputSchema.shape.orderQuantity.unwrap().optional(),
  dueDate: isoDateSchema.nullable().optional(),
  leadTimeDays: z.number().int().min(0).max(3650).nullable().optional(),
  spec: z.unknown(),
}).strict();

export const isJobFile = (raw: unknown): boolean =>
  typeof raw === 'object' && raw !== null && !Array.isArray(raw) && !('kind' in raw) && 'spec' in raw;

function prefixed(prefix: string, errors: FieldError[]): FieldError[] {
  return errors.map((e) => ({ ...e, path: e.path ? `${prefix}.${e.path}`.replace('.[', '[') : prefix }));
}

function fromSpec(spec: Spec): PrintJob {
  return {
    number: null, customerName: null, customerLines: [], partNumber: '', drawingNumber: '', drawingRevision: '',
    orderQuantity: null, dueDate: null, leadTimeDays: null, spec,
  };
}

function jobOf(raw: unknown): Result<PrintJob> {
  const parsed = jobFileSchema.safeParse(raw);
  if (!parsed.success) return fail(zodErrors(parsed.error));
  const j = parsed.data;
  const spec = parseSpec(j.spec);
  if (!spec.ok) return fail(prefixed('spec', spec.errors));
  const contact = [j.customer?.email, j.customer?.phone].filter((s): s is string => Boolean(s));
  return ok({
    ...fromSpec(spec.value),
    customerName: j.customer?.name ?? null, customerLines: contact, partNumber: j.partNumber,
    drawingNumber: j.drawingNumber ?? j.drawing ?? '', drawingRevision: j.drawingRevision ?? j.revision ?? '',
    ...(j.purchaseOrder ? { purchaseOrder: j.purchaseOrder } : {}),
    orderQuantity: j.orderQuantity ?? null, dueDate: j.dueDate ?? null, leadTimeDays: j.leadTimeDays ?? null,
  });
}

/** Reads a spec or a job file; every problem comes back with the field it concerns. */
export function parsePrintFile(raw: unknown): Result<PrintJob> {
  if (isJobFile(raw)) {
    return jobOf(raw);
  }
  const spec = parseSpec(raw);
  return spec.ok ? ok(fromSpec(spec.value)) : spec;
}

/** The quantity a traveller is for: the one asked for, the job's order, else the spec's first break. */
export function travellerQuantity(job: PrintJob, asked?: number): Result<number> {
  const q = asked ?? job.orderQuantity ?? job.spec.quantities?.[0];
  if (q === undefined) {
    return fail([fieldError('missing-quantity', 'orderQuantity', 'a traveller needs an order quantity: give orderQuantity in the job file or --quantity N')]);
  }
  return ok(q);
}
