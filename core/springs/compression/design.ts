import type { CompressionSpec, CompressionEnds, FreeParameter, Seating } from '../../spec/compression';
import type { Finding } from '../../result';
import type { UnitSystem } from '../../units';
import { toInternal } from '../../units';
import type { MaterialOverrides, WireProperties } from '../../materials/types';
import { wireProperties } from '../../materials';
import { endForms } from './ends';

/** A compression spring in internal units (mm, N, MPa, kg/dm³, °C), with its wire resolved. */
export interface CompressionDesign {
  units: UnitSystem;
  d: number;
  /** Mean coil diameter. */
  D: number;
  diameterGiven: 'outer' | 'inner' | 'mean';
  nt: number;
  na: number;
  coilsGiven: 'total' | 'active';
  ends: CompressionEnds;
  L0: number;
  loads: { length: number; force?: number; tolerancePercent?: number }[];
  seating: Seating;
  duty:
    | { type: 'static' }
    | { type: 'cyclic'; between: [number, number]; cycles: number; peened: boolean; frequency?: number };
  freeParameters: FreeParameter[];
  serviceTemperature?: { min: number; max: number };
  wire: WireProperties;
  /** Findings raised while resolving the wire (size outside the grade, strength from a fit). */
  wireFindings: Finding[];
}

function meanDiameter(spec: CompressionSpec, d: number, mm: number): { D: number; given: CompressionDesign['diameterGiven'] } {
  if (spec.outerDiameter !== undefined) return { D: spec.outerDiameter * mm - d, given: 'outer' };
  if (spec.innerDiameter !== undefined) return { D: spec.innerDiameter * mm + d, given: 'inner' };
  return { D: (spec.meanDiameter ?? Number.NaN) * mm, given: 'mean' };
}

function stressOverride(v: number | undefined, units: UnitSystem): number | undefined {
  return v === undefined ? undefined : toInternal(v, 'stress', units);
}

function overridesInternal(spec: CompressionSpec): MaterialOverrides | undefined {
  const o = spec.materialOverrides;
  if (!o) return undefined;
  return {
    shearModulus: stressOverride(o.shearModulus, spec.units),
    elasticModulus: stressOverride(o.elasticModulus, spec.units),
    tensileStrength: stressOverride(o.tensileStrength, spec.units),
    density: o.density === undefined ? undefined : toInternal(o.density, 'density', spec.units),
  };
}

function loadsInternal(spec: CompressionSpec, mm: number): CompressionDesign['loads'] {
  const newtons = toInternal(1, 'force', spec.units);
  const out: CompressionDesign['loads'] = [];
  for (const l of spec.loads) {
    out.push({
      length: l.length * mm,
      force: l.force === undefined ? undefined : l.force * newtons,
      tolerancePercent: l.tolerancePercent,
    });
  }
  return out;
}

function dutyInternal(spec: CompressionSpec, mm: number): CompressionDesign['duty'] {
  const duty = spec.duty;
  if (duty.type === 'static') return duty;
  return { ...duty, between: [duty.between[0] * mm, duty.between[1] * mm] };
}

function temperatureInternal(spec: CompressionSpec): CompressionDesign['serviceTemperature'] {
  const t = spec.serviceTemperature;
  if (!t) return undefined;
  return { min: toInternal(t.min, 'temperature', spec.units), max: toInternal(t.max, 'temperature', spec.units) };
}

/**
 * Converts a validated spec to internal units. Returns undefined only for an unknown grade, which
 * validation has already reported.
 */
export function compressionDesign(spec: CompressionSpec): CompressionDesign | undefined {
  const units = spec.units;
  // Lengths scale linearly between the two systems, so one factor serves every length field.
  const mm = toInternal(1, 'length', units);
  const d = spec.wireDiameter * mm;
  const { D, given } = meanDiameter(spec, d, mm);
  const inactive = endForms[spec.ends].inactiveCoils;
  const nt = spec.totalCoils ?? (spec.activeCoils ?? Number.NaN) + inactive;
  const resolved = wireProperties(spec.material, d, overridesInternal(spec));
  if (!resolved) return undefined;
  return {
    units, d, D, diameterGiven: given, nt, na: nt - inactive,
    coilsGiven: spec.totalCoils !== undefined ? 'total' : 'active',
    ends: spec.ends, L0: spec.freeLength * mm, loads: loadsInternal(spec, mm),
    seating: spec.seating, duty: dutyInternal(spec, mm), freeParameters: spec.freeParameters,
    serviceTemperature: temperatureInternal(spec),
    wire: resolved.props, wireFindings: resolved.findings,
  };
}
