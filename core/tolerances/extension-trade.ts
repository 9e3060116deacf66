/**
 * North-American trade ("commercial") extension-spring free length inside the ends and relative loop
 * position. Inch bands as printed; lengths in and out in mm.
 */
import { MM_PER_IN } from '../units';
import type { Band } from './bands';
import { findBand } from './bands';
import type { Lookup } from './lookup';
import { checkPositive, found, notFound } from './lookup';

const inch = (over: number, upTo: number, plusMinus: number) => ({ over: over * MM_PER_IN, upTo: upTo * MM_PER_IN, plusMinus });

export const extensionFreeLengthTable = {
  source: 'trade extension-spring free-length table (inside ends) as reprinted by katyspring.com; ' +
    'common trade practice. The page prints "0.5–1 in"; a length on an edge is read into the lower band',
  verified: false,
  /** Bands in mm (converted from the printed inches); ± in as printed. */
  rows: [
    inch(0, 0.5, 0.020), inch(0.5, 1, 0.030), inch(1, 2, 0.040), inch(2, 4, 0.060),
    inch(4, 8, 0.093), inch(8, 16, 0.156), inch(16, 24, 0.218),
  ] as readonly (Band & { plusMinus: number })[],
} as const;

/** ± mm on the free length inside the ends of a commercial extension spring of free length L0 (mm). */
export function extensionFreeLengthTolerance(input: { L0: number }): Lookup<number> {
  const bad = checkPositive({ L0: input.L0 });
  if (bad) return bad;
  const row = findBand(extensionFreeLengthTable.rows, input.L0, false);
  if (!row) return notFound('outside-table', 'L0', 'free lengths over 24 in are outside the trade table: by agreement');
  return found(row.plusMinus * MM_PER_IN, extensionFreeLengthTable);
}

export const loopPositionTable = {
  source: 'relative loop position, commercial, as published by stock-springs-australia (technical info); ' +
    'common trade practice. Band edges between the printed whole-coil ranges are read into the lower band',
  verified: false,
  rows: [
    { over: 3, upTo: 5, degrees: 20 }, { over: 5, upTo: 8, degrees: 30 }, { over: 8, upTo: 12, degrees: 40 },
  ] as readonly (Band & { degrees: number })[],
  /** Beyond the last band: degrees added per extra coil. */
  perExtraCoil: 1.5,
} as const;

/** ± degrees between the two loops' planes for a spring of `totalCoils` coils. */
export function loopPositionTolerance(input: { totalCoils: number }): Lookup<number> {
  const n = input.totalCoils;
  const bad = checkPositive({ totalCoils: n });
  if (bad) return bad;
  const t = loopPositionTable;
  const last = t.rows[t.rows.length - 1] as Band & { degrees: number };
  if (n > last.upTo) return found(last.degrees + t.perExtraCoil * (n - last.upTo), t);
  const row = findBand(t.rows, n, true);
  if (!row) return notFound('outside-table', 'totalCoils', `${n} coils is under the table's 3: loop position by agreement`);
  return found(row.degrees, t);
}
