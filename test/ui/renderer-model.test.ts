/** The renderer's form model, without a browser: drafts, unit conversion, error placement, undo over revisions. */
import { menuCommands } from '../../core/api/method-names';
import { commandOfMenu } from '../../renderer/hooks/commands';
import { describe, expect, it } from 'vitest';
import type { Job, RevisionFields } from '../../core/api';
import { noJudgement } from '../../core/quoting/judgement';
import type { Spec } from '../../core/spec';
import { parseSpec } from '../../core/spec';
import { drawbarExtension, lidTorsion, valveSpringMetric } from '../fixtures/specs';
import { resolveField } from '../../renderer/model/errors';
import { evaluateDraft } from '../../renderer/model/evaluate';
import { jobDraftOf, jobFieldsOf, sameAsStored } from '../../renderer/model/job-draft';
import { numberText, parseList, parseNumber, takeDecimalMark } from '../../renderer/model/numbers';
import { getAt, setAt } from '../../renderer/model/paths';
import { convertDraft, draftFromSpec, draftToRaw, emptySpecDraft } from '../../renderer/model/spec-draft';
import { redoTarget, timelineOf, undoTarget } from '../../renderer/model/timeline';
import { revisionChanges } from '../../renderer/model/revision-diff';

const parsed = (raw: unknown): Spec => {
  const r = parseSpec(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};

describe('numbers as typed', () => {
  it('reads numbers as people type them and says why anything else is not one', () => {
    expect(parseNumber(' 2.5 ')).toEqual({ ok: true, value: 2.5, understood: null });
    expect(parseNumber('2.5')).toEqual({ ok: true, value: 2.5, understood: null });
    expect(parseNumber('')).toEqual({ ok: true, value: undefined, understood: null });
    expect(parseNumber('.5')).toMatchObject({ ok: true, value: 0.5 });
    expect(parseNumber('2,5')).toMatchObject({ ok: false, code: 'bad-grouping', message: expect.stringContaining('did you mean 2.5?') });
    expect(parseNumber('2 mm')).toMatchObject({ ok: false, code: 'wrong-unit' });
    expect(parseNumber('12 mm', 'length', 'inch')).toMatchObject({ ok: true, understood: 'read "12 mm" as 0.4724409 in' });
    // Split on ";", "/", a line break (and ", " where the comma is not the decimal mark), never inside "2 000".
    expect(parseList('100; 2 000/5 000')).toMatchObject({ ok: true, value: [100, 2000, 5000] });
    expect(parseList('100, 1000')).toMatchObject({ ok: true, value: [100, 1000] });
    expect(parseList('100; 1.5')).toEqual({ ok: false, code: 'not-whole', message: '1.5 is not a whole number of pieces', item: 1 });
  });

  it('reads and writes with a decimal comma when the shop sets one', () => {
    takeDecimalMark(',');
    try {
      expect(parseNumber('1,6')).toEqual({ ok: true, value: 1.6, understood: null });
      expect(parseNumber('2.000,5')).toMatchObject({ ok: true, value: 2000.5 });
      expect(numberText(1.6)).toBe('1,6');
      expect(parseList('1 000; 2 500')).toMatchObject({ ok: true, value: [1000, 2500] });
    } finally {
      takeDecimalMark('.');
    }
  });

  it('shows converted values without float noise and with enough digits to come back', () => {
    expect(numberText(44.99999)).toBe('45');
    expect(numberText(45 / 25.4)).toBe('1.771654');
    expect(numberText(Number(numberText(45 / 25.4)) * 25.4)).toBe('45');
    expect(numberText(undefined)).toBe('');
  });
});

describe('spec drafts', () => {
  const kinds: [string, Spec][] = [
    ['compression', parsed(valveSpringMetric)],
    ['extension', parsed(drawbarExtension)],
    ['torsion', parsed(lidTorsion)],
  ];

  it.each(kinds)('hold a %s spec and give it back unchanged', (_, spec) => {
    const back = parseSpec(draftToRaw(draftFromSpec(spec)).raw);
    expect(back.ok && back.value).toEqual({ ...spec, version: 1 });
  });

  it.each(kinds)('carry every value of a %s spec to inch and back to what was typed', (_, spec) => {
    const there = convertDraft(draftFromSpec(spec), 'inch');
    const inch = evaluateDraft(there);
    expect(inch.errors).toEqual([]);
    const back = parseSpec(draftToRaw(convertDraft(there, 'metric')).raw);
    expect(back.ok && back.value).toEqual({ ...spec, version: 1 });
  });

  it('converts lengths, forces and stresses by their own factors', () => {
    const inch = convertDraft(draftFromSpec(parsed(valveSpringMetric)), 'inch');
    expect(Number(inch.wireDiameter)).toBeCloseTo(2 / 25.4, 6);
    expect(Number(inch.compression.loads[1]!.force)).toBeCloseTo(70 / 4.4482216152605, 4);
    expect(Number(inch.overrides.shearModulus)).toBeCloseTo(81500 / 0.00689475729, -1);
    expect(inch.compression.loads[1]!.tolerancePercent).toBe('10');
  });

  it('lists what a blank form still needs, in the order of the form, as not yet shown', () => {
    const e = evaluateDraft(emptySpecDraft('metric'));
    expect(e.report).toBeNull();
    expect(e.errors.map((x) => x.path)).toEqual(['material', 'wireDiameter', 'outerDiameter', 'totalCoils', 'freeLength']);
    expect(e.errors.every((x) => x.missing)).toBe(true);
  });

  it('places errors on the rows of the form, past a blank row', () => {
    const d = draftFromSpec(parsed(valveSpringMetric));
    const blank = { length: '', force: '', tolerancePercent: '' };
    const typed = evaluateDraft({ ...d, compression: { ...d.compression, loads: [blank, { ...blank, length: '40', force: 'x' }] } });
    expect(typed.errors.map((x) => [x.path, x.message])).toEqual([['loads[1].force', '"x" is not a number; e.g. 2.5 or 2 000 or 3/8 or 1-1/4']]);
    // The schema sees one load (index 0); its error belongs to the second row of the form.
    const schema = evaluateDraft({ ...d, compression: { ...d.compression, loads: [blank, { ...blank, length: '75' }] } });
    expect(schema.errors.map((x) => x.path)).toEqual(['loads[1].length']);
  });

  it('finds the nearest field of an error path', () => {
    const fields = new Set(['spec.quantities', 'spec.loads[0].force']);
    expect(resolveField('spec.quantities[3]', fields)).toBe('spec.quantities');
    expect(resolveField('spec.loads[0].force', fields)).toBe('spec.loads[0].force');
    expect(resolveField('spec.duty', fields)).toBeNull();
  });
});

describe('job fields', () => {
  const job = {
    id: 1, number: 'J-26-0001', customer: { id: 3, name: 'Quillon Gate Co' }, partNumber: 'QG-1', drawingNumber: 'D-1',
    drawingRevision: 'A', status: 'draft', notes: '', dueDate: null, orderQuantity: 500, leadTimeDays: null, revision: 2,
    createdAt: '', updatedAt: '', shape: {} as Job['shape'], spec: parsed(valveSpringMetric),
  } as Job;

  it('turns whole numbers into numbers and anything else into an error on its field', () => {
    const { fields, errors } = jobFieldsOf({ ...jobDraftOf(job), orderQuantity: '12.5', leadTimeDays: '10' });
    expect(errors.map((e) => e.path)).toEqual(['orderQuantity']);
    expect(fields.leadTimeDays).toBe(10);
  });

  it('knows when a save would store nothing new', () => {
    const { fields } = jobFieldsOf(jobDraftOf(job));
    const spec = evaluateDraft(draftFromSpec(job.spec)).spec!;
    expect(sameAsStored(job, { ...fields, spec })).toBe(true);
    expect(sameAsStored(job, { ...fields, partNumber: 'QG-2', spec })).toBe(false);
  });
});

describe('undo and redo over stored revisions', () => {
  const saved = (revision: number, reason = 'saved') => ({ revision, reason });

  it('steps back and forward through restores, as the store records them', () => {
    let t = timelineOf([saved(1, 'created'), saved(2), saved(3)]);
    expect([undoTarget(t), redoTarget(t)]).toEqual([2, null]);
    t = timelineOf([saved(1, 'created'), saved(2), saved(3), saved(4, 'restored revision 2')]);
    expect([undoTarget(t), redoTarget(t)]).toEqual([1, 3]);
    t = timelineOf([saved(1, 'created'), saved(2), saved(3), saved(4, 'restored revision 2'), saved(5, 'restored revision 1')]);
    expect([undoTarget(t), redoTarget(t)]).toEqual([null, 2]);
  });

  it('drops the undone states once a new change is saved over them', () => {
    const t = timelineOf([saved(1, 'created'), saved(2), saved(3), saved(4, 'restored revision 2'), saved(5)]);
    expect(t.states).toEqual([1, 2, 5]);
    expect([undoTarget(t), redoTarget(t)]).toEqual([2, null]);
  });
});

describe('paths into settings', () => {
  it('reads and writes nested values by error path, leaving the original alone', () => {
    const original = { machines: [{ id: 'a', wireRange: { min: 0, max: 2 } }] };
    const next = setAt(original, 'machines[0].wireRange.max', 3);
    expect(getAt(next, 'machines[0].wireRange.max')).toBe(3);
    expect(getAt(original, 'machines[0].wireRange.max')).toBe(2);
    expect(getAt(setAt(next, 'machines[0].id', undefined), 'machines[0]')).toEqual({ wireRange: { min: 0, max: 3 } });
  });
});

describe('the application menu\'s commands', () => {
  it('map to the UI\'s commands, undo and redo included, and nothing else', () => {
    for (const menu of menuCommands) expect(commandOfMenu(menu), menu).not.toBeNull();
    expect(commandOfMenu('undo')).toBe('undo');
    expect(commandOfMenu('redo')).toBe('redo');
    expect(commandOfMenu('format-disk')).toBeNull();
  });
});

describe('a field that does not read, and what changed between revisions', () => {
  const saved = parsed(valveSpringMetric);

  it('lets the saved value stand in, keeps the edits that read, and probes which figures wait', () => {
    const d = draftFromSpec(saved);
    const e = evaluateDraft({ ...d, wireDiameter: 'abc', compression: { ...d.compression, freeLength: '52' } }, saved);
    expect(e.waitingOn).toEqual(['wireDiameter']);
    expect(e.errors.map((x) => [x.path, x.code])).toEqual([['wireDiameter', 'not-a-number']]);
    expect(e.spec?.wireDiameter).toBe(saved.wireDiameter);
    expect(e.spec && 'freeLength' in e.spec ? e.spec.freeLength : null).toBe(52);
    expect(e.probes).toHaveLength(3);
    // The rate moves with d (G d⁴ / 8 D³ n, EN 13906-1 eq. 9); the probes see it move.
    expect(e.probes.every((p) => p.kind === 'compression' && e.internal?.kind === 'compression' && p.rate !== e.internal.rate)).toBe(true);
    // With no saved spec a required field cannot stand in: nothing computes.
    expect(evaluateDraft({ ...d, wireDiameter: 'abc' }).spec).toBeNull();
  });

  it('lists each change by its label, in the units of the later revision', () => {
    const fields: RevisionFields = {
      customerId: null, customerName: null, partNumber: 'QG-7731', drawingNumber: '', drawingRevision: '', status: 'draft', notes: '',
      dueDate: null, orderQuantity: null, leadTimeDays: null, judgement: noJudgement(),
    };
    const inch = convertDraft(draftFromSpec(saved), 'inch');
    const after = evaluateDraft({ ...inch, compression: { ...inch.compression, freeLength: '2' } }).spec!;
    const changes = revisionChanges({ fields, spec: saved }, { fields: { ...fields, partNumber: 'QG-9' }, spec: after });
    expect(changes).toContainEqual({ field: 'Part number', before: 'QG-7731', after: 'QG-9' });
    expect(changes).toContainEqual({ field: 'Units', before: 'metric', after: 'inch' });
    // The free length before, in inches at the trade's 0.001 in (1 in = 25.4 mm, NIST SP 811).
    const l0 = ('freeLength' in saved ? saved.freeLength : undefined) ?? 0;
    expect(changes).toContainEqual({ field: 'Free length', before: `${(l0 / 25.4).toFixed(3)} in`, after: '2.000 in' });
    // Converted values that read the same in inches are not changes.
    expect(changes.map((c) => c.field)).not.toContain('Wire diameter');
  });
});
