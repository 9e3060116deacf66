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
import type { GradeFamily } from '../materials/types';

/** The Zimmerli data and the cyclic tables are for spring steels; there is no row for non-ferrous wire. */
export const hasSteelFatigueData = (family: GradeFamily): boolean => family !== 'non-ferrous';

/** Cycles the infinite-life data stand for: the last column of the cyclic tables below (10⁷). */
export const ENDURANCE_CYCLES = 1e7;

/**
 * Maximum allowable torsional stress in cyclic use, stress ratio 0, as a fraction of Sut, at 10⁵, 10⁶ and 10⁷
 * cycles, [not peened, peened] (Associated Spring data for ASTM A228 and type 302; from memory).
 * Compression: Shigley 9e Table 10-8's companion table for compression springs; extension body: Table 10-8.
 */
export const finiteLifeTables = {
  compression: {
    columns: [[0.36, 0.42], [0.33, 0.39], [0.3, 0.36]] as const,
    source: 'Associated Spring cyclic table for compression springs (A228 and 302, stress ratio 0), as in Shigley 9e, from memory',
  },
  extension: {
    columns: [[0.36, 0.36], [0.33, 0.33], [0.3, 0.3]] as const,
    source: 'Shigley 9e Table 10-8, extension body, not peened (A228 and 302, stress ratio 0), from memory',
  },
} as const;

export interface FiniteLife {
  cycles: number;
  fraction: number;
  limit: number;
  source: string;
}

/**
 * The allowable for fewer cycles than the endurance data stand for; null at or beyond it. Below 10⁵ the 10⁵
 * column holds (errs low); between columns the fraction is linear in log(cycles) (common practice). The
 * tables are for stress ratio 0, so the check takes the maximum stress of the cycle (errs safe for a preload).
 */
export function finiteLife(kind: keyof typeof finiteLifeTables, cycles: number, peened: boolean, tensileStrength: number): FiniteLife | null {
  if (!(cycles < ENDURANCE_CYCLES)) return null;
  const t = finiteLifeTables[kind];
  const column = (i: number) => t.columns[i]![peened ? 1 : 0];
  const x = Math.max(0, Math.log10(cycles) - 5);
  const i = Math.min(1, Math.floor(x));
  const fraction = column(i) + (x - i) * (column(i + 1) - column(i));
  return { cycles, fraction, limit: fraction * tensileStrength, source: t.source };
}

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
  /** Set when the duty's cycles are fewer than the endurance data stand for: the verdict is then this check's. */
  finiteLife: FiniteLife | null;
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

/** Corrected stresses at the two ends of the working stroke, tensile strength, surface condition, and the finite-life check if any. */
export function fatigueCheck(stressA: number, stressB: number, tensileStrength: number, peened: boolean, life: FiniteLife | null = null): FatigueResult {
  const stressMin = Math.min(stressA, stressB);
  const stressMax = Math.max(stressA, stressB);
  const ta = (stressMax - stressMin) / 2;
  const tm = (stressMax + stressMin) / 2;
  const point = peened ? zimmerli.peened : zimmerli.unpeened;
  const ssu = TORSIONAL_ULTIMATE_RATIO * tensileStrength;
  const goodman = ta === 0 ? Number.POSITIVE_INFINITY : goodmanSafetyFactor(ta, tm, point.alternating, point.mean, ssu);
  const gerber = ta === 0 ? Number.POSITIVE_INFINITY : gerberSafetyFactor(ta, tm, point.alternating, point.mean, ssu);
  const verdict: FatigueVerdict = life ? (stressMax <= life.limit ? 'pass' : 'fail')
    : goodman >= fatigueCriteria.goodmanPass ? 'pass' : gerber >= fatigueCriteria.gerberFail ? 'marginal' : 'fail';
  return {
    stressMin, stressMax, stressAlternating: ta, stressMean: tm, stressRange: stressMax - stressMin,
    ultimateShear: ssu, enduranceAlternating: point.alternating, enduranceMean: point.mean, peened,
    goodmanSafetyFactor: goodman, gerberSafetyFactor: gerber, finiteLife: life, verdict,
  };
}

/** Units of a fatigue result's fields, for converting reports out. */
export const fatigueQuantities: QuantityMap = {
  stressMin: 'stress', stressMax: 'stress', stressAlternating: 'stress', stressMean: 'stress',
  stressRange: 'stress', ultimateShear: 'stress', enduranceAlternating: 'stress', enduranceMean: 'stress',
  goodmanSafetyFactor: 'ratio', gerberSafetyFactor: 'ratio',
  finiteLife: { limit: 'stress', cycles: 'count', fraction: 'ratio' },
};
