import { describe, expect, it } from 'vitest';
import { findGrade, tensileStrengthAt, wireGrades } from '../../core/materials';
import type { WireGrade } from '../../core/materials';

const grade = (id: string): WireGrade => {
  const g = findGrade(id);
  if (!g) throw new Error(`no grade ${id}`);
  return g;
};
const minAt = (id: string, d: number) => tensileStrengthAt(grade(id), d).min;

/** The largest change the grade's own data allow between two sizes δ apart: row-to-row slopes, band steps, fit slopes. */
function ownStep(g: WireGrade, delta: number): number {
  let slope = 0;
  let jump = 0;
  const rows = g.strengthTable?.rows ?? [];
  for (let i = 1; i < rows.length; i++) {
    const drop = Math.abs(rows[i]!.min - rows[i - 1]!.min);
    if (g.strengthTable!.form === 'bands') jump = Math.max(jump, drop);
    else slope = Math.max(slope, drop / (rows[i]!.d - rows[i - 1]!.d));
  }
  const fits = g.strengthFits;
  for (const f of fits) slope = Math.max(slope, (f.m * f.A) / f.dMin ** (f.m + 1));
  // Where a handbook prints its fit in pieces (Shigley 9e Table 10-4, A313), the step between pieces is its own.
  for (let i = 1; i < fits.length; i++) {
    const [a, b] = [fits[i - 1]!, fits[i]!];
    if (Math.abs(a.dMax - b.dMin) < 1e-9) jump = Math.max(jump, Math.abs(a.A / a.dMax ** a.m - b.A / b.dMin ** b.m));
  }
  return (slope * delta + jump) * (1 + 1e-9) + 1e-9;
}

const grid = (min: number, max: number, n: number) => Array.from({ length: n + 1 }, (_, i) => min + ((max - min) * i) / n);

describe('wire strength over each grade\'s whole range', () => {
  const steel = wireGrades.filter((g) => g.standard.startsWith('EN 10270') || g.standard.startsWith('ASTM A'));

  for (const g of steel) {
    it(`${g.id}: minimum tensile strength never rises with diameter and has no jump beyond the table's own`, () => {
      const n = 4000;
      const sizes = grid(g.diameterRange.min, g.diameterRange.max, n);
      const delta = (g.diameterRange.max - g.diameterRange.min) / n;
      const limit = ownStep(g, delta);
      let previous = tensileStrengthAt(g, sizes[0]!).min;
      for (const d of sizes.slice(1)) {
        const now = tensileStrengthAt(g, d).min;
        expect(Number.isFinite(now)).toBe(true);
        expect(now, `${g.id} at ${d.toFixed(3)} mm`).toBeLessThanOrEqual(previous + 1e-9);
        expect(previous - now, `${g.id} step at ${d.toFixed(3)} mm`).toBeLessThanOrEqual(limit);
        previous = now;
      }
    });
  }
});

describe('the standards\' order of grades holds at every size both are made in', () => {
  // EN 10270-1: SH and DH share a column, as do SM and DM; DH ≥ DM ≥ SM ≥ SL (the standard's strength classes).
  // EN 10270-2: FDSiCr ≥ TDSiCr = VDSiCr ≥ FDC. ASTM A228 ≥ A227 class II ≥ class I; chrome-silicon A401 ≥ A229.
  const pairs: [string, string][] = [
    ['en10270-1-dh', 'en10270-1-dm'], ['en10270-1-sh', 'en10270-1-sm'], ['en10270-1-dm', 'en10270-1-sm'],
    ['en10270-1-sm', 'en10270-1-sl'], ['en10270-1-dh', 'en10270-1-sh'], ['en10270-1-sh', 'en10270-1-dh'],
    ['en10270-2-fdsicr', 'en10270-2-tdsicr'], ['en10270-2-tdsicr', 'en10270-2-vdsicr'], ['en10270-2-vdsicr', 'en10270-2-tdsicr'],
    ['en10270-2-vdsicr', 'en10270-2-fdc'], ['en10270-2-fdsicr', 'en10270-2-fdc'],
    ['astm-a228', 'astm-a227-2'], ['astm-a227-2', 'astm-a227-1'], ['astm-a401', 'astm-a229'],
  ];
  for (const [stronger, weaker] of pairs) {
    it(`${stronger} ≥ ${weaker}`, () => {
      const a = grade(stronger).diameterRange;
      const b = grade(weaker).diameterRange;
      for (const d of grid(Math.max(a.min, b.min), Math.min(a.max, b.max), 2000)) {
        expect(minAt(stronger, d), `at ${d.toFixed(3)} mm`).toBeGreaterThanOrEqual(minAt(weaker, d));
      }
    });
  }
});

describe('heavy EN wire at the standards\' values', () => {
  it('SH/DH above 5 mm come from their own rows, not from the SM curve', () => {
    // EN 10270-1 SH/DH column, from memory: 5.0 mm 1660, 10 mm 1410, 20 mm 1180 MPa minimum
    for (const id of ['en10270-1-sh', 'en10270-1-dh']) {
      expect(tensileStrengthAt(grade(id), 5)).toMatchObject({ min: 1660, verified: false });
      expect(minAt(id, 10)).toBe(1410);
      expect(minAt(id, 20)).toBe(1180);
      expect(minAt(id, 5.01)).toBeGreaterThan(1650);
      expect(tensileStrengthAt(grade(id), 8).source).toContain('from memory');
    }
    // EN 10270-1 SM, read (mollificiomodenese.it): 5.0 mm 1460, 10 mm 1240 MPa
    expect(minAt('en10270-1-sm', 5)).toBe(1460);
    expect(minAt('en10270-1-sm', 10)).toBe(1240);
  });

  it('SL from its own column (EN 10270-1, from memory): 2.0 mm 1520, 5.0 mm 1260 MPa', () => {
    expect(tensileStrengthAt(grade('en10270-1-sl'), 2)).toMatchObject({ min: 1520, max: 1750, verified: false });
    expect(minAt('en10270-1-sl', 5)).toBe(1260);
  });

  it('EN 10270-2 bands: 0.50–0.70 mm read, the bands above from memory and marked so', () => {
    // EN 10270-2 via metalleschmidt.de: FDC 1900–2100, VDSiCr 2080–2230 at 0.50–0.70 mm
    expect(tensileStrengthAt(grade('en10270-2-fdc'), 0.7)).toMatchObject({ min: 1900, verified: true });
    // EN 10270-2 from memory: FDC 4.70 < d ≤ 5.00 mm 1510–1660; VDSiCr same band 1860–2010 MPa
    expect(tensileStrengthAt(grade('en10270-2-fdc'), 5)).toMatchObject({ min: 1510, max: 1660, verified: false });
    expect(tensileStrengthAt(grade('en10270-2-vdsicr'), 5)).toMatchObject({ min: 1860, max: 2010, verified: false });
    expect(tensileStrengthAt(grade('en10270-2-vdsicr'), 5).source).toContain('from memory');
    // a band's value holds to its upper edge, the next band starts just above it
    expect(minAt('en10270-2-vdsicr', 1.3)).toBe(2080);
    expect(minAt('en10270-2-vdsicr', 1.31)).toBe(2010);
  });

  it('ASTM A401 keeps the handbook fit (Shigley 9e Table 10-4, from memory): 0.063 in about 272 ksi', () => {
    const ksi = minAt('astm-a401', 0.063 * 25.4) / 6.894757;
    expect(ksi).toBeCloseTo(202 / 0.063 ** 0.108, 0);
  });
});
