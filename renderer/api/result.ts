import type { ApiResult } from '../../core/api';

/** A failure that never reached a handler (no answer, a broken reply): still an ApiResult, never a throw. */
export function transportFailure(message: string): ApiResult<never> {
  return { ok: false, error: { code: 'transport', message, path: '' } };
}

export function isApiResult(value: unknown): value is ApiResult<unknown> {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as { ok?: unknown; value?: unknown; error?: { message?: unknown } };
  if (v.ok === true) return 'value' in v;
  return v.ok === false && typeof v.error?.message === 'string';
}
