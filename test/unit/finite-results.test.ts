import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculate } from '../../core/calculate';
import { estimateCost } from '../../core/costing/estimate';
import { quoteDocument, travellerDocument } from '../../core/documents';
import { planInSpecUnits, planManufacture } from '../../core/process/plan';
import { settingsWith } from '../integration/documents/fixtures';
import { nonFiniteNumbers, validSpec, validSpecInput } from '../support/random-springs';

const settings = settingsWith();
const job = { number: 'J-26-0001', customerName: 'Quarry Lane Tools (demo)', customerLines: [], partNumber: 'QL-1', drawingNumber: '', drawingRevision: '', orderQuantity: 100, dueDate: null, leadTimeDays: null };
const RUNS = Number(process.env.FINITE_RUNS ?? 150);

describe('no report, plan, price or document holds NaN or ±∞, over random valid specs', () => {
  it('the report (in the spec\'s units)', () => {
    fc.assert(fc.property(validSpecInput, (raw) => {
      const r = calculate(raw);
      expect(r.ok).toBe(true);
      expect(r.ok && nonFiniteNumbers(r.value)).toEqual([]);
    }), { numRuns: RUNS });
  });

  it('the manufacturing plan and the price', () => {
    fc.assert(fc.property(validSpec, fc.integer({ min: 1, max: 10_000_000 }), (spec, q) => {
      expect(nonFiniteNumbers(planInSpecUnits(planManufacture(spec, settings, q)))).toEqual([]);
      expect(nonFiniteNumbers(estimateCost(spec, settings))).toEqual([]);
    }), { numRuns: RUNS });
  });

  it('the quote and traveller models, drawings included', () => {
    fc.assert(fc.property(validSpec, (spec) => {
      const estimate = estimateCost(spec, settings);
      const issuedAt = '2026-03-02T09:30:00.000Z';
      expect(nonFiniteNumbers(quoteDocument({ spec, settings, job, estimate, issuedAt }))).toEqual([]);
      expect(nonFiniteNumbers(travellerDocument({ spec, settings, printedAt: issuedAt, job }))).toEqual([]);
    }), { numRuns: RUNS / 3 });
  });
});
