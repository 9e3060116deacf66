import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { JobShape } from '../../core/api/store';
import type { Store } from '../../db';
import { copyStore, findJobs, listJobs, openPgStore, openStore } from '../../db';
import { checkSpec } from '../../db/jobs/input';
import { nearestJobs } from '../../db/search/similar';
import { SyncConnection } from '../../db/pg';
import { startPgCluster } from '../../test/support/pg-cluster';
import type { BenchRow, BenchSuite } from '../harness';
import { latencies } from '../harness';
import { benchQueries, compressionSpec, fillWithJobs, lcg, oneWordQueries } from './store-data';

const JOBS = Number(process.env.COILWRIGHT_BENCH_JOBS ?? 100_000);

const row = (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow =>
  ({ suite: 'store-pg', name, value, unit, ...(target === undefined ? {} : { target, pass }) });

function asked(count: number): JobShape[] {
  const random = lcg(77);
  return Array.from({ length: count }, () => {
    const checked = checkSpec(compressionSpec(random), ['spec']);
    if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
    return checked.value.shape;
  });
}

/** Search and list times of one store, each named with its backend so the two sit side by side. */
function searchRows(store: Store, backend: string): BenchRow[] {
  const shapes = asked(200);
  for (const a of shapes.slice(0, 20)) nearestJobs(store, a, 10);
  const similar = latencies((i) => nearestJobs(store, shapes[i]!, 10), shapes.length);
  const find = (queries: string[]) => latencies((i) => {
    const r = findJobs(store, { text: queries[i]!, limit: 25 });
    if (!r.ok) throw new Error(r.error.message);
  }, queries.length);
  for (const text of benchQueries(lcg(6), 50)) findJobs(store, { text, limit: 25 });
  const words = find(benchQueries(lcg(5), 400));
  const one = find(oneWordQueries(lcg(8), 400));
  const list = latencies(() => {
    const page = listJobs(store, { limit: 50, sort: 'customer' });
    if (!page.ok) throw new Error(page.error.message);
  }, 100);
  // The medians beside the targets: on a shared machine the p95 also measures the other programs' load.
  return [
    row(`${backend}: similar jobs p95, compression, top 10`, similar.p95, 'ms', '< 10 ms', similar.p95 < 10),
    row(`${backend}: similar jobs p50`, similar.p50, 'ms'),
    row(`${backend}: text search p95, 1–3 words, top 25`, words.p95, 'ms', '< 10 ms', words.p95 < 10),
    row(`${backend}: text search p50, 1–3 words`, words.p50, 'ms'),
    row(`${backend}: text search p95, one word as typed`, one.p95, 'ms', '< 10 ms', one.p95 < 10),
    row(`${backend}: text search p50, one word as typed`, one.p50, 'ms'),
    row(`${backend}: job list first page by customer p95`, list.p95, 'ms'),
  ];
}

/**
 * The search at JOBS jobs on PostgreSQL beside SQLite: the same generated jobs, written to SQLite by the
 * store's own write path, copied to a throwaway cluster with `db copy` (timed), then measured on both.
 */
export const storePgSuite: BenchSuite = {
  name: 'store-pg',
  onlyWhenAsked: true,
  async run(): Promise<BenchRow[]> {
    const dir = mkdtempSync(join(tmpdir(), 'coilwright-bench-'));
    const cluster = await startPgCluster();
    try {
      const file = join(dir, 'bench.db');
      const writer = openStore(file);
      fillWithJobs(writer, JOBS, 20260301);
      writer.close();
      const admin = new SyncConnection(cluster.url('postgres'));
      admin.query('CREATE DATABASE bench_shop', []);
      admin.close();
      const lite = openStore(file);
      const server = openPgStore(cluster.url('bench_shop'));
      const t0 = performance.now();
      const copied = copyStore(lite, server);
      if (!copied.ok) throw new Error(copied.error.message);
      const copySeconds = (performance.now() - t0) / 1000;
      server.sql('ANALYZE').run();
      server.sql('VACUUM').run();
      const rows = [row(`db copy of ${JOBS} jobs SQLite → PostgreSQL (one transaction, verified)`, copySeconds, 's'),
        ...searchRows(lite, 'SQLite'), ...searchRows(server, 'PostgreSQL')];
      lite.close();
      server.close();
      return rows;
    } finally {
      cluster.stop();
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
