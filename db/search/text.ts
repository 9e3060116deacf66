import type { TextHit } from '../../core/api/store';
import { findJobsSchema } from '../../core/api/store';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import { matchExpression, tsQueryExpression } from './match';

/**
 * How many matches are ranked at most. A short prefix in a large store matches hundreds of thousands of
 * jobs; ranking them all costs time in proportion. Past this many, the newest matches are ranked (job ids
 * grow with time, so the rowid order of the index is newest-last): the jobs a shop most likely means.
 */
export const RANKED_MATCHES = 2000;

/**
 * The FTS query: of the RANKED_MATCHES newest matches (FTS5 reads a kept prefix newest-first and stops
 * there), the best bm25 rank first (the table's rank is bm25 with per-column weights), newest first among
 * equals. Asking FTS5 itself for rank order instead reads every match of the word, whatever the bound.
 */
export const FIND_SQL = `SELECT ${SUMMARY_COLUMNS}, t.rank AS text_rank
  FROM (SELECT rowid, rank FROM (SELECT rowid, rank FROM job_text WHERE job_text MATCH ? ORDER BY rowid DESC LIMIT ${RANKED_MATCHES})
        ORDER BY rank, rowid DESC LIMIT ?) t
  JOIN jobs j ON j.id = t.rowid LEFT JOIN customers c ON c.id = j.customer_id
  ORDER BY t.rank, j.id DESC`;

/** The same two queries on PostgreSQL: job_text's weighted tsvector through its GIN index (migration 0002). */
const PG_NEWEST_BOUND_SQL = `SELECT id AS rowid FROM job_text WHERE document @@ to_tsquery('simple', ?)
  ORDER BY id DESC LIMIT 1 OFFSET ${RANKED_MATCHES - 1}`;
const PG_FIND_SQL = `SELECT ${SUMMARY_COLUMNS}, t.rank AS text_rank
  FROM (SELECT id, -ts_rank(document, to_tsquery('simple', ?)) AS rank FROM job_text
        WHERE document @@ to_tsquery('simple', ?) AND id >= ? ORDER BY rank, id DESC LIMIT ?) t
  JOIN jobs j ON j.id = t.id LEFT JOIN customers c ON c.id = j.customer_id
  ORDER BY t.rank, j.id DESC`;

/** Text search over job number, customer, part number, drawing number and notes, with prefix matching. */
export function findJobs(store: Store, raw: unknown): StoreResult<TextHit[]> {
  const parsed = parseWith(findJobsSchema, raw);
  if (!parsed.ok) return invalid(parsed.errors);
  if (store.dialect === 'postgres') return findOnServer(store, parsed.value.text, parsed.value.limit);
  const match = matchExpression(parsed.value.text);
  if (!match.ok) return invalid(match.errors);
  const rows = store.sql(FIND_SQL).all(match.value, parsed.value.limit) as (JobRow & { text_rank: number })[];
  return success(rows.map((row) => ({ job: toSummary(row), rank: row.text_rank })));
}

function findOnServer(store: Store, text: string, limit: number): StoreResult<TextHit[]> {
  const query = tsQueryExpression(text);
  if (!query.ok) return invalid(query.errors);
  const bound = store.sql(PG_NEWEST_BOUND_SQL).get(query.value) as { rowid: number } | undefined;
  const rows = store.sql(PG_FIND_SQL).all(query.value, query.value, bound?.rowid ?? 0, limit) as (JobRow & { text_rank: number })[];
  return success(rows.map((row) => ({ job: toSummary(row), rank: row.text_rank })));
}
