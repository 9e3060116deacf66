import type { Quantity, UnitSystem } from './units';
import { fromInternal, unitSymbol } from './units';

/** Decimal places the trade reads lengths in: 0.01 mm, 0.001 in. */
export const lengthDecimals: Record<UnitSystem, number> = { metric: 2, inch: 3 };

/** Three significant digits, without exponent notation for ordinary magnitudes. */
export function significant(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  // Whole numbers at or above the precision are shown whole (12 345 N, not 1.23e+4 N).
  if (Math.abs(value) >= 10 ** digits) return Math.round(value).toString();
  if (value === 0) return '0';
  // 999.5 rounds up to 1000 at three digits, which toPrecision writes as "1.00e+3".
  const text = value.toPrecision(digits);
  const rounded = Number(text);
  return Math.abs(rounded) >= 10 ** digits ? rounded.toString() : text;
}

/** Formats an internal value in the spec's units with the trade's precision and the unit symbol. */
export function formatQuantity(value: number, quantity: Quantity, units: UnitSystem): string {
  const shown = fromInternal(value, quantity, units);
  const text = quantity === 'length' ? shown.toFixed(lengthDecimals[units]) : significant(shown);
  const symbol = unitSymbol(quantity, units);
  return symbol === '' ? text : `${text} ${symbol}`;
}
