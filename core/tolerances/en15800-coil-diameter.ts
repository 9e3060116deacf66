/**
 * EN 15800 coil-diameter deviation A_D (± mm), applied to D, De or Di, whichever the drawing controls.
 * Extension springs to DIN 2097 use the same table.
 */
import { reviewLimits } from '../review/limits';
import type { Band } from './bands';
import { findBand } from './bands';
import type { Lookup, ToleranceGrade } from './lookup';
import { checkPositive, found, notFound } from './lookup';

/** Deviations for the index bands w 4–8, over 8–14, over 14–20; null where no public reprint was found. */
type ByIndex = readonly [number, number, number] | null;

export interface CoilDiameterRow extends Band {
  grades: Readonly<Record<ToleranceGrade, ByIndex>>;
  source: string;
}

const DIN_2095 = 'DIN 2095 coil-diameter table as reprinted by industrial-springs.com (compression-spring tolerances FAQ), ' +
  'agreeing row for row with the DIN 2097 table at blog.federnshop.com; that EN 15800 kept these values is from memory';
const DIN_2097_G2 = 'DIN 2097 coil-diameter table, grade 2, as reprinted by blog.federnshop.com (tension-spring tolerances)';

const w = reviewLimits.en15800.w;
export const indexBands: readonly Band[] = [{ over: w.min, upTo: 8 }, { over: 8, upTo: 14 }, { over: 14, upTo: w.max }];

type Printed = readonly [number, number, ByIndex, ByIndex, ByIndex];
const printed: readonly Printed[] = [
  [0.63, 1.0, [0.05, 0.07, 0.10], [0.07, 0.10, 0.15], [0.10, 0.15, 0.20]],
  [1.0, 1.6, [0.05, 0.07, 0.10], [0.08, 0.10, 0.15], [0.15, 0.20, 0.30]],
  [1.6, 2.5, [0.07, 0.10, 0.15], [0.10, 0.15, 0.20], [0.20, 0.30, 0.40]],
  [2.5, 4.0, [0.10, 0.10, 0.15], [0.15, 0.20, 0.25], [0.30, 0.40, 0.50]],
  [4.0, 6.3, [0.10, 0.15, 0.20], [0.20, 0.25, 0.30], [0.40, 0.50, 0.60]],
  [6.3, 10, [0.15, 0.15, 0.20], [0.25, 0.30, 0.35], [0.50, 0.60, 0.70]],
  [10, 16, [0.15, 0.20, 0.25], [0.30, 0.35, 0.40], [0.60, 0.70, 0.80]],
  [16, 25, [0.20, 0.25, 0.30], [0.35, 0.45, 0.50], [0.70, 0.90, 1.00]],
  [25, 31.5, [0.25, 0.30, 0.35], [0.40, 0.50, 0.60], [0.80, 1.00, 1.20]],
  [31.5, 40, [0.25, 0.30, 0.35], [0.50, 0.60, 0.70], [1.00, 1.20, 1.50]],
  [40, 50, [0.30, 0.40, 0.50], [0.60, 0.80, 0.90], [1.20, 1.50, 1.80]],
  [50, 63, [0.40, 0.50, 0.60], [0.80, 1.00, 1.10], [1.50, 2.00, 2.30]],
  [63, 80, null, [1.00, 1.20, 1.40], null],
  [80, 100, null, [1.20, 1.50, 1.70], null],
  [100, 125, null, [1.40, 1.90, 2.20], null],
  [125, 160, null, [1.80, 2.30, 2.70], null],
  [160, 200, null, [2.10, 2.90, 3.30], null],
];

export const coilDiameterTable = {
  source: `${DIN_2095}; grade 2 above 63 mm: ${DIN_2097_G2}`,
  verified: false,
  rows: printed.map(([over, upTo, g1, g2, g3]): CoilDiameterRow => ({
    over, upTo, grades: { 1: g1, 2: g2, 3: g3 }, source: upTo <= 63 ? DIN_2095 : DIN_2097_G2,
  })),
} as const;

const BY_AGREEMENT = 'the coil-diameter tolerance is by agreement';

/** A_D (± mm) for mean diameter D (mm), spring index w = D/d and grade; no grade stated means grade 2. */
export function coilDiameterTolerance(input: { D: number; index: number; grade?: ToleranceGrade }): Lookup<number> {
  const { D, index, grade = 2 } = input;
  const bad = checkPositive({ D, index });
  if (bad) return bad;
  const row = findBand(coilDiameterTable.rows, D, true);
  if (!row) {
    const { min, max } = reviewLimits.en15800.D;
    return notFound('outside-en15800-scope', 'D', `D = ${D} mm is outside EN 15800 (${min}–${max} mm): ${BY_AGREEMENT}`);
  }
  const band = findBand(indexBands, index, true);
  if (!band) {
    return notFound('outside-en15800-scope', 'index',
      `spring index ${index} is outside EN 15800 (${w.min}–${w.max}): ${BY_AGREEMENT}`);
  }
  const cells = row.grades[grade];
  if (!cells) {
    return notFound('not-in-public-table', 'grade',
      `no public reprint gives grade ${grade} for D over ${row.over} up to ${row.upTo} mm: take it from EN 15800, or ${BY_AGREEMENT}`);
  }
  return found(cells[indexBands.indexOf(band)] as number, { source: row.source, verified: coilDiameterTable.verified });
}
