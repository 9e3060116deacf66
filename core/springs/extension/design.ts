import type { ExtensionEndInput, ExtensionSpec, ExtensionEndForm } from '../../spec/extension';
import { toInternal } from '../../units';
import type { CoilBody } from '../coil-body';
import { coilBody, millimetresPer } from '../coil-body';
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

function endOf(input: ExtensionEndInput, d: number, mm: number): ExtensionEnd {
  const e = typeof input === 'string' ? { form: input } : input;
  return {
    form: e.form,
    gap: (('gap' in e ? e.gap : undefined) ?? 0) * mm,
    extension: (('extension' in e ? e.extension : undefined) ?? 0) * mm,
    bendRadius: 'bendRadius' in e && e.bendRadius !== undefined ? e.bendRadius * mm : DEFAULT_BEND_RADIUS_IN_WIRE_DIAMETERS * d,
    bendRadiusAssumed: !('bendRadius' in e && e.bendRadius !== undefined),
  };
}

export function extensionDesign(spec: ExtensionSpec): ExtensionDesign | undefined {
  const body = coilBody(spec);
  if (!body) return undefined;
  const mm = millimetresPer(spec.units);
  const N = toInternal(1, 'force', spec.units);
  const duty = spec.duty.type === 'static'
    ? spec.duty
    : { ...spec.duty, between: [spec.duty.between[0] * mm, spec.duty.between[1] * mm] as [number, number] };
  return {
    units: body.units, d: body.d, D: body.D, diameterGiven: body.diameterGiven, serviceTemperature: body.serviceTemperature,
    wire: body.wire, wireFindings: body.wireFindings,
    nb: spec.bodyCoils,
    ends: [endOf(spec.ends[0], body.d, mm), endOf(spec.ends[1], body.d, mm)],
    specifiedFreeLength: spec.freeLength === undefined ? null : spec.freeLength * mm,
    specifiedBodyLength: spec.bodyLength === undefined ? null : spec.bodyLength * mm,
    initialTension: spec.initialTension === undefined ? null : spec.initialTension * N,
    loads: spec.loads.map((l) => ({ length: l.length * mm, force: l.force === undefined ? undefined : l.force * N, tolerancePercent: l.tolerancePercent })),
    loopAngle: spec.loopAngle ?? null,
    loopAngleTolerance: spec.loopAngleTolerance ?? null,
    mechanicalStop: spec.mechanicalStop,
    duty,
  };
}
