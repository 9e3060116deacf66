import { describe, expect, it } from 'vitest';
import { archiveJob, createJob, listJobs, setJobStatus } from '../../../db';
import { COUNT_CAP, countJobsSql, countedTotal, listJobsSql } from '../../../db/search/list';
import { boxSql } from '../../../db/search/similar';
import { FIND_SQL } from '../../../db/search/text';
import { listJobsSchema } from '../../../core/api/store';
import type { SqliteStore as Store } from '../../../db';
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
    const following = value(listJobs(store, { sort: 'number', limit: 4, after: page.next! }));
    expect(following.jobs.map((j) => j.number)).toEqual(['J-26-0009']);
    expect(following.next).toBeNull();
    expect(value(listJobs(store, { sort: 'customer', limit: 3 })).jobs.map((j) => j.customer!.name)).toEqual(['Abbey Locks', 'Abbey Locks', 'Abbey Locks']);
    expect(value(listJobs(store, { dates: { field: 'created', from: '2026-02-01', to: '2026-02-01' } })).total).toBe(9);
    expect(value(listJobs(store, { dates: { field: 'created', to: '2026-01-31' } })).total).toBe(0);
  });

  it('names a bad filter and a page key from another list', () => {
    expect(listJobs(tempStore(), { status: 'shipped' })).toMatchObject({ ok: false, error: { path: 'status' } });
    const store = seeded();
    const byNumber = value(listJobs(store, { sort: 'number', limit: 2 }));
    expect(listJobs(store, { sort: 'customer', after: byNumber.next! })).toMatchObject({ ok: false, error: { path: 'after', code: 'bad-cursor' } });
    expect(listJobs(store, { after: 'not a key' })).toMatchObject({ ok: false, error: { path: 'after' } });
    expect(listJobs(store, { after: byNumber.next!, offset: 2, sort: 'number' })).toMatchObject({ ok: false, error: { path: 'after' } });
  });

  it('walks every sort and filter page by page, in the same order as one long page', () => {
    const store = seeded();
    const customers = value(listJobs(store, { limit: 500 })).jobs.map((j) => j.customer!.id);
    const filters = [{}, { status: 'quoted' }, { kind: 'compression' }, { material: 'en10270-1-sh' }, { customerId: customers[0]! }];
    for (const filter of filters) {
      for (const sort of ['updated', 'number', 'customer'] as const) {
        for (const direction of ['asc', 'desc'] as const) {
          const whole = value(listJobs(store, { ...filter, sort, direction, limit: 500 }));
          const walked: string[] = [];
          let after: string | undefined;
          do {
            const page = value(listJobs(store, { ...filter, sort, direction, limit: 2, ...(after ? { after } : {}) }));
            walked.push(...page.jobs.map((j) => j.number));
            expect(page.total).toBe(whole.total);
            after = page.next ?? undefined;
          } while (after !== undefined);
          expect(walked).toEqual(whole.jobs.map((j) => j.number));
        }
      }
    }
  });

  it('walks the archived list page by page in every sort, and the default list without them', () => {
    const store = seeded();
    const all = value(listJobs(store, { sort: 'number', limit: 500 })).jobs;
    for (const j of all.filter((_j, i) => i % 2 === 0)) value(archiveJob(store, { id: j.id, archived: true }));
    for (const archived of [true, false]) {
      for (const sort of ['updated', 'number', 'customer'] as const) {
        for (const direction of ['asc', 'desc'] as const) {
          const whole = value(listJobs(store, { archived, sort, direction, limit: 500 }));
          expect(whole.total).toBe(archived ? 5 : 4);
          expect(whole.jobs.every((j) => (j.archivedAt !== null) === archived)).toBe(true);
          const walked: string[] = [];
          let after: string | undefined;
          do {
            const page = value(listJobs(store, { archived, sort, direction, limit: 2, ...(after ? { after } : {}) }));
            walked.push(...page.jobs.map((j) => j.number));
            after = page.next ?? undefined;
          } while (after !== undefined);
          expect(walked).toEqual(whole.jobs.map((j) => j.number));
        }
      }
    }
  });

  it('keeps the counted total equal to a count of the rows through status changes and renames', () => {
    const store = seeded();
    const count = (q: Record<string, unknown>) => (store.db.prepare(`SELECT count(*) AS n FROM jobs j ${
      Object.keys(q).length ? 'WHERE ' + Object.keys(q).map((k) => `j.${k} = ?`).join(' AND ') : ''}`).get(...Object.values(q)) as { n: number }).n;
    const first = value(listJobs(store, { sort: 'number', limit: 1 })).jobs[0]!;
    value(setJobStatus(store, { id: first.id, status: 'lost' }));
    for (const q of [{}, { status: 'lost' }, { status: 'draft' }, { kind: 'compression' }, { material: 'en10270-1-sh' }]) {
      expect(value(listJobs(store, q)).total).toBe(count(q));
    }
    store.db.prepare("UPDATE customers SET name = 'Zephyr Locks', name_key = 'zephyr locks' WHERE name = 'Abbey Locks'").run();
    const last = value(listJobs(store, { sort: 'customer', direction: 'desc', limit: 1 })).jobs[0]!;
    expect(last.customer!.name).toBe('Zephyr Locks');
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

  // Every sort the list offers, alone and under each filter the screen offers, first page and a following
  // page: read in index order (no TEMP B-TREE sort of the matching jobs) through the index named here.
  const intended: Record<string, Record<string, RegExp>> = {
    none: { updated: /(SCAN|SEARCH) j USING INDEX jobs_by_updated/, number: /(SCAN|SEARCH) j USING INDEX sqlite_autoindex_jobs_1/, customer: /(SCAN|SEARCH) j USING INDEX jobs_by_customer_name/ },
    status: { updated: /SEARCH j USING INDEX jobs_by_status \(status=\?/, number: /SEARCH j USING INDEX jobs_by_status_number \(status=\?/, customer: /SEARCH j USING INDEX jobs_by_status_customer \(status=\?/ },
    kind: { updated: /SEARCH j USING INDEX jobs_by_kind \(kind=\?/, number: /SEARCH j USING INDEX jobs_by_kind_number \(kind=\?/, customer: /SEARCH j USING INDEX jobs_by_kind_customer \(kind=\?/ },
    material: { updated: /SEARCH j USING INDEX jobs_by_material \(material=\?/, number: /SEARCH j USING INDEX jobs_by_material_number \(material=\?/, customer: /SEARCH j USING INDEX jobs_by_material_customer \(material=\?/ },
    customerId: { updated: /SEARCH j USING INDEX jobs_by_customer \(customer_id=\?/, number: /SEARCH j USING INDEX jobs_by_customer_number \(customer_id=\?/, customer: /SEARCH j USING INDEX jobs_by_customer_number \(customer_id=\?/ },
  };
  const filterOf: Record<string, Record<string, unknown>> = {
    none: {}, status: { status: 'quoted' }, kind: { kind: 'compression' }, material: { material: 'en10270-1-sh' }, customerId: { customerId: 1 },
  };
  for (const [filter, sorts] of Object.entries(intended)) {
    for (const [sort, index] of Object.entries(sorts)) {
      it(`sorts by ${sort} with ${filter === 'none' ? 'no filter' : `a ${filter} filter`} through its index, pages included`, () => {
        const store = seeded();
        for (const direction of ['asc', 'desc']) {
          const q = listJobsSchema.parse({ ...filterOf[filter], sort, direction });
          const first = listJobsSql(q);
          const keyset = listJobsSql(q, first.columns.map(() => 'x'));
          for (const page of [first, keyset]) {
            const detail = plan(store, page.sql, [...page.params, 50, 0]);
            expect(detail).toMatch(index);
            expect(detail).not.toMatch(/TEMP B-TREE/);
          }
        }
      });
    }
  }

  it('lists the archived jobs newest archived first through their partial index, pages included', () => {
    const store = seeded();
    for (const direction of ['asc', 'desc']) {
      const q = listJobsSchema.parse({ archived: true, direction });
      const first = listJobsSql(q);
      for (const page of [first, listJobsSql(q, first.columns.map(() => 'x'))]) {
        const detail = plan(store, page.sql, [...page.params, 50, 0]);
        expect(detail).toMatch(/(SCAN|SEARCH) j USING INDEX jobs_archived/);
        expect(detail).not.toMatch(/TEMP B-TREE/);
      }
    }
    const withStatus = listJobsSql(listJobsSchema.parse({ archived: true, status: 'quoted' }));
    expect(plan(store, withStatus.sql, [...withStatus.params, 50, 0])).toMatch(/(SCAN|SEARCH) j USING INDEX jobs_archived/);
    expect(plan(store, withStatus.sql, [...withStatus.params, 50, 0])).not.toMatch(/TEMP B-TREE/);
  });

  it('counts the archived jobs from the kept counts, and a customer\'s listed jobs through its index alone', () => {
    const store = seeded();
    const archived = countJobsSql({ archived: true, kind: 'compression' });
    expect(plan(store, archived.sql, archived.params)).toMatch(/job_counts/);
    expect(plan(store, archived.sql, archived.params)).not.toMatch(/\bj\b|jobs/);
    const byCustomer = countJobsSql({ customerId: 1 });
    const detail = plan(store, byCustomer.sql, byCustomer.params);
    expect(detail).toMatch(/SCALAR SUBQUERY 1\nSEARCH j USING COVERING INDEX jobs_by_customer/);
    expect(detail).toMatch(/SCALAR SUBQUERY 2\nSEARCH j USING INDEX jobs_by_customer/);
    expect(detail).not.toMatch(/SCAN j/);
  });

  it('counts status, kind and material from the kept counts, and a customer through its index', () => {
    const store = seeded();
    const byKind = countJobsSql({ kind: 'compression', status: 'quoted' });
    expect(plan(store, byKind.sql, byKind.params)).toMatch(/job_counts/);
    expect(plan(store, byKind.sql, byKind.params)).not.toMatch(/\bj\b|jobs/);
    const byCustomer = countJobsSql({ customerId: 1 });
    expect(plan(store, byCustomer.sql, byCustomer.params)).toMatch(/SEARCH j USING COVERING INDEX jobs_by_customer/);
  });

  it('counts a date range through its index up to a cap, and says when the total is only a lower bound', () => {
    const store = seeded();
    value(archiveJob(store, { id: value(listJobs(store, { sort: 'number', limit: 1 })).jobs[0]!.id, archived: true }));
    const range = { dates: { field: 'updated' as const, from: '2026-01-01' } };
    const exact = value(listJobs(store, range));
    expect([exact.total, exact.totalAtLeast]).toEqual([8, false]);
    const count = countJobsSql(range, 3);
    const row = store.db.prepare(count.sql).get(...count.params) as { n: number; archived: number };
    // Stopped at 4 matches, one of the 9 archived: at least 3 listed jobs.
    expect(row).toEqual({ n: 4, archived: 1 });
    expect(countedTotal(count, row)).toEqual({ total: 3, totalAtLeast: true });
    expect(COUNT_CAP).toBeGreaterThanOrEqual(1000);
    const detail = plan(store, countJobsSql(range).sql, countJobsSql(range).params);
    expect(detail).toMatch(/SEARCH j USING COVERING INDEX jobs_by_updated \(updated_at>\?\)/);
    expect(detail).toMatch(/SEARCH j USING INDEX jobs_archived/);
    expect(value(listJobs(store, { status: 'quoted' })).totalAtLeast).toBe(false);
  });

  it('pre-filters similar jobs through the R*Tree alone', () => {
    const store = seeded();
    const detail = plan(store, boxSql('compression'), [3, 1, 20, 10, 60, 30, 12, 4, 9, 2, 2, 18, 50, 8, 3.5, 1]);
    // One constraint on each of the ten box edges (d, D, L0, coils, rate: columns 0–9), and no read of the jobs table.
    expect(detail).toMatch(/^SCAN job_shape_compression VIRTUAL TABLE INDEX 2:([A-E]\d){10}$/);
    expect(detail.match(/\d(?=[A-E]|$)/g)!.sort()).toEqual(['0', '1', '2', '3', '4', '5', '6', '7', '8', '9']);
  });

  it('searches text through the FTS5 index', () => {
    const store = seeded();
    const detail = plan(store, FIND_SQL, ['"abbey"*', 25]);
    // FTS5 in rowid order, descending (idxNum flags 64 + 128 in SQLite's fts5_main.c), never its rank order
    // (flag 32, which reads every match of the word); the newest matches are then sorted by rank in SQLite.
    expect(detail).toMatch(/SCAN job_text VIRTUAL TABLE INDEX 192:M/);
    expect(detail).toMatch(/USE TEMP B-TREE FOR ORDER BY/);
    expect(detail).toMatch(/SEARCH j USING INTEGER PRIMARY KEY/);
  });
});
