import type { UnitSystem } from '../units';
import { toInternal } from '../units';
import { DEFAULT_LOAD_TOLERANCE_PERCENT } from '../springs/specified';
import type { CompressionEnds, Seating } from '../spec/compression';
import type { GradeFamily } from '../materials/types';
import type { CompressionRequirement, WireSizeSource } from './schema';

/** A requirement in internal units (mm, N, N/mm, °C), with the target rate and the loads longest first. */
export interface RequirementInternal {
  kind: 'compression';
  units: UnitSystem;
  envelope: { bore?: number; maxOuterDiameter?: number; rod?: number; minInnerDiameter?: number; maxSolidLength?: number; maxFreeLength?: number };
  /** Longest length first; each with its tolerance (± %) and its path in the requirement. */
  loads: { length: number; force: number; tolerancePercent: number; path: string }[];
  /** The rate the function asks for: given, or from the two loads. */
  rate: number;
  /** Set when the customer gives the rate with a tolerance (± %). */
  rateTolerancePercent: number | null;
  maxStressRatio: number | null;
  duty: { type: 'static' } | { type: 'cyclic'; between: [number, number]; cycles: number; peeningAllowed: boolean; frequency?: number };
  serviceTemperature?: { min: number; max: number };
  seating: Seating;
  /** Shortest working length (a load or an end of the stroke). */
  deepestLength: number;
  grades?: string[];
  families?: GradeFamily[];
  ends: CompressionEnds[];
  wireSizes: WireSizeSource;
  /** EN 15800 tolerance grade the drawing will name, if the customer gives one. */
  toleranceGrade: 1 | 2 | 3 | undefined;
}

export function requirementInternal(r: CompressionRequirement): RequirementInternal {
  const mm = (v: number | undefined) => (v === undefined ? undefined : toInternal(v, 'length', r.units));
  const N = (v: number) => toInternal(v, 'force', r.units);
  const f = r.function;
  const points = f.type === 'two-loads' ? f.loads.map((l, i) => ({ l, path: `function.loads[${i}]` })) : [{ l: f.load, path: 'function.load' }];
  const loads = points
    .map(({ l, path }) => ({ length: mm(l.length)!, force: N(l.force), tolerancePercent: l.tolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT, path }))
    .sort((a, b) => b.length - a.length);
  const rate = f.type === 'load-and-rate' ? toInternal(f.rate, 'rate', r.units)
    : (loads[1]!.force - loads[0]!.force) / (loads[0]!.length - loads[1]!.length);
  const duty: RequirementInternal['duty'] = r.duty.type === 'static' ? r.duty
    : { ...r.duty, between: [mm(r.duty.between[0])!, mm(r.duty.between[1])!] };
  const working = [...loads.map((l) => l.length), ...(duty.type === 'cyclic' ? duty.between : [])];
  const e = r.envelope;
  const t = r.serviceTemperature;
  return {
    kind: 'compression', units: r.units,
    envelope: { bore: mm(e.bore), maxOuterDiameter: mm(e.maxOuterDiameter), rod: mm(e.rod), minInnerDiameter: mm(e.minInnerDiameter),
      maxSolidLength: mm(e.maxSolidLength), maxFreeLength: mm(e.maxFreeLength) },
    loads, rate,
    rateTolerancePercent: f.type === 'load-and-rate' ? f.rateTolerancePercent ?? DEFAULT_LOAD_TOLERANCE_PERCENT : null,
    maxStressRatio: r.maxStressRatio ?? null,
    duty,
    serviceTemperature: t && { min: toInternal(t.min, 'temperature', r.units), max: toInternal(t.max, 'temperature', r.units) },
    seating: r.seating,
    deepestLength: Math.min(...working),
    grades: r.choices.grades, families: r.choices.families, ends: r.choices.ends, wireSizes: r.choices.wireSizes,
    toleranceGrade: r.choices.toleranceGrade,
  };
}
