import { z } from 'zod';
/** Schema validation results as field errors: one conversion for specs, settings, store input and the API. */
import type { FieldError, Result } from './result';
import { fail, fieldError, formatPath, ok } from './result';

/** Zod issues as field errors, paths under `prefix` (e.g. "jobs[3]"). */
export function zodErrors(error: z.ZodError, prefix: readonly PropertyKey[] = []): FieldError[] {
  const out: FieldError[] = [];
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) {
        out.push(fieldError('unknown-field', formatPath([...prefix, ...issue.path, key]), `unknown field "${key}"`));
      }
    } else if (issue.code === 'invalid_union' && issue.errors.length > 0) {
      // Report the alternative that came closest (fewest issues), with its own field paths.
      const closest = issue.errors.reduce((a, b) => (b.length < a.length ? b : a));
      out.push(...zodErrors({ issues: closest } as z.ZodError, [...prefix, ...issue.path]));
    } else if (issue.code === 'custom' && typeof issue.params?.code === 'string') {
      out.push(fieldError(issue.params.code, formatPath([...prefix, ...issue.path]), issue.message));
    } else {
      out.push(fieldError(`invalid-${issue.code.replace(/_/g, '-')}`, formatPath([...prefix, ...issue.path]), issue.message));
    }
  }
  return out;
}

const plural = (n: number | bigint, one: string, many: string) => `${n} ${Number(n) === 1 ? one : many}`;

/** A limit in words by what it limits: a number's value, a text's length, a list's size. */
function limitWords(origin: string, limit: number | bigint, least: boolean, inclusive: boolean): string {
  if (origin === 'string') return Number(limit) <= 1 && least ? 'needed' : `${least ? 'at least' : 'at most'} ${plural(limit, 'character', 'characters')}`;
  if (origin === 'array' || origin === 'set') return `${least ? 'at least' : 'at most'} ${plural(limit, 'item', 'items')}`;
  if (inclusive) return `${least ? 'at least' : 'at most'} ${limit}`;
  return `${least ? 'more than' : 'less than'} ${limit}`;
}

/**
 * The message of an issue, written from its code and parameters rather than the schema library's own English.
 * Installed as zod's fallback, so a message a schema states itself still wins.
 */
function issueMessage(issue: z.core.$ZodRawIssue): string | undefined {
  switch (issue.code) {
    case 'too_small': return limitWords(issue.origin, issue.minimum, true, issue.inclusive !== false);
    case 'too_big': return limitWords(issue.origin, issue.maximum, false, issue.inclusive !== false);
    case 'invalid_type':
      if (issue.input === undefined) return 'needed';
      return issue.expected === 'number' ? 'a number, e.g. 2.5' : `expected ${issue.expected}`;
    case 'invalid_value': return `one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`;
    case 'not_multiple_of': return `a multiple of ${issue.divisor}`;
    default: return undefined;
  }
}

z.config({ customError: issueMessage });

export function parseWith<S extends z.ZodType>(schema: S, raw: unknown, prefix: readonly PropertyKey[] = []): Result<z.output<S>> {
  const parsed = schema.safeParse(raw);
  return parsed.success ? ok(parsed.data) : fail(zodErrors(parsed.error, prefix));
}
