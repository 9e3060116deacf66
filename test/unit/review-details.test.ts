import { describe, expect, it } from 'vitest';
import { analyseSpec } from '../../core/calculate';
import { parseSpec } from '../../core/spec';
import type { CompressionSpecInput, ExtensionSpecInput, Spec, TorsionSpecInput } from '../../core/spec';
import type { CompressionReport } from '../../core/springs/compression/report';
import type { ExtensionReport } from '../../core/springs/extension/report';
import type { TorsionReport } from '../../core/springs/torsion/report';
import { planManufacture } from '../../core/process/plan';
import { defaultSettings } from '../../core/settings/schema';
import { drawbarExtension, lidTorsion, referenceSpring } from '../fixtures/specs';

const specOf = (input: unknown): Spec => {
  const parsed = parseSpec(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.value;
};
const compression = (input: CompressionSpecInput) => analyseSpec(specOf(input)) as CompressionReport;
const extension = (input: ExtensionSpecInput) => analyseSpec(specOf(input)) as ExtensionReport;
const torsion = (input: TorsionSpecInput) => analyseSpec(specOf(input)) as TorsionReport;
const codes = (r: { findings: { code: string }[] }) => r.findings.map((f) => f.code);

describe('solid length and coil clearance per EN 13906-1', () => {
  // closed, not ground, d 2 mm, nt 10: handbook d(nt + 1) = 22 mm (Machinery's Handbook 31e Table 3);
  // EN 13906-1 (from memory) (nt + 1.5)·d_max = 11.5 × 2.025 = 23.2875 mm (d_max: EN 10218-2 T5 ±0.025 mm, from memory)
  const closed = { ...referenceSpring, ends: 'closed' as const };
  const r = compression(closed);

  it('gives both solid lengths', () => {
    expect(r.solidLength).toBeCloseTo(22, 12);
    expect(r.solidLengthMaximum).toBeCloseTo(23.2875, 12);
    expect(r.solidLengthMaximumSource).toMatch(/EN 13906-1.*\(nt \+ 1\.5\)/);
  });

  it('the inspection limit "solid length (maximum)" is the maximum with the wire tolerance', () => {
    const plan = planManufacture(specOf(closed), defaultSettings(), 500);
    const c = plan.inspection.characteristics.find((x) => x.name === 'Solid length (maximum)')!;
    expect(c.upper).toBeCloseTo(23.2875, 12);
    // a conforming spring of maximum-tolerance wire measures 23.0 mm at solid: inside the limit
    expect(23.0).toBeLessThanOrEqual(c.upper!);
  });

  it('the coil-clearance check starts from the maximum: coils that touch at the working length are warned', () => {
    // Sa = (0.0015·D²/d + 0.1·d)·n = 4.0 mm (EN 13906-1 via the FEBROTEC FAQ), so Ln = 27.2875 mm
    expect(r.minimumWorkingLength).toBeCloseTo(27.2875, 10);
    const between = compression({ ...closed, loads: [{ length: 26.5 }] }); // over Ls + Sa = 26, under Lc,max + Sa
    expect(codes(between)).toContain('coil-clearance');
    expect(codes(compression({ ...closed, loads: [{ length: 27.5 }] }))).not.toContain('coil-clearance');
  });
});

describe('torsion springs loaded to unwind', () => {
  it('take the lower allowable the warning names: 0.8 × (Associated Spring static torsion table ratio, from memory)', () => {
    const closing = torsion(lidTorsion);
    const opening = torsion({ ...lidTorsion, loadDirection: 'opening', arborDiameter: undefined });
    // Shigley 9e Eq. 10-57: 0.78·Sut for music wire, Sut 2000 MPa (override)
    expect(closing.allowableStress).toBeCloseTo(0.78 * 2000, 9);
    expect(opening.allowableStress).toBeCloseTo(0.8 * 0.78 * 2000, 9);
    expect(opening.findings.find((f) => f.code === 'loaded-against-wind')?.message).toMatch(/1248 MPa/);
  });
});

describe('fatigue data', () => {
  const bronze = 'astm-b159';
  const cyclic = { type: 'cyclic' as const, between: [50, 40] as [number, number], cycles: 1e7, peened: false };

  it('non-ferrous wire has no steel fatigue data: a finding, not a pass (compression, extension, torsion)', () => {
    const c = compression({ ...referenceSpring, material: bronze, materialOverrides: undefined, duty: cyclic });
    expect(c.fatigue).toBeNull();
    expect(c.findings.find((f) => f.code === 'no-fatigue-data')?.severity).toBe('warning');
    const e = extension({ ...drawbarExtension, material: bronze, materialOverrides: undefined,
      duty: { type: 'cyclic', between: [70, 80], cycles: 1e6, peened: false } });
    expect(e.fatigue).toBeNull();
    expect(codes(e)).toContain('no-fatigue-data');
    const t = torsion({ ...lidTorsion, material: bronze, materialOverrides: undefined,
      duty: { type: 'cyclic', between: [60, 90], cycles: 1e5, peened: false } });
    expect(t.fatigue).toBeNull();
    expect(codes(t)).toContain('no-fatigue-data');
    expect(codes(compression({ ...referenceSpring, duty: cyclic }))).not.toContain('no-fatigue-data');
  });

  it('fewer cycles than the endurance data: the finite-life table decides (Associated Spring, stress ratio 0, from memory)', () => {
    const at = (cycles: number, peened = false) => compression({ ...referenceSpring, duty: { ...cyclic, cycles, peened } }).fatigue!;
    expect(at(1e5).finiteLife!.fraction).toBeCloseTo(0.36, 12);
    expect(at(1e5, true).finiteLife!.fraction).toBeCloseTo(0.42, 12);
    expect(at(1e6).finiteLife!.fraction).toBeCloseTo(0.33, 12);
    expect(at(1e4).finiteLife!.fraction).toBeCloseTo(0.36, 12); // below 10⁵ the 10⁵ column holds
    expect(at(10 ** 6.5).finiteLife!.fraction).toBeCloseTo(0.315, 12); // linear in log(cycles), common practice
    expect(at(1e7).finiteLife).toBeNull(); // Zimmerli infinite life
    const f = at(1e5);
    expect(f.verdict).toBe(f.stressMax <= 0.36 * f.ultimateShear / 0.67 ? 'pass' : 'fail');
  });

  it('a finite-life failure names the cycles and the table', () => {
    const hard = compression({ ...referenceSpring, freeLength: 60, duty: { ...cyclic, between: [59, 25], cycles: 2e5 } });
    const f = hard.findings.find((x) => x.code === 'fatigue-fail');
    expect(f?.message).toMatch(/finite-life check fail at 200000 cycles/);
  });
});

describe('buckling margin', () => {
  it('a working length within 20 % of the buckling deflection gets a note (common trade practice)', () => {
    const slender = { ...referenceSpring, freeLength: 120, seating: 'both-hinged' as const };
    const sK = compression(slender).bucklingDeflection!;
    const near = compression({ ...slender, loads: [{ length: 120 - 0.9 * sK }] });
    expect(codes(near)).toContain('near-buckling');
    expect(codes(near)).not.toContain('buckling');
    expect(codes(compression({ ...slender, loads: [{ length: 120 - 0.7 * sK }] }))).not.toContain('near-buckling');
  });
});

describe('hook bend radius', () => {
  it('a radius given on the drawing is never reported as assumed', () => {
    // d = 1.5 mm: assumed radius 2·d = 3 mm (Shigley 9e §10-11, C2 = 4)
    const givenTighter = extension({ ...drawbarExtension, ends: [{ form: 'full-loop', bendRadius: 2.5 }, 'full-loop'] });
    expect(givenTighter.hookBendRadius).toBeCloseTo(2.5, 12);
    expect(codes(givenTighter)).not.toContain('hook-bend-assumed');
    const givenLooser = extension({ ...drawbarExtension, ends: [{ form: 'full-loop', bendRadius: 5 }, 'full-loop'] });
    expect(givenLooser.hookBendRadius).toBeCloseTo(3, 12);
    expect(codes(givenLooser)).toContain('hook-bend-assumed');
    const both = extension({ ...drawbarExtension, ends: [{ form: 'full-loop', bendRadius: 3 }, { form: 'full-loop', bendRadius: 3 }] });
    expect(codes(both)).not.toContain('hook-bend-assumed');
  });
});
