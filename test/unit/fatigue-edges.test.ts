/**
 * The fatigue check at the edges of its inputs: a stroke with no alternating stress, a mean stress near zero or
 * of either sign, wire softer than the Zimmerli data, extension working lengths short of the free length.
 * Every figure the report, the traveller and the diagram show stays finite, or is absent with a finding.
 */
import { describe, expect, it } from 'vitest';
import { analyseSpec, calculate } from '../../core/calculate';
import { travellerDocument } from '../../core/documents';
import { goodmanDiagram } from '../../core/drawing/goodman';
import type { Spec } from '../../core/spec';
import { parseSpec } from '../../core/spec';
import type { CompressionReport } from '../../core/springs/compression/report';
import type { ExtensionReport } from '../../core/springs/extension/report';
import type { FatigueResult } from '../../core/springs/fatigue';
import { fatigueCheck, gerberSafetyFactor, goodmanSafetyFactor } from '../../core/springs/fatigue';
import { settingsWith } from '../integration/documents/fixtures';
import { drawbarExtension, valveSpringMetric } from '../fixtures/specs';
import { nonFiniteNumbers } from '../support/random-springs';

const specOf = (input: unknown): Spec => {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.value;
};
const reportOf = (input: unknown) => {
  const r = calculate(input);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};
const fatigueOf = (input: unknown): FatigueResult => {
  const f = (reportOf(input) as { fatigue: FatigueResult | null }).fatigue;
  if (!f) throw new Error('no fatigue check');
  return f;
};

/**
 * Random specs (test/support/random-springs.ts) whose working lengths differ as typed, in the last digits, but
 * give one and the same corrected stress: τa = 0, where the report once showed ∞ for both safety factors.
 */
const hairlineStrokes = {
  extension: {
    kind: 'extension', units: 'inch', material: 'en10270-2-fdc', wireDiameter: 0.03937007874015748, outerDiameter: 0.14025006515599178,
    materialOverrides: { tensileStrength: 192634.28618338762, density: 0.24053906467527036 }, bodyCoils: 1,
    ends: [{ form: 'extended-hook', extension: 0.03937007874015748 }, { form: 'extended-hook', extension: 0.03937007874004046 }],
    initialTension: 0.2248089430997105,
    loads: [{ length: 0.28078063044229545, force: 0.2248089430997105 }, { length: 0.4328559295358054, force: 0.2248089430997105 }, { length: 0.28345415741113617, force: 0.2248089430997105 }],
    duty: { type: 'cyclic', between: [0.561000260623966, 0.5610002606239661], cycles: 1, peened: true, frequency: 1 },
    loopAngle: 1.6099299019462893e-88, aql: 150, finish: 'oil', serviceTemperature: { min: -272.99999999999994, max: -5.013341580194414e-157 },
  },
  compression: {
    kind: 'compression', units: 'metric', material: 'en10270-2-tdsicr', wireDiameter: 0.020000000000000153,
    outerDiameter: 0.10178320179680159, materialOverrides: { tensileStrength: 3717.2295197644335, density: 11.330873665157041 },
    ends: 'closed', totalCoils: 161.87768292357046, freeLength: 8.682874423270633,
    loads: [{ length: 1.895666931970362 }, { length: 4.404211461964268 }],
    duty: { type: 'cyclic', between: [0.17365748846541276, 0.1736574884654126], cycles: 1, peened: true, frequency: 1 },
    quantities: [8349364, 4449404, 4863404], aql: 250, toleranceGrade: 3, finish: 'black oxide (demo)',
    serviceTemperature: { min: -3.4015994138838004e-212, max: -2.2576478177482747e-239 },
  },
};

/** The same, on wire (Rm 370 MPa) too soft for the Zimmerli lines. */
const hairlineStrokeSoftWire = {
  kind: 'extension', units: 'metric', material: 'astm-a229', wireDiameter: 1, innerDiameter: 38.99999999999982,
  materialOverrides: { tensileStrength: 369.6135242917719, density: 21.99999999999996 }, bodyCoils: 1,
  ends: ['machine-loop', 'machine-loop'], initialTension: 99999.99999999843,
  loads: [{ length: 100.54548964555329, force: 1 }, { length: 82.08199999999964, force: 1 }],
  duty: { type: 'cyclic', between: [163.9999999999992, 163.999999999999], cycles: 999999999999.9635, peened: true, frequency: 19999.99999999984 },
  loopAngle: 359.99999999999926, aql: 0.15, toleranceGrade: 3, finish: 'black oxide (demo)',
  serviceTemperature: { min: -9.436873571245523e-259, max: -1.5e-323 },
};

describe('a stroke with no alternating stress', () => {
  it.each(Object.entries(hairlineStrokes))('%s: finite factors, nf = Ssu/τm on both lines', (_kind, input) => {
    const report = reportOf(input);
    expect(nonFiniteNumbers(report)).toEqual([]);
    const f = fatigueOf(input);
    expect(f.stressAlternating).toBe(0);
    // Goodman 1/nf = τa/Sse + τm/Ssu (Shigley 9e §10-9) at τa = 0: the load line meets both lines at Ssu (derived).
    expect(f.goodmanSafetyFactor! / (f.ultimateShear / f.stressMean)).toBeCloseTo(1, 12);
    expect(f.gerberSafetyFactor! / (f.ultimateShear / f.stressMean)).toBeCloseTo(1, 12);
  });

  it('on wire too soft for the Zimmerli lines: no factors, and the finding says why', () => {
    const report = reportOf(hairlineStrokeSoftWire);
    expect(nonFiniteNumbers(report)).toEqual([]);
    const f = fatigueOf(hairlineStrokeSoftWire);
    expect([f.stressAlternating, f.goodmanSafetyFactor, f.gerberSafetyFactor, f.verdict]).toEqual([0, null, null, 'fail']);
    expect(report.findings.find((x) => x.code === 'fatigue-fail')?.message).toMatch(/not above the Zimmerli mean stress/);
  });

  it('the traveller and its fatigue diagram print the same finite figures', () => {
    const spec = specOf(hairlineStrokes.compression);
    const job = { number: 'J-26-0042', customerName: 'Quarry Lane Tools (demo)', customerLines: [], partNumber: 'QL-7', drawingNumber: '', drawingRevision: '', orderQuantity: 100, dueDate: null, leadTimeDays: null };
    const traveller = travellerDocument({ spec, settings: settingsWith(), printedAt: '2026-03-02T09:30:00.000Z', job });
    expect(nonFiniteNumbers(traveller)).toEqual([]);
    const svg = goodmanDiagram(analyseSpec(spec) as CompressionReport) ?? '';
    expect(svg).toMatch(/nf = \d[\d.]* \(Goodman\), \d[\d.]* \(Gerber\)/);
    expect(svg).not.toMatch(/NaN|Infinity|no limit/);
  });

  it('runs on continuously from a small alternating stress (no jump at τa = 0)', () => {
    const ssu = 0.67 * 1800;
    const near = fatigueCheck(500, 500 * (1 - 1e-12), 1800, false);
    const at = fatigueCheck(500, 500, 1800, false);
    expect(at.goodmanSafetyFactor).toBeCloseTo(ssu / 500, 12);
    expect(near.goodmanSafetyFactor!).toBeCloseTo(at.goodmanSafetyFactor!, 9);
    expect(near.gerberSafetyFactor!).toBeCloseTo(at.gerberSafetyFactor!, 9);
    expect(at.verdict).toBe('pass');
  });

  it('a cycle with no stress at all has no factor to show, and passes', () => {
    const f = fatigueCheck(0, 0, 1800, false);
    expect([f.goodmanSafetyFactor, f.gerberSafetyFactor, f.verdict]).toEqual([null, null, 'pass']);
  });
});

describe('the Gerber factor in its cancellation-free form (Shigley 9e §10-9; nf as in Table 6-7, from memory)', () => {
  const ssu = 0.67 * 1800;
  const sse = 241 / (1 - (379 / ssu) ** 2);
  const textbook = (ta: number, tm: number) =>
    0.5 * (ssu / tm) ** 2 * (ta / sse) * (-1 + Math.sqrt(1 + ((2 * tm * sse) / (ssu * ta)) ** 2));

  it('equals the textbook expression where that expression is well conditioned', () => {
    for (const ta of [5, 50, 241, 600]) {
      for (const tm of [100, 379, 900]) expect(gerberSafetyFactor(ta, tm, 241, 379, ssu) / textbook(ta, tm)).toBeCloseTo(1, 11);
    }
  });

  it('tends to Sse/τa as the mean stress vanishes, where the textbook expression cancels to 0', () => {
    expect(textbook(100, 1e-7)).toBe(0);
    expect(gerberSafetyFactor(100, 1e-7, 241, 379, ssu)).toBeCloseTo(sse / 100, 12);
  });

  it('takes the mean shear stress by its size on both lines (a shear stress\'s sign is its direction)', () => {
    expect(gerberSafetyFactor(100, -300, 241, 379, ssu)).toBe(gerberSafetyFactor(100, 300, 241, 379, ssu));
    expect(goodmanSafetyFactor(100, -300, 241, 379, ssu)).toBe(goodmanSafetyFactor(100, 300, 241, 379, ssu));
  });
});

describe('wire softer than the Zimmerli data', () => {
  // Ssu = 0.67·Sut (Shigley 9e §10-9): the Zimmerli mean 379 MPa (534 MPa peened) needs Sut above 565.7 MPa (797 MPa).
  const cyclic = { type: 'cyclic', between: [45, 35], cycles: 1e8 } as const;
  const withStrength = (tensileStrength: number, peened: boolean) => ({
    ...valveSpringMetric, materialOverrides: { ...valveSpringMetric.materialOverrides, tensileStrength }, duty: { ...cyclic, peened },
  });

  it('shows no safety factor and fails the infinite-life check with a finding that says why', () => {
    const report = reportOf(withStrength(500, false));
    const f = fatigueOf(withStrength(500, false));
    expect([f.goodmanSafetyFactor, f.gerberSafetyFactor, f.verdict]).toEqual([null, null, 'fail']);
    const finding = report.findings.find((x) => x.code === 'fatigue-fail');
    expect(finding?.path).toBe('duty');
    expect(finding?.message).toMatch(/335 MPa is not above the Zimmerli mean stress 379 MPa/);
    expect(finding?.fix).toMatch(/higher tensile strength/);
    expect(goodmanDiagram(analyseSpec(specOf(withStrength(500, false))) as CompressionReport)).toMatch(/Zimmerli point beyond the ultimate strength/);
  });

  it('the boundary sits at Ssu = Zimmerli mean, peened or not', () => {
    expect(fatigueOf(withStrength(570, false)).goodmanSafetyFactor).not.toBeNull();
    expect(fatigueOf(withStrength(560, false)).goodmanSafetyFactor).toBeNull();
    expect(fatigueOf(withStrength(800, true)).goodmanSafetyFactor).not.toBeNull();
    expect(fatigueOf(withStrength(790, true)).goodmanSafetyFactor).toBeNull();
  });

  it('the finite-life check still applies below the endurance cycles', () => {
    const f = fatigueOf({ ...withStrength(500, false), duty: { ...cyclic, cycles: 1e5, peened: false } });
    expect(f.finiteLife?.limit).toBeCloseTo(0.36 * 500, 9); // 10⁵ column, not peened (Associated Spring data, from memory)
    expect(f.goodmanSafetyFactor).toBeNull();
  });
});

describe('extension working lengths short of the free length', () => {
  // drawbarExtension: L0 = (Nb + 1)·d + two full loops of the inside diameter = 32.25 + 2 × 10.5 = 53.25 mm.
  const short = { ...drawbarExtension, duty: { type: 'cyclic', between: [40, 75], cycles: 1e8, peened: false } };

  it('are an error on the length, as for a load, and the figures stay finite', () => {
    const report = reportOf(short) as ExtensionReport;
    expect(report.freeLength).toBeCloseTo(53.25, 9);
    const finding = report.findings.find((x) => x.code === 'duty-length-not-above-free-length');
    expect(finding).toMatchObject({ severity: 'error', path: 'duty.between[0]' });
    expect(report.findings.some((x) => x.path === 'duty.between[1]')).toBe(false);
    expect(nonFiniteNumbers(report)).toEqual([]);
  });

  it('the finite-life check takes the larger stress of the cycle by its size', () => {
    const f = fatigueCheck(-900, 100, 2000, false, { cycles: 1e5, fraction: 0.36, limit: 720, source: 'test' });
    expect(f.verdict).toBe('fail');
    expect(fatigueCheck(-700, 100, 2000, false, { cycles: 1e5, fraction: 0.36, limit: 720, source: 'test' }).verdict).toBe('pass');
  });
});
