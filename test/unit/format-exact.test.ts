/**
 * The report's number formatting does in integers what the runtime's conversions do, and must give the same
 * characters: ECMA-262 Number.prototype.toFixed (§21.1.3.3: the nearest multiple of 10^-f, the larger on a
 * tie, of the exact binary value) and Number.prototype.toPrecision (§21.1.3.5) are the reference.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fixedDecimals, significant } from '../../core/format';

/** significant() as it was written with the runtime's own conversion alone. */
function significantByRuntime(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (Math.abs(value) >= 1000) return Math.round(value).toString();
  if (value === 0) return '0';
  const text = value.toPrecision(3);
  const rounded = Number(text);
  return Math.abs(rounded) >= 1000 ? rounded.toString() : text;
}

/** Magnitudes from 10⁻⁹ to 10⁶, both signs: every size a report prints and some beyond. */
const anyMagnitude = fc.tuple(fc.double({ min: -9, max: 6, noNaN: true }), fc.boolean())
  .map(([exponent, negative]) => (negative ? -1 : 1) * 10 ** exponent);

/** Values on or next to a rounding half at 0–4 decimals (the ties toFixed breaks upwards on the exact value). */
const nearHalves = fc.tuple(fc.integer({ min: 0, max: 2_000_000 }), fc.integer({ min: 0, max: 4 }), fc.integer({ min: -2, max: 2 }))
  .map(([units, places, ulps]) => {
    const half = (units + 0.5) / 10 ** places;
    return half + ulps * Number.EPSILON * half;
  });

/** Values on or next to a power of ten (where the digit count and toPrecision's exponent change). */
const nearDecades = fc.tuple(fc.integer({ min: -8, max: 3 }), fc.integer({ min: -3, max: 3 }), fc.boolean())
  .map(([exponent, ulps, negative]) => (negative ? -1 : 1) * 10 ** exponent * (1 + ulps * Number.EPSILON));

describe('fixed decimals (the length format)', () => {
  it('gives toFixed\'s characters for 0–4 places on any magnitude, halves and ties', () => {
    fc.assert(fc.property(fc.oneof(anyMagnitude, nearHalves, nearDecades), fc.integer({ min: 0, max: 4 }), (x, places) => {
      expect(fixedDecimals(x, places)).toBe(x.toFixed(places));
    }), { numRuns: 20_000 });
  });

  it('keeps toFixed\'s sign and its exponent form beyond 10²¹', () => {
    expect(fixedDecimals(-0.001, 2)).toBe('-0.00');
    expect(fixedDecimals(-0, 2)).toBe('0.00');
    expect(fixedDecimals(1.005, 2)).toBe((1.005).toFixed(2));
    expect(fixedDecimals(0.125, 2)).toBe('0.13');
    expect(fixedDecimals(2e21, 3)).toBe((2e21).toFixed(3));
  });
});

describe('three significant digits (forces, stresses, ratios)', () => {
  it('gives the runtime conversion\'s characters on any magnitude, halves and decade edges', () => {
    fc.assert(fc.property(fc.oneof(anyMagnitude, nearHalves, nearDecades), (x) => {
      expect(significant(x)).toBe(significantByRuntime(x));
    }), { numRuns: 20_000 });
  });

  it('writes a value rounding up to the next decade as toPrecision does', () => {
    for (const x of [9.995, 99.95, 0.0009995, 999.4999, 999.5, -9.9951, 1e-7, 0.000001]) expect(significant(x)).toBe(significantByRuntime(x));
  });
});
