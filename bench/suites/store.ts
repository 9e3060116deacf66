import Database from 'better-sqlite3';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { JobShape, ListJobsInput } from '../../core/api/store';
import type { SqliteStore, Store } from '../../db';
import { isSqliteStore } from '../../db';
import { CHECK_BEFORE_OPEN_MAX_BYTES, findJobs, listJobs, openStore, storeBytes } from '../../db';
import { openShopStore } from '../../service/host/first-run';
import { checkSpec } from '../../db/jobs/input';
import { nearestJobs, scanSql } from '../../db/search/similar';
import { distance } from '../../db/search/similarity';
import type { BenchRow, BenchSuite } from '../harness';
import { latencies } from '../harness';
import { exchangeRows } from './exchange';
import { GENERATION_BATCH, benchQueries, compressionSpec, extensionSpec, fillWithJobs, lcg, oneWordQueries, torsionSpec } from './store-data';

const makers = { compression: compressionSpec, extension: extensionSpec, torsion: torsionSpec };

function askedShapes(kind: keyof typeof makers, count: number): JobShape[] {
  const random = lcg(77);
  return Array.from({ length: count }, () => {
    const checked = checkSpec(makers[kind](random), ['spec']);
    if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
    return checked.value.shape;
  });
}

function rowMaker(suite: string) {
  return (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow =>
    ({ suite, name, value, unit, ...(target === undefined ? {} : { target, pass }) });
}

type Row = ReturnType<typeof rowMaker>;

const SHAPE_KEYS = ['id', 'wireDiameter', 'meanDiameter', 'freeLength', 'activeCoils', 'rate', 'material', 'materialFamily'] as const;

/**
 * The honest baseline for the similar-jobs search: every row of the kind's shape table read as a plain
 * array (no row objects), scored into one reused point, the best `limit` kept in a small sorted list as
 * the scan goes (no sort of every job).
 */
function plainScan(given: Store, asked: JobShape, limit: number): { id: number; distance: number }[] {
  if (!isSqliteStore(given)) throw new Error('the plain scan reads a SQLite store');
  const store: SqliteStore = given;
  const best: { id: number; distance: number }[] = [];
  const point: Record<string, unknown> = {};
  for (const values of store.sql(scanSql(asked.kind as 'compression')).raw(true).iterate() as Iterable<unknown[]>) {
    for (let k = 0; k < SHAPE_KEYS.length; k++) point[SHAPE_KEYS[k]!] = values[k];
    const dist = distance(asked, point as unknown as Parameters<typeof distance>[1]);
    if (best.length === limit && dist >= best[limit - 1]!.distance) continue;
    let at = best.length;
    while (at > 0 && (best[at - 1]!.distance > dist || (best[at - 1]!.distance === dist && best[at - 1]!.id > (values[0] as number)))) at--;
    best.splice(at, 0, { id: values[0] as number, distance: dist });
    if (best.length > limit) best.pop();
  }
  store.sql(scanSql(asked.kind as 'compression')).raw(false);
  return best;
}

/** The plain scan must find what the search finds, or the comparison is of unlike work. */
function sameNearest(store: Store, asked: JobShape): void {
  const a = plainScan(store, asked, 10).map((s) => s.id);
  const b = nearestJobs(store, asked, 10).map((s) => s.id);
  if (a.join() !== b.join()) throw new Error(`the plain scan found ${a.join()} where the search found ${b.join()}`);
}

function similarRows(store: Store, row: Row): BenchRow[] {
  const rows: BenchRow[] = [];
  for (const kind of Object.keys(makers) as (keyof typeof makers)[]) {
    const asked = askedShapes(kind, 200);
    for (const a of asked.slice(0, 20)) nearestJobs(store, a, 10);
    const t = latencies((i) => nearestJobs(store, asked[i]!, 10), asked.length);
    rows.push(row(`similar jobs p95, ${kind} (R*Tree by kind + exact score, top 10)`, t.p95, 'ms', '< 10 ms', t.p95 < 10));
    if (kind === 'compression') {
      for (const a of asked.slice(0, 5)) sameNearest(store, a);
      const scan = latencies((i) => plainScan(store, asked[i]!, 10), 20);
      rows.push(row('plain scan of the shape table p50, compression (raw rows, top 10 kept as it goes; same asks)', scan.p50, 'ms'));
      rows.push(row('similar speed-up over the plain scan (p50)', scan.p50 / t.p50, '×', '≥ 20×', scan.p50 / t.p50 >= 20));
    }
  }
  return rows;
}

function textRows(store: Store, row: Row): BenchRow[] {
  const timed = (queries: string[]) => latencies((i) => {
    const r = findJobs(store, { text: queries[i]!, limit: 25 });
    if (!r.ok) throw new Error(r.error.message);
  }, queries.length);
  for (const text of benchQueries(lcg(6), 50)) findJobs(store, { text, limit: 25 });
  const words = timed(benchQueries(lcg(5), 400));
  const one = timed(oneWordQueries(lcg(8), 400));
  return [
    row('text search p95, 1–3 words (FTS5 prefix, bm25, top 25)', words.p95, 'ms', '< 10 ms', words.p95 < 10),
    row('text search p95, one word as typed (1–4 characters)', one.p95, 'ms', '< 10 ms', one.p95 < 10),
  ];
}

/** The filters the job list offers, one at a time and kind with material, with each sort. */
function listCases(store: Store): Array<[string, ListJobsInput]> {
  const someCustomer = listJobs(store, { limit: 1 });
  const customerId = someCustomer.ok ? someCustomer.value.jobs[0]?.customer?.id : undefined;
  const filters: Array<[string, ListJobsInput]> = [
    ['all', {}], ['status', { status: 'quoted' }], ['rarest kind', { kind: 'torsion' }],
    ['material', { material: 'en10270-1-dh' }], ['kind + material', { kind: 'compression', material: 'astm-a228' }],
    ...(customerId === undefined ? [] : [['customer', { customerId }] as [string, ListJobsInput]]),
    ['updated since a date', { dates: { field: 'updated', from: '2000-01-01' } }],
    ['created in a date range', { dates: { field: 'created', from: '2000-01-01', to: '2099-12-31' } }],
    ['status + updated since a date', { status: 'quoted', dates: { field: 'updated', from: '2000-01-01' } }],
    ['archived', { archived: true }],
  ];
  const cases: Array<[string, ListJobsInput]> = [];
  for (const [name, filter] of filters) {
    for (const sort of ['updated', 'number', 'customer'] as const) cases.push([`${name}, by ${sort}`, { ...filter, sort }]);
  }
  cases.push(['all, by updated, oldest first', { sort: 'updated', direction: 'asc' }], ['all, by number, descending', { sort: 'number', direction: 'desc' }]);
  return cases;
}

/**
 * Date ranges a user picks on a store of twenty years (BENCH_NOW is 2026-03-20): this month, last year, one
 * month ten years back, a decade.
 */
const DATE_RANGES = [
  ['this month', '2026-03-01', '2026-03-31'], ['last year', '2025-01-01', '2025-12-31'],
  ['a month ten years ago', '2016-03-01', '2016-03-31'], ['a decade', '2010-01-01', '2019-12-31'],
] as const;

/**
 * Each date range on each date field, with each sort in both directions; on the created date also with a
 * status, the rarest kind, and on the archived list.
 */
function dateCases(): Array<[string, ListJobsInput]> {
  const cases: Array<[string, ListJobsInput]> = [];
  const filters: Array<[string, 'created' | 'updated' | 'due', ListJobsInput]> = [
    ['created', 'created', {}], ['due', 'due', {}], ['updated', 'updated', {}],
    ['status + created', 'created', { status: 'quoted' }], ['rarest kind + created', 'created', { kind: 'torsion' }],
    ['archived + created', 'created', { archived: true }],
  ];
  for (const [name, field, filter] of filters) {
    for (const [range, from, to] of DATE_RANGES) {
      for (const sort of ['updated', 'number', 'customer'] as const) {
        for (const direction of ['asc', 'desc'] as const) {
          cases.push([`${name} ${range}, by ${sort} ${direction}`, { ...filter, dates: { field, from, to }, sort, direction }]);
        }
      }
    }
  }
  return cases;
}

/** COILWRIGHT_BENCH_LIST=<regular expression> keeps the list cases whose name it matches (e.g. "^created a decade"). */
function chosenCases(cases: Array<[string, ListJobsInput]>): Array<[string, ListJobsInput]> {
  const only = process.env.COILWRIGHT_BENCH_LIST;
  return only ? cases.filter(([name]) => new RegExp(only).test(name)) : cases;
}

/** Samples of ten pages each per list case: COILWRIGHT_BENCH_LIST_ROUNDS, 10 unless set (fewer for slow builds). */
const listRounds = (): number => Number(process.env.COILWRIGHT_BENCH_LIST_ROUNDS ?? 10);

function listRows(store: Store, row: Row): BenchRow[] {
  let worst = { name: '', p95: 0 };
  const rows: BenchRow[] = [];
  for (const [name, input] of chosenCases([...listCases(store), ...dateCases()])) {
    // The first page, then ten pages on by the keys each page hands back, as the screen pages.
    const t = latencies(() => {
      let after: string | undefined;
      for (let p = 0; p < 10; p++) {
        const page = listJobs(store, { ...input, limit: 50, ...(after ? { after } : {}) });
        if (!page.ok) throw new Error(page.error.message);
        if (page.value.next === null) break;
        after = page.value.next;
      }
    }, listRounds());
    const perPage = t.p95 / 10;
    rows.push(row(`job list page p95, ${name}`, perPage, 'ms'));
    if (perPage > worst.p95) worst = { name, p95: perPage };
  }
  return [row(`job list: slowest sort or filter page p95 (${worst.name})`, worst.p95, 'ms', '< 50 ms', worst.p95 < 50), ...rows];
}

/** The damage check every open runs (PRAGMA quick_check), alone, on the generated store. */
function checkRows(file: string, jobs: number, row: Row): BenchRow[] {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const times = latencies(() => {
      if (db.pragma('quick_check', { simple: true }) !== 'ok') throw new Error('the generated store fails quick_check');
    }, 5);
    const size = ((db.pragma('page_count', { simple: true }) as number) * (db.pragma('page_size', { simple: true }) as number)) / 1e6;
    return [row(`PRAGMA quick_check on open, ${jobs} jobs (${size.toFixed(0)} MB), p50 of 5`, times.p50, 'ms')];
  } finally {
    db.close();
  }
}

/** Opening and the first page, without the damage check and with it, as the app, web and CLI open a store. */
function openRows(file: string, row: Row): BenchRow[] {
  const opened = (check: 'quick' | 'none', count: number) => latencies(() => {
    const store = openStore(file, { check });
    const page = listJobs(store, { limit: 50 });
    if (!page.ok || page.value.jobs.length !== 50) throw new Error('first page did not load');
    store.db.close();
  }, count);
  const plain = opened('none', 30);
  const checked = opened('quick', 5);
  return [
    row('open store + first page of 50 p95, without the damage check (30 opens)', plain.p95, 'ms', '< 50 ms', plain.p95 < 50),
    row('open store with quick_check + first page of 50, max of 5', checked.max, 'ms'),
  ];
}

/**
 * Opening as the app and the web transport do (service/host/first-run: the damage check's size rule), and the
 * first page. Over the rule the check runs in a worker thread after the open: each open waits for it outside
 * the timing (so checks do not pile up), and its time is a row of its own.
 */
async function appOpenRows(file: string, row: Row): Promise<BenchRow[]> {
  const opens: number[] = [];
  const checks: number[] = [];
  for (let i = 0; i < 10; i++) {
    const t0 = performance.now();
    const opened = openShopStore(file);
    if (!opened.ok) throw new Error(opened.error.message);
    const store = opened.value.store;
    const page = listJobs(store, { limit: 50 });
    if (!page.ok || page.value.jobs.length !== 50) throw new Error('first page did not load');
    opens.push(performance.now() - t0);
    const check = await store.damageCheck.settled();
    checks.push(performance.now() - t0);
    store.close();
    if (check.state !== 'passed') throw new Error(`the generated store's damage check did not pass: ${JSON.stringify(check)}`);
  }
  const p95 = [...opens].sort((a, b) => a - b)[Math.floor(0.95 * opens.length)]!;
  const checked = [...checks].sort((a, b) => a - b)[Math.floor(0.5 * checks.length)]!;
  const deferred = storeBytes(file) > CHECK_BEFORE_OPEN_MAX_BYTES;
  return [
    row(`open store as the app does (size rule: ${deferred ? 'checked after opening' : 'checked before opening'}) + first page p95 (10 opens)`,
      p95, 'ms', deferred ? '< 50 ms' : undefined, deferred ? p95 < 50 : undefined),
    row('damage check passed, from the app\'s open, p50 of 10', checked, 'ms'),
  ];
}

/**
 * Where the generated store lives. With COILWRIGHT_BENCH_KEEP=<folder> it is kept there between runs
 * (store-<jobs>.db) and generated only when missing, so the measurements of a million-job store can be
 * repeated without its generation; otherwise it is generated afresh into a temporary folder.
 */
function generatedStore(dir: string, jobs: number, row: Row): { file: string; rows: BenchRow[] } {
  const keep = process.env.COILWRIGHT_BENCH_KEEP;
  const file = keep ? join(keep, `store-${jobs}.db`) : join(dir, 'bench.db');
  if (keep && existsSync(file)) {
    const store = openStore(file, { check: 'none' });
    const n = (store.sql('SELECT count(*) AS n FROM jobs').get() as { n: number }).n;
    store.close();
    if (n !== jobs) throw new Error(`${file} holds ${n} jobs, not ${jobs}: remove it to generate it again`);
    return { file, rows: [] };
  }
  if (keep) mkdirSync(keep, { recursive: true });
  const writer = openStore(file);
  const t0 = performance.now();
  fillWithJobs(writer, jobs, 20260301);
  const generation = (performance.now() - t0) / 1000;
  writer.close();
  return { file, rows: [row(`generate ${jobs} jobs (${GENERATION_BATCH} a commit)`, generation, 's')] };
}

/** The store suite at one size: generated through the store's own write path, then measured afresh. */
export function storeSuiteOf(name: string, jobs: number, onlyWhenAsked = false): BenchSuite {
  const row = rowMaker(name);
  return {
    name,
    onlyWhenAsked,
    async run(): Promise<BenchRow[]> {
      const dir = mkdtempSync(join(tmpdir(), 'coilwright-bench-'));
      try {
        const { file, rows } = generatedStore(dir, jobs, row);
        // COILWRIGHT_BENCH_ONLY=list measures the job list alone (with COILWRIGHT_BENCH_LIST, some of its cases).
        const listOnly = process.env.COILWRIGHT_BENCH_ONLY === 'list';
        // Measured as the app meets it: a store opened afresh, not the connection that just wrote it.
        if (!listOnly) rows.push(...checkRows(file, jobs, row), ...openRows(file, row), ...await appOpenRows(file, row));
        const store = openStore(file);
        rows.push(...listRows(store, row));
        if (!listOnly) rows.push(...textRows(store, row), ...similarRows(store, row));
        store.close();
        if (!listOnly) rows.push(...await exchangeRows(file, dir, jobs, row));
        return rows;
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}

export const storeSuite = storeSuiteOf('store', Number(process.env.COILWRIGHT_BENCH_JOBS ?? 100_000));
export const storeMillionSuite = storeSuiteOf('store-1m', 1_000_000, true);
