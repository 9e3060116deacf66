import type { z } from 'zod';
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

export function parseWith<S extends z.ZodType>(schema: S, raw: unknown, prefix: readonly PropertyKey[] = []): Result<z.output<S>> {
  const parsed = schema.safeParse(raw);
  return parsed.success ? ok(parsed.data) : fail(zodErrors(parsed.error, prefix));
}
