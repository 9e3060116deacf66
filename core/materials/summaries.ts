/** One line per grade for the `materials` listing: what it is, where it can be used, where its strength comes from. */
import { wireGrades } from './catalog';
import type { GradeFamily, StrengthTable, WireGrade } from './types';

export interface StrengthSourceSummary {
  kind: 'table' | 'fit';
  source: string;
  verified: boolean;
  /** Sizes (mm) this source covers. */
  sizes: { min: number; max: number };
}

export interface GradeSummary {
  id: string;
  name: string;
  standard: string;
  family: GradeFamily;
  diameterRange: { min: number; max: number };
  serviceTemperature: { min: number; max: number };
  dynamicGrade: boolean;
  strengthSources: StrengthSourceSummary[];
}

/** The table's own rows as one entry, then one entry per distinct row origin (e.g. rows from memory). */
function tableSources(t: StrengthTable, rangeMin: number): StrengthSourceSummary[] {
  const out: StrengthSourceSummary[] = [];
  t.rows.forEach((row, k) => {
    const o = row.origin ?? t;
    const lower = t.form === 'bands' && k === 0 ? Math.min(rangeMin, row.d) : row.d;
    const entry = out.find((e) => e.source === o.source);
    if (entry) entry.sizes.max = row.d;
    else out.push({ kind: 'table', source: o.source, verified: o.verified, sizes: { min: lower, max: row.d } });
  });
  return out;
}

function summary(g: WireGrade): GradeSummary {
  const fits = g.strengthFits.map((f): StrengthSourceSummary =>
    ({ kind: 'fit', source: f.source, verified: f.verified, sizes: { min: f.dMin, max: f.dMax } }));
  return {
    id: g.id,
    name: g.name,
    standard: g.standard,
    family: g.family,
    diameterRange: { min: g.diameterRange.min, max: g.diameterRange.max },
    serviceTemperature: { min: g.serviceTemperature.min, max: g.serviceTemperature.max },
    dynamicGrade: g.dynamicGrade,
    strengthSources: [...(g.strengthTable ? tableSources(g.strengthTable, g.diameterRange.min) : []), ...fits],
  };
}

/** A fresh listing on each call (callers may serialise or change it freely). */
export function gradeSummaries(): GradeSummary[] {
  return wireGrades.map(summary);
}
