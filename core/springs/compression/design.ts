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

function meanDiameter(spec: CompressionSpec, d: number): { D: number; given: CompressionDesign['diameterGiven'] } {
  const L = (v: number) => toInternal(v, 'length', spec.units);
  if (spec.outerDiameter !== undefined) return { D: L(spec.outerDiameter) - d, given: 'outer' };
  if (spec.innerDiameter !== undefined) return { D: L(spec.innerDiameter) + d, given: 'inner' };
  return { D: L(spec.meanDiameter ?? Number.NaN), given: 'mean' };
}

function overridesInternal(spec: CompressionSpec): MaterialOverrides | undefined {
  const o = spec.materialOverrides;
  if (!o) return undefined;
  const stress = (v: number | undefined) => (v === undefined ? undefined : toInternal(v, 'stress', spec.units));
  return {
    shearModulus: stress(o.shearModulus),
    elasticModulus: stress(o.elasticModulus),
    tensileStrength: stress(o.tensileStrength),
    density: o.density === undefined ? undefined : toInternal(o.density, 'density', spec.units),
  };
}

/**
 * Converts a validated spec to internal units. Returns undefined only for an unknown grade, which
 * validation has already reported.
 */
export function compressionDesign(spec: CompressionSpec): CompressionDesign | undefined {
  const units = spec.units;
  const L = (v: number) => toInternal(v, 'length', units);
  const d = L(spec.wireDiameter);
  const { D, given } = meanDiameter(spec, d);
  const inactive = endForms[spec.ends].inactiveCoils;
  const nt = spec.totalCoils ?? (spec.activeCoils ?? Number.NaN) + inactive;
  const resolved = wireProperties(spec.material, d, overridesInternal(spec));
  if (!resolved) return undefined;
  const duty = spec.duty.type === 'static'
    ? spec.duty
    : { ...spec.duty, between: [L(spec.duty.between[0]), L(spec.duty.between[1])] as [number, number] };
  return {
    units, d, D, diameterGiven: given, nt, na: nt - inactive,
    coilsGiven: spec.totalCoils !== undefined ? 'total' : 'active', ends: spec.ends, L0: L(spec.freeLength),
    loads: spec.loads.map((l) => ({
      length: L(l.length),
      force: l.force === undefined ? undefined : toInternal(l.force, 'force', units),
      tolerancePercent: l.tolerancePercent,
    })),
    seating: spec.seating, duty, freeParameters: spec.freeParameters,
    serviceTemperature: spec.serviceTemperature && {
      min: toInternal(spec.serviceTemperature.min, 'temperature', units),
      max: toInternal(spec.serviceTemperature.max, 'temperature', units),
    },
    wire: resolved.props, wireFindings: resolved.findings,
  };
}
