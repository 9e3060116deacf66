import type { JobShape } from '../../core/api/store';
import { setCalibrationSchema } from '../../core/api/first-off';
import { calibrateSet, calibrationInSpecUnits } from '../../core/process/set-calibration';
import type { PastFirstOff, SetCalibration } from '../../core/process/set-calibration';
import { setModelValues } from '../../core/process/set-model-values';
import type { SetModelValues } from '../../core/process/set-model-values';
import type { SetRemovalGoverning } from '../../core/springs/compression/set-removal';
import { readSetting } from '../settings';
import { toInternal } from '../../core/units';
import { parseWith } from '../../core/validation';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import { checkSpec } from '../jobs/input';
import { distance } from '../search/similarity';
import type { Store } from '../store';
import type { FirstOffRow } from './records';

type EvidenceRow = Pick<FirstOffRow, 'id' | 'job_id' | 'job_number' | 'job_revision' | 'units' | 'coiled_free_length'
  | 'free_length_after_set' | 'measured_on' | 'measured_by'> & { revision_spec: string };

/** Records of compression jobs of one grade family, each with the spec of the revision it was made to. */
const EVIDENCE_SQL = `SELECT r.id, r.job_id, j.number AS job_number, r.job_revision, r.units, r.coiled_free_length,
    r.free_length_after_set, r.measured_on, r.measured_by, v.spec AS revision_spec
  FROM first_off_records r JOIN jobs j ON j.id = r.job_id
  JOIN job_revisions v ON v.job_id = r.job_id AND v.revision = r.job_revision
  WHERE j.kind = 'compression' AND j.material_family = ?`;

interface RevisionView { shape: JobShape; model: SetModelValues | null }

/** The shape and model values of the spec a record was made to; null when that spec no longer analyses. */
function revisionView(raw: string, method: SetRemovalGoverning): RevisionView | null {
  const checked = checkSpec(JSON.parse(raw) as unknown, []);
  return checked.ok ? { shape: checked.value.shape, model: setModelValues(checked.value.spec, method) } : null;
}

function pastRecords(store: Store, asked: JobShape, method: SetRemovalGoverning): PastFirstOff[] {
  const rows = store.sql(EVIDENCE_SQL).all(asked.materialFamily) as EvidenceRow[];
  const views = new Map<string, RevisionView | null>();
  const out: PastFirstOff[] = [];
  for (const row of rows) {
    const key = `${row.job_id}:${row.job_revision}`;
    if (!views.has(key)) views.set(key, revisionView(row.revision_spec, method));
    const view = views.get(key)!;
    if (!view) continue;
    const mm = (v: number) => toInternal(v, 'length', row.units);
    out.push({
      recordId: row.id, jobId: row.job_id, jobNumber: row.job_number, material: view.shape.material,
      materialFamily: view.shape.materialFamily, distance: distance(asked, view.shape),
      measuredOn: row.measured_on, measuredBy: row.measured_by,
      coiledFreeLength: mm(row.coiled_free_length), freeLengthAfterSet: mm(row.free_length_after_set), model: view.model,
    });
  }
  return out;
}

/**
 * The model's coiled free length for a spec beside one calibrated by the shop's first-off records of
 * similar springs of the same grade family (ranked by the same distance as similar-job search), in the
 * spec's units.
 */
export function setCalibration(store: Store, raw: unknown): StoreResult<SetCalibration> {
  const parsed = parseWith(setCalibrationSchema, raw);
  if (!parsed.ok) return invalid(parsed.errors);
  const checked = checkSpec(parsed.value.spec, ['spec']);
  if (!checked.ok) return invalid(checked.errors);
  const { spec, shape } = checked.value;
  // Past records are read against the model as the shop routes now, so their ratio applies to this spring's value.
  const method = readSetting(store, 'defaults').setRemovalMethod;
  const model = setModelValues(spec, method);
  const past = model ? pastRecords(store, shape, method) : [];
  return success(calibrationInSpecUnits(calibrateSet({ materialFamily: shape.materialFamily, units: spec.units, model }, past)));
}
