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
  /** Null when the Zimmerli lines do not reach the wire (see `zimmerliReaches`) or the cycle carries no stress. */
  goodmanSafetyFactor: number | null;
  gerberSafetyFactor: number | null;
  /** Set when the duty's cycles are fewer than the endurance data stand for: the verdict is then this check's. */
  finiteLife: FiniteLife | null;
  verdict: FatigueVerdict;
}

/**
 * Goodman: Sse = Ssa/(1 − Ssm/Ssu); nf = 1/(τa/Sse + |τm|/Ssu), for Ssm < Ssu. A shear stress's sign only gives
 * its direction, so the mean enters by its size (as through the sign-free von Mises stress, Shigley 9e §6-14,
 * from memory). With no alternating stress the load line runs along the mean axis: nf = Ssu/|τm|.
 */
export function goodmanSafetyFactor(ta: number, tm: number, ssa: number, ssm: number, ssu: number): number {
  const sse = ssa / (1 - ssm / ssu);
  return 1 / (ta / sse + Math.abs(tm) / ssu);
}

/**
 * Gerber: Sse = Ssa/(1 − (Ssm/Ssu)²); nf = ½(Ssu/τm)²(τa/Sse)[−1 + √(1 + (2τm·Sse/(Ssu·τa))²)] (Shigley 9e §10-9),
 * for Ssm < Ssu, worked in the equal form nf = 2/(a + √(a² + b²)), a = τa/Sse, b = 2τm/Ssu: no cancellation as
 * τm → 0 (nf → Sse/τa) and no 0·∞ at τa = 0 (nf = Ssu/|τm|, as on the Goodman line).
 */
export function gerberSafetyFactor(ta: number, tm: number, ssa: number, ssm: number, ssu: number): number {
  const a = ta / (ssa / (1 - (ssm / ssu) ** 2));
  return 2 / (a + Math.hypot(a, (2 * tm) / ssu));
}

/**
 * The Goodman line and Gerber parabola run from the endurance intercept to Ssu through the Zimmerli point, so
 * they exist only while the point's mean stress is below Ssu: not so for wire under about 566 MPa (797 MPa
 * peened), softer than the spring steels the data were taken on.
 */
export const zimmerliReaches = (enduranceMean: number, ultimateShear: number): boolean => enduranceMean < ultimateShear;

export interface InfiniteLifeCheck {
  goodman: number | null;
  gerber: number | null;
  verdict: FatigueVerdict;
}

/** A factor with no bound (no stress anywhere in the cycle) has no number to show. */
const bounded = (n: number): number | null => (Number.isFinite(n) ? n : null);

/**
 * The infinite-life check on the Zimmerli lines. Where the lines do not reach the wire, infinite life cannot be
 * shown and the verdict is a fail with no factors; a cycle with no stress passes with none.
 */
export function infiniteLifeCheck(ta: number, tm: number, peened: boolean, ssu: number): InfiniteLifeCheck {
  const point = peened ? zimmerli.peened : zimmerli.unpeened;
  if (!zimmerliReaches(point.mean, ssu)) return { goodman: null, gerber: null, verdict: 'fail' };
  const goodman = bounded(goodmanSafetyFactor(ta, tm, point.alternating, point.mean, ssu));
  const gerber = bounded(gerberSafetyFactor(ta, tm, point.alternating, point.mean, ssu));
  const verdict: FatigueVerdict = goodman === null || goodman >= fatigueCriteria.goodmanPass ? 'pass'
    : gerber !== null && gerber >= fatigueCriteria.gerberFail ? 'marginal' : 'fail';
  return { goodman, gerber, verdict };
}

/**
 * Corrected stresses at the two ends of the working stroke, tensile strength, surface condition, and the
 * finite-life check if any, which takes the larger stress of the cycle by its size (a shear stress's sign is
 * only its direction).
 */
export function fatigueCheck(stressA: number, stressB: number, tensileStrength: number, peened: boolean, life: FiniteLife | null = null): FatigueResult {
  const stressMin = Math.min(stressA, stressB);
  const stressMax = Math.max(stressA, stressB);
  const ta = (stressMax - stressMin) / 2;
  const tm = (stressMax + stressMin) / 2;
  const point = peened ? zimmerli.peened : zimmerli.unpeened;
  const ssu = TORSIONAL_ULTIMATE_RATIO * tensileStrength;
  const infinite = infiniteLifeCheck(ta, tm, peened, ssu);
  return {
    stressMin, stressMax, stressAlternating: ta, stressMean: tm, stressRange: stressMax - stressMin,
    ultimateShear: ssu, enduranceAlternating: point.alternating, enduranceMean: point.mean, peened,
    goodmanSafetyFactor: infinite.goodman, gerberSafetyFactor: infinite.gerber, finiteLife: life,
    verdict: life ? (Math.max(stressMax, -stressMin) <= life.limit ? 'pass' : 'fail') : infinite.verdict,
  };
}

/** Units of a fatigue result's fields, for converting reports out. */
export const fatigueQuantities: QuantityMap = {
  stressMin: 'stress', stressMax: 'stress', stressAlternating: 'stress', stressMean: 'stress',
  stressRange: 'stress', ultimateShear: 'stress', enduranceAlternating: 'stress', enduranceMean: 'stress',
  goodmanSafetyFactor: 'ratio', gerberSafetyFactor: 'ratio',
  finiteLife: { limit: 'stress', cycles: 'count', fraction: 'ratio' },
};
