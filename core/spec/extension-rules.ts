import type { FieldError } from '../result';
import { fieldError } from '../result';
import type { ExtensionSpec } from './extension';
import { coilBodyErrors } from './common-rules';

/** Contradictions the extension schema cannot express. Loads against the free length are review findings. */
export function extensionSpecErrors(s: ExtensionSpec): FieldError[] {
  const errors: FieldError[] = [];
  coilBodyErrors(s, errors);
  s.ends.forEach((end, i) => {
    const form = typeof end === 'string' ? end : end.form;
    const extension = typeof end === 'string' ? undefined : end.extension;
    if (form === 'extended-hook' && extension === undefined) {
      errors.push(fieldError('hook-length-missing', `ends[${i}]`, 'an extended hook needs its straight length: give {"form":"extended-hook","extension":…}'));
    }
  });
  if (s.bodyCoils < 1) errors.push(fieldError('too-few-coils', 'bodyCoils', 'an extension spring needs at least one body coil'));
  if (s.duty.type === 'cyclic' && s.duty.between[0] === s.duty.between[1]) {
    errors.push(fieldError('no-stroke', 'duty.between[1]', 'the two working lengths are equal: no stroke to cycle'));
  }
  return errors;
}
