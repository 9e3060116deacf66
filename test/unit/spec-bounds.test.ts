import { describe, expect, it } from 'vitest';
import { ISO_2859_AQLS, parseSpec, specBounds } from '../../core/spec';
import { drawbarExtension, lidTorsion, valveSpringMetric } from '../fixtures/specs';

const errorsOf = (raw: unknown) => {
  const r = parseSpec(raw);
  return r.ok ? [] : r.errors;
};

describe('every number of a spec has a plausible range', () => {
  it.each([
    ['1e9 body coils', { ...drawbarExtension, bodyCoils: 1e9 }, 'bodyCoils'],
    ['1e15 total coils', { ...valveSpringMetric, totalCoils: 1e15, freeLength: 1e17 }, 'totalCoils'],
    ['OD 1e300', { ...valveSpringMetric, outerDiameter: 1e300 }, 'outerDiameter'],
    ['a mill certificate at 1e300 MPa', { ...valveSpringMetric, materialOverrides: { tensileStrength: 1e300 } }, 'materialOverrides.tensileStrength'],
    ['a modulus of 1e-300', { ...valveSpringMetric, materialOverrides: { shearModulus: 1e-300 } }, 'materialOverrides.shearModulus'],
    ['a density of 1e-300', { ...valveSpringMetric, materialOverrides: { density: 1e-300 } }, 'materialOverrides.density'],
    ['1e-9 cycles', { ...valveSpringMetric, duty: { type: 'cyclic', between: [40, 30], cycles: 1e-9 } }, 'duty.cycles'],
    ['−300 °C, below absolute zero', { ...valveSpringMetric, serviceTemperature: { min: -300, max: 20 } }, 'serviceTemperature.min'],
    ['−460 °F, below absolute zero (−459.67 °F)', { ...valveSpringMetric, units: 'inch', wireDiameter: 0.16, outerDiameter: 1, freeLength: 2.5, loads: [], serviceTemperature: { min: -460, max: 70 } }, 'serviceTemperature.min'],
    ['a leg 1 km long', { ...lidTorsion, legs: [{ length: 1e6 }, { length: 20 }] }, 'legs[0].length'],
    ['a load of 1e12 N', { ...valveSpringMetric, loads: [{ length: 40, force: 1e12 }] }, 'loads[0].force'],
    ['a torque of 1e15 N·mm', { ...lidTorsion, loads: [{ angle: 90, torque: 1e15 }] }, 'loads[0].torque'],
    ['an order of 1e12 pieces', { ...valveSpringMetric, quantities: [1e12] }, 'quantities[0]'],
    ['wire 5 in thick', { ...valveSpringMetric, units: 'inch', wireDiameter: 5, outerDiameter: 40, freeLength: 100, loads: [] }, 'wireDiameter'],
  ])('refuses %s with the field path', (_what, raw, path) => {
    const errors = errorsOf(raw);
    const hit = errors.find((e) => e.path === path);
    expect(hit, JSON.stringify(errors)).toBeDefined();
    expect(hit!.code).toBe('out-of-range');
    expect(hit!.message).toMatch(/must be .* and at most .*: /);
  });

  it('catches mill-certificate values typed in MPa on an inch spec (psi expected)', () => {
    const paths = errorsOf({ ...valveSpringMetric, units: 'inch', wireDiameter: 0.08, outerDiameter: 0.8, freeLength: 2.4, loads: [] }).map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['materialOverrides.shearModulus', 'materialOverrides.tensileStrength']));
  });

  // Poisson's ratio ν = E/(2G) − 1 (any strength-of-materials text); EN 13906-1 Table 3 pairs G and E near ν = 0.3.
  it('refuses a shear modulus that cannot pair with the grade\'s elastic modulus', () => {
    const bronze = { ...valveSpringMetric, material: 'astm-b159', materialOverrides: { shearModulus: 103400 } };
    expect(errorsOf(bronze).find((e) => e.path === 'materialOverrides.shearModulus')?.code).toBe('moduli-do-not-pair');
    expect(errorsOf({ ...valveSpringMetric, materialOverrides: { shearModulus: 79300, elasticModulus: 206000 } })).toEqual([]);
  });

  it('states the range in the spec\'s own units', () => {
    const inch = errorsOf({ ...valveSpringMetric, units: 'inch', wireDiameter: 5, outerDiameter: 40, freeLength: 100, loads: [] });
    expect(inch.find((e) => e.path === 'wireDiameter')!.message).toMatch(/at most 3\.94 in/);
  });

  it('accepts 3 in bar in inch units and the example springs as they are', () => {
    expect(errorsOf({ ...valveSpringMetric, materialOverrides: undefined, units: 'inch', wireDiameter: 3, outerDiameter: 30, totalCoils: 6, freeLength: 40, loads: [] }).filter((e) => e.code === 'out-of-range')).toEqual([]);
    for (const spec of [valveSpringMetric, drawbarExtension, lidTorsion]) expect(parseSpec(spec).ok).toBe(true);
  });

  // ISO 2859-1, clause 5.4 and the column heads of Tables 2-A to 2-C: the preferred AQL series (from memory).
  it('takes the AQL from ISO 2859-1\'s list only', () => {
    expect(errorsOf({ ...valveSpringMetric, aql: 1e9 }).find((e) => e.path === 'aql')?.code).toBe('aql-not-iso-2859');
    expect(errorsOf({ ...valveSpringMetric, aql: 0.3 }).find((e) => e.path === 'aql')?.code).toBe('aql-not-iso-2859');
    for (const aql of [0.065, 0.65, 1, 2.5, 6.5, 1000]) expect(parseSpec({ ...valveSpringMetric, aql }).ok).toBe(true);
    expect(ISO_2859_AQLS).toHaveLength(26);
  });

  it('gives every bound a reason, a range that is not empty, and a minimum above absolute zero for temperatures', () => {
    for (const [name, b] of Object.entries(specBounds)) {
      expect(b.reason.length, name).toBeGreaterThan(30);
      expect(b.max, name).toBeGreaterThan(b.min);
      expect(Number.isFinite(b.max), name).toBe(true);
    }
    expect(specBounds.temperature).toMatchObject({ min: -273.15, minExclusive: true });
  });
});
