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

/** The words typed, trailing stars dropped, each holding a letter or digit; an error naming `text` when none does. */
function typedWords(text: string): Result<string[]> {
  const words = text.split(/\s+/).map((w) => w.replace(/\*+$/, '')).filter((w) => /[\p{L}\p{N}]/u.test(w));
  if (words.length === 0) {
    return fail([fieldError('empty-search', 'text', 'type a word, a part number or a customer name to search for')]);
  }
  return ok(words);
}

export function matchExpression(text: string): Result<string> {
  const words = typedWords(text);
  return words.ok ? ok(words.value.map(ftsWord).join(' ')) : words;
}

/** One typed word as PostgreSQL reads it: its letter and digit runs, the last one a prefix or not. */
export interface TsWord { runs: string[]; prefix: boolean }

/**
 * The words of a search as PostgreSQL reads them: each word's letter and digit runs (lower case, as the
 * 'simple' configuration stores them), the last run a prefix unless the word is a single character, cut
 * to PREFIX_KEPT characters as SQLite cuts it.
 * A word typed twice adds nothing to the match; to the planner it would look twice as selective.
 */
export function tsWords(text: string): Result<TsWord[]> {
  const typed = typedWords(text);
  if (!typed.ok) return typed;
  return ok([...new Set(typed.value.map((w) => w.toLowerCase()))].map((w) => ({
    runs: (([...w].length > 1 && cutRuns(w)) || w.match(/[\p{L}\p{N}]+/gu)) ?? [],
    prefix: [...w].length > 1,
  })));
}

const quoted = (lexeme: string): string => `'${lexeme.replace(/'/g, "''")}'`;

/**
 * The search as a tsquery: each word's runs in sequence (`<->`, as FTS5 reads a quoted phrase), the words
 * ANDed. A prefix run is written as the words it stands for when `expanded` lists them (the same match,
 * which the GIN index answers from each word's own list instead of gathering every word under the prefix),
 * else as `run:*`.
 */
export function tsQueryText(words: readonly TsWord[], expanded: ReadonlyMap<string, readonly string[]> = new Map()): string {
  return words.map((w) => w.runs.map((r, i) => {
    if (i < w.runs.length - 1 || !w.prefix) return quoted(r);
    const full = expanded.get(r);
    if (full === undefined || full.length === 0) return `${quoted(r)}:*`;
    return full.length === 1 ? quoted(full[0]!) : `(${full.map(quoted).join(' | ')})`;
  }).join(' <-> ')).join(' & ');
}

/** The prefix runs of a search: the runs the store may expand into whole words. */
export const prefixRuns = (words: readonly TsWord[]): string[] =>
  [...new Set(words.filter((w) => w.prefix && w.runs.length > 0).map((w) => w.runs[w.runs.length - 1]!))];
