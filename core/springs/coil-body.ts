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

/** The mean coil diameter from whichever diameter the spec gives (in the spec's own units or internal ones). */
export function meanDiameterOf(spec: CoilBodySpec): number {
  if (spec.outerDiameter !== undefined) return spec.outerDiameter - spec.wireDiameter;
  if (spec.innerDiameter !== undefined) return spec.innerDiameter + spec.wireDiameter;
  return spec.meanDiameter ?? Number.NaN;
}

/** Which coil diameter the spec gives. */
export const diameterGiven = (spec: CoilBodySpec): CoilBody['diameterGiven'] =>
  spec.outerDiameter !== undefined ? 'outer' : spec.innerDiameter !== undefined ? 'inner' : 'mean';

/** The spec's field of each given coil diameter (the path findings and errors name). */
export const diameterField: Record<CoilBody['diameterGiven'], string> = {
  outer: 'outerDiameter', inner: 'innerDiameter', mean: 'meanDiameter',
};

/** Resolves wire and coil; undefined only for an unknown grade, which validation has already reported. */
export function coilBody(spec: CoilBodySpec): CoilBody | undefined {
  const d = spec.wireDiameter;
  const resolved = wireProperties(spec.material, d, spec.materialOverrides, spec.units);
  if (!resolved) return undefined;
  return {
    units: spec.units, d, D: meanDiameterOf(spec), diameterGiven: diameterGiven(spec), serviceTemperature: spec.serviceTemperature,
    wire: resolved.props, wireFindings: resolved.findings,
  };
}

