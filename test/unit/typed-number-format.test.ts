import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatQuantity, lengthDecimals } from '../../core/format';
import type { DecimalMark } from '../../core/typed-number';
import { readTypedNumber } from '../../core/typed-number';
import type { Quantity, UnitSystem } from '../../core/units';
import { fromInternal, MM_PER_IN } from '../../core/units';

/** The trade's precision of a shown value (core/format.ts): 0.01 mm / 0.001 in for lengths, three significant digits else. */
function step(shown: number, quantity: Quantity, units: UnitSystem): number {
  if (quantity === 'length') return 10 ** -lengthDecimals[units];
  if (Math.abs(shown) >= 1000) return 1;
  return 10 ** (Math.floor(Math.log10(Math.abs(shown))) - 2);
}

/** A shown value as a person in the shop would retype it: their decimal mark, thousands grouped or not, the unit kept or left off. */
function retyped(shownText: string, mark: DecimalMark, grouping: ' ' | 'other' | 'none', withUnit: boolean): string {
  const [number = '', symbol] = shownText.split(' ');
  const [whole = '', fraction] = number.split('.');
  const separator = grouping === 'none' ? '' : grouping === ' ' ? ' ' : mark === '.' ? ',' : '.';
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, separator);
  const text = `${grouped}${fraction !== undefined ? `${mark}${fraction}` : ''}`;
  return withUnit && symbol ? `${text} ${symbol}` : text;
}

describe('a shown value reads back as the value it shows', () => {
  it('parse(format(x)) equals x at the trade precision, in both unit systems, for both decimal marks', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.01, max: 1e6, noNaN: true, noDefaultInfinity: true }),
      fc.constantFrom<Quantity>('length', 'force', 'stress', 'rate', 'torque'),
      fc.constantFrom<UnitSystem>('metric', 'inch'),
      fc.constantFrom<DecimalMark>('.', ','),
      fc.constantFrom<' ' | 'other' | 'none'>(' ', 'other', 'none'),
      fc.boolean(),
      (internal, quantity, units, mark, grouping, withUnit) => {
        const shown = fromInternal(internal, quantity, units);
        const text = retyped(formatQuantity(internal, quantity, units), mark, grouping, withUnit);
        const read = readTypedNumber(text, { decimalMark: mark, measure: quantity, units });
        if (!read.ok) throw new Error(`${text}: ${read.message}`);
        // Within half a step of the trade's precision (plus float noise), in the job's own units.
        expect(Math.abs(read.value! - shown)).toBeLessThanOrEqual(step(shown, quantity, units) / 2 + 1e-9 * shown);
      }), { numRuns: 3000 });
  });

  it('reads a length typed in the other system converted into the job\'s units', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 5000 }), (mm) => {
      const read = readTypedNumber(`${mm} mm`, { decimalMark: '.', measure: 'length', units: 'inch' });
      // 1 in = 25.4 mm exactly (NIST SP 811, Appendix B).
      expect(read).toMatchObject({ ok: true });
      expect(read.ok && read.value).toBeCloseTo(mm / MM_PER_IN, 12);
    }), { numRuns: 300 });
  });

  it('reads inch fractions and mixed numbers exactly', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 40 }), fc.constantFrom(2, 4, 8, 16, 32, 64), fc.integer({ min: 1, max: 63 }),
      fc.constantFrom('-', ' '), (whole, denominator, top, joint) => {
        const numerator = top % denominator || 1;
        const text = whole === 0 ? `${numerator}/${denominator}` : `${whole}${joint}${numerator}/${denominator}`;
        expect(readTypedNumber(text, { decimalMark: '.', measure: 'length', units: 'inch' })).toMatchObject({ ok: true, value: whole + numerator / denominator });
      }), { numRuns: 500 });
  });
});
