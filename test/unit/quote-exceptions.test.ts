import { describe, expect, it } from 'vitest';
import { customerException } from '../../core/quoting/exceptions';
import { issueProblems } from '../../core/quoting/problems';
import type { Finding } from '../../core/result';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';

const specOf = (input: unknown): Spec => {
  const r = parseSpec(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};
const finding = (code: string, message = 'internal wording'): Finding => ({ code, severity: 'error', message, path: 'freeLength', fix: '' });
const metric = specOf({ kind: 'compression', units: 'metric', material: 'en10270-1-sh', wireDiameter: 2, outerDiameter: 14, totalCoils: 6,
  ends: 'closed-ground', freeLength: 60, loads: [{ length: 45 }, { length: 38 }] });

describe('accepted exceptions in the customer\'s words', () => {
  it('a set at solid recommends a stop at the shortest working length, in the job\'s units', () => {
    expect(customerException(finding('solid-stress-over-set-removed-allowable'), metric))
      .toBe('The spring takes a permanent set when compressed to solid; we recommend a stop at 38.00 mm.');
    const inch = specOf({ kind: 'compression', units: 'inch', material: 'astm-a228', wireDiameter: 0.08, outerDiameter: 0.6, totalCoils: 6,
      ends: 'closed-ground', freeLength: 2.4, loads: [{ length: 1.5 }] });
    expect(customerException(finding('solid-stress-over-set-removed-allowable'), inch)).toMatch(/a stop at 1\.500 in\.$/);
  });

  it('never prints the review\'s code; an unworded finding is its message, marked as accepted', () => {
    const text = customerException(finding('something-new', 'coil pitch uneven near the ends'), metric);
    expect(text).toBe('Accepted as drawn: Coil pitch uneven near the ends.');
    expect(text).not.toContain('something-new');
  });

  it('open errors and price gaps are the problems; warnings and notes are not', () => {
    const warn: Finding = { ...finding('index-outside-preferred'), severity: 'warning' };
    const problems = issueProblems(metric, [warn, finding('fatigue-fail')], {
      currency: 'USD', minimumOrderValue: 0, breaks: [], charges: [], missing: [{ code: 'no-wire-price', message: 'no price', path: 'materialPrices' }],
    });
    expect(problems.map((p) => [p.kind, p.code, p.path])).toEqual([['finding', 'fatigue-fail', 'spec.freeLength'], ['price', 'no-wire-price', 'settings.materialPrices']]);
  });
});
