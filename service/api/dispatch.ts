import { contract, inputError } from '../../core/api';
import type { ApiResult, MethodName } from '../../core/api';
import { zodErrors } from '../../core/validation';
import { depthError } from '../../core/api/input-depth';
import type { FieldError } from '../../core/result';

/** A method implementation receives parsed input and returns a result value (never throws for bad input). */
export type Handler = (input: never) => Promise<ApiResult<unknown>> | ApiResult<unknown>;
export type Handlers = Record<MethodName, Handler>;

export interface DispatchOptions {
  /** Called with unexpected failures, so they reach the log file; the caller still gets a value. */
  onUnexpected?: (method: string, error: unknown) => void;
}

/** An error about the whole input (no field path) says which method's input it is about. */
const namingInput = (method: string, errors: FieldError[]): FieldError[] =>
  errors.map((e) => (e.path === '' ? { ...e, message: `the input of ${method}: ${e.message}` } : e));

/** Parses input with the contract's schema and calls the handler; every outcome is a value. */
export async function dispatch(
  handlers: Handlers, name: string, raw: unknown, options: DispatchOptions = {},
): Promise<ApiResult<unknown>> {
  if (!Object.hasOwn(contract, name)) {
    return { ok: false, error: { code: 'unknown-method', message: `no API method "${name}"`, path: '' } };
  }
  const method = name as MethodName;
  try {
    const deep = depthError(raw);
    if (deep) return { ok: false, error: inputError([deep]) };
    const parsed = contract[method].input.safeParse(raw);
    if (!parsed.success) return { ok: false, error: inputError(namingInput(method, zodErrors(parsed.error))) };
    return await handlers[method](parsed.data as never);
  } catch (e) {
    options.onUnexpected?.(method, e);
    return { ok: false, error: { code: 'unexpected', message: `${method} failed: ${(e as Error).message}`, path: '' } };
  }
}
