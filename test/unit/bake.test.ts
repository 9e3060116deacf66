import { describe, expect, it } from 'vitest';
import {
  bakeGuidance, bakeSpecifications, checkBakeSpecification, hardnessFromHv, hardnessFromTensile, parseBakeCondition, parseBakeSpecification,
} from '../../core/finishing/bake';
import type { BakeOptions, BakeStatement } from '../../core/finishing/bake';
import { hrcToHv, tensileToHrc } from '../../core/finishing/bake-hardness';
import { astmB850 } from '../../core/finishing/bake-specs';

const says = (tensile: number, spec: BakeStatement['spec'], options: BakeOptions = {}): BakeStatement => {
  const r = bakeGuidance(tensile, options);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
  const s = r.value.find((x) => x.spec === spec);
  if (!s) throw new Error(`no statement for ${spec}`);
  return s;
};
const codes = (findings: { code: string; severity: string }[]): string[] => findings.map((f) => `${f.severity} ${f.code}`);

describe('ASTM B850 bake by tensile strength (plater\'s B850 chart, sonicplatinginc.com)', () => {
  it('1450 MPa: at least 16 h at 190–220 °C (§8 row 12)', () => {
    const s = says(1450, 'astm-b850');
    expect(s.status).toBe('bake');
    expect(s.hours).toEqual({ min: 16, max: null });
    expect(s.temperatureC).toEqual({ min: 190, max: 220 });
  });

  it('1050 MPa: at least 8 h; under 1000 MPa a bake is not essential (§8 row 13)', () => {
    expect(says(1050, 'astm-b850').hours?.min).toBe(8);
    expect(says(950, 'astm-b850').status).toBe('no-bake');
    expect(says(1000, 'astm-b850').status).toBe('no-bake');
  });

  it('every printed band: 8, 10, … 22 h from 1001–1100 to 1701–1800 MPa (B850 chart)', () => {
    expect([1050, 1150, 1250, 1350, 1450, 1550, 1650, 1750].map((t) => says(t, 'astm-b850').hours?.min))
      .toEqual([8, 10, 12, 14, 16, 18, 20, 22]);
  });

  it('band edges are inclusive above: 1100 MPa → 8 h, 1100.5 → 10 h, 1800 → 22 h', () => {
    expect(says(1100, 'astm-b850').hours?.min).toBe(8);
    expect(says(1100.5, 'astm-b850').hours?.min).toBe(10);
    expect(says(1800, 'astm-b850').hours?.min).toBe(22);
  });

  it('over 1800 MPa (most spring wire) the partial table does not reach: not covered, no number', () => {
    const s = says(1900, 'astm-b850');
    expect(s.status).toBe('not-covered');
    expect(s.hours).toBeNull();
    expect(s.says).toMatch(/full standard/);
  });

  it('the approximate HRC printed beside the chart: 1450 MPa ≈ 44 HRC (§8 row 12, sonicplatinginc.com)', () => {
    expect(hardnessFromTensile(1450).hrc).toBeCloseTo(44, 5);
    expect(hardnessFromTensile(1900).bound).toBe('at-least');
  });
});

describe('hardness-based specifications', () => {
  it('SAE/USCAR-5: 4 h at 200 °C up to 390 HV, 8 h above (§8 row 14, finishing.com thread summary)', () => {
    const low = says(1200, 'sae-uscar-5', { hardnessHv: 380 });
    const high = says(1200, 'sae-uscar-5', { hardnessHv: 400 });
    expect(`${low.hours?.min} h at ${low.temperatureC?.min} °C`).toBe('4 h at 200 °C');
    expect(`${high.hours?.min} h at ${high.temperatureC?.min} °C`).toBe('8 h at 200 °C');
  });

  it('ISO 4042:2018: 400 HV bake required; 370 HV not required with process verification (§8 row 15, ulstandardspdf.com excerpt)', () => {
    expect(says(1300, 'iso-4042', { hardnessHv: 400 }).status).toBe('bake');
    const mid = says(1300, 'iso-4042', { hardnessHv: 370 });
    expect(mid.status).toBe('conditional');
    expect(mid.says).toMatch(/process verification/);
    expect(says(1000, 'iso-4042', { hardnessHv: 340 }).status).toBe('no-bake');
  });

  it('ASTM F1941: from 40 HRC bake within 4 h at 350–450 °F (swplating.com summary)', () => {
    const s = says(1400, 'astm-f1941', { hardnessHv: 420 });
    expect(s.status).toBe('bake');
    expect(s.startWithinHours).toBe(4);
    expect(s.temperatureC?.min).toBeCloseTo(176.67, 2); // 350 °F
    expect(s.temperatureC?.max).toBeCloseTo(232.22, 2); // 450 °F
    expect(says(1000, 'astm-f1941', { hardnessHv: 300 }).status).toBe('no-bake');
  });

  it('SAE AMS 2759/9: 375 ± 25 °F, at least 3 h, start within 1 h (smfi.net summary)', () => {
    const s = says(1500, 'sae-ams-2759-9');
    expect(s.hours?.min).toBe(3);
    expect(s.startWithinHours).toBe(1);
    expect(s.temperatureC?.max).toBeCloseTo(204.44, 2); // 400 °F
  });

  it('a converted hardness near a threshold is flagged borderline; a stated hardness is not', () => {
    expect(says(1230, 'iso-4042').borderline).toBe(true);
    expect(says(1230, 'iso-4042', { hardnessHv: 395 }).borderline).toBe(false);
    expect(says(1700, 'iso-4042').borderline).toBe(false);
  });

  it('the conversion is marked approximate; E140 puts 40 HRC at 392 HV (from memory)', () => {
    expect(hardnessFromTensile(1450).source).toMatch(/approximate/);
    expect(hardnessFromHv(392).hrc).toBeCloseTo(40, 5);
    expect(hrcToHv.source).toMatch(/from memory/);
  });
});

describe('guidance lists every specification and never picks one', () => {
  it('one statement per nameable specification, then the spring maker\'s practice', () => {
    const r = bakeGuidance(1450);
    expect(r.ok && r.value.map((s) => s.spec)).toEqual([...bakeSpecifications, 'spring-maker-practice']);
    if (r.ok) for (const s of r.value) expect(s.source.length).toBeGreaterThan(15);
  });

  it('the maker\'s 45 min–2 h practice is flagged against B850\'s 16 h at 1450 MPa (katyspring.com vs B850 chart)', () => {
    const s = says(1450, 'spring-maker-practice');
    expect(s.hours).toEqual({ min: 0.75, max: 2 });
    expect(s.conflict).toMatch(/ASTM B850.*16 h/);
  });

  it('rejects a strength that is not a positive number', () => {
    const r = bakeGuidance(-5);
    expect(r.ok ? '' : r.errors[0]?.path).toBe('tensileStrength');
  });
});

describe('checking the named specification', () => {
  it('none named on high-strength plated steel is an error; at 900 MPa a note', () => {
    expect(codes(checkBakeSpecification(undefined, 1600))).toEqual(['error bake-spec-missing']);
    expect(codes(checkBakeSpecification('  ', 900))).toEqual(['note bake-spec-missing']);
    expect(checkBakeSpecification(undefined, 1600)[0]?.path).toBe('bakeSpecification');
  });

  it('an unknown name is an error', () => {
    expect(codes(checkBakeSpecification('house bake', 1600))).toEqual(['error bake-spec-unknown']);
  });

  it('reads the usual ways of writing the names', () => {
    expect(['ASTM B850-98', 'ASTM B850 (R2009)', 'ISO 4042:2018', 'SAE/USCAR-5', 'ASTM F1941-16', 'AMS 2759/9', 'astm-b850']
      .map(parseBakeSpecification))
      .toEqual(['astm-b850', 'astm-b850', 'iso-4042', 'sae-uscar-5', 'astm-f1941', 'sae-ams-2759-9', 'astm-b850']);
  });

  it('reads a specification written with its bake condition, and not one naming two standards', () => {
    expect(['ISO 4042, 4 h at 200 °C', 'ASTM B850, 22 h at 200 °C', 'SAE AMS 2759/9 (3 h, 375 °F)', 'B850 class ER-1']
      .map(parseBakeSpecification)).toEqual(['iso-4042', 'astm-b850', 'sae-ams-2759-9', 'astm-b850']);
    expect(parseBakeSpecification('ISO 4042 or ASTM B850')).toBeNull();
    expect(parseBakeSpecification('ISO 40421')).toBeNull();
    expect(parseBakeCondition('ASTM B850, 22 h at 200 °C')).toEqual({ hours: 22, temperatureC: 200 });
    // 375 °F = 190.56 °C ((375 − 32) × 5/9, NIST SP 811 B.8)
    expect(parseBakeCondition('SAE AMS 2759/9 (3 h, 375 °F)')?.temperatureC).toBeCloseTo(190.56, 2);
  });

  it('the bake written with the specification is checked as a planned one, on the specification\'s field', () => {
    // ASTM B850 chart (sonicplatinginc.com): 1401–1500 MPa needs at least 16 h at 190–220 °C.
    expect(checkBakeSpecification('ASTM B850, 22 h at 200 °C', 1450)).toEqual([]);
    const short = checkBakeSpecification('ASTM B850, 4 h at 200 °C', 1450);
    expect(codes(short)).toEqual(['error bake-too-short']);
    expect(short[0]?.path).toBe('bakeSpecification');
  });

  it('the fix names specifications as people write them, never internal ids', () => {
    const [unknown] = checkBakeSpecification('house bake', 1600);
    expect(unknown?.fix).toContain('ASTM B850, ISO 4042, SAE/USCAR-5, ASTM F1941, SAE AMS 2759/9');
    expect(unknown?.fix).not.toMatch(/astm-b850|iso-4042/);
    expect(checkBakeSpecification(undefined, 1600)[0]?.fix).not.toMatch(/astm-b850|iso-4042/);
  });

  it('B850 named for 1900 MPa wire: the partial table does not cover it', () => {
    expect(codes(checkBakeSpecification('ASTM B850', 1900))).toEqual(['warning bake-spec-not-covered']);
  });

  it('B850 at 1450 MPa: 8 h planned is too short, 180 °C too cold, 16 h at 200 °C meets it', () => {
    const short = checkBakeSpecification('ASTM B850', 1450, { planned: { hours: 8, temperatureC: 200 } });
    expect(codes(short)).toEqual(['error bake-too-short']);
    expect(short[0]?.path).toBe('bake.hours');
    expect(codes(checkBakeSpecification('ASTM B850', 1450, { planned: { hours: 16, temperatureC: 180 } })))
      .toEqual(['error bake-temperature-low']);
    expect(checkBakeSpecification('ASTM B850', 1450, { planned: { hours: 16, temperatureC: 200 } })).toEqual([]);
  });

  it('F1941 at 1600 MPa: a bake 6 h after plating misses the 4 h window', () => {
    const f = checkBakeSpecification('ASTM F1941', 1600, { planned: { hours: 4, temperatureC: 200, startWithinHours: 6 } });
    expect(codes(f)).toEqual(['error bake-start-late']);
  });

  it('ISO 4042 at 1230 MPa: conditional, and the converted hardness is too close to call', () => {
    expect(codes(checkBakeSpecification('ISO 4042', 1230))).toEqual(['warning bake-conditional', 'warning hardness-borderline']);
  });

  it('the B850 data keep the chart as printed', () => {
    expect(astmB850.bands.map((b) => b.upTo)).toEqual([1100, 1200, 1300, 1400, 1500, 1600, 1700, 1800]);
    astmB850.bands.forEach((b, i) => {
      if (i > 0) expect(b.over).toBe(astmB850.bands[i - 1]?.upTo);
    });
    expect(astmB850.bands[0]?.over).toBe(astmB850.notEssentialUpTo);
    for (const pts of [tensileToHrc.points, hrcToHv.points]) {
      pts.forEach((p, i) => {
        if (i > 0) {
          expect(p[0]).toBeGreaterThan(pts[i - 1]?.[0] as number);
          expect(p[1]).toBeGreaterThan(pts[i - 1]?.[1] as number);
        }
      });
    }
  });
});
