import type { FieldError } from '../../core/result';

/** Field error as the form shows it; `missing` ones wait until the field has been visited. */
export interface FormError extends FieldError {
  missing: boolean;
}

/**
 * A field error as the form shows it, by its code: a value the schema found absent (`required`, or a wrong
 * type where nothing was given) waits until the field is visited. Messages are core's own words (core/validation.ts
 * writes them from each issue's code and limits), so nothing here reads the English of an error.
 */
export function friendlyError(e: FieldError, given?: (path: string) => unknown): FormError {
  if (e.code === 'required') return { ...e, missing: true };
  if (e.code === 'invalid-invalid-type' && given !== undefined && given(e.path) === undefined) {
    return { ...e, code: 'required', message: 'needed', missing: true };
  }
  return { ...e, missing: false };
}

/**
 * The field an error belongs to: its own path when the form has that field, else the nearest parent
 * ("quantities[2]" → "quantities"), else null (the error is listed above the form).
 */
export function resolveField(path: string, fields: ReadonlySet<string>): string | null {
  let p = path;
  while (p !== '') {
    if (fields.has(p)) return p;
    const cut = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
    p = cut > 0 ? p.slice(0, cut) : '';
  }
  return null;
}

/** Groups errors by the field they belong to; the first error of a field wins. */
export function errorsByField(errors: readonly FormError[], fields: ReadonlySet<string>): {
  byField: Map<string, FormError>; unplaced: FormError[];
} {
  const byField = new Map<string, FormError>();
  const unplaced: FormError[] = [];
  for (const e of errors) {
    const field = resolveField(e.path, fields);
    if (field === null) unplaced.push(e);
    else if (!byField.has(field)) byField.set(field, e);
  }
  return { byField, unplaced };
}
