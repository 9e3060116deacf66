/**
 * What every tolerance lookup returns: a value with the table it came from, or a reason why the table
 * gives none. A missing cell is never filled in; the message says the value is by agreement.
 */
export type ToleranceGrade = 1 | 2 | 3;

export interface Found<T> {
  ok: true;
  value: T;
  source: string;
  /** True only once checked against a licensed copy of the standard. */
  verified: boolean;
}

export interface NotFound {
  ok: false;
  code: string;
  message: string;
  /** The input field the reason concerns, e.g. "index". */
  path: string;
}

export type Lookup<T> = Found<T> | NotFound;

export const found = <T>(value: T, table: { source: string; verified: boolean }): Found<T> => ({
  ok: true, value, source: table.source, verified: table.verified,
});

export const notFound = (code: string, path: string, message: string): NotFound => ({ ok: false, code, path, message });

/** Every number a lookup reads must be finite and, unless `allowZero`, positive. */
export function checkPositive(inputs: Record<string, number>, allowZero: readonly string[] = []): NotFound | null {
  for (const [path, x] of Object.entries(inputs)) {
    const bad = !Number.isFinite(x) || x < 0 || (x === 0 && !allowZero.includes(path));
    if (bad) return notFound('invalid-input', path, `${path} must be a positive number (got ${x})`);
  }
  return null;
}
