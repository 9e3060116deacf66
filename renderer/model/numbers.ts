import type { DecimalMark, FieldMeasure } from '../../core/typed-number';
import { readTypedList, readTypedNumber } from '../../core/typed-number';
import type { UnitSystem } from '../../core/units';

/**
 * The shop's decimal mark (settings `defaults.decimalMark`), taken when the settings are read: every field
 * reads and writes numbers with it, and the other of "." and "," reads as a thousands separator.
 */
let shopDecimalMark: DecimalMark = '.';

export function takeDecimalMark(mark: DecimalMark | undefined): void {
  shopDecimalMark = mark ?? '.';
}

export const decimalMark = (): DecimalMark => shopDecimalMark;

export type Parsed =
  | { ok: true; value: number | undefined; understood: string | null }
  | { ok: false; code: string; message: string };

/**
 * Text typed into a number field, as people type it (core/typed-number.ts): the shop's decimal mark, spaced
 * thousands, inch fractions, a unit after the number. Empty text is "not given".
 */
export function parseNumber(text: string, measure?: FieldMeasure, units?: UnitSystem): Parsed {
  const read = readTypedNumber(text, { decimalMark: shopDecimalMark, ...(measure ? { measure } : {}), ...(units ? { units } : {}) });
  return read.ok ? read : { ok: false, code: read.code, message: read.message };
}

/**
 * A value shown in a field: the shortest decimal within one part in a million, at most seven significant
 * digits, with the shop's decimal mark. Seven digits carry a value to the other unit system and back to what
 * was typed (45 mm → 1.771654 in → 45 mm), and the snap drops the float noise a conversion leaves (44.99999 → 45).
 */
export function numberText(value: number | undefined | null): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return '';
  const text = plainText(value);
  return shopDecimalMark === ',' ? text.replace('.', ',') : text;
}

function plainText(value: number): string {
  if (value === 0) return '0';
  for (let digits = 1; digits < 7; digits++) {
    const candidate = Number(value.toPrecision(digits));
    if (Math.abs(candidate - value) <= 1e-6 * Math.abs(value)) return String(candidate);
  }
  return String(Number(value.toPrecision(7)));
}

/** A shown figure ("0.375 in / 0.305 in") with the shop's decimal mark; only a point between digits changes. */
export const inShopMark = (text: string): string => (shopDecimalMark === ',' ? text.replace(/(\d)\.(\d)/g, '$1,$2') : text);

export type ParsedList =
  | { ok: true; value: number[]; understood: string[] }
  | { ok: false; code: string; message: string; item: number };

/** Whole numbers of pieces split on ";", "/" or a line break (never on the space inside "2 000"), e.g. "100; 1 000; 5 000". */
export function parseList(text: string): ParsedList {
  const read = readTypedList(text, { decimalMark: shopDecimalMark, measure: 'pieces' });
  if (!read.ok) return read;
  const broken = read.value.findIndex((v) => !Number.isInteger(v) || v < 0);
  if (broken >= 0) return { ok: false, code: 'not-whole', message: `${read.value[broken]} is not a whole number of pieces`, item: broken };
  return read;
}

/** The list as the field shows it when read back from a spec. */
export const listText = (values: readonly number[]): string => values.map(numberText).join('; ');
