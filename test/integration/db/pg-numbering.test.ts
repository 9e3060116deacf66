import { spawn } from 'node:child_process';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createJob, getSettings, openPgStore } from '../../../db';
import { formatNumber } from '../../../db/jobs/numbering';
import { usePgCluster } from '../../support/pg-stores';
import { job, value } from './helpers';

const pg = usePgCluster();
const root = resolve(__dirname, '../../..');
const desk = join(__dirname, 'fixtures', 'numbering-desk.ts');

const DESKS = 4;
const JOBS_EACH = 15;
/** A quotation after every third job of each desk. */
const QUOTE_EVERY = 3;

interface Desk { lines: string[]; ready: Promise<void>; done: Promise<void>; start(): void }

/** A desk in its own process with its own connection; resolves `ready` once connected, `done` when it exits cleanly. */
function startDesk(url: string, name: string): Desk {
  const child = spawn(process.execPath, ['--import', 'tsx', desk, url, name, String(JOBS_EACH), String(QUOTE_EVERY)],
    { cwd: root, stdio: ['pipe', 'pipe', 'pipe'] });
  const lines: string[] = [];
  let pending = '';
  let stderr = '';
  let onReady: () => void = () => undefined;
  const ready = new Promise<void>((r) => { onReady = r; });
  child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
    pending += chunk;
    const parts = pending.split('\n');
    pending = parts.pop()!;
    for (const line of parts) {
      if (line === 'ready') onReady();
      else lines.push(line);
    }
  });
  child.stderr.setEncoding('utf8').on('data', (chunk: string) => { stderr += chunk; });
  const done = new Promise<void>((ok, fail) => {
    child.on('error', fail);
    child.on('close', (code) => (code === 0 ? ok() : fail(new Error(`desk ${name} exited ${code}: ${stderr}`))));
  });
  return { lines, ready, done, start: () => void child.stdin.end('go\n') };
}

/** The numbers a sequence hands out from `next`, in order, leaving out those already in use. */
function expectedNumbers(seq: { prefix: string; width: number; next: number }, count: number, taken: ReadonlySet<string>, at: Date): string[] {
  const out: string[] = [];
  for (let n = seq.next; out.length < count; n++) {
    const number = formatNumber(seq.prefix, seq.width, n, at);
    if (!taken.has(number)) out.push(number);
  }
  return out;
}

const sorted = (list: string[]) => [...list].sort();
const said = (desks: Desk[], word: string) => desks.flatMap((d) => d.lines.filter((l) => l.startsWith(`${word} `)).map((l) => l.slice(word.length + 1)));

describe('job and quote numbers taken from four desks at once on one PostgreSQL store', () => {
  it('are each handed out once, in sequence with no gaps, skipping only a number typed in before', async () => {
    const url = pg.freshDatabase();
    const store = openPgStore(url, { author: 'set-up' });
    const at = new Date();
    const numbering = value(getSettings(store)).numbering;
    // A job kept under a number the sequence will reach (as an import keeps its numbers): the shop's rule skips it.
    const typedIn = formatNumber(numbering.prefix, numbering.width, numbering.next + 7, at);
    value(createJob(store, job({ partNumber: 'TYPED-IN (demo)' }), { number: typedIn }));

    const desks = Array.from({ length: DESKS }, (_, k) => startDesk(url, String.fromCharCode(65 + k)));
    await Promise.all(desks.map((d) => d.ready));
    for (const d of desks) d.start();
    await Promise.all(desks.map((d) => d.done));

    const jobNumbers = said(desks, 'job');
    const quoteNumbers = said(desks, 'quote');
    const quotesEach = Math.floor(JOBS_EACH / QUOTE_EVERY);
    expect(jobNumbers).toHaveLength(DESKS * JOBS_EACH);
    expect(quoteNumbers).toHaveLength(DESKS * quotesEach);
    // Every number acknowledged to a desk is the one the store holds, once, and the sequence has no holes.
    expect(new Set(jobNumbers).size).toBe(jobNumbers.length);
    expect(new Set(quoteNumbers).size).toBe(quoteNumbers.length);
    expect(sorted(jobNumbers)).toEqual(sorted(expectedNumbers(numbering, DESKS * JOBS_EACH, new Set([typedIn]), at)));
    expect(sorted(quoteNumbers)).toEqual(sorted(expectedNumbers(numbering.quotes, DESKS * quotesEach, new Set(), at)));
    const stored = store.sql('SELECT number FROM jobs ORDER BY number').all().map((r) => (r as { number: string }).number);
    expect(stored).toEqual(sorted([...jobNumbers, typedIn]));
    const quotes = store.sql('SELECT number FROM quotes ORDER BY number').all().map((r) => (r as { number: string }).number);
    expect(quotes).toEqual(sorted(quoteNumbers));
    // Each desk's own numbers rise in the order it took them: the sequence only moves forward.
    for (const d of desks) {
      const own = said([d], 'job');
      expect(own).toEqual(sorted(own));
    }
    const after = value(getSettings(store)).numbering;
    expect([after.next, after.quotes.next]).toEqual([numbering.next + DESKS * JOBS_EACH + 1, numbering.quotes.next + DESKS * quotesEach]);
    store.close();
  }, 180_000);
});
