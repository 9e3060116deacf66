/**
 * Infinite-life fatigue check of helical spring wire in torsion with the Zimmerli data
 * (Shigley 9e §10-9): one point of the repeated-loading failure line, independent of size, material and
 * strength for the common spring steels under 10 mm.
 */
export const zimmerli = {
  unpeened: { alternating: 241, mean: 379 },
  peened: { alternating: 398, mean: 534 },
  source: 'Shigley 9e §10-9 (Zimmerli); MPa',
} as const;

/** Torsional ultimate strength (modulus of rupture) Ssu = 0.67·Sut, Shigley 9e §10-9. */
export const TORSIONAL_ULTIMATE_RATIO = 0.67;

/**
 * Verdict thresholds on the safety factors: common trade practice (design factor 1.2 on the conservative
 * Goodman line; below 1.0 on the Gerber line, which fits test data, failure is expected).
 */
export const fatigueCriteria = { goodmanPass: 1.2, gerberFail: 1.0, source: 'common trade practice' } as const;

import type { QuantityMap } from '../units';

export type FatigueVerdict = 'pass' | 'marginal' | 'fail';

export interface FatigueResult {
  stressMin: number;
  stressMax: number;
  stressAlternating: number;
  stressMean: number;
  stressRange: number;
  ultimateShear: number;
  enduranceAlternating: number;
  enduranceMean: number;
  peened: boolean;
  goodmanSafetyFactor: number;
  gerberSafetyFactor: number;
  verdict: FatigueVerdict;
}

/** Goodman: Sse = Ssa/(1 − Ssm/Ssu); nf = 1/(τa/Sse + τm/Ssu). */
export function goodmanSafetyFactor(ta: number, tm: number, ssa: number, ssm: number, ssu: number): number {
  const sse = ssa / (1 - ssm / ssu);
  return 1 / (ta / sse + tm / ssu);
}

/** Gerber: Sse = Ssa/(1 − (Ssm/Ssu)²); nf = ½(Ssu/τm)²(τa/Sse)[−1 + √(1 + (2τm·Sse/(Ssu·τa))²)]. */
export function gerberSafetyFactor(ta: number, tm: number, ssa: number, ssm: number, ssu: number): number {
  const sse = ssa / (1 - (ssm / ssu) ** 2);
  if (tm === 0) return sse / ta;
  const q = (2 * tm * sse) / (ssu * ta);
  return 0.5 * (ssu / tm) ** 2 * (ta / sse) * (-1 + Math.sqrt(1 + q * q));
}

/** Corrected stresses at the two ends of the working stroke, tensile strength, and surface condition. */
export function fatigueCheck(stressA: number, stressB: number, tensileStrength: number, peened: boolean): FatigueResult {
  const stressMin = Math.min(stressA, stressB);
  const stressMax = Math.max(stressA, stressB);
  const ta = (stressMax - stressMin) / 2;
  const tm = (stressMax + stressMin) / 2;
  const point = peened ? zimmerli.peened : zimmerli.unpeened;
  const ssu = TORSIONAL_ULTIMATE_RATIO * tensileStrength;
  const goodman = ta === 0 ? Number.POSITIVE_INFINITY : goodmanSafetyFactor(ta, tm, point.alternating, point.mean, ssu);
  const gerber = ta === 0 ? Number.POSITIVE_INFINITY : gerberSafetyFactor(ta, tm, point.alternating, point.mean, ssu);
  const verdict: FatigueVerdict =
    goodman >= fatigueCriteria.goodmanPass ? 'pass' : gerber >= fatigueCriteria.gerberFail ? 'marginal' : 'fail';
  return {
    stressMin, stressMax, stressAlternating: ta, stressMean: tm, stressRange: stressMax - stressMin,
    ultimateShear: ssu, enduranceAlternating: point.alternating, enduranceMean: point.mean, peened,
    goodmanSafetyFactor: goodman, gerberSafetyFactor: gerber, verdict,
  };
}

/** Units of a fatigue result's fields, for converting reports out. */
export const fatigueQuantities: QuantityMap = {
  stressMin: 'stress', stressMax: 'stress', stressAlternating: 'stress', stressMean: 'stress',
  stressRange: 'stress', ultimateShear: 'stress', enduranceAlternating: 'stress', enduranceMean: 'stress',
  goodmanSafetyFactor: 'ratio', gerberSafetyFactor: 'ratio',
};
