import type { ExtensionEndInput, ExtensionSpec, ExtensionEndForm } from '../../spec/extension';
import { extensionSpecQuantities } from '../../spec/extension';
import { convertFields } from '../../units';
import type { CoilBody } from '../coil-body';
import { coilBody } from '../coil-body';
import { DEFAULT_BEND_RADIUS_IN_WIRE_DIAMETERS } from './ends';

export interface ExtensionEnd {
  form: ExtensionEndForm;
  gap: number;
  /** Straight length of an extended hook beyond the loop (0 otherwise). */
  extension: number;
  /** Side-bend radius r2 where the loop turns into the body. */
  bendRadius: number;
  bendRadiusAssumed: boolean;
}

/** An extension spring in internal units (mm, N, MPa). */
export interface ExtensionDesign extends CoilBody {
  nb: number;
  ends: [ExtensionEnd, ExtensionEnd];
  specifiedFreeLength: number | null;
  specifiedBodyLength: number | null;
  initialTension: number | null;
  loads: { length: number; force?: number; tolerancePercent?: number }[];
  loopAngle: number | null;
  loopAngleTolerance: number | null;
  mechanicalStop: boolean;
  duty: { type: 'static' } | { type: 'cyclic'; between: [number, number]; cycles: number; peened: boolean; frequency?: number };
}

function endOf(input: ExtensionEndInput, d: number): ExtensionEnd {
  const e = typeof input === 'string' ? { form: input } : input;
  return {
    form: e.form,
    gap: ('gap' in e ? e.gap : undefined) ?? 0,
    extension: ('extension' in e ? e.extension : undefined) ?? 0,
    bendRadius: 'bendRadius' in e && e.bendRadius !== undefined ? e.bendRadius : DEFAULT_BEND_RADIUS_IN_WIRE_DIAMETERS * d,
    bendRadiusAssumed: !('bendRadius' in e && e.bendRadius !== undefined),
  };
}

/** Converts a validated spec to internal units with the kind's declared quantities; undefined for an unknown grade. */
export function extensionDesign(given: ExtensionSpec): ExtensionDesign | undefined {
  const spec = convertFields(given, extensionSpecQuantities, given.units, 'in');
  const body = coilBody(spec);
  if (!body) return undefined;
  return {
    units: body.units, d: body.d, D: body.D, diameterGiven: body.diameterGiven, serviceTemperature: body.serviceTemperature,
    wire: body.wire, wireFindings: body.wireFindings,
    nb: spec.bodyCoils,
    ends: [endOf(spec.ends[0], body.d), endOf(spec.ends[1], body.d)],
    specifiedFreeLength: spec.freeLength ?? null,
    specifiedBodyLength: spec.bodyLength ?? null,
    initialTension: spec.initialTension ?? null,
    loads: spec.loads.map((l) => ({ length: l.length, force: l.force, tolerancePercent: l.tolerancePercent })),
    loopAngle: spec.loopAngle ?? null,
    loopAngleTolerance: spec.loopAngleTolerance ?? null,
    mechanicalStop: spec.mechanicalStop,
    duty: spec.duty,
  };
}
