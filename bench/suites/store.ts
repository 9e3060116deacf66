import Database from 'better-sqlite3';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { JobShape } from '../../core/api/store';
import type { Store } from '../../db';
import { findJobs, listJobs, openStore } from '../../db';
import { checkSpec } from '../../db/jobs/input';
import { nearestJobs, nearestJobsByScan } from '../../db/search/similar';
import type { BenchRow, BenchSuite } from '../harness';
import { latencies } from '../harness';
import { benchQueries, benchSpec, fillWithJobs, lcg } from './store-data';

const JOBS = Number(process.env.COILWRIGHT_BENCH_JOBS ?? 100_000);

/** Writes the generated jobs through the store's own checks and write path, in one transaction. */
function generate(store: Store): number {
  const t0 = performance.now();
  fillWithJobs(store, JOBS, 20260301);
  return performance.now() - t0;
}

function askedShapes(count: number): JobShape[] {
  const random = lcg(77);
  return Array.from({ length: count }, () => {
    const checked = checkSpec(benchSpec(random), ['spec']);
    if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
    return checked.value.shape;
  });
}

const row = (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow =>
  ({ suite: 'store', name, value, unit, ...(target === undefined ? {} : { target, pass }) });

function searchRows(store: Store): BenchRow[] {
  const asked = askedShapes(400);
  for (const a of asked.slice(0, 50)) nearestJobs(store, a, 10);
  const similar = latencies((i) => nearestJobs(store, asked[i % asked.length]!, 10), asked.length);
  const scan = latencies((i) => nearestJobsByScan(store, asked[i % asked.length]!, 10), 40);
  const queries = benchQueries(lcg(5), 400);
  for (const text of benchQueries(lcg(6), 50)) findJobs(store, { text, limit: 25 });
  const text = latencies((i) => {
    const r = findJobs(store, { text: queries[i]!, limit: 25 });
    if (!r.ok) throw new Error(r.error.message);
  }, queries.length);
  const speedup = scan.p50 / similar.p50;
  return [
    row('similar jobs p95 (R*Tree + exact score, top 10)', similar.p95, 'ms', '< 10 ms', similar.p95 < 10),
    row('similar jobs p50', similar.p50, 'ms'),
    row('full-scan scoring p50 (same asks)', scan.p50, 'ms'),
    row('similar speed-up over full scan (p50)', speedup, '×', '≥ 20×', speedup >= 20),
    row('text search p95 (FTS5 prefix, bm25, top 25)', text.p95, 'ms', '< 10 ms', text.p95 < 10),
    row('text search p50', text.p50, 'ms'),
  ];
}

/** The damage check every open runs (PRAGMA quick_check), alone, on the generated store. */
function checkRows(file: string): BenchRow[] {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const times = latencies(() => {
      if (db.pragma('quick_check', { simple: true }) !== 'ok') throw new Error('the generated store fails quick_check');
    }, 5);
    const pages = db.pragma('page_count', { simple: true }) as number;
    const size = (pages * (db.pragma('page_size', { simple: true }) as number)) / 1e6;
    return [row(`PRAGMA quick_check on open, ${JOBS} jobs (${size.toFixed(0)} MB), p50 of 5`, times.p50, 'ms'),
      row('PRAGMA quick_check, max of 5', times.max, 'ms')];
  } finally {
    db.close();
  }
}

function openRows(file: string, check: 'quick' | 'none'): BenchRow[] {
  const times = latencies(() => {
    const store = openStore(file, { check });
    const page = listJobs(store, { limit: 50 });
    if (!page.ok || page.value.jobs.length !== 50) throw new Error('first page did not load');
    store.db.close();
  }, check === 'none' ? 15 : 5);
  return check === 'none'
    ? [row('open store without the damage check + first page of 50 (max of 15)', times.max, 'ms', '< 50 ms', times.max < 50)]
    : [row('open store with quick_check + first page of 50 (max of 5), as the app, web and CLI open it', times.max, 'ms')];
}

export const storeSuite: BenchSuite = {
  name: 'store',
  run(): BenchRow[] {
    const dir = mkdtempSync(join(tmpdir(), 'coilwright-bench-'));
    const file = join(dir, 'bench.db');
    try {
      const writer = openStore(file);
      const generation = generate(writer);
      writer.close();
      // Measured as the app meets it: a store opened afresh, not the connection that just wrote it.
      const store = openStore(file);
      const rows = [row(`generate ${JOBS} jobs (one transaction)`, generation / 1000, 's'), ...searchRows(store)];
      store.close();
      return [...rows, ...checkRows(file), ...openRows(file, 'none'), ...openRows(file, 'quick')];
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
