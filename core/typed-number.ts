/**
 * Numbers as people type them into a field: "1,6" or "1.6" by the shop's decimal mark, "2 000" and "2,000"
 * with thousands separators, inch fractions and mixed numbers ("3/8", "1-1/4", "1 1/4"), and a unit after
 * the number ("12 mm" in an inch job is converted; "2000 pcs", "3 weeks" where the field counts those).
 * Every reading says what it understood, so the estimator sees "read 2 000 as 2000 pcs", not a silent guess.
 */
import type { Quantity, UnitSystem } from './units';
import { fromInternal, toInternal, unitSymbol } from './units';

export type DecimalMark = '.' | ',';

/** What a field holds: a physical quantity in the job's units, a count of pieces, or a number of days. */
export type FieldMeasure = Quantity | 'pieces' | 'days';

export interface ReadOptions {
  decimalMark: DecimalMark;
  /** What the field holds; a unit typed after the number must fit it. Plain numbers when absent. */
  measure?: FieldMeasure;
  /** The job's unit system: a unit typed from the other system is converted into it. */
  units?: UnitSystem;
}

export type TypedNumber =
  | { ok: true; value: number | undefined; understood: string | null }
  | { ok: false; code: 'not-a-number' | 'wrong-unit' | 'bad-grouping'; message: string };

/** A unit written after a number: what it measures and how to bring it to internal units. */
interface TypedUnit { measure: FieldMeasure; system: UnitSystem | null; factor?: number }

const TYPED_UNITS: Record<string, TypedUnit> = {
  mm: { measure: 'length', system: 'metric' },
  cm: { measure: 'length', system: 'metric', factor: 10 },
  m: { measure: 'length', system: 'metric', factor: 1000 },
  in: { measure: 'length', system: 'inch' },
  inch: { measure: 'length', system: 'inch' },
  inches: { measure: 'length', system: 'inch' },
  '"': { measure: 'length', system: 'inch' },
  n: { measure: 'force', system: 'metric' },
  kn: { measure: 'force', system: 'metric', factor: 1000 },
  lbf: { measure: 'force', system: 'inch' },
  lb: { measure: 'force', system: 'inch' },
  lbs: { measure: 'force', system: 'inch' },
  mpa: { measure: 'stress', system: 'metric' },
  gpa: { measure: 'stress', system: 'metric', factor: 1000 },
  psi: { measure: 'stress', system: 'inch' },
  ksi: { measure: 'stress', system: 'inch', factor: 1000 },
  'n/mm': { measure: 'rate', system: 'metric' },
  'lbf/in': { measure: 'rate', system: 'inch' },
  'lb/in': { measure: 'rate', system: 'inch' },
  'n·mm': { measure: 'torque', system: 'metric' },
  'n*mm': { measure: 'torque', system: 'metric' },
  nmm: { measure: 'torque', system: 'metric' },
  'lbf·in': { measure: 'torque', system: 'inch' },
  'lbf*in': { measure: 'torque', system: 'inch' },
  'in·lbf': { measure: 'torque', system: 'inch' },
  '°': { measure: 'angle', system: null },
  deg: { measure: 'angle', system: null },
  pcs: { measure: 'pieces', system: null },
  pc: { measure: 'pieces', system: null },
  pieces: { measure: 'pieces', system: null },
  off: { measure: 'pieces', system: null },
  day: { measure: 'days', system: null },
  days: { measure: 'days', system: null },
  week: { measure: 'days', system: null, factor: 7 },
  weeks: { measure: 'days', system: null, factor: 7 },
  wk: { measure: 'days', system: null, factor: 7 },
  wks: { measure: 'days', system: null, factor: 7 },
};

const MEASURE_WORDS: Partial<Record<FieldMeasure, string>> = {
  length: 'a length', force: 'a force', stress: 'a stress', rate: 'a rate', torque: 'a torque', angle: 'an angle',
  pieces: 'a number of pieces', days: 'a number of days',
};

/** Spaces people put between thousands: ordinary, no-break, thin and narrow no-break. */
const GROUP_SPACES = /[ \u00a0\u2009\u202f]/g;
const UNIT_TAIL = /^(.*?\d)\s*([a-zA-Z"°][a-zA-Z/·*"]*)\.?$/u;
const FRACTION = /^(\d+)\/(\d+)$/;
const MIXED = /^(\d+)[ \u00a0-](\d+)\/(\d+)$/;

function fail(code: 'not-a-number' | 'wrong-unit' | 'bad-grouping', message: string): TypedNumber {
  return { ok: false, code, message };
}

/** Digits with separators: groups after the first must be three digits, or the separator was not one. */
function ungroup(digits: string, separator: string): string | null {
  if (!digits.includes(separator)) return digits;
  const groups = digits.split(separator);
  const [first, ...rest] = groups;
  if (!/^\d{1,3}$/.test(first ?? '') || !rest.every((g) => /^\d{3}$/.test(g))) return null;
  return groups.join('');
}

/** A plain number with the shop's decimal mark and any thousands separators, as a JS number text. */
function readDecimal(text: string, mark: DecimalMark): string | null | 'bad-grouping' {
  const other = mark === '.' ? ',' : '.';
  const spaced = text.replace(GROUP_SPACES, ' ');
  const sign = /^[-\u2212+]/.test(spaced) ? (spaced[0] === '+' ? '' : '-') : '';
  const body = sign === '' && spaced[0] !== '+' ? spaced : spaced.slice(1);
  const exponent = /[eE][-+]?\d+$/.exec(body)?.[0] ?? '';
  const mantissa = body.slice(0, body.length - exponent.length);
  const [whole = '', fraction, extra] = mantissa.split(mark);
  if (extra !== undefined) return null;
  if (fraction !== undefined && !/^\d*$/.test(fraction)) return null;
  let digits = whole;
  for (const separator of [' ', other]) {
    if (!digits.includes(separator)) continue;
    const joined = ungroup(digits, separator);
    if (joined === null) return 'bad-grouping';
    digits = joined;
  }
  if (!/^\d*$/.test(digits) || (digits === '' && !fraction)) return null;
  return `${sign}${digits || '0'}${fraction ? `.${fraction}` : ''}${exponent}`;
}

/** Fractions and mixed numbers of an inch: "3/8", "1-1/4", "1 1/4". */
function readFraction(text: string): number | null {
  const simple = FRACTION.exec(text);
  if (simple) return Number(simple[2]) === 0 ? null : Number(simple[1]) / Number(simple[2]);
  const mixed = MIXED.exec(text);
  if (mixed) return Number(mixed[3]) === 0 ? null : Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  return null;
}

function readBare(text: string, mark: DecimalMark): { value: number } | TypedNumber {
  const fraction = readFraction(text.replace(GROUP_SPACES, ' '));
  if (fraction !== null) return { value: fraction };
  const decimal = readDecimal(text, mark);
  if (decimal === 'bad-grouping') {
    const other = mark === '.' ? ',' : '.';
    return fail('bad-grouping', text.includes(other)
      ? `"${text}": the decimal mark here is "${mark}" and "${other}" separates thousands; did you mean ${text.replace(other, mark)}?`
      : `"${text}": thousands are grouped in threes, e.g. 2 000`);
  }
  if (decimal === null || !Number.isFinite(Number(decimal))) {
    return fail('not-a-number', `"${text}" is not a number; e.g. 2${mark}5 or 2 000 or 3/8 or 1-1/4`);
  }
  return { value: Number(decimal) };
}

/** The value in the field's own units, from a number written with a unit. */
function converted(value: number, unit: TypedUnit, options: ReadOptions): number {
  const scaled = value * (unit.factor ?? 1);
  const quantity = unit.measure as Quantity;
  if (unit.system === null || options.units === undefined || options.units === unit.system) return scaled;
  return fromInternal(toInternal(scaled, quantity, unit.system), quantity, options.units);
}

/** What to show after "read … as": the value with the field's unit, to seven significant digits. */
function shownValue(value: number, options: ReadOptions): string {
  const plain = String(Number(value.toPrecision(7)));
  const text = options.decimalMark === ',' ? plain.replace('.', ',') : plain;
  const measure = options.measure;
  if (measure === 'pieces') return `${text} pcs`;
  if (measure === 'days') return `${text} days`;
  if (measure === undefined || options.units === undefined) return text;
  const symbol = unitSymbol(measure, options.units);
  return symbol === '' ? text : `${text} ${symbol}`;
}

/** Reads one typed number; empty text is "not given". */
export function readTypedNumber(raw: string, options: ReadOptions): TypedNumber {
  const text = raw.trim();
  if (text === '') return { ok: true, value: undefined, understood: null };
  const tail = UNIT_TAIL.exec(text);
  const key = tail ? tail[2]!.toLowerCase() : '';
  const unit = tail && Object.hasOwn(TYPED_UNITS, key) ? TYPED_UNITS[key] : undefined;
  if (tail && unit === undefined) return fail('not-a-number', `"${text}": "${tail[2]}" is not a unit this field knows`);
  const numberText = tail ? tail[1]!.trim() : text;
  const bare = readBare(numberText, options.decimalMark);
  if ('ok' in bare) return bare;
  let value = bare.value;
  if (unit !== undefined) {
    if (options.measure === undefined || unit.measure !== options.measure) {
      const wanted = options.measure === undefined ? 'a plain number' : MEASURE_WORDS[options.measure] ?? 'a plain number';
      return fail('wrong-unit', `"${text}" is ${MEASURE_WORDS[unit.measure]}; this field takes ${wanted}`);
    }
    value = converted(value, unit, options);
  }
  // A number written plainly in the shop's own mark needs no word about how it was read.
  const plain = String(value);
  const asTyped = options.decimalMark === ',' ? plain.replace('.', ',') : plain;
  return { ok: true, value, understood: asTyped === text ? null : `read "${text}" as ${shownValue(value, options)}` };
}

export type TypedList =
  | { ok: true; value: number[]; understood: string[] }
  | { ok: false; code: string; message: string; item: number };

/**
 * A list of numbers, e.g. quantity breaks: items are split on ";", "/" or a line break, and on a comma when
 * the comma is not the decimal mark and is followed by a space ("100, 500"); never on the space inside "2 000".
 */
export function readTypedList(raw: string, options: ReadOptions): TypedList {
  const splitter = options.decimalMark === ',' ? /[;/\n\r]+/ : /[;/\n\r]+|,\s+/;
  const items = raw.split(splitter).map((s) => s.trim()).filter((s) => s !== '');
  const value: number[] = [];
  const understood: string[] = [];
  for (const [i, item] of items.entries()) {
    const read = readTypedNumber(item, options);
    if (!read.ok) return { ...read, item: i };
    if (read.value === undefined) continue;
    value.push(read.value);
    if (read.understood) understood.push(read.understood);
  }
  return { ok: true, value, understood };
}

/** Writes a number the way a person in this shop would type it: the shop's mark, thousands spaced. */
export function typedText(value: number, options: ReadOptions & { grouping?: ' ' | 'other' | 'none'; withUnit?: boolean }): string {
  const [whole = '', fraction] = String(Math.abs(value)).split('.');
  const separator = options.grouping === 'other' ? (options.decimalMark === '.' ? ',' : '.') : options.grouping === 'none' ? '' : ' ';
  const grouped = separator === '' ? whole : whole.replace(/\B(?=(\d{3})+(?!\d))/g, separator);
  const number = `${value < 0 ? '-' : ''}${grouped}${fraction ? `${options.decimalMark}${fraction}` : ''}`;
  if (!options.withUnit || options.measure === undefined) return number;
  if (options.measure === 'pieces') return `${number} pcs`;
  if (options.measure === 'days') return `${number} days`;
  const symbol = options.units === undefined ? '' : unitSymbol(options.measure, options.units);
  return symbol === '' ? number : `${number} ${symbol}`;
}
