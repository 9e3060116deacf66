import type { Quantity, UnitSystem } from './units';
import { fromInternal, unitSymbol } from './units';

/** Decimal places the trade reads lengths in: 0.01 mm, 0.001 in. */
export const lengthDecimals: Record<UnitSystem, number> = { metric: 2, inch: 3 };

/** Three significant digits, without exponent notation for ordinary magnitudes. */
export function significant(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  // Whole numbers at or above the precision are shown whole (12 345 N, not 1.23e+4 N).
  if (Math.abs(value) >= 10 ** digits) return Math.round(value).toString();
  return value === 0 ? '0' : value.toPrecision(digits);
}

/** Formats an internal value in the spec's units with the trade's precision and the unit symbol. */
export function formatQuantity(value: number, quantity: Quantity, units: UnitSystem): string {
  const shown = fromInternal(value, quantity, units);
  const text = quantity === 'length' ? shown.toFixed(lengthDecimals[units]) : significant(shown);
  const symbol = unitSymbol(quantity, units);
  return symbol === '' ? text : `${text} ${symbol}`;
}
