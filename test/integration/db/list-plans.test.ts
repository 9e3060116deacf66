import { describe, expect, it } from 'vitest';
import { createJob, listJobs, setJobStatus } from '../../../db';
import { listJobsSql } from '../../../db/search/list';
import { BOX_SQL } from '../../../db/search/similar';
import { FIND_SQL } from '../../../db/search/text';
import { listJobsSchema } from '../../../core/api/store';
import type { Store } from '../../../db';
import { job, steppingClock, tempStore, value } from './helpers';

function plan(store: Store, sql: string, params: unknown[]): string {
  return (store.db.prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...params) as { detail: string }[]).map((r) => r.detail).join('\n');
}

function seeded(): Store {
  const store = tempStore(steppingClock(Date.parse('2026-02-01T00:00:00Z')));
  const names = ['Cobb Valves', 'Abbey Locks', 'Brent Pumps'];
  for (let i = 0; i < 9; i++) {
    const created = value(createJob(store, job({ customer: { name: names[i % 3] }, partNumber: `P-${i}` }, { freeLength: 40 + i })));
    if (i % 3 === 1) value(setJobStatus(store, { id: created.id, status: 'quoted' }));
  }
  return store;
}

describe('job list', () => {
  it('filters by status, customer, kind and dates and pages with a total', () => {
    const store = seeded();
    const quoted = value(listJobs(store, { status: 'quoted' }));
    expect(quoted.total).toBe(3);
    expect(quoted.jobs.map((j) => j.partNumber)).toEqual(['P-7', 'P-4', 'P-1']);
    const abbey = quoted.jobs[0]!.customer!.id;
    expect(value(listJobs(store, { customerId: abbey, status: ['draft', 'quoted'] })).total).toBe(3);
    expect(value(listJobs(store, { kind: 'torsion' })).total).toBe(0);
    const page = value(listJobs(store, { sort: 'number', limit: 4, offset: 4 }));
    expect(page.jobs.map((j) => j.number)).toEqual(['J-26-0005', 'J-26-0006', 'J-26-0007', 'J-26-0008']);
    expect(page.total).toBe(9);
    expect(value(listJobs(store, { sort: 'customer', limit: 3 })).jobs.map((j) => j.customer!.name)).toEqual(['Abbey Locks', 'Abbey Locks', 'Abbey Locks']);
    expect(value(listJobs(store, { dates: { field: 'created', from: '2026-02-01', to: '2026-02-01' } })).total).toBe(9);
    expect(value(listJobs(store, { dates: { field: 'created', to: '2026-01-31' } })).total).toBe(0);
  });

  it('names a bad filter', () => {
    expect(listJobs(tempStore(), { status: 'shipped' })).toMatchObject({ ok: false, error: { path: 'status' } });
  });
});

describe('query plans', () => {
  it('lists by status through the status index, already in order', () => {
    const store = seeded();
    const { sql, params } = listJobsSql(listJobsSchema.parse({ status: 'quoted' }));
    const detail = plan(store, sql, [...params, 50, 0]);
    expect(detail).toMatch(/SEARCH j USING INDEX jobs_by_status \(status=\?\)/);
    expect(detail).not.toMatch(/TEMP B-TREE/);
  });

  it('lists everything newest first through the updated index', () => {
    const store = seeded();
    const { sql, params } = listJobsSql(listJobsSchema.parse({}));
    expect(plan(store, sql, [...params, 50, 0])).toMatch(/SCAN j USING INDEX jobs_by_updated/);
  });

  it('pre-filters similar jobs through the R*Tree alone', () => {
    const store = seeded();
    const detail = plan(store, BOX_SQL, [3, 1, 20, 10, 60, 30, 12, 4, 9, 2, 2, 18, 50, 8, 3.5, 1]);
    // One constraint on each of the ten box edges (columns 0–9), and no read of the jobs table.
    expect(detail).toMatch(/^SCAN job_shape VIRTUAL TABLE INDEX 2:([A-E]\d){10}$/);
    expect(detail.match(/\d(?=[A-E]|$)/g)!.sort()).toEqual(['0', '1', '2', '3', '4', '5', '6', '7', '8', '9']);
  });

  it('searches text through the FTS5 index', () => {
    const store = seeded();
    const detail = plan(store, FIND_SQL, ['"abbey"*', 25]);
    expect(detail).toMatch(/SCAN job_text VIRTUAL TABLE INDEX \d+:M/);
    expect(detail).toMatch(/SEARCH j USING INTEGER PRIMARY KEY/);
  });
});
