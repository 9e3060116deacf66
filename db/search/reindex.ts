import type { ReindexResult, StoredProblem } from '../../core/api/store';
import { reindexJobsSchema } from '../../core/api/store';
import { ENGINE_VERSION } from '../../core/engine-version';
import { parseWith } from '../../core/validation';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import { jobShape } from '../jobs/shape';
import { searchWords } from '../jobs/search-words';
import { readStoredSpec } from '../jobs/stored-spec';
import type { Store } from '../store';
import { inTransaction } from '../store';

interface IndexRow { id: number; number: string; spec: string; d: number; mean_diameter: number; free_length: number; active_coils: number; rate: number }

const SHAPE_NUMBERS = ['d', 'mean_diameter', 'free_length', 'active_coils', 'rate'] as const;

/**
 * Jobs whose search numbers came from another engine version, or from before versions were recorded. Written
 * without `IS NOT ?`, which SQLite reads and PostgreSQL does not (it takes IS NOT only before NULL, TRUE, FALSE).
 */
const STALE = '(shape_engine IS NULL OR shape_engine <> ?)';

export function staleJobCount(store: Store): number {
  return (store.sql(`SELECT count(*) AS n FROM jobs WHERE ${STALE}`).get(ENGINE_VERSION) as { n: number }).n;
}

/** Recomputes one job's search numbers; a spec that no longer reads (or analyse) is left alone and named. */
function reindexOne(store: Store, row: IndexRow): { changed: boolean } | StoredProblem {
  const stored = readStoredSpec(row.spec, `job ${row.number}`);
  if (!stored.ok) return stored.problem;
  let shape;
  try {
    shape = jobShape(stored.spec);
  } catch (e) {
    return { code: 'analysis-failed', path: 'spec', message: `job ${row.number}: the spec cannot be analysed: ${(e as Error).message}` };
  }
  const next = { d: shape.wireDiameter, mean_diameter: shape.meanDiameter, free_length: shape.freeLength, active_coils: shape.activeCoils, rate: shape.rate };
  store.sql(`UPDATE jobs SET kind = ?, material = ?, material_family = ?, units = ?, d = ?, mean_diameter = ?, free_length = ?,
             active_coils = ?, rate = ?, shape_engine = ?, search_words = ? WHERE id = ?`)
    .run(shape.kind, shape.material, shape.materialFamily, shape.units, next.d, next.mean_diameter, next.free_length,
      next.active_coils, next.rate, ENGINE_VERSION, searchWords(stored.spec, shape), row.id);
  return { changed: SHAPE_NUMBERS.some((c) => next[c] !== row[c]) };
}

/**
 * Recomputes the search numbers of every job indexed by another engine version (or of every job, with
 * `all`), in one transaction. Neither the spec nor the revision history changes: only the index does.
 */
export function reindexJobs(store: Store, raw: unknown): StoreResult<ReindexResult> {
  const parsed = parseWith(reindexJobsSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const where = parsed.value.all ? '' : `WHERE ${STALE}`;
  return success(inTransaction(store, () => {
    const rows = store.sql(`SELECT id, number, spec, ${SHAPE_NUMBERS.join(', ')} FROM jobs ${where} ORDER BY number`)
      .all(...(parsed.value.all ? [] : [ENGINE_VERSION])) as IndexRow[];
    const result: ReindexResult = { engineVersion: ENGINE_VERSION, checked: rows.length, reindexed: 0, changed: 0, problems: [] };
    for (const row of rows) {
      const outcome = reindexOne(store, row);
      if ('code' in outcome) result.problems.push(outcome);
      else {
        result.reindexed += 1;
        if (outcome.changed) result.changed += 1;
      }
    }
    return result;
  }));
}
