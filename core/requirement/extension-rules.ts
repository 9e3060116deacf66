import type { FieldError } from '../result';
import { fieldError } from '../result';
import { choiceErrors } from './rules';
import type { ExtensionRequirement } from './extension';

/** Contradictions of an extension requirement the schema cannot express, each naming its field. */
export function extensionRequirementErrors(r: ExtensionRequirement): FieldError[] {
  const errors: FieldError[] = [];
  const [a, b] = r.function.loads;
  const [shorter, longer] = a.length < b.length ? [{ l: a, i: 0 }, { l: b, i: 1 }] : [{ l: b, i: 1 }, { l: a, i: 0 }];
  if (a.length === b.length) errors.push(fieldError('equal-load-lengths', 'function.loads[1].length', 'the two loads are at the same length: give two different lengths'));
  else if (longer.l.force <= shorter.l.force) {
    errors.push(fieldError('force-not-rising', `function.loads[${longer.i}].force`,
      `an extension spring gives more force at the longer length: ${longer.l.force} at ${longer.l.length} is not above ${shorter.l.force} at ${shorter.l.length}`));
  }
  const e = r.envelope;
  if (e.maxFreeLength !== undefined && e.maxFreeLength >= shorter.l.length) {
    errors.push(fieldError('free-length-above-working-length', 'envelope.maxFreeLength',
      `the maximum free length ${e.maxFreeLength} is not below the shortest working length ${shorter.l.length}: it does not limit the design`));
  }
  const t = r.initialTension;
  if (t?.min !== undefined && t.max !== undefined && t.max < t.min) {
    errors.push(fieldError('window-reversed', 'initialTension.max', 'the largest initial tension is below the smallest'));
  }
  if (r.duty.type === 'cyclic' && r.duty.between[0] === r.duty.between[1]) {
    errors.push(fieldError('no-stroke', 'duty.between[1]', 'the two working lengths are equal: no stroke to cycle'));
  }
  errors.push(...choiceErrors(r.choices));
  return errors;
}
