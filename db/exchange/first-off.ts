import { z } from 'zod';
import { checkFirstOff } from '../../core/first-off/check';
import type { FirstOffFields } from '../../core/first-off/record';
import type { FieldError, Result } from '../../core/result';
import { fail, fieldError, formatPath, ok } from '../../core/result';
import type { Spec } from '../../core/spec';
import { insertFirstOff } from '../first-off/records';
import type { Store } from '../store';
import type { FirstOffRow } from '../first-off/records';

/** A first-off record in an export file: the measured values as entered, and when they were recorded. */
export interface FirstOffExport extends FirstOffFields {
  recordedAt: string;
}

/** What an import file may carry beside a job: its first-off records (checked against the job's spec). */
export const importedFirstOffSchema = z.array(z.unknown()).max(1000).optional();

/** The stored columns of a record (the export reads the table itself, without the job's number). */
type Row = Omit<FirstOffRow, 'id' | 'job_number' | 'job_revision'>;

/** The first-off records of the given jobs for export, by job id, oldest measurement first. */
export function firstOffByJob(store: Store, jobIds: readonly number[]): Map<number, FirstOffExport[]> {
  const rows = store.sql(`SELECT * FROM first_off_records WHERE job_id IN (SELECT value FROM json_each(?))
                          ORDER BY job_id, measured_on, id`).all(JSON.stringify(jobIds)) as Row[];
  const byJob = new Map<number, FirstOffExport[]>();
  for (const r of rows) {
    const list = byJob.get(r.job_id) ?? [];
    list.push({
      units: r.units, coiledFreeLength: r.coiled_free_length, freeLengthAfterSet: r.free_length_after_set,
      forces: JSON.parse(r.forces) as FirstOffExport['forces'], outerDiameter: r.outer_diameter,
      measuredOn: r.measured_on, measuredBy: r.measured_by, notes: r.notes, recordedAt: r.recorded_at,
    });
    byJob.set(r.job_id, list);
  }
  return byJob;
}

export interface CheckedFirstOff {
  fields: FirstOffFields;
  recordedAt: string | undefined;
}

const recordedAtSchema = z.iso.datetime().optional();

/** Checks each imported record as `recordFirstOff` would, against the job's imported spec. */
export function checkImportedFirstOff(raw: unknown[] | undefined, spec: Spec, at: readonly PropertyKey[]): Result<CheckedFirstOff[]> {
  const errors: FieldError[] = [];
  const out: CheckedFirstOff[] = [];
  (raw ?? []).forEach((item, i) => {
    const path = [...at, 'firstOff', i];
    if (typeof item !== 'object' || item === null || Array.isArray(item)) {
      errors.push(fieldError('not-an-object', formatPath(path), 'a first-off record must be an object'));
      return;
    }
    const { recordedAt, ...fields } = item as Record<string, unknown>;
    const stamp = recordedAtSchema.safeParse(recordedAt);
    if (!stamp.success) errors.push(fieldError('invalid-format', formatPath([...path, 'recordedAt']), 'recordedAt must be an ISO date and time'));
    const checked = checkFirstOff(fields, spec, path);
    if (!checked.ok) errors.push(...checked.errors);
    else if (stamp.success) out.push({ fields: checked.value, recordedAt: stamp.data });
  });
  return errors.length > 0 ? fail(errors) : ok(out);
}

/** Writes an imported job's records against its first revision. Call inside the import's transaction. */
export function writeImportedFirstOff(store: Store, jobId: number, records: readonly CheckedFirstOff[]): void {
  const now = store.now().toISOString();
  for (const r of records) insertFirstOff(store, jobId, 1, r.fields, r.recordedAt ?? now);
}
