import { describe, expect, it } from 'vitest';
import { reviewLimits } from '../../core/review/limits';
import {
  checkShopToleranceTable, coilDiameterTable, coilDiameterTolerance, commercialOdTable, commercialOdTolerance,
  demoFreeLengthTolerances, demoLoadTolerances, din2097LengthTable, din2097LengthTolerance, endSquarenessTable,
  endSquarenessTolerance, extensionFreeLengthTable, extensionFreeLengthTolerance, extensionLoadTable,
  extensionLoadTolerance, freeLengthTolerance, indexBands, loadTolerance, loopPositionTable, loopPositionTolerance,
} from '../../core/tolerances';
import type { Band, Lookup, ShopToleranceTable } from '../../core/tolerances';
import { firstBandBreak } from '../../core/tolerances/bands';
import { MM_PER_IN, N_PER_LBF } from '../../core/units';

const value = <T>(r: Lookup<T>): T => {
  if (!r.ok) throw new Error(`${r.code} at ${r.path}: ${r.message}`);
  return r.value;
};
const code = (r: Lookup<unknown>): string => (r.ok ? 'ok' : r.code);
const inch = (x: number): number => x * MM_PER_IN;

describe('EN 15800 coil-diameter deviation A_D', () => {
  // All values: DIN 2095 table as reprinted by industrial-springs.com; same rows in the DIN 2097 table at
  // blog.federnshop.com.
  it('D = 8 mm, w = 6.4: ±0.15 / ±0.25 / ±0.50 for grades 1 / 2 / 3 (§8 row 1)', () => {
    expect(value(coilDiameterTolerance({ D: 8, index: 6.4, grade: 1 }))).toBe(0.15);
    expect(value(coilDiameterTolerance({ D: 8, index: 6.4, grade: 2 }))).toBe(0.25);
    expect(value(coilDiameterTolerance({ D: 8, index: 6.4, grade: 3 }))).toBe(0.50);
  });

  it('D = 20 mm, w = 10: ±0.25 / ±0.45 / ±0.90 (§8 row 2)', () => {
    expect(value(coilDiameterTolerance({ D: 20, index: 10, grade: 1 }))).toBe(0.25);
    expect(value(coilDiameterTolerance({ D: 20, index: 10, grade: 2 }))).toBe(0.45);
    expect(value(coilDiameterTolerance({ D: 20, index: 10, grade: 3 }))).toBe(0.90);
  });

  it('D = 45 mm, w = 10: ±0.40 / ±0.80 / ±1.50 (§8 row 3, the two reprints agree)', () => {
    expect(value(coilDiameterTolerance({ D: 45, index: 10, grade: 1 }))).toBe(0.40);
    expect(value(coilDiameterTolerance({ D: 45, index: 10, grade: 2 }))).toBe(0.80);
    expect(value(coilDiameterTolerance({ D: 45, index: 10, grade: 3 }))).toBe(1.50);
  });

  it('D = 10.0, w = 8.0 lies in "over 6.3 up to 10" and "4 up to 8": ±0.25 (§8 row 4)', () => {
    expect(value(coilDiameterTolerance({ D: 10, index: 8, grade: 2 }))).toBe(0.25);
  });

  it('no grade stated means grade 2 (beck-federn.de glossary)', () => {
    expect(value(coilDiameterTolerance({ D: 8, index: 6.4 }))).toBe(0.25);
  });

  it('D exactly 1.0 belongs to 0.63–1.0 (G2 w4–8 ±0.07), just above to 1.0–1.6 (±0.08)', () => {
    expect(value(coilDiameterTolerance({ D: 1.0, index: 6, grade: 2 }))).toBe(0.07);
    expect(value(coilDiameterTolerance({ D: 1.001, index: 6, grade: 2 }))).toBe(0.08);
  });

  it('D exactly 63 belongs to 50–63 (G2 ±0.80, G1 ±0.40); above 63 grade 2 is ±1.00 (DIN 2097, federnshop.com)', () => {
    expect(value(coilDiameterTolerance({ D: 63, index: 6, grade: 2 }))).toBe(0.80);
    expect(value(coilDiameterTolerance({ D: 63, index: 6, grade: 1 }))).toBe(0.40);
    expect(value(coilDiameterTolerance({ D: 63.5, index: 6, grade: 2 }))).toBe(1.00);
  });

  it('index exactly 8 is in 4–8 and exactly 14 in 8–14 (D = 20 mm, grade 2: 0.35 / 0.45 / 0.50)', () => {
    expect(value(coilDiameterTolerance({ D: 20, index: 8, grade: 2 }))).toBe(0.35);
    expect(value(coilDiameterTolerance({ D: 20, index: 8.01, grade: 2 }))).toBe(0.45);
    expect(value(coilDiameterTolerance({ D: 20, index: 14, grade: 2 }))).toBe(0.45);
    expect(value(coilDiameterTolerance({ D: 20, index: 14.01, grade: 2 }))).toBe(0.50);
  });

  it('a diameter computed with rounding noise still reads onto the edge (2.1 × 3 = 6.300000000000001)', () => {
    expect(value(coilDiameterTolerance({ D: 2.1 * 3, index: 6, grade: 2 }))).toBe(0.20);
  });

  it('the scope ends are inside: D = 0.63 and 200 mm, w = 4 and 20', () => {
    expect(value(coilDiameterTolerance({ D: 0.63, index: 4, grade: 2 }))).toBe(0.07);
    expect(value(coilDiameterTolerance({ D: 200, index: 20, grade: 2 }))).toBe(3.30);
  });

  it('outside EN 15800 the tolerance is by agreement, never a number (iteh.ai abstract, §8 row 30: w = 22)', () => {
    for (const input of [{ D: 20, index: 22 }, { D: 20, index: 3.9 }, { D: 0.62, index: 6 }, { D: 201, index: 6 }]) {
      const r = coilDiameterTolerance(input);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.code).toBe('outside-en15800-scope');
        expect(r.message).toMatch(/by agreement/);
      }
    }
    const w22 = coilDiameterTolerance({ D: 20, index: 22 });
    expect(w22.ok ? '' : w22.path).toBe('index');
  });

  it('grades 1 and 3 above 63 mm were not found in public material: by agreement', () => {
    const r = coilDiameterTolerance({ D: 70, index: 6, grade: 3 });
    expect(code(r)).toBe('not-in-public-table');
    expect(r.ok ? '' : r.message).toMatch(/by agreement/);
  });

  it('rejects a diameter that is not a positive number', () => {
    const r = coilDiameterTolerance({ D: Number.NaN, index: 6 });
    expect(r.ok ? '' : `${r.code} ${r.path}`).toBe('invalid-input D');
  });
});

describe('EN 15800 perpendicularity e1 and parallelism e2 (from memory)', () => {
  it('grade 2: e1 = 0.052·L0, e2 = 0.030·De (from memory) for L0 = 50, D = 10, d = 1', () => {
    const e = value(endSquarenessTolerance({ L0: 50, D: 10, d: 1, grade: 2, groundEnds: true }));
    expect(e.perpendicularity).toBeCloseTo(2.6, 10);
    expect(e.parallelism).toBeCloseTo(0.33, 10);
    expect(e.perpendicularityDegrees).toBe(3);
  });

  it('applies to ground ends only, and not to slender springs (L0/D over about 5, from memory)', () => {
    expect(code(endSquarenessTolerance({ L0: 50, D: 10, d: 1, groundEnds: false }))).toBe('ends-not-ground');
    expect(code(endSquarenessTolerance({ L0: 60, D: 10, d: 1, groundEnds: true }))).toBe('slenderness-beyond-scope');
  });

  it('each factor is the tangent of its angle to within 0.05°', () => {
    for (const row of Object.values(endSquarenessTable.grades)) {
      expect(Math.abs((Math.atan(row.e1Factor) * 180) / Math.PI - row.e1Degrees)).toBeLessThan(0.05);
      expect(Math.abs((Math.atan(row.e2Factor) * 180) / Math.PI - row.e2Degrees)).toBeLessThan(0.05);
    }
    expect(endSquarenessTable.source).toMatch(/from memory/);
  });
});

describe('commercial OD tolerance, inch jobs (katyspring.com table; common trade practice)', () => {
  it('d = 0.035 in, index 10: ±0.007 in (§8 row 7; also quoted by jobshop.com)', () => {
    expect(value(commercialOdTolerance({ d: inch(0.035), index: 10 })) / MM_PER_IN).toBeCloseTo(0.007, 10);
  });

  it('d = 0.250 in, index 6: ±0.015 in (§8 row 8)', () => {
    expect(value(commercialOdTolerance({ d: inch(0.25), index: 6 })) / MM_PER_IN).toBeCloseTo(0.015, 10);
  });

  it('between columns: linear gives the mean of 0.007 and 0.009 in; nearest takes the larger node on a tie', () => {
    expect(value(commercialOdTolerance({ d: inch(0.035), index: 11 })) / MM_PER_IN).toBeCloseTo(0.008, 10);
    const nearest = commercialOdTolerance({ d: inch(0.035), index: 11, interpolation: 'nearest' });
    expect(value(nearest) / MM_PER_IN).toBeCloseTo(0.009, 10);
  });

  it('outside the printed sizes and indexes the OD tolerance is by agreement', () => {
    expect(code(commercialOdTolerance({ d: inch(0.014), index: 8 }))).toBe('outside-table');
    expect(code(commercialOdTolerance({ d: inch(0.6), index: 8 }))).toBe('outside-table');
    expect(code(commercialOdTolerance({ d: inch(0.035), index: 3 }))).toBe('outside-table');
    expect(code(commercialOdTolerance({ d: inch(0.035), index: 17 }))).toBe('outside-table');
  });
});

describe('load and free-length tolerances: shop tables (demo defaults, shop to set)', () => {
  it('demo load tolerance, grade 2: ±10 % for 3–10 active coils, ±8 % above (demo defaults)', () => {
    expect(value(loadTolerance({ load: 100, activeCoils: 8, index: 8 })).plusMinus).toBeCloseTo(10, 10);
    expect(value(loadTolerance({ load: 100, activeCoils: 10, index: 8 })).plusMinus).toBeCloseTo(10, 10);
    expect(value(loadTolerance({ load: 100, activeCoils: 12, index: 8 })).plusMinus).toBeCloseTo(8, 10);
    expect(code(loadTolerance({ load: 100, activeCoils: 2, index: 8 }))).toBe('not-in-shop-table');
  });

  it("a shop's own table replaces the demo defaults", () => {
    const shop: ShopToleranceTable = {
      quantity: 'load', bandedBy: 'index', source: 'our quality manual QM-7', verified: true,
      rows: [1, 2, 3].map((g) => ({ grade: g as 1 | 2 | 3, over: 4, upTo: 20, percent: 7, minimum: 1 })),
    };
    const r = loadTolerance({ load: 50, activeCoils: 6, index: 9 }, shop);
    expect(value(r).plusMinus).toBeCloseTo(3.5, 10);
    expect(r.ok && r.source).toBe('our quality manual QM-7');
    expect(value(loadTolerance({ load: 10, activeCoils: 6, index: 9 }, shop)).plusMinus).toBe(1);
  });

  it('a specified load makes L0 a reference dimension (EN 15800 rule, from memory)', () => {
    const r = freeLengthTolerance({ L0: 50, index: 6, activeCoils: 8, loadSpecified: true });
    expect(value(r)).toEqual({ reference: true });
    expect(r.ok && r.source).toMatch(/EN 15800.*from memory/);
  });

  it('without a load, demo grade 2 free length is ±2 % at w 4–8, never under 0.5 mm (demo defaults)', () => {
    expect(value(freeLengthTolerance({ L0: 50, index: 6, activeCoils: 8, loadSpecified: false })))
      .toEqual({ reference: false, plusMinus: 1, percent: 2 });
    const short = value(freeLengthTolerance({ L0: 10, index: 6, activeCoils: 8, loadSpecified: false }));
    expect(short.reference === false && short.plusMinus).toBe(0.5);
  });

  it('the demo tables say so and pass the shop-table check', () => {
    for (const t of [demoLoadTolerances, demoFreeLengthTolerances]) {
      expect(t.source).toMatch(/demo defaults, shop to set/);
      expect(t.verified).toBe(false);
      expect(checkShopToleranceTable(t)).toEqual([]);
    }
  });

  it('the shop-table check finds gaps and negative values', () => {
    const broken: ShopToleranceTable = {
      ...demoLoadTolerances,
      rows: [{ grade: 2, over: 3, upTo: 10, percent: 10, minimum: 0 }, { grade: 2, over: 12, upTo: 20, percent: -1, minimum: 0 }],
    };
    expect(checkShopToleranceTable(broken).map((e) => `${e.code} ${e.path}`))
      .toEqual(['negative-tolerance rows[1].percent', 'bands-not-contiguous rows[1]']);
  });
});

describe('DIN 2097 extension-spring length L0, grade 2 (industrial-springs.com extension page)', () => {
  it('L0 = 50 mm: ±1.10 mm at w = 6, ±1.30 mm at w = 10 (§8 row 5)', () => {
    expect(value(din2097LengthTolerance({ L0: 50, index: 6 }))).toBe(1.10);
    expect(value(din2097LengthTolerance({ L0: 50, index: 10 }))).toBe(1.30);
  });

  it('L0 = 500 mm: 1.5 % of L0 = ±7.5 mm (§8 row 6)', () => {
    expect(value(din2097LengthTolerance({ L0: 500, index: 6 }))).toBeCloseTo(7.5, 10);
  });

  it('edges read into the lower band: L0 = 40 → 0.80, L0 = 400 → 3.00, w = 8 → the 4–8 column', () => {
    expect(value(din2097LengthTolerance({ L0: 40, index: 6 }))).toBe(0.80);
    expect(value(din2097LengthTolerance({ L0: 400, index: 6 }))).toBe(3.00);
    expect(value(din2097LengthTolerance({ L0: 50, index: 8 }))).toBe(1.10);
  });

  it('grades 1 and 3, and indexes outside 4–20, are by agreement', () => {
    expect(code(din2097LengthTolerance({ L0: 50, index: 6, grade: 1 }))).toBe('not-in-public-table');
    expect(code(din2097LengthTolerance({ L0: 50, index: 21 }))).toBe('outside-table');
  });
});

describe('extension springs, trade practice', () => {
  it('index 4, L/F 12, d = 0.015 in: ±20.0 % (§8 row 10, engineersedge.com table)', () => {
    expect(value(extensionLoadTolerance({ index: 4, lengthOverDeflection: 12, d: inch(0.015) }))).toBe(20.0);
  });

  it('worked example FL 4.050, D 0.390, d 0.048, deflection 0.900 in: ±10.1 % = ±0.35 lb on 3.5 lb ' +
    '(§8 row 9; engineersedge.com table, example at stock-springs-australia)', () => {
    const percent = value(extensionLoadTolerance({ index: 0.390 / 0.048, lengthOverDeflection: 4.05 / 0.9, d: inch(0.048) }));
    expect(percent).toBe(10.1);
    const load = 3.5 * N_PER_LBF;
    expect(((percent / 100) * load) / N_PER_LBF).toBeCloseTo(0.35, 2);
  });

  it('linear reading between printed rows (index 8, d 0.015 in, L/F 5.25: mean of 12.8 and 14.2)', () => {
    const r = extensionLoadTolerance({ index: 8, lengthOverDeflection: 5.25, d: inch(0.015), interpolation: 'linear' });
    expect(value(r)).toBeCloseTo(13.5, 10);
  });

  it('cells cut off in the stored reprint are not filled in (index 6, L/F 4.5)', () => {
    expect(code(extensionLoadTolerance({ index: 6, lengthOverDeflection: 4.5, d: inch(0.032) }))).toBe('not-in-public-table');
    expect(code(extensionLoadTolerance({ index: 8, lengthOverDeflection: 6, d: inch(0.25) }))).toBe('not-in-public-table');
    expect(code(extensionLoadTolerance({ index: 12, lengthOverDeflection: 6, d: inch(0.032) }))).toBe('outside-table');
  });

  it('free length inside ends: 3 in → ±0.060 in, 0.5 in → ±0.020 in, over 24 in by agreement (katyspring.com)', () => {
    expect(value(extensionFreeLengthTolerance({ L0: inch(3) })) / MM_PER_IN).toBeCloseTo(0.060, 10);
    expect(value(extensionFreeLengthTolerance({ L0: inch(0.5) })) / MM_PER_IN).toBeCloseTo(0.020, 10);
    expect(value(extensionFreeLengthTolerance({ L0: inch(24) })) / MM_PER_IN).toBeCloseTo(0.218, 10);
    expect(code(extensionFreeLengthTolerance({ L0: inch(25) }))).toBe('outside-table');
  });

  it('loop position: 10 coils → ±40° (§8 row 11); 3–5 → ±20°, 6–8 → ±30°, +1.5° per coil over 12 (stock-springs-australia)', () => {
    expect(value(loopPositionTolerance({ totalCoils: 10 }))).toBe(40);
    expect(value(loopPositionTolerance({ totalCoils: 3 }))).toBe(20);
    expect(value(loopPositionTolerance({ totalCoils: 5 }))).toBe(20);
    expect(value(loopPositionTolerance({ totalCoils: 7 }))).toBe(30);
    expect(value(loopPositionTolerance({ totalCoils: 12 }))).toBe(40);
    expect(value(loopPositionTolerance({ totalCoils: 14 }))).toBe(43);
    expect(code(loopPositionTolerance({ totalCoils: 2 }))).toBe('outside-table');
  });
});

describe('table integrity', () => {
  const tables = [
    coilDiameterTable, endSquarenessTable, commercialOdTable, din2097LengthTable, extensionLoadTable,
    extensionFreeLengthTable, loopPositionTable, demoLoadTolerances, demoFreeLengthTolerances,
  ];

  it('every table names its source and carries verified: false until checked against a licensed copy', () => {
    for (const t of tables) {
      expect(t.source.length).toBeGreaterThan(20);
      expect(t.verified).toBe(false);
    }
    for (const row of coilDiameterTable.rows) expect(row.source.length).toBeGreaterThan(20);
  });

  it('band tables run upward without gaps or overlaps', () => {
    const banded: readonly (readonly Band[])[] = [
      coilDiameterTable.rows, indexBands, din2097LengthTable.rows, din2097LengthTable.indexBands,
      extensionFreeLengthTable.rows, loopPositionTable.rows,
    ];
    for (const bands of banded) expect(firstBandBreak(bands)).toBe(-1);
  });

  it('the coil-diameter table spans exactly the EN 15800 scope in review/limits', () => {
    const rows = coilDiameterTable.rows;
    expect(rows[0]?.over).toBe(reviewLimits.en15800.D.min);
    expect(rows[rows.length - 1]?.upTo).toBe(reviewLimits.en15800.D.max);
    expect(indexBands[0]?.over).toBe(reviewLimits.en15800.w.min);
    expect(indexBands[indexBands.length - 1]?.upTo).toBe(reviewLimits.en15800.w.max);
  });

  it('coil-diameter deviations never fall as D, the index or the grade number grow (catches copying slips)', () => {
    const rows = coilDiameterTable.rows;
    for (const g of [1, 2, 3] as const) {
      for (let i = 0; i < rows.length; i++) {
        const cells = rows[i]?.grades[g];
        const below = rows[i - 1]?.grades[g];
        if (!cells) continue;
        expect([...cells].sort((a, b) => a - b)).toEqual([...cells]);
        if (below) cells.forEach((c, k) => expect(c).toBeGreaterThanOrEqual(below[k] as number));
        if (g > 1) {
          const lower = rows[i]?.grades[(g - 1) as 1 | 2];
          lower?.forEach((c, k) => expect(cells[k]).toBeGreaterThan(c));
        }
      }
    }
  });

  it('commercial OD values never fall as wire or index grow; every row has one value per index', () => {
    const t = commercialOdTable;
    expect(t.plusMinusInches).toHaveLength(t.wireInches.length);
    t.plusMinusInches.forEach((row, i) => {
      expect(row).toHaveLength(t.indexes.length);
      row.forEach((x, k) => {
        if (k > 0) expect(x).toBeGreaterThanOrEqual(row[k - 1] as number);
        if (i > 0) expect(x).toBeGreaterThanOrEqual(t.plusMinusInches[i - 1]?.[k] as number);
      });
    });
  });

  it('extension load tolerance falls with wire size and rises with L/F wherever both cells are printed', () => {
    const t = extensionLoadTable;
    expect(t.percent).toHaveLength(t.indexes.length);
    for (const rows of t.percent) {
      expect(rows).toHaveLength(t.lengthOverDeflection.length);
      rows.forEach((row, r) => {
        expect(row).toHaveLength(t.wireInches.length);
        row.forEach((x, w) => {
          const left = row[w - 1];
          const up = rows[r - 1]?.[w];
          if (x === null) return;
          if (left !== null && left !== undefined) expect(x).toBeLessThanOrEqual(left);
          if (up !== null && up !== undefined) expect(x).toBeGreaterThan(up);
        });
      });
    }
  });

  it('printed axes ascend', () => {
    for (const axis of [commercialOdTable.wireInches, commercialOdTable.indexes, extensionLoadTable.indexes,
      extensionLoadTable.lengthOverDeflection, extensionLoadTable.wireInches]) {
      expect([...axis].sort((a, b) => a - b)).toEqual([...axis]);
    }
  });
});
