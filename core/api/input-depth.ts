import type { FieldError } from '../result';
import { fieldError, formatPath } from '../result';

/**
 * The deepest nesting any API input has: a spec is five levels deep (duty → between → value), a settings
 * document six. Far deeper input is refused before any schema walks it, so no parser recursion can run
 * out of stack on a hostile body.
 */
export const MAX_INPUT_DEPTH = 32;

/** The first place `value` nests deeper than `limit`, as a field error naming the top-level field; null when it does not. */
export function depthError(value: unknown, limit = MAX_INPUT_DEPTH): FieldError | null {
  const stack: { v: unknown; depth: number; path: PropertyKey[] }[] = [{ v: value, depth: 0, path: [] }];
  while (stack.length > 0) {
    const { v, depth, path } = stack.pop()!;
    if (typeof v !== 'object' || v === null) continue;
    if (depth >= limit) {
      const field = formatPath(path.slice(0, 1));
      return fieldError('input-too-deep', field,
        `${field || 'the input'} is nested more than ${limit} levels deep; no valid input is`);
    }
    const entries = Array.isArray(v) ? v.map((item, i) => [i, item] as const) : Object.entries(v as Record<string, unknown>);
    for (const [key, inner] of entries) stack.push({ v: inner, depth: depth + 1, path: [...path.slice(0, 1), key] });
  }
  return null;
}
