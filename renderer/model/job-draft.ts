import type { Job, JobStatus } from '../../core/api';
import type { Spec } from '../../core/spec';
import { numberText, parseNumber } from './numbers';
import type { FormError } from './errors';
import type { Understood } from './convert';

/** The order and customer fields of a job, as typed. */
export interface JobDraft {
  customer: string;
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  status: JobStatus;
  dueDate: string;
  orderQuantity: string;
  leadTimeDays: string;
  notes: string;
}

export const jobPaths = ['customer.name', 'partNumber', 'drawingNumber', 'drawingRevision', 'status', 'dueDate', 'orderQuantity', 'leadTimeDays', 'notes'];

export function emptyJobDraft(): JobDraft {
  return {
    customer: '', partNumber: '', drawingNumber: '', drawingRevision: '', status: 'draft', dueDate: '',
    orderQuantity: '', leadTimeDays: '', notes: '',
  };
}

export function jobDraftOf(job: Job): JobDraft {
  return {
    customer: job.customer?.name ?? '', partNumber: job.partNumber, drawingNumber: job.drawingNumber,
    drawingRevision: job.drawingRevision, status: job.status, dueDate: job.dueDate ?? '',
    orderQuantity: numberText(job.orderQuantity), leadTimeDays: numberText(job.leadTimeDays), notes: job.notes,
  };
}

export interface JobFieldsInput {
  customer: { name: string } | null;
  partNumber: string;
  drawingNumber: string;
  drawingRevision: string;
  status: JobStatus;
  dueDate: string | null;
  orderQuantity: number | null;
  leadTimeDays: number | null;
  notes: string;
}

function whole(path: string, text: string, measure: 'pieces' | 'days', found: JobFieldCheck): number | null {
  const parsed = parseNumber(text, measure);
  if (!parsed.ok) {
    found.errors.push({ code: parsed.code, path, message: parsed.message, missing: false });
    return null;
  }
  if (parsed.value !== undefined && !Number.isInteger(parsed.value)) {
    found.errors.push({ code: 'not-whole', path, message: `${numberText(parsed.value)} is not a whole number of ${measure}`, missing: false });
    return null;
  }
  if (parsed.understood) found.understood.push({ path, message: parsed.understood });
  return parsed.value ?? null;
}

interface JobFieldCheck {
  errors: FormError[];
  understood: Understood[];
}

/** The fields createJob and updateJob take; numbers that are not whole numbers become errors on their paths. */
export function jobFieldsOf(d: JobDraft): { fields: JobFieldsInput } & JobFieldCheck {
  const found: JobFieldCheck = { errors: [], understood: [] };
  const name = d.customer.trim();
  const fields: JobFieldsInput = {
    customer: name === '' ? null : { name },
    partNumber: d.partNumber.trim(), drawingNumber: d.drawingNumber.trim(), drawingRevision: d.drawingRevision.trim(),
    status: d.status, dueDate: d.dueDate === '' ? null : d.dueDate,
    orderQuantity: whole('orderQuantity', d.orderQuantity, 'pieces', found),
    leadTimeDays: whole('leadTimeDays', d.leadTimeDays, 'days', found),
    notes: d.notes,
  };
  return { fields, ...found };
}

/** JSON with keys in order, so two equal objects built in a different order compare equal. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value).filter(([, v]) => v !== undefined).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Whether a save would store exactly what the job holds already (a spec without a version is version 1). */
export function sameAsStored(job: Job, input: JobFieldsInput & { spec: Spec }): boolean {
  const versioned = (s: Spec) => ({ ...s, version: s.version ?? 1 });
  const stored = {
    customer: job.customer ? { name: job.customer.name } : null, partNumber: job.partNumber, drawingNumber: job.drawingNumber,
    drawingRevision: job.drawingRevision, status: job.status, dueDate: job.dueDate, orderQuantity: job.orderQuantity,
    leadTimeDays: job.leadTimeDays, notes: job.notes, spec: versioned(job.spec),
  };
  return canonical(stored) === canonical({ ...input, spec: versioned(input.spec) });
}
