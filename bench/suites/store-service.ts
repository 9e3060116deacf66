import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openStore } from '../../db';
import { createService, dispatch } from '../../service/api';
import type { BenchRow, BenchSuite } from '../harness';
import { compressionSpec, fillWithJobs, lcg } from './store-data';

const JOBS = Number(process.env.COILWRIGHT_BENCH_SERVICE_JOBS ?? 20_000);

/**
 * The SQLite store as the app, the web transport and the CLI reach it: through the service's handlers
 * (dispatch, the Store interface, a transaction per save), on a store of JOBS generated jobs. Run on two
 * builds side by side, it tells whether a change to the store's interface slows the SQLite path.
 */
export const storeServiceSuite: BenchSuite = {
  name: 'store-service',
  async run(): Promise<BenchRow[]> {
    const dir = mkdtempSync(join(tmpdir(), 'coilwright-bench-'));
    try {
      const file = join(dir, 'bench.db');
      const writer = openStore(file);
      fillWithJobs(writer, JOBS, 20260301);
      writer.close();
      const service = createService(openStore(file));
      const random = lcg(99);
      const call = async (method: string, input: unknown) => {
        const r = await dispatch(service.handlers, method, input);
        if (!r.ok) throw new Error(`${method}: ${r.error.message}`);
        return r.value as { id: number; revision: number };
      };
      const timed = async (count: number, fn: (i: number) => Promise<unknown>) => {
        const times: number[] = [];
        for (let i = 0; i < count; i++) {
          const t0 = performance.now();
          await fn(i);
          times.push(performance.now() - t0);
        }
        times.sort((a, b) => a - b);
        return { p50: times[Math.floor(times.length / 2)]!, p95: times[Math.floor(times.length * 0.95)]! };
      };
      const created: { id: number; revision: number }[] = [];
      const create = await timed(400, async () => created.push(await call('createJob', { partNumber: 'BENCH (demo)', spec: compressionSpec(random) })));
      const update = await timed(400, async (i) => {
        const j = created[i % created.length]!;
        const saved = await call('updateJob', { id: j.id, expectedRevision: j.revision, notes: `bench save ${i}` });
        created[i % created.length] = saved;
      });
      const read = await timed(1000, async (i) => call('getJob', { id: 1 + (i * 7919) % JOBS }));
      const list = await timed(200, async () => call('listJobs', { limit: 50 }));
      const find = await timed(200, async (i) => call('findJobs', { text: ['valve', 'Oak', 'J-26-00', 'zinc pump'][i % 4]!, limit: 25 }));
      service.close();
      const row = (name: string, value: number): BenchRow => ({ suite: 'store-service', name, value, unit: 'ms' });
      return [
        row(`createJob through the service p50 (${JOBS} jobs)`, create.p50), row('createJob p95', create.p95),
        row('updateJob (expected revision) p50', update.p50), row('updateJob p95', update.p95),
        row('getJob p50', read.p50), row('getJob p95', read.p95),
        row('listJobs first page p50', list.p50), row('findJobs p50', find.p50),
      ];
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
