import { significant } from '../../core/format';
import type { Quantity, UnitSystem } from '../../core/units';
import { unitSymbol } from '../../core/units';

/** A value already in the job's units (plans come back converted), with the trade's precision and its unit. */
export function shown(value: number | string, quantity: Quantity | undefined, units: UnitSystem): string {
  if (typeof value === 'string') return value;
  if (!quantity) return significant(value);
  const text = quantity === 'length' ? value.toFixed(units === 'inch' ? 3 : 2) : quantity === 'count' ? String(Number(value.toFixed(2))) : significant(value);
  const symbol = unitSymbol(quantity, units);
  return symbol === '' ? text : `${text} ${symbol}`;
}

export function money(value: number, currency: string): string {
  return `${currency} ${value.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: value < 1 ? 4 : 2 })}`;
}
