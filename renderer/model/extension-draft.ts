import type { ExtensionEndForm, ExtensionEndInput, ExtensionSpec } from '../../core/spec';
import type { RawBuilder } from './convert';
import { compact } from './convert';
import type { LoadDraft } from './compression-draft';
import { emptyLoad, loadsFromSpec, loadsRaw } from './compression-draft';
import type { DutyDraft } from './duty-draft';
import { dutyFromSpec, dutyPaths, dutyRaw, emptyDuty } from './duty-draft';
import { numberText } from './numbers';
import type { KindRaw } from './rows';
import { rowPath } from './rows';

export interface EndDraft {
  form: ExtensionEndForm;
  gap: string;
  extension: string;
  bendRadius: string;
}

/** The extension-specific part of the form. Lengths are inside the ends, as extension springs are measured. */
export interface ExtensionDraft {
  bodyCoils: string;
  ends: [EndDraft, EndDraft];
  freeLength: string;
  bodyLength: string;
  initialTension: string;
  loads: LoadDraft[];
  loopAngle: string;
  loopAngleTolerance: string;
  mechanicalStop: boolean;
  duty: DutyDraft;
}

const emptyEnd = (): EndDraft => ({ form: 'machine-loop', gap: '', extension: '', bendRadius: '' });

export function emptyExtension(): ExtensionDraft {
  return {
    bodyCoils: '', ends: [emptyEnd(), emptyEnd()], freeLength: '', bodyLength: '', initialTension: '', loads: [emptyLoad()],
    loopAngle: '', loopAngleTolerance: '', mechanicalStop: false, duty: emptyDuty(),
  };
}

function endFromSpec(e: ExtensionEndInput): EndDraft {
  if (typeof e === 'string') return { ...emptyEnd(), form: e };
  return { form: e.form, gap: numberText(e.gap), extension: numberText(e.extension), bendRadius: numberText(e.bendRadius) };
}

export function extensionFromSpec(s: ExtensionSpec): ExtensionDraft {
  return {
    bodyCoils: numberText(s.bodyCoils), ends: [endFromSpec(s.ends[0]), endFromSpec(s.ends[1])], freeLength: numberText(s.freeLength), bodyLength: numberText(s.bodyLength),
    initialTension: numberText(s.initialTension), loads: loadsFromSpec(s.loads), loopAngle: numberText(s.loopAngle),
    loopAngleTolerance: numberText(s.loopAngleTolerance), mechanicalStop: s.mechanicalStop, duty: dutyFromSpec(s.duty, numberText),
  };
}

function endRaw(e: EndDraft, i: number, b: RawBuilder): unknown {
  const details = compact({
    gap: b.number(`ends[${i}].gap`, e.gap),
    extension: b.number(`ends[${i}].extension`, e.extension),
    bendRadius: b.number(`ends[${i}].bendRadius`, e.bendRadius),
  });
  return Object.keys(details).length === 0 ? e.form : { form: e.form, ...details };
}

export function extensionRaw(d: ExtensionDraft, b: RawBuilder): KindRaw {
  const rows: number[] = [];
  const raw = compact({
    bodyCoils: b.required('bodyCoils', d.bodyCoils, 'the number of body coils'),
    ends: [endRaw(d.ends[0], 0, b), endRaw(d.ends[1], 1, b)],
    freeLength: b.number('freeLength', d.freeLength),
    bodyLength: b.number('bodyLength', d.bodyLength),
    initialTension: b.number('initialTension', d.initialTension),
    loads: loadsRaw(d.loads, b, rows),
    loopAngle: b.number('loopAngle', d.loopAngle),
    loopAngleTolerance: b.number('loopAngleTolerance', d.loopAngleTolerance),
    mechanicalStop: d.mechanicalStop,
    duty: dutyRaw(d.duty, b, ['the shorter working length', 'the longer working length']),
  });
  return { raw, formPath: (path) => rowPath(path, 'loads', rows) };
}

export function extensionPaths(d: ExtensionDraft): string[] {
  const paths = ['bodyCoils', 'freeLength', 'bodyLength', 'initialTension', 'loopAngle', 'loopAngleTolerance', 'mechanicalStop', 'directionOfWind', ...dutyPaths(d.duty)];
  for (const i of [0, 1]) paths.push(`ends[${i}]`, `ends[${i}].gap`, `ends[${i}].extension`, `ends[${i}].bendRadius`);
  d.loads.forEach((_, i) => paths.push(`loads[${i}].length`, `loads[${i}].force`, `loads[${i}].tolerancePercent`));
  return paths;
}
