/** DIN 2097 extension springs: length L0 (inside the eyes) tolerance, grade 2 only in the public reprint. */
import type { Band } from './bands';
import { findBand } from './bands';
import type { Lookup, ToleranceGrade } from './lookup';
import { checkPositive, found, notFound } from './lookup';

export interface ExtensionLengthRow extends Band {
  /** ± mm for w 4–8 and over 8–20; or, on the open-ended last row, a percentage of L0. */
  plusMinus: readonly [number, number] | null;
  percentOfL0: number | null;
}

const mm = (over: number, upTo: number, a: number, b: number): ExtensionLengthRow =>
  ({ over, upTo, plusMinus: [a, b], percentOfL0: null });

export const din2097LengthTable = {
  source: 'DIN 2097 L0 tolerance, grade 2, as reprinted by industrial-springs.com (extension-spring tolerances FAQ)',
  verified: false,
  grade: 2 as ToleranceGrade,
  indexBands: [{ over: 4, upTo: 8 }, { over: 8, upTo: 20 }] as readonly Band[],
  rows: [
    mm(0, 10, 0.40, 0.50), mm(10, 16, 0.50, 0.60), mm(16, 25, 0.60, 0.70), mm(25, 40, 0.80, 0.90),
    mm(40, 63, 1.10, 1.30), mm(63, 100, 1.50, 1.80), mm(100, 160, 2.00, 2.40), mm(160, 250, 2.50, 3.00),
    mm(250, 400, 3.00, 4.00),
    { over: 400, upTo: Infinity, plusMinus: null, percentOfL0: 1.5 },
  ] as readonly ExtensionLengthRow[],
} as const;

/** ± mm on L0 of a DIN 2097 extension spring; grades other than 2 are not in the public reprint. */
export function din2097LengthTolerance(input: { L0: number; index: number; grade?: ToleranceGrade }): Lookup<number> {
  const { L0, index, grade = 2 } = input;
  const bad = checkPositive({ L0, index });
  if (bad) return bad;
  const t = din2097LengthTable;
  if (grade !== t.grade) {
    return notFound('not-in-public-table', 'grade',
      `only grade 2 of the DIN 2097 length table was found in public material: grade ${grade} is by agreement`);
  }
  const band = findBand(t.indexBands, index, true);
  if (!band) return notFound('outside-table', 'index', `index ${index} is outside DIN 2097 (4–20): by agreement`);
  const row = findBand(t.rows, L0, false);
  if (!row) return notFound('outside-table', 'L0', `L0 = ${L0} mm is not a length the table covers`);
  const value = row.percentOfL0 !== null ? (row.percentOfL0 / 100) * L0 : (row.plusMinus?.[t.indexBands.indexOf(band)] as number);
  return found(value, t);
}
