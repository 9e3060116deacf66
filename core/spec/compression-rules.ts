import type { FieldError } from '../result';
import { fieldError } from '../result';
import { endForms, solidLength } from '../springs/compression/ends';
import type { CompressionSpec } from './compression';
import { coilBodyErrors, givenCount } from './common-rules';

function coilErrors(s: CompressionSpec, errors: FieldError[]): void {
  const given = givenCount(s.totalCoils, s.activeCoils);
  if (given !== 1) {
    errors.push(fieldError('coil-count', 'totalCoils', `give exactly one of totalCoils, activeCoils (${given} given)`));
    return;
  }
  const inactive = endForms[s.ends].inactiveCoils;
  const active = s.activeCoils ?? (s.totalCoils ?? 0) - inactive;
  if (active >= 1) return;
  const path = s.activeCoils !== undefined ? 'activeCoils' : 'totalCoils';
  errors.push(fieldError('too-few-coils', path,
    `${s.ends} ends take ${inactive} inactive coils, so at least ${inactive + 1} total coils are needed`));
}

function lengthErrors(s: CompressionSpec, errors: FieldError[]): void {
  const inactive = endForms[s.ends].inactiveCoils;
  const nt = s.totalCoils ?? (s.activeCoils ?? 0) + inactive;
  const solid = solidLength(s.ends, s.wireDiameter, nt);
  if (solid >= s.freeLength) {
    errors.push(fieldError('solid-above-free-length', 'freeLength',
      `solid length ${solid.toPrecision(4)} is not below the free length ${s.freeLength}: fewer coils, finer wire or a longer free length`));
  }
  for (let i = 0; i < s.loads.length; i++) {
    if (s.loads[i]!.length >= s.freeLength) {
      errors.push(fieldError('load-length-not-below-free-length', `loads[${i}].length`,
        `a compression load length must be shorter than the free length ${s.freeLength}`));
    }
  }
  if (s.duty.type === 'cyclic') {
    const between = s.duty.between;
    for (let i = 0; i < between.length; i++) {
      if (between[i]! >= s.freeLength) {
        errors.push(fieldError('load-length-not-below-free-length', `duty.between[${i}]`,
          `a working length must be shorter than the free length ${s.freeLength}`));
      }
    }
    if (between[0] === between[1]) {
      errors.push(fieldError('no-stroke', 'duty.between[1]', 'the two working lengths are equal: no stroke to cycle'));
    }
  }
}

/** Checks a schema-valid compression spec for contradictions the schema cannot express. */
export function compressionSpecErrors(s: CompressionSpec): FieldError[] {
  const errors: FieldError[] = [];
  coilBodyErrors(s, errors);
  coilErrors(s, errors);
  if (errors.length === 0) lengthErrors(s, errors);
  return errors;
}
