import type { JobPage, ListJobsQuery } from '../../core/api/store';
import { listJobsSchema } from '../../core/api/store';
import { fieldError } from '../../core/result';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { JOB_FROM, SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';
import { addCalendarDays, dayStart } from '../../core/calendar';
import { shopTimeZone } from '../settings';

interface Where {
  clauses: string[];
  params: unknown[];
}

/**
 * A date range as the store compares it. `before` (set by inShopDays) is the first instant of the day after `to` in
 * the shop's time zone; without it a stamp's UTC date is compared.
 */
type DateBounds = NonNullable<ListJobsQuery['dates']> & { before?: string };
type Filters = Pick<ListJobsQuery, 'status' | 'customerId' | 'kind' | 'material'> & { dates?: DateBounds | undefined; archived?: boolean };

const dateColumn = { created: 'created_at', updated: 'updated_at', due: 'due_date' } as const;

/**
 * Date bounds on ISO stamps: "to" includes the whole day (up to `before` when the shop's days are set). Due dates
 * are plain YYYY-MM-DD. `indexed: false` writes the column as `substr(column, 1)` (the same value, NULL kept):
 * SQLite then neither reads a date index for the range nor counts the query among those its partial dated indexes
 * serve, and reads the sort's index.
 */
function dateClauses(where: Where, dates: DateBounds, table: string, indexed = true): void {
  const column = indexed ? `${table}${dateColumn[dates.field]}` : `substr(${table}${dateColumn[dates.field]}, 1)`;
  if (dates.from) {
    where.clauses.push(`${column} >= ?`);
    where.params.push(dates.from);
  }
  if (dates.to) {
    where.clauses.push(dates.field === 'due' ? `${column} <= ?` : `${column} < ?`);
    where.params.push(dates.field === 'due' ? dates.to : dates.before ?? `${dates.to}T99`);
  }
}

/**
 * The range's days as the shop's (settings `defaults.timeZone`): a created or last-saved range runs from the first
 * instant of its from day to the first instant of the day after its to day there. Due dates are days already.
 */
export function inShopDays<Q extends { dates?: DateBounds | undefined }>(q: Q, zone: string): Q {
  const d = q.dates;
  if (d === undefined || d.field === 'due') return q;
  return { ...q, dates: {
    ...d, ...(d.from ? { from: dayStart(d.from, zone) } : {}), ...(d.to ? { before: dayStart(addCalendarDays(d.to, 1), zone) } : {}),
  } };
}

/** The filters as SQL on the jobs table; `table` is its alias with the dot ("j.") or "" for job_counts. */
export function jobFilter(q: Filters, table = 'j.', datesIndexed = true): Where {
  const where: Where = { clauses: [], params: [] };
  if (q.status !== undefined) {
    const statuses = Array.isArray(q.status) ? q.status : [q.status];
    where.clauses.push(`${table}status IN (${statuses.map(() => '?').join(', ')})`);
    where.params.push(...statuses);
  }
  if (q.customerId !== undefined) {
    where.clauses.push(`${table}customer_id = ?`);
    where.params.push(q.customerId);
  }
  if (q.kind !== undefined) {
    where.clauses.push(`${table}kind = ?`);
    where.params.push(q.kind);
  }
  if (q.material !== undefined) {
    where.clauses.push(`${table}material = ?`);
    where.params.push(q.material);
  }
  if (q.dates) dateClauses(where, q.dates, table, datesIndexed);
  return where;
}

/**
 * The columns each sort orders by, ending in a unique one so that a page can continue exactly after its
 * last row (keyset paging). Every combination with one filter has an index in this order (migration 0009).
 */
const SORT_KEYS = {
  updated: ['updated_at', 'id'],
  number: ['number'],
  customer: ['customer_key', 'number'],
  archived: ['archived_at', 'id'],
} as const;

/**
 * The default list skips archived jobs as it reads its sort's index (archived jobs are few beside the rest);
 * the archived list reads its own partial index, jobs_archived, newest archived first (migration 0014).
 */
const ARCHIVED_CLAUSE = { listed: 'j.archived_at IS NULL', archived: 'j.archived_at IS NOT NULL' } as const;

type SortColumn = (typeof SORT_KEYS)[keyof typeof SORT_KEYS][number];

/** Within one customer every job has the same customer key: ordering by it is ordering by number. */
function sortColumns(q: ListJobsQuery): readonly SortColumn[] {
  if (q.archived && q.sort === 'updated') return SORT_KEYS.archived;
  return q.sort === 'customer' && q.customerId !== undefined ? SORT_KEYS.number : SORT_KEYS[q.sort];
}

function descending(q: ListJobsQuery): boolean {
  return (q.direction ?? (q.sort === 'updated' ? 'desc' : 'asc')) === 'desc';
}

/** A page's continuation: the sort values of its last row, as an opaque URL-safe string. */
export function cursorOf(row: Record<string, unknown>, columns: readonly SortColumn[]): string {
  return Buffer.from(JSON.stringify(columns.map((c) => row[c]))).toString('base64url');
}

function decodeCursor(text: string, columns: readonly SortColumn[]): unknown[] | null {
  try {
    const values: unknown = JSON.parse(Buffer.from(text, 'base64url').toString('utf8'));
    const fits = Array.isArray(values) && values.length === columns.length
      && values.every((v) => typeof v === 'string' || (typeof v === 'number' && Number.isFinite(v)));
    return fits ? values : null;
  } catch {
    return null;
  }
}

export interface ListSql {
  sql: string;
  params: unknown[];
  columns: readonly SortColumn[];
}

/**
 * The index of each date field that holds, beside the date, every column the list filters and sorts by
 * (migration 0019): a range's jobs are filtered and ordered from it alone, and only the page's rows are read.
 */
export const DATED_INDEX = { created: 'jobs_dated_created', updated: 'jobs_dated_updated', due: 'jobs_dated_due' } as const;

/**
 * How a page is read. `sorted`: the sort's own index in order, each job's date checked on its row, stopping at
 * the page's end: quick when the range's jobs come early in that order. `dated`: every job of the date range
 * from the range's index alone, the page's jobs picked from them in the sort's order: quick when the range is
 * not huge. Both give the same rows in the same order.
 */
export type ListRoute = 'sorted' | 'dated';

interface ListParts {
  where: Where;
  order: string;
  columns: readonly SortColumn[];
  pinned: boolean;
}

/** Filters, the keyset bound of a following page and the order, as both routes use them. */
function listParts(q: ListJobsQuery, after: unknown[] | null, dialect: Store['dialect'], datesIndexed: boolean): ListParts {
  const where = jobFilter(q, 'j.', datesIndexed);
  where.clauses.push(q.archived ? ARCHIVED_CLAUSE.archived : ARCHIVED_CLAUSE.listed);
  const columns = sortColumns(q);
  const desc = descending(q);
  if (after !== null) {
    const tuple = columns.map((c) => `j.${c}`).join(', ');
    where.clauses.push(columns.length === 1 ? `${tuple} ${desc ? '<' : '>'} ?` : `(${tuple}) ${desc ? '<' : '>'} (${columns.map(() => '?').join(', ')})`);
    where.params.push(...after);
  }
  const order = columns.map((c) => `j.${c} ${desc ? 'DESC' : 'ASC'}`).join(', ');
  // Without statistics SQLite's planner would rather sort the archived jobs a status index finds; the partial
  // index is already in the order asked for. (PostgreSQL has no index hints; its statistics choose.)
  return { where, order, columns, pinned: columns === SORT_KEYS.archived && dialect === 'sqlite' };
}

const whereOf = (where: Where): string => (where.clauses.length > 0 ? `WHERE ${where.clauses.join(' AND ')}` : '');

/** Whether the date range is on the column the sort's index starts with: that index then reads the range in order. */
function rangeInSortOrder(q: ListJobsQuery): boolean {
  return q.dates !== undefined && sortColumns(q)[0] === dateColumn[q.dates.field];
}

/** A date filter with at least one bound. */
function ranged(q: Filters): q is Filters & { dates: NonNullable<Filters['dates']> } {
  return q.dates !== undefined && (q.dates.from !== undefined || q.dates.to !== undefined);
}

/** A date range a customer's own index (a few hundred jobs) or the sort's index serves better than the range's. */
function datedRouteApplies(q: ListJobsQuery): boolean {
  return ranged(q) && q.customerId === undefined && !rangeInSortOrder(q);
}

/** The page query: filters, then (for a following page) the keyset bound, in the sort's index order or the range's. */
export function listJobsSql(q: ListJobsQuery, after: unknown[] | null = null, dialect: Store['dialect'] = 'sqlite', route: ListRoute = 'sorted'): ListSql {
  const dated = route === 'dated' && datedRouteApplies(q);
  // On the sorted route a date range is checked on each row, never read through a date index (SQLite only: PostgreSQL has no `+column`).
  const { where, order, columns, pinned } = listParts(q, after, dialect, dated || dialect !== 'sqlite' || !datedRouteApplies(q));
  const select = `SELECT ${SUMMARY_COLUMNS}, j.customer_key`;
  if (dated) {
    const index = dialect === 'sqlite' ? `jobs j INDEXED BY ${DATED_INDEX[q.dates!.field]}` : 'jobs j';
    const ids = `SELECT j.id FROM ${index} ${whereOf(where)} ORDER BY ${order} LIMIT ? OFFSET ?`;
    return { sql: `${select} FROM ${JOB_FROM} WHERE j.id IN (${ids}) ORDER BY ${order}`, params: where.params, columns };
  }
  const from = pinned ? JOB_FROM.replace('jobs j', 'jobs j INDEXED BY jobs_archived') : JOB_FROM;
  return { sql: `${select} FROM ${from} ${whereOf(where)} ORDER BY ${order} LIMIT ? OFFSET ?`, params: where.params, columns };
}

/**
 * Rows of the sort's index the probe reads to see how densely the range's jobs lie in the sort's order: a
 * short probe first, a longer one only when the short one found too few (a range far along the sort's order).
 */
export const PROBE_ROWS = [500, 5_000] as const;

/**
 * The sorted route is taken when, at the density a probe found, the page lies within this many times the rows
 * it read: a row of the table costs about what fifty entries of a dated index do, and a wide range has more.
 */
export const PROBE_REACH = 4;

/** How many of the next `rows` jobs of the sorted route (the same index, filters and keyset bound) fall in the date range. */
export function probeSql(q: ListJobsQuery, after: unknown[] | null, dialect: Store['dialect'] = 'sqlite', rows: number = PROBE_ROWS[0]): { sql: string; params: unknown[] } {
  const { where, order, pinned } = listParts({ ...q, dates: undefined }, after, dialect, true);
  const range = jobFilter({ dates: q.dates }, '');
  const from = pinned ? 'jobs j INDEXED BY jobs_archived' : 'jobs j';
  const column = dateColumn[q.dates!.field];
  const next = `SELECT j.${column} FROM ${from} ${whereOf(where)} ORDER BY ${order} LIMIT ${rows}`;
  return { sql: `SELECT count(*) AS n FROM (${next}) AS probe ${whereOf(range)}`, params: [...where.params, ...range.params] };
}

/**
 * The route of a page (see ListRoute). The dated route when the count read the whole range (it holds no more
 * than RANGE_READ jobs) or when no probe puts the page within PROBE_REACH times its rows; else the sorted route.
 */
export function routeOf(store: Store, q: ListJobsQuery, after: unknown[] | null, counted: { totalAtLeast: boolean },
  probes: readonly number[] = PROBE_ROWS): ListRoute {
  if (!datedRouteApplies(q)) return 'sorted';
  if (!counted.totalAtLeast) return 'dated';
  for (const rows of probes) {
    const probe = probeSql(q, after, store.dialect, rows);
    const { n } = store.sql(probe.sql).get(...probe.params) as { n: number };
    if (n * PROBE_REACH > q.offset + q.limit) return 'sorted';
  }
  return 'dated';
}

/**
 * Past this many jobs a customer's date range stops counting: a date filter has no count kept by triggers. The
 * list says "10000+ jobs" and pages on by its keys, which cost the same on any page.
 */
export const COUNT_CAP = 10_000;

/**
 * Past this many jobs of a date range (whatever the other filters) the range's count stops reading its index
 * and gives the matches found so far as a lower bound: the count's time stays bounded however rare the other
 * filters are (a rare kind over a decade), and a range read whole is counted exactly.
 */
export const RANGE_READ = 20_000;

export interface CountSql {
  sql: string;
  params: unknown[];
  /** The count stops at this many + 1 matches (a customer's date range), or never (undefined). */
  cap?: number;
  /** The count stops after this many + 1 jobs of the date range (the `read` column says how many it read). */
  rangeRead?: number;
}

/**
 * How many jobs match. Status, kind and material are summed from job_counts (a few hundred rows kept by
 * triggers); a customer counts through its own index (up to COUNT_CAP + 1 within a date range), less its
 * archived jobs; a date range reads up to RANGE_READ + 1 of its jobs from its own index, which holds every
 * other filter, and counts the listed (or archived) ones among them.
 */
export function countJobsSql(q: Filters, cap = COUNT_CAP, dialect: Store['dialect'] = 'sqlite', rangeRead = RANGE_READ): CountSql {
  const archived = q.archived === true;
  if (q.customerId === undefined && !ranged(q)) {
    const where = jobFilter({ ...q, dates: undefined }, '');
    const clause = [`archived = ${archived ? 1 : 0}`, ...where.clauses].join(' AND ');
    return { sql: `SELECT coalesce(sum(n), 0) AS n FROM job_counts WHERE ${clause}`, params: where.params };
  }
  const shelf = archived ? ARCHIVED_CLAUSE.archived : ARCHIVED_CLAUSE.listed;
  if (q.customerId === undefined) {
    const range = jobFilter({ dates: q.dates });
    const others = jobFilter({ ...q, dates: undefined });
    const match = [...others.clauses, shelf].join(' AND ');
    const from = dialect === 'sqlite' ? `jobs j INDEXED BY ${DATED_INDEX[q.dates!.field]}` : 'jobs j';
    const read = `SELECT CASE WHEN ${match} THEN 1 ELSE 0 END AS m FROM ${from} WHERE ${range.clauses.join(' AND ')} LIMIT ${rangeRead + 1}`;
    return { sql: `SELECT coalesce(sum(m), 0) AS n, count(*) AS "read" FROM (${read}) AS counted`, params: [...others.params, ...range.params], rangeRead };
  }
  const where = jobFilter(q);
  const all = where.clauses.join(' AND ');
  const ofArchived = `SELECT count(*) FROM jobs j WHERE ${all} AND ${ARCHIVED_CLAUSE.archived}`;
  if (archived) return { sql: `${ofArchived.replace('count(*)', 'count(*) AS n')}`, params: where.params };
  const capped = ranged(q);
  const matching = capped ? `SELECT count(*) FROM (SELECT 1 FROM jobs j WHERE ${all} LIMIT ${cap + 1}) AS counted` : `SELECT count(*) FROM jobs j WHERE ${all}`;
  // All the customer's matching jobs through its index, less the archived ones.
  return { sql: `SELECT (${matching}) AS n, (${ofArchived}) AS archived`, params: [...where.params, ...where.params], ...(capped ? { cap } : {}) };
}

/**
 * The count's answer as the page's total. When the count stopped at the cap, at least (cap + 1 − archived)
 * listed jobs match, said as at least the cap; when it stopped reading a range, at least the matches it found.
 */
export function countedTotal(count: CountSql, row: { n: number; archived?: number; read?: number }): { total: number; totalAtLeast: boolean } {
  if (count.rangeRead !== undefined) return { total: row.n, totalAtLeast: (row.read ?? 0) > count.rangeRead };
  const atLeast = count.cap !== undefined && row.n > count.cap;
  const total = row.n - (row.archived ?? 0);
  return { total: atLeast ? Math.min(total, count.cap!) : total, totalAtLeast: atLeast };
}

/** A page of the job list with the total that matches the filters and the key to the next page. */
export function listJobs(store: Store, raw: unknown): StoreResult<JobPage> {
  const parsed = parseWith(listJobsSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const q = inShopDays(parsed.value, shopTimeZone(store));
  const after = q.after === undefined ? null : decodeCursor(q.after, sortColumns(q));
  if (q.after !== undefined && after === null) {
    return invalid([fieldError('bad-cursor', 'after', 'this page key is not from this list and sort: start again from the first page')]);
  }
  const count = countJobsSql(q, COUNT_CAP, store.dialect);
  const totals = countedTotal(count, store.sql(count.sql).get(...count.params) as { n: number; archived?: number; read?: number });
  const { sql, params, columns } = listJobsSql(q, after, store.dialect, routeOf(store, q, after, totals));
  const rows = store.sql(sql).all(...params, q.limit + 1, q.offset) as (JobRow & { customer_key: string })[];
  const more = rows.length > q.limit;
  const page = more ? rows.slice(0, q.limit) : rows;
  const next = more ? cursorOf(page[page.length - 1] as unknown as Record<string, unknown>, columns) : null;
  return success({ jobs: page.map((r) => toSummary(r)), ...totals, limit: q.limit, offset: q.offset, next });
}
