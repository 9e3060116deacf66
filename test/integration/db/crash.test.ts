import { spawn } from 'node:child_process';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { getSettings, openStore, verifyBackup } from '../../../db';
import { tempDir } from './helpers';

const root = resolve(__dirname, '../../..');
const writer = join(__dirname, 'fixtures', 'writer.ts');

const KINDS = ['job', 'import', 'issue', 'backup', 'restore'] as const;
type Kind = (typeof KINDS)[number];

/** What one lane's writer has said over all its runs. */
interface Said {
  begunParts: Set<string>;
  /** part → the job number acknowledged for it. */
  parts: Map<string, string>;
  quotes: Set<string>;
  backups: string[];
  kills: Record<Kind, number>;
}

const newSaid = (): Said => ({ begunParts: new Set(), parts: new Map(), quotes: new Set(), backups: [], kills: { job: 0, import: 0, issue: 0, backup: 0, restore: 0 } });

function hear(said: Said, line: string): string | undefined {
  const [word, kind, payload = ''] = line.split(' ');
  if (word === 'begin' && (kind === 'job' || kind === 'import')) for (const p of payload.split(',')) said.begunParts.add(p);
  if (word !== 'committed') return word === 'begin' ? kind : undefined;
  if (kind === 'job' || kind === 'import') {
    for (const pair of payload.split(',')) {
      const [part, number] = pair.split('=') as [string, string];
      said.parts.set(part, number);
    }
  }
  if (kind === 'issue') said.quotes.add(payload);
  if (kind === 'backup') said.backups.push(payload);
  return undefined;
}

/** Runs the writer and kills it with SIGKILL as soon as it begins its `occurrence`-th step of `kind`. */
function runAndKill(file: string, lane: string, said: Said, kind: Kind, occurrence: number): Promise<void> {
  return new Promise((done, fail) => {
    const child = spawn(process.execPath, ['--import', 'tsx', writer, file, lane], { cwd: root, stdio: ['ignore', 'pipe', 'pipe'] });
    let pending = '';
    let stderr = '';
    let seen = 0;
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
      pending += chunk;
      const lines = pending.split('\n');
      pending = lines.pop()!;
      for (const line of lines) if (hear(said, line) === kind) seen += 1;
      if (seen >= occurrence && child.exitCode === null) child.kill('SIGKILL');
    });
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => { stderr += chunk; });
    child.on('error', fail);
    child.on('close', (_code, signal) => {
      if (signal !== 'SIGKILL') return fail(new Error(`writer ended on its own: ${stderr}`));
      said.kills[kind] += 1;
      done();
    });
  });
}

const serial = (number: string) => Number(/(\d+)$/.exec(number)![1]);

/** Opens the store after a kill and checks it against everything the writer acknowledged. */
function checkAfterKill(file: string, said: Said): void {
  const store = openStore(file);
  try {
    expect(store.db.pragma('integrity_check', { simple: true })).toBe('ok');
    const counts = store.db.prepare(`SELECT
        (SELECT count(*) FROM jobs) AS jobs, ((SELECT count(*) FROM job_shape_compression) + (SELECT count(*) FROM job_shape_extension)
           + (SELECT count(*) FROM job_shape_torsion)) AS shapes, (SELECT count(*) FROM job_text) AS texts,
        (SELECT count(*) FROM jobs j WHERE j.revision <> (SELECT max(revision) FROM job_revisions r WHERE r.job_id = j.id)) AS gaps`)
      .get() as Record<string, number>;
    expect(counts.jobs).toBe(counts.shapes);
    expect(counts.jobs).toBe(counts.texts);
    expect(counts.gaps).toBe(0);
    const stored = new Map((store.db.prepare('SELECT part_number AS part, number FROM jobs').all() as { part: string; number: string }[])
      .map((r) => [r.part, r.number]));
    // No acknowledged write lost, each with the number it was acknowledged with.
    expect([...said.parts].filter(([part, number]) => stored.get(part) !== number)).toEqual([]);
    // Nothing that was never begun, and imports whole or not at all.
    expect([...stored.keys()].filter((p) => !said.begunParts.has(p))).toEqual([]);
    const batches = new Map<string, number>();
    for (const p of stored.keys()) if (/-\d+-\d+-\d$/.test(p)) batches.set(p.slice(0, -2), (batches.get(p.slice(0, -2)) ?? 0) + 1);
    expect([...batches.values()].filter((n) => n !== 3)).toEqual([]);
    // No number handed out twice: every stored number belongs to one part, and the sequences are past every acknowledged number.
    const owners = new Map<string, string>();
    for (const [part, number] of [...said.parts, ...stored]) {
      expect(owners.get(number) ?? part, `job number ${number}`).toBe(part);
      owners.set(number, part);
    }
    const quotes = new Set((store.db.prepare('SELECT number FROM quotes').all() as { number: string }[]).map((r) => r.number));
    expect([...said.quotes].filter((q) => !quotes.has(q))).toEqual([]);
    const numbering = getSettings(store);
    if (!numbering.ok) throw new Error(numbering.error.message);
    const { next, quotes: quoteSequence } = numbering.value.numbering;
    expect(Math.max(0, ...[...said.parts.values()].map(serial))).toBeLessThan(next);
    expect(Math.max(0, ...[...said.quotes].map(serial))).toBeLessThan(quoteSequence.next);
    for (const backup of said.backups) expect(verifyBackup(backup).ok, backup).toBe(true);
  } finally {
    store.close();
  }
}

/** Kill targets: each kind in turn, at its first or second step in the run. */
async function killRounds(dir: string, lanes: number, rounds: number): Promise<Said[]> {
  const said = Array.from({ length: lanes }, newSaid);
  for (let round = 0; round < rounds; round++) {
    await Promise.all(Array.from({ length: lanes }, async (_, lane) => {
      const file = join(dir, `lane-${lane}.db`);
      const kind = KINDS[(round + lane) % KINDS.length]!;
      await runAndKill(file, `${lane}r${round}`, said[lane]!, kind, 1 + (round % 2));
      checkAfterKill(file, said[lane]!);
    }));
  }
  return said;
}

/** 10 rounds of 5 lanes in `npm test`; `npm run bench -- crash` sets more. */
const ROUNDS = Number(process.env.COILWRIGHT_KILL_ROUNDS ?? 10);

describe('writers killed (SIGKILL) in the middle of saves, imports, quotes, backups and restores', () => {
  it(`leave stores that open, pass integrity_check, keep every acknowledged write and reuse no number (${5 * ROUNDS} kills)`, async () => {
    const said = await killRounds(tempDir(), 5, ROUNDS);
    const kills = said.reduce((sum, s) => sum + Object.values(s.kills).reduce((a, b) => a + b, 0), 0);
    expect(kills).toBe(5 * ROUNDS);
    for (const kind of KINDS) expect(said.reduce((sum, s) => sum + s.kills[kind], 0), kind).toBe(ROUNDS);
    expect(said.reduce((sum, s) => sum + s.parts.size, 0)).toBeGreaterThan(50);
  }, 24_000 * ROUNDS);
});
