import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import type { BenchRow, BenchSuite } from '../harness';

const ROUNDS = Number(process.env.COILWRIGHT_KILL_ROUNDS ?? 40);

/**
 * The kill -9 suite of `npm test` (test/integration/db/crash.test.ts) run longer: 5 writers killed with
 * SIGKILL ROUNDS times each, in the middle of saves, imports, quotes, backups and restores, every store
 * checked after every kill (integrity, acknowledged writes, numbers).
 */
export const crashSuite: BenchSuite = {
  name: 'crash',
  run(): BenchRow[] {
    const t0 = performance.now();
    const vitest = join(process.cwd(), 'node_modules', 'vitest', 'vitest.mjs');
    const run = spawnSync(process.execPath, [vitest, 'run', 'test/integration/db/crash.test.ts'], {
      env: { ...process.env, COILWRIGHT_KILL_ROUNDS: String(ROUNDS) }, encoding: 'utf8',
    });
    const seconds = (performance.now() - t0) / 1000;
    if (run.status !== 0) process.stderr.write(`${run.stdout}\n${run.stderr}\n`);
    const failed = run.status === 0 ? 0 : 1;
    return [
      { suite: 'crash', name: 'SIGKILLs, each followed by a full check of the store', value: 5 * ROUNDS, unit: 'kills' },
      { suite: 'crash', name: 'runs with a lost acknowledged write, a reused number or a failed check', value: failed, unit: 'runs', target: '0', pass: failed === 0 },
      { suite: 'crash', name: 'duration', value: seconds, unit: 's' },
    ];
  },
};
