import type { LegForm, TorsionSpec } from '../../spec/torsion';
import { torsionSpecQuantities } from '../../spec/torsion';
import { convertFields } from '../../units';
import type { CoilBody } from '../coil-body';
import { coilBody } from '../coil-body';

export interface TorsionLeg {
  length: number;
  form: LegForm;
  bendRadius: number | null;
}

/** A torsion spring in internal units (mm, N·mm, MPa, degrees). */
export interface TorsionDesign extends CoilBody {
  nb: number;
  legs: [TorsionLeg, TorsionLeg];
  freeAngle: number | null;
  freeAngleTolerance: number | null;
  windDirection: 'right' | 'left';
  loadDirection: 'closing' | 'opening';
  arborDiameter: number | null;
  loads: { angle: number; torque?: number; tolerancePercent?: number }[];
  duty: { type: 'static' } | { type: 'cyclic'; between: [number, number]; cycles: number; peened: boolean; frequency?: number };
}

/** Converts a validated spec to internal units with the kind's declared quantities; undefined for an unknown grade. */
export function torsionDesign(given: TorsionSpec): TorsionDesign | undefined {
  const spec = convertFields(given, torsionSpecQuantities, given.units, 'in');
  const body = coilBody(spec);
  if (!body) return undefined;
  const leg = (i: 0 | 1): TorsionLeg => ({
    length: spec.legs[i].length, form: spec.legs[i].form, bendRadius: spec.legs[i].bendRadius ?? null,
  });
  return {
    units: body.units, d: body.d, D: body.D, diameterGiven: body.diameterGiven, serviceTemperature: body.serviceTemperature,
    wire: body.wire, wireFindings: body.wireFindings, nb: spec.bodyCoils, legs: [leg(0), leg(1)],
    freeAngle: spec.freeAngle ?? null, freeAngleTolerance: spec.freeAngleTolerance ?? null,
    windDirection: spec.windDirection, loadDirection: spec.loadDirection,
    arborDiameter: spec.arborDiameter ?? null,
    loads: spec.loads.map((l) => ({ angle: l.angle, torque: l.torque, tolerancePercent: l.tolerancePercent })),
    duty: spec.duty,
  };
}
