import type { Finding } from '../result';
import type { UnitSystem } from '../units';
import { toInternal } from '../units';
import type { MaterialOverrides, WireProperties } from '../materials/types';
import { wireProperties } from '../materials';

/** What every helical spring spec has: wire, one coil diameter, overrides, service temperature. */
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

function meanDiameter(spec: CoilBodySpec, d: number, mm: number): { D: number; given: CoilBody['diameterGiven'] } {
  if (spec.outerDiameter !== undefined) return { D: spec.outerDiameter * mm - d, given: 'outer' };
  if (spec.innerDiameter !== undefined) return { D: spec.innerDiameter * mm + d, given: 'inner' };
  return { D: (spec.meanDiameter ?? Number.NaN) * mm, given: 'mean' };
}

function stressOverride(v: number | undefined, units: UnitSystem): number | undefined {
  return v === undefined ? undefined : toInternal(v, 'stress', units);
}

function overridesInternal(spec: CoilBodySpec): MaterialOverrides | undefined {
  const o = spec.materialOverrides;
  if (!o) return undefined;
  return {
    shearModulus: stressOverride(o.shearModulus, spec.units),
    elasticModulus: stressOverride(o.elasticModulus, spec.units),
    tensileStrength: stressOverride(o.tensileStrength, spec.units),
    density: o.density === undefined ? undefined : toInternal(o.density, 'density', spec.units),
  };
}

function temperatureInternal(spec: CoilBodySpec): CoilBody['serviceTemperature'] {
  const t = spec.serviceTemperature;
  if (!t) return undefined;
  return { min: toInternal(t.min, 'temperature', spec.units), max: toInternal(t.max, 'temperature', spec.units) };
}

/** Lengths scale linearly between the two systems, so one factor serves every length field. */
export const millimetresPer = (units: UnitSystem): number => toInternal(1, 'length', units);

/** Resolves wire and coil; undefined only for an unknown grade, which validation has already reported. */
export function coilBody(spec: CoilBodySpec): CoilBody | undefined {
  const mm = millimetresPer(spec.units);
  const d = spec.wireDiameter * mm;
  const { D, given } = meanDiameter(spec, d, mm);
  const resolved = wireProperties(spec.material, d, overridesInternal(spec));
  if (!resolved) return undefined;
  return {
    units: spec.units, d, D, diameterGiven: given, serviceTemperature: temperatureInternal(spec),
    wire: resolved.props, wireFindings: resolved.findings,
  };
}

