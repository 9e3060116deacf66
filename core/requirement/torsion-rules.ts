import type { FieldError } from '../result';
import { fieldError } from '../result';
import { choiceErrors } from './rules';
import type { TorsionRequirement } from './torsion';

/** Contradictions of a torsion requirement the schema cannot express, each naming its field. */
export function torsionRequirementErrors(r: TorsionRequirement): FieldError[] {
  const errors: FieldError[] = [];
  const [a, b] = r.function.torques;
  if (b.torque <= a.torque) {
    errors.push(fieldError('torque-not-rising', 'function.torques[1].torque',
      `the second position is further wound, so its torque must be larger: ${b.torque} is not above ${a.torque}`));
  }
  const e = r.envelope;
  if (e.arbor !== undefined && e.maxOuterDiameter !== undefined && e.arbor >= e.maxOuterDiameter) {
    errors.push(fieldError('envelope-closed', 'envelope.arbor', `the arbor ${e.arbor} is not smaller than the maximum outside diameter ${e.maxOuterDiameter}`));
  }
  errors.push(...choiceErrors(r.choices));
  return errors;
}
