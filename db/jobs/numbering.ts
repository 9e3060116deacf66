import type { Store } from '../store';
import { readSetting, writeSetting } from '../settings';

/** "J-{yy}-" with width 4 and n = 1 on a 2026 date gives "J-26-0001". */
export function formatNumber(prefix: string, width: number, n: number, date: Date): string {
  const year = String(date.getUTCFullYear());
  return prefix.replace(/\{yyyy\}/g, year).replace(/\{yy\}/g, year.slice(-2)) + String(n).padStart(width, '0');
}

const taken = {
  jobs: 'SELECT 1 FROM jobs WHERE number = ?',
  quotes: 'SELECT 1 FROM quotes WHERE number = ?',
} as const;

/**
 * Takes the next number of a sequence (jobs or quotes) and moves the sequence on. Numbers already in use
 * (typed in, imported) are skipped. Call inside the transaction that uses the number.
 */
export function takeNumber(store: Store, sequence: 'jobs' | 'quotes'): string {
  const numbering = readSetting(store, 'numbering');
  const seq = sequence === 'jobs' ? numbering : numbering.quotes;
  const now = store.now();
  let n = seq.next;
  let number = formatNumber(seq.prefix, seq.width, n, now);
  while (store.sql(taken[sequence]).get(number) !== undefined) {
    n += 1;
    number = formatNumber(seq.prefix, seq.width, n, now);
  }
  const next = n + 1;
  writeSetting(store, 'numbering', sequence === 'jobs'
    ? { ...numbering, next }
    : { ...numbering, quotes: { ...numbering.quotes, next } });
  return number;
}
