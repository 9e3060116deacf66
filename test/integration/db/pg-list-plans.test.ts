import { describe, expect, it } from 'vitest';
import type { PgStore } from '../../../db';
import { listJobsSql } from '../../../db/search/list';
import { listJobsSchema } from '../../../core/api/store';
import { usePgCluster } from '../../support/pg-stores';

const pg = usePgCluster();

/** 30 000 demo jobs of 60 demo customers over ten years, as a shared store holds them (a torsion spring in a hundred), then ANALYZE. */
function seeded(): PgStore {
  const store = pg.freshStore();
  store.sql(`INSERT INTO customers (name, name_key, created_at, updated_at)
    SELECT 'Demo customer ' || n, 'demo customer ' || lpad(n::text, 3, '0'), '2014-01-01T00:00:00.000Z', '2014-01-01T00:00:00.000Z'
    FROM generate_series(1, 60) AS n`).run();
  store.sql(`INSERT INTO jobs (number, customer_id, status, spec, revision, created_at, updated_at, due_date, archived_at, kind, material,
      material_family, units, d, mean_diameter, free_length, active_coils, rate)
    SELECT 'J-' || lpad(n::text, 6, '0'), 1 + n % 60, (ARRAY['draft', 'quoted', 'ordered', 'in-production', 'done', 'lost'])[1 + n % 6], '{}', 1,
      to_char(timestamp '2014-01-01' + n * interval '3 hours', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'),
      to_char(timestamp '2014-01-02' + n * interval '3 hours', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'),
      to_char(date '2014-02-01' + n / 8, 'YYYY-MM-DD'),
      CASE WHEN n % 3 = 0 AND n < 20000 THEN to_char(timestamp '2020-01-01' + n * interval '1 hour', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') END,
      CASE WHEN n % 100 = 0 THEN 'torsion' WHEN n % 20 = 0 THEN 'extension' ELSE 'compression' END,
      (ARRAY['en10270-1-sh', 'en10270-1-dh', 'en10270-2-vdc', 'en10270-3-1.4310', 'astm-a228'])[1 + n % 5], 'patented', 'metric',
      1 + n % 7 * 0.25, 10 + n % 11, 30 + n % 13, 5 + n % 9, 2 + n % 17
    FROM generate_series(1, 30000) AS n`).run();
  store.sql('ANALYZE').run();
  return store;
}

const plan = (store: PgStore, sql: string, params: unknown[]) =>
  (store.sql(`EXPLAIN ${sql}`).all(...params) as Record<string, string>[]).map((r) => r['QUERY PLAN']).join('\n');

/** The most jobs any Sort node of the plan is estimated to sort (0 when the plan sorts nothing). */
const sortedRows = (detail: string) => Math.max(0, ...[...detail.matchAll(/Sort {2}\(cost=[\d.]+\.\.[\d.]+ rows=(\d+)/g)].map((m) => Number(m[1])));

const FILTERS: Record<string, Record<string, unknown>> = {
  none: {}, status: { status: 'quoted' }, kind: { kind: 'torsion' }, material: { material: 'en10270-1-sh' }, customerId: { customerId: 7 },
};

/**
 * The indexes whose order is each sort's: the sort's own, or the filter's index of that sort. PostgreSQL picks
 * between them by the filter's estimated share of jobs (a filter that keeps one job in six reads the sort's own
 * index and skips the others; a rare kind reads its own index); either way the page is read in order.
 */
const ORDERED_BY: Record<string, RegExp> = {
  updated: /Index Scan (Backward )?using (jobs_by_updated|jobs_by_status|jobs_by_kind|jobs_by_material|jobs_by_customer) on jobs j/,
  number: /Index Scan (Backward )?using (jobs_number_key|jobs_by_status_number|jobs_by_kind_number|jobs_by_material_number|jobs_by_customer_number) on jobs j/,
  customer: /Index Scan (Backward )?using (jobs_by_customer_name|jobs_by_status_customer|jobs_by_kind_customer|jobs_by_material_customer|jobs_by_customer_number) on jobs j/,
};

/** For the rare kind (one job in a hundred) the kind's own index of each sort. */
const RARE_KIND: Record<string, string> = { updated: 'jobs_by_kind', number: 'jobs_by_kind_number', customer: 'jobs_by_kind_customer' };

describe('job list on PostgreSQL (30 000 jobs, analysed)', () => {
  const store = () => shared ??= seeded();
  let shared: PgStore | undefined;

  it('reads every sort under every filter in the sort\'s order through an index, first and following pages, never sorting more than a page', () => {
    for (const [filter, f] of Object.entries(FILTERS)) {
      for (const sort of ['updated', 'number', 'customer']) {
        for (const direction of ['asc', 'desc']) {
          const q = listJobsSchema.parse({ ...f, sort, direction });
          const first = listJobsSql(q, null, 'postgres');
          // The following page continues after a real job from the middle of the list: the key carries PostgreSQL's types.
          const row = store().sql(`SELECT ${first.columns.map((c, i) => `${c} AS k${i}`).join(', ')} FROM jobs j ORDER BY j.id LIMIT 1 OFFSET 15000`)
            .get() as Record<string, unknown>;
          const key = first.columns.map((_c, i) => row[`k${i}`]);
          const following = listJobsSql(q, key, 'postgres');
          for (const page of [first, following]) {
            const detail = plan(store(), page.sql, [...page.params, 50, 0]);
            const what = `${filter} by ${sort} ${direction}`;
            expect(detail, what).toMatch(ORDERED_BY[sort]!);
            expect(detail, what).not.toMatch(/Seq Scan on jobs/);
            // Near the end of a list the planner may read the few jobs left in order and sort them: never more than a page.
            expect(sortedRows(detail), what).toBeLessThanOrEqual(50);
            if (filter === 'kind') expect(detail, what).toMatch(new RegExp(`using ${RARE_KIND[sort]} on jobs j`));
          }
        }
      }
    }
  }, 60_000);

  it('reads a month\'s range from its dated index and sorts only that month\'s jobs; a decade never scans the table', () => {
    for (const [filter, f] of Object.entries(FILTERS)) {
      for (const sort of ['updated', 'number', 'customer']) {
        const month = listJobsSql(listJobsSchema.parse({ ...f, sort, dates: { field: 'created', from: '2020-03-01', to: '2020-03-31' } }), null, 'postgres');
        const detail = plan(store(), month.sql, [...month.params, 50, 0]);
        expect(detail, `${filter} by ${sort}, a month`).toMatch(/Index (Only )?Scan using jobs_dated_created on jobs j|Bitmap Index Scan on jobs_dated_created/);
        const decade = listJobsSql(listJobsSchema.parse({ ...f, sort, dates: { field: 'due', from: '2014-01-01', to: '2023-12-31' } }), null, 'postgres');
        expect(plan(store(), decade.sql, [...decade.params, 50, 0]), `${filter} by ${sort}, a decade`).not.toMatch(/Seq Scan on jobs/);
      }
    }
  }, 60_000);
});
