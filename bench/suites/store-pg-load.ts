import { spawn } from 'node:child_process';
import type { ChildProcess } from 'node:child_process';
import type { Store } from '../../db';
import { createJob, getJob, openPgStore, updateJob } from '../../db';
import { SyncConnection } from '../../db/pg';
import { createService, dispatch } from '../../service/api';
import { startPgCluster } from '../../test/support/pg-cluster';
import type { BenchRow, BenchSuite } from '../harness';
import { compressionSpec, lcg } from './store-data';

const WRITERS = Number(process.env.COILWRIGHT_PG_WRITERS ?? 8);
const SECONDS = Number(process.env.COILWRIGHT_PG_SECONDS ?? 60);
const KILLS = Number(process.env.COILWRIGHT_PG_KILLS ?? 50);

/** One acknowledged outcome of a writer, one JSON line on its stdout. */
interface Ack { op: 'create' | 'update' | 'quote' | 'conflict' | 'error'; id?: number; number?: string; revision?: number; notes?: string; ms?: number; code?: string }

/**
 * A writer process: creates jobs, saves recent jobs on the revision it read (two writers on one job make
 * the designed conflict), and now and then issues a quote, printing each acknowledged write as it returns.
 */
export async function pgWriter(url: string, seconds: number, n: number): Promise<void> {
  const store = openPgStore(url, { author: `writer ${n}` });
  const service = createService(store);
  const random = lcg(1000 + n);
  const print = (a: Ack) => process.stdout.write(`${JSON.stringify(a)}\n`);
  const end = Date.now() + seconds * 1000;
  for (let i = 0; Date.now() < end; i++) {
    const pick = random();
    const t0 = performance.now();
    if (pick < 0.45) {
      const notes = `w${n}-${i}`;
      const r = createJob(store, { partNumber: `LOAD-${n}-${i} (demo)`, notes, spec: compressionSpec(random) });
      print(r.ok ? { op: 'create', id: r.value.id, number: r.value.number, revision: 1, notes, ms: performance.now() - t0 } : { op: 'error', code: r.error.code });
    } else if (pick < 0.95) {
      const top = (store.sql('SELECT max(id) AS m FROM jobs').get() as { m: number | null }).m ?? 0;
      if (top === 0) continue;
      const id = Math.max(1, top - Math.floor(random() * 20));
      const read = getJob(store, id);
      if (!read.ok) continue;
      const notes = `w${n}-${i}`;
      const r = updateJob(store, { id, expectedRevision: read.value.revision, notes });
      if (r.ok) print({ op: 'update', id, revision: r.value.revision, notes, ms: performance.now() - t0 });
      else print({ op: r.error.code === 'stale-revision' ? 'conflict' : 'error', code: r.error.code });
    } else {
      const top = (store.sql('SELECT max(id) AS m FROM jobs').get() as { m: number | null }).m ?? 0;
      if (top === 0) continue;
      const r = await dispatch(service.handlers, 'issueQuote', { jobId: top, accept: 'load test: problems accepted' });
      if (r.ok) print({ op: 'quote', number: (r.value as { number: string }).number, ms: performance.now() - t0 });
      else print({ op: r.error.code === 'stale-revision' ? 'conflict' : 'error', code: r.error.code });
    }
  }
  store.close();
}

function startWriter(url: string, seconds: number, n: number): { child: ChildProcess; acks: Ack[]; done: Promise<void> } {
  const child = spawn(process.execPath, [process.argv[1]!, '--pg-writer', url, String(seconds), String(n)], { stdio: ['ignore', 'pipe', 'inherit'] });
  const acks: Ack[] = [];
  let rest = '';
  child.stdout!.on('data', (chunk: Buffer) => {
    const lines = (rest + chunk.toString('utf8')).split('\n');
    rest = lines.pop()!;
    for (const line of lines) if (line.trim()) acks.push(JSON.parse(line) as Ack);
  });
  const done = new Promise<void>((resolve) => child.on('exit', () => resolve()));
  return { child, acks, done };
}

/** Gaps in a numbering: the numeric tails of every number, which should run 1..N. */
function gaps(numbers: string[]): number {
  const tails = numbers.map((s) => Number(/(\d+)$/.exec(s)?.[1] ?? NaN)).sort((a, b) => a - b);
  return tails.filter((t, i) => t !== i + 1).length;
}

/** What no crash may leave: a job without its revisions, counts or text rows out of step, a quote of a missing revision. */
function partialRows(c: SyncConnection): number {
  const n = (sql: string) => Number(c.query(sql, []).rows[0]!.n);
  return n(`SELECT count(*) AS n FROM jobs j WHERE (SELECT count(*) FROM job_revisions r WHERE r.job_id = j.id) <> j.revision`)
    + Math.abs(n('SELECT coalesce(sum(n), 0) - (SELECT count(*) FROM jobs) AS n FROM job_counts'))
    + Math.abs(n('SELECT (SELECT count(*) FROM job_text) - (SELECT count(*) FROM jobs) AS n'))
    + n(`SELECT count(*) AS n FROM quotes q WHERE NOT EXISTS (SELECT 1 FROM job_revisions r WHERE r.job_id = q.job_id AND r.revision = q.job_revision)`);
}

/** Acknowledged writes not found in the store afterwards. */
function lostWrites(c: SyncConnection, acks: Ack[]): number {
  let lost = 0;
  for (const a of acks) {
    if (a.op === 'create' && c.query('SELECT 1 FROM jobs WHERE id = $1 AND number = $2', [a.id, a.number]).rows.length === 0) lost += 1;
    if (a.op === 'update' && c.query(`SELECT 1 FROM job_revisions WHERE job_id = $1 AND revision = $2 AND fields::jsonb ->> 'notes' = $3`,
      [a.id, a.revision, a.notes]).rows.length === 0) lost += 1;
    if (a.op === 'quote' && c.query('SELECT 1 FROM quotes WHERE number = $1', [a.number]).rows.length === 0) lost += 1;
  }
  return lost;
}

const row = (name: string, value: number, unit: string, target?: string, pass?: boolean): BenchRow =>
  ({ suite: 'store-pg-load', name, value, unit, ...(target === undefined ? {} : { target, pass }) });

async function loadRows(url: string): Promise<BenchRow[]> {
  const t0 = performance.now();
  const writers = Array.from({ length: WRITERS }, (_, n) => startWriter(url, SECONDS, n));
  await Promise.all(writers.map((w) => w.done));
  const elapsed = (performance.now() - t0) / 1000;
  const acks = writers.flatMap((w) => w.acks);
  const writes = acks.filter((a) => a.op === 'create' || a.op === 'update' || a.op === 'quote');
  const ms = writes.map((a) => a.ms!).sort((a, b) => a - b);
  const c = new SyncConnection(url);
  try {
    const jobNumbers = c.query('SELECT number FROM jobs', []).rows.map((r) => String(r.number));
    const quoteNumbers = c.query('SELECT number FROM quotes', []).rows.map((r) => String(r.number));
    const lost = lostWrites(c, acks);
    const errors = acks.filter((a) => a.op === 'error');
    const numberGaps = gaps(jobNumbers) + gaps(quoteNumbers);
    const duplicates = jobNumbers.length - new Set(jobNumbers).size + quoteNumbers.length - new Set(quoteNumbers).size;
    return [
      row(`acknowledged writes per second, ${WRITERS} writer processes for ${SECONDS} s`, writes.length / elapsed, 'writes/s'),
      row('write p95 (create, save on a read revision, issue a quote)', ms[Math.floor(ms.length * 0.95)] ?? 0, 'ms'),
      row('acknowledged writes', writes.length, 'writes'),
      row('designed conflicts (a save on a revision another writer replaced)', acks.filter((a) => a.op === 'conflict').length, 'saves'),
      row(`other refusals (${[...new Set(errors.map((e) => e.code))].join(', ') || 'none'})`, errors.length, 'writes', '0', errors.length === 0),
      row('acknowledged writes lost', lost, 'writes', '0', lost === 0),
      row('duplicate job or quote numbers', duplicates, 'numbers', '0', duplicates === 0),
      row('gaps in job and quote numbering', numberGaps, 'numbers', '0', numberGaps === 0),
      row('partial jobs or quotes', partialRows(c), 'rows', '0', partialRows(c) === 0),
    ];
  } finally {
    c.close();
  }
}

async function killRows(url: string): Promise<BenchRow[]> {
  const random = lcg(4242);
  let lost = 0;
  let partial = 0;
  const acks: Ack[] = [];
  for (let k = 0; k < KILLS; k++) {
    const w = startWriter(url, 30, 100 + k);
    // Killed while writing: after its first acknowledged write, at a random moment within the next 0.4 s.
    while (w.acks.length === 0 && w.child.exitCode === null) await new Promise((r) => setTimeout(r, 5));
    await new Promise((r) => setTimeout(r, 20 + random() * 400));
    w.child.kill('SIGKILL');
    await w.done;
    acks.push(...w.acks);
    const c = new SyncConnection(url);
    try {
      lost += lostWrites(c, w.acks);
      partial += partialRows(c);
    } finally {
      c.close();
    }
  }
  const c = new SyncConnection(url);
  const numbers = c.query('SELECT number FROM jobs', []).rows.map((r) => String(r.number));
  c.close();
  return [
    row('writers killed with SIGKILL while writing', KILLS, 'kills'),
    row('acknowledged writes before the kills', acks.filter((a) => a.op !== 'conflict' && a.op !== 'error').length, 'writes'),
    row('acknowledged writes lost after a kill', lost, 'writes', '0', lost === 0),
    row('partial jobs or quotes after a kill (checked after each)', partial, 'rows', '0', partial === 0),
    row('gaps in job numbering after the kills', gaps(numbers), 'numbers', '0', gaps(numbers) === 0),
  ];
}

/** Eight writer processes against one PostgreSQL store, then writers killed mid-write: `npm run bench -- store-pg-load`. */
export const storePgLoadSuite: BenchSuite = {
  name: 'store-pg-load',
  onlyWhenAsked: true,
  async run(): Promise<BenchRow[]> {
    const cluster = await startPgCluster();
    try {
      const admin = new SyncConnection(cluster.url('postgres'));
      admin.query('CREATE DATABASE load_shop', []);
      admin.query('CREATE DATABASE kill_shop', []);
      admin.close();
      for (const name of ['load_shop', 'kill_shop']) {
        const s: Store = openPgStore(cluster.url(name));
        createJob(s, { partNumber: 'FIRST (demo)', spec: compressionSpec(lcg(1)) });
        s.close();
      }
      return [...(await loadRows(cluster.url('load_shop'))), ...(await killRows(cluster.url('kill_shop')))];
    } finally {
      cluster.stop();
    }
  },
};
