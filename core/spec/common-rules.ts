import type { FieldError } from '../result';
import { fieldError } from '../result';
import { findGrade } from '../materials';
import type { CoilBodySpec } from '../springs/coil-body';
import { diameterField, diameterGiven, meanDiameterOf } from '../springs/coil-body';
import { wireProperties } from '../materials/properties';
import { toInternal } from '../units';
import { POISSON_RATIO } from './bounds';

/** Index below which a coil cannot be wound on an arbor at all (the spec is rejected). */
export const MINIMUM_INDEX = 2;

/** How many of the values are given (the rules count the alternatives a spec may give only one of). */
export const givenCount = (a: unknown, b: unknown, c?: unknown): number =>
  (a !== undefined ? 1 : 0) + (b !== undefined ? 1 : 0) + (c !== undefined ? 1 : 0);

function diameterErrors(s: CoilBodySpec, out: FieldError[]): void {
  const given = givenCount(s.outerDiameter, s.innerDiameter, s.meanDiameter);
  if (given === 1) return;
  out.push(fieldError('diameter-count', 'outerDiameter',
    `give exactly one of outerDiameter, innerDiameter, meanDiameter (${given} given)`));
}

/** A given shear or elastic modulus must pair with the other (given or the grade's) as a metal's moduli do. */
function modulusPairErrors(s: CoilBodySpec, out: FieldError[]): void {
  const o = s.materialOverrides;
  if (o?.shearModulus === undefined && o?.elasticModulus === undefined) return;
  const stress = (v: number | undefined) => (v === undefined ? undefined : toInternal(v, 'stress', s.units));
  const w = wireProperties(s.material, toInternal(s.wireDiameter, 'length', s.units), {
    ...(o.shearModulus !== undefined ? { shearModulus: stress(o.shearModulus) } : {}),
    ...(o.elasticModulus !== undefined ? { elasticModulus: stress(o.elasticModulus) } : {}),
  });
  if (!w) return;
  const nu = w.props.elasticModulus / (2 * w.props.shearModulus) - 1;
  if (nu >= POISSON_RATIO.min && nu <= POISSON_RATIO.max) return;
  const path = o.shearModulus !== undefined ? 'materialOverrides.shearModulus' : 'materialOverrides.elasticModulus';
  out.push(fieldError('moduli-do-not-pair', path,
    `G and E give Poisson's ratio ${nu.toPrecision(3)}, outside ${POISSON_RATIO.min}–${POISSON_RATIO.max}: ${POISSON_RATIO.reason}; check the certificate values and their units`));
}

/**
 * Wire grade known, exactly one coil diameter, and an index a coil can be wound at; each problem is added to
 * `errors` (a spec is checked on every parse, so the rules add to one list rather than build their own).
 */
export function coilBodyErrors(s: CoilBodySpec, errors: FieldError[]): void {
  const before = errors.length;
  if (!findGrade(s.material)) {
    errors.push(fieldError('unknown-material', 'material', `unknown wire grade "${s.material}" (see the materials list)`));
  }
  diameterErrors(s, errors);
  if (errors.length > before) return;
  modulusPairErrors(s, errors);
  const D = meanDiameterOf(s);
  if (!(D / s.wireDiameter >= MINIMUM_INDEX)) {
    errors.push(fieldError('index-too-small', diameterField[diameterGiven(s)],
      `spring index D/d = ${(D / s.wireDiameter).toPrecision(3)} is below ${MINIMUM_INDEX}: the coil cannot be wound`));
  }
}
