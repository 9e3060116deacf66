import type { TextHit } from '../../core/api/store';
import { findJobsSchema } from '../../core/api/store';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import type { TsWord } from './match';
import { matchExpression, prefixRuns, tsQueryText, tsWords } from './match';

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

/**
 * How many matches PostgreSQL ranks at most. Fewer than SQLite's RANKED_MATCHES: FTS5 walks doclists kept
 * in rowid order and stops at the bound, while PostgreSQL finds the newest matches by testing each job's
 * tsvector from the newest job down (about a microsecond a job), so a word in one job in twenty costs
 * twenty jobs read per candidate. Past the newest few hundred matches of a common word the ranks are ties
 * among notes-only mentions, which the newest job wins on both backends anyway; a word in the identifying
 * columns is rare, and rare words never reach the bound.
 */
export const PG_RANKED_MATCHES = 500;

/**
 * PostgreSQL: one statement. `newest` is the PG_RANKED_MATCHES newest matches, found by whichever way the
 * planner judges cheaper from the words' statistics: the GIN index (migration 0014) for rare words, or the
 * primary key walked from the newest job down, testing each job's tsvector, for common ones (a two-letter
 * prefix matching a third of the jobs reaches its newest matches within a few thousand jobs; GIN would hand
 * over every match unordered, each a heap visit). Only those are ranked (ts_rank with the column weights).
 */
export const PG_FIND_SQL = `WITH newest AS MATERIALIZED (
    SELECT id, document FROM job_text WHERE document @@ to_tsquery('simple', ?) ORDER BY id DESC LIMIT ${PG_RANKED_MATCHES})
  SELECT ${SUMMARY_COLUMNS}, t.rank AS text_rank
  FROM (SELECT id, -ts_rank(document, to_tsquery('simple', ?)) AS rank FROM newest ORDER BY rank, id DESC LIMIT ?) t
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

/**
 * A prefix is written as its whole words only when it stands for this many at most ("valv": valve, valves).
 * The planner prices each word it has no statistics for as a common-enough one, so a prefix of a dozen rare
 * drawing numbers would look like a common word and be searched from the newest job down through every
 * job; such a prefix stays a prefix, which GIN answers quickly when its words are rare.
 */
const MAX_EXPANSION = 4;

/** The indexed words starting with each prefix (job_text_words, migration 0016), up to one past MAX_EXPANSION. */
const WORDS_SQL = `SELECT p AS prefix, ARRAY(SELECT word FROM job_text_words
    WHERE word >= p COLLATE "C" AND word < (p || chr(1114111)) COLLATE "C" ORDER BY word LIMIT ${MAX_EXPANSION + 1}) AS words
  FROM unnest(?::text[]) AS p`;

/** Each prefix's whole words, or null when one of them starts no indexed word (then nothing can match). */
function expansions(store: Store, words: readonly TsWord[]): Map<string, string[]> | null {
  const prefixes = prefixRuns(words);
  const out = new Map<string, string[]>();
  if (prefixes.length === 0) return out;
  for (const row of store.sql(WORDS_SQL).all(prefixes) as { prefix: string; words: string[] }[]) {
    if (row.words.length === 0) return null;
    if (row.words.length <= MAX_EXPANSION) out.set(row.prefix, row.words);
  }
  return out;
}

function findOnServer(store: Store, text: string, limit: number): StoreResult<TextHit[]> {
  const words = tsWords(text);
  if (!words.ok) return invalid(words.errors);
  const expanded = expansions(store, words.value);
  if (expanded === null) return success([]);
  const query = tsQueryText(words.value, expanded);
  const rows = store.sql(PG_FIND_SQL).all(query, query, limit) as (JobRow & { text_rank: number })[];
  return success(rows.map((row) => ({ job: toSummary(row), rank: row.text_rank })));
}
