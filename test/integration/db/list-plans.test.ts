import { describe, expect, it } from 'vitest';
import { archiveJob, createJob, listJobs, setJobStatus } from '../../../db';
import type { ListRoute } from '../../../db/search/list';
import { COUNT_CAP, DATED_INDEX, RANGE_READ, countJobsSql, countedTotal, cursorOf, listJobsSql, probeSql, routeOf } from '../../../db/search/list';
import { boxSql } from '../../../db/search/similar';
import { FIND_SQL } from '../../../db/search/text';
import type { ListJobsInput } from '../../../core/api/store';
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

  // sqlite_stat1 of the bench's million-job store (bench/suites/store-data.ts: twenty years, many due dates a
  // day) after ANALYZE, as PRAGMA optimize leaves a shop's store: the plans must hold under statistics too.
  const MILLION_STATS: [string, string][] = [
    ['jobs_archived', '377800 1 1'], ['jobs_by_customer', '1000000 834 1 1'], ['jobs_by_customer_name', '1000000 834 1'],
    ['jobs_by_customer_number', '1000000 834 1'], ['jobs_by_kind', '1000000 333334 1 1'], ['jobs_by_kind_customer', '1000000 333334 278 1'],
    ['jobs_by_kind_number', '1000000 333334 1'], ['jobs_by_material', '1000000 200000 1 1'],
    ['jobs_by_material_customer', '1000000 200000 167 1'], ['jobs_by_material_number', '1000000 200000 1'],
    ['jobs_by_shape_engine', '1000000 1000000'], ['jobs_by_status', '1000000 166667 1 1'], ['jobs_by_status_customer', '1000000 166667 154 1'],
    ['jobs_by_status_number', '1000000 166667 1'], ['jobs_by_updated', '1000000 1 1'], ['jobs_dated_created', '1000000 1 1 1 1 1 1 1 1 1'],
    ['jobs_dated_due', '857060 117 3 3 3 3 1 1 1 1'], ['jobs_dated_updated', '1000000 1 1 1 1 1 1 1 1'], ['sqlite_autoindex_jobs_1', '1000000 1'],
  ];

  it('keeps every sort and filter on its index under a million-job store\'s statistics, dated indexes only for a range', () => {
    const store = seeded();
    store.db.exec('ANALYZE');
    store.db.exec("DELETE FROM sqlite_stat1 WHERE tbl = 'jobs'");
    const put = store.db.prepare("INSERT INTO sqlite_stat1 (tbl, idx, stat) VALUES ('jobs', ?, ?)");
    for (const [idx, stat] of MILLION_STATS) put.run(idx, stat);
    store.db.exec('ANALYZE sqlite_schema');
    for (const [filter, sorts] of Object.entries(intended)) {
      for (const [sort, index] of Object.entries(sorts)) {
        for (const direction of ['asc', 'desc']) {
          for (const dates of [undefined, { field: 'due', from: '2010-01-01', to: '2019-12-31' }, { field: 'created', from: '2025-01-01' }]) {
            const q = listJobsSchema.parse({ ...filterOf[filter], sort, direction, ...(dates ? { dates } : {}) });
            const first = listJobsSql(q, null, 'sqlite', 'sorted');
            for (const page of [first, listJobsSql(q, first.columns.map(() => 'x'), 'sqlite', 'sorted')]) {
              const detail = plan(store, page.sql, [...page.params, 50, 0]);
              expect(detail, JSON.stringify(q)).toMatch(index);
              expect(detail, JSON.stringify(q)).not.toMatch(/TEMP B-TREE|jobs_dated/);
            }
            if (dates === undefined || filter === 'customerId') continue;
            const dated = listJobsSql(q, null, 'sqlite', 'dated');
            expect(plan(store, dated.sql, [...dated.params, 50, 0])).toMatch(new RegExp(`SEARCH j USING COVERING INDEX ${DATED_INDEX[q.dates!.field]}`));
          }
        }
      }
    }
  });

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
    // Read 4 jobs of the range (up to RANGE_READ + 1, here 3 + 1): the archived one among them, 3 listed.
    const count = countJobsSql(range, COUNT_CAP, 'sqlite', 3);
    const row = store.db.prepare(count.sql).get(...count.params) as { n: number; read: number };
    expect(row).toEqual({ n: 3, read: 4 });
    expect(countedTotal(count, row)).toEqual({ total: 3, totalAtLeast: true });
    expect(RANGE_READ).toBeGreaterThanOrEqual(COUNT_CAP);
    const archivedCount = countJobsSql({ ...range, archived: true });
    expect(store.db.prepare(archivedCount.sql).get(...archivedCount.params)).toEqual({ n: 1, read: 9 });
    expect(value(listJobs(store, { ...range, archived: true }))).toMatchObject({ total: 1, totalAtLeast: false });
    // A customer's range stops counting at the cap.
    const customer = value(listJobs(store, { limit: 1 })).jobs[0]!.customer!.id;
    const byCustomer = countJobsSql({ ...range, customerId: customer }, 1);
    expect(countedTotal(byCustomer, store.db.prepare(byCustomer.sql).get(...byCustomer.params) as { n: number; archived: number })).toEqual({ total: 1, totalAtLeast: true });
    for (const [field, column] of [['updated', 'updated_at'], ['created', 'created_at'], ['due', 'due_date']] as const) {
      for (const q of [{}, { status: 'quoted' as const, kind: 'compression' }, { archived: true }]) {
        const counted = countJobsSql({ ...q, dates: { field, from: '2026-01-01', to: '2026-12-31' } });
        const detail = plan(store, counted.sql, counted.params);
        // The range's own index holds every filter: the count never reads a job's row.
        expect(detail).toMatch(new RegExp(`SEARCH j USING COVERING INDEX ${DATED_INDEX[field]} \\(${column}>\\? AND ${column}<\\?\\)`));
        expect(detail).not.toMatch(/SCAN j\b|jobs_archived|jobs_by_/);
      }
    }
    expect(value(listJobs(store, { status: 'quoted' })).totalAtLeast).toBe(false);
  });

  it('pre-filters similar jobs through the R*Tree alone', () => {
    const store = seeded();
    const detail = plan(store, boxSql('compression'), [9, 8, 1, 0, 2, 1, 3, 2, 4, 3]);
    // One constraint on each of the ten box edges (five mixed coordinates: columns 0–9), and no read of the jobs table.
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

/**
 * Jobs created over three years, two a month; last saved days later (out of created order, several saved at
 * the same moment, so ties fall to the id); due three weeks on (none on one in five); one in four quoted, the
 * rest done; one in six archived.
 */
function datedStore(): Store {
  const store = tempStore(steppingClock(Date.parse('2026-03-20T00:00:00Z')));
  const names = ['Cobb Valves', 'Abbey Locks', 'Brent Pumps'];
  const day = 86_400_000;
  for (let i = 0; i < 72; i++) {
    const created = Date.UTC(2023, 3 + Math.floor(i / 2), 1 + (i % 2) * 14, 9);
    const updated = i % 8 === 0 ? '2025-06-01T00:00:00.000Z' : new Date(created + ((i * 7) % 30) * day).toISOString();
    const dueDate = i % 5 === 0 ? null : new Date(created + 21 * day).toISOString().slice(0, 10);
    const fields = { customer: { name: names[i % 3] }, partNumber: `P-${i}`, status: i % 4 === 1 ? 'quoted' : 'done', dueDate };
    const made = value(createJob(store, job(fields, { freeLength: 40 + (i % 9) }), { createdAt: new Date(created).toISOString(), updatedAt: updated }));
    if (i % 6 === 0) value(archiveJob(store, { id: made.id, archived: true }));
  }
  return store;
}

const FIELDS = [['created', 'created_at'], ['due', 'due_date'], ['updated', 'updated_at']] as const;
const RANGES = [{ from: '2023-06-01', to: '2024-05-31' }, { from: '2025-01-01', to: '2025-01-31' }, { from: '2024-11-01' }];
const DATED_FILTERS: ListJobsInput[] = [{}, { status: 'quoted' }, { kind: 'compression', status: ['done', 'quoted'] }, { archived: true }];

/** Every page of a query read by one route, four jobs a page, following each page's key. */
function walk(store: Store, input: ListJobsInput, route: ListRoute): string[] {
  const numbers: string[] = [];
  let after: unknown[] | null = null;
  for (;;) {
    const { sql, params, columns } = listJobsSql(listJobsSchema.parse({ ...input, limit: 4 }), after, 'sqlite', route);
    const rows = store.db.prepare(sql).all(...params, 5, 0) as Record<string, unknown>[];
    numbers.push(...rows.slice(0, 4).map((r) => r.number as string));
    if (rows.length <= 4) return numbers;
    after = JSON.parse(Buffer.from(cursorOf(rows[3]!, columns), 'base64url').toString('utf8')) as unknown[];
  }
}

describe('date ranges', () => {
  it('gives the same pages, in the same order, by either route and through listJobs', () => {
    const store = datedStore();
    let found = 0;
    for (const [field] of FIELDS) {
      for (const range of RANGES) {
        for (const filter of DATED_FILTERS) {
          for (const sort of ['updated', 'number', 'customer'] as const) {
            for (const direction of ['asc', 'desc'] as const) {
              const input: ListJobsInput = { ...filter, dates: { field, ...range }, sort, direction };
              const whole = value(listJobs(store, { ...input, limit: 500 }));
              const expected = whole.jobs.map((j) => j.number);
              const label = JSON.stringify(input);
              if (expected.length > 0) found += 1;
              expect(walk(store, input, 'sorted'), label).toEqual(expected);
              expect(walk(store, input, 'dated'), label).toEqual(expected);
              const walked: string[] = [];
              let after: string | undefined;
              do {
                const page = value(listJobs(store, { ...input, limit: 3, ...(after ? { after } : {}) }));
                expect(page.total, label).toBe(whole.total);
                walked.push(...page.jobs.map((j) => j.number));
                after = page.next ?? undefined;
              } while (after !== undefined);
              expect(walked, label).toEqual(expected);
            }
          }
        }
      }
    }
    // Quoted jobs in January 2025 are none; nearly every other case lists some.
    expect(found).toBeGreaterThan(180);
  });

  it('reads the dated route from the range\'s own index and only the page\'s rows from the table, pages included', () => {
    const store = datedStore();
    for (const [field, column] of FIELDS) {
      for (const filter of DATED_FILTERS) {
        for (const sort of ['updated', 'number', 'customer'] as const) {
          for (const direction of ['asc', 'desc'] as const) {
            const q = listJobsSchema.parse({ ...filter, dates: { field, from: '2024-01-01', to: '2024-12-31' }, sort, direction });
            const first = listJobsSql(q, null, 'sqlite', 'dated');
            for (const page of [first, listJobsSql(q, first.columns.map(() => 'x'), 'sqlite', 'dated')]) {
              const detail = plan(store, page.sql, [...page.params, 50, 0]);
              if (field === 'updated' && sort === 'updated' && filter.archived !== true) {
                // The range is on the sort's own key: its index reads the range in order, whatever the route.
                expect(detail).toMatch(/SEARCH j USING INDEX jobs_by_(updated|status) \((status=\? AND )?updated_at>\? AND updated_at<\?\)|jobs_by_kind|jobs_by_status/);
                expect(detail).not.toMatch(/TEMP B-TREE|jobs_dated/);
                continue;
              }
              expect(detail, JSON.stringify(q)).toMatch(new RegExp(`SEARCH j USING COVERING INDEX ${DATED_INDEX[field]} \\(${column}>\\? AND ${column}<\\?\\)`));
              expect(detail).toMatch(/SEARCH j USING INTEGER PRIMARY KEY \(rowid=\?\)/);
              expect(detail).not.toMatch(/SCAN j\b/);
            }
          }
        }
      }
    }
  });

  it('reads the sorted route through the sort\'s index as without a date range, the date checked on the row', () => {
    const store = datedStore();
    const sortIndex = { updated: /jobs_by_updated|jobs_by_status \(status=\?|jobs_by_kind \(kind=\?/, number: /sqlite_autoindex_jobs_1|jobs_by_status_number|jobs_by_kind_number/, customer: /jobs_by_customer_name|jobs_by_status_customer|jobs_by_kind_customer/ };
    for (const [field] of FIELDS) {
      for (const filter of [{}, { status: 'quoted' }, { kind: 'compression' }] as ListJobsInput[]) {
        for (const sort of ['updated', 'number', 'customer'] as const) {
          for (const direction of ['asc', 'desc'] as const) {
            const q = listJobsSchema.parse({ ...filter, dates: { field, from: '2024-01-01', to: '2024-12-31' }, sort, direction });
            const first = listJobsSql(q, null, 'sqlite', 'sorted');
            for (const page of [first, listJobsSql(q, first.columns.map(() => 'x'), 'sqlite', 'sorted')]) {
              const detail = plan(store, page.sql, [...page.params, 50, 0]);
              expect(detail, JSON.stringify(q)).toMatch(sortIndex[sort]);
              expect(detail).not.toMatch(/TEMP B-TREE|jobs_dated/);
            }
            const probe = probeSql(q, null);
            const probed = plan(store, probe.sql, probe.params);
            expect(probed, JSON.stringify(q)).toMatch(sortIndex[sort]);
            expect(probed).not.toMatch(/TEMP B-TREE|jobs_dated/);
          }
        }
      }
    }
  });

  it('takes the dated route for a range the count read whole, or one far along the sort\'s order', () => {
    const store = datedStore();
    const q = (input: ListJobsInput) => listJobsSchema.parse({ ...input, limit: 5 });
    const firstYear = { field: 'created' as const, from: '2023-01-01', to: '2023-12-31' };
    // Four rows of the sort's index probed, then eight (the page of 5 expected within PROBE_REACH times the rows
    // at the density found): the routes a store of many thousands takes with PROBE_ROWS.
    const route = (input: ListJobsInput, counted: boolean): ListRoute => routeOf(store, q(input), null, { totalAtLeast: counted }, [4, 8]);
    expect(route({ dates: firstYear, sort: 'number' }, false)).toBe('dated');
    // Past the cap, the sorted route is kept when its next rows hold the page: the oldest numbers first.
    expect(route({ dates: firstYear, sort: 'number', direction: 'asc' }, true)).toBe('sorted');
    expect(route({ dates: firstYear, sort: 'number', direction: 'desc' }, true)).toBe('dated');
    expect(route({ dates: firstYear, sort: 'updated', direction: 'desc' }, true)).toBe('dated');
    expect(route({ dates: { field: 'created', from: '2023-01-01' }, sort: 'customer' }, true)).toBe('sorted');
    // A customer's own index and a range on the sort's key need no date index.
    expect(route({ dates: firstYear, customerId: 1 }, false)).toBe('sorted');
    expect(route({ dates: { field: 'updated', from: '2024-01-01' }, sort: 'updated' }, false)).toBe('sorted');
  });
});
