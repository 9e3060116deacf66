import type { Quantity, UnitSystem } from './units';
import { fromInternal, unitSymbol } from './units';

/** Decimal places the trade reads lengths in: 0.01 mm, 0.001 in. */
export const lengthDecimals: Record<UnitSystem, number> = { metric: 2, inch: 3 };

const POWERS_OF_TEN = [1, 10, 100, 1000, 10000, 100000, 1000000, 10000000, 100000000, 1000000000];

/**
 * Rounds a ≥ 0 scaled by an exact power of ten to the nearest integer, halves up, as toFixed and toPrecision
 * round the exact binary value; -1 when the product lies so near a half that its own rounding error could
 * decide (the caller then asks the runtime's conversion).
 */
function roundScaled(a: number, scale: number): number {
  const scaled = a * scale;
  const whole = Math.floor(scaled);
  const part = scaled - whole;
  if (Math.abs(part - 0.5) <= scaled * 1e-15 + 1e-300) return -1;
  return part > 0.5 ? whole + 1 : whole;
}

const digitsPadded = (n: number, width: number): string => {
  const text = String(n);
  return text.length >= width ? text : '0'.repeat(width - text.length) + text;
};

/**
 * `value.toFixed(places)` to the character: the same exact rounding, done in integers where it is certain
 * (reports format several lengths each, and the runtime's general conversion costs more than the analysis).
 */
export function fixedDecimals(value: number, places: number): string {
  const scale = POWERS_OF_TEN[places];
  const a = Math.abs(value);
  if (scale === undefined || !(a * scale < 2 ** 52)) return value.toFixed(places);
  const n = roundScaled(a, scale);
  if (n < 0) return value.toFixed(places);
  const sign = value < 0 ? '-' : '';
  if (places === 0) return sign + String(n);
  const whole = Math.floor(n / scale);
  return `${sign}${whole}.${digitsPadded(n - whole * scale, places)}`;
}

/** `value.toPrecision(3)` to the character for 10⁻⁶ ≤ |value| < 1000 where the rounding is certain; else undefined. */
function threeDigits(value: number): string | undefined {
  const a = Math.abs(value);
  let e = 2;
  while (e > -7 && a < (e >= 0 ? POWERS_OF_TEN[e]! : 1 / POWERS_OF_TEN[-e]!)) e--;
  if (e < -6) return undefined;
  const n = roundScaled(a, POWERS_OF_TEN[2 - e]!);
  // A product at a decade's edge, or one rounding up into the next decade, is left to the runtime.
  if (n < 101 || n > 999) return undefined;
  const text = String(n);
  const sign = value < 0 ? '-' : '';
  if (e === 2) return sign + text;
  if (e >= 0) return `${sign}${text.slice(0, e + 1)}.${text.slice(e + 1)}`;
  return `${sign}0.${'0'.repeat(-e - 1)}${text}`;
}

/** Three significant digits, without exponent notation for ordinary magnitudes. */
export function significant(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  // Whole numbers at or above the precision are shown whole (12 345 N, not 1.23e+4 N).
  if (Math.abs(value) >= 10 ** digits) return Math.round(value).toString();
  if (value === 0) return '0';
  const quick = digits === 3 ? threeDigits(value) : undefined;
  if (quick !== undefined) return quick;
  // 999.5 rounds up to 1000 at three digits, which toPrecision writes as "1.00e+3".
  const text = value.toPrecision(digits);
  const rounded = Number(text);
  return Math.abs(rounded) >= 10 ** digits ? rounded.toString() : text;
}

/** Formats an internal value in the spec's units with the trade's precision and the unit symbol. */
export function formatQuantity(value: number, quantity: Quantity, units: UnitSystem): string {
  const shown = fromInternal(value, quantity, units);
  const text = quantity === 'length' ? fixedDecimals(shown, lengthDecimals[units]) : significant(shown);
  const symbol = unitSymbol(quantity, units);
  return symbol === '' ? text : `${text} ${symbol}`;
}
