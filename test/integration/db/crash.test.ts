import { spawn } from 'node:child_process';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { openStore } from '../../../db';
import { tempDir } from './helpers';

const root = resolve(__dirname, '../../..');
const writer = join(__dirname, 'fixtures', 'writer.ts');

interface Run { begun: Set<string>; committed: Set<string>; stderr: string }

/** Runs the writer until it reports `commits` committed jobs, kills it with SIGKILL, and returns what it said. */
function runAndKill(file: string, lane: number, commits: number): Promise<Run> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, ['--import', 'tsx', writer, file, String(lane)], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
    const run: Run = { begun: new Set(), committed: new Set(), stderr: '' };
    let pending = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
      pending += chunk;
      const lines = pending.split('\n');
      pending = lines.pop()!;
      for (const line of lines) {
        const [word, part] = line.split(' ');
        if (word === 'begin') run.begun.add(part!);
        if (word === 'committed') run.committed.add(part!);
      }
      if (run.committed.size >= commits && child.exitCode === null) child.kill('SIGKILL');
    });
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => { run.stderr += chunk; });
    child.on('error', fail);
    child.on('close', (_code, signal) => (signal === 'SIGKILL' ? done(run) : fail(new Error(`writer ended on its own: ${run.stderr}`))));
  });
}

function storedParts(file: string): { parts: Set<string>; integrity: string; consistent: boolean } {
  const store = openStore(file);
  try {
    const integrity = String(store.db.pragma('integrity_check', { simple: true }));
    const rows = store.db.prepare('SELECT part_number FROM jobs').all() as { part_number: string }[];
    const checks = store.db.prepare(`SELECT
        (SELECT count(*) FROM jobs) AS jobs,
        ((SELECT count(*) FROM job_shape_compression) + (SELECT count(*) FROM job_shape_extension)
          + (SELECT count(*) FROM job_shape_torsion)) AS shapes,
        (SELECT count(*) FROM job_text) AS texts,
        (SELECT count(*) FROM jobs j WHERE j.revision <> (SELECT max(revision) FROM job_revisions r WHERE r.job_id = j.id)) AS gaps`).get() as Record<string, number>;
    const consistent = checks.jobs === checks.shapes && checks.jobs === checks.texts && checks.gaps === 0;
    return { parts: new Set(rows.map((r) => r.part_number)), integrity, consistent };
  } finally {
    store.close();
  }
}

describe('a writer killed in the middle of its writes', () => {
  it('leaves a store that opens, passes integrity_check and holds exactly what was committed (50 kills)', async () => {
    const dir = tempDir();
    const lanes = 5;
    const rounds = 10;
    const committed = Array.from({ length: lanes }, () => new Set<string>());
    const begun = Array.from({ length: lanes }, () => new Set<string>());
    for (let round = 0; round < rounds; round++) {
      await Promise.all(Array.from({ length: lanes }, async (_, lane) => {
        const file = join(dir, `lane-${lane}.db`);
        const run = await runAndKill(file, lane * 100 + round, 3 + ((round * 7 + lane * 3) % 25));
        for (const p of run.committed) committed[lane]!.add(p);
        for (const p of run.begun) begun[lane]!.add(p);
        const stored = storedParts(file);
        expect(stored.integrity).toBe('ok');
        expect(stored.consistent).toBe(true);
        const missing = [...committed[lane]!].filter((p) => !stored.parts.has(p));
        expect(missing).toEqual([]);
        // At most the writes in flight at the kill may be there without a "committed" line; nothing never begun.
        const unannounced = [...stored.parts].filter((p) => !begun[lane]!.has(p));
        expect(unannounced).toEqual([]);
        const uncommitted = [...stored.parts].filter((p) => !committed[lane]!.has(p));
        expect(uncommitted.length).toBeLessThanOrEqual(3 * (round + 1));
        const batches = new Map<string, number>();
        for (const p of stored.parts) if (/-\d+-\d+-\d$/.test(p)) batches.set(p.slice(0, -2), (batches.get(p.slice(0, -2)) ?? 0) + 1);
        expect([...batches.values()].filter((n) => n !== 3)).toEqual([]);
      }));
    }
  }, 180_000);
});
