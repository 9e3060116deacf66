import type { FieldError } from '../result';
import { fieldError } from '../result';
import { findGrade } from '../materials';
import type { CoilBodySpec } from '../springs/coil-body';

/** Index below which a coil cannot be wound on an arbor at all (the spec is rejected). */
export const MINIMUM_INDEX = 2;

function diameterErrors(s: CoilBodySpec): FieldError[] {
  const given = [s.outerDiameter, s.innerDiameter, s.meanDiameter].filter((v) => v !== undefined).length;
  if (given === 1) return [];
  return [fieldError('diameter-count', 'outerDiameter',
    `give exactly one of outerDiameter, innerDiameter, meanDiameter (${given} given)`)];
}

export function meanDiameterOf(s: CoilBodySpec): { D: number; path: string } {
  if (s.outerDiameter !== undefined) return { D: s.outerDiameter - s.wireDiameter, path: 'outerDiameter' };
  if (s.innerDiameter !== undefined) return { D: s.innerDiameter + s.wireDiameter, path: 'innerDiameter' };
  return { D: s.meanDiameter ?? Number.NaN, path: 'meanDiameter' };
}

/** Wire grade known, exactly one coil diameter, and an index a coil can be wound at. */
export function coilBodyErrors(s: CoilBodySpec): FieldError[] {
  const errors: FieldError[] = [];
  if (!findGrade(s.material)) {
    errors.push(fieldError('unknown-material', 'material', `unknown wire grade "${s.material}" (see the materials list)`));
  }
  errors.push(...diameterErrors(s));
  if (errors.length > 0) return errors;
  const { D, path } = meanDiameterOf(s);
  if (!(D / s.wireDiameter >= MINIMUM_INDEX)) {
    errors.push(fieldError('index-too-small', path,
      `spring index D/d = ${(D / s.wireDiameter).toPrecision(3)} is below ${MINIMUM_INDEX}: the coil cannot be wound`));
  }
  return errors;
}
