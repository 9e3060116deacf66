import type { JobPage, ListJobsQuery } from '../../core/api/store';
import { listJobsSchema } from '../../core/api/store';
import { invalid, success } from '../errors';
import type { StoreResult } from '../errors';
import type { JobRow } from '../jobs/rows';
import { JOB_FROM, SUMMARY_COLUMNS, toSummary } from '../jobs/rows';
import type { Store } from '../store';
import { parseWith } from '../../core/validation';

interface Where {
  clauses: string[];
  params: unknown[];
}

const dateColumn = { created: 'j.created_at', updated: 'j.updated_at', due: 'j.due_date' } as const;

/** Date bounds on ISO stamps: "to" includes the whole day. Due dates are plain YYYY-MM-DD. */
function dateClauses(where: Where, dates: NonNullable<ListJobsQuery['dates']>): void {
  const column = dateColumn[dates.field];
  if (dates.from) {
    where.clauses.push(`${column} >= ?`);
    where.params.push(dates.from);
  }
  if (dates.to) {
    where.clauses.push(dates.field === 'due' ? `${column} <= ?` : `${column} < ?`);
    where.params.push(dates.field === 'due' ? dates.to : `${dates.to}T99`);
  }
}

export function jobFilter(q: Pick<ListJobsQuery, 'status' | 'customerId' | 'kind' | 'material' | 'dates'>): Where {
  const where: Where = { clauses: [], params: [] };
  if (q.status !== undefined) {
    const statuses = Array.isArray(q.status) ? q.status : [q.status];
    where.clauses.push(`j.status IN (${statuses.map(() => '?').join(', ')})`);
    where.params.push(...statuses);
  }
  if (q.customerId !== undefined) {
    where.clauses.push('j.customer_id = ?');
    where.params.push(q.customerId);
  }
  if (q.kind !== undefined) {
    where.clauses.push('j.kind = ?');
    where.params.push(q.kind);
  }
  if (q.material !== undefined) {
    where.clauses.push('j.material = ?');
    where.params.push(q.material);
  }
  if (q.dates) dateClauses(where, q.dates);
  return where;
}

function orderBy(q: ListJobsQuery): string {
  const direction = q.direction ?? (q.sort === 'updated' ? 'desc' : 'asc');
  const d = direction === 'desc' ? 'DESC' : 'ASC';
  if (q.sort === 'number') return `j.number ${d}`;
  if (q.sort === 'customer') return `c.name_key ${d}, j.number ${d}`;
  return `j.updated_at ${d}, j.id ${d}`;
}

export function listJobsSql(q: ListJobsQuery): { sql: string; count: string; params: unknown[] } {
  const where = jobFilter(q);
  const clause = where.clauses.length > 0 ? `WHERE ${where.clauses.join(' AND ')}` : '';
  return {
    sql: `SELECT ${SUMMARY_COLUMNS} FROM ${JOB_FROM} ${clause} ORDER BY ${orderBy(q)} LIMIT ? OFFSET ?`,
    count: `SELECT count(*) AS n FROM jobs j ${clause}`,
    params: where.params,
  };
}

/** A page of the job list with the total that matches the filters. */
export function listJobs(store: Store, raw: unknown): StoreResult<JobPage> {
  const parsed = parseWith(listJobsSchema, raw ?? {});
  if (!parsed.ok) return invalid(parsed.errors);
  const q = parsed.value;
  const { sql, count, params } = listJobsSql(q);
  const rows = store.sql(sql).all(...params, q.limit, q.offset) as JobRow[];
  const total = (store.sql(count).get(...params) as { n: number }).n;
  return success({ jobs: rows.map((r) => toSummary(r)), total, limit: q.limit, offset: q.offset });
}
