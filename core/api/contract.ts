import { z } from 'zod';
import type { FieldError } from '../result';

/** An API failure: a code, a message for the user, the field it concerns, and every field error when input was bad. */
export interface ApiError {
  code: string;
  message: string;
  path: string;
  details?: FieldError[];
}

export type ApiResult<T> = { ok: true; value: T } | { ok: false; error: ApiError };

/** One API method: the zod schema its input must pass, and the (typed, not re-validated) output. */
export interface MethodSpec<I extends z.ZodType, O> {
  input: I;
  output: z.ZodType<O>;
}

export const method = <I extends z.ZodType, O>(input: I): MethodSpec<I, O> => ({ input, output: z.custom<O>() });

export type MethodInput<M> = M extends MethodSpec<infer I, unknown> ? z.input<I> : never;
export type MethodOutput<M> = M extends MethodSpec<z.ZodType, infer O> ? O : never;

/** Turns field errors into one API error (the first names the field; all are in details). */
export function inputError(errors: FieldError[]): ApiError {
  const first = errors[0] ?? { code: 'invalid-input', message: 'invalid input', path: '' };
  return { code: first.code, message: first.message, path: first.path, details: errors };
}
