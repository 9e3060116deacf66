import type { Result } from '../../core/result';
import { fail, fieldError, ok } from '../../core/result';

/**
 * Turns what a user typed into a safe FTS5 MATCH expression. Each whitespace-separated word becomes a
 * quoted phrase with a prefix star, so "spr" finds "spring" and "CS-10" finds "CS-1042"; the words
 * are ANDed. Quoting means operators (AND, NEAR, column filters, brackets) in user text are plain text.
 * A single letter or digit is matched as a whole word ("rev B", "A 2"): as a prefix it would match most
 * of a large store and tell the estimator nothing; the index keeps prefixes of two and three characters.
 * A decimal value ("1.6", "0,063") is a dimension: matched whole, so 1.6 does not find 1.65.
 */
const DECIMAL = /^\d*[.,]\d+$/;

export function matchExpression(text: string): Result<string> {
  const words = text
    .split(/\s+/)
    .map((w) => w.replace(/\*+$/, ''))
    .filter((w) => /[\p{L}\p{N}]/u.test(w));
  if (words.length === 0) {
    return fail([fieldError('empty-search', 'text', 'type a word, a part number or a customer name to search for')]);
  }
  return ok(words.map((w) => `"${w.replace(/"/g, '""')}"${[...w].length > 1 && !DECIMAL.test(w) ? '*' : ''}`).join(' '));
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
    const runs = w.match(/[\p{L}\p{N}]+/gu) ?? [];
    const prefix = [...w].length > 1 ? ':*' : '';
    return runs.map((r, i) => `'${r}'${i === runs.length - 1 ? prefix : ''}`).join(' <-> ');
  }).join(' & '));
}
