import type { ApiError, ApiResult } from '../core/api/contract';
import type { FieldError } from '../core/result';

/** Thrown only where a caller cannot go on (opening, migrating); every other failure is a value. */
export class StoreError extends Error {
  constructor(readonly code: string, message: string, readonly path = '', readonly details?: FieldError[]) {
    super(message);
    this.name = 'StoreError';
  }

  toApiError(): ApiError {
    const head = { code: this.code, message: this.message, path: this.path };
    return this.details && this.details.length > 0 ? { ...head, details: this.details } : head;
  }
}

export type StoreResult<T> = ApiResult<T>;

export const success = <T>(value: T): { ok: true; value: T } => ({ ok: true, value });

export function failure(code: string, message: string, path = '', details?: FieldError[]): { ok: false; error: ApiError } {
  return { ok: false, error: details ? { code, message, path, details } : { code, message, path } };
}

/** Field errors as one failure: the first names the field, all are in details. */
export function invalid(errors: FieldError[]): { ok: false; error: ApiError } {
  const first = errors[0] ?? { code: 'invalid-input', message: 'invalid input', path: '' };
  return failure(first.code, first.message, first.path, errors);
}

/** Prefixes error paths, e.g. "wireDiameter" under "spec" becomes "spec.wireDiameter". */
export function underPath(prefix: string, errors: FieldError[]): FieldError[] {
  return errors.map((e) => ({
    ...e,
    path: e.path === '' ? prefix : e.path.startsWith('[') ? `${prefix}${e.path}` : `${prefix}.${e.path}`,
  }));
}
