import type { FieldError } from '../../core/result';

/** Field error as the form shows it; `missing` ones wait until the field has been visited. */
export interface FormError extends FieldError {
  missing: boolean;
}

/** Schema messages in the estimator's words. */
export function friendlyError(e: FieldError): FormError {
  if (e.code === 'required') return { ...e, missing: true };
  if (/received undefined/.test(e.message)) return { ...e, code: 'required', message: 'needed', missing: true };
  const tooSmall = /^Too small: expected number to be >(=?)(-?[\d.e+]+)$/.exec(e.message);
  if (tooSmall) return { ...e, message: tooSmall[1] === '=' ? `at least ${tooSmall[2]}` : `more than ${tooSmall[2]}`, missing: false };
  const tooBig = /^Too big: expected number to be <(=?)(-?[\d.e+]+)$/.exec(e.message);
  if (tooBig) return { ...e, message: tooBig[1] === '=' ? `at most ${tooBig[2]}` : `less than ${tooBig[2]}`, missing: false };
  if (/expected number, received string/.test(e.message)) return { ...e, message: 'a number, e.g. 2.5', missing: false };
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
