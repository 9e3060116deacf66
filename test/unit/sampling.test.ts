import { describe, expect, it } from 'vitest';
import { sampleSizeCode, samplingPlan } from '../../core/inspection/sampling';
import type { SamplingPlan } from '../../core/inspection/sampling';
import {
  aqls, cellAt, codeLetters, columnSources, levelIICodeLetters, normalSingleTable, sampleSizes,
} from '../../core/inspection/sampling-tables';
import type { Lookup } from '../../core/tolerances';

const plan = (lotSize: number, aql: number): SamplingPlan => {
  const r: Lookup<SamplingPlan> = samplingPlan({ lotSize, aql });
  if (!r.ok) throw new Error(`${r.code}: ${r.message}`);
  return r.value;
};
const acRe = (p: SamplingPlan): string => `${p.sampleSize} ${p.accept}/${p.reject}`;

describe('sample-size code letters, general level II', () => {
  // ISO 2859-1 / ANSI/ASQ Z1.4 Table I as reprinted in the pdfcoffee.com AQL chart and at nibs.org
  // (AC-TABLE.ASC).
  it('lot 5 → A, n = 2 (§8 row 19)', () => {
    const r = sampleSizeCode(5);
    expect(r.ok && r.value).toEqual({ code: 'A', sampleSize: 2 });
  });

  it('each printed lot range starts and ends on its letter', () => {
    const edges: [number, string, number][] = [
      [2, 'A', 2], [8, 'A', 2], [9, 'B', 3], [15, 'B', 3], [16, 'C', 5], [25, 'C', 5], [26, 'D', 8], [50, 'D', 8],
      [51, 'E', 13], [90, 'E', 13], [91, 'F', 20], [150, 'F', 20], [151, 'G', 32], [280, 'G', 32],
      [281, 'H', 50], [500, 'H', 50], [501, 'J', 80], [1200, 'J', 80], [1201, 'K', 125], [3200, 'K', 125],
      [3201, 'L', 200], [10000, 'L', 200], [10001, 'M', 315], [35000, 'M', 315], [35001, 'N', 500],
      [150000, 'N', 500], [150001, 'P', 800], [500000, 'P', 800], [500001, 'Q', 1250], [5_000_000, 'Q', 1250],
    ];
    for (const [lot, letter, n] of edges) {
      const r = sampleSizeCode(lot);
      expect(r.ok && `${r.value.code} ${r.value.sampleSize}`).toBe(`${letter} ${n}`);
    }
  });

  it('a lot under 2 or not a whole number is an error value', () => {
    for (const lot of [1, 0, 12.5, Number.NaN]) {
      const r = sampleSizeCode(lot);
      expect(r.ok ? '' : `${r.code} ${r.path}`).toBe('lot-size-outside-table lotSize');
    }
  });
});

describe('normal single sampling, level II', () => {
  // Sampling checks below: ISO 2859-1 Table 2-A = ANSI/ASQ Z1.4 Table II-A, as reprinted at nibs.org
  // (AC-TABLE.ASC, Re printed, Ac = Re − 1) and the pdfcoffee.com chart.
  it('lot 1000, AQL 1.0 → J, n = 80, Ac 2 / Re 3 (§8 row 16)', () => {
    const p = plan(1000, 1.0);
    expect(p.code).toBe('J');
    expect(acRe(p)).toBe('80 2/3');
  });

  it('lot 500, AQL 2.5 → H, n = 50, Ac 3 / Re 4 (§8 row 17)', () => {
    const p = plan(500, 2.5);
    expect(p.code).toBe('H');
    expect(acRe(p)).toBe('50 3/4');
  });

  it('lot 5000, AQL 1.0 → L, n = 200, Ac 5 / Re 6 (§8 row 18)', () => {
    const p = plan(5000, 1.0);
    expect(p.code).toBe('L');
    expect(acRe(p)).toBe('200 5/6');
  });

  it('reproduces the nibs.org Ac/Re table (ISO 2859-1 Table 2-A) for n = 50, 80, 125, 200 and AQL 1.0–6.5 (nibs.org)', () => {
    const rows: [number, string[]][] = [
      [500, ['50 1/2', '50 2/3', '50 3/4', '50 5/6', '50 7/8']],
      [1000, ['80 2/3', '80 3/4', '80 5/6', '80 7/8', '80 10/11']],
      [2000, ['125 3/4', '125 5/6', '125 7/8', '125 10/11', '125 14/15']],
      [5000, ['200 5/6', '200 7/8', '200 10/11', '200 14/15', '200 21/22']],
    ];
    for (const [lot, expected] of rows) expect([1.0, 1.5, 2.5, 4.0, 6.5].map((a) => acRe(plan(lot, a)))).toEqual(expected);
    expect([1000, 2000, 5000].map((lot) => acRe(plan(lot, 0.65)))).toEqual(['80 1/2', '125 2/3', '200 3/4']);
  });

  it('down arrow: lot 500 at AQL 0.65 uses the plan of J, n = 80, Ac 1 / Re 2 (ISO 2859-1 Table 2-A arrow: "use 80")', () => {
    const p = plan(500, 0.65);
    expect(`${p.code}→${p.planCode}`).toBe('H→J');
    expect(acRe(p)).toBe('80 1/2');
  });

  it('up arrow: lot 200 (G) at AQL 0.65 uses the plan of F, n = 20, Ac 0 / Re 1 (nibs.org)', () => {
    const p = plan(200, 0.65);
    expect(`${p.code}→${p.planCode}`).toBe('G→F');
    expect(acRe(p)).toBe('20 0/1');
  });

  it('lot 100 (F) at AQL 10: n = 20, Ac 5 / Re 6; lot 20 (C) at AQL 10: n = 5, Ac 1 / Re 2 (nibs.org)', () => {
    expect(acRe(plan(100, 10))).toBe('20 5/6');
    expect(acRe(plan(20, 10))).toBe('5 1/2');
  });

  it('100 % when the sample reaches the lot: lot 10 (B) at AQL 1.0 leads to E, n = 13 ≥ 10 (chart note)', () => {
    const p = plan(10, 1.0);
    expect(p.planCode).toBe('E');
    expect(p.hundredPercent).toBe(true);
    expect(p.sampleSize).toBe(10);
    expect(`${p.accept}/${p.reject}`).toBe('0/1');
  });

  it('100 % also when the sample equals the lot: lot 13 (B) at AQL 1.0; lot 14 at AQL 6.5 is sampled (n = 2)', () => {
    expect(plan(13, 1.0).hundredPercent).toBe(true);
    expect(plan(14, 6.5).hundredPercent).toBe(false);
  });

  it('code A at AQL 10 points above the first row: no plan, an error value', () => {
    const r = samplingPlan({ lotSize: 5, aql: 10 });
    expect(r.ok ? '' : r.code).toBe('no-plan-in-table');
  });

  it('an AQL that is not a column is an error value with its path', () => {
    const r = samplingPlan({ lotSize: 500, aql: 0.3 });
    expect(r.ok ? '' : `${r.code} ${r.path}`).toBe('aql-not-in-table aql');
  });

  it('AQL 0.065 columns are carried from memory and say so: lot 12 000 (M) → L, n = 200, 0/1', () => {
    const r = samplingPlan({ lotSize: 12_000, aql: 0.065 });
    expect(r.ok && `${r.value.planCode} ${acRe(r.value)}`).toBe('L 200 0/1');
    expect(r.ok && r.source).toMatch(/from memory/);
    expect(columnSources[1.0]?.source).toMatch(/nibs\.org/);
  });
});

describe('sampling table integrity', () => {
  it('lot bands follow on without gaps and sample sizes grow with the letter', () => {
    const bands = levelIICodeLetters.bands;
    bands.forEach((b, i) => {
      if (i > 0) expect(b.from).toBe((bands[i - 1]?.to as number) + 1);
      expect(b.to).toBeGreaterThanOrEqual(b.from);
    });
    const sizes = codeLetters.map((c) => sampleSizes[c]);
    expect([...sizes].sort((a, b) => a - b)).toEqual(sizes);
  });

  it('every row has one cell per AQL column; Re = Ac + 1; plans never fall along a row', () => {
    for (const letter of codeLetters) {
      expect(normalSingleTable[letter].trim().split(/\s+/)).toHaveLength(aqls.length);
      let last = -1;
      aqls.forEach((_, column) => {
        const cell = cellAt(letter, column);
        if (cell === undefined || typeof cell === 'string') return;
        expect(cell.reject).toBe(cell.accept + 1);
        expect(cell.accept).toBeGreaterThanOrEqual(last);
        last = cell.accept;
      });
    }
  });

  it('every arrow leads to a plan inside the table except the one above code A at AQL 10', () => {
    const dead: string[] = [];
    for (const aql of aqls) {
      for (const [i, letter] of codeLetters.entries()) {
        const lot = levelIICodeLetters.bands[i]?.to === Infinity ? 1_000_000 : (levelIICodeLetters.bands[i]?.to as number);
        const r = samplingPlan({ lotSize: lot, aql });
        if (!r.ok) dead.push(`${letter}@${aql}`);
      }
    }
    expect(dead).toEqual(['A@10']);
  });

  it('every column names its source', () => {
    for (const aql of aqls) {
      expect(columnSources[aql]?.source).toMatch(/ISO 2859-1/);
      expect(columnSources[aql]?.verified).toBe(false);
    }
    expect(levelIICodeLetters.source).toMatch(/Z1\.4/);
  });
});
