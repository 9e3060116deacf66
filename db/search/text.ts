import type { TextHit } from '../../core/api/store';
import { findJobsSchema } from '../../core/api/store';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import { matchExpression } from './match';

/** The FTS query: best bm25 rank first (the table's rank is bm25 with per-column weights). */
export const FIND_SQL = `SELECT ${SUMMARY_COLUMNS}, t.rank AS text_rank
  FROM (SELECT rowid, rank FROM job_text WHERE job_text MATCH ? ORDER BY rank LIMIT ?) t
  JOIN jobs j ON j.id = t.rowid LEFT JOIN customers c ON c.id = j.customer_id
  ORDER BY t.rank`;

/** Text search over job number, customer, part number, drawing number and notes, with prefix matching. */
export function findJobs(store: Store, raw: unknown): StoreResult<TextHit[]> {
  const parsed = parseWith(findJobsSchema, raw);
  if (!parsed.ok) return invalid(parsed.errors);
  const match = matchExpression(parsed.value.text);
  if (!match.ok) return invalid(match.errors);
  const rows = store.sql(FIND_SQL).all(match.value, parsed.value.limit) as (JobRow & { text_rank: number })[];
  return success(rows.map((row) => ({ job: toSummary(row), rank: row.text_rank })));
}
