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

/** A sequence read once and moved on in memory: many new jobs in one transaction (an import) share it. */
export interface NumberSequence {
  /** The next number not in use. */
  take(): string;
  /** Writes where the sequence stands; call before the transaction commits. */
  keep(): void;
}

/**
 * The job or quote sequence inside the caller's transaction. Numbers already in use (typed in, imported)
 * are skipped.
 */
export function numberSequence(store: Store, sequence: 'jobs' | 'quotes'): NumberSequence {
  const numbering = readSetting(store, 'numbering');
  const seq = sequence === 'jobs' ? numbering : numbering.quotes;
  let next = seq.next;
  return {
    take() {
      const now = store.now();
      let number = formatNumber(seq.prefix, seq.width, next, now);
      while (store.sql(taken[sequence]).get(number) !== undefined) {
        next += 1;
        number = formatNumber(seq.prefix, seq.width, next, now);
      }
      next += 1;
      return number;
    },
    keep() {
      writeSetting(store, 'numbering', sequence === 'jobs'
        ? { ...numbering, next }
        : { ...numbering, quotes: { ...numbering.quotes, next } });
    },
  };
}

/** Takes the next number of a sequence (jobs or quotes) and moves the sequence on. Call inside the transaction that uses the number. */
export function takeNumber(store: Store, sequence: 'jobs' | 'quotes'): string {
  const numbers = numberSequence(store, sequence);
  const number = numbers.take();
  numbers.keep();
  return number;
}
