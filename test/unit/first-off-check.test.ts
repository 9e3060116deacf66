import { describe, expect, it } from 'vitest';
import { checkFirstOff } from '../../core/first-off/check';
import { finishedLengths } from '../../core/process/set-model-values';
import { parseSpec } from '../../core/spec';
import type { Spec } from '../../core/spec';
import { MM_PER_IN } from '../../core/units';
import { draftValue, emptyFirstOffDraft, firstOffInputOf, withDraftValue } from '../../renderer/model/first-off-draft';

const specOf = (raw: unknown): Spec => {
  const r = parseSpec(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};

/** An invented inch part (demo data): 0.12 in carbon wire, OD 0.95 in, 9 coils, closed and ground. */
const inchSpring = specOf({ kind: 'compression', units: 'inch', material: 'astm-a228', wireDiameter: 0.12, outerDiameter: 0.95,
  totalCoils: 9, ends: 'closed-ground', freeLength: 2.4, loads: [{ length: 1.8 }] });
const record = { units: 'inch', coiledFreeLength: 2.45, freeLengthAfterSet: 2.4, forces: [{ length: 1.8, force: 20 }],
  outerDiameter: 0.951, measuredOn: '2026-05-04', measuredBy: 'R. Demo' };

describe('checking a first-off record against its job', () => {
  it('accepts a record in the job\'s units and compares it with the solid length in those units', () => {
    expect(checkFirstOff(record, inchSpring).ok).toBe(true);
    // Squared and ground ends: solid length Ls = d·Nt (Shigley, Mechanical Engineering Design, 9th ed., Table 10-1) = 0.12 × 9 = 1.08 in.
    expect(finishedLengths(inchSpring)!.solidLength).toBeCloseTo(1.08 * MM_PER_IN, 9);
    const below = checkFirstOff({ ...record, freeLengthAfterSet: 1.0, forces: [] }, inchSpring, ['firstOff', 2]);
    expect(below).toMatchObject({ ok: false, errors: [{ code: 'set-beyond-deflection', path: 'firstOff[2].freeLengthAfterSet' }] });
    if (!below.ok) expect(below.errors[0]!.message).toMatch(/1\.370 in\).*1\.080 in/);
  });

  it('names every field of a record in the other unit system that is also incomplete', () => {
    const r = checkFirstOff({ units: 'metric', coiledFreeLength: 62 }, inchSpring);
    expect(r.ok ? [] : r.errors.map((e) => e.path)).toEqual(['units', 'freeLengthAfterSet', 'outerDiameter', 'measuredOn', 'measuredBy']);
  });
});

describe('the first-off form model', () => {
  it('sends blanks as missing and keeps text that is not a number beside its field', () => {
    let d = emptyFirstOffDraft(2, '2026-05-04', 'R. Demo');
    d = withDraftValue(withDraftValue(d, 'forces[1]', '3,5'), 'coiledFreeLength', '2.45');
    expect(draftValue(d, 'forces[1]')).toBe('3,5');
    expect(firstOffInputOf(d, 7, 'inch', [1.8, 1.5])).toMatchObject({ input: null, errors: [{ path: 'forces[1]' }] });
    d = withDraftValue(d, 'forces[1]', '3.5');
    const { input } = firstOffInputOf(d, 7, 'inch', [1.8, 1.5]);
    expect(input).toMatchObject({ jobId: 7, units: 'inch', coiledFreeLength: 2.45, freeLengthAfterSet: undefined,
      forces: [{ length: 1.8, force: undefined }, { length: 1.5, force: 3.5 }] });
  });
});
