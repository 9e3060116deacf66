import { contract, inputError } from '../../core/api';
import type { ApiResult, MethodName } from '../../core/api';
import { zodErrors } from '../../core/validation';
import { StoreError } from '../../db';

/** A method implementation receives parsed input and returns a result value (never throws for bad input). */
export type Handler = (input: never) => Promise<ApiResult<unknown>> | ApiResult<unknown>;
export type Handlers = Record<MethodName, Handler>;

export interface DispatchOptions {
  /** Called with unexpected failures, so they reach the log file; the caller still gets a value. */
  onUnexpected?: (method: string, error: unknown) => void;
}

/** Parses input with the contract's schema and calls the handler; every outcome is a value. */
export async function dispatch(
  handlers: Handlers, name: string, raw: unknown, options: DispatchOptions = {},
): Promise<ApiResult<unknown>> {
  if (!Object.hasOwn(contract, name)) {
    return { ok: false, error: { code: 'unknown-method', message: `no API method "${name}"`, path: '' } };
  }
  const method = name as MethodName;
  const parsed = contract[method].input.safeParse(raw);
  if (!parsed.success) {
    return {
      ok: false,
      error: inputError(zodErrors(parsed.error)),
    };
  }
  try {
    return await handlers[method](parsed.data as never);
  } catch (e) {
    // A store fault the user can act on (full disk, read-only store) is an answer, not a failure.
    if (e instanceof StoreError) return { ok: false, error: e.toApiError() };
    options.onUnexpected?.(method, e);
    return { ok: false, error: { code: 'unexpected', message: `${method} failed: ${(e as Error).message}`, path: '' } };
  }
}
