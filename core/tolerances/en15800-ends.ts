/**
 * EN 15800 perpendicularity e1 (spring axis to seat, over L0) and parallelism e2 (ground end faces,
 * over De), for closed-and-ground ends only. The factors are the tangents of the angles.
 */
import type { Lookup, ToleranceGrade } from './lookup';
import { checkPositive, found, notFound } from './lookup';

export interface EndSquarenessRow {
  e1Factor: number;
  e1Degrees: number;
  e2Factor: number;
  e2Degrees: number;
}

export const endSquarenessTable = {
  source: 'EN 15800 / DIN 2095 e1 and e2 by grade, from memory',
  verified: false,
  grades: {
    1: { e1Factor: 0.026, e1Degrees: 1.5, e2Factor: 0.015, e2Degrees: 0.9 },
    2: { e1Factor: 0.052, e1Degrees: 3, e2Factor: 0.030, e2Degrees: 1.7 },
    3: { e1Factor: 0.087, e1Degrees: 5, e2Factor: 0.047, e2Degrees: 2.7 },
  } satisfies Record<ToleranceGrade, EndSquarenessRow>,
  /** Beyond this L0/D the values are commonly not applied (from memory). */
  maxSlenderness: 5,
} as const;

export interface EndSquareness {
  /** e1 in mm and as an angle. */
  perpendicularity: number;
  perpendicularityDegrees: number;
  /** e2 in mm and as an angle. */
  parallelism: number;
  parallelismDegrees: number;
}

/** e1 and e2 for free length L0, mean diameter D and wire d (mm); unground ends have none. */
export function endSquarenessTolerance(input: {
  L0: number; D: number; d: number; grade?: ToleranceGrade; groundEnds: boolean;
}): Lookup<EndSquareness> {
  const { L0, D, d, grade = 2, groundEnds } = input;
  const bad = checkPositive({ L0, D, d });
  if (bad) return bad;
  if (!groundEnds) {
    return notFound('ends-not-ground', 'groundEnds',
      'EN 15800 gives e1 and e2 for ground ends only: squareness of unground ends is by agreement');
  }
  const limit = endSquarenessTable.maxSlenderness;
  if (L0 / D > limit) {
    return notFound('slenderness-beyond-scope', 'L0',
      `L0/D = ${(L0 / D).toFixed(1)} is above ${limit}: e1 and e2 are by agreement for slender springs`);
  }
  const row = endSquarenessTable.grades[grade];
  return found({
    perpendicularity: row.e1Factor * L0,
    perpendicularityDegrees: row.e1Degrees,
    parallelism: row.e2Factor * (D + d),
    parallelismDegrees: row.e2Degrees,
  }, endSquarenessTable);
}
