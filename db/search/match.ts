import type { Result } from '../../core/result';
import { fail, fieldError, ok } from '../../core/result';

/**
 * Turns what a user typed into a safe FTS5 MATCH expression. Each whitespace-separated word becomes a
 * quoted phrase with a prefix star, so "spr" finds "spring" and "CS-10" finds "CS-1042"; the words
 * are ANDed. Quoting means operators (AND, NEAR, column filters, brackets) in user text are plain text.
 * A single letter or digit is matched as a whole word ("rev B", "A 2"): as a prefix it would match most
 * of a large store and tell the estimator nothing; the index keeps prefixes of two to eight characters.
 * A decimal value ("1.6", "0,063") is a dimension: matched whole, so 1.6 does not find 1.65.
 */
const DECIMAL = /^\d*[.,]\d+$/;

/**
 * The longest prefix the text index keeps (migration 0018): a longer last word is searched by its first
 * PREFIX_KEPT characters, which the index reads newest-first; "regulators" finds "regulator" too.
 */
export const PREFIX_KEPT = 8;

/** The word's letter and digit runs, the last cut to PREFIX_KEPT characters, or null when none is longer. */
function cutRuns(word: string): string[] | null {
  const runs = word.match(/[\p{L}\p{N}]+/gu) ?? [];
  const last = [...(runs[runs.length - 1] ?? '')];
  if (last.length <= PREFIX_KEPT) return null;
  return [...runs.slice(0, -1), last.slice(0, PREFIX_KEPT).join('')];
}

function ftsWord(w: string): string {
  if ([...w].length <= 1 || DECIMAL.test(w)) return `"${w.replace(/"/g, '""')}"`;
  const cut = cutRuns(w);
  return `"${cut ? cut.join(' ') : w.replace(/"/g, '""')}"*`;
}

export function matchExpression(text: string): Result<string> {
  const words = text
    .split(/\s+/)
    .map((w) => w.replace(/\*+$/, ''))
    .filter((w) => /[\p{L}\p{N}]/u.test(w));
  if (words.length === 0) {
    return fail([fieldError('empty-search', 'text', 'type a word, a part number or a customer name to search for')]);
  }
  return ok(words.map(ftsWord).join(' '));
}

/**
 * The same search as a PostgreSQL tsquery: each word's letter and digit runs in sequence (`<->`, as FTS5
 * reads a quoted phrase), the last run a prefix unless the word is a single character; the words ANDed.
 */
export function tsQueryExpression(text: string): Result<string> {
  const words = text.split(/\s+/).map((w) => w.replace(/\*+$/, '').toLowerCase()).filter((w) => /[\p{L}\p{N}]/u.test(w));
  if (words.length === 0) {
    return fail([fieldError('empty-search', 'text', 'type a word, a part number or a customer name to search for')]);
  }
  return ok(words.map((w) => {
    const runs = (([...w].length > 1 && cutRuns(w)) || w.match(/[\p{L}\p{N}]+/gu)) ?? [];
    const prefix = [...w].length > 1 ? ':*' : '';
    return runs.map((r, i) => `'${r}'${i === runs.length - 1 ? prefix : ''}`).join(' <-> ');
  }).join(' & '));
}
