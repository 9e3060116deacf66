import { describe, expect, it } from 'vitest';
import { createJob, getJob, jobRevisions, keepWorkingRevision, setJobStatus, updateJob } from '../../../db';
import { deskBackends } from '../../support/desk-backends';
import { usePgCluster } from '../../support/pg-stores';
import { job, spec, value } from './helpers';

const pg = usePgCluster();

const backends = deskBackends(pg);

const freeLength = (s: unknown) => (s as { freeLength?: number }).freeLength;

function refusal(result: ReturnType<typeof updateJob>) {
  expect(result.ok).toBe(false);
  if (result.ok) throw new Error('expected a refusal');
  return result.error;
}

describe.each(backends)('two desks autosaving one job on $name', (backend) => {
  it('the second desk to type is refused with both versions and told who is editing; nothing is written', () => {
    const [anna, ben] = backend.desks('Anna (estimator)', 'Ben (planner)');
    const created = value(createJob(anna, job()));
    value(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 52 }), working: true, desk: 'anna-1' }));

    // Ben opens the job: the working copy is Anna's, and says so.
    const seen = value(getJob(ben, created.id));
    expect(seen.working).toMatchObject({ desk: 'anna-1', by: 'Anna (estimator)', baseRevision: 1, saves: 1 });
    expect(freeLength(seen.spec)).toBe(52);

    const late = refusal(updateJob(ben, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 55 }), notes: 'Ben', working: true, desk: 'ben-1' }));
    expect(late).toMatchObject({ code: 'edited-elsewhere', path: 'expectedRevision' });
    expect(late.message).toMatch(/being edited at another desk by Anna \(estimator\).*nothing was saved/);
    expect(late.details).toEqual([
      { code: 'changed-since', path: 'notes', message: 'saved: ""; yours: "Ben"' },
      { code: 'changed-since', path: 'spec.freeLength', message: 'saved: 52; yours: 55' },
    ]);
    // A deliberate save from Ben's desk is refused the same way: it would overwrite Anna's working copy.
    expect(refusal(updateJob(ben, { id: created.id, expectedRevision: 1, notes: 'Ben', desk: 'ben-1' })).code).toBe('edited-elsewhere');
    // Ben leaving the job does not close Anna's working copy.
    value(keepWorkingRevision(ben, { id: created.id, reason: 'left the job', desk: 'ben-1' }));

    const after = value(getJob(anna, created.id));
    expect([after.revision, freeLength(after.spec), after.notes, after.working?.saves]).toEqual([1, 52, '', 1]);
    // Anna goes on typing in her own working copy.
    value(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 53 }), working: true, desk: 'anna-1' }));
    expect(value(getJob(ben, created.id)).working?.saves).toBe(2);
  });

  it('keeping the other desk\'s copy first saves it under their name; their next autosave is refused as stale, with both versions', () => {
    const [anna, ben] = backend.desks('Anna (estimator)', 'Ben (planner)');
    const created = value(createJob(anna, job()));
    value(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 52 }), working: true, desk: 'anna-1' }));

    // Ben chooses to save his version anyway: Anna's working copy becomes her revision, Ben's goes on top.
    expect(value(keepWorkingRevision(ben, { id: created.id, reason: 'saved' })).revision).toBe(2);
    value(updateJob(ben, { id: created.id, expectedRevision: 2, spec: spec({ freeLength: 55 }), desk: 'ben-1' }));
    const history = value(jobRevisions(ben, created.id));
    expect(history.map((r) => [r.revision, r.madeBy, freeLength(r.spec)])).toEqual([
      [3, 'Ben (planner)', 55], [2, 'Anna (estimator)', 52], [1, 'Anna (estimator)', 50],
    ]);

    // Anna's desk still started from revision 1: her autosave is not silently written over Ben's.
    const stale = refusal(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 54 }), working: true, desk: 'anna-1' }));
    expect(stale).toMatchObject({ code: 'stale-revision', path: 'expectedRevision' });
    expect(stale.message).toMatch(/by Ben \(planner\).*revision 3 since your revision 1/);
    expect(stale.details).toEqual([{ code: 'changed-since', path: 'spec.freeLength', message: 'saved: 55; yours: 54' }]);
    expect(freeLength(value(getJob(anna, created.id)).spec)).toBe(55);
    // On top of revision 3 her autosave opens her own working copy again.
    const again = value(updateJob(anna, { id: created.id, expectedRevision: 3, spec: spec({ freeLength: 54 }), working: true, desk: 'anna-1' }));
    expect([again.revision, again.working?.desk, again.working?.baseRevision]).toEqual([3, 'anna-1', 3]);
  });

  it('a save naming no desk keeps the open working copy as its author\'s revision, then saves on top', () => {
    const [anna, ben] = backend.desks('Anna (estimator)', 'Ben (planner)');
    const created = value(createJob(anna, job()));
    value(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 52 }), working: true, desk: 'anna-1' }));
    const lost = value(setJobStatus(ben, { id: created.id, status: 'lost' }));
    expect([lost.revision, lost.status, freeLength(lost.spec), lost.working]).toEqual([3, 'lost', 52, undefined]);
    expect(value(jobRevisions(ben, created.id)).map((r) => [r.revision, r.madeBy, r.reason])).toEqual([
      [3, 'Ben (planner)', 'status'], [2, 'Anna (estimator)', 'saved'], [1, 'Anna (estimator)', 'created'],
    ]);
  });

  it('one desk\'s own autosaves and deliberate save still make one revision', () => {
    const [anna] = backend.desks('Anna (estimator)', 'Ben (planner)');
    const created = value(createJob(anna, job()));
    for (const freeLength of [51, 52]) {
      value(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength }), working: true, desk: 'anna-1' }));
    }
    const saved = value(updateJob(anna, { id: created.id, expectedRevision: 1, spec: spec({ freeLength: 53 }), desk: 'anna-1' }));
    expect([saved.revision, saved.working]).toEqual([2, undefined]);
    expect(value(jobRevisions(anna, created.id)).map((r) => [r.revision, freeLength(r.spec)])).toEqual([[2, 53], [1, 50]]);
  });
});
