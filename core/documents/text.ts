/** Formatting for printed documents: deterministic (no locale), in the trade's usual precision. */
import { formatQuantity } from '../format';
import type { Quantity, UnitSystem } from '../units';
import { compressionEndTerms, windTerms } from '../vocabulary';

/** Groups thousands with a comma: 12,345.60. */
function grouped(fixed: string): string {
  const [whole = '', fraction] = fixed.split('.');
  const sign = whole.startsWith('-') ? '-' : '';
  const digits = sign ? whole.slice(1) : whole;
  const withCommas = digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return fraction === undefined ? `${sign}${withCommas}` : `${sign}${withCommas}.${fraction}`;
}

/** A number to fixed places with thousands grouped: 1,234.5. */
export function fixedText(value: number, decimals: number): string {
  return grouped(value.toFixed(decimals));
}

/** An amount of money to the cent. */
export function moneyText(value: number): string {
  return fixedText(value, 2);
}

/**
 * A unit price: small piece prices need more places to mean anything (0.0468 each), large ones read to
 * the cent.
 */
export function unitPriceText(value: number): string {
  const usual = value >= 100 ? 2 : value >= 1 ? 3 : 4;
  // A price the shop's rounding rule set (12.345 to 0.005) prints every place it has; an unrounded one the usual places.
  const places = (String(Number(value.toPrecision(12))).split('.')[1] ?? '').length;
  return grouped(value.toFixed(places <= 6 ? Math.max(usual, places) : usual));
}

/** A whole number of pieces, grouped: 5,000. */
export function piecesText(count: number): string {
  return grouped(String(Math.round(count)));
}

/** A plain number with at most `decimals` places and no trailing zeros: 8, 7.5, 0.25. */
export function plainText(value: number, decimals = 2): string {
  const fixed = value.toFixed(decimals);
  const trimmed = fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
  return trimmed === '-0' ? '0' : trimmed;
}

/** A value of a quantity in the job's units; counts without unit or trailing zeros, big numbers grouped. */
export function quantityText(value: number, quantity: Quantity, units: UnitSystem): string {
  if (quantity === 'count') return plainText(value);
  return formatQuantity(value, quantity, units).replace(/^\d{5,}(?=\D|$)/, (digits) => grouped(digits));
}


/** Schema words the documents spell out, in the shared vocabulary's long form. */
const words: Record<string, string> = Object.fromEntries(
  [...Object.entries(compressionEndTerms), ...Object.entries(windTerms)].map(([id, t]) => [id, t.long]),
);

/** A schema word as the shop reads it ("closed-ground" → "closed and ground"); other text as it is. */
export function wordText(value: string): string {
  return words[value] ?? value;
}

export const percentText = (fraction: number): string => `${plainText(fraction * 100, 1)} %`;
