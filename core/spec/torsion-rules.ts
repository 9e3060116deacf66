import type { FieldError } from '../result';
import { fieldError } from '../result';
import type { TorsionSpec } from './torsion';
import { coilBodyErrors } from './common-rules';
import { meanDiameterOf } from '../springs/coil-body';

/** Contradictions the torsion schema cannot express. */
export function torsionSpecErrors(s: TorsionSpec): FieldError[] {
  const errors: FieldError[] = [];
  coilBodyErrors(s, errors);
  if (errors.length > 0) return errors;
  const inside = meanDiameterOf(s) - s.wireDiameter;
  if (s.arborDiameter !== undefined && s.arborDiameter >= inside) {
    errors.push(fieldError('arbor-too-large', 'arborDiameter',
      `the arbor (${s.arborDiameter}) does not fit the free inside diameter (${inside.toPrecision(4)})`));
  }
  if (s.duty.type === 'cyclic' && s.duty.between[0] === s.duty.between[1]) {
    errors.push(fieldError('no-stroke', 'duty.between[1]', 'the two working angles are equal: no stroke to cycle'));
  }
  return errors;
}
