import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSpec, calculate } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { CompressionSpec, CompressionSpecInput } from '../../core/spec';
import type { CompressionReport } from '../../core/springs/compression/report';
import { permanentSet, SET_STROKES } from '../../core/springs/compression/set-removal';
import { planManufacture } from '../../core/process/plan';
import { defaultSettings } from '../../core/settings/schema';
import type { Settings } from '../../core/settings/schema';
import { referenceSpring } from '../fixtures/specs';

const RM = 1800;
const G = 81500;

const spec = (input: CompressionSpecInput): CompressionSpec => {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.value as CompressionSpec;
};

interface Shape { d: number; index: number; na: number }

const input = (a: Shape, L0: number, material = 'en10270-1-sm'): CompressionSpecInput => ({
  ...referenceSpring, material, wireDiameter: a.d, meanDiameter: a.d * a.index, activeCoils: a.na, freeLength: L0,
  materialOverrides: { shearModulus: G, elasticModulus: 206000, tensileStrength: RM, density: 7.85 },
});

/**
 * Independent of the engine: uncorrected stress per mm of deflection τ/s = G·d/(π·n·D²) (8FD/(πd³) with
 * R = G·d⁴/(8D³n), EN 13906-1 / Shigley 9e Eq. 10-9), and the deflection at which each method's basis stress
 * reaches its limit before set removal.
 */
function yieldDeflections(a: Shape): { handbook: number; en13906: number } {
  const D = a.d * a.index;
  const perDeflection = (G * a.d) / (Math.PI * a.na * D * D);
  const Ks = (2 * a.index + 1) / (2 * a.index); // Shigley 9e Eq. 10-2 (from memory)
  return {
    handbook: (0.45 * RM) / (Ks * perDeflection), // Shigley 9e Table 10-6, cold-drawn carbon, 45 % before set removal
    en13906: (0.56 * RM) / perDeflection, // EN 13906-1 τc,zul ≈ 0.56·Rm at solid, uncorrected (from memory)
  };
}

const solid = (a: Shape) => a.d * (a.na + 2); // closed and ground, Ls = d·Nt (Machinery's Handbook 31e Table 3)
const at = (a: Shape, ratio: number) => solid(a) + ratio * yieldDeflections(a).handbook;
const analyse = (a: Shape, L0: number) => analyseSpec(spec(input(a, L0))) as CompressionReport;

const arbShape = fc.record({
  d: fc.double({ min: 0.5, max: 6, noNaN: true }),
  index: fc.double({ min: 4, max: 14, noNaN: true }),
  na: fc.double({ min: 3, max: 20, noNaN: true }),
});

describe('set removal: one stress basis per method', () => {
  const a = { d: 2, index: 8, na: 8 };

  it('each method states its limits: Table 10-6 on the Ks stress, EN 13906-1 on the uncorrected stress', () => {
    const s = analyse(a, at(a, 1.1)).setRemoval;
    const Ks = 17 / 16;
    const tau = (G * 2) / (Math.PI * 8 * 256) * (at(a, 1.1) - 20);
    expect(s.methods.handbook.stressAtSolid).toBeCloseTo(Ks * tau, 9);
    expect(s.methods.handbook.allowableBefore).toBeCloseTo(0.45 * RM, 9); // Shigley 9e Table 10-6, 45 %
    expect(s.methods.handbook.allowableAfter).toBeCloseTo(0.6 * RM, 9); // Table 10-6, 60–70 %, low end (from memory)
    expect(s.methods.en13906.stressAtSolid).toBeCloseTo(tau, 9);
    expect(s.methods.en13906.allowableBefore).toBeCloseTo(0.56 * RM, 9); // EN 13906-1 (from memory)
    expect(s.methods.en13906.allowableAfter).toBeCloseTo((4 / 3) * 0.56 * RM, 9); // fully plastic wire, derived
    expect(s.methods.handbook.basis).toMatch(/Table 10-6/);
    expect(s.methods.en13906.basis).toMatch(/EN 13906-1/);
  });

  it('property: required ⇔ expected set > 0, for both methods and the governing verdict', () => {
    fc.assert(fc.property(arbShape, fc.double({ min: 0.3, max: 1.6, noNaN: true }), (shape, ratio) => {
      const s = analyse(shape, at(shape, ratio)).setRemoval;
      for (const v of [s, s.methods.handbook, s.methods.en13906]) {
        expect(v.required).toBe(v.ratio > 1);
        if (v.expectedSet !== null) expect(v.required).toBe(v.expectedSet > 0);
        else expect(v.required).toBe(true);
      }
    }), { numRuns: 400 });
  });

  it('property: the coiled length is never shorter than the free length, and the set model returns to it', () => {
    fc.assert(fc.property(arbShape, fc.double({ min: 0.3, max: 1.33, noNaN: true }), (shape, ratio) => {
      const L0 = at(shape, ratio);
      const r = analyse(shape, L0);
      const v = r.setRemoval.methods.handbook;
      if (r.coiler.freeLength !== null) expect(r.coiler.freeLength).toBeGreaterThanOrEqual(L0);
      if (v.coiledFreeLength === null) return;
      expect(v.coiledFreeLength).toBeGreaterThanOrEqual(L0);
      const sY = yieldDeflections(shape).handbook;
      // Elastic–perfectly-plastic round bar (Beer, Johnston, DeWolf & Mazurek, Mechanics of Materials, 7th ed., §3.11, from memory): set = s(1 − 4r/3 + r⁴/3).
      expect(v.coiledFreeLength - permanentSet(v.coiledFreeLength - r.solidLength, sY)).toBeCloseTo(L0, 8);
    }), { numRuns: 300 });
  });

  it('property: the coiled length falls back to the free length as the stress at solid falls to the allowable', () => {
    fc.assert(fc.property(arbShape, (shape) => {
      let previous = Infinity;
      for (const ratio of [1.2, 1.1, 1.05, 1.01, 1.001, 1.0001]) {
        const L0 = at(shape, ratio);
        const v = analyse(shape, L0).setRemoval.methods.handbook;
        const over = v.expectedSet!;
        expect(over).toBeLessThan(previous);
        previous = over;
      }
      expect(previous).toBeLessThan(1e-3 * yieldDeflections(shape).handbook);
      const below = analyse(shape, at(shape, 0.999));
      expect(below.setRemoval.methods.handbook.required).toBe(false);
      if (!below.setRemoval.required) expect(below.coiler.freeLength).toBe(below.freeLength);
    }), { numRuns: 100 });
  });

  it('the stricter method governs by default; a shop setting can name one, and the plan follows it', () => {
    const input0 = input(a, at(a, 1.15));
    const r = analyseSpec(spec(input0)) as CompressionReport;
    expect(r.setRemoval.methods.handbook.required).toBe(true);
    expect(r.setRemoval.methods.en13906.required).toBe(false);
    expect(r.setRemoval.governing).toBe('handbook');
    expect(r.setRemoval.governedBy).toBe('stricter');
    const withMethod = (m: Settings['defaults']['setRemovalMethod']): Settings => {
      const s = defaultSettings();
      return { ...s, defaults: { ...s.defaults, setRemovalMethod: m } };
    };
    const en = planManufacture(spec(input0), withMethod('en13906'), 100);
    expect(en.operations.map((o) => o.kind)).not.toContain('set');
    expect(en.coiledFreeLength).toBeCloseTo(at(a, 1.15), 9);
    const stricter = planManufacture(spec(input0), defaultSettings(), 100);
    expect(stricter.operations.map((o) => o.kind)).toContain('set');
    expect(stricter.findings.find((f) => f.code === 'set-removal-required')?.message).toMatch(/the stricter, handbook method, governs/);
  });

  it('the results the estimator sees route set removal by the same shop setting as the plan', () => {
    const input0 = input(a, at(a, 1.15));
    const s = defaultSettings();
    const en = { ...s, defaults: { ...s.defaults, setRemovalMethod: 'en13906' as const } };
    const shown = calculate(input0, en);
    expect(shown.ok).toBe(true);
    if (!shown.ok) return;
    const r = shown.value as CompressionReport;
    expect(r.setRemoval.governedBy).toBe('en13906');
    expect(r.setRemoval.required).toBe(false);
    const plan = planManufacture(spec(input0), en, 100);
    expect(r.setRemoval.required).toBe(plan.operations.some((o) => o.kind === 'set'));
    const byDefault = calculate(input0);
    expect(byDefault.ok && (byDefault.value as CompressionReport).setRemoval.required).toBe(true);
  });
});

describe('the set the first-off can measure is judged against the shop\'s own free-length table', () => {
  const a = { d: 2, index: 8, na: 8 };
  const shopWith = (plusMinus: number): Settings => {
    const s = defaultSettings();
    // Every band: no percentage, a flat minimum of ±plusMinus (the shop's own rule).
    const rows = s.toleranceTables.freeLength.rows.map((r) => ({ ...r, percent: 0, minimum: plusMinus }));
    return { ...s, toleranceTables: { ...s.toleranceTables, freeLength: { ...s.toleranceTables.freeLength, rows } } };
  };
  it('a set under the shop\'s band warns, naming the shop\'s table; a band under the set clears it (common trade practice)', () => {
    for (let ratio = 1.0; ratio <= 1.3; ratio += 0.005) {
      const r = analyseSpec(spec(input(a, at(a, ratio))), shopWith(10)) as CompressionReport;
      if (!r.setRemoval.required || r.setRemoval.bound !== null) continue;
      const set = r.setRemoval.expectedSet ?? 0;
      const warned = r.findings.find((f) => f.code === 'set-below-length-tolerance');
      expect(set).toBeLessThan(10);
      expect(warned?.message).toMatch(/±10\.00 mm \(the shop's free length table/);
      const tight = analyseSpec(spec(input(a, at(a, ratio))), shopWith(set / 2)) as CompressionReport;
      expect(tight.findings.map((f) => f.code)).not.toContain('set-below-length-tolerance');
      return;
    }
    throw new Error('no clean set-removal spring in the range');
  });
});

describe('set removal: outputs stay within stated physical limits', () => {
  const a = { d: 2, index: 8, na: 8 };

  it('beyond a fully plastic wire there is no coiled length, only an error with the fix', () => {
    const r = analyse(a, at(a, 1.5));
    expect(r.setRemoval.methods.handbook.bound).toBe('beyond-fully-plastic');
    expect(r.coiler.freeLength).toBeNull();
    const f = r.findings.find((x) => x.code === 'solid-stress-over-set-removed-allowable');
    expect(f?.severity).toBe('error');
    expect(f?.fix).toMatch(/shorten the free length/);
  });

  it('a coiled pitch beyond 0.65 × the mean diameter (common practice) is an error, and the traveller holds the coiler', () => {
    const wide = { d: 2, index: 12, na: 8 };
    const L0 = at(wide, 1.29);
    const r = analyse(wide, L0);
    expect(r.setRemoval.bound).toBe('pitch-over-coiler');
    expect(r.setRemoval.methods.handbook.coiledPitch!).toBeGreaterThan(0.65 * 24);
    expect(r.findings.find((x) => x.code === 'coiled-length-out-of-bounds')?.severity).toBe('error');
    const plan = planManufacture(spec(input(wide, L0)), defaultSettings(), 100);
    const coil = plan.operations[0]!;
    expect(coil.settings.find((s) => s.label === 'Coiled free length')?.value).toBe('not set: see findings');
    expect(coil.notes.join(' ')).toMatch(/HOLD/);
    expect(plan.coiledFreeLength).toBeNull();
  });

  it('a set larger than the spring\'s own deflection to solid is an error', () => {
    const r = analyse({ d: 2, index: 4, na: 8 }, at({ d: 2, index: 4, na: 8 }, 1.325));
    expect(r.setRemoval.bound).toBe('set-over-deflection');
    expect(r.coiler.freeLength).toBeNull();
  });
});

describe('set removal findings fire and clear at every index 4 to 12 (d 2 mm, 8 active coils, SM wire)', () => {
  const codes = ['set-removal-required', 'set-below-length-tolerance', 'set-ratio-high', 'coiled-length-out-of-bounds',
    'solid-stress-over-set-removed-allowable'] as const;
  for (let index = 4; index <= 12; index++) {
    it(`index ${index}`, () => {
      const shape = { d: 2, index, na: 8 };
      const fired = new Set<string>();
      const cleared = new Set<string>();
      let cleanSetRemoval = false;
      for (let ratio = 0.8; ratio <= 1.6; ratio += 0.0025) {
        const found = new Set(analyse(shape, at(shape, ratio)).findings.map((f) => f.code));
        for (const c of codes) (found.has(c) ? fired : cleared).add(c);
        if (found.has('set-removal-required') && codes.every((c) => c === 'set-removal-required' || !found.has(c))) cleanSetRemoval = true;
      }
      for (const c of codes) {
        expect(fired, `${c} fires`).toContain(c);
        expect(cleared, `${c} clears`).toContain(c);
      }
      expect(cleanSetRemoval, 'a set-removal spring with no warning').toBe(true);
    });
  }
});

describe('the coiler\'s settings for the coiled spring', () => {
  const a = { d: 2, index: 8, na: 8 };
  const L0 = at(a, 1.2);
  const r = analyse(a, L0);

  it('pitch and wire per piece are taken at the coiled length (Machinery\'s Handbook 31e Table 3; wire length common practice)', () => {
    const coiled = r.coiler.freeLength!;
    expect(coiled).toBeGreaterThan(L0);
    expect(r.coiler.pitch).toBeCloseTo((coiled - 2 * 2) / 8, 12);
    expect(r.coiler.wireLength).toBeCloseTo(8 * Math.hypot(Math.PI * 16, r.coiler.pitch!) + 2 * Math.PI * 16, 9);
    expect(r.wireLength).toBe(r.coiler.wireLength);
    expect(r.coiler.expectedSet).toBeCloseTo(coiled - L0, 12);
    expect(r.coiler).toMatchObject({ totalCoils: 10, activeCoils: 8, pressStrokes: SET_STROKES });
  });

  it('the routing\'s coil and set operations carry the same values', () => {
    const plan = planManufacture(spec(input(a, L0)), defaultSettings(), 100);
    const value = (kind: string, label: string) => plan.operations.find((o) => o.kind === kind)!.settings.find((s) => s.label === label)?.value;
    expect(value('coil', 'Coiled free length')).toBe(r.coiler.freeLength);
    expect(value('coil', 'Pitch as coiled')).toBe(r.coiler.pitch);
    expect(value('coil', 'Wire per piece')).toBe(r.coiler.wireLength);
    expect(value('set', 'Expected set')).toBe(r.coiler.expectedSet);
    expect(value('set', 'Strokes')).toBe(SET_STROKES);
    expect(plan.wireLengthPerPiece).toBe(r.coiler.wireLength);
  });
});

describe('set removal in the spec\'s units', () => {
  it('an inch spec reports the same coiled length, pitch and set, in inches', async () => {
    const { calculate } = await import('../../core/calculate');
    const a = { d: 2, index: 8, na: 8 };
    const metricInput = input(a, at(a, 1.2));
    const inchInput = {
      ...metricInput, units: 'inch' as const, wireDiameter: 2 / 25.4, meanDiameter: 16 / 25.4, freeLength: at(a, 1.2) / 25.4,
      materialOverrides: { shearModulus: G / 0.006894757293168361, elasticModulus: 206000 / 0.006894757293168361,
        tensileStrength: RM / 0.006894757293168361, density: 7.85 / 27.679904710203125 },
    };
    const m = calculate(metricInput);
    const i = calculate(inchInput);
    if (!m.ok || !i.ok || m.value.kind !== 'compression' || i.value.kind !== 'compression') throw new Error('expected reports');
    expect(i.value.coiler.freeLength! * 25.4).toBeCloseTo(m.value.coiler.freeLength!, 6);
    expect(i.value.coiler.pitch! * 25.4).toBeCloseTo(m.value.coiler.pitch!, 6);
    expect(i.value.setRemoval.methods.en13906.coiledFreeLength! * 25.4).toBeCloseTo(m.value.setRemoval.methods.en13906.coiledFreeLength!, 6);
    expect(i.value.setRemoval.expectedSet! * 25.4).toBeCloseTo(m.value.setRemoval.expectedSet!, 6);
  });
});
