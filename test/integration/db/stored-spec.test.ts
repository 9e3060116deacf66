import { describe, expect, it } from 'vitest';
import {
  createJob, exportJobs, findJobs, getJob, jobRevisions, recordQuote, listJobs, restoreRevision, setJobStatus, updateJob,
} from '../../../db';
import { job, spec, tempStore, value } from './helpers';

/** A stored spec changed behind the program's back, as an older or newer build, or a damaged file, leaves it. */
function storeWithOneBrokenJob() {
  const store = tempStore();
  const first = value(createJob(store, job({ partNumber: 'GOOD-1' })));
  const broken = value(createJob(store, job({ partNumber: 'WITHDRAWN-GRADE' })));
  const third = value(createJob(store, job({ partNumber: 'GOOD-3' })));
  store.db.prepare('UPDATE jobs SET spec = ? WHERE id = ?').run(JSON.stringify(spec({ material: 'en10270-1-withdrawn' })), broken.id);
  return { store, first, broken, third };
}

describe('stored specs are read with the spec schema', () => {
  it('lists every job; the one whose spec no longer reads carries its problem, naming the job and the field', () => {
    const { store, broken } = storeWithOneBrokenJob();
    const page = value(listJobs(store, { sort: 'number' }));
    expect(page.jobs.map((j) => j.partNumber)).toEqual(['GOOD-1', 'WITHDRAWN-GRADE', 'GOOD-3']);
    expect(page.jobs.filter((j) => j.problem).map((j) => j.number)).toEqual([broken.number]);
    const problem = page.jobs[1]!.problem!;
    expect(problem).toMatchObject({ code: 'stored-spec-invalid', path: 'spec.material' });
    expect(problem.message).toContain(`job ${broken.number}`);
    expect(problem.message).toContain('en10270-1-withdrawn');
    expect(value(findJobs(store, { text: 'WITHDRAWN' }))[0]!.job.problem?.path).toBe('spec.material');
  });

  it('opening the broken job is that job\'s failure, with its field; the others open', () => {
    const { store, first, broken, third } = storeWithOneBrokenJob();
    const opened = getJob(store, { id: broken.id });
    expect(opened.ok).toBe(false);
    if (opened.ok) return;
    expect(opened.error).toMatchObject({ code: 'stored-spec-invalid', path: 'spec.material' });
    expect(value(getJob(store, { id: first.id })).partNumber).toBe('GOOD-1');
    expect(value(getJob(store, { id: third.id })).partNumber).toBe('GOOD-3');
  });

  it('a spec from a newer version, or one that is not a spec object, is named as such', () => {
    const { store, broken, first } = storeWithOneBrokenJob();
    store.db.prepare('UPDATE jobs SET spec = ? WHERE id = ?').run(JSON.stringify(spec({ version: 7 })), broken.id);
    store.db.prepare('UPDATE jobs SET spec = ? WHERE id = ?').run('[50, 2]', first.id);
    const page = value(listJobs(store, { sort: 'number' }));
    expect(page.jobs[0]!.problem).toMatchObject({ code: 'stored-spec-invalid', path: 'spec' });
    expect(page.jobs[1]!.problem).toMatchObject({ code: 'stored-spec-too-new', path: 'spec.version' });
    expect(page.jobs[1]!.problem!.message).toMatch(/version 7.*update Coilwright/);
  });

  it('the broken job is put right with a new spec; a save that keeps the spec is refused and changes nothing', () => {
    const { store, broken } = storeWithOneBrokenJob();
    const before = (store.db.prepare('SELECT spec FROM jobs WHERE id = ?').get(broken.id) as { spec: string }).spec;
    const status = setJobStatus(store, { id: broken.id, status: 'quoted' });
    expect(status.ok ? null : status.error).toMatchObject({ code: 'stored-spec-invalid', path: 'spec.material' });
    expect((store.db.prepare('SELECT spec, status, revision FROM jobs WHERE id = ?').get(broken.id))).toEqual({ spec: before, status: 'draft', revision: 1 });
    const fixed = value(updateJob(store, { id: broken.id, spec: spec({ material: 'en10270-1-dh' }) }));
    expect(fixed.spec.material).toBe('en10270-1-dh');
    expect(value(listJobs(store, {})).jobs.every((j) => j.problem === undefined)).toBe(true);
  });

  it('history lists a revision that no longer reads with its problem and will not restore it', () => {
    const { store, first } = storeWithOneBrokenJob();
    // Revisions are history (triggers refuse changes), so the unreadable one is added as an older build saved it.
    store.db.prepare(`INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec)
      SELECT job_id, 2, saved_at, 'saved', fields, ? FROM job_revisions WHERE job_id = ? AND revision = 1`)
      .run(JSON.stringify(spec({ material: 'en10270-1-withdrawn' })), first.id);
    store.db.prepare('UPDATE jobs SET revision = 2 WHERE id = ?').run(first.id);
    value(updateJob(store, { id: first.id, spec: spec({ material: 'en10270-1-dh' }) }));
    const history = value(jobRevisions(store, first.id));
    expect(history.map((r) => [r.revision, r.spec?.material ?? null, r.problem?.path ?? null])).toEqual([
      [3, 'en10270-1-dh', null],
      [2, null, 'spec.material'],
      [1, 'en10270-1-sh', null],
    ]);
    expect(history[1]!.problem!.message).toContain(`revision 2 of job ${first.number}`);
    const restored = restoreRevision(store, { id: first.id, revision: 2 });
    expect(restored.ok ? null : restored.error.code).toBe('stored-spec-invalid');
  });

  it('a quote is not issued from a job whose spec no longer reads; export keeps the job and names it', () => {
    const { store, broken } = storeWithOneBrokenJob();
    const quote = recordQuote(store, {
      jobId: broken.id, jobRevision: broken.revision, validityDays: 30, prices: {}, quantityBreaks: [], document: {}, decision: null,
    });
    expect(quote.ok ? null : quote.error).toMatchObject({ code: 'stored-spec-invalid', path: 'spec.material' });
    const exported = value(exportJobs(store, { format: 'json' }));
    expect(exported.count).toBe(3);
    expect(exported.problems?.map((p) => p.message.includes(broken.number))).toEqual([true]);
    const doc = JSON.parse(exported.text!) as { jobs: { partNumber: string; spec: { material: string } }[] };
    expect(doc.jobs.find((j) => j.partNumber === 'WITHDRAWN-GRADE')!.spec.material).toBe('en10270-1-withdrawn');
  });
});
