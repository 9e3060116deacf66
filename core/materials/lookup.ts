/**
 * Strength and moduli by wire diameter. Each grade's table is turned into segments once; a lookup then only
 * compares and interpolates.
 *
 * Order of use: the strength table where its rows reach d, else the first fit whose range holds d. A diameter
 * outside the grade's range is clamped to the nearer end of the range (so below the range the value errs low,
 * above it high); such a spec also gets an error finding, so the value only serves to print a report.
 */
import type { ModulusBand, Sourced, StrengthFit, StrengthRow, StrengthTable, WireGrade } from './types';

export interface StrengthAt {
  min: number;
  max: number | null;
  basis: 'table' | 'fit';
  source: string;
  verified: boolean;
}

/** Rows k-1..k of a table (d0 = d1 for a band or the first row); the value at d1 is row k's. */
interface Segment {
  d0: number;
  d1: number;
  min0: number;
  min1: number;
  max0: number | null;
  max1: number | null;
  /** Where the interpolated value comes from, and where row k alone comes from. */
  span: Sourced;
  end: Sourced;
}

export interface CompiledStrength {
  range: { min: number; max: number };
  segments: Segment[];
  tableLo: number;
  tableHi: number;
  fits: StrengthFit[];
}

function origin(table: StrengthTable, row: StrengthRow): Sourced {
  return row.origin ?? table;
}

function joined(a: Sourced, b: Sourced): Sourced {
  if (a.source === b.source) return { source: a.source, verified: a.verified && b.verified };
  return { source: `${a.source}; ${b.source}`, verified: a.verified && b.verified };
}

function segmentsOf(table: StrengthTable): Segment[] {
  return table.rows.map((row, k) => {
    const prev = table.form === 'points' && k > 0 ? table.rows[k - 1] : undefined;
    const start = prev ?? row;
    const end = origin(table, row);
    return {
      d0: start.d, d1: row.d, min0: start.min, min1: row.min,
      max0: start.max ?? null, max1: row.max ?? null,
      span: prev ? joined(origin(table, prev), end) : end, end,
    };
  });
}

export function compileStrength(grade: WireGrade): CompiledStrength {
  const table = grade.strengthTable;
  const rows = table?.rows ?? [];
  const first = rows[0];
  const last = rows[rows.length - 1];
  if (!first && grade.strengthFits.length === 0) throw new Error(`wire grade ${grade.id} has no strength data`);
  return {
    range: grade.diameterRange,
    segments: table ? segmentsOf(table) : [],
    tableLo: table?.form === 'bands' ? -Infinity : (first?.d ?? Infinity),
    tableHi: last?.d ?? -Infinity,
    fits: grade.strengthFits,
  };
}

/** Nearest diameter inside the range; NaN goes to the lower end. */
export function clampToRange(range: { min: number; max: number }, d: number): number {
  return d > range.max ? range.max : d >= range.min ? d : range.min;
}

export type StrengthScratch = StrengthAt & { fitIndex: number };

function fromSegments(c: CompiledStrength, x: number, out: StrengthScratch): void {
  let s = c.segments[c.segments.length - 1] as Segment;
  for (const seg of c.segments) {
    if (x <= seg.d1) { s = seg; break; }
  }
  const atEnd = x >= s.d1 || s.d0 === s.d1;
  const t = atEnd ? 1 : (x - s.d0) / (s.d1 - s.d0);
  out.min = atEnd ? s.min1 : s.min0 + t * (s.min1 - s.min0);
  out.max = s.max0 === null || s.max1 === null ? null : atEnd ? s.max1 : s.max0 + t * (s.max1 - s.max0);
  const src = atEnd ? s.end : s.span;
  out.source = src.source;
  out.verified = src.verified;
  out.basis = 'table';
  out.fitIndex = -1;
}

/** The fit holding x, else (only for grades whose data leave gaps) the nearest fit at its nearer end. */
function fromFits(c: CompiledStrength, x: number, out: StrengthScratch): void {
  let best = 0;
  let gap = Infinity;
  for (let i = 0; i < c.fits.length; i++) {
    const f = c.fits[i] as StrengthFit;
    const g = x < f.dMin ? f.dMin - x : x > f.dMax ? x - f.dMax : 0;
    if (g < gap) { best = i; gap = g; }
    if (g === 0) break;
  }
  const f = c.fits[best] as StrengthFit;
  const at = clampToRange({ min: f.dMin, max: f.dMax }, x);
  out.min = f.A / at ** f.m;
  out.max = null;
  out.source = f.source;
  out.verified = f.verified;
  out.basis = 'fit';
  out.fitIndex = best;
}

/** Writes the strength at d into `out` (no allocation; the engine calls this per analysed spec). */
export function strengthInto(c: CompiledStrength, d: number, out: StrengthScratch): void {
  const x = clampToRange(c.range, d);
  if (c.fits.length === 0 || (x >= c.tableLo && x <= c.tableHi)) fromSegments(c, x, out);
  else fromFits(c, x, out);
}

const cache = new WeakMap<WireGrade, CompiledStrength>();

export function compiledStrength(grade: WireGrade): CompiledStrength {
  let c = cache.get(grade);
  if (!c) {
    c = compileStrength(grade);
    cache.set(grade, c);
  }
  return c;
}

/** Minimum (and, where the table prints one, maximum) tensile strength in MPa at wire diameter d in mm. */
export function tensileStrengthAt(grade: WireGrade, d: number): StrengthAt {
  const out: StrengthScratch = { min: 0, max: null, basis: 'table', source: '', verified: false, fitIndex: -1 };
  strengthInto(compiledStrength(grade), d, out);
  return { min: out.min, max: out.max, basis: out.basis, source: out.source, verified: out.verified };
}

/** The modulus band holding d (bands ascend; the last one also serves beyond its edge). */
export function modulusBandAt(bands: readonly ModulusBand[], d: number): ModulusBand {
  for (const b of bands) {
    if (d <= b.upToDiameter) return b;
  }
  return bands[bands.length - 1] as ModulusBand;
}
