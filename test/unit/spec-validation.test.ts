import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseSpec } from '../../core/spec';
import { drawbarExtension, lidTorsion, valveSpringMetric } from '../fixtures/specs';

const errorsOf = (raw: unknown) => {
  const r = parseSpec(raw);
  return r.ok ? [] : r.errors;
};

describe('spec validation names the field', () => {
  it('accepts the example spec', () => {
    expect(parseSpec(valveSpringMetric).ok).toBe(true);
  });

  it.each([
    [{ ...valveSpringMetric, colour: 'red' }, 'colour', 'unknown-field'],
    [{ ...valveSpringMetric, wireDiameter: '2' }, 'wireDiameter', undefined],
    [{ ...valveSpringMetric, wireDiameter: -2 }, 'wireDiameter', undefined],
    [{ ...valveSpringMetric, freeLength: 0 }, 'freeLength', undefined],
    [{ ...valveSpringMetric, innerDiameter: 18 }, 'outerDiameter', 'diameter-count'],
    [{ ...valveSpringMetric, outerDiameter: 5 }, 'outerDiameter', 'index-too-small'],
    [{ ...valveSpringMetric, totalCoils: 40 }, 'freeLength', 'solid-above-free-length'],
    [{ ...valveSpringMetric, material: 'unobtainium' }, 'material', 'unknown-material'],
    [{ ...valveSpringMetric, loads: [{ length: 65 }] }, 'loads[0].length', 'load-length-not-below-free-length'],
    [{ ...valveSpringMetric, loads: [{ length: 40, force: 'x' }] }, 'loads[0].force', undefined],
    [{ ...valveSpringMetric, loads: [{ length: 40, tolerancePercent: 5 }] }, 'loads[0].tolerancePercent', undefined],
    [{ ...valveSpringMetric, materialOverrides: { shearModulus: 1, hardness: 50 } }, 'materialOverrides.hardness', 'unknown-field'],
    [{ ...valveSpringMetric, ends: 'squashed' }, 'ends', undefined],
    [{ ...valveSpringMetric, kind: 'leaf' }, 'kind', undefined],
    [{ ...valveSpringMetric, duty: { type: 'cyclic', between: [50, 50], cycles: 1e6 } }, 'duty.between[1]', 'no-stroke'],
    [{ ...valveSpringMetric, totalCoils: 2 }, 'totalCoils', 'too-few-coils'],
  ])('%#: error at %s', (raw, path, code) => {
    const errors = errorsOf(raw);
    const hit = errors.find((e) => e.path === path);
    expect(hit, JSON.stringify(errors)).toBeDefined();
    if (code) expect(hit!.code).toBe(code);
    expect(hit!.message.length).toBeGreaterThan(5);
  });

  it('rejects a non-object with a root error', () => {
    for (const raw of [null, 3, 'spec', [valveSpringMetric]]) {
      expect(errorsOf(raw)[0]!.code).toBe('not-an-object');
    }
  });
});

/** Mutations of a valid spec: a field replaced by a wrong value, removed, or an extra field added. */
const badValue = fc.oneof(
  fc.constant(null), fc.constant(-1), fc.constant(0), fc.constant(''), fc.constant('12'), fc.constant([]),
  fc.constant({}), fc.constant(true), fc.constant(Number.NaN), fc.constant(1e308 * 10), fc.double(), fc.string(),
);
const fields = Object.keys(valveSpringMetric);

describe('2 000 malformed specs', () => {
  it('never throw, and every error has a code, a message and a field path', () => {
    let rejected = 0;
    fc.assert(fc.property(
      fc.array(fc.tuple(fc.constantFrom(...fields, 'extra', 'loads'), badValue, fc.boolean()), { minLength: 1, maxLength: 4 }),
      (mutations) => {
        const raw: Record<string, unknown> = structuredClone(valveSpringMetric) as Record<string, unknown>;
        for (const [field, value, remove] of mutations) {
          if (remove && field !== 'extra') delete raw[field];
          else if (field === 'loads') raw.loads = [{ length: value }];
          else raw[field] = value;
        }
        const result = parseSpec(raw);
        if (result.ok) return;
        rejected++;
        for (const e of result.errors) {
          expect(e.code).toMatch(/^[a-z-]+$/);
          expect(e.message.length).toBeGreaterThan(3);
          expect(e.path.length).toBeGreaterThan(0);
        }
      },
    ), { numRuns: 2000 });
    expect(rejected).toBeGreaterThan(1500);
  });
});

describe('malformed extension and torsion specs', () => {
  it.each([
    ['extension', drawbarExtension],
    ['torsion', lidTorsion],
  ] as const)('%s: 1 000 mutations never throw, and every error names a field', (_kind, base) => {
    const keys = Object.keys(base);
    let rejected = 0;
    fc.assert(fc.property(
      fc.array(fc.tuple(fc.constantFrom(...keys, 'extra'), badValue, fc.boolean()), { minLength: 1, maxLength: 4 }),
      (mutations) => {
        const raw: Record<string, unknown> = structuredClone(base) as Record<string, unknown>;
        for (const [field, value, remove] of mutations) {
          if (remove && field !== 'extra') delete raw[field];
          else raw[field] = value;
        }
        const result = parseSpec(raw);
        if (result.ok) return;
        rejected++;
        for (const e of result.errors) {
          expect(e.code).toMatch(/^[a-z-]+$/);
          expect(e.path.length).toBeGreaterThan(0);
        }
      },
    ), { numRuns: 1000 });
    expect(rejected).toBeGreaterThan(700);
  });

  it.each([
    [{ ...drawbarExtension, ends: ['full-loop'] }, 'ends'],
    [{ ...drawbarExtension, ends: ['extended-hook', 'full-loop'] }, 'ends[0]'],
    [{ ...drawbarExtension, initialTension: -1 }, 'initialTension'],
    [{ ...lidTorsion, windDirection: 'up' }, 'windDirection'],
    [{ ...lidTorsion, legs: [{ length: 0 }, { length: 30 }] }, 'legs[0].length'],
    [{ ...lidTorsion, loads: [{ angle: 30, tolerancePercent: 5 }] }, 'loads[0].tolerancePercent'],
  ])('%#: error at %s', (raw, path) => {
    const errors = errorsOf(raw);
    expect(errors.map((e) => e.path), JSON.stringify(errors)).toContain(path);
  });
});
