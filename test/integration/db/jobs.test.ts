import { describe, expect, it } from 'vitest';
import { createJob, getJob, jobRevisions, restoreRevision, saveSettings, setJobStatus, updateJob } from '../../../db';
import { MM_PER_IN } from '../../../core/units';
import { job, spec, steppingClock, tempStore, totalCoils, value } from './helpers';

describe('jobs', () => {
  it('numbers jobs from the sequence setting and records who they are for', () => {
    const store = tempStore(steppingClock(Date.parse('2026-05-04T08:00:00Z')));
    const first = value(createJob(store, job()));
    const second = value(createJob(store, job({ customer: { name: '  fernhill   GAUGES (test) ' } })));
    expect([first.number, second.number]).toEqual(['J-26-0001', 'J-26-0002']);
    expect(second.customer).toEqual(first.customer);
    value(saveSettings(store, { numbering: { prefix: 'SP{yyyy}/', width: 3, next: 41 } }));
    expect(value(createJob(store, job())).number).toBe('SP2026/041');
    expect(value(createJob(store, job())).number).toBe('SP2026/042');
  });

  it('keeps shape columns in mm and N/mm whatever the spec units', () => {
    const store = tempStore();
    const metric = value(createJob(store, job({}, { wireDiameter: 1.016, outerDiameter: 10.16, freeLength: 25.4, material: 'astm-a228' })));
    const inch = value(createJob(store, job({}, { units: 'inch', wireDiameter: 0.04, outerDiameter: 0.4, freeLength: 1, material: 'astm-a228' })));
    expect(inch.shape.wireDiameter).toBeCloseTo(0.04 * MM_PER_IN, 9);
    expect(inch.shape.meanDiameter).toBeCloseTo(0.36 * MM_PER_IN, 9);
    expect(inch.shape.freeLength).toBeCloseTo(MM_PER_IN, 9);
    expect(inch.shape.rate).toBeCloseTo(metric.shape.rate, 6);
    expect(inch.shape.units).toBe('inch');
    expect(inch.spec.wireDiameter).toBe(0.04);
  });

  it('names the field of bad input and writes nothing', () => {
    const store = tempStore();
    const bad = createJob(store, job({ orderQuantity: -5 }, { wireDiameter: -2 }));
    expect(bad.ok).toBe(false);
    const paths = !bad.ok ? bad.error.details!.map((e) => e.path) : [];
    expect(paths).toEqual(expect.arrayContaining(['orderQuantity', 'spec.wireDiameter']));
    expect(createJob(store, job({ customerId: 77, customer: undefined })).ok).toBe(false);
    const missing = createJob(store, job({ customerId: 77, customer: undefined }));
    expect(!missing.ok && missing.error).toMatchObject({ code: 'not-found', path: 'customerId' });
    expect(store.db.prepare('SELECT (SELECT count(*) FROM jobs) + (SELECT count(*) FROM customers) AS n').get()).toEqual({ n: 0 });
  });

  it('adds a revision on every save and restores an old one as a new revision', () => {
    const store = tempStore(steppingClock());
    const created = value(createJob(store, job({ notes: 'first quote' })));
    value(updateJob(store, { id: created.id, notes: 'customer wants more coils', spec: spec({ totalCoils: 12 }) }));
    value(setJobStatus(store, { id: created.id, status: 'quoted' }));
    const restored = value(restoreRevision(store, { id: created.id, revision: 1 }));
    expect(restored.revision).toBe(4);
    expect(restored.notes).toBe('first quote');
    expect(restored.status).toBe('draft');
    expect(totalCoils(restored.spec)).toBe(10);
    const history = value(jobRevisions(store, created.id));
    expect(history.map((r) => [r.revision, r.reason, r.fields.status, totalCoils(r.spec!)])).toEqual([
      [4, 'restored revision 1', 'draft', 10],
      [3, 'status', 'quoted', 12],
      [2, 'saved', 'draft', 12],
      [1, 'created', 'draft', 10],
    ]);
    expect(history[1]!.fields.notes).toBe('customer wants more coils');
    expect(value(getJob(store, { number: created.number })).id).toBe(created.id);
  });

  it('recomputes the shape when the spec changes, and refuses a save over a newer revision', () => {
    const store = tempStore();
    const created = value(createJob(store, job()));
    const saved = value(updateJob(store, { id: created.id, expectedRevision: 1, spec: spec({ wireDiameter: 2.5, outerDiameter: 22 }) }));
    expect(saved.shape.wireDiameter).toBe(2.5);
    expect(saved.shape.meanDiameter).toBeCloseTo(19.5, 9);
    const stale = updateJob(store, { id: created.id, expectedRevision: 1, notes: 'lost edit?' });
    expect(!stale.ok && stale.error).toMatchObject({ code: 'stale-revision', path: 'expectedRevision' });
    expect(value(getJob(store, created.id)).notes).toBe('');
    const badSpec = updateJob(store, { id: created.id, spec: spec({ material: 'cheese' }) });
    expect(!badSpec.ok && badSpec.error.path).toBe('spec.material');
    expect(value(getJob(store, created.id)).revision).toBe(2);
  });

  it('reports a missing job or revision by its field', () => {
    const store = tempStore();
    expect(getJob(store, 5)).toMatchObject({ ok: false, error: { code: 'not-found', path: 'id' } });
    const created = value(createJob(store, job()));
    expect(restoreRevision(store, { id: created.id, revision: 9 })).toMatchObject({ ok: false, error: { path: 'revision' } });
  });
});
