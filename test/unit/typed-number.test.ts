import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { ReadOptions } from '../../core/typed-number';
import { readTypedList, readTypedNumber, typedText } from '../../core/typed-number';

const point: ReadOptions = { decimalMark: '.' };
const comma: ReadOptions = { decimalMark: ',' };
const value = (text: string, options: ReadOptions) => {
  const r = readTypedNumber(text, options);
  if (!r.ok) throw new Error(r.message);
  return r.value;
};

describe('numbers as people type them', () => {
  it('reads the shop\'s decimal mark and the other as a thousands separator', () => {
    expect(value('1,6', comma)).toBe(1.6);
    expect(value('1.6', point)).toBe(1.6);
    expect(value('2,000.5', point)).toBe(2000.5);
    expect(value('2.000,5', comma)).toBe(2000.5);
    expect(readTypedNumber('1,6', point)).toMatchObject({ ok: false, code: 'bad-grouping', message: expect.stringContaining('did you mean 1.6?') });
    expect(readTypedNumber('1.6', comma)).toMatchObject({ ok: false, code: 'bad-grouping', message: expect.stringContaining('did you mean 1,6?') });
  });

  it('reads spaces between thousands, ordinary, no-break and thin', () => {
    expect(readTypedNumber('2 000', { ...point, measure: 'pieces' })).toEqual({ ok: true, value: 2000, understood: 'read "2 000" as 2000 pcs' });
    expect(value('12\u00a0500', point)).toBe(12500);
    expect(value('1\u202f250,75', comma)).toBe(1250.75);
    expect(readTypedNumber('20 00', point)).toMatchObject({ ok: false, code: 'bad-grouping' });
  });

  // Fractions of an inch as drawings give them: 3/8 = 0.375, 1-1/4 = 1.25 (exact binary fractions).
  it('reads inch fractions and mixed numbers', () => {
    expect(readTypedNumber('3/8', { ...point, measure: 'length', units: 'inch' })).toEqual({ ok: true, value: 0.375, understood: 'read "3/8" as 0.375 in' });
    expect(value('1-1/4', point)).toBe(1.25);
    expect(value('1 1/4', point)).toBe(1.25);
    expect(readTypedNumber('3/0', point)).toMatchObject({ ok: false, code: 'not-a-number' });
  });

  // 1 in = 25.4 mm exactly (NIST SP 811, Appendix B): 12 mm = 0.472441 in to seven digits.
  it('converts a unit of the other system into the job\'s units and says so', () => {
    const r = readTypedNumber('12 mm', { ...point, measure: 'length', units: 'inch' });
    expect(r.ok && r.value).toBeCloseTo(12 / 25.4, 12);
    expect(r.ok && r.understood).toBe('read "12 mm" as 0.4724409 in');
    expect(value('0.5 in', { ...point, measure: 'length', units: 'metric' })).toBeCloseTo(12.7, 12);
    // 1 lbf = 4.4482216152605 N (NIST SP 811, Appendix B).
    expect(value('10 lbf', { ...point, measure: 'force', units: 'metric' })).toBeCloseTo(44.482216152605, 9);
    expect(value('3 weeks', { ...point, measure: 'days' })).toBe(21);
    expect(value('2000 pcs', { ...point, measure: 'pieces' })).toBe(2000);
  });

  it('refuses a unit that does not fit the field, and words that are not numbers', () => {
    expect(readTypedNumber('12 N', { ...point, measure: 'length', units: 'metric' })).toMatchObject({ ok: false, code: 'wrong-unit', message: '"12 N" is a force; this field takes a length' });
    expect(readTypedNumber('12 mm', point)).toMatchObject({ ok: false, code: 'wrong-unit' });
    expect(readTypedNumber('12 constructor', { ...point, measure: 'length' })).toMatchObject({ ok: false, code: 'not-a-number' });
    expect(readTypedNumber('abc', point)).toMatchObject({ ok: false, code: 'not-a-number' });
    expect(readTypedNumber('', point)).toEqual({ ok: true, value: undefined, understood: null });
  });

  it('splits lists on ";", "/" or a line break, never on the space inside "2 000"', () => {
    expect(readTypedList('500; 2 000; 10 000', { ...point, measure: 'pieces' })).toMatchObject({ ok: true, value: [500, 2000, 10000] });
    expect(readTypedList('100/500\n1000', point)).toMatchObject({ ok: true, value: [100, 500, 1000] });
    expect(readTypedList('100, 500, 1,000', point)).toMatchObject({ ok: true, value: [100, 500, 1000] });
    expect(readTypedList('1,5; 2,5', comma)).toMatchObject({ ok: true, value: [1.5, 2.5] });
    expect(readTypedList('100; x', point)).toMatchObject({ ok: false, item: 1 });
  });

  it('reads back exactly what it writes, for any number, mark, grouping and unit system', () => {
    const decimals = fc.double({ min: 1e-4, max: 1e9, noNaN: true, noDefaultInfinity: true })
      .filter((x) => !String(x).includes('e'));
    fc.assert(fc.property(
      decimals, fc.constantFrom<'.' | ','>('.', ','), fc.constantFrom<' ' | 'other' | 'none'>(' ', 'other', 'none'),
      fc.constantFrom<'metric' | 'inch'>('metric', 'inch'), fc.constantFrom('length', 'force', 'stress', 'rate') as fc.Arbitrary<'length'>,
      fc.boolean(),
      (x, decimalMark, grouping, units, measure, withUnit) => {
        const options = { decimalMark, units, measure };
        const text = typedText(x, { ...options, grouping, withUnit });
        const read = readTypedNumber(text, options);
        expect(read).toMatchObject({ ok: true, value: x });
      }), { numRuns: 2000 });
  });
});

describe('what the reader says it understood', () => {
  it('says nothing of a plain number in the shop\'s mark and writes what it read in that mark', () => {
    expect(readTypedNumber('1,6', { decimalMark: ',', measure: 'length', units: 'metric' })).toEqual({ ok: true, value: 1.6, understood: null });
    expect(readTypedNumber('3/8', { decimalMark: ',', measure: 'length', units: 'inch' })).toEqual({ ok: true, value: 0.375, understood: 'read "3/8" as 0,375 in' });
    expect(readTypedNumber('1.6', { decimalMark: '.', measure: 'length', units: 'metric' })).toEqual({ ok: true, value: 1.6, understood: null });
  });
});
