import type { FirstOffFields, FirstOffRecord } from '../../core/first-off/record';
import { firstOffInputSchema } from '../../core/first-off/record';
import { checkFirstOff } from '../../core/first-off/check';
import type { Spec } from '../../core/spec';
import { parseWith } from '../../core/validation';
import { failure, invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { Store } from '../store';
import { inTransaction } from '../store';

/** A first_off_records row joined with its job's number, as the store's queries read it. */
export interface FirstOffRow {
  id: number;
  job_id: number;
  job_number: string;
  job_revision: number;
  units: 'metric' | 'inch';
  coiled_free_length: number;
  free_length_after_set: number;
  outer_diameter: number;
  forces: string;
  measured_on: string;
  measured_by: string;
  notes: string;
  recorded_at: string;
}

/** The job a record names; the rest is checked against that job's spring. */
const jobRefSchema = firstOffInputSchema.pick({ jobId: true }).loose();

const RECORD_SELECT = `SELECT r.*, j.number AS job_number FROM first_off_records r JOIN jobs j ON j.id = r.job_id`;

/** The set a record shows, to a millionth of its unit: the readings are gauge values, not float noise. */
const setOf = (coiled: number, after: number) => Number((coiled - after).toFixed(6));

function toRecord(row: FirstOffRow): FirstOffRecord {
  return {
    id: row.id, jobId: row.job_id, jobNumber: row.job_number, jobRevision: row.job_revision, units: row.units,
    coiledFreeLength: row.coiled_free_length, freeLengthAfterSet: row.free_length_after_set,
    set: setOf(row.coiled_free_length, row.free_length_after_set),
    forces: JSON.parse(row.forces) as FirstOffRecord['forces'], outerDiameter: row.outer_diameter,
    measuredOn: row.measured_on, measuredBy: row.measured_by, notes: row.notes, recordedAt: row.recorded_at,
  };
}

/** Writes a checked record. Call inside a transaction. */
export function insertFirstOff(store: Store, jobId: number, jobRevision: number, f: FirstOffFields, recordedAt: string): number {
  const result = store.sql(`INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set,
      outer_diameter, forces, measured_on, measured_by, notes, recorded_at, made_by) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`)
    .run(jobId, jobRevision, f.units, f.coiledFreeLength, f.freeLengthAfterSet, f.outerDiameter, JSON.stringify(f.forces),
      f.measuredOn, f.measuredBy, f.notes, recordedAt, store.author);
  return Number(result.lastInsertRowid);
}

function recordById(store: Store, id: number): FirstOffRecord {
  return toRecord(store.sql(`${RECORD_SELECT} WHERE r.id = ?`).get(id) as FirstOffRow);
}

/**
 * Checks a first-off record against the job's current spec and stores it against the job's current
 * revision. A record with any field error is refused whole: nothing is written.
 */
export function recordFirstOff(store: Store, raw: unknown): StoreResult<FirstOffRecord> {
  const ref = jobRefSchema.safeParse(raw);
  if (!ref.success) {
    const parsed = parseWith(firstOffInputSchema, raw);
    return invalid(parsed.ok ? [] : parsed.errors);
  }
  const { jobId, ...fields } = ref.data;
  const job = store.sql('SELECT revision, spec FROM jobs WHERE id = ?').get(jobId) as { revision: number; spec: string } | undefined;
  if (!job) return failure('not-found', `no job with id ${jobId}`, 'jobId');
  const checked = checkFirstOff(fields, JSON.parse(job.spec) as Spec);
  if (!checked.ok) return invalid(checked.errors);
  const id = inTransaction(store, () => insertFirstOff(store, jobId, job.revision, checked.value, store.now().toISOString()));
  return success(recordById(store, id));
}

/** A job's first-off records, oldest measurement first. */
export function listFirstOff(store: Store, jobId: number): StoreResult<FirstOffRecord[]> {
  if (!store.sql('SELECT 1 FROM jobs WHERE id = ?').get(jobId)) return failure('not-found', `no job with id ${jobId}`, 'jobId');
  const rows = store.sql(`${RECORD_SELECT} WHERE r.job_id = ? ORDER BY r.measured_on, r.id`).all(jobId) as FirstOffRow[];
  return success(rows.map(toRecord));
}
