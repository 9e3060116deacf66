import type { SpringKind } from '../../core/spec';
import type { Job, JobDetails, JobLink, JobShape, JobStatus, JobSummary, StoredProblem } from '../../core/api/store';
import { failure, success } from '../errors';
import type { StoreResult } from '../errors';
import type { StoredSpec } from './stored-spec';
import { readStoredSpec } from './stored-spec';
import { jobJudgementSchema, noJudgement } from '../../core/quoting/judgement';
import type { JobJudgement } from '../../core/quoting/judgement';

/** A jobs row joined with its customer's name, as the SELECTs below read it. */
export interface JobRow {
  id: number;
  number: string;
  customer_id: number | null;
  customer_name: string | null;
  part_number: string;
  drawing_number: string;
  drawing_revision: string;
  status: JobStatus;
  notes: string;
  due_date: string | null;
  order_quantity: number | null;
  lead_time_days: number | null;
  judgement: string;
  revision: number;
  created_at: string;
  updated_at: string;
  /** Written from a parsed spec's kind (db/jobs/shape). */
  kind: SpringKind;
  material: string;
  material_family: string;
  units: 'metric' | 'inch';
  d: number;
  mean_diameter: number;
  free_length: number;
  active_coils: number;
  rate: number;
  shape_engine: number | null;
  archived_at: string | null;
  spec: string;
}

export const SUMMARY_COLUMNS = `j.id, j.number, j.customer_id, c.name AS customer_name, j.part_number, j.drawing_number,
  j.drawing_revision, j.status, j.notes, j.due_date, j.order_quantity, j.lead_time_days, j.judgement, j.revision, j.created_at,
  j.updated_at, j.kind, j.material, j.material_family, j.units, j.d, j.mean_diameter, j.free_length, j.active_coils, j.rate, j.shape_engine, j.archived_at, j.spec`;

export const JOB_FROM = 'jobs j LEFT JOIN customers c ON c.id = j.customer_id';

/** The typed fields of a job, from its row. */
export function jobDetailsOfRow(row: JobRow): JobDetails {
  return {
    partNumber: row.part_number, drawingNumber: row.drawing_number, drawingRevision: row.drawing_revision,
    status: row.status, notes: row.notes, dueDate: row.due_date, orderQuantity: row.order_quantity,
    leadTimeDays: row.lead_time_days, judgement: judgementOf(row.judgement),
  };
}

/** The stored judgement; one saved before overrides existed (or unreadable) reads as none. */
export function judgementOf(raw: unknown): JobJudgement {
  if (raw === '{}' || raw === undefined || raw === null) return noJudgement();
  const parsed = jobJudgementSchema.safeParse(typeof raw === 'string' ? JSON.parse(raw) : raw ?? {});
  return parsed.success ? parsed.data : noJudgement();
}

export function shapeOf(row: JobRow): JobShape {
  return {
    kind: row.kind, material: row.material, materialFamily: row.material_family, units: row.units,
    wireDiameter: row.d, meanDiameter: row.mean_diameter, outerDiameter: row.mean_diameter + row.d,
    freeLength: row.free_length, activeCoils: row.active_coils, rate: row.rate,
  };
}

/** The job's stored spec, read and checked as any input is. */
export function storedSpecOf(row: JobRow): StoredSpec {
  return readStoredSpec(row.spec, `job ${row.number}`);
}

/**
 * Whether a listed job's spec reads, remembered by its text: a list or search page re-reads the same specs
 * often, and the answer cannot change while this program runs (its grades and spec version are fixed).
 */
const listedProblems = new Map<string, StoredProblem | null>();
const LISTED_LIMIT = 10_000;

function listedProblem(row: JobRow): StoredProblem | null {
  const key = `${row.number}\n${row.spec}`;
  let problem = listedProblems.get(key);
  if (problem === undefined) {
    const stored = storedSpecOf(row);
    problem = stored.ok ? null : stored.problem;
    if (listedProblems.size >= LISTED_LIMIT) listedProblems.clear();
    listedProblems.set(key, problem);
  }
  return problem;
}

export function toSummary(row: JobRow, stored?: StoredSpec): JobSummary {
  const problem = stored ? (stored.ok ? null : stored.problem) : listedProblem(row);
  return {
    id: row.id,
    number: row.number,
    customer: row.customer_id === null ? null : { id: row.customer_id, name: row.customer_name ?? '' },
    ...jobDetailsOfRow(row),
    revision: row.revision,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    archivedAt: row.archived_at,
    shape: shapeOf(row),
    ...(problem ? { problem } : {}),
  };
}

export type { JobLink };

/** The whole job; a spec that no longer reads is this job's problem, with the field it concerns. */
export function toJob(row: JobRow, lineage: Job['lineage'] = { copiedFrom: null, copiedTo: [] }): StoreResult<Job> {
  const stored = storedSpecOf(row);
  if (!stored.ok) return failure(stored.problem.code, stored.problem.message, stored.problem.path);
  return success({ ...toSummary(row, stored), spec: stored.spec, lineage });
}
