/**
 * Load and free-length tolerances as shop-editable tables (± % of the value, never less than a minimum).
 * EN 15800 derives both from factors the public material does not give, so the shop enters its own;
 * the defaults below are demo defaults only.
 */
import type { FieldError } from '../result';
import { fieldError } from '../result';
import type { Band } from './bands';
import { findBand, firstBandBreak } from './bands';
import type { Lookup, ToleranceGrade } from './lookup';
import { checkPositive, found, notFound } from './lookup';

export interface ShopToleranceRow extends Band {
  grade: ToleranceGrade;
  percent: number;
  /** Floor in the quantity's internal unit: N for load, mm for free length. */
  minimum: number;
}

export interface ShopToleranceTable {
  quantity: 'load' | 'freeLength';
  /** What the bands count: spring index w = D/d, or active coils n. */
  bandedBy: 'index' | 'activeCoils';
  rows: ShopToleranceRow[];
  source: string;
  verified: boolean;
}

const DEMO = 'demo defaults, shop to set';

const rowsFor = (grade: ToleranceGrade, bands: readonly (readonly [number, number, number, number])[]): ShopToleranceRow[] =>
  bands.map(([over, upTo, percent, minimum]) => ({ grade, over, upTo, percent, minimum }));

/** Shaped like the Chinese grade table (±5/10/15 % for 3–10 coils, ±4/8/12 % above; chinacustomspring.com reprint). */
export const demoLoadTolerances: ShopToleranceTable = {
  quantity: 'load',
  bandedBy: 'activeCoils',
  source: `${DEMO} (shaped like the cold-coiled compression-spring table reprinted at chinacustomspring.com)`,
  verified: false,
  rows: [
    ...rowsFor(1, [[3, 10, 5, 0], [10, Infinity, 4, 0]]),
    ...rowsFor(2, [[3, 10, 10, 0], [10, Infinity, 8, 0]]),
    ...rowsFor(3, [[3, 10, 15, 0], [10, Infinity, 12, 0]]),
  ],
};

/** Grade 2 starts from ±2 % (min 0.5 mm) at w 4–8 (the same chinacustomspring.com reprint); grades 1 and 3 scaled by 0.63 and 1.6. */
export const demoFreeLengthTolerances: ShopToleranceTable = {
  quantity: 'freeLength',
  bandedBy: 'index',
  source: `${DEMO} (grade-2 row after chinacustomspring.com; grade scaling after the EN 15800 factor Q, from memory)`,
  verified: false,
  rows: [
    ...rowsFor(1, [[4, 8, 1.3, 0.3], [8, 15, 1.9, 0.3], [15, 22, 2.5, 0.3]]),
    ...rowsFor(2, [[4, 8, 2, 0.5], [8, 15, 3, 0.5], [15, 22, 4, 0.5]]),
    ...rowsFor(3, [[4, 8, 3.2, 0.8], [8, 15, 4.8, 0.8], [15, 22, 6.4, 0.8]]),
  ],
};

/** Bands of each grade must be contiguous and increasing; percent and minimum not negative. */
export function checkShopToleranceTable(table: ShopToleranceTable): FieldError[] {
  const errors: FieldError[] = [];
  table.rows.forEach((r, i) => {
    if (!(r.percent >= 0)) errors.push(fieldError('negative-tolerance', `rows[${i}].percent`, 'percent must be 0 or more'));
    if (!(r.minimum >= 0)) errors.push(fieldError('negative-tolerance', `rows[${i}].minimum`, 'minimum must be 0 or more'));
  });
  for (const grade of [1, 2, 3] as const) {
    const rows = table.rows.filter((r) => r.grade === grade);
    const broken = firstBandBreak(rows);
    if (broken >= 0) {
      errors.push(fieldError('bands-not-contiguous', `rows[${table.rows.indexOf(rows[broken] as ShopToleranceRow)}]`,
        `grade ${grade}: each band must start where the previous one ends and end above its start`));
    }
  }
  return errors;
}

export interface PlusMinus {
  plusMinus: number;
  percent: number;
}

function lookupRow(table: ShopToleranceTable, grade: ToleranceGrade, key: number, value: number): Lookup<PlusMinus> {
  const row = findBand(table.rows.filter((r) => r.grade === grade), key, true);
  if (!row) {
    return notFound('not-in-shop-table', table.bandedBy,
      `the shop's ${table.quantity} table has no grade ${grade} row for ${table.bandedBy} ${key}: by agreement`);
  }
  return found({ plusMinus: Math.max((row.percent / 100) * value, row.minimum), percent: row.percent }, table);
}

/** ± N on a specified load, from the shop's table (demo defaults unless the shop has set its own). */
export function loadTolerance(
  input: { load: number; grade?: ToleranceGrade; activeCoils: number; index: number },
  table: ShopToleranceTable = demoLoadTolerances,
): Lookup<PlusMinus> {
  const { load, grade = 2, activeCoils, index } = input;
  const bad = checkPositive({ load, activeCoils, index });
  if (bad) return bad;
  return lookupRow(table, grade, table.bandedBy === 'index' ? index : activeCoils, load);
}

export type FreeLengthTolerance = { reference: true } | ({ reference: false } & PlusMinus);

const REFERENCE_RULE = 'EN 15800 / DIN 2095: where a force is specified, L0 is a reference dimension ' +
  'and only the force is checked (from memory)';

/** ± mm on L0, or `{ reference: true }` when a load is specified (the maker then adjusts L0 to hit it). */
export function freeLengthTolerance(
  input: { L0: number; grade?: ToleranceGrade; index: number; activeCoils: number; loadSpecified: boolean },
  table: ShopToleranceTable = demoFreeLengthTolerances,
): Lookup<FreeLengthTolerance> {
  const { L0, grade = 2, index, activeCoils, loadSpecified } = input;
  const bad = checkPositive({ L0, index, activeCoils });
  if (bad) return bad;
  if (loadSpecified) return found({ reference: true }, { source: REFERENCE_RULE, verified: false });
  const r = lookupRow(table, grade, table.bandedBy === 'index' ? index : activeCoils, L0);
  return r.ok ? { ...r, value: { reference: false, ...r.value } } : r;
}

/** A ± band table the shop keeps for torsion springs: leg length by leg length (mm), free angle by body coils (°). */
export interface PlusMinusRow extends Band {
  plusMinus: number;
}

export interface PlusMinusTable {
  quantity: 'legLength' | 'freeAngle';
  bandedBy: 'legLength' | 'bodyCoils';
  rows: PlusMinusRow[];
  source: string;
  verified: boolean;
}

const bandsOf = (rows: readonly (readonly [number, number, number])[]): PlusMinusRow[] =>
  rows.map(([over, upTo, plusMinus]) => ({ over, upTo, plusMinus }));

/** Leg length ± mm by leg length: demo defaults only (round figures from memory of common practice). */
export const demoLegLengthTolerances: PlusMinusTable = {
  quantity: 'legLength', bandedBy: 'legLength', verified: false,
  source: `${DEMO} (round figures, from memory)`,
  rows: bandsOf([[0, 25, 0.5], [25, 50, 0.8], [50, 100, 1.2], [100, Infinity, 2]]),
};

/** Free angle ± degrees by body coils: demo defaults read from ±(2° + 1.5° per coil) at each band's top, from memory. */
export const demoFreeAngleTolerances: PlusMinusTable = {
  quantity: 'freeAngle', bandedBy: 'bodyCoils', verified: false,
  source: `${DEMO} (±(2° + 1.5° per coil) at each band's top, from memory)`,
  rows: bandsOf([[0, 3, 6.5], [3, 6, 11], [6, 10, 17], [10, 20, 32], [20, Infinity, 47]]),
};

/** Every table the shop keeps; the plan reads them from the shop's settings. */
export interface ShopTables {
  load: ShopToleranceTable;
  freeLength: ShopToleranceTable;
  legLength: PlusMinusTable;
  freeAngle: PlusMinusTable;
}

export const demoShopTables: ShopTables = {
  load: demoLoadTolerances, freeLength: demoFreeLengthTolerances, legLength: demoLegLengthTolerances, freeAngle: demoFreeAngleTolerances,
};

/** What each table is called on screens and in the sources the plan names. */
export const shopTableLabels: Record<keyof ShopTables, string> = {
  load: 'load', freeLength: 'free length', legLength: 'torsion leg length', freeAngle: 'torsion free angle',
};

/** ± from the shop's band table, or why the table gives none. */
export function plusMinusTolerance(table: PlusMinusTable, key: number): Lookup<number> {
  const bad = checkPositive({ [table.bandedBy]: key });
  if (bad) return bad;
  const row = findBand(table.rows, key, true);
  if (!row) {
    return notFound('not-in-shop-table', table.bandedBy,
      `the shop's ${table.quantity === 'legLength' ? 'leg length' : 'free angle'} table has no row for ${table.bandedBy} ${key}: by agreement`);
  }
  return found(row.plusMinus, table);
}

/** A ± table's bands must run upward without gaps; ± not negative. */
export function checkPlusMinusTable(table: Pick<PlusMinusTable, 'rows'>): FieldError[] {
  const errors: FieldError[] = [];
  table.rows.forEach((r, i) => {
    if (!(r.plusMinus >= 0)) errors.push(fieldError('negative-tolerance', `rows[${i}].plusMinus`, '± must be 0 or more'));
  });
  const broken = firstBandBreak(table.rows);
  if (broken >= 0) errors.push(fieldError('bands-not-contiguous', `rows[${broken}]`, 'each band must start where the previous one ends and end above its start'));
  return errors;
}
