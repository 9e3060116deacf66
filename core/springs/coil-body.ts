import type { Finding } from '../result';
import type { UnitSystem } from '../units';
import type { WireProperties } from '../materials/types';
import { wireProperties } from '../materials';

/**
 * What every helical spring spec has: wire, one coil diameter, overrides, service temperature; here already
 * in internal units (each kind's design converts its spec in with the kind's declared quantities).
 */
export interface CoilBodySpec {
  units: UnitSystem;
  material: string;
  wireDiameter: number;
  outerDiameter?: number;
  innerDiameter?: number;
  meanDiameter?: number;
  materialOverrides?: { shearModulus?: number; elasticModulus?: number; tensileStrength?: number; density?: number };
  serviceTemperature?: { min: number; max: number };
}

/** The wire and coil shared by the three kinds, in internal units (mm, MPa, kg/dm³, °C), with the wire resolved. */
export interface CoilBody {
  units: UnitSystem;
  d: number;
  /** Mean coil diameter. */
  D: number;
  diameterGiven: 'outer' | 'inner' | 'mean';
  serviceTemperature?: { min: number; max: number };
  wire: WireProperties;
  /** Findings raised while resolving the wire (size outside the grade, strength from a fit). */
  wireFindings: Finding[];
}

function meanDiameter(spec: CoilBodySpec, d: number): { D: number; given: CoilBody['diameterGiven'] } {
  if (spec.outerDiameter !== undefined) return { D: spec.outerDiameter - d, given: 'outer' };
  if (spec.innerDiameter !== undefined) return { D: spec.innerDiameter + d, given: 'inner' };
  return { D: spec.meanDiameter ?? Number.NaN, given: 'mean' };
}

/** Resolves wire and coil; undefined only for an unknown grade, which validation has already reported. */
export function coilBody(spec: CoilBodySpec): CoilBody | undefined {
  const d = spec.wireDiameter;
  const { D, given } = meanDiameter(spec, d);
  const resolved = wireProperties(spec.material, d, spec.materialOverrides, spec.units);
  if (!resolved) return undefined;
  return {
    units: spec.units, d, D, diameterGiven: given, serviceTemperature: spec.serviceTemperature,
    wire: resolved.props, wireFindings: resolved.findings,
  };
}

