import type { FieldError } from '../result';
import { fieldError } from '../result';
import { findGrade } from '../materials';
import type { CompressionRequirement } from './schema';

/** The loads as (length, force, path), longest length first. */
function loadPoints(r: CompressionRequirement): { length: number; force: number; path: string }[] {
  const f = r.function;
  if (f.type === 'load-and-rate') return [{ length: f.load.length, force: f.load.force, path: 'function.load' }];
  const points = f.loads.map((l, i) => ({ length: l.length, force: l.force, path: `function.loads[${i}]` }));
  return points.sort((a, b) => b.length - a.length);
}

function functionErrors(r: CompressionRequirement): FieldError[] {
  if (r.function.type !== 'two-loads') return [];
  const [long, short] = loadPoints(r) as [{ length: number; force: number; path: string }, { length: number; force: number; path: string }];
  if (long.length === short.length) {
    return [fieldError('equal-load-lengths', 'function.loads[1].length', 'the two loads are at the same length: give two different lengths')];
  }
  if (short.force <= long.force) {
    return [fieldError('force-not-rising', `${short.path}.force`,
      `a compression spring gives more force at the shorter length: ${short.force} at ${short.length} is not above ${long.force} at ${long.length}`)];
  }
  return [];
}

function envelopeErrors(r: CompressionRequirement): FieldError[] {
  const e = r.envelope;
  const errors: FieldError[] = [];
  const outer = Math.min(e.bore ?? Infinity, e.maxOuterDiameter ?? Infinity);
  const inner = Math.max(e.rod ?? 0, e.minInnerDiameter ?? 0);
  if (outer <= inner) {
    const path = e.bore !== undefined && e.bore <= inner ? 'envelope.bore' : 'envelope.maxOuterDiameter';
    errors.push(fieldError('envelope-closed', path, `the outside limit ${outer} is not above the inside limit ${inner}: no coil fits between them`));
  }
  const longest = Math.max(...loadPoints(r).map((p) => p.length), ...(r.duty.type === 'cyclic' ? r.duty.between : []));
  if (e.maxFreeLength !== undefined && e.maxFreeLength <= longest) {
    errors.push(fieldError('free-length-below-working-length', 'envelope.maxFreeLength',
      `the maximum free length ${e.maxFreeLength} is not above the longest working length ${longest}`));
  }
  const shortest = Math.min(...loadPoints(r).map((p) => p.length), ...(r.duty.type === 'cyclic' ? r.duty.between : []));
  if (e.maxSolidLength !== undefined && e.maxSolidLength >= shortest) {
    errors.push(fieldError('solid-length-above-working-length', 'envelope.maxSolidLength',
      `the maximum solid length ${e.maxSolidLength} is not below the shortest working length ${shortest}: it does not limit the design`));
  }
  return errors;
}

function dutyErrors(r: CompressionRequirement): FieldError[] {
  if (r.duty.type !== 'cyclic') return [];
  if (r.duty.between[0] === r.duty.between[1]) {
    return [fieldError('no-stroke', 'duty.between[1]', 'the two working lengths are equal: no stroke to cycle')];
  }
  return [];
}

/** The choices every kind's requirement shares: known grades, and a main quantity among the breaks. */
export function choiceErrors(c: Pick<CompressionRequirement['choices'], 'grades' | 'mainQuantity' | 'quantities'>): FieldError[] {
  const errors: FieldError[] = [];
  (c.grades ?? []).forEach((g, i) => {
    if (!findGrade(g)) errors.push(fieldError('unknown-grade', `choices.grades[${i}]`, `unknown wire grade "${g}"`));
  });
  if (c.mainQuantity !== undefined && c.quantities !== undefined && !c.quantities.includes(c.mainQuantity)) {
    errors.push(fieldError('main-quantity-not-a-break', 'choices.mainQuantity',
      `the main quantity ${c.mainQuantity} is not one of the quantity breaks ${c.quantities.join(', ')}`));
  }
  return errors;
}

/** Contradictions the schema cannot express, each naming its field. */
export function compressionRequirementErrors(r: CompressionRequirement): FieldError[] {
  return [...functionErrors(r), ...envelopeErrors(r), ...dutyErrors(r), ...choiceErrors(r.choices)];
}
