import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSpec } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { TorsionSpec, TorsionSpecInput } from '../../core/spec';
import { torqueRatePerDegreeEn, torqueRatePerTurn } from '../../core/springs/torsion/rate';
import { MM_PER_IN, MPA_PER_PSI } from '../../core/units';
import { lidTorsion } from '../fixtures/specs';

const spec = (input: TorsionSpecInput): TorsionSpec => {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  if (parsed.value.kind !== 'torsion') throw new Error('not a torsion spec');
  return parsed.value;
};

describe('torsion rate: EN 13906-3 theoretical form against the handbook 10.8 form', () => {
  // E = 206 000 N/mm², d = 2, D = 20 mm, n = 5: derived from EN 13906-3 RM = E·d⁴/(3667·D·n) (from memory) and
  // the handbook form k' = E·d⁴/(10.8·D·n) per turn (Shigley 9e §10-12, from memory).
  it('EN: 8.988 N·mm/°; 10.8 form: 3 052 N·mm/turn = 8.478 N·mm/° (±0.1 %)', () => {
    expect(torqueRatePerDegreeEn(206000, 2, 20, 5) / 8.988).toBeCloseTo(1, 3);
    expect(torqueRatePerTurn(206000, 2, 20, 5) / 3052).toBeCloseTo(1, 3);
    expect(torqueRatePerTurn(206000, 2, 20, 5) / 360 / 8.478).toBeCloseTo(1, 3);
  });

  it('3667 = 64·180/π, and 10.8 × 360 = 3888 (EN 13906-3 constant, from memory; derived)', () => {
    expect((64 * 180) / Math.PI).toBeCloseTo(3667, 0);
    expect(torqueRatePerDegreeEn(1, 1, 1, 1) / (torqueRatePerTurn(1, 1, 1, 1) / 360)).toBeCloseTo(3888 / 3667, 12);
  });
});

describe('torsion analysis of the contract example', () => {
  const r = analyseSpec(spec(lidTorsion));

  it('active coils add the legs: Na = Nb + (l1 + l2)/(3πD) (Shigley 9e §10-12)', () => {
    expect(r.activeCoils).toBeCloseTo(5.25 + 55 / (3 * Math.PI * 20), 12);
    expect(r.ratePerTurn).toBeCloseTo((2 ** 4 * 206000) / (10.8 * 20 * r.activeCoils), 9);
    expect(r.ratePerDegree).toBeCloseTo(r.ratePerTurn / 360, 12);
  });

  it('torque from the rate per turn and Ki-corrected bending stress at each angle', () => {
    const ki = (4 * 100 - 10 - 1) / (4 * 10 * 9);
    expect(r.loads[1]!.torque).toBeCloseTo(r.ratePerDegree * 90, 9);
    expect(r.loads[1]!.stress).toBeCloseTo((ki * 32 * r.loads[1]!.torque) / (Math.PI * 8), 9);
  });

  it('the inside diameter closes as the body winds up: D\' = D·Nb/(Nb + θc)', () => {
    const bodyTurns = (90 / 360) * (5.25 / r.activeCoils);
    expect(r.meanDiameterAtLoad).toBeCloseTo((20 * 5.25) / (5.25 + bodyTurns), 10);
    expect(r.arborClearance).toBeCloseTo(r.insideDiameterAtLoad - 15, 10);
    expect(r.insideDiameterAtLoad).toBeLessThan(18);
  });

  it('flags a tight arbor, loading against the wind and a tight leg bend', () => {
    const bad = analyseSpec(spec({ ...lidTorsion, arborDiameter: 17.5, loadDirection: 'opening', legs: [{ length: 25, form: 'radial', bendRadius: 1 }, { length: 30 }] }));
    const codes = bad.findings.map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['loaded-against-wind', 'leg-bend-tight']));
    const binds = analyseSpec(spec({ ...lidTorsion, arborDiameter: 17.9, loads: [{ angle: 300 }] }));
    expect(binds.findings.find((f) => f.code === 'binds-on-arbor')?.severity).toBe('error');
  });

  it('an arbor that does not fit the free spring is a spec error on arborDiameter', () => {
    const parsed = parseSpec({ ...lidTorsion, arborDiameter: 18 });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.errors[0]!.path).toBe('arborDiameter');
  });

  it('stress over the allowable at a large angle is an error on that load', () => {
    const big = analyseSpec(spec({ ...lidTorsion, loads: [{ angle: 2 * r.maximumSafeAngle }] }));
    expect(big.findings.find((f) => f.code === 'bending-stress-over-allowable')?.path).toBe('loads[0].angle');
  });
});

describe('torsion properties', () => {
  const arb = fc.record({
    d: fc.double({ min: 0.5, max: 4, noNaN: true }), index: fc.double({ min: 5, max: 12, noNaN: true }),
    nb: fc.double({ min: 3, max: 20, noNaN: true }), f: fc.double({ min: 1.1, max: 2, noNaN: true }),
  });
  const build = (a: { d: number; index: number; nb: number }): TorsionSpecInput => ({
    ...lidTorsion, wireDiameter: a.d, outerDiameter: undefined, meanDiameter: a.d * a.index, bodyCoils: a.nb,
    arborDiameter: undefined, legs: [{ length: 10 * a.d }, { length: 12 * a.d }],
  });

  it('rate per turn ∝ d⁴ (legs scaled with the coil), ∝ 1/(D·Na)', () => {
    fc.assert(fc.property(arb, (a) => {
      const base = analyseSpec(spec(build(a)));
      const heavier = analyseSpec(spec({ ...build(a), wireDiameter: a.d * a.f, meanDiameter: a.d * a.index }));
      expect(heavier.ratePerTurn / base.ratePerTurn).toBeCloseTo(a.f ** 4 * (base.activeCoils / heavier.activeCoils), 9);
      const more = analyseSpec(spec({ ...build(a), bodyCoils: a.nb * a.f }));
      expect(more.ratePerTurn / base.ratePerTurn).toBeCloseTo(base.activeCoils / more.activeCoils, 9);
    }), { numRuns: 200 });
  });

  it('inch and metric agree to 1e-9 relative', () => {
    fc.assert(fc.property(arb, (a) => {
      const m = build(a);
      const L = (v: number) => v / MM_PER_IN;
      const inch: TorsionSpecInput = {
        ...m, units: 'inch', wireDiameter: L(m.wireDiameter), meanDiameter: L(m.meanDiameter!),
        legs: [{ length: L(m.legs[0].length) }, { length: L(m.legs[1].length) }],
        materialOverrides: { elasticModulus: 206000 / MPA_PER_PSI, tensileStrength: 2000 / MPA_PER_PSI, density: 7.85 / 27.679904710203125 },
      };
      const rm = analyseSpec(spec(m));
      const ri = analyseSpec(spec(inch));
      for (const k of ['ratePerTurn', 'ratePerDegreeTheoretical', 'insideDiameterAtLoad', 'maximumSafeAngle', 'wireLength', 'mass', 'allowableStress'] as const) {
        expect(Math.abs(ri[k] / rm[k] - 1)).toBeLessThan(1e-9);
      }
    }), { numRuns: 200 });
  });
});
