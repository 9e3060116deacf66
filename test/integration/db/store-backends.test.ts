import { describe, expect, it } from 'vitest';
import type { Store } from '../../../db';
import { createDemoShop, createJob, getJob, jobRevisions, updateJob } from '../../../db';
import { createService, dispatch } from '../../../service/api';
import { deskBackends } from '../../support/desk-backends';
import { usePgCluster } from '../../support/pg-stores';
import { job, value } from './helpers';

const pg = usePgCluster();

const backends = deskBackends(pg);

const refused = (store: Store, sql: string, ...params: unknown[]) => expect(() => store.sql(sql).run(...params), sql).toThrow();

describe.each(backends)('the job store on $name', (backend) => {
  it('a save on an old revision is refused showing both versions; saving again keeps it as the next revision', () => {
    const [anna, ben] = backend.desks('Anna (estimator)', 'Ben (planner)');
    const created = value(createJob(anna, job({ notes: 'first' })));
    value(updateJob(anna, { id: created.id, expectedRevision: 1, notes: 'Anna: 500 off' }));
    const late = updateJob(ben, { id: created.id, expectedRevision: 1, notes: 'Ben: 800 off', partNumber: 'FG-100' });
    expect(late.ok).toBe(false);
    if (late.ok) return;
    expect(late.error).toMatchObject({ code: 'stale-revision', path: 'expectedRevision' });
    expect(late.error.message).toMatch(/by Anna \(estimator\).*revision 2 since your revision 1: nothing was saved/);
    // Only what differs is listed, with both values; the unchanged part number is not.
    expect(late.error.details).toEqual([{ code: 'changed-since', path: 'notes', message: 'saved: "Anna: 500 off"; yours: "Ben: 800 off"' }]);
    const kept = value(updateJob(ben, { id: created.id, expectedRevision: 2, notes: 'Ben: 800 off' }));
    expect(kept.revision).toBe(3);
    const history = value(jobRevisions(anna, created.id));
    expect(history.map((r) => [r.revision, r.madeBy, r.fields.notes])).toEqual([
      [3, 'Ben (planner)', 'Ben: 800 off'], [2, 'Anna (estimator)', 'Anna: 500 off'], [1, 'Anna (estimator)', 'first'],
    ]);
  });

  it('issued quotes and first-off records say who made them; history refuses change', async () => {
    const [anna] = backend.desks('Anna (estimator)', 'unused');
    value(createDemoShop(anna));
    const first = anna.sql('SELECT id FROM jobs ORDER BY id LIMIT 1').get() as { id: number };
    const service = createService(anna);
    const issued = await dispatch(service.handlers, 'issueQuote', { jobId: first.id, accept: 'demo shop: problems accepted for the test' });
    expect(issued.ok, JSON.stringify(issued)).toBe(true);
    const quote = anna.sql('SELECT id, number, made_by FROM quotes').get() as { id: number; number: string; made_by: string };
    expect(quote.made_by).toBe('Anna (estimator)');
    expect((anna.sql('SELECT made_by FROM first_off_records LIMIT 1').get() as { made_by: string }).made_by).toBe('Anna (estimator)');
    refused(anna, 'UPDATE quotes SET currency = ? WHERE id = ?', 'XXX', quote.id);
    refused(anna, 'DELETE FROM quotes WHERE id = ?', quote.id);
    refused(anna, 'UPDATE quote_lines SET prices = ? WHERE quote_id = ?', '{}', quote.id);
    refused(anna, 'DELETE FROM quote_lines WHERE quote_id = ?', quote.id);
    // A line added to an issued quote after the fact is refused: the quote has the lines it was issued with.
    refused(anna, `INSERT INTO quote_lines (quote_id, line, job_id, job_revision, job, spec, prices, quantity_breaks)
      SELECT quote_id, 2, job_id, job_revision, job, spec, prices, quantity_breaks FROM quote_lines WHERE quote_id = ?`, quote.id);
    refused(anna, 'UPDATE job_revisions SET reason = ? WHERE job_id = ?', 'forged', first.id);
    refused(anna, 'DELETE FROM job_revisions WHERE job_id = ?', first.id);
    refused(anna, 'UPDATE first_off_records SET notes = ?', 'forged');
    refused(anna, 'UPDATE settings_versions SET saved_at = ?', 'forged');
    // An upsert that would replace an issued quote or a saved revision is refused as an update would be.
    refused(anna, `INSERT INTO quotes (id, number, job_id, job_revision, issued_at, validity_days, currency, job, spec, settings, prices,
      quantity_breaks, document) SELECT id, number, job_id, job_revision, issued_at, validity_days, 'XXX', job, spec, settings, prices,
      quantity_breaks, document FROM quotes ON CONFLICT (number) DO UPDATE SET currency = 'XXX'`);
    refused(anna, `INSERT INTO job_revisions (job_id, revision, saved_at, reason, fields, spec) SELECT job_id, revision, saved_at,
      'forged', fields, spec FROM job_revisions WHERE job_id = ? ON CONFLICT (job_id, revision) DO UPDATE SET reason = 'forged'`, first.id);
    expect((anna.sql('SELECT currency FROM quotes').get() as { currency: string }).currency).not.toBe('XXX');
  });

  it('a change committed on another desk moves the change mark an open job list watches', async () => {
    const [anna, ben] = backend.desks('Anna (estimator)', 'Ben (planner)');
    const before = ben.changeMark();
    expect(ben.changeMark()).toBe(before);
    value(createJob(anna, job({ partNumber: 'FROM-ANNA' })));
    // The notice travels over the server's connection: give it a moment to arrive.
    for (let i = 0; i < 50 && ben.changeMark() === before; i++) await new Promise((r) => setTimeout(r, 20));
    expect(ben.changeMark()).not.toBe(before);
  });

  it('refuses rows that break a status, unit, JSON or range check', () => {
    const [store] = backend.desks('Anna (estimator)', 'unused');
    const created = value(createJob(store, job()));
    refused(store, 'UPDATE jobs SET status = ? WHERE id = ?', 'shipped', created.id);
    refused(store, 'UPDATE jobs SET units = ? WHERE id = ?', 'furlongs', created.id);
    refused(store, 'UPDATE jobs SET spec = ? WHERE id = ?', '{not json', created.id);
    refused(store, 'UPDATE jobs SET d = ? WHERE id = ?', 0, created.id);
    refused(store, 'UPDATE jobs SET judgement = ? WHERE id = ?', '[unclosed', created.id);
    refused(store, `INSERT INTO settings (key, value, updated_at) VALUES ('numbering', 'nope', '2026-01-01')`);
    refused(store, `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter,
      forces, measured_on, measured_by, recorded_at) VALUES (?, 1, 'metric', 50, 49, 22, '{"a":1}', '2026-01-01', 'Cora', 'x')`, created.id);
    refused(store, `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter,
      forces, measured_on, measured_by, recorded_at) VALUES (?, 1, 'metric', 50, 49, 22, '[]', '1st May', 'Cora', 'x')`, created.id);
    refused(store, `INSERT INTO first_off_records (job_id, job_revision, units, coiled_free_length, free_length_after_set, outer_diameter,
      forces, measured_on, measured_by, recorded_at) VALUES (?, 1, 'metric', 50, 51, 22, '[]', '2026-01-01', 'Cora', 'x')`, created.id);
    expect(value(getJob(store, created.id)).status).toBe('draft');
  });
});
