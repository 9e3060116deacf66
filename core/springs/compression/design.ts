import type { CompressionSpec, CompressionEnds, FreeParameter, Seating } from '../../spec/compression';
import { compressionSpecQuantities } from '../../spec/compression';
import { convertFields } from '../../units';
import type { CoilBody } from '../coil-body';
import { coilBody } from '../coil-body';
import { endForms } from './ends';

/** A compression spring in internal units (mm, N, MPa, kg/dm³, °C), with its wire resolved. */
export interface CompressionDesign extends CoilBody {
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
  /** EN 15800 tolerance grade the drawing names, if any. */
  toleranceGrade: 1 | 2 | 3 | undefined;
}

function loadsOf(spec: CompressionSpec): CompressionDesign['loads'] {
  const out: CompressionDesign['loads'] = [];
  for (const l of spec.loads) out.push({ length: l.length, force: l.force, tolerancePercent: l.tolerancePercent });
  return out;
}

/**
 * Converts a validated spec to internal units with the kind's declared quantities. Returns undefined only for an unknown grade, which
 * validation has already reported.
 */
export function compressionDesign(given: CompressionSpec): CompressionDesign | undefined {
  const spec = convertFields(given, compressionSpecQuantities, given.units, 'in');
  const body = coilBody(spec);
  if (!body) return undefined;
  const inactive = endForms[spec.ends].inactiveCoils;
  const nt = spec.totalCoils ?? (spec.activeCoils ?? Number.NaN) + inactive;
  // Fields listed one by one: an object spread of the body made these objects' shapes unstable and the
  // analysis several times slower (npm run bench).
  return {
    units: body.units, d: body.d, D: body.D, diameterGiven: body.diameterGiven, serviceTemperature: body.serviceTemperature,
    wire: body.wire, wireFindings: body.wireFindings, nt, na: nt - inactive,
    coilsGiven: spec.totalCoils !== undefined ? 'total' : 'active',
    ends: spec.ends, L0: spec.freeLength, loads: loadsOf(spec),
    seating: spec.seating, duty: spec.duty, freeParameters: spec.freeParameters,
    toleranceGrade: spec.toleranceGrade,
  };
}
