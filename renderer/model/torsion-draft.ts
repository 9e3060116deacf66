import type { LegForm, TorsionSpec } from '../../core/spec';
import type { RawBuilder } from './convert';
import { compact } from './convert';
import type { DutyDraft } from './duty-draft';
import { dutyFromSpec, dutyPaths, dutyRaw, emptyDuty } from './duty-draft';
import { numberText } from './numbers';
import type { KindRaw } from './rows';
import { rowPath, sentRows } from './rows';

export interface LegDraft {
  length: string;
  form: LegForm;
  bendRadius: string;
}

/** A working position: deflection from free in degrees, with the torque the drawing may ask. */
export interface AngleLoadDraft {
  angle: string;
  torque: string;
  tolerancePercent: string;
}

export interface TorsionDraft {
  bodyCoils: string;
  legs: [LegDraft, LegDraft];
  freeAngle: string;
  freeAngleTolerance: string;
  windDirection: 'right' | 'left';
  loadDirection: 'closing' | 'opening';
  arborDiameter: string;
  loads: AngleLoadDraft[];
  /** `between` holds two deflections in degrees. */
  duty: DutyDraft;
}

const emptyLeg = (): LegDraft => ({ length: '', form: 'tangent', bendRadius: '' });
export const emptyAngleLoad = (): AngleLoadDraft => ({ angle: '', torque: '', tolerancePercent: '' });

export function emptyTorsion(): TorsionDraft {
  return {
    bodyCoils: '', legs: [emptyLeg(), emptyLeg()], freeAngle: '', freeAngleTolerance: '', windDirection: 'right',
    loadDirection: 'closing', arborDiameter: '', loads: [emptyAngleLoad()], duty: emptyDuty(),
  };
}

export function torsionFromSpec(s: TorsionSpec): TorsionDraft {
  const leg = (l: TorsionSpec['legs'][number]): LegDraft => ({ length: numberText(l.length), form: l.form, bendRadius: numberText(l.bendRadius) });
  return {
    bodyCoils: numberText(s.bodyCoils), legs: [leg(s.legs[0]), leg(s.legs[1])], freeAngle: numberText(s.freeAngle),
    freeAngleTolerance: numberText(s.freeAngleTolerance), windDirection: s.windDirection, loadDirection: s.loadDirection,
    arborDiameter: numberText(s.arborDiameter),
    loads: s.loads.map((l) => ({ angle: numberText(l.angle), torque: numberText(l.torque), tolerancePercent: numberText(l.tolerancePercent) })),
    duty: dutyFromSpec(s.duty, numberText),
  };
}

export function torsionRaw(d: TorsionDraft, b: RawBuilder): KindRaw {
  const rows: number[] = [];
  const leg = (l: LegDraft, i: number) => compact({
    length: b.required(`legs[${i}].length`, l.length, 'the leg length'), form: l.form, bendRadius: b.number(`legs[${i}].bendRadius`, l.bendRadius),
  });
  const raw = compact({
    bodyCoils: b.required('bodyCoils', d.bodyCoils, 'the number of body coils'),
    legs: [leg(d.legs[0], 0), leg(d.legs[1], 1)],
    freeAngle: b.number('freeAngle', d.freeAngle),
    freeAngleTolerance: b.number('freeAngleTolerance', d.freeAngleTolerance),
    windDirection: d.windDirection,
    loadDirection: d.loadDirection,
    arborDiameter: b.number('arborDiameter', d.arborDiameter),
    loads: sentRows(d.loads, rows, (l, i) => compact({
      angle: b.required(`loads[${i}].angle`, l.angle, 'a working angle'),
      torque: b.number(`loads[${i}].torque`, l.torque),
      tolerancePercent: b.number(`loads[${i}].tolerancePercent`, l.tolerancePercent),
    })),
    duty: dutyRaw(d.duty, b, ['the first working angle', 'the second working angle']),
  });
  return { raw, formPath: (path) => rowPath(path, 'loads', rows) };
}

export function torsionPaths(d: TorsionDraft): string[] {
  const paths = ['bodyCoils', 'freeAngle', 'freeAngleTolerance', 'windDirection', 'loadDirection', 'arborDiameter', ...dutyPaths(d.duty)];
  for (const i of [0, 1]) paths.push(`legs[${i}].length`, `legs[${i}].form`, `legs[${i}].bendRadius`);
  d.loads.forEach((_, i) => paths.push(`loads[${i}].angle`, `loads[${i}].torque`, `loads[${i}].tolerancePercent`));
  return paths;
}
