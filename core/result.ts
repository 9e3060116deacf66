/** Findings and errors are values: a code, a severity, a message for the user and the field they concern. */
export type Severity = 'error' | 'warning' | 'note';

export interface Finding {
  code: string;
  severity: Severity;
  message: string;
  /** Field path in the spec, e.g. "loads[1].force"; "" when the finding concerns the whole spec. */
  path: string;
  /** What the estimator can do about it; "" when nothing needs doing. */
  fix: string;
}

export interface FieldError {
  code: string;
  message: string;
  path: string;
}

export type Result<T, E = FieldError[]> = { ok: true; value: T } | { ok: false; errors: E };

export const ok = <T>(value: T): { ok: true; value: T } => ({ ok: true, value });
export const fail = (errors: FieldError[]): { ok: false; errors: FieldError[] } => ({ ok: false, errors });

export function fieldError(code: string, path: string, message: string): FieldError {
  return { code, path, message };
}

/** Renders a path array from a schema library as "loads[1].force". */
export function formatPath(parts: readonly PropertyKey[]): string {
  let out = '';
  for (const part of parts) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out === '' ? String(part) : `.${String(part)}`;
  }
  return out;
}
