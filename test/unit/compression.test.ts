import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSpec, calculate } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { CompressionSpec, CompressionSpecInput } from '../../core/spec';
import { MM_PER_IN, MPA_PER_PSI, N_PER_LBF } from '../../core/units';
import { referenceSpring, valveSpringMetric } from '../fixtures/specs';

const spec = (input: CompressionSpecInput): CompressionSpec => {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  if (parsed.value.kind !== 'compression') throw new Error('not a compression spec');
  return parsed.value;
};

describe('compression analysis of the reference spring (d 2, D 20, n 8)', () => {
  const r = analyseSpec(spec(referenceSpring));

  it('rate, surge frequency and minimum gaps match Shigley 9e Eqs. 10-9, 10-25 and FEBROTEC\'s Sa rule (derived)', () => {
    expect(r.rate).toBeCloseTo(2.547, 3);
    expect(r.naturalFrequency / 226.6).toBeCloseTo(1, 2);
    expect(r.coilGapSum).toBeCloseTo(4.0, 10);
  });

  it('end table: closed and ground, Nt = Na + 2, Ls = d·Nt, p = (L0 − 2d)/Na (Machinery\'s Handbook 31e Table 3)', () => {
    expect(r.totalCoils).toBe(10);
    expect(r.solidLength).toBeCloseTo(20, 12);
    expect(r.pitch).toBeCloseTo((60 - 4) / 8, 12);
  });

  it('the clearance check starts from the largest solid length nt·d_max (EN 13906-1, from memory; d_max = 2 + 0.025 mm, EN 10218-2 T5 from memory)', () => {
    expect(r.wireDiameterMaximum).toBeCloseTo(2.025, 12);
    expect(r.solidLengthMaximum).toBeCloseTo(10 * 2.025, 12);
    // Sa = 4.0 mm for this spring (engineering check row 19, FEBROTEC formula).
    expect(r.minimumWorkingLength).toBeCloseTo(20.25 + 4, 10);
  });

  it('stresses use k = (w + 0.5)/(w − 0.75) on 8FD/(πd³) (EN 13906-1)', () => {
    const tau = (8 * r.solidForce * 20) / (Math.PI * 8);
    expect(r.stressAtSolidUncorrected).toBeCloseTo(tau, 9);
    expect(r.stressAtSolid).toBeCloseTo(tau * (10.5 / 9.25), 9);
  });

  it('developed wire length is pitch-true: Na·√((πD)² + p²) + (Nt − Na)·πD (common practice)', () => {
    const p = 7;
    expect(r.wireLength).toBeCloseTo(8 * Math.hypot(Math.PI * 20, p) + 2 * Math.PI * 20, 9);
    expect(r.mass).toBeCloseTo(7.85e-6 * Math.PI * r.wireLength, 12);
  });
});

describe('compression report in the spec\'s units', () => {
  it('reports the metric example and flags nothing it should not', () => {
    const result = calculate(valveSpringMetric);
    expect(result.ok).toBe(true);
    if (!result.ok || result.value.kind !== 'compression') throw new Error('expected a compression report');
    const r = result.value;
    expect(r.outerDiameter).toBeCloseTo(22, 10);
    expect(r.meanDiameter).toBeCloseTo(20, 10);
    expect(r.tensileStrength).toBe(1900);
    expect(r.tensileStrengthBasis).toBe('override');
    expect(r.loads).toHaveLength(2);
    expect(r.loads[1]!.force).toBeCloseTo(r.rate * 25, 9);
    // R = G·d⁴/(8·D³·n) (Shigley 9e Eq. 10-9) = 81 500·16/(8·8000·8) = 2.547 N/mm, so F at 35 mm is
    // 63.7 N, inside 70 N ± 10 %: the only finding is that a drawing fixing geometry and a force is over-determined.
    expect(r.rate).toBeCloseTo(2.547, 3);
    expect(Math.abs(r.loads[1]!.force - 70) / 70).toBeLessThan(0.1);
    expect(r.findings.map((f) => [f.code, f.severity, f.path])).toEqual([['over-determined', 'warning', 'loads[1].force']]);
  });

  it('a drawing fixing geometry and a force is over-determined until the EN 15800 free parameters are released', () => {
    const codes = (input: CompressionSpecInput) => analyseSpec(spec(input)).findings.map((f) => f.code);
    expect(codes({ ...valveSpringMetric, freeParameters: [] })).toContain('over-determined');
    expect(codes({ ...valveSpringMetric, freeParameters: ['coils', 'wireDiameter'] })).not.toContain('over-determined');
    expect(codes({ ...valveSpringMetric, freeParameters: ['freeLength'] })).not.toContain('over-determined');
    const twoForces = { ...valveSpringMetric, loads: [{ length: 45, force: 38 }, { length: 35, force: 64 }] };
    expect(codes({ ...twoForces, freeParameters: ['coils', 'wireDiameter'] })).toContain('over-determined');
    expect(codes({ ...twoForces, freeParameters: ['freeLength', 'coils', 'wireDiameter'] })).not.toContain('over-determined');
  });

  it('the over-determined finding names only what the drawing still fixes', () => {
    const message = (input: CompressionSpecInput) => analyseSpec(spec(input)).findings.find((f) => f.code === 'over-determined')?.message;
    expect(message({ ...valveSpringMetric, freeParameters: [] })).toContain('fixes wire diameter, coil diameter, coils and free length');
    const coilsFreed = message({ ...valveSpringMetric, freeParameters: ['coils'] });
    expect(coilsFreed).toContain('fixes wire diameter, coil diameter and free length and a toleranced force');
    expect(coilsFreed).not.toMatch(/coils/);
  });

  it('a force outside its tolerance is an error finding on that load, with a free length that fixes it', () => {
    const r = analyseSpec(spec({ ...valveSpringMetric, loads: [{ length: 35, force: 200, tolerancePercent: 5 }] }));
    const f = r.findings.find((x) => x.code === 'load-outside-tolerance');
    expect(f?.severity).toBe('error');
    expect(f?.path).toBe('loads[0].force');
    expect(f?.fix).toMatch(/free length of \d+\.\d\d mm/);
  });
});

const metricToInch = (s: CompressionSpecInput): CompressionSpecInput => {
  const L = (v: number) => v / MM_PER_IN;
  const o = s.materialOverrides!;
  return {
    ...s,
    units: 'inch',
    wireDiameter: L(s.wireDiameter),
    outerDiameter: s.outerDiameter === undefined ? undefined : L(s.outerDiameter),
    meanDiameter: s.meanDiameter === undefined ? undefined : L(s.meanDiameter),
    freeLength: L(s.freeLength),
    loads: (s.loads ?? []).map((l) => ({ ...l, length: L(l.length), force: l.force === undefined ? undefined : l.force / N_PER_LBF })),
    materialOverrides: {
      shearModulus: o.shearModulus! / MPA_PER_PSI,
      elasticModulus: o.elasticModulus! / MPA_PER_PSI,
      tensileStrength: o.tensileStrength === undefined ? undefined : o.tensileStrength / MPA_PER_PSI,
      density: o.density! / 27.679904710203125,
    },
  };
};

const numericFields = ['rate', 'solidLength', 'stressAtSolid', 'wireLength', 'mass', 'naturalFrequency',
  'minimumWorkingLength', 'outerDiameterAtSolid', 'slendernessLimit', 'allowableStress'] as const;

describe('properties', () => {
  const arbSpring = fc.record({
    d: fc.double({ min: 0.5, max: 6, noNaN: true }),
    index: fc.double({ min: 4, max: 14, noNaN: true }),
    na: fc.double({ min: 3, max: 20, noNaN: true }),
    gap: fc.double({ min: 0.3, max: 3, noNaN: true }),
  });
  const build = (a: { d: number; index: number; na: number; gap: number }): CompressionSpecInput => ({
    ...referenceSpring,
    wireDiameter: a.d,
    meanDiameter: a.d * a.index,
    activeCoils: a.na,
    freeLength: a.d * (a.na + 2) + a.gap * a.d * a.na,
    materialOverrides: { shearModulus: 81500, elasticModulus: 206000, tensileStrength: 1800, density: 7.85 },
  });

  it('rate ∝ d⁴, ∝ 1/D³, ∝ 1/n (Shigley 9e Eq. 10-9)', () => {
    fc.assert(fc.property(arbSpring, fc.double({ min: 1.1, max: 2, noNaN: true }), (a, f) => {
      const base = analyseSpec(spec(build(a))).rate;
      const moreWire = analyseSpec(spec({ ...build(a), wireDiameter: a.d * f, freeLength: build(a).freeLength * f * 2 })).rate;
      const biggerCoil = analyseSpec(spec({ ...build(a), meanDiameter: a.d * a.index * f })).rate;
      const moreCoils = analyseSpec(spec({ ...build(a), activeCoils: a.na * f, freeLength: build(a).freeLength * f * 2 })).rate;
      expect(moreWire / base).toBeCloseTo(f ** 4, 9);
      expect(biggerCoil / base).toBeCloseTo(f ** -3, 9);
      expect(moreCoils / base).toBeCloseTo(1 / f, 9);
    }), { numRuns: 200 });
  });

  it('the same spring in inch and metric agrees to 1e-9 relative', () => {
    fc.assert(fc.property(arbSpring, (a) => {
      const metric = analyseSpec(spec(build(a)));
      const inch = analyseSpec(spec(metricToInch(build(a))));
      for (const field of numericFields) {
        expect(Math.abs(inch[field] / metric[field] - 1)).toBeLessThan(1e-9);
      }
    }), { numRuns: 300 });
  });
});
