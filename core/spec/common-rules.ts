import type { FieldError } from '../result';
import { fieldError } from '../result';
import { findGrade } from '../materials';
import type { CoilBodySpec } from '../springs/coil-body';
import { wireProperties } from '../materials/properties';
import { toInternal } from '../units';
import { POISSON_RATIO } from './bounds';

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

/** A given shear or elastic modulus must pair with the other (given or the grade's) as a metal's moduli do. */
function modulusPairErrors(s: CoilBodySpec): FieldError[] {
  const o = s.materialOverrides;
  if (o?.shearModulus === undefined && o?.elasticModulus === undefined) return [];
  const stress = (v: number | undefined) => (v === undefined ? undefined : toInternal(v, 'stress', s.units));
  const w = wireProperties(s.material, toInternal(s.wireDiameter, 'length', s.units), {
    ...(o.shearModulus !== undefined ? { shearModulus: stress(o.shearModulus) } : {}),
    ...(o.elasticModulus !== undefined ? { elasticModulus: stress(o.elasticModulus) } : {}),
  });
  if (!w) return [];
  const nu = w.props.elasticModulus / (2 * w.props.shearModulus) - 1;
  if (nu >= POISSON_RATIO.min && nu <= POISSON_RATIO.max) return [];
  const path = o.shearModulus !== undefined ? 'materialOverrides.shearModulus' : 'materialOverrides.elasticModulus';
  return [fieldError('moduli-do-not-pair', path,
    `G and E give Poisson's ratio ${nu.toPrecision(3)}, outside ${POISSON_RATIO.min}–${POISSON_RATIO.max}: ${POISSON_RATIO.reason}; check the certificate values and their units`)];
}

/** Wire grade known, exactly one coil diameter, and an index a coil can be wound at. */
export function coilBodyErrors(s: CoilBodySpec): FieldError[] {
  const errors: FieldError[] = [];
  if (!findGrade(s.material)) {
    errors.push(fieldError('unknown-material', 'material', `unknown wire grade "${s.material}" (see the materials list)`));
  }
  errors.push(...diameterErrors(s));
  if (errors.length > 0) return errors;
  errors.push(...modulusPairErrors(s));
  const { D, path } = meanDiameterOf(s);
  if (!(D / s.wireDiameter >= MINIMUM_INDEX)) {
    errors.push(fieldError('index-too-small', path,
      `spring index D/d = ${(D / s.wireDiameter).toPrecision(3)} is below ${MINIMUM_INDEX}: the coil cannot be wound`));
  }
  return errors;
}
