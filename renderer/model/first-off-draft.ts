import type { FirstOffInput } from '../../core/api';
import type { UnitSystem } from '../../core/units';
import type { FormError } from './errors';
import { parseNumber } from './numbers';

/** What the inspector has typed for one first-off record; numbers stay text until they parse. */
export interface FirstOffDraft {
  coiledFreeLength: string;
  freeLengthAfterSet: string;
  /** One measured force per test length of the job's spec, in the spec's order. */
  forces: string[];
  outerDiameter: string;
  measuredOn: string;
  measuredBy: string;
  notes: string;
}

export const emptyFirstOffDraft = (testLengths: number, today: string, measuredBy = ''): FirstOffDraft => ({
  coiledFreeLength: '', freeLengthAfterSet: '', forces: Array.from({ length: testLengths }, () => ''), outerDiameter: '',
  measuredOn: today, measuredBy, notes: '',
});

/**
 * The paths the form has a field for (the API's own paths, so its errors land beside the fields). A test
 * length's row is `forces[i]`: errors on its force and on its length both belong there.
 */
export function firstOffPaths(testLengths: number): string[] {
  return ['coiledFreeLength', 'freeLengthAfterSet', 'outerDiameter', 'measuredOn', 'measuredBy', 'notes', 'units', 'jobId',
    ...Array.from({ length: testLengths }, (_, i) => `forces[${i}]`)];
}

/**
 * The record to send, or the fields whose text is not a number. A blank number goes as missing, so the
 * service names it; everything else is checked by the service against the job's spring.
 */
export function firstOffInputOf(draft: FirstOffDraft, jobId: number, units: UnitSystem, testLengths: readonly number[]):
  { input: FirstOffInput | null; errors: FormError[] } {
  const errors: FormError[] = [];
  const num = (text: string, path: string): number | undefined => {
    const p = parseNumber(text, path.startsWith('forces') ? 'force' : 'length', units);
    if (!p.ok) errors.push({ code: p.code, path, message: p.message, missing: false });
    return p.ok ? p.value : undefined;
  };
  const input = {
    jobId, units,
    coiledFreeLength: num(draft.coiledFreeLength, 'coiledFreeLength'),
    freeLengthAfterSet: num(draft.freeLengthAfterSet, 'freeLengthAfterSet'),
    forces: testLengths.map((length, i) => ({ length, force: num(draft.forces[i] ?? '', `forces[${i}]`) })),
    outerDiameter: num(draft.outerDiameter, 'outerDiameter'),
    measuredOn: draft.measuredOn.trim(), measuredBy: draft.measuredBy, notes: draft.notes,
  };
  return { input: errors.length > 0 ? null : (input as FirstOffInput), errors };
}

type TextKey = Exclude<keyof FirstOffDraft, 'forces'>;
const forcePath = /^forces\[(\d+)\]$/;

/** The text of the field a path names. */
export function draftValue(draft: FirstOffDraft, path: string): string {
  const force = forcePath.exec(path);
  return force ? draft.forces[Number(force[1])] ?? '' : draft[path as TextKey];
}

/** The draft with the field a path names set to `value`. */
export function withDraftValue(draft: FirstOffDraft, path: string, value: string): FirstOffDraft {
  const force = forcePath.exec(path);
  if (force) return { ...draft, forces: draft.forces.map((f, i) => (i === Number(force[1]) ? value : f)) };
  return { ...draft, [path as TextKey]: value };
}
