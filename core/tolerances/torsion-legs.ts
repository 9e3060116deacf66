/**
 * Leg-length limits of a torsion spring. No published torsion-spring table was obtained (DIN 2194 not at
 * hand), so leg lengths follow the shop's general wire-forming limits: ± % of the length, never under a floor.
 * The figures are demo defaults for the shop to replace, not sourced values.
 */
import type { Lookup, ToleranceGrade } from './lookup';
import { checkPositive, found } from './lookup';

export const legLengthTable = {
  source: 'demo defaults, shop to set: general wire-forming limits (no published torsion-spring table used)',
  verified: false,
  /** By grade: ± % of the leg length, and the least ± mm. */
  grades: { 1: { percent: 1, minimumMm: 0.3 }, 2: { percent: 2, minimumMm: 0.5 }, 3: { percent: 3, minimumMm: 0.8 } },
} as const;

/** ± mm on a leg of `length` mm at the tolerance grade. */
export function legLengthTolerance(input: { length: number; grade: ToleranceGrade }): Lookup<number> {
  const bad = checkPositive({ length: input.length });
  if (bad) return bad;
  const g = legLengthTable.grades[input.grade];
  return found(Math.max((input.length * g.percent) / 100, g.minimumMm), legLengthTable);
}
