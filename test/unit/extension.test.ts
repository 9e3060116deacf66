import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSpec, calculate } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { ExtensionSpec, ExtensionSpecInput } from '../../core/spec';
import { initialTensionStressRange } from '../../core/springs/extension/initial-tension';
import { MM_PER_IN, MPA_PER_PSI, N_PER_LBF } from '../../core/units';
import { drawbarExtension } from '../fixtures/specs';

const spec = (input: ExtensionSpecInput): ExtensionSpec => {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  if (parsed.value.kind !== 'extension') throw new Error('not an extension spec');
  return parsed.value;
};
const psi = (mpa: number) => mpa / MPA_PER_PSI;

describe('Machinery\'s Handbook 31e extension-spring example (p. 328)', () => {
  // d = 0.0625 in, OD = 0.75 in, initial tension 2 lb, maximum load 9 lb (Machinery's Handbook 31e, extension-spring worked example, p. 328).
  const base: ExtensionSpecInput = {
    kind: 'extension', units: 'inch', material: 'astm-a228', wireDiameter: 0.0625, outerDiameter: 0.75, bodyCoils: 12,
    ends: ['machine-loop', 'machine-loop'], initialTension: 2, loads: [],
  };
  const probe = analyseSpec(spec(base));
  const atNine = probe.freeLength + (9 * N_PER_LBF - probe.initialTension) / probe.rate;
  const r = analyseSpec(spec({ ...base, loads: [{ length: atNine / MM_PER_IN }] }));

  it('index 11 and initial-tension stress 14 340 psi, uncorrected (±0.2 %)', () => {
    expect(r.springIndex).toBeCloseTo(11, 10);
    expect(psi(r.initialTensionStress) / 14340).toBeCloseTo(1, 2);
  });

  it('7 lb above the initial tension adds 50 200 psi, uncorrected (±0.2 %)', () => {
    const added = r.loads[0]!.stressUncorrected - r.initialTensionStress;
    expect(psi(added) / 50200).toBeCloseTo(1, 2);
  });

  it('corrected total at 9 lb ≈ 72 285 psi: the handbook reads K = 1.12 from its chart, the formula gives 1.130 (within 1 %)', () => {
    expect(r.loads[0]!.force / N_PER_LBF).toBeCloseTo(9, 9);
    expect(r.stressCorrectionFactor).toBeCloseTo(1.12, 1);
    expect(Math.abs(psi(r.loads[0]!.stress) / 72285 - 1)).toBeLessThan(0.01);
  });
});

describe('initial tension window (Shigley 9e §10-11 curve fit, from memory)', () => {
  it('C = 11: 7 780 … 13 320 psi, centre 10 551 (Shigley 9e §10-11 initial-tension curve fit, derived)', () => {
    const w = initialTensionStressRange(11);
    expect(Math.abs(psi(w.min) - 7780)).toBeLessThan(10);
    expect(Math.abs(psi(w.max) - 13320)).toBeLessThan(10);
    expect(Math.abs(psi(w.centre) - 10551)).toBeLessThan(10);
  });

  it('proposes the window\'s centre when no initial tension is given', () => {
    const r = analyseSpec(spec({ ...drawbarExtension, initialTension: undefined }));
    expect(r.initialTensionProposed).toBe(true);
    expect(r.initialTensionStress).toBeCloseTo(initialTensionStressRange(r.springIndex).centre, 9);
    expect(r.findings.map((f) => f.code)).toContain('initial-tension-proposed');
  });
});

describe('extension analysis of the contract example', () => {
  const r = analyseSpec(spec(drawbarExtension));

  it('Na = Nb + G/E and the free length inside the ends is (Nb + 1)·d plus one inside diameter per full loop', () => {
    expect(r.activeCoils).toBeCloseTo(20.5 + 81500 / 206000, 12);
    expect(r.freeLength).toBeCloseTo(21.5 * 1.5 + 2 * 10.5, 10);
    expect(r.rate).toBeCloseTo((81500 * 1.5 ** 4) / (8 * 12 ** 3 * r.activeCoils), 10);
  });

  it('force at a length is the initial tension plus rate × extension', () => {
    expect(r.loads[1]!.extension).toBeCloseTo(80 - r.freeLength, 10);
    expect(r.loads[1]!.force).toBeCloseTo(8 + r.rate * (80 - r.freeLength), 10);
  });

  it('hook stresses with (K)A at C1 = C and (K)B at C2 = 2r2/d, at the largest load (Shigley 9e §10-11)', () => {
    const F = r.loads[1]!.force;
    const C = 8;
    const kA = (4 * C * C - C - 1) / (4 * C * (C - 1));
    expect(r.hookBendingStress).toBeCloseTo(F * (kA * 16 * 12 / (Math.PI * 1.5 ** 3) + 4 / (Math.PI * 1.5 ** 2)), 8);
    const c2 = 4; // r2 assumed 2·d
    expect(r.hookTorsionStress).toBeCloseTo(((4 * c2 - 1) / (4 * c2 - 4)) * 8 * F * 12 / (Math.PI * 1.5 ** 3), 8);
  });

  it('the safe length is where the first section reaches its allowable', () => {
    const atSafe = analyseSpec(spec({ ...drawbarExtension, loads: [{ length: r.maximumSafeLength }] }));
    const ratios = [atSafe.bodyStress / atSafe.allowables.body, atSafe.hookTorsionStress / atSafe.allowables.hookTorsion,
      atSafe.hookBendingStress / atSafe.allowables.hookBending];
    expect(Math.max(...ratios)).toBeCloseTo(1, 9);
  });

  it('flags a missing mechanical stop, a load shorter than the free length and a tight hook bend', () => {
    const bad = analyseSpec(spec({ ...drawbarExtension, loads: [{ length: 40 }], ends: [{ form: 'full-loop', bendRadius: 1 }, 'full-loop'] }));
    const codes = bad.findings.map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['no-mechanical-stop', 'load-length-not-above-free-length', 'hook-bend-tight']));
    expect(bad.findings.find((f) => f.code === 'hook-bend-tight')!.path).toBe('ends[0].bendRadius');
  });

  it('checks the drawing\'s free and body lengths against what the coils and loops make', () => {
    const codes = (input: ExtensionSpecInput) => analyseSpec(spec(input)).findings.map((f) => f.code);
    expect(codes({ ...drawbarExtension, freeLength: 53.25, bodyLength: 32.25 })).not.toEqual(expect.arrayContaining(['free-length-mismatch']));
    expect(codes({ ...drawbarExtension, bodyLength: 32.25 })).not.toContain('body-length-mismatch');
    const off = analyseSpec(spec({ ...drawbarExtension, freeLength: 60, bodyLength: 36 })).findings;
    expect(off.map((f) => f.code)).toEqual(expect.arrayContaining(['free-length-mismatch', 'body-length-mismatch']));
    expect(off.find((f) => f.code === 'body-length-mismatch')!.fix).toMatch(/^23\.0 body coils/);
  });

  it('initial tension above the preferred window is a warning: the window is a preferred range (Shigley 9e §10-11 curve fit), not a limit', () => {
    const bad = analyseSpec(spec({ ...drawbarExtension, initialTension: 60 }));
    expect(bad.findings.find((f) => f.code === 'initial-tension-too-high')?.severity).toBe('warning');
  });

  it('reports in the spec\'s units through calculate', () => {
    const result = calculate(drawbarExtension);
    expect(result.ok).toBe(true);
    if (!result.ok || result.value.kind !== 'extension') return;
    expect(result.value.initialTension).toBeCloseTo(8, 10);
    expect(result.value.freeLength).toBeCloseTo(53.25, 10);
  });
});

describe('extension properties', () => {
  const arb = fc.record({
    d: fc.double({ min: 0.5, max: 4, noNaN: true }), index: fc.double({ min: 5, max: 12, noNaN: true }),
    nb: fc.double({ min: 5, max: 40, noNaN: true }), f: fc.double({ min: 1.1, max: 2, noNaN: true }),
  });
  const build = (a: { d: number; index: number; nb: number }): ExtensionSpecInput => ({
    ...drawbarExtension, wireDiameter: a.d, outerDiameter: a.d * (a.index + 1), bodyCoils: a.nb, loads: [],
  });

  it('rate ∝ 1/D³ and ∝ 1/Na (Shigley 9e Eq. 10-9 with Na = Nb + G/E)', () => {
    fc.assert(fc.property(arb, (a) => {
      const base = analyseSpec(spec(build(a)));
      const coarser = analyseSpec(spec({ ...build(a), meanDiameter: a.d * a.index * a.f, outerDiameter: undefined }));
      expect(coarser.rate / base.rate).toBeCloseTo(a.f ** -3, 9);
      const more = analyseSpec(spec({ ...build(a), bodyCoils: a.nb * a.f }));
      expect(more.rate / base.rate).toBeCloseTo(base.activeCoils / more.activeCoils, 9);
    }), { numRuns: 200 });
  });

  it('inch and metric agree to 1e-9 relative', () => {
    fc.assert(fc.property(arb, (a) => {
      const m = build(a);
      const inch: ExtensionSpecInput = {
        ...m, units: 'inch', wireDiameter: m.wireDiameter / MM_PER_IN, outerDiameter: m.outerDiameter! / MM_PER_IN,
        initialTension: m.initialTension! / N_PER_LBF,
        materialOverrides: { shearModulus: 81500 / MPA_PER_PSI, elasticModulus: 206000 / MPA_PER_PSI, tensileStrength: 2000 / MPA_PER_PSI, density: 7.85 / 27.679904710203125 },
      };
      const rm = analyseSpec(spec(m));
      const ri = analyseSpec(spec(inch));
      for (const k of ['rate', 'freeLength', 'initialTensionStress', 'maximumSafeLength', 'wireLength', 'mass'] as const) {
        expect(Math.abs(ri[k] / rm[k] - 1)).toBeLessThan(1e-9);
      }
    }), { numRuns: 200 });
  });
});
