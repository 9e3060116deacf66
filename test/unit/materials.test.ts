import { describe, it, expect } from 'vitest';
import {
  findGrade, gradeSummaries, staticAllowables, tensileStrengthAt, wireGrades, wireProperties,
} from '../../core/materials';
import type { Sourced, WireGrade } from '../../core/materials';
import { MM_PER_IN, MPA_PER_PSI } from '../../core/units';

const KSI = 1000 * MPA_PER_PSI;
const inch = (x: number): number => x * MM_PER_IN;

function grade(id: string): WireGrade {
  const g = findGrade(id);
  if (!g) throw new Error(`no grade ${id}`);
  return g;
}

/** Strength in ksi at a diameter given in inches. */
function ksiAt(id: string, dIn: number): { min: number; max: number | null } {
  const r = tensileStrengthAt(grade(id), inch(dIn));
  return { min: r.min / KSI, max: r.max === null ? null : r.max / KSI };
}

function props(id: string, d: number) {
  const r = wireProperties(id, d);
  if (!r) throw new Error(`no grade ${id}`);
  return r;
}

describe('minimum tensile strength: standards tables', () => {
  it('ASTM A228 music wire at 0.010, 0.063, 0.125 and 0.250 in', () => {
    // ASTM A228 table as reprinted by interwiregroup.com
    const cases: [number, number, number][] = [[0.010, 387, 428], [0.063, 293, 324], [0.125, 261, 288], [0.250, 230, 255]];
    for (const [d, min, max] of cases) {
      const r = ksiAt('astm-a228', d);
      expect(r.min).toBeCloseTo(min, 9);
      expect(r.max).toBeCloseTo(max, 9);
    }
  });

  it('ASTM A227 hard-drawn at 0.062 in, class I and class II', () => {
    // ASTM A227 table as reprinted by interwiregroup.com
    expect(ksiAt('astm-a227-1', 0.062).min).toBeCloseTo(237, 9);
    expect(ksiAt('astm-a227-1', 0.062).max).toBeCloseTo(272, 9);
    expect(ksiAt('astm-a227-2', 0.062).min).toBeCloseTo(273, 9);
    expect(ksiAt('astm-a227-2', 0.062).max).toBeCloseTo(308, 9);
  });

  it('EN 10270-1 SM and DM at 2, 5 and 10 mm', () => {
    // EN 10270-1 as reprinted by mollificiomodenese.it
    const cases: [number, number, number][] = [[2.0, 1760, 1970], [5.0, 1460, 1650], [10.0, 1240, 1400]];
    for (const id of ['en10270-1-sm', 'en10270-1-dm']) {
      for (const [d, min, max] of cases) {
        expect(tensileStrengthAt(grade(id), d)).toMatchObject({ min, max, basis: 'table', verified: true });
      }
    }
  });

  it('EN 10270-1 SH and DH at 0.30 and 0.40 mm', () => {
    // EN 10270-1 as reprinted by durofer.ch
    for (const id of ['en10270-1-sh', 'en10270-1-dh']) {
      expect(tensileStrengthAt(grade(id), 0.3)).toMatchObject({ min: 2660, max: 2940, verified: true });
      expect(tensileStrengthAt(grade(id), 0.4)).toMatchObject({ min: 2560, max: 2830, verified: true });
    }
  });

  it('EN 10270-3 1.4310 NS at 1, 2 and 5 mm, maximum = minimum + 15 %', () => {
    // EN 10270-3 as reprinted by stahlbecker.com
    const g = grade('en10270-3-1.4310');
    for (const [d, min] of [[1.0, 1900], [2.0, 1700], [5.0, 1450]] as const) {
      const r = tensileStrengthAt(g, d);
      expect(r.min).toBe(min);
      expect(r.max).toBeCloseTo(min * 1.15, 9);
    }
  });

  it('EN 10270-2 FDC and VDSiCr at 0.60 mm', () => {
    // EN 10270-2 as reprinted by metalleschmidt.de
    expect(tensileStrengthAt(grade('en10270-2-fdc'), 0.6)).toMatchObject({ min: 1900, max: 2100, basis: 'table' });
    expect(tensileStrengthAt(grade('en10270-2-fdsicr'), 0.6)).toMatchObject({ min: 2100, max: 2300, basis: 'table', verified: true });
    expect(tensileStrengthAt(grade('en10270-2-tdsicr'), 0.6)).toMatchObject({ min: 2080, max: 2230, basis: 'table', verified: true });
    expect(tensileStrengthAt(grade('en10270-2-vdsicr'), 0.6)).toMatchObject({ min: 2080, max: 2230, basis: 'table' });
  });

  it('the 1.4310 table is stepped: 0.9 mm takes the "≤ 1.00" band, 1.01 mm the next', () => {
    // EN 10270-3 as reprinted by stahlbecker.com
    const g = grade('en10270-3-1.4310');
    expect(tensileStrengthAt(g, 0.9).min).toBe(1900);
    expect(tensileStrengthAt(g, 1.01).min).toBe(1850);
  });

  it('between two table rows the value is linear in d and lies between the rows', () => {
    // EN 10270-1 SM rows 1.0 mm (1980–2250) and 1.5 mm (1850–2080), mollificiomodenese.it; midpoint derived
    const mid = tensileStrengthAt(grade('en10270-1-sm'), 1.25);
    expect(mid.min).toBeCloseTo((1980 + 1850) / 2, 9);
    expect(mid.max).toBeCloseTo((2250 + 2080) / 2, 9);
    // ASTM A228 rows 0.010 in (387 ksi) and 0.012 in (377 ksi), interwiregroup.com
    const r = ksiAt('astm-a228', 0.011);
    expect(r.min).toBeLessThan(387);
    expect(r.min).toBeGreaterThan(377);
  });

  it('a value interpolated towards a from-memory row says so', () => {
    // EN 10270-1 SH rows: 0.45 mm read (durofer.ch), 1.0 mm from memory
    const r = tensileStrengthAt(grade('en10270-1-sh'), 0.7);
    expect(r.verified).toBe(false);
    expect(r.source).toContain('from memory');
    expect(r.min).toBeLessThan(2510);
    expect(r.min).toBeGreaterThan(2230);
  });
});

describe('A / d^m fits', () => {
  const US_TO_SI = (A: number, m: number) => 6.894757 * 25.4 ** m * A;

  it('music wire A = 201 kpsi·in^m, m = 0.145 converts to about 2214 MPa·mm^m', () => {
    // Shigley 9e Table 10-4 (A in both unit columns): 2214 ± 4
    expect(Math.abs(US_TO_SI(201, 0.145) - 2214)).toBeLessThanOrEqual(4);
    const fit = grade('astm-a228').strengthFits[0];
    expect(Math.abs((fit?.A ?? 0) - 2214)).toBeLessThanOrEqual(4);
  });

  it('every inch-origin fit matches A_SI = 6.894757·25.4^m·A_US and the table\'s printed metric A within 0.3 %', () => {
    // Shigley 9e Table 10-4, both unit columns
    let checked = 0;
    for (const g of wireGrades) {
      for (const f of g.strengthFits) {
        if (!f.inch) continue;
        const expected = US_TO_SI(f.inch.A, f.m);
        expect(Math.abs(f.A / expected - 1), `${g.id} A`).toBeLessThan(0.003);
        expect(f.dMin).toBeCloseTo(f.inch.dMin * 25.4, 9);
        expect(f.dMax).toBeCloseTo(f.inch.dMax * 25.4, 9);
        if (f.inch.printedMetricA !== undefined) {
          expect(Math.abs(f.inch.printedMetricA / expected - 1), `${g.id} printed A`).toBeLessThan(0.003);
          checked++;
        }
      }
    }
    expect(checked).toBe(11); // the eleven Table 10-4 rows used here
  });

  it('the handbook fit gives 245.8 ksi at 0.250 in while the library keeps the table\'s 230 ksi', () => {
    // Shigley 9e Table 10-4 fit vs ASTM A228 via interwiregroup.com (±0.2 ksi)
    const fit = grade('astm-a228').strengthFits[0];
    if (!fit) throw new Error('music wire fit missing');
    expect(Math.abs(fit.A / inch(0.25) ** fit.m / KSI - 245.8)).toBeLessThanOrEqual(0.2);
    const r = tensileStrengthAt(grade('astm-a228'), inch(0.25));
    expect(r.basis).toBe('table');
    expect(r.min / KSI).toBeCloseTo(230, 9);
  });

  it('where no table row reaches the size, a fit is used and marked', () => {
    // Shigley 9e Table 10-4 chrome-silicon row, from memory: 202 / d^0.108 ksi, d = 0.2 in → 240.5 ksi (derived)
    const r = ksiAt('astm-a401', 0.2);
    expect(r.min).toBeCloseTo(202 / 0.2 ** 0.108, 6);
    expect(tensileStrengthAt(grade('astm-a401'), inch(0.2)).basis).toBe('fit');
  });


});

describe('elastic moduli, density, temperatures, process data', () => {
  it('music wire G by size band: 81.7 GPa at 0.050 in, 80.0 GPa at 0.150 in', () => {
    // Shigley 9e Table 10-5, read
    expect(props('astm-a228', inch(0.05)).props.shearModulus / 1000).toBeCloseTo(81.7, 9);
    expect(props('astm-a228', inch(0.15)).props.shearModulus / 1000).toBeCloseTo(80.0, 9);
  });

  it('music wire and hard-drawn E and G at other bands', () => {
    // Shigley 9e Table 10-5, read
    expect(props('astm-a228', inch(0.02)).props).toMatchObject({ elasticModulus: 203400, shearModulus: 82700 });
    expect(props('astm-a228', inch(0.1)).props).toMatchObject({ elasticModulus: 196500, shearModulus: 81000 });
    expect(props('astm-a227-1', inch(0.2)).props).toMatchObject({ elasticModulus: 196500, shearModulus: 78600 });
  });

  it('EN reference moduli', () => {
    // EN 13906-1 values: EN 10270-1 confirmed on mollificiomodenese.it; the others from memory
    expect(props('en10270-1-sm', 2).props).toMatchObject({ elasticModulus: 206000, shearModulus: 81500 });
    expect(props('en10270-2-fdc', 2).props).toMatchObject({ elasticModulus: 206000, shearModulus: 79500 });
    expect(props('en10270-3-1.4310', 2).props).toMatchObject({ elasticModulus: 185000, shearModulus: 70000 });
  });

  it('EN 10270-1 density 7.85 and working range −30…+100 °C; music wire 0.284 lb/in³ ≈ 7.86 g/cm³', () => {
    // mollificiomodenese.it for EN 10270-1 SM; diamondwire.com for A228
    expect(props('en10270-1-dh', 1).props).toMatchObject({ density: 7.85, serviceTemperature: { min: -30, max: 100 } });
    expect(props('astm-a228', 1).props.density).toBeCloseTo(7.86, 2);
  });

  it('maximum service temperatures of the ASTM steels', () => {
    // Shigley 9e Table 10-3 (music wire 120 °C, oil-tempered 180 °C); diamondwire.com (Cr-Si 475 °F ≈ 246 °C)
    expect(props('astm-a228', 1).props.serviceTemperature.max).toBe(120);
    expect(props('astm-a229', 1).props.serviceTemperature.max).toBe(180);
    expect(props('astm-a401', 2).props.serviceTemperature.max).toBeCloseTo(246, 0);
  });

  it('stress-relief temperatures and times', () => {
    // makers' stress-relief tables: apexspring.com, chinaspringcorp.com, suzuki-garphyttan.com
    const a228 = props('astm-a228', 1).props.stressRelief;
    expect(a228.temperature).toBeCloseTo(260, 0);
    expect(a228.minutes).toBe(30);
    const s302 = props('astm-a313-302', 1).props.stressRelief;
    expect(s302.temperature).toBeGreaterThanOrEqual(315);
    expect(s302.temperature).toBeLessThanOrEqual(345);
    expect(s302.minutes).toBe(30);
    const ph = props('astm-a313-631', 1).props.stressRelief;
    expect(ph.temperature).toBeCloseTo(480, -1);
    expect(ph.minutes).toBe(60);
  });

  it('dynamic grades', () => {
    // EN 10270-1 D grades for dynamic duty; VD = valve-spring quality; Shigley 9e Table 10-3
    const dynamic = wireGrades.filter((g) => g.dynamicGrade).map((g) => g.id).sort();
    expect(dynamic).toEqual(['astm-a228', 'astm-a232', 'en10270-1-dh', 'en10270-1-dm', 'en10270-2-tdsicr', 'en10270-2-vdsicr']);
  });

  it('relative cost, hard-drawn = 1', () => {
    // Shigley 9e Table 10-4 cost column, from memory
    expect(props('astm-a227-1', 1).props.relativeCost).toBe(1.0);
    expect(props('astm-a228', 1).props.relativeCost).toBe(2.6);
    expect(props('astm-a401', 2).props.relativeCost).toBe(4.0);
  });
});

describe('allowable static torsion', () => {
  it('fractions of Sut before and after set removal by family', () => {
    // Shigley 9e Table 10-6: all fractions from memory; "after" = low end of range
    expect(staticAllowables['cold-drawn-carbon']).toMatchObject({ beforeSetRemoval: 0.45, afterSetRemoval: 0.6 });
    expect(staticAllowables['hardened-tempered']).toMatchObject({ beforeSetRemoval: 0.5, afterSetRemoval: 0.65 });
    expect(staticAllowables['austenitic-stainless']).toMatchObject({ beforeSetRemoval: 0.35, afterSetRemoval: 0.55 });
    expect(staticAllowables['non-ferrous']).toMatchObject({ beforeSetRemoval: 0.35, afterSetRemoval: 0.55 });
  });

  it('each grade carries its family\'s fractions', () => {
    for (const g of wireGrades) {
      const p = props(g.id, g.diameterRange.min).props;
      expect(p.allowableStaticFraction).toEqual(staticAllowables[g.family]);
    }
    expect(props('astm-a228', 1).props.allowableStaticFraction.beforeSetRemoval).toBe(0.45);
    expect(props('en10270-2-vdsicr', 2).props.allowableStaticFraction.beforeSetRemoval).toBe(0.5);
  });
});

describe('wireProperties findings and overrides', () => {
  it('a diameter outside the grade\'s range gives an error on wireDiameter, and properties from the nearest size', () => {
    const r = props('en10270-3-1.4310', 12);
    const f = r.findings.find((x) => x.code === 'wire-diameter-outside-grade');
    expect(f).toMatchObject({ severity: 'error', path: 'wireDiameter' });
    expect(f?.message).toContain('12 mm');
    expect(f?.message).toContain('Stainless 1.4310');
    expect(f?.message).toContain('0.2–10 mm');
    expect(f?.fix).toMatch(/^Choose a grade made in this size/);
    // Clamped to 10 mm: EN 10270-3 band "≤ 10.0" = 1250 MPa (stahlbecker.com)
    expect(r.props).toMatchObject({ d: 12, tensileStrength: 1250, tensileStrengthBasis: 'table' });
  });

  it('below the range too, and not inside it or at an edge typed in mm', () => {
    expect(props('astm-a228', 0.05).findings.map((f) => f.code)).toContain('wire-diameter-outside-grade');
    expect(props('astm-a228', 1).findings).toEqual([]);
    expect(props('astm-a228', 0.1016).findings).toEqual([]);
    expect(props('astm-a228', 6.35).findings).toEqual([]);
  });

  it('a strength from a fit adds a note on material; a table value does not', () => {
    const fromFit = props('astm-a401', 5).findings;
    expect(fromFit).toEqual([expect.objectContaining({ code: 'strength-from-fit', severity: 'note', path: 'material' })]);
    expect(props('en10270-1-sm', 5).findings).toEqual([]);
  });

  it('mill-certificate overrides replace library values and set the basis to override', () => {
    const r = wireProperties('astm-a401', 5, { tensileStrength: 2000, shearModulus: 78000, elasticModulus: 205000, density: 7.8 });
    expect(r?.props).toMatchObject({
      tensileStrength: 2000, tensileStrengthMax: null, tensileStrengthBasis: 'override',
      shearModulus: 78000, elasticModulus: 205000, density: 7.8,
    });
    expect(r?.findings.map((f) => f.code)).not.toContain('strength-from-fit');
  });

  it('an override of the moduli alone leaves the strength basis alone', () => {
    const r = wireProperties('en10270-1-sm', 2, { shearModulus: 80000 });
    expect(r?.props).toMatchObject({ shearModulus: 80000, elasticModulus: 206000, tensileStrength: 1760, tensileStrengthBasis: 'table' });
  });

  it('an unknown grade gives undefined', () => {
    expect(wireProperties('astm-a999', 1)).toBeUndefined();
    expect(findGrade('astm-a999')).toBeUndefined();
  });
});

describe('library data integrity', () => {
  const ids = [
    'astm-a228', 'astm-a227-1', 'astm-a227-2', 'astm-a229', 'astm-a232', 'astm-a401', 'astm-a313-302', 'astm-a313-631',
    'astm-b159', 'astm-b197', 'en10270-1-sl', 'en10270-1-sm', 'en10270-1-sh', 'en10270-1-dm', 'en10270-1-dh',
    'en10270-2-fdc', 'en10270-2-fdsicr', 'en10270-2-tdsicr', 'en10270-2-vdsicr', 'en10270-3-1.4310',
  ];

  function sourcesOf(g: WireGrade): Sourced[] {
    const rows = g.strengthTable?.rows.flatMap((r) => (r.origin ? [r.origin] : [])) ?? [];
    return [g.diameterRange, g.moduli, g.density, g.serviceTemperature, g.stressRelief, g.relativeCost,
      ...(g.strengthTable ? [g.strengthTable] : []), ...rows, ...g.strengthFits];
  }

  it('holds exactly the listed grades, each findable by id', () => {
    expect(wireGrades.map((g) => g.id).sort()).toEqual([...ids].sort());
    for (const id of ids) expect(findGrade(id)?.id).toBe(id);
  });

  it('every value names a source, and an unverified one says why', () => {
    for (const g of wireGrades) {
      for (const s of sourcesOf(g)) {
        expect(s.source.trim().length, g.id).toBeGreaterThan(0);
        if (s.verified) expect(s.source, g.id).not.toMatch(/from memory/);
        else expect(s.source, g.id).toMatch(/from memory|derived|by analogy/);
      }
    }
  });

  it('table rows strictly increase in d, with min ≤ max, and strength never rises with d', () => {
    for (const g of wireGrades) {
      const rows = g.strengthTable?.rows ?? [];
      for (let i = 1; i < rows.length; i++) {
        const [a, b] = [rows[i - 1], rows[i]];
        expect(b?.d, g.id).toBeGreaterThan(a?.d ?? Infinity);
        expect(b?.min, g.id).toBeLessThanOrEqual(a?.min ?? -Infinity);
      }
      for (const r of rows) if (r.max !== undefined) expect(r.min, g.id).toBeLessThan(r.max);
    }
  });

  it('the strength never rises with d anywhere in a grade\'s range, across tables, fits and their joins', () => {
    for (const g of wireGrades) {
      const { min, max } = g.diameterRange;
      let last = Infinity;
      for (let k = 0; k <= 400; k++) {
        const s = tensileStrengthAt(g, min * (max / min) ** (k / 400)).min;
        expect(s, `${g.id} step ${k}`).toBeLessThanOrEqual(last * (1 + 1e-12));
        last = s;
      }
    }
  });

  it('tables and fits together cover each grade\'s whole size range', () => {
    for (const g of wireGrades) {
      const t = g.strengthTable;
      const spans = g.strengthFits.map((f) => [f.dMin, f.dMax]);
      if (t) spans.push([t.form === 'bands' ? -Infinity : (t.rows[0]?.d ?? Infinity), t.rows[t.rows.length - 1]?.d ?? -Infinity]);
      spans.sort((a, b) => (a[0] ?? 0) - (b[0] ?? 0));
      let reached = g.diameterRange.min;
      for (const [lo, hi] of spans) if ((lo ?? Infinity) <= reached) reached = Math.max(reached, hi ?? -Infinity);
      expect(reached, g.id).toBeGreaterThanOrEqual(g.diameterRange.max);
    }
  });

  it('fits, moduli and the other scalars are physically sensible', () => {
    for (const g of wireGrades) {
      expect(g.diameterRange.min, g.id).toBeLessThan(g.diameterRange.max);
      for (const f of g.strengthFits) {
        expect(f.dMin, g.id).toBeLessThan(f.dMax);
        expect(f.A, g.id).toBeGreaterThan(0);
        expect(f.m, g.id).toBeGreaterThanOrEqual(0);
      }
      const bands = g.moduli.bands;
      expect(bands[bands.length - 1]?.upToDiameter, g.id).toBe(Infinity);
      for (const b of bands) {
        const poisson = b.E / (2 * b.G) - 1;
        expect(poisson, g.id).toBeGreaterThan(0.2);
        expect(poisson, g.id).toBeLessThan(0.45);
      }
      expect(g.density.value, g.id).toBeGreaterThan(7.5);
      expect(g.density.value, g.id).toBeLessThan(9);
      expect(g.serviceTemperature.min, g.id).toBeLessThan(g.serviceTemperature.max);
      expect(g.stressRelief.minutes, g.id).toBeGreaterThan(0);
      expect(g.relativeCost.value, g.id).toBeGreaterThanOrEqual(1);
    }
  });

  it('the library data are frozen', () => {
    const g = grade('astm-a228');
    expect(Object.isFrozen(g)).toBe(true);
    expect(Object.isFrozen(g.strengthTable?.rows[0])).toBe(true);
    expect(Object.isFrozen(props('astm-a228', 1).props.serviceTemperature)).toBe(true);
  });
});

describe('gradeSummaries', () => {
  it('lists every grade with its ranges and strength sources, and survives JSON', () => {
    const list = gradeSummaries();
    expect(list).toHaveLength(wireGrades.length);
    expect(JSON.parse(JSON.stringify(list))).toEqual(list);
    for (const s of list) {
      const g = grade(s.id);
      expect(s).toMatchObject({ name: g.name, standard: g.standard, family: g.family });
      expect(s.diameterRange).toEqual({ min: g.diameterRange.min, max: g.diameterRange.max });
      expect(s.strengthSources.length, s.id).toBeGreaterThan(0);
    }
  });

  it('separates read rows from rows given from memory', () => {
    const dh = gradeSummaries().find((s) => s.id === 'en10270-1-dh');
    const tables = dh?.strengthSources.filter((x) => x.kind === 'table') ?? [];
    expect(tables.map((x) => [x.verified, x.sizes])).toEqual([
      [true, { min: 0.2, max: 0.45 }],
      [false, { min: 0.5, max: 20 }],
    ]);
  });
});
